#pragma once
// What the room and the supply air are at one outdoor temperature: the extract
// state the exchanger sees and the targets the unit controls to.

#include "airwright/core/Quantities.h"

#include <optional>

namespace Airwright::Core::Annual {

struct IndoorTargets {
    AbsoluteTemperature roomTemperature;
    HumidityRatio roomHumidity;
    AbsoluteTemperature supplySetpoint;
    std::optional<HumidityRatio> minimumSupplyHumidity;
    std::optional<HumidityRatio> maximumSupplyHumidity;
    bool dehumidifyWithReheat = false;
};

} // namespace Airwright::Core::Annual
