#pragma once
// When the unit runs over the year: a daily period, a number of working days per
// week, holiday weeks, and what happens outside those hours (off, or a setback at
// reduced airflow with lowered room and supply temperatures).
//
// Hour i of the year (0-based, hour ending i + 1 as in EPW files) falls on day
// i / 24 at hour of day i % 24. It is an operating hour when
//  - its hour of day lies in [firstHour, firstHour + hoursPerDay) (wrapping past
//    midnight; the day it wraps into keeps the weekday of the day it started),
//  - its weekday is one of the first daysPerWeek days counted from Monday, the
//    weekday of 1 January being firstWeekday (0 Monday .. 6 Sunday), and
//  - it is not in a holiday week. Holiday weeks are whole 7-day blocks: the last
//    ceil(n / 2) weeks of the year (around the turn of the year) and floor(n / 2)
//    weeks from day 210 counted from 0 (30 July in a normal year, midsummer). Our own rule.

#include "airwright/core/Quantities.h"

#include <cstddef>
#include <optional>
#include <string_view>

namespace Airwright::Core::Annual {

enum class OffHoursMode {
    Off,     // fans stopped, no energy use at all
    Setback, // running at setbackAirflow with room and supply setpoint lowered by setbackTemperature
};
const char* offHoursModeKey(OffHoursMode mode); // "off", "setback"
std::optional<OffHoursMode> offHoursModeFromKey(std::string_view key);

enum class OperatingMode { Normal, Setback, Off };

struct OperatingSchedule {
    int hoursPerDay = 24;  // 1 .. 24
    int firstHour = 0;     // 0 .. 23, first operating hour of the day
    int daysPerWeek = 7;   // 1 .. 7, counted from Monday
    int holidayWeeks = 0;  // 0 .. 52
    int firstWeekday = 0;  // weekday of 1 January, 0 Monday .. 6 Sunday
    OffHoursMode offHours = OffHoursMode::Off;
    Ratio setbackAirflow = percent(50.0);                             // 5 .. 100 % of the design flows
    TemperatureDifference setbackTemperature = kelvinDifference(3.0); // 0 .. 10 K

    void validate() const; // throws InputError naming the field and its range

    // hoursInYear: 8760 or 8784.
    OperatingMode modeAt(std::size_t hourIndex, std::size_t hoursInYear) const;
    // Share of the year's hours in a mode (what the bin method weights bins by).
    double share(OperatingMode mode, std::size_t hoursInYear) const;

    bool operator==(const OperatingSchedule&) const = default;
};

} // namespace Airwright::Core::Annual
