#pragma once
// Raw-double kernels behind EffectivenessNtu.h, shared by the recovery layer's
// hot loops. Inputs are assumed valid (checked at the public boundary).

#include "airwright/core/recovery/FlowArrangement.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Recovery::Kernels {

// |1 - Cr| below this is treated as balanced flow (closed Cr = 1 limits).
inline constexpr double kBalancedTolerance = 1e-12;
// Cr N below this is treated as Cr = 0 (the error is of order Cr N).
inline constexpr double kZeroCapacityTolerance = 1e-12;

inline double counterFlow(double n, double cr)
{
    const double delta = 1.0 - cr;
    if (delta < kBalancedTolerance)
        return n / (1.0 + n);
    // 1 - Cr e^-x written as (1 - e^-x) + (1 - Cr) e^-x: no cancellation near Cr = 1.
    // e^-x as 1 - (1 - e^-x): exact to 1e-16 absolute, all that the term delta e^-x
    // needs beside 1 - e^-x, and one transcendental call instead of two.
    const double x = n * delta;
    const double oneMinusE = -std::expm1(-x);
    return oneMinusE / (oneMinusE + delta * (1.0 - oneMinusE));
}

inline double parallelFlow(double n, double cr) { return -std::expm1(-n * (1.0 + cr)) / (1.0 + cr); }

inline double crossFlowCmaxMixed(double n, double cr)
{
    if (cr * n < kZeroCapacityTolerance)
        return -std::expm1(-n);
    return -std::expm1(cr * std::expm1(-n)) / cr;
}

inline double crossFlowCminMixed(double n, double cr)
{
    if (cr * n < kZeroCapacityTolerance)
        return -std::expm1(-n);
    return -std::expm1(std::expm1(-cr * n) / cr);
}

// 1/k and 1/(k (k+1)) for k = 0 .. kReciprocalCount - 1 (entry 0 unused).
inline constexpr int kReciprocalCount = 64;
inline constexpr auto kReciprocals = [] {
    struct Table {
        double v[kReciprocalCount];
        constexpr double operator[](int k) const { return v[k]; }
    } t{};
    for (int k = 1; k < kReciprocalCount; ++k)
        t.v[k] = 1.0 / k;
    return t;
}();
inline constexpr auto kPairReciprocals = [] {
    struct Table {
        double v[kReciprocalCount];
        constexpr double operator[](int k) const { return v[k]; }
    } t{};
    for (int k = 1; k < kReciprocalCount; ++k)
        t.v[k] = 1.0 / (static_cast<double>(k) * (k + 1));
    return t;
}();

// Exact series for unmixed cross-flow (see EffectivenessNtu.h):
// eps = (1 / x) sum_{k>=1} P(k, n) P(k, x), x = Cr n. P(k, x) is kept as
// 1 - e^-x sum_{m<k} x^m/m!, reduced term by term from -expm1(-x): the
// subtraction stays accurate to ~1e-16 absolute, which is what the sum needs.
inline double crossFlowBothUnmixed(double n, double cr)
{
    if (n <= 0.0)
        return 0.0;
    const double x = cr * n;
    if (x < kZeroCapacityTolerance)
        return -std::expm1(-n);
    // e^-x and 1 - e^-x from one call: expm1 where 1 - e^-x is small, exp where
    // e^-x is (each then exact to rounding).
    auto split = [](double v, double& e, double& oneMinusE) {
        if (v < 1.0) {
            oneMinusE = -std::expm1(-v);
            e = 1.0 - oneMinusE;
        } else {
            e = std::exp(-v);
            oneMinusE = 1.0 - e;
        }
    };
    double tN, pN, tX, pX;
    split(n, tN, pN);
    split(x, tX, pX);
    double sum = pN * pX;
    // Terms k and k + 1 together, both from the terms of k - 1 (t_k = t_{k-1} v / k,
    // t_{k+1} = t_{k-1} v^2 / (k (k+1))): half the length of the chains of
    // dependent operations of a term-by-term loop, which bound its speed. False
    // once the terms no longer count (or P has reached its rounding floor).
    const double n2 = n * n, x2 = x * x;
    auto addPair = [&](double invK, double invPair) {
        const double tN1 = tN * (n * invK), tX1 = tX * (x * invK);
        tN *= n2 * invPair;
        tX *= x2 * invPair;
        const double pN1 = pN - tN1, pX1 = pX - tX1;
        pN = pN1 - tN;
        pX = pX1 - tX;
        if (!(std::min(pN1, pX1) > 0.0))
            return false;
        const double first = pN1 * pX1;
        if (!(std::min(pN, pX) > 0.0)) {
            sum += first;
            return false;
        }
        const double second = pN * pX;
        sum += first + second;
        return !(second < 1e-16 * sum);
    };
    // 1/k from tables while they last: the loop runs about 5 to 15 times at
    // usual NTU, and multiplications are far cheaper than divisions.
    int k = 1;
    while (k + 1 < kReciprocalCount && addPair(kReciprocals[k], kPairReciprocals[k]))
        k += 2;
    if (k + 1 >= kReciprocalCount)
        while (k < 2000 && addPair(1.0 / k, 1.0 / (static_cast<double>(k) * (k + 1))))
            k += 2;
    return sum / x;
}

// Up to this many passes multiPassCounter sums the geometric series directly.
inline constexpr int kGeometricPassLimit = 16;

// n passes of a per-pass effectiveness in overall counter-flow, streams mixed
// between passes (Incropera eq. 11.31b,c).
inline double multiPassCounter(double passEps, double cr, int passes)
{
    const double delta = 1.0 - cr;
    if (delta < kBalancedTolerance)
        return passes * passEps / (1.0 + (passes - 1) * passEps);
    // r = ((1 - eps1 Cr) / (1 - eps1))^n = (1 + eps1 delta / (1 - eps1))^n
    const double y = passEps * delta / (1.0 - passEps);
    double rMinusOne;
    if (passes <= kGeometricPassLimit) {
        // r - 1 = y (1 + (1+y) + ... + (1+y)^(n-1)): positive terms, no cancellation
        // for small y, and far cheaper than expm1 and log1p for the few passes used.
        const double onePlusY = 1.0 + y;
        double power = 1.0, sum = 0.0;
        for (int k = 0; k < passes; ++k) {
            sum += power;
            power *= onePlusY;
        }
        rMinusOne = y * sum;
    } else {
        rMinusOne = std::expm1(passes * std::log1p(y));
    }
    return rMinusOne / (rMinusOne + delta);
}

// Cross-counter-flow from its per-pass effectiveness (unmixed cross-flow at NTU / passes).
inline double crossCounterFlowFromPass(double passEps, double cr, int passes)
{
    if (passEps >= 1.0)
        return 1.0;
    return multiPassCounter(passEps, cr, passes);
}

inline double crossCounterFlow(double n, double cr, int passes)
{
    if (n <= 0.0)
        return 0.0;
    return crossCounterFlowFromPass(crossFlowBothUnmixed(n / passes, cr), cr, passes);
}

inline double effectiveness(FlowArrangement arrangement, double n, double cr, int crossCounterPasses)
{
    switch (arrangement) {
    case FlowArrangement::CounterFlow:
        return counterFlow(n, cr);
    case FlowArrangement::CrossFlowBothUnmixed:
        return crossFlowBothUnmixed(n, cr);
    case FlowArrangement::CrossFlowCminMixed:
        return crossFlowCminMixed(n, cr);
    case FlowArrangement::CrossFlowCmaxMixed:
        return crossFlowCmaxMixed(n, cr);
    case FlowArrangement::ParallelFlow:
        return parallelFlow(n, cr);
    case FlowArrangement::CrossCounterFlow:
        return crossCounterFlow(n, cr, crossCounterPasses);
    }
    return 0.0;
}

// Rotary regenerator capacity factor f(Cr_r) (see EffectivenessNtu.h).
inline double rotorFactor(double rotorCapacityRatio)
{
    if (rotorCapacityRatio >= 1.0)
        return 1.0 - 1.0 / (9.0 * std::pow(rotorCapacityRatio, 1.93));
    return (8.0 / 9.0) * rotorCapacityRatio;
}

} // namespace Airwright::Core::Recovery::Kernels
