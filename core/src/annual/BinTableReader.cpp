#include "airwright/core/annual/BinTableReader.h"

#include "TextFields.h"

#include "airwright/core/NumberFormat.h"
#include "airwright/core/annual/WeatherFileError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <array>
#include <fstream>
#include <optional>
#include <system_error>

namespace Airwright::Core::Annual {

namespace {

using TextFields::quote;
using TextFields::trim;

enum class Column { DryBulb, Hours, HumidityRatio, RelativeHumidity };

struct ColumnName {
    std::string_view name;
    Column column;
};

constexpr std::array<ColumnName, 4> kColumns = {{{"tdb_C", Column::DryBulb},
                                                 {"hours", Column::Hours},
                                                 {"w_gkg", Column::HumidityRatio},
                                                 {"rh_pct", Column::RelativeHumidity}}};

constexpr double kMaxHours = 8784.0;

} // namespace

BinTableReader::BinTableReader(Pressure pressure, std::size_t maxBytes) : m_pressure(pressure), m_maxBytes(maxBytes)
{
    const double p = toPascals(pressure);
    if (!(p >= 31000.0 && p <= 120000.0))
        throw InputError("bin table pressure", p, "Pa", "31000 .. 120000 Pa");
}

BinTable BinTableReader::readFile(const std::filesystem::path& path) const
{
    const std::string source = path.string();
    std::error_code ec;
    if (!std::filesystem::is_regular_file(path, ec))
        throw WeatherFileError(source, 0, 0, "cannot open: no such file");
    const auto size = std::filesystem::file_size(path, ec);
    if (ec)
        throw WeatherFileError(source, 0, 0, "cannot read the file size: " + ec.message());
    if (size > m_maxBytes)
        throw WeatherFileError(source, 0, 0,
                               "file is " + std::to_string(size) + " bytes, above the limit of " +
                                   std::to_string(m_maxBytes) + " bytes for a bin table");
    std::ifstream in(path, std::ios::binary);
    if (!in)
        throw WeatherFileError(source, 0, 0, "cannot open for reading");
    return readStream(in, source);
}

BinTable BinTableReader::readStream(std::istream& in, const std::string& sourceName) const
{
    const auto text = TextFields::readAtMost(in, m_maxBytes);
    if (!text)
        throw WeatherFileError(sourceName, 0, 0,
                               "input is larger than the limit of " + std::to_string(m_maxBytes) +
                                   " bytes for a bin table");
    return readText(*text, sourceName);
}

BinTable BinTableReader::readText(std::string_view text, const std::string& sourceName) const
{
    const auto fail = [&sourceName](std::size_t line, std::size_t column, const std::string& message) {
        throw WeatherFileError(sourceName, line, column, message);
    };
    if (text.size() > m_maxBytes)
        fail(0, 0, "input is larger than the limit of " + std::to_string(m_maxBytes) + " bytes for a bin table");

    const auto lines = TextFields::splitLines(text);
    std::vector<Column> layout;
    std::size_t headerLine = 0;
    std::vector<TemperatureBin> bins;
    double totalHours = 0.0;

    for (std::size_t i = 0; i < lines.size(); ++i) {
        const std::size_t lineNumber = i + 1;
        const std::string_view line = trim(lines[i]);
        if (line.empty() || line.front() == '#')
            continue;
        const auto fields = TextFields::splitFields(line);

        if (layout.empty()) {
            headerLine = lineNumber;
            std::array<bool, kColumns.size()> seen{};
            for (std::size_t f = 0; f < fields.size(); ++f) {
                const std::string_view name = trim(fields[f]);
                std::optional<std::size_t> match;
                for (std::size_t k = 0; k < kColumns.size(); ++k)
                    if (TextFields::equalsIgnoringCase(name, kColumns[k].name))
                        match = k;
                if (!match)
                    fail(lineNumber, f + 1,
                         "unknown column " + quote(name) + "; the columns are tdb_C, hours and w_gkg or rh_pct");
                if (seen[*match])
                    fail(lineNumber, f + 1, "column " + quote(name) + " appears twice");
                seen[*match] = true;
                layout.push_back(kColumns[*match].column);
            }
            if (!seen[0] || !seen[1])
                fail(lineNumber, 0, "the header row needs the columns tdb_C and hours");
            if (seen[2] == seen[3])
                fail(lineNumber, 0, "the header row needs exactly one of the columns w_gkg or rh_pct");
            continue;
        }

        if (fields.size() != layout.size())
            fail(lineNumber, fields.size() < layout.size() ? fields.size() + 1 : layout.size() + 1,
                 "row has " + std::to_string(fields.size()) + " fields; the header row on line " +
                     std::to_string(headerLine) + " has " + std::to_string(layout.size()));

        double tdb = 0.0;
        double h = 0.0;
        std::optional<double> wGkg;
        std::optional<double> rhPct;
        std::size_t humidityColumn = 0;
        std::size_t dryBulbColumn = 0;
        for (std::size_t f = 0; f < fields.size(); ++f) {
            const std::size_t column = f + 1;
            const auto value = TextFields::parseNumber(fields[f]);
            if (!value)
                fail(lineNumber, column, "value " + quote(trim(fields[f])) + " is not a number");
            const double v = *value;
            switch (layout[f]) {
            case Column::DryBulb:
                if (!(v >= -70.0 && v <= 70.0))
                    fail(lineNumber, column, "dry bulb temperature " + formatNumber(v) + " C is outside -70 .. 70 C");
                if (!bins.empty() && !(v > toCelsius(bins.back().dryBulb)))
                    fail(lineNumber, column,
                         "dry bulb temperature " + formatNumber(v) + " C is not above the previous row's " +
                             formatNumber(toCelsius(bins.back().dryBulb)) + " C; rows go in ascending temperature");
                tdb = v;
                dryBulbColumn = column;
                break;
            case Column::Hours:
                if (!(v >= 0.0 && v <= kMaxHours))
                    fail(lineNumber, column, "hours " + formatNumber(v) + " h is outside 0 .. 8784 h");
                if (totalHours + v > kMaxHours)
                    fail(lineNumber, column,
                         "hours add up to " + formatNumber(totalHours + v) + " h, more than 8784 h in a year");
                h = v;
                break;
            case Column::HumidityRatio:
                wGkg = v;
                humidityColumn = column;
                break;
            case Column::RelativeHumidity:
                rhPct = v;
                humidityColumn = column;
                break;
            }
        }

        const AbsoluteTemperature t = celsius(tdb);
        double w = 0.0;
        try {
            const double wsGkg = toGramsPerKilogram(Psychro::saturationHumidityRatio(t, m_pressure));
            if (wGkg) {
                if (!(*wGkg >= 0.0 && *wGkg <= wsGkg))
                    fail(lineNumber, humidityColumn,
                         "humidity ratio " + formatNumber(*wGkg) + " g/kg is outside 0 .. " + formatFixed(wsGkg, 3) +
                             " g/kg (saturation at " + formatNumber(tdb) + " C)");
                w = *wGkg / 1000.0;
            } else {
                if (!(*rhPct >= 0.0 && *rhPct <= 100.0))
                    fail(lineNumber, humidityColumn,
                         "relative humidity " + formatNumber(*rhPct) + " % is outside 0 .. 100 %");
                w = toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(t, percent(*rhPct), m_pressure));
            }
        } catch (const WeatherFileError&) {
            throw;
        } catch (const InputError& e) {
            fail(lineNumber, dryBulbColumn, e.what());
        }
        totalHours += h;
        bins.push_back({t, hours(h), kilogramsPerKilogram(w)});
    }

    if (layout.empty())
        fail(lines.size() + 1, 0, "no header row; expected e.g. tdb_C,hours,w_gkg");
    if (bins.empty())
        fail(lines.size() + 1, 0, "no bin rows after the header row");
    return BinTable(std::move(bins), m_pressure);
}

} // namespace Airwright::Core::Annual
