#pragma once
// Where a weather year belongs: the fields of the EPW LOCATION record.
// Angles stay plain degrees because Quantities.h has no angle type; the names say so.

#include "airwright/core/Quantities.h"

#include <string>

namespace Airwright::Core::Annual {

struct SiteInfo {
    std::string name;   // city or site name
    std::string region; // state, province or region; may be empty
    std::string country;
    std::string source;             // where the data came from, e.g. "generated"
    std::string stationId;          // WMO number or any identifier; text
    double latitudeDegrees = 0.0;   // + north, -90 .. 90
    double longitudeDegrees = 0.0;  // + east, -180 .. 180
    Duration timeZone = hours(0.0); // offset from UTC, -12 .. +12 h
    Length elevation = metres(0.0);

    bool operator==(const SiteInfo&) const = default;
};

} // namespace Airwright::Core::Annual
