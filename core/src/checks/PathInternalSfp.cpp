#include "airwright/core/checks/PathInternalSfp.h"

#include "airwright/core/InputError.h"

#include <algorithm>
#include <cmath>
#include <variant>

namespace Airwright::Core::Checks {

PathInternalSfp pathInternalSfp(const std::vector<Chain::SectionResult>& path)
{
    PathInternalSfp p;
    double weight = 0.0;       // sum of fan total pressures, Pa
    double weightedLoss = 0.0; // sum of dp / eta
    double efficiencySum = 0.0;
    int fans = 0;
    for (const auto& r : path) {
        if (std::holds_alternative<Recovery::HeatRecoveryDetail>(r.detail)) {
            p.recoveryDrop += r.pressureDrop;
        } else if (const auto* filter = std::get_if<Sections::Filter::Detail>(&r.detail)) {
            p.filterDrop += filter->initialDrop; // clean, as in the reference configuration
        } else if (const auto* fan = std::get_if<Sections::Fan::Detail>(&r.detail)) {
            const double eta = toFraction(fan->overallEfficiency);
            if (!std::isfinite(eta) || eta <= 0.0 || eta > 1.0)
                throw InputError("fan " + r.id + " overall efficiency", toPercent(fan->overallEfficiency), "%",
                                 "above 0 .. 100 %");
            const double dp = std::max(0.0, toPascals(fan->totalPressure));
            weight += dp;
            weightedLoss += dp / eta;
            efficiencySum += eta;
            ++fans;
        }
    }
    if (fans == 0) {
        const std::string which = path.empty() ? std::string("an empty path")
                                               : std::string("the ") + Chain::pathKey(path.front().path) + " path";
        throw InputError(which + " has no fan result: SFPint needs the fan efficiency");
    }
    // Fans in series move the same flow, so their electric powers add as dp_i / eta_i.
    const double eta = weight > 0.0 ? weight / weightedLoss : efficiencySum / fans;
    p.internalDrop = p.recoveryDrop + p.filterDrop;
    p.fanEfficiency = fraction(eta);
    p.sfpInt = wattsPerCubicMetrePerSecond(toPascals(p.internalDrop) / eta);
    return p;
}

} // namespace Airwright::Core::Checks
