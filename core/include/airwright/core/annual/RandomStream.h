#pragma once
// A small random stream, selected by a 64-bit stream number, whose integer
// sequence is the same on every platform and standard library: SplitMix64
// (Steele, Lea and Flood, "Fast splittable pseudorandom number generators",
// OOPSLA 2014) for the integers, our own Box-Muller transform for normal
// deviates. std::normal_distribution is not used because its algorithm differs
// between standard libraries.
//
// The normal deviates go through std::log, std::sqrt and std::cos; IEEE 754 does
// not require log and cos to be correctly rounded, so another maths library may
// differ in the last bit. Anything written to a file is rounded far coarser.

#include <cstdint>

namespace Airwright::Core::Annual {

class RandomStream {
public:
    explicit RandomStream(std::uint64_t streamNumber) : m_state(streamNumber) {}

    std::uint64_t nextInteger();
    // Uniform in (0, 1]: never 0, so the logarithm in Box-Muller is finite.
    double nextUniform();
    // Standard normal (mean 0, standard deviation 1).
    double nextNormal();

private:
    std::uint64_t m_state;
    double m_spareNormal = 0.0;
    bool m_hasSpare = false;
};

} // namespace Airwright::Core::Annual
