#include "airwright/core/checks/RecoveryReferenceDrop.h"

#include "airwright/core/InputError.h"
#include "airwright/core/recovery/ExchangerRating.h"

#include <cmath>

namespace Airwright::Core::Checks {

Pressure recoveryReferenceDrop(const Recovery::HeatRecovery& spec, VolumeFlow ratedFlow,
                               const Chain::SectionResult& side)
{
    const double q = toCubicMetresPerSecond(ratedFlow);
    if (!std::isfinite(q) || q <= 0.0)
        throw InputError("heat recovery " + side.id + " rated flow", q, "m3/s", "above 0");
    const double rho = toKilogramsPerCubicMetre(side.inlet.density());
    if (!std::isfinite(rho) || rho <= 0.0)
        throw InputError("heat recovery " + side.id + " inlet density", rho, "kg/m3", "above 0");
    const double m = toKilogramsPerSecond(side.inlet.dryAir);
    if (!(m > 0.0))
        return pascals(0.0);
    const Pressure rated =
        side.path == Chain::PathKind::Supply ? spec.ratedPressureDropSupply : spec.ratedPressureDropExtract;
    const double x = toFraction(Recovery::defaultPressureDropExponent(spec.kind));
    const double ratedMass = q * Recovery::kReferenceAirDensity;
    return rated * (std::pow(m / ratedMass, x) * Recovery::kReferenceAirDensity / rho);
}

} // namespace Airwright::Core::Checks
