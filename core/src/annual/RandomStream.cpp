#include "airwright/core/annual/RandomStream.h"

#include <cmath>
#include <numbers>

namespace Airwright::Core::Annual {

std::uint64_t RandomStream::nextInteger()
{
    // SplitMix64: a Weyl sequence through a 64-bit avalanche mix.
    m_state += 0x9e3779b97f4a7c15ULL;
    std::uint64_t z = m_state;
    z = (z ^ (z >> 30)) * 0xbf58476d1ce4e5b9ULL;
    z = (z ^ (z >> 27)) * 0x94d049bb133111ebULL;
    return z ^ (z >> 31);
}

double RandomStream::nextUniform()
{
    // Top 53 bits, shifted by one step so the result lies in (0, 1].
    const std::uint64_t top = nextInteger() >> 11;
    return static_cast<double>(top + 1) * 0x1.0p-53;
}

double RandomStream::nextNormal()
{
    if (m_hasSpare) {
        m_hasSpare = false;
        return m_spareNormal;
    }
    // Box-Muller: two uniforms give two independent standard normals.
    const double u1 = nextUniform();
    const double u2 = nextUniform();
    const double radius = std::sqrt(-2.0 * std::log(u1));
    const double angle = 2.0 * std::numbers::pi * u2;
    m_spareNormal = radius * std::sin(angle);
    m_hasSpare = true;
    return radius * std::cos(angle);
}

} // namespace Airwright::Core::Annual
