#pragma once
// What the cold-corner surface temperature of a recuperator depends on: where
// the cold inlet stream meets the warm stream on its way out (see docs/frost.md).

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/FlowArrangement.h"

namespace Airwright::Core::Recovery {

struct ColdCorner {
    FlowArrangement arrangement = FlowArrangement::CounterFlow;
    AbsoluteTemperature coldInlet;
    AbsoluteTemperature warmInlet;
    AbsoluteTemperature warmOutlet;  // mixed mean
    Ratio ntu;                       // UA / Cmin
    Ratio capacityRatio;             // Cmin / Cmax
    bool warmStreamIsCmin = true;
    // hA_cold / (hA_cold + hA_warm): the weight of the cold air temperature in
    // the wall temperature (0.5 for a symmetric plate at balanced flow).
    Ratio coldSideWeight = fraction(0.5);
};

} // namespace Airwright::Core::Recovery
