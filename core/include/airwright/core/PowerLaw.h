#pragma once
// ratio^exponent for the flow scaling laws (pressure drop ~ q^x, heat transfer
// coefficient ~ m^n). A chain pass evaluates dozens of them and std::pow is its
// slowest call, while most exponents are 1 or 2 and most ratios are exactly 1
// at design flow; those cases are exact without pow.

#include <cmath>

namespace Airwright::Core {

inline double powerLaw(double ratio, double exponent)
{
    if (ratio == 1.0 || exponent == 0.0)
        return 1.0;
    if (exponent == 2.0)
        return ratio * ratio;
    if (exponent == 1.0)
        return ratio;
    if (exponent == 0.5)
        return std::sqrt(ratio);
    // The usual turbulent-flow exponents of plates (1.5) and coils (1.75) from
    // square roots: exact to a couple of ulps, several times cheaper than pow.
    if (exponent == 1.5)
        return ratio * std::sqrt(ratio);
    if (exponent == 1.75) {
        const double root = std::sqrt(ratio);
        return ratio * root * std::sqrt(root);
    }
    // exp(x ln r) rather than pow: within a few ulps for the ratios of flow
    // scaling (0.01 .. 100), and about half the cost of glibc's pow.
    return std::exp(exponent * std::log(ratio));
}

} // namespace Airwright::Core
