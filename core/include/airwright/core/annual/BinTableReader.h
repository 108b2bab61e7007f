#pragma once
// Reads a bin table from CSV text of this program's own layout:
//
//   # lines starting with '#' are comments; blank lines are skipped
//   tdb_C,hours,w_gkg
//   -11,14,1.2
//   -9,37,1.5
//
// The header row names the columns in any order: tdb_C (representative dry bulb,
// C), hours (h) and exactly one of w_gkg (coincident mean humidity ratio, g/kg dry
// air) or rh_pct (coincident mean relative humidity, %, converted at the bin's dry
// bulb). Unknown or repeated column names are errors. Rows must be in strictly
// ascending tdb_C with hours >= 0, tdb -70 .. 70 C, w_gkg 0 .. saturation, rh_pct
// 0 .. 100, and at most 8784 hours in all. Errors are WeatherFileError with line
// and field. Parsing is locale-independent; CRLF is accepted.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/BinTable.h"

#include <cstddef>
#include <filesystem>
#include <istream>
#include <string>
#include <string_view>

namespace Airwright::Core::Annual {

class BinTableReader {
public:
    // The pressure the table is taken at (site station pressure).
    explicit BinTableReader(Pressure pressure, std::size_t maxBytes = 1024u * 1024u);

    BinTable readFile(const std::filesystem::path& path) const;
    BinTable readStream(std::istream& in, const std::string& sourceName = "bin table") const;
    BinTable readText(std::string_view text, const std::string& sourceName = "bin table") const;

private:
    Pressure m_pressure;
    std::size_t m_maxBytes;
};

} // namespace Airwright::Core::Annual
