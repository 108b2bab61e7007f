#pragma once
// The section schedule as CSV for spreadsheets and scripts: one row per section
// per design case, in SI, with the unit in every column name. The common columns
// carry the names and meaning of the compute JSON (docs/cli.md), prefixed with
// inlet_ / outlet_ for the two states; the type-specific figures follow under
// their SectionFigures keys, empty where a section does not have them. Written
// by CsvWriter (RFC 4180, round-trip numbers, locale-independent).

#include "airwright/core/chain/CaseResult.h"

#include <string>
#include <vector>

namespace Airwright::Cli {

class ScheduleCsv {
public:
    // The columns in order: the common ones, then every figure key that occurs in
    // the result, in the order first met (supply before extract, case by case).
    static std::vector<std::string> columns(const Core::Chain::UnitResult& result);

    // Header row and one row per section per case. Throws std::runtime_error for a
    // non-finite computed value (a fault of ours, never written).
    static std::string write(const Core::Chain::UnitResult& result);
};

} // namespace Airwright::Cli
