#include "airwright/core/sections/PassiveSection.h"

#include "airwright/core/InputError.h"

namespace Airwright::Core::Sections {

const char* passiveKindKey(PassiveKind kind)
{
    switch (kind) {
    case PassiveKind::Silencer:
        return "silencer";
    case PassiveKind::Access:
        return "access";
    case PassiveKind::Empty:
        return "empty";
    case PassiveKind::Plenum:
        return "plenum";
    }
    return "silencer";
}

std::optional<PassiveKind> passiveKindFromKey(std::string_view key)
{
    for (auto kind : {PassiveKind::Silencer, PassiveKind::Access, PassiveKind::Empty, PassiveKind::Plenum})
        if (key == passiveKindKey(kind))
            return kind;
    return std::nullopt;
}

void PassiveSection::validate() const
{
    if (!(ratedPressureDrop.value() >= 0.0 && ratedPressureDrop.value() <= 2000.0))
        throw InputError("rated pressure drop", ratedPressureDrop.value(), "Pa", "0 .. 2000 Pa");
    if (!(ratedVelocity.value() > 0.0 && ratedVelocity.value() <= 20.0))
        throw InputError("rated face velocity", ratedVelocity.value(), "m/s", "above 0 .. 20 m/s");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("section length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome PassiveSection::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    detail = Detail{kind};
    // Turbulent losses in baffles and openings: dp ~ v^2 (common practice).
    const Pressure dp = scaledPressureDrop(ratedPressureDrop, ratedVelocity, context.faceVelocity, 2.0);
    return SectionOutcome{inlet, dp, MassFlow{}, MassFlow{}, {}};
}

} // namespace Airwright::Core::Sections
