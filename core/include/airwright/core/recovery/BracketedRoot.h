#pragma once
// A bounded root finder for monotone-ish scalar functions on a bracket: Brent's
// method (inverse quadratic / secant steps, falling back to bisection), so it
// converges like Newton near a smooth root and never leaves [lo, hi].
// Raw doubles: used inside the recovery layer's hot loops.

#include <algorithm>
#include <cmath>
#include <optional>

namespace Airwright::Core::Recovery {

struct BracketedRoot {
    double x = 0.0;
    int evaluations = 0;
};

// Requires fLo and fHi of opposite sign (or one of them zero); the caller checks
// that and reports the physical meaning when it is not so. Brent's method in its
// classic form (Brent 1973, "Algorithms for minimization without derivatives",
// ch. 4): the bracket [b, c] always holds the root, steps shorter than the
// tolerance are lengthened to it, so the bracket collapses to xTolerance.
//
// acceptStepBelow > 0: an interpolation step (secant or inverse quadratic, never
// a bisection) shorter than this ends the search at the step's end without
// evaluating f there. Near a smooth root these steps converge superlinearly, so
// the returned x is far closer to the root than the step; it saves the last
// evaluation or two that only confirm the bracket. The caller must not need f(x).
// acceptStepRatio < 1 asks for evidence of that convergence as well: the step
// must also be at most this fraction of the step before it.
template <class F>
BracketedRoot findBracketedRoot(F&& f, double lo, double hi, double fLo, double fHi, double xTolerance,
                                int maxEvaluations = 100, double acceptStepBelow = 0.0,
                                double acceptStepRatio = 1.0)
{
    BracketedRoot out;
    double a = lo, b = hi, fa = fLo, fb = fHi;
    double c = b, fc = fb, d = b - a, e = d;
    while (true) {
        if ((fb > 0.0 && fc > 0.0) || (fb < 0.0 && fc < 0.0)) {
            c = a;
            fc = fa;
            d = e = b - a;
        }
        if (std::abs(fc) < std::abs(fb)) {
            a = b;
            b = c;
            c = a;
            fa = fb;
            fb = fc;
            fc = fa;
        }
        const double tol = 2.0 * 2.2e-16 * std::abs(b) + 0.5 * xTolerance;
        const double half = 0.5 * (c - b);
        if (std::abs(half) <= tol || fb == 0.0 || out.evaluations >= maxEvaluations)
            break;
        if (std::abs(e) >= tol && std::abs(fa) > std::abs(fb)) {
            const double s = fb / fa;
            double p, q;
            if (a == c) { // secant
                p = 2.0 * half * s;
                q = 1.0 - s;
            } else { // inverse quadratic interpolation
                const double qa = fa / fc, r = fb / fc;
                p = s * (2.0 * half * qa * (qa - r) - (b - a) * (r - 1.0));
                q = (qa - 1.0) * (r - 1.0) * (s - 1.0);
            }
            if (p > 0.0)
                q = -q;
            p = std::abs(p);
            if (2.0 * p < std::min(3.0 * half * q - std::abs(tol * q), std::abs(e * q))) {
                e = d;
                d = p / q;
                if (std::abs(d) < acceptStepBelow && std::abs(d) <= acceptStepRatio * std::abs(e)) {
                    out.x = b + d;
                    return out;
                }
            } else {
                d = e = half;
            }
        } else {
            d = e = half;
        }
        a = b;
        fa = fb;
        b += std::abs(d) > tol ? d : (half > 0.0 ? tol : -tol);
        fb = f(b);
        ++out.evaluations;
    }
    out.x = b;
    return out;
}

// A root near a known point (a warm start, e.g. the last pass's control value):
// from (x0, f0) and an estimated slope, secant steps each aimed a little past the
// secant root (by 1e-3 of the step, at least minOvershoot), so that the root is
// soon bracketed, then findBracketedRoot on that bracket. Never leaves
// [lower, upper]. Empty when `steps` steps bracket nothing or the slope vanishes:
// the caller then solves on its full bracket.
template <class F>
std::optional<double> findRootFromWarmStart(F&& f, double x0, double f0, double slope, double lower, double upper,
                                            double minOvershoot, double xTolerance, int maxEvaluations,
                                            double acceptStepBelow, int steps = 4)
{
    for (int step = 0; step < steps; ++step) {
        if (f0 == 0.0)
            return x0;
        if (!(slope != 0.0 && std::isfinite(slope)))
            return std::nullopt;
        const double secant = x0 - f0 / slope;
        const double past = std::max(1e-3 * std::abs(secant - x0), minOvershoot);
        const double x1 = std::clamp(secant + (secant > x0 ? past : -past), lower, upper);
        if (x1 == x0)
            return std::nullopt;
        const double f1 = f(x1);
        if (f1 == 0.0)
            return x1;
        if ((f1 > 0.0) != (f0 > 0.0))
            return findBracketedRoot(f, x0, x1, f0, f1, xTolerance, maxEvaluations, acceptStepBelow).x;
        slope = (f1 - f0) / (x1 - x0);
        x0 = x1;
        f0 = f1;
    }
    return std::nullopt;
}

template <class F>
BracketedRoot findBracketedRoot(F&& f, double lo, double hi, double xTolerance, int maxEvaluations = 100)
{
    const double fLo = f(lo);
    const double fHi = f(hi);
    BracketedRoot r = findBracketedRoot(f, lo, hi, fLo, fHi, xTolerance, maxEvaluations);
    r.evaluations += 2;
    return r;
}

} // namespace Airwright::Core::Recovery
