#pragma once

#include "airwright/core/annual/AnnualEnergy.h"
#include "airwright/core/annual/HourResult.h"

#include <cstddef>
#include <vector>

namespace Airwright::Core::Annual {

struct AnnualResult {
    AnnualEnergy total;
    AnnualEnergy normal;  // operating hours
    AnnualEnergy setback; // setback hours (empty when the unit is off outside operating hours)
    // Hourly method with AnnualSettings::keepHours: one entry per hour of the
    // year, Off hours included (all zero); total is the sum of these times 1 h.
    std::vector<HourResult> hours;
    std::size_t tableNodes = 0; // exchanger evaluations spent on tables
};

} // namespace Airwright::Core::Annual
