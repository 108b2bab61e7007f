#include "airwright/core/annual/EpwReader.h"

#include "TextFields.h"

#include "airwright/core/NumberFormat.h"
#include "airwright/core/annual/WeatherFileError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <array>
#include <fstream>
#include <optional>
#include <system_error>
#include <vector>

namespace Airwright::Core::Annual {

namespace {

using TextFields::parseInteger;
using TextFields::parseNumber;
using TextFields::quote;
using TextFields::splitFields;
using TextFields::trim;

constexpr std::size_t kHeaderRecords = 8;
constexpr std::size_t kLocationFields = 10;
constexpr std::size_t kDataFields = 35; // N1 .. N34 and A1 of the data dictionary

// 1-based field numbers of the data record.
constexpr std::size_t kYearField = 1;
constexpr std::size_t kMonthField = 2;
constexpr std::size_t kDayField = 3;
constexpr std::size_t kHourField = 4;
constexpr std::size_t kMinuteField = 5;
constexpr std::size_t kDryBulbField = 7;
constexpr std::size_t kDewPointField = 8;
constexpr std::size_t kRelativeHumidityField = 9;
constexpr std::size_t kPressureField = 10;

// Limits and missing codes from the EPW data dictionary (\minimum>, \maximum<, \missing).
constexpr double kTemperatureLowerC = -70.0;  // exclusive
constexpr double kTemperatureUpperC = 70.0;   // exclusive
constexpr double kTemperatureMissingC = 99.9; // this value and above
constexpr double kRelativeHumidityMaxPct = 110.0;
constexpr double kRelativeHumidityMissingPct = 999.0;
constexpr double kPressureLowerPa = 31000.0;  // exclusive
constexpr double kPressureUpperPa = 120000.0; // exclusive
constexpr double kPressureMissingPa = 999999.0;

struct Date {
    long long month;
    long long day;
    long long hour;
    bool operator==(const Date&) const = default;
};

std::string describe(const Date& d)
{
    return std::to_string(d.month) + "/" + std::to_string(d.day) + " hour " + std::to_string(d.hour);
}

int daysInMonth(long long month)
{
    static constexpr std::array<int, 12> kDays = {31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
    return kDays[static_cast<std::size_t>(month - 1)];
}

// The dates that may follow prev in an hourly year; 28 February hour 24 may be
// followed by 29 February (leap year) or 1 March.
std::vector<Date> successors(const Date& prev)
{
    if (prev.hour < 24)
        return {{prev.month, prev.day, prev.hour + 1}};
    if (prev.month == 2 && prev.day == 28)
        return {{2, 29, 1}, {3, 1, 1}};
    if (prev.day < daysInMonth(prev.month))
        return {{prev.month, prev.day + 1, 1}};
    if (prev.month < 12)
        return {{prev.month + 1, 1, 1}};
    return {};
}

struct RawHour {
    std::optional<double> dryBulbC;
    std::optional<double> dewPointC;
    std::optional<double> relativeHumidityPct;
    std::optional<double> pressurePa;
};

class Parser {
public:
    Parser(const EpwReadOptions& options, std::string source) : m_options(options), m_source(std::move(source)) {}

    EpwReadResult parse(std::string_view text)
    {
        std::vector<std::string_view> lines = TextFields::splitLines(text);
        while (!lines.empty() && trim(lines.back()).empty())
            lines.pop_back();
        if (lines.size() < kHeaderRecords)
            fail(lines.size() + 1, 0,
                 "file ends within the header; an EPW file starts with " + std::to_string(kHeaderRecords) +
                     " header records");

        SiteInfo site = parseLocation(lines[0]);
        expectKeyword(lines[1], 2, {"DESIGN CONDITIONS"});
        expectKeyword(lines[2], 3, {"TYPICAL/EXTREME PERIODS"});
        expectKeyword(lines[3], 4, {"GROUND TEMPERATURES"});
        expectKeyword(lines[4], 5, {"HOLIDAYS/DAYLIGHT SAVINGS", "HOLIDAYS/DAYLIGHT SAVING"});
        expectKeyword(lines[5], 6, {"COMMENTS 1"});
        expectKeyword(lines[6], 7, {"COMMENTS 2"});
        parseDataPeriods(lines[7]);

        std::vector<RawHour> raw;
        raw.reserve(WeatherYear::kHoursInLeapYear);
        std::optional<Date> previous;
        for (std::size_t i = kHeaderRecords; i < lines.size(); ++i) {
            const std::size_t lineNumber = i + 1;
            raw.push_back(parseRecord(lines[i], lineNumber, previous));
        }
        const std::size_t firstDataLine = kHeaderRecords + 1;
        if (raw.empty())
            fail(firstDataLine, 0, "no hourly data records after the header");
        if (!(*previous == Date{12, 31, 24}))
            fail(lines.size() + 1, 0,
                 "file ends after " + std::to_string(raw.size()) + " hourly records at " + describe(*previous) +
                     "; a year runs to 12/31 hour 24 (8760 records, 8784 in a leap year)");

        std::vector<EpwReadResult::FilledGap> gaps;
        std::vector<std::optional<double>> dryBulb(raw.size());
        std::vector<std::optional<double>> pressure(raw.size());
        for (std::size_t i = 0; i < raw.size(); ++i) {
            dryBulb[i] = raw[i].dryBulbC;
            pressure[i] = raw[i].pressurePa;
        }
        fill(dryBulb, "dry bulb temperature", kDryBulbField, gaps);
        fill(pressure, "station pressure", kPressureField, gaps);

        std::vector<std::optional<double>> humidity(raw.size());
        for (std::size_t i = 0; i < raw.size(); ++i)
            humidity[i] = humidityRatio(raw[i], *dryBulb[i], *pressure[i], firstDataLine + i);
        fill(humidity, "humidity (dew point and relative humidity)", kDewPointField, gaps);

        std::vector<WeatherHour> hours;
        hours.reserve(raw.size());
        for (std::size_t i = 0; i < raw.size(); ++i) {
            const AbsoluteTemperature t = celsius(*dryBulb[i]);
            const Pressure p = pascals(*pressure[i]);
            double w = *humidity[i];
            try {
                // Interpolated humidity may sit just above saturation at an interpolated
                // temperature; dew points within the tolerance land there too.
                w = std::min(w, toKilogramsPerKilogram(Psychro::saturationHumidityRatio(t, p)));
            } catch (const InputError& e) {
                fail(firstDataLine + i, kDryBulbField, e.what());
            }
            hours.push_back({t, kilogramsPerKilogram(w), p});
        }
        return {WeatherYear(std::move(site), std::move(hours)), std::move(gaps)};
    }

private:
    [[noreturn]] void fail(std::size_t line, std::size_t column, const std::string& message) const
    {
        throw WeatherFileError(m_source, line, column, message);
    }

    double number(std::string_view field, std::size_t line, std::size_t column, const std::string& what) const
    {
        const auto v = parseNumber(field);
        if (!v)
            fail(line, column, what + " " + quote(trim(field)) + " is not a number");
        return *v;
    }

    long long integer(std::string_view field, std::size_t line, std::size_t column, const std::string& what) const
    {
        const auto v = parseInteger(field);
        if (!v)
            fail(line, column, what + " " + quote(trim(field)) + " is not a whole number");
        return *v;
    }

    void checkFieldCount(const std::vector<std::string_view>& fields, std::size_t expected, std::size_t line,
                         const std::string& record) const
    {
        if (fields.size() == expected)
            return;
        // Point at the first missing field, or the first surplus one.
        const std::size_t column = fields.size() < expected ? fields.size() + 1 : expected + 1;
        fail(line, column,
             record + " has " + std::to_string(fields.size()) + " fields; expected " + std::to_string(expected));
    }

    void expectKeyword(std::string_view line, std::size_t lineNumber,
                       std::initializer_list<std::string_view> keywords) const
    {
        const std::string_view found = trim(splitFields(line).front());
        for (const auto keyword : keywords)
            if (TextFields::equalsIgnoringCase(found, keyword))
                return;
        fail(lineNumber, 1, "expected the " + std::string(*keywords.begin()) + " header record, found " + quote(found));
    }

    SiteInfo parseLocation(std::string_view line) const
    {
        expectKeyword(line, 1, {"LOCATION"});
        const auto fields = splitFields(line);
        checkFieldCount(fields, kLocationFields, 1, "the LOCATION record");
        SiteInfo site;
        site.name = std::string(trim(fields[1]));
        site.region = std::string(trim(fields[2]));
        site.country = std::string(trim(fields[3]));
        site.source = std::string(trim(fields[4]));
        site.stationId = std::string(trim(fields[5]));
        site.latitudeDegrees = ranged(fields[6], 1, 7, "latitude", "deg", -90.0, 90.0);
        site.longitudeDegrees = ranged(fields[7], 1, 8, "longitude", "deg", -180.0, 180.0);
        site.timeZone = hours(ranged(fields[8], 1, 9, "time zone", "h", -12.0, 12.0));
        const double elevation = number(fields[9], 1, 10, "elevation");
        if (!(elevation >= -1000.0 && elevation < 9999.9))
            fail(1, 10, "elevation " + formatNumber(elevation) + " m is outside -1000 .. 9999.9 m (exclusive)");
        site.elevation = metres(elevation);
        return site;
    }

    double ranged(std::string_view field, std::size_t line, std::size_t column, const std::string& what,
                  const std::string& unit, double lo, double hi) const
    {
        const double v = number(field, line, column, what);
        if (!(v >= lo && v <= hi))
            fail(line, column,
                 what + " " + formatNumber(v) + " " + unit + " is outside " + formatNumber(lo) + " .. " +
                     formatNumber(hi) + " " + unit);
        return v;
    }

    void parseDataPeriods(std::string_view line) const
    {
        constexpr std::size_t lineNumber = kHeaderRecords;
        expectKeyword(line, lineNumber, {"DATA PERIODS"});
        const auto fields = splitFields(line);
        if (fields.size() < 3)
            fail(lineNumber, fields.size() + 1,
                 "the DATA PERIODS record needs the number of periods and of records per hour");
        const long long periods = integer(fields[1], lineNumber, 2, "number of data periods");
        if (periods != 1)
            fail(lineNumber, 2,
                 "number of data periods is " + std::to_string(periods) + "; this reader takes files with one period");
        const long long perHour = integer(fields[2], lineNumber, 3, "number of records per hour");
        if (perHour != 1)
            fail(lineNumber, 3,
                 "number of records per hour is " + std::to_string(perHour) + "; this reader takes hourly files (1)");
    }

    RawHour parseRecord(std::string_view line, std::size_t lineNumber, std::optional<Date>& previous) const
    {
        if (trim(line).empty())
            fail(lineNumber, 0, "blank line among the hourly data records");
        const auto fields = splitFields(line);
        checkFieldCount(fields, kDataFields, lineNumber, "the data record");

        integer(fields[kYearField - 1], lineNumber, kYearField, "year");
        const Date date{integerIn(fields, lineNumber, kMonthField, "month", 1, 12),
                        integerIn(fields, lineNumber, kDayField, "day", 1, 31),
                        integerIn(fields, lineNumber, kHourField, "hour", 1, 24)};
        integerIn(fields, lineNumber, kMinuteField, "minute", 0, 60);
        checkSequence(date, previous, lineNumber);
        previous = date;

        RawHour raw;
        raw.dryBulbC = temperature(fields, lineNumber, kDryBulbField, "dry bulb temperature");
        raw.dewPointC = temperature(fields, lineNumber, kDewPointField, "dew point temperature");

        const double rh =
            number(fields[kRelativeHumidityField - 1], lineNumber, kRelativeHumidityField, "relative humidity");
        if (rh < kRelativeHumidityMissingPct) {
            if (!(rh >= 0.0 && rh <= kRelativeHumidityMaxPct))
                fail(lineNumber, kRelativeHumidityField,
                     "relative humidity " + formatNumber(rh) + " % is outside 0 .. 110 %");
            raw.relativeHumidityPct = rh;
        }

        const double p = number(fields[kPressureField - 1], lineNumber, kPressureField, "station pressure");
        if (p < kPressureMissingPa) {
            if (!(p > kPressureLowerPa && p < kPressureUpperPa))
                fail(lineNumber, kPressureField,
                     "station pressure " + formatNumber(p) + " Pa is outside 31000 .. 120000 Pa (exclusive)");
            raw.pressurePa = p;
        }

        if (raw.dryBulbC && raw.dewPointC &&
            *raw.dewPointC > *raw.dryBulbC + toKelvinDifference(m_options.dewPointTolerance))
            fail(lineNumber, kDewPointField,
                 "dew point " + formatNumber(*raw.dewPointC) + " C is above the dry bulb " +
                     formatNumber(*raw.dryBulbC) + " C by more than " +
                     formatNumber(toKelvinDifference(m_options.dewPointTolerance)) + " K");
        return raw;
    }

    long long integerIn(const std::vector<std::string_view>& fields, std::size_t line, std::size_t column,
                        const std::string& what, long long lo, long long hi) const
    {
        const long long v = integer(fields[column - 1], line, column, what);
        if (v < lo || v > hi)
            fail(line, column,
                 what + " " + std::to_string(v) + " is outside " + std::to_string(lo) + " .. " + std::to_string(hi));
        return v;
    }

    void checkSequence(const Date& date, const std::optional<Date>& previous, std::size_t line) const
    {
        const std::vector<Date> allowed = previous ? successors(*previous) : std::vector<Date>{{1, 1, 1}};
        if (allowed.empty())
            fail(line, 0, "record after 12/31 hour 24; a year has 8760 hourly records (8784 in a leap year)");
        for (const auto& d : allowed)
            if (d == date)
                return;
        const Date& want = allowed.back();
        const std::size_t column = date.month != want.month ? kMonthField
                                   : date.day != want.day   ? kDayField
                                                            : kHourField;
        std::string expected = describe(allowed.front());
        if (allowed.size() > 1)
            expected += " or " + describe(allowed.back());
        const std::string after = previous ? " after " + describe(*previous) : " as the first record";
        fail(line, column,
             "expected " + expected + after + ", found " + describe(date) +
                 "; hourly records must follow the calendar without gaps");
    }

    std::optional<double> temperature(const std::vector<std::string_view>& fields, std::size_t line, std::size_t column,
                                      const std::string& what) const
    {
        const double v = number(fields[column - 1], line, column, what);
        if (v >= kTemperatureMissingC)
            return std::nullopt;
        if (!(v > kTemperatureLowerC && v < kTemperatureUpperC))
            fail(line, column, what + " " + formatNumber(v) + " C is outside -70 .. 70 C (exclusive)");
        return v;
    }

    std::optional<double> humidityRatio(const RawHour& raw, double dryBulbC, double pressurePa, std::size_t line) const
    {
        const Pressure p = pascals(pressurePa);
        try {
            if (raw.dewPointC) {
                const Pressure pw = Psychro::saturationPressure(celsius(*raw.dewPointC));
                return toKilogramsPerKilogram(Psychro::humidityRatioFromVapourPressure(pw, p));
            }
            if (raw.relativeHumidityPct) {
                const double rh = std::min(*raw.relativeHumidityPct, 100.0) / 100.0;
                return toKilogramsPerKilogram(
                    Psychro::humidityRatioFromRelativeHumidity(celsius(dryBulbC), fraction(rh), p));
            }
        } catch (const InputError& e) {
            fail(line, raw.dewPointC ? kDewPointField : kRelativeHumidityField, e.what());
        }
        return std::nullopt;
    }

    // Fills runs of missing values by the rule in EpwReadOptions.h.
    void fill(std::vector<std::optional<double>>& values, const std::string& quantity, std::size_t column,
              std::vector<EpwReadResult::FilledGap>& gaps) const
    {
        const std::size_t firstDataLine = kHeaderRecords + 1;
        const std::size_t n = values.size();
        std::size_t missing = 0;
        std::size_t firstMissing = n;
        std::size_t i = 0;
        while (i < n) {
            if (values[i]) {
                ++i;
                continue;
            }
            const std::size_t begin = i;
            while (i < n && !values[i])
                ++i;
            const std::size_t end = i; // one past the run
            const std::size_t length = end - begin;
            if (length == n)
                fail(firstDataLine, column, quantity + " is missing in every hour");
            if (length > m_options.maxGapHours)
                fail(firstDataLine + begin, column,
                     quantity + " is missing for " + std::to_string(length) +
                         " consecutive hours from this line; at most " + std::to_string(m_options.maxGapHours) +
                         " are filled by interpolation");
            missing += length;
            firstMissing = std::min(firstMissing, begin);
            gaps.push_back({quantity, firstDataLine + begin, column, length});

            if (begin == 0 || end == n) {
                const double edge = begin == 0 ? *values[end] : *values[begin - 1];
                for (std::size_t k = begin; k < end; ++k)
                    values[k] = edge;
            } else {
                const double a = *values[begin - 1];
                const double b = *values[end];
                const double span = static_cast<double>(length + 1);
                for (std::size_t k = begin; k < end; ++k)
                    values[k] = a + (b - a) * static_cast<double>(k - begin + 1) / span;
            }
        }
        if (missing > m_options.maxMissingHours)
            fail(firstDataLine + firstMissing, column,
                 quantity + " is missing in " + std::to_string(missing) + " hours of the year; at most " +
                     std::to_string(m_options.maxMissingHours) + " are filled");
    }

    const EpwReadOptions& m_options;
    std::string m_source;
};

} // namespace

EpwReader::EpwReader(EpwReadOptions options) : m_options(options) {}

EpwReadResult EpwReader::readFile(const std::filesystem::path& path) const
{
    const std::string source = path.string();
    std::error_code ec;
    if (!std::filesystem::is_regular_file(path, ec))
        throw WeatherFileError(source, 0, 0, "cannot open: no such file");
    const auto size = std::filesystem::file_size(path, ec);
    if (ec)
        throw WeatherFileError(source, 0, 0, "cannot read the file size: " + ec.message());
    if (size > m_options.maxBytes)
        throw WeatherFileError(source, 0, 0,
                               "file is " + std::to_string(size) + " bytes, above the limit of " +
                                   std::to_string(m_options.maxBytes) + " bytes for a weather file");
    std::ifstream in(path, std::ios::binary);
    if (!in)
        throw WeatherFileError(source, 0, 0, "cannot open for reading");
    return readStream(in, source);
}

EpwReadResult EpwReader::readStream(std::istream& in, const std::string& sourceName) const
{
    const auto text = TextFields::readAtMost(in, m_options.maxBytes);
    if (!text)
        throw WeatherFileError(sourceName, 0, 0,
                               "input is larger than the limit of " + std::to_string(m_options.maxBytes) +
                                   " bytes for a weather file");
    return readText(*text, sourceName);
}

EpwReadResult EpwReader::readText(std::string_view text, const std::string& sourceName) const
{
    if (text.size() > m_options.maxBytes)
        throw WeatherFileError(sourceName, 0, 0,
                               "input is larger than the limit of " + std::to_string(m_options.maxBytes) +
                                   " bytes for a weather file");
    return Parser(m_options, sourceName).parse(text);
}

} // namespace Airwright::Core::Annual
