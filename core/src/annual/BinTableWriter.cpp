#include "airwright/core/annual/BinTableWriter.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

namespace Airwright::Core::Annual {

void BinTableWriter::write(const BinTable& table, std::ostream& out, const std::vector<std::string>& comments)
{
    for (const auto& comment : comments) {
        if (comment.find_first_of("\r\n") != std::string::npos)
            throw InputError("bin table comment must be a single line: \"" + comment + "\"");
        out << "# " << comment << "\n";
    }
    out << "tdb_C,hours,w_gkg\n";
    for (const auto& bin : table.bins())
        out << formatFixed(toCelsius(bin.dryBulb), 2) << ',' << formatNumber(toHours(bin.duration)) << ','
            << formatFixed(toGramsPerKilogram(bin.humidityRatio), 3) << "\n";
}

} // namespace Airwright::Core::Annual
