#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>
#include <string_view>

namespace Airwright::Core::Sections {

enum class PassiveKind { Silencer, Access, Empty, Plenum };
const char* passiveKindKey(PassiveKind kind);
std::optional<PassiveKind> passiveKindFromKey(std::string_view key);

// A section that only costs pressure and length: silencer, access door, empty or
// plenum section. Pressure drop given at a rated face velocity, scaling with v^2.
class PassiveSection {
public:
    PassiveKind kind = PassiveKind::Silencer;
    Pressure ratedPressureDrop = pascals(40.0);
    Velocity ratedVelocity = metresPerSecond(2.0);
    Length length = metres(1.0);

    struct Detail {
        PassiveKind kind = PassiveKind::Silencer;
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const PassiveSection&) const = default;
};

} // namespace Airwright::Core::Sections
