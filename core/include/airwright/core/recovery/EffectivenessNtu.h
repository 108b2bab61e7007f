#pragma once
// Effectiveness-NTU relations (Incropera, Fundamentals of Heat and Mass Transfer,
// table 11.3 for eps(NTU, Cr), table 11.4 for NTU(eps, Cr)) and the rotary
// regenerator correction (Kays and London, as given in Shah and Sekulic,
// Fundamentals of Heat Exchanger Design, eq. 5.62).
//
// eps = Q / (Cmin (t_hot,in - t_cold,in)), NTU = UA / Cmin, Cr = Cmin / Cmax.
// Allowed inputs: NTU 0 .. kMaxNtu, Cr 0 .. 1, eps 0 .. the arrangement's
// maximum at (kMaxNtu, Cr). Anything else throws InputError.
//
// Cross-flow with both streams unmixed uses the exact series (Mason 1954, as in
// Kays and London):
//   eps = 1/(Cr N) sum_{n>=0} P(n+1, N) P(n+1, Cr N),
//   P(k, x) = 1 - e^-x sum_{m<k} x^m/m!   (regularised lower incomplete gamma),
// summed until the terms fall below 1e-16 of the sum. Cross-counter-flow is
// modelled as kCrossCounterFlowPasses passes of unmixed cross-flow in overall
// counter-flow, the streams mixed between passes (Incropera eq. 11.31 for n
// passes, from the per-pass eps at NTU/n) -- an approximation of our choosing:
// real cross-counter-flow plates lie between this and pure counter-flow.

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/FlowArrangement.h"

namespace Airwright::Core::Recovery {

inline constexpr double kMaxNtu = 100.0;
inline constexpr int kCrossCounterFlowPasses = 4;

Ratio effectiveness(FlowArrangement arrangement, Ratio ntu, Ratio capacityRatio);

// Effectiveness at NTU = kMaxNtu: anything above is unattainable for this model.
Ratio maximumEffectiveness(FlowArrangement arrangement, Ratio capacityRatio);

// Closed forms (table 11.4) where they exist; a bracketed solve on 0 .. kMaxNtu
// for the two cross-flow arrangements. Throws when eps is out of reach.
Ratio ntuFromEffectiveness(FlowArrangement arrangement, Ratio eps, Ratio capacityRatio);

// The common explicit approximation for unmixed cross-flow,
// eps = 1 - exp((N^0.22 / Cr)(exp(-Cr N^0.78) - 1)) (Incropera table 11.3),
// kept for comparison: about 1 % off the series for 1 <= NTU <= 5.
Ratio crossFlowUnmixedApproximation(Ratio ntu, Ratio capacityRatio);

// Rotary regenerator: eps = eps_counterflow(NTU_o, Cr) * f(Cr_r) with
// Cr_r = rotor matrix heat capacity rate / Cmin and
//   f = 1 - 1 / (9 Cr_r^1.93)   for Cr_r >= 1 (Shah and Sekulic eq. 5.62, within
//                               1 % of Lambertson's exact results for Cr = 1,
//                               Cr_r >= 1.5),
//   f = (8/9) Cr_r             below 1 (our continuation: the matrix cannot carry
//                               more than Cr_r Cmin dT, so eps <= Cr_r; linear to
//                               zero at a stopped rotor).
Ratio rotorCapacityFactor(Ratio rotorCapacityRatio);
Ratio regeneratorEffectiveness(Ratio ntu, Ratio capacityRatio, Ratio rotorCapacityRatio);

} // namespace Airwright::Core::Recovery
