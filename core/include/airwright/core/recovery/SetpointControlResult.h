#pragma once
// Outcome of capacity control to a supply-air temperature setpoint.

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/ExchangerPerformance.h"

#include <optional>

namespace Airwright::Core::Recovery {

struct SetpointControlResult {
    // The control value found: bypass fraction (plates, loops) or rotor speed
    // ratio (rotors).
    Ratio control;
    // False when full recovery falls short of the setpoint, or when any recovery
    // moves away from it (then the device is at zero recovery).
    bool setpointReached = false;
    ExchangerPerformance performance;
    // Supply outlet at full recovery for this point, which the solve needed anyway.
    std::optional<AbsoluteTemperature> fullRecoveryOutlet;
    // Change of the supply outlet per unit of control near the solution (from the
    // solve's last two evaluations), for a warm start of the next solve.
    std::optional<TemperatureDifference> outletChangePerControl;
};

} // namespace Airwright::Core::Recovery
