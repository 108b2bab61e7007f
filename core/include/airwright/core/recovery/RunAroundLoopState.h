#pragma once
// The intermediate-fluid loop of a run-around coil system at one operating case.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Recovery {

struct RunAroundLoopState {
    MassFlow fluidFlow;
    AbsoluteTemperature fluidLeavingExtractCoil;  // = entering the supply coil
    AbsoluteTemperature fluidLeavingSupplyCoil;   // = returning to the extract coil
    Power heatCarried;                            // from the extract to the supply coil (negative in summer)
    Power pumpPower;
};

} // namespace Airwright::Core::Recovery
