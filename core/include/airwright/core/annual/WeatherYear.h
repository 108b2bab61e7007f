#pragma once
// A full year of hourly outdoor air for one site: 8760 hours, or 8784 in a leap
// year, starting with the hour ending 01:00 on 1 January. Always valid: the
// constructor checks the hour count and every value (dry bulb -70 .. 70 C,
// pressure 31 .. 120 kPa as in the EPW data dictionary, humidity ratio between 0
// and saturation).

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/BinTable.h"
#include "airwright/core/annual/DegreeHours.h"
#include "airwright/core/annual/SiteInfo.h"
#include "airwright/core/annual/WeatherHour.h"

#include <cstddef>
#include <vector>

namespace Airwright::Core::Annual {

class WeatherYear {
public:
    static constexpr std::size_t kHoursInYear = 8760;
    static constexpr std::size_t kHoursInLeapYear = 8784;

    WeatherYear(SiteInfo site, std::vector<WeatherHour> hours);

    const SiteInfo& site() const { return m_site; }
    const std::vector<WeatherHour>& hours() const { return m_hours; }
    std::size_t size() const { return m_hours.size(); }
    bool isLeapYear() const { return m_hours.size() == kHoursInLeapYear; }

    // Index 0 is the hour ending 01:00 on 1 January; throws InputError past the end.
    const WeatherHour& hour(std::size_t index) const;

    AbsoluteTemperature meanDryBulb() const;
    AbsoluteTemperature minDryBulb() const;
    AbsoluteTemperature maxDryBulb() const;
    Pressure meanPressure() const;

    // Sum over hours of max(0, base - t) x 1 h, and max(0, t - base) x 1 h.
    DegreeHours heatingDegreeHours(AbsoluteTemperature base) const;
    DegreeHours coolingDegreeHours(AbsoluteTemperature base) const;

    // Bins [k w, (k+1) w) in Celsius for bin width w (0.1 .. 10 K). Each bin
    // carries the mean dry bulb and mean humidity ratio of its hours, so hours and
    // temperature-hours are conserved; the table pressure is the mean pressure.
    // Empty bins are left out.
    BinTable toBins(TemperatureDifference binWidth) const;

private:
    SiteInfo m_site;
    std::vector<WeatherHour> m_hours;
};

} // namespace Airwright::Core::Annual
