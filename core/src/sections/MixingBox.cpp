#include "airwright/core/sections/MixingBox.h"

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/AirProcesses.h"

#include <algorithm>

namespace Airwright::Core::Sections {

Ratio MixingBox::outdoorShare(VolumeFlow supplyFlow) const
{
    double share = outdoorAirFraction.value();
    if (minimumOutdoorFlow && supplyFlow.value() > 0.0)
        share = std::max(share, minimumOutdoorFlow->value() / supplyFlow.value());
    return fraction(std::clamp(share, 0.0, 1.0));
}

void MixingBox::validate() const
{
    if (!(outdoorAirFraction.value() >= 0.0 && outdoorAirFraction.value() <= 1.0))
        throw InputError("outdoor air fraction", toPercent(outdoorAirFraction), "%", "0 .. 100 %");
    if (minimumOutdoorFlow && !(minimumOutdoorFlow->value() >= 0.0))
        throw InputError("minimum outdoor air flow", toCubicMetresPerHour(*minimumOutdoorFlow), "m3/h", "0 or more");
    if (!(lossCoefficient >= 0.0 && lossCoefficient <= 50.0))
        throw InputError("mixing section loss coefficient", lossCoefficient, "", "0 .. 50");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("mixing section length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome MixingBox::mix(const AirStream& outdoor, const AirStream& recirculated, const SectionContext& context,
                              Detail& detail) const
{
    const MassFlow total = outdoor.dryAir + recirculated.dryAir;
    detail.recirculated = recirculated.dryAir;
    detail.outdoorShare = total.value() > 0.0 ? fraction(outdoor.dryAir / total) : fraction(1.0);
    SectionOutcome outcome{outdoor, dynamicPressureDrop(lossCoefficient, outdoor.density(), context.faceVelocity),
                           MassFlow{}, MassFlow{}, {}};
    outcome.outlet.dryAir = total;
    if (recirculated.dryAir.value() <= 0.0)
        return outcome;
    const auto process = Psychro::mix(outdoor.state, outdoor.dryAir, recirculated.state, recirculated.dryAir);
    outcome.outlet.state = process.outlet;
    outcome.waterRemoved = total * process.condensate;
    if (process.clamped)
        outcome.findings.push_back({Severity::Warning, "mixing.fog", "",
                                    "outdoor and recirculated air mix to fog: water drops out in the mixing section"});
    return outcome;
}

} // namespace Airwright::Core::Sections
