#include "airwright/core/annual/SeasonalConditions.h"

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Annual {

namespace {
constexpr double kLeastRoomRh = 0.05;
constexpr double kMostRoomRh = 0.95;
} // namespace

SeasonalConditions::SeasonalConditions(const std::vector<Chain::DesignCase>& cases, Pressure pressure)
    : m_pressure(pressure)
{
    if (cases.empty())
        throw InputError("the annual simulation needs at least one design case for the room state and setpoints");
    for (const auto& c : cases) {
        c.validate();
        const double t = toCelsius(c.outdoorTemperature);
        const bool taken = std::any_of(m_anchors.begin(), m_anchors.end(),
                                       [&](const Anchor& a) { return std::abs(a.outdoorC - t) < 1e-9; });
        if (!taken)
            m_anchors.push_back(Anchor{c, t, 0.0, 0.0, 0.0});
    }
    std::stable_sort(m_anchors.begin(), m_anchors.end(),
                     [](const Anchor& a, const Anchor& b) { return a.outdoorC < b.outdoorC; });
    for (auto& a : m_anchors) {
        a.roomC = toCelsius(a.designCase.roomTemperature);
        a.roomW = toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(
            a.designCase.roomTemperature, a.designCase.roomHumidity, m_pressure));
        a.setpointC = toCelsius(a.designCase.supplySetpoint);
    }
    derive();
}

void SeasonalConditions::derive()
{
    m_minimum.clear();
    m_maximum.clear();
    m_reheat = false;
    for (const auto& a : m_anchors) {
        const auto& c = a.designCase;
        const auto setpoint = celsius(a.setpointC);
        if (c.minimumSupplyHumidity)
            m_minimum.push_back({a.outdoorC, toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(
                                                 setpoint, *c.minimumSupplyHumidity, m_pressure))});
        if (c.maximumSupplyHumidity)
            m_maximum.push_back({a.outdoorC, toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(
                                                 setpoint, *c.maximumSupplyHumidity, m_pressure))});
        m_reheat = m_reheat || c.dehumidifyWithReheat;
    }
}

double SeasonalConditions::interpolate(const std::vector<Limit>& limits, double outdoorC)
{
    if (outdoorC <= limits.front().outdoorC)
        return limits.front().w;
    if (outdoorC >= limits.back().outdoorC)
        return limits.back().w;
    std::size_t i = 0;
    while (i + 2 < limits.size() && outdoorC > limits[i + 1].outdoorC)
        ++i;
    const double u = (outdoorC - limits[i].outdoorC) / (limits[i + 1].outdoorC - limits[i].outdoorC);
    return limits[i].w + u * (limits[i + 1].w - limits[i].w);
}

SeasonalConditions::Weights SeasonalConditions::weightsAt(double outdoorC) const
{
    const std::size_t n = m_anchors.size();
    if (n == 1 || outdoorC <= m_anchors.front().outdoorC)
        return {0, 0.0};
    if (outdoorC >= m_anchors.back().outdoorC)
        return {n - 2, 1.0};
    std::size_t i = 0;
    while (i + 2 < n && outdoorC > m_anchors[i + 1].outdoorC)
        ++i;
    return {i, (outdoorC - m_anchors[i].outdoorC) / (m_anchors[i + 1].outdoorC - m_anchors[i].outdoorC)};
}

IndoorTargets SeasonalConditions::at(AbsoluteTemperature outdoor) const
{
    const Weights w = weightsAt(toCelsius(outdoor));
    const Anchor& a = m_anchors[w.lower];
    const Anchor& b = m_anchors[std::min(w.lower + 1, m_anchors.size() - 1)];
    const auto blend = [&](double x, double y) { return x + w.upperWeight * (y - x); };
    IndoorTargets t;
    t.roomTemperature = celsius(blend(a.roomC, b.roomC));
    t.roomHumidity = kilogramsPerKilogram(blend(a.roomW, b.roomW));
    t.supplySetpoint = celsius(blend(a.setpointC, b.setpointC));
    const double o = toCelsius(outdoor);
    if (!m_minimum.empty())
        t.minimumSupplyHumidity = kilogramsPerKilogram(interpolate(m_minimum, o));
    if (!m_maximum.empty())
        t.maximumSupplyHumidity = kilogramsPerKilogram(interpolate(m_maximum, o));
    t.dehumidifyWithReheat = m_reheat;
    return t;
}

AbsoluteTemperature SeasonalConditions::anchorOutdoorTemperature(std::size_t i) const
{
    return celsius(m_anchors.at(i).outdoorC);
}

Chain::DesignCase SeasonalConditions::anchorCase(std::size_t i, Ratio airflowFraction) const
{
    const Anchor& a = m_anchors.at(i);
    Chain::DesignCase c = a.designCase;
    c.roomTemperature = celsius(a.roomC);
    c.roomHumidity = Psychro::relativeHumidityFromHumidityRatio(c.roomTemperature, kilogramsPerKilogram(a.roomW),
                                                                m_pressure);
    c.supplySetpoint = celsius(a.setpointC);
    c.airflowFraction = airflowFraction;
    c.validate();
    return c;
}

Chain::DesignCase SeasonalConditions::caseAt(AbsoluteTemperature outdoor, Ratio outdoorHumidity,
                                             Ratio airflowFraction, std::string name) const
{
    const Weights w = weightsAt(toCelsius(outdoor));
    const std::size_t nearer = w.upperWeight > 0.5 ? std::min(w.lower + 1, m_anchors.size() - 1) : w.lower;
    Chain::DesignCase c = m_anchors[nearer].designCase;
    const IndoorTargets t = at(outdoor);
    c.name = std::move(name);
    c.outdoorTemperature = outdoor;
    c.outdoorHumidity = outdoorHumidity;
    c.roomTemperature = t.roomTemperature;
    c.roomHumidity = Psychro::relativeHumidityFromHumidityRatio(t.roomTemperature, t.roomHumidity, m_pressure);
    c.supplySetpoint = t.supplySetpoint;
    c.minimumSupplyHumidity.reset();
    c.maximumSupplyHumidity.reset();
    if (t.minimumSupplyHumidity)
        c.minimumSupplyHumidity = Psychro::relativeHumidityFromHumidityRatio(
            t.supplySetpoint,
            std::min(*t.minimumSupplyHumidity, Psychro::saturationHumidityRatio(t.supplySetpoint, m_pressure)),
            m_pressure);
    if (t.maximumSupplyHumidity)
        c.maximumSupplyHumidity = Psychro::relativeHumidityFromHumidityRatio(
            t.supplySetpoint,
            std::min(*t.maximumSupplyHumidity, Psychro::saturationHumidityRatio(t.supplySetpoint, m_pressure)),
            m_pressure);
    c.dehumidifyWithReheat = t.dehumidifyWithReheat;
    c.airflowFraction = airflowFraction;
    c.validate();
    return c;
}

SeasonalConditions SeasonalConditions::lowered(TemperatureDifference delta) const
{
    const double d = toKelvinDifference(delta);
    if (!(d >= 0.0 && d <= 10.0))
        throw InputError("setback temperature reduction", d, "K", "0 .. 10 K");
    SeasonalConditions s = *this;
    for (auto& a : s.m_anchors) {
        a.roomC -= d;
        a.setpointC -= d;
        a.roomW = std::min(a.roomW, toKilogramsPerKilogram(Psychro::saturationHumidityRatio(celsius(a.roomC), m_pressure)));
        a.designCase.roomTemperature = celsius(a.roomC);
        a.designCase.supplySetpoint = celsius(a.setpointC);
        a.designCase.roomHumidity =
            Psychro::relativeHumidityFromHumidityRatio(celsius(a.roomC), kilogramsPerKilogram(a.roomW), m_pressure);
    }
    s.derive();
    return s;
}

SeasonalConditions SeasonalConditions::withRoomHumidityOffset(Ratio offset) const
{
    const double d = offset.value();
    if (!(d >= -0.9 && d <= 0.9))
        throw InputError("room humidity offset", d * 100.0, "percentage points", "-90 .. 90");
    SeasonalConditions s = *this;
    for (auto& a : s.m_anchors) {
        const auto t = celsius(a.roomC);
        const double rh = Psychro::relativeHumidityFromHumidityRatio(t, kilogramsPerKilogram(a.roomW), m_pressure).value();
        const double moved = std::clamp(rh + d, kLeastRoomRh, kMostRoomRh);
        a.designCase.roomHumidity = fraction(moved);
        a.roomW = toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(t, fraction(moved), m_pressure));
    }
    s.derive();
    return s;
}

} // namespace Airwright::Core::Annual
