#pragma once
// What EpwReader returns: the weather year and a record of every gap it filled,
// so a caller can tell the user which values were interpolated.

#include "airwright/core/annual/WeatherYear.h"

#include <cstddef>
#include <string>
#include <vector>

namespace Airwright::Core::Annual {

struct EpwReadResult {
    struct FilledGap {
        std::string quantity;  // "dry bulb temperature", "humidity", "station pressure"
        std::size_t firstLine; // line of the first missing value
        std::size_t column;    // EPW field number (7 dry bulb, 8 dew point, 10 pressure)
        std::size_t hours;     // length of the run
    };

    WeatherYear weather;
    std::vector<FilledGap> filledGaps;
};

} // namespace Airwright::Core::Annual
