#include "airwright/core/recovery/EffectivenessNtu.h"

#include "EffectivenessKernels.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/recovery/BracketedRoot.h"

#include <cmath>
#include <string>

namespace Airwright::Core::Recovery {

std::string_view toString(FlowArrangement arrangement)
{
    switch (arrangement) {
    case FlowArrangement::CounterFlow:
        return "counter-flow";
    case FlowArrangement::CrossFlowBothUnmixed:
        return "cross-flow, both streams unmixed";
    case FlowArrangement::CrossFlowCminMixed:
        return "cross-flow, Cmin stream mixed";
    case FlowArrangement::CrossFlowCmaxMixed:
        return "cross-flow, Cmax stream mixed";
    case FlowArrangement::ParallelFlow:
        return "parallel flow";
    case FlowArrangement::CrossCounterFlow:
        return "cross-counter-flow";
    }
    return "unknown arrangement";
}

namespace {

void checkCapacityRatio(double cr)
{
    if (!(cr >= 0.0 && cr <= 1.0))
        throw InputError("capacity rate ratio Cmin/Cmax", cr, "", "0 .. 1");
}

void checkNtu(double n)
{
    if (!(n >= 0.0 && n <= kMaxNtu))
        throw InputError("NTU", n, "", "0 .. " + formatNumber(kMaxNtu));
}

double maxEps(FlowArrangement arrangement, double cr)
{
    return Kernels::effectiveness(arrangement, kMaxNtu, cr, kCrossCounterFlowPasses);
}

} // namespace

Ratio effectiveness(FlowArrangement arrangement, Ratio ntu, Ratio capacityRatio)
{
    const double n = toFraction(ntu);
    const double cr = toFraction(capacityRatio);
    checkNtu(n);
    checkCapacityRatio(cr);
    return fraction(Kernels::effectiveness(arrangement, n, cr, kCrossCounterFlowPasses));
}

Ratio maximumEffectiveness(FlowArrangement arrangement, Ratio capacityRatio)
{
    const double cr = toFraction(capacityRatio);
    checkCapacityRatio(cr);
    return fraction(maxEps(arrangement, cr));
}

Ratio ntuFromEffectiveness(FlowArrangement arrangement, Ratio eps, Ratio capacityRatio)
{
    const double e = toFraction(eps);
    const double cr = toFraction(capacityRatio);
    checkCapacityRatio(cr);
    const double limit = maxEps(arrangement, cr);
    if (!(e >= 0.0 && e < limit))
        throw InputError("effectiveness of a " + std::string(toString(arrangement)) + " exchanger at Cr "
                             + formatNumber(cr),
                         e, "", "0 .. below " + formatNumber(limit) + " (the value reached at NTU "
                                    + formatNumber(kMaxNtu) + ")");
    if (e == 0.0)
        return fraction(0.0);

    double n = 0.0;
    const bool zeroCr = cr < Kernels::kZeroCapacityTolerance;
    switch (arrangement) {
    case FlowArrangement::CounterFlow: {
        const double delta = 1.0 - cr;
        n = delta < Kernels::kBalancedTolerance ? e / (1.0 - e) : std::log1p(e * delta / (1.0 - e)) / delta;
        break;
    }
    case FlowArrangement::ParallelFlow:
        n = -std::log1p(-e * (1.0 + cr)) / (1.0 + cr);
        break;
    case FlowArrangement::CrossFlowCmaxMixed:
        n = zeroCr ? -std::log1p(-e) : -std::log1p(std::log1p(-e * cr) / cr);
        break;
    case FlowArrangement::CrossFlowCminMixed:
        n = zeroCr ? -std::log1p(-e) : -std::log1p(cr * std::log1p(-e)) / cr;
        break;
    case FlowArrangement::CrossFlowBothUnmixed:
    case FlowArrangement::CrossCounterFlow: {
        auto f = [&](double x) {
            return Kernels::effectiveness(arrangement, x, cr, kCrossCounterFlowPasses) - e;
        };
        // eps is increasing in NTU, zero at 0 and above e at kMaxNtu: bracketed.
        n = findBracketedRoot(f, 0.0, kMaxNtu, -e, limit - e, 1e-12).x;
        break;
    }
    }
    return fraction(n);
}

Ratio crossFlowUnmixedApproximation(Ratio ntu, Ratio capacityRatio)
{
    const double n = toFraction(ntu);
    const double cr = toFraction(capacityRatio);
    checkNtu(n);
    checkCapacityRatio(cr);
    if (cr * n < Kernels::kZeroCapacityTolerance)
        return fraction(-std::expm1(-n));
    return fraction(-std::expm1(std::pow(n, 0.22) / cr * std::expm1(-cr * std::pow(n, 0.78))));
}

Ratio rotorCapacityFactor(Ratio rotorCapacityRatio)
{
    const double r = toFraction(rotorCapacityRatio);
    if (!(r >= 0.0 && std::isfinite(r)))
        throw InputError("rotor capacity rate ratio Cr_r", r, "", ">= 0");
    return fraction(Kernels::rotorFactor(r));
}

Ratio regeneratorEffectiveness(Ratio ntu, Ratio capacityRatio, Ratio rotorCapacityRatio)
{
    return fraction(toFraction(effectiveness(FlowArrangement::CounterFlow, ntu, capacityRatio))
                    * toFraction(rotorCapacityFactor(rotorCapacityRatio)));
}

} // namespace Airwright::Core::Recovery
