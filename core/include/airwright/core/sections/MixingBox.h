#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>

namespace Airwright::Core::Sections {

// A mixing (recirculation) section. It sits in both paths: in the extract path it
// takes the recirculated air out, in the supply path it mixes it with the outdoor
// air by dry-air mass. The outdoor-air share is a fixed fraction of the supply, or
// the fraction giving at least a minimum outdoor-air flow.
class MixingBox {
public:
    Ratio outdoorAirFraction = percent(100.0);
    std::optional<VolumeFlow> minimumOutdoorFlow; // overrides the fraction when larger
    double lossCoefficient = 1.0;                 // both dampers, at face velocity
    Length length = metres(0.8);

    // Outdoor share of the supply's dry-air flow for a supply volume flow.
    Ratio outdoorShare(VolumeFlow supplyFlow) const;

    struct Detail {
        Ratio outdoorShare;
        MassFlow recirculated;   // dry air
    };

    // The supply side: mixes outdoor air (inlet) with recirculated air.
    SectionOutcome mix(const AirStream& outdoor, const AirStream& recirculated, const SectionContext& context,
                       Detail& detail) const;
    void validate() const;

    bool operator==(const MixingBox&) const = default;
};

} // namespace Airwright::Core::Sections
