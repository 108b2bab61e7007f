#pragma once
// Outcome of capacity control to a supply-air temperature setpoint.

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/ExchangerPerformance.h"

namespace Airwright::Core::Recovery {

struct SetpointControlResult {
    // The control value found: bypass fraction (plates, loops) or rotor speed
    // ratio (rotors).
    Ratio control;
    // False when full recovery falls short of the setpoint, or when any recovery
    // moves away from it (then the device is at zero recovery).
    bool setpointReached = false;
    ExchangerPerformance performance;
};

} // namespace Airwright::Core::Recovery
