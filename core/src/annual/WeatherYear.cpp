#include "airwright/core/annual/WeatherYear.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>
#include <map>
#include <string>

namespace Airwright::Core::Annual {

namespace {

constexpr double kMinDryBulbC = -70.0; // EPW data dictionary range for dry bulb
constexpr double kMaxDryBulbC = 70.0;
constexpr double kMinPressurePa = 31000.0; // EPW data dictionary range for station pressure
constexpr double kMaxPressurePa = 120000.0;

void checkHour(const WeatherHour& h, std::size_t index)
{
    const std::string at = " at hour " + std::to_string(index + 1);
    const double t = toCelsius(h.dryBulb);
    if (!(t >= kMinDryBulbC && t <= kMaxDryBulbC))
        throw InputError("dry bulb temperature" + at, t, "C", "-70 .. 70 C");
    const double p = toPascals(h.pressure);
    if (!(p >= kMinPressurePa && p <= kMaxPressurePa))
        throw InputError("station pressure" + at, p, "Pa", "31000 .. 120000 Pa");
    const double w = toKilogramsPerKilogram(h.humidityRatio);
    const double ws = toKilogramsPerKilogram(Psychro::saturationHumidityRatio(h.dryBulb, h.pressure));
    if (!(w >= 0.0 && w <= ws * (1.0 + 1e-9)))
        throw InputError("humidity ratio" + at, w * 1000.0, "g/kg",
                         "0 .. " + formatNumber(ws * 1000.0) + " g/kg (saturation)");
}

} // namespace

WeatherYear::WeatherYear(SiteInfo site, std::vector<WeatherHour> hours)
    : m_site(std::move(site)), m_hours(std::move(hours))
{
    if (m_hours.size() != kHoursInYear && m_hours.size() != kHoursInLeapYear)
        throw InputError("number of hours in a weather year", static_cast<double>(m_hours.size()), "",
                         "8760 or 8784 (leap year)");
    for (std::size_t i = 0; i < m_hours.size(); ++i)
        checkHour(m_hours[i], i);
}

const WeatherHour& WeatherYear::hour(std::size_t index) const
{
    if (index >= m_hours.size())
        throw InputError("hour index", static_cast<double>(index), "", "0 .. " + std::to_string(m_hours.size() - 1));
    return m_hours[index];
}

AbsoluteTemperature WeatherYear::meanDryBulb() const
{
    double sum = 0.0;
    for (const auto& h : m_hours)
        sum += toKelvin(h.dryBulb);
    return kelvin(sum / static_cast<double>(m_hours.size()));
}

AbsoluteTemperature WeatherYear::minDryBulb() const
{
    const auto it = std::min_element(m_hours.begin(), m_hours.end(), [](const WeatherHour& a, const WeatherHour& b) {
        return toKelvin(a.dryBulb) < toKelvin(b.dryBulb);
    });
    return it->dryBulb;
}

AbsoluteTemperature WeatherYear::maxDryBulb() const
{
    const auto it = std::max_element(m_hours.begin(), m_hours.end(), [](const WeatherHour& a, const WeatherHour& b) {
        return toKelvin(a.dryBulb) < toKelvin(b.dryBulb);
    });
    return it->dryBulb;
}

Pressure WeatherYear::meanPressure() const
{
    double sum = 0.0;
    for (const auto& h : m_hours)
        sum += toPascals(h.pressure);
    return pascals(sum / static_cast<double>(m_hours.size()));
}

DegreeHours WeatherYear::heatingDegreeHours(AbsoluteTemperature base) const
{
    const double b = toKelvin(base);
    double sum = 0.0;
    for (const auto& h : m_hours)
        sum += std::max(0.0, b - toKelvin(h.dryBulb));
    return kelvinHours(sum);
}

DegreeHours WeatherYear::coolingDegreeHours(AbsoluteTemperature base) const
{
    const double b = toKelvin(base);
    double sum = 0.0;
    for (const auto& h : m_hours)
        sum += std::max(0.0, toKelvin(h.dryBulb) - b);
    return kelvinHours(sum);
}

BinTable WeatherYear::toBins(TemperatureDifference binWidth) const
{
    const double width = toKelvinDifference(binWidth);
    if (!(width >= 0.1 && width <= 10.0))
        throw InputError("bin width", width, "K", "0.1 .. 10 K");

    struct Sums {
        double kelvinSum = 0.0;
        double humiditySum = 0.0;
        std::size_t count = 0;
    };
    std::map<long long, Sums> byBin;
    for (const auto& h : m_hours) {
        const auto key = static_cast<long long>(std::floor(toCelsius(h.dryBulb) / width));
        Sums& s = byBin[key];
        s.kelvinSum += toKelvin(h.dryBulb);
        s.humiditySum += toKilogramsPerKilogram(h.humidityRatio);
        ++s.count;
    }

    const Pressure p = meanPressure();
    std::vector<TemperatureBin> bins;
    bins.reserve(byBin.size());
    for (const auto& [key, s] : byBin) {
        const double n = static_cast<double>(s.count);
        const AbsoluteTemperature t = kelvin(s.kelvinSum / n);
        // Saturation humidity is convex in temperature, so the mean of saturated
        // hours can lie a hair above saturation at their mean temperature.
        const double ws = toKilogramsPerKilogram(Psychro::saturationHumidityRatio(t, p));
        const double w = std::min(s.humiditySum / n, ws);
        bins.push_back({t, Core::hours(n), kilogramsPerKilogram(w)});
    }
    return BinTable(std::move(bins), p);
}

} // namespace Airwright::Core::Annual
