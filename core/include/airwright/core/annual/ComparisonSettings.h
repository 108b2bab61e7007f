#pragma once

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/AnnualSettings.h"
#include "airwright/core/annual/EnergyPrices.h"

#include <vector>

namespace Airwright::Core::Annual {

struct ComparisonSettings {
    AnnualSettings annual;
    EnergyPrices prices;
    // The ranking weighs annual savings against the extra cost over this many
    // years (undiscounted). 15 years is common practice for the service life of
    // air-to-air heat recovery.
    double evaluationYears = 15.0;
    // Sensitivity table: the ranking again with the room relative humidity of
    // every design case moved by each offset (percentage points as a fraction),
    // and with the heat price times each factor.
    bool sensitivity = true;
    std::vector<Ratio> roomHumidityOffsets{percent(-15.0), percent(0.0), percent(15.0)};
    std::vector<double> heatPriceFactors{0.5, 1.0, 2.0};

    void validate() const; // throws InputError
    bool operator==(const ComparisonSettings&) const = default;
};

} // namespace Airwright::Core::Annual
