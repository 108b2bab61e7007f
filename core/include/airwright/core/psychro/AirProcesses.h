#pragma once
// Air-handling processes on a dry-air mass basis (ASHRAE Fundamentals 2017, ch. 1).
// Every process returns the outlet state and the liquid water it leaves behind per
// kg of dry air: a state that would be supersaturated is clamped to saturation at
// the same enthalpy balance, and the excess water is reported as condensate.

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"

namespace Airwright::Core::Psychro {

struct ProcessOutcome {
    MoistAirState outlet;
    HumidityRatio condensate;   // kg liquid water per kg dry air left behind (>= 0)
    bool clamped = false;       // true when the state was brought back to saturation
};

// Clamp a (tdb, W) pair that may be supersaturated: returns the saturated state
// with the same dry-air enthalpy balance (fog settles as liquid at the new t)
// and the excess water. A state that is not supersaturated comes back unchanged.
ProcessOutcome clampToSaturation(AbsoluteTemperature tdb, HumidityRatio w, Pressure p);

// Sensible heating or cooling at constant humidity ratio to a temperature. Cooling
// below the dew point is clamped (condensate reported).
ProcessOutcome heatToTemperature(const MoistAirState& inlet, AbsoluteTemperature outletTdb);

// Sensible heat added (positive) or removed (negative) to dryAirFlow.
ProcessOutcome heatByDuty(const MoistAirState& inlet, Power duty, MassFlow dryAirFlow);

// Adiabatic mixing of two streams by dry-air mass; both at the pressure of a.
ProcessOutcome mix(const MoistAirState& a, MassFlow dryAirA, const MoistAirState& b, MassFlow dryAirB);

// Steam humidification to a target humidity ratio with steam at steamTemperature
// (enthalpy of vapour at that temperature added with the water).
ProcessOutcome steamHumidify(const MoistAirState& inlet, HumidityRatio targetW, AbsoluteTemperature steamTemperature);

// Adiabatic (evaporative) humidification along the wet-bulb line; saturation
// efficiency 0..1 is the fraction of the dry bulb - wet bulb depression removed.
ProcessOutcome adiabaticHumidify(const MoistAirState& inlet, Ratio saturationEfficiency);

// Cooling and dehumidifying by the apparatus dew point / bypass factor method:
// outlet = ADP + BF (inlet - ADP) in t and W (and so in h). When the ADP is above
// the inlet dew point the process is dry (W unchanged, t from the same rule).
ProcessOutcome coolDehumidify(const MoistAirState& inlet, AbsoluteTemperature apparatusDewPoint, Ratio bypassFactor);

} // namespace Airwright::Core::Psychro
