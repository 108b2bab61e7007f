#pragma once
// One row of a bin table: the hours the outdoor dry bulb spends in a temperature
// band and the coincident mean humidity ratio of those hours. dryBulb is the
// representative (mean) temperature of the bin, not its band edge, so that the
// temperature-hours of the year are kept when hours are binned.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Annual {

struct TemperatureBin {
    AbsoluteTemperature dryBulb;
    Duration duration;
    HumidityRatio humidityRatio;

    bool operator==(const TemperatureBin&) const = default;
};

} // namespace Airwright::Core::Annual
