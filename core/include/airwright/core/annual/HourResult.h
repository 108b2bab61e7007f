#pragma once
// What the unit does in one hour (or per hour of a bin): powers, which times the
// hour's duration give energies.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/OperatingSchedule.h"

namespace Airwright::Core::Annual {

struct HourResult {
    OperatingMode mode = OperatingMode::Off;
    Power heating;          // heating coils and heaters, plus frost preheat of the exchanger
    Power cooling;          // cooling coil loads, condensate term included
    MassFlow humidification; // water into the supply air
    Power humidifierPower;  // steam generation (electric)
    Power fanPower;         // both paths, electric
    Power pumpPower;        // run-around loop pump
    Power recovered;        // by the exchanger to the supply air (+ heats it, - cools it)
    Power frostProtection;  // recovery given up, or preheat, to keep the exchanger free of ice
    bool frost = false;     // the exchanger would frost at this hour without protection
    AbsoluteTemperature supplyAfterRecovery = celsius(0.0); // informative
    AbsoluteTemperature supplyTemperature = celsius(0.0);   // leaving the unit
};

} // namespace Airwright::Core::Annual
