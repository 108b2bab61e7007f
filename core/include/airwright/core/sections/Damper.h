#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>
#include <string_view>

namespace Airwright::Core::Sections {

enum class DamperRole { OutdoorAir, Exhaust, Recirculation, ShutOff };
const char* damperRoleKey(DamperRole role);
std::optional<DamperRole> damperRoleFromKey(std::string_view key);

// A damper, fully open in design operation. Pressure drop from a loss coefficient
// referred to the face velocity; the EN 1751 leakage class (casing and closed-blade
// tightness, classes 0..4 where 4 is tightest) is recorded for the schedule.
class Damper {
public:
    DamperRole role = DamperRole::OutdoorAir;
    double lossCoefficient = 0.4; // zeta of the open damper at face velocity
    int leakageClass = 2;         // EN 1751 closed-blade class 0..4
    Length length = metres(0.2);

    struct Detail {
        double lossCoefficient = 0.0;
        int leakageClass = 0;
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const; // throws InputError

    bool operator==(const Damper&) const = default;
};

} // namespace Airwright::Core::Sections
