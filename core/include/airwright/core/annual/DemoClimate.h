#pragma once
// The invented demo climate shipped as resources/demo/demo-climate.epw: one fixed
// set of SyntheticClimate parameters for a fictional mid-European inland town
// ("Airwright Demo Town (invented)", 250 m). It is generated, not measured; the
// generator tool and the test that checks the shipped file both use these values,
// and resources/demo/demo-climate.md documents them.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/SyntheticClimateParameters.h"

namespace Airwright::Core::Annual {

class DemoClimate {
public:
    static SyntheticClimateParameters parameters();
    // Width of the bins in resources/demo/demo-bins.csv.
    static TemperatureDifference binWidth() { return kelvinDifference(2.0); }
};

} // namespace Airwright::Core::Annual
