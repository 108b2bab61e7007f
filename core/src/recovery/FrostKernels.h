#pragma once
// Raw-double kernels behind FrostOnset.h, shared with the exchanger model's hot
// path. Temperatures in degC, pressure in Pa, humidity ratio in kg/kg.

#include "EffectivenessKernels.h"

#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/recovery/BracketedRoot.h"
#include "airwright/core/recovery/EffectivenessNtu.h"

#include <algorithm>
#include <cmath>
#include <optional>

namespace Airwright::Core::Recovery::Kernels {

// Wall temperature at the cold corner of a recuperator (docs/frost.md).
// m = Cmin / C_warm. The warm stream's local temperature at the corner:
//  counter-flow: its mixed outlet;
//  unmixed cross-flow: the warm fluid strip running along the cold stream's
//    entry edge sees the cold inlet temperature all the way, so it decays as
//    t_c + (t_w,in - t_c) exp(-UA / C_warm);
//  cross-counter-flow: the same inside the last (coldest) of the passes, whose
//    warm inlet follows from that pass's balance;
//  other arrangements: the mixed outlet (not used for plates).
// passEps: the cross-counter pass effectiveness at (ntu / passes, cr) when the
// caller already has it (the exchanger's wet-surface solve has just computed it).
inline double coldCornerSurface(FlowArrangement arrangement, double tCold, double tWarmIn, double tWarmOut,
                                double ntu, double cr, bool warmIsCmin, double coldWeight,
                                std::optional<double> passEps = std::nullopt)
{
    const double m = warmIsCmin ? 1.0 : cr;
    double corner = tWarmOut;
    switch (arrangement) {
    case FlowArrangement::CrossFlowBothUnmixed:
        corner = tCold + (tWarmIn - tCold) * std::exp(-ntu * m);
        break;
    case FlowArrangement::CrossCounterFlow: {
        const double passes = kCrossCounterFlowPasses;
        const double k = (passEps ? *passEps : crossFlowBothUnmixed(ntu / passes, cr)) * m;
        const double warmIntoLastPass = k < 1.0 ? (tWarmOut - k * tCold) / (1.0 - k) : tWarmOut;
        corner = tCold + (warmIntoLastPass - tCold) * std::exp(-ntu * m / passes);
        break;
    }
    default:
        break;
    }
    return coldWeight * tCold + (1.0 - coldWeight) * corner;
}

// Below 0 C and below the warm stream's dew/frost point (pws over ice there).
inline bool surfaceFrosts(double tSurface, double warmVapourPressure)
{
    if (!(tSurface < 0.0))
        return false;
    // pws over ice rises with t up to the triple point: a vapour pressure at or
    // above that value frosts every surface below 0 C, no pws(t) needed.
    if (warmVapourPressure >= Psychro::detail::satPressureAtTriplePoint())
        return true;
    return Psychro::detail::satPressure(tSurface) < warmVapourPressure;
}

// Largest W_line(t) - Ws(t) on the part of the line from (tCold, wCold) to
// (tWarm, wWarmEffective) that lies below 0 C. Ws is convex in t and the line
// straight, so the difference is concave: its largest value is where its slope,
// slope_line - dWs/dt, changes sign (a bracketed root, to 1e-6 K), or at an end
// of the range. Positive: the line crosses into the supersaturated region.
inline double mixingLineSupersaturation(double tCold, double wCold, double tWarm, double wWarmEffective, double p)
{
    namespace raw = Psychro::detail;
    const double upper = std::min(tWarm, 0.0);
    if (!(upper > tCold) || !(tWarm > tCold))
        return wCold - raw::satHumidityRatio(tCold, p);
    const double slope = (wWarmEffective - wCold) / (tWarm - tCold);
    auto difference = [&](double t) { return wCold + slope * (t - tCold) - raw::satHumidityRatio(t, p); };
    // dWs/dt = 0.621945 p dpws/dt / (p - pws)^2 (ASHRAE Fundamentals 2017 ch. 1, eq. 23 differentiated).
    auto differenceSlope = [&](double t) {
        const double pws = raw::satPressure(t);
        const double gap = p - pws;
        return slope - raw::kMolarMassRatio * p * pws * raw::dLnSatPressure(t) / (gap * gap);
    };
    const double slopeAtCold = differenceSlope(tCold);
    if (!(slopeAtCold > 0.0))
        return difference(tCold);
    const double slopeAtUpper = differenceSlope(upper);
    if (!(slopeAtUpper < 0.0))
        return difference(upper);
    return difference(findBracketedRoot(differenceSlope, tCold, upper, slopeAtCold, slopeAtUpper, 1e-6, 100, 1e-6).x);
}

} // namespace Airwright::Core::Recovery::Kernels
