#include "airwright/core/psychro/MoistAirState.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>

namespace Airwright::Core::Psychro {

MoistAirState MoistAirState::fromDryBulbRelativeHumidity(AbsoluteTemperature tdb, Ratio rh, Pressure p)
{
    return MoistAirState(tdb, humidityRatioFromRelativeHumidity(tdb, rh, p), p);
}

MoistAirState MoistAirState::fromDryBulbWetBulb(AbsoluteTemperature tdb, AbsoluteTemperature twb, Pressure p)
{
    return MoistAirState(tdb, humidityRatioFromWetBulb(tdb, twb, p), p);
}

MoistAirState MoistAirState::fromDryBulbDewPoint(AbsoluteTemperature tdb, AbsoluteTemperature tdp, Pressure p)
{
    const double t = toCelsius(tdb);
    const double dp = toCelsius(tdp);
    Psychro::saturationPressure(tdb); // validates the dry bulb's range
    if (!(dp >= kMinTemperatureC))
        throw InputError("dew-point temperature", dp, "°C", "-100 .. " + formatFixed(t, 2) + " °C (the dry bulb)");
    if (dp > t + detail::kTemperatureTolerance)
        throw InputError("dew-point temperature", dp, "°C", "-100 .. " + formatFixed(t, 2) + " °C (the dry bulb)");
    const Pressure pws = Psychro::saturationPressure(celsius(std::min(dp, t)));
    return MoistAirState(tdb, humidityRatioFromVapourPressure(pws, p), p);
}

MoistAirState MoistAirState::fromDryBulbHumidityRatio(AbsoluteTemperature tdb, HumidityRatio w, Pressure p)
{
    // Validates t, W (against saturation) and p; a W within the rounding
    // tolerance above saturation is stored as saturated.
    return MoistAirState(tdb, checkedHumidityRatioAt(tdb, w, p), p);
}

MoistAirState MoistAirState::fromEnthalpyHumidityRatio(SpecificEnthalpy h, HumidityRatio w, Pressure p)
{
    return fromDryBulbHumidityRatio(dryBulbFromEnthalpy(h, w), w, p);
}

MoistAirState MoistAirState::fromDryBulbEnthalpy(AbsoluteTemperature tdb, SpecificEnthalpy h, Pressure p)
{
    return fromDryBulbHumidityRatio(tdb, humidityRatioFromEnthalpy(tdb, h), p);
}

Ratio MoistAirState::relativeHumidity() const { return relativeHumidityFromHumidityRatio(m_tdb, m_w, m_p); }

AbsoluteTemperature MoistAirState::dewPoint() const
{
    // Never above the dry bulb, whatever the last bit of rounding says.
    const AbsoluteTemperature tdp = dewPointFromHumidityRatio(m_w, m_p);
    return tdp.value() > m_tdb.value() ? m_tdb : tdp;
}

AbsoluteTemperature MoistAirState::wetBulb() const { return wetBulbFromHumidityRatio(m_tdb, m_w, m_p); }

SpecificEnthalpy MoistAirState::enthalpy() const { return Psychro::enthalpy(m_tdb, m_w); }

SpecificVolume MoistAirState::specificVolume() const { return Psychro::specificVolume(m_tdb, m_w, m_p); }

Density MoistAirState::density() const { return Psychro::density(m_tdb, m_w, m_p); }

Ratio MoistAirState::degreeOfSaturation() const { return Psychro::degreeOfSaturation(m_tdb, m_w, m_p); }

Pressure MoistAirState::vapourPressure() const { return vapourPressureFromHumidityRatio(m_w, m_p); }

Pressure MoistAirState::saturationPressure() const { return Psychro::saturationPressure(m_tdb); }

HumidityRatio MoistAirState::saturationHumidityRatio() const { return Psychro::saturationHumidityRatio(m_tdb, m_p); }

} // namespace Airwright::Core::Psychro
