#pragma once
// Writes a BinTable in the CSV layout BinTableReader reads (tdb_C, hours, w_gkg),
// with optional comment lines first.

#include "airwright/core/annual/BinTable.h"

#include <ostream>
#include <string>
#include <vector>

namespace Airwright::Core::Annual {

class BinTableWriter {
public:
    static void write(const BinTable& table, std::ostream& out, const std::vector<std::string>& comments = {});
};

} // namespace Airwright::Core::Annual
