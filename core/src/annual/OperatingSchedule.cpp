#include "airwright/core/annual/OperatingSchedule.h"

#include "airwright/core/InputError.h"

namespace Airwright::Core::Annual {

namespace {
constexpr std::size_t kSummerHolidayFirstDay = 210; // counted from 0: 30 July in a normal year
} // namespace

const char* offHoursModeKey(OffHoursMode mode)
{
    return mode == OffHoursMode::Off ? "off" : "setback";
}

std::optional<OffHoursMode> offHoursModeFromKey(std::string_view key)
{
    if (key == "off")
        return OffHoursMode::Off;
    if (key == "setback")
        return OffHoursMode::Setback;
    return std::nullopt;
}

void OperatingSchedule::validate() const
{
    if (hoursPerDay < 1 || hoursPerDay > 24)
        throw InputError("operating hours per day", hoursPerDay, "h", "1 .. 24 h");
    if (firstHour < 0 || firstHour > 23)
        throw InputError("first operating hour of the day", firstHour, "", "0 .. 23");
    if (daysPerWeek < 1 || daysPerWeek > 7)
        throw InputError("operating days per week", daysPerWeek, "", "1 .. 7");
    if (holidayWeeks < 0 || holidayWeeks > 52)
        throw InputError("holiday weeks", holidayWeeks, "", "0 .. 52");
    if (firstWeekday < 0 || firstWeekday > 6)
        throw InputError("weekday of 1 January", firstWeekday, "", "0 (Monday) .. 6 (Sunday)");
    if (!(setbackAirflow.value() >= 0.05 && setbackAirflow.value() <= 1.0))
        throw InputError("setback airflow", toPercent(setbackAirflow), "%", "5 .. 100 %");
    if (!(setbackTemperature.value() >= 0.0 && setbackTemperature.value() <= 10.0))
        throw InputError("setback temperature reduction", toKelvinDifference(setbackTemperature), "K", "0 .. 10 K");
}

OperatingMode OperatingSchedule::modeAt(std::size_t hourIndex, std::size_t hoursInYear) const
{
    const OperatingMode idle = offHours == OffHoursMode::Off ? OperatingMode::Off : OperatingMode::Setback;
    const auto hourOfDay = static_cast<int>(hourIndex % 24);
    const int sinceStart = (hourOfDay - firstHour + 24) % 24;
    if (sinceStart >= hoursPerDay)
        return idle;
    // An operating period that wraps past midnight belongs to the day it started.
    std::size_t day = hourIndex / 24;
    if (hourOfDay < firstHour) {
        if (day == 0)
            day = hoursInYear / 24; // the wrap into 1 January belongs to the previous year's last day
        --day;
    }
    const auto weekday = static_cast<int>((static_cast<std::size_t>(firstWeekday) + day) % 7);
    if (weekday >= daysPerWeek)
        return idle;
    const std::size_t days = hoursInYear / 24;
    const auto winterWeeks = static_cast<std::size_t>((holidayWeeks + 1) / 2);
    const auto summerWeeks = static_cast<std::size_t>(holidayWeeks / 2);
    if (day + 7 * winterWeeks >= days)
        return idle;
    if (day >= kSummerHolidayFirstDay && day < kSummerHolidayFirstDay + 7 * summerWeeks)
        return idle;
    return OperatingMode::Normal;
}

double OperatingSchedule::share(OperatingMode mode, std::size_t hoursInYear) const
{
    if (hoursInYear == 0)
        return 0.0;
    std::size_t count = 0;
    for (std::size_t i = 0; i < hoursInYear; ++i)
        if (modeAt(i, hoursInYear) == mode)
            ++count;
    return static_cast<double>(count) / static_cast<double>(hoursInYear);
}

} // namespace Airwright::Core::Annual
