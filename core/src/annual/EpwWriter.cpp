#include "airwright/core/annual/EpwWriter.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <array>
#include <cmath>
#include <string_view>

namespace Airwright::Core::Annual {

namespace {

// Missing codes of fields 11 .. 35 (EPW data dictionary), for what this program
// does not model: radiation, illuminance, wind, sky, visibility, weather codes,
// precipitation, snow, albedo.
constexpr std::string_view kUnmodelledFields =
    "9999,9999,9999,9999,9999,9999,999999,999999,999999,9999,999,999,99,99,9999,99999,9,999999999,999,.999,999,99,"
    "999,999,99";

bool isLeapCalendarYear(int y)
{
    return (y % 4 == 0 && y % 100 != 0) || y % 400 == 0;
}

// Weekday of 1 January (Gauss's rule), 0 = Sunday.
int weekdayOfFirstJanuary(int y)
{
    const int a = y - 1;
    return (1 + 5 * (a % 4) + 4 * (a % 100) + 6 * (a % 400)) % 7;
}

void checkText(const std::string& text, const std::string& what, bool commasAllowed)
{
    if (text.find_first_of("\r\n") != std::string::npos)
        throw InputError(what + " must be a single line for an EPW file");
    if (!commasAllowed && text.find(',') != std::string::npos)
        throw InputError(what + " must not contain a comma in an EPW file: \"" + text + "\"");
}

} // namespace

void EpwWriter::write(const WeatherYear& year, std::ostream& out, const std::string& comment1,
                      const std::string& comment2, int calendarYear)
{
    if (calendarYear == 0)
        calendarYear = year.isLeapYear() ? 2004 : 2001;
    if (calendarYear < 1 || calendarYear > 9999)
        throw InputError("calendar year", calendarYear, "", "1 .. 9999");
    if (isLeapCalendarYear(calendarYear) != year.isLeapYear())
        throw InputError("calendar year " + std::to_string(calendarYear) + (year.isLeapYear() ? " is not" : " is") +
                         " a leap year, but the weather year has " + std::to_string(year.size()) + " hours");

    const SiteInfo& site = year.site();
    checkText(site.name, "site name", false);
    checkText(site.region, "site region", false);
    checkText(site.country, "site country", false);
    checkText(site.source, "data source", false);
    checkText(site.stationId, "station identifier", false);
    checkText(comment1, "comment 1", true);
    checkText(comment2, "comment 2", true);

    static constexpr std::array<std::string_view, 7> kWeekdays = {"Sunday",   "Monday", "Tuesday", "Wednesday",
                                                                  "Thursday", "Friday", "Saturday"};
    out << "LOCATION," << site.name << ',' << site.region << ',' << site.country << ',' << site.source << ','
        << site.stationId << ',' << formatFixed(site.latitudeDegrees, 2) << ',' << formatFixed(site.longitudeDegrees, 2)
        << ',' << formatFixed(toHours(site.timeZone), 1) << ',' << formatFixed(toMetres(site.elevation), 1) << "\n";
    out << "DESIGN CONDITIONS,0\n";
    out << "TYPICAL/EXTREME PERIODS,0\n";
    out << "GROUND TEMPERATURES,0\n";
    out << "HOLIDAYS/DAYLIGHT SAVINGS," << (year.isLeapYear() ? "Yes" : "No") << ",0,0,0\n";
    out << "COMMENTS 1," << comment1 << "\n";
    out << "COMMENTS 2," << comment2 << "\n";
    out << "DATA PERIODS,1,1,Data," << kWeekdays[static_cast<std::size_t>(weekdayOfFirstJanuary(calendarYear))]
        << ", 1/ 1,12/31\n";

    static constexpr std::array<int, 12> kDays = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
    std::size_t index = 0;
    for (int month = 1; month <= 12; ++month) {
        const int days = kDays[static_cast<std::size_t>(month - 1)] + (month == 2 && year.isLeapYear() ? 1 : 0);
        for (int day = 1; day <= days; ++day) {
            for (int hour = 1; hour <= 24; ++hour, ++index) {
                const WeatherHour& h = year.hour(index);
                const double rh = std::round(toPercent(h.relativeHumidity()));
                out << calendarYear << ',' << month << ',' << day << ',' << hour << ",0,*,"
                    << formatFixed(toCelsius(h.dryBulb), 1) << ',' << formatFixed(toCelsius(h.dewPoint()), 1) << ','
                    << formatFixed(rh, 0) << ',' << formatFixed(toPascals(h.pressure), 0) << ',' << kUnmodelledFields
                    << "\n";
            }
        }
    }
}

} // namespace Airwright::Core::Annual
