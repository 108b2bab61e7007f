#pragma once
// The design of one air handling unit: site, airflows, casing, both paths and the
// design cases. A value type; the chain solver computes it case by case.

#include "airwright/core/Quantities.h"
#include "airwright/core/chain/DesignCase.h"
#include "airwright/core/chain/Section.h"

#include <optional>
#include <vector>

namespace Airwright::Core::Chain {

enum class FlowBasis {
    StandardAir, // volume flows at 1.2 kg/m3 moist air
    Actual,      // at the path's inlet state (outdoor air for supply, extract air for extract)
};

struct Site {
    std::optional<Length> altitude = metres(0.0);    // standard atmosphere, unless
    std::optional<Pressure> barometricPressure;      // a measured pressure is given
    Pressure pressure() const;                        // barometric if given, else from altitude
    bool operator==(const Site&) const = default;
};

struct Airflows {
    VolumeFlow supply = cubicMetresPerHour(10000.0);
    VolumeFlow extract = cubicMetresPerHour(10000.0);
    FlowBasis basis = FlowBasis::StandardAir;
    // External (duct) pressure per path, split before and after the unit.
    Pressure supplyExternalBefore = pascals(50.0);
    Pressure supplyExternalAfter = pascals(250.0);
    Pressure extractExternalBefore = pascals(200.0);
    Pressure extractExternalAfter = pascals(50.0);
    bool operator==(const Airflows&) const = default;
};

struct Casing {
    Velocity targetFaceVelocity = metresPerSecond(2.0); // sizing: largest allowed
    std::optional<Length> width;                          // fixed by the user, or sized
    std::optional<Length> height;                         // of one deck
    Length sizingGrid = millimetres(100.0);
    bool operator==(const Casing&) const = default;
};

struct AirHandlingUnit {
    Site site;
    Airflows airflows;
    Casing casing;
    std::vector<Section> supply;
    std::vector<Section> extract;
    std::vector<DesignCase> cases;

    bool operator==(const AirHandlingUnit&) const = default;
};

} // namespace Airwright::Core::Chain
