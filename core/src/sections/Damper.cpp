#include "airwright/core/sections/Damper.h"

#include "airwright/core/InputError.h"

#include <cmath>

namespace Airwright::Core::Sections {

const char* damperRoleKey(DamperRole role)
{
    switch (role) {
    case DamperRole::OutdoorAir:
        return "outdoor_air";
    case DamperRole::Exhaust:
        return "exhaust";
    case DamperRole::Recirculation:
        return "recirculation";
    case DamperRole::ShutOff:
        return "shut_off";
    }
    return "outdoor_air";
}

std::optional<DamperRole> damperRoleFromKey(std::string_view key)
{
    for (auto role : {DamperRole::OutdoorAir, DamperRole::Exhaust, DamperRole::Recirculation, DamperRole::ShutOff})
        if (key == damperRoleKey(role))
            return role;
    return std::nullopt;
}

void Damper::validate() const
{
    if (!(lossCoefficient >= 0.0 && lossCoefficient <= 50.0))
        throw InputError("damper loss coefficient", lossCoefficient, "", "0 .. 50");
    if (leakageClass < 0 || leakageClass > 4)
        throw InputError("damper leakage class (EN 1751)", leakageClass, "", "0 .. 4");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("damper length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome Damper::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    detail = Detail{lossCoefficient, leakageClass};
    const Pressure dp = dynamicPressureDrop(lossCoefficient, inlet.density(), context.faceVelocity);
    return SectionOutcome{inlet, dp, MassFlow{}, MassFlow{}, {}};
}

} // namespace Airwright::Core::Sections
