#pragma once
// How forgiving EpwReader is. The defaults are the documented rule of the reader:
//  - a value equal to or above the data dictionary's missing code (dry bulb and
//    dew point 99.9 C, relative humidity 999 %, pressure 999999 Pa) is missing;
//  - runs of up to maxGapHours missing hours of one quantity are filled by linear
//    interpolation in time between the valid neighbours (a run touching the start
//    or end of the year takes the single neighbour's value);
//  - a longer run, or more than maxMissingHours missing hours of one quantity in
//    the year, rejects the file.

#include "airwright/core/Quantities.h"

#include <cstddef>

namespace Airwright::Core::Annual {

struct EpwReadOptions {
    std::size_t maxGapHours = 6;
    std::size_t maxMissingHours = 168; // one week
    // A dew point above the dry bulb by more than this is an error; within it the
    // humidity is taken as saturated (files carry 0.1 K rounding).
    TemperatureDifference dewPointTolerance = kelvinDifference(0.5);
    // Files above this size are refused before reading (a year is about 1.5 MB).
    std::size_t maxBytes = 50u * 1024u * 1024u;
};

} // namespace Airwright::Core::Annual
