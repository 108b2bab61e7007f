#pragma once
// What the chain tells a section when it computes it: geometry, the case's filter
// condition, and what the controls ask of it in this pass.

#include "airwright/core/Quantities.h"

#include <optional>

namespace Airwright::Core::Sections {

// Which filter pressure drop a case uses: clean (initial), the EN 13053 design
// value (mean of initial and final), or dirty (final).
enum class FilterCondition { Initial, Design, Final };

// The control request for one section in one pass. The chain sets the outlet
// temperature a coil or recovery should reach (already corrected for what later
// sections add, such as fan heat), and the humidity band of the supply.
struct ControlTarget {
    std::optional<AbsoluteTemperature> outletTemperature;
    std::optional<HumidityRatio> minHumidity;
    std::optional<HumidityRatio> maxHumidity;
    bool dehumidify = false; // cool below the temperature target to reach maxHumidity
};

struct SectionContext {
    Area crossSection;              // inner cross-section of the deck
    Velocity faceVelocity;          // inlet volume flow over the section's free area
    FilterCondition filterCondition = FilterCondition::Design;
    VolumeFlow pathDesignFlow;      // the path's design flow: nominal for defaults
    Pressure fanTotalPressure;      // for fans: pressure the fan must deliver
    ControlTarget target;
};

} // namespace Airwright::Core::Sections
