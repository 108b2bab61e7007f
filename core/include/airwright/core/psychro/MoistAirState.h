#pragma once
// A moist-air state: dry bulb, humidity ratio and the total (barometric) pressure
// it exists at. Immutable and always valid: the factories reject any input that
// is not a physical, unsaturated-or-saturated state.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Psychro {

class MoistAirState;

namespace detail {
// fromDryBulbHumidityRatio for a hot loop that has itself just found W <= Ws(t)
// (the exchanger outlets): the range checks, without computing pws(t) again.
// Not for any other use: W above saturation is not caught here.
MoistAirState stateBelowSaturation(AbsoluteTemperature tdb, HumidityRatio w, Pressure p);
// relativeHumidity() of a state without its input checks (a state is valid by
// construction): for hot paths that ask it of every section's air.
Ratio relativeHumidityOf(const MoistAirState& state);
} // namespace detail

class MoistAirState {
public:
    // Dry air at 20 C and 101325 Pa: a valid state for result containers that are
    // filled in later; never a stand-in for an unknown input.
    MoistAirState() : m_tdb(celsius(20.0)), m_w(kilogramsPerKilogram(0.0)), m_p(pascals(101325.0)) {}

    static MoistAirState fromDryBulbRelativeHumidity(AbsoluteTemperature tdb, Ratio rh, Pressure p);
    static MoistAirState fromDryBulbWetBulb(AbsoluteTemperature tdb, AbsoluteTemperature twb, Pressure p);
    static MoistAirState fromDryBulbDewPoint(AbsoluteTemperature tdb, AbsoluteTemperature tdp, Pressure p);
    static MoistAirState fromDryBulbHumidityRatio(AbsoluteTemperature tdb, HumidityRatio w, Pressure p);
    static MoistAirState fromEnthalpyHumidityRatio(SpecificEnthalpy h, HumidityRatio w, Pressure p);
    static MoistAirState fromDryBulbEnthalpy(AbsoluteTemperature tdb, SpecificEnthalpy h, Pressure p);

    AbsoluteTemperature dryBulb() const { return m_tdb; }
    HumidityRatio humidityRatio() const { return m_w; }
    Pressure pressure() const { return m_p; }

    Ratio relativeHumidity() const;
    AbsoluteTemperature dewPoint() const;
    AbsoluteTemperature wetBulb() const;
    SpecificEnthalpy enthalpy() const;
    SpecificVolume specificVolume() const; // per kg dry air
    Density density() const;               // moist air
    Ratio degreeOfSaturation() const;
    Pressure vapourPressure() const;
    Pressure saturationPressure() const;
    HumidityRatio saturationHumidityRatio() const;

    bool operator==(const MoistAirState&) const = default;

private:
    MoistAirState(AbsoluteTemperature tdb, HumidityRatio w, Pressure p) : m_tdb(tdb), m_w(w), m_p(p) {}
    friend MoistAirState detail::stateBelowSaturation(AbsoluteTemperature, HumidityRatio, Pressure);

    AbsoluteTemperature m_tdb;
    HumidityRatio m_w;
    Pressure m_p;
};

} // namespace Airwright::Core::Psychro
