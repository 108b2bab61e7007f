#include "airwright/core/annual/RandomStream.h"

#include <gtest/gtest.h>

#include <cmath>
#include <cstdint>

using Airwright::Core::Annual::RandomStream;

TEST(AnnualRandomStream, MatchesThePublishedSplitMix64Sequence)
{
    // Rosetta Code task "Pseudo-random numbers/Splitmix64": the first five integers
    // for the state 1234567.
    RandomStream stream(1234567);
    EXPECT_EQ(stream.nextInteger(), 6457827717110365317ULL);
    EXPECT_EQ(stream.nextInteger(), 3203168211198807973ULL);
    EXPECT_EQ(stream.nextInteger(), 9817491932198370423ULL);
    EXPECT_EQ(stream.nextInteger(), 4593380528125082431ULL);
    EXPECT_EQ(stream.nextInteger(), 16408922859458223821ULL);
}

TEST(AnnualRandomStream, UniformStaysInTheHalfOpenUnitInterval)
{
    RandomStream stream(7);
    double sum = 0.0;
    constexpr int n = 100000;
    for (int i = 0; i < n; ++i) {
        const double u = stream.nextUniform();
        ASSERT_GT(u, 0.0);
        ASSERT_LE(u, 1.0);
        sum += u;
    }
    // Mean of U(0,1] is 1/2; the standard error for n = 1e5 is 0.29 / 316 = 0.0009,
    // so 0.005 is more than five standard errors.
    EXPECT_NEAR(sum / n, 0.5, 0.005);
}

TEST(AnnualRandomStream, NormalHasZeroMeanAndUnitDeviation)
{
    RandomStream stream(11);
    constexpr int n = 200000;
    double sum = 0.0;
    double sumSquares = 0.0;
    int beyondTwo = 0;
    for (int i = 0; i < n; ++i) {
        const double z = stream.nextNormal();
        ASSERT_TRUE(std::isfinite(z));
        sum += z;
        sumSquares += z * z;
        if (std::abs(z) > 2.0)
            ++beyondTwo;
    }
    const double mean = sum / n;
    const double variance = sumSquares / n - mean * mean;
    // Standard errors for n = 2e5: mean 0.0022, variance sqrt(2 / n) = 0.0032;
    // tolerances of about five standard errors.
    EXPECT_NEAR(mean, 0.0, 0.011);
    EXPECT_NEAR(variance, 1.0, 0.016);
    // P(|Z| > 2) = 0.0455 for a standard normal (statistics tables); standard
    // error sqrt(p (1 - p) / n) = 0.00047.
    EXPECT_NEAR(static_cast<double>(beyondTwo) / n, 0.0455, 0.0025);
}

TEST(AnnualRandomStream, SameNumberSameStream)
{
    RandomStream a(42);
    RandomStream b(42);
    RandomStream c(43);
    bool differs = false;
    for (int i = 0; i < 1000; ++i) {
        const double za = a.nextNormal();
        EXPECT_EQ(za, b.nextNormal());
        differs = differs || za != c.nextNormal();
    }
    EXPECT_TRUE(differs);
}
