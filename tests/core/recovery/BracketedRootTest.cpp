#include "airwright/core/recovery/BracketedRoot.h"

#include <gtest/gtest.h>

#include <cmath>

using Airwright::Core::Recovery::findBracketedRoot;

TEST(BracketedRoot, ConvergesInsideTheBracket)
{
    // Dottie number: the root of cos x = x, 0.739085133215160641655312... (a
    // classical constant; tolerance 1e-12).
    const auto r = findBracketedRoot([](double x) { return std::cos(x) - x; }, 0.0, 1.0, 1e-13);
    EXPECT_NEAR(r.x, 0.7390851332151607, 1e-12);
    EXPECT_LT(r.evaluations, 15);
    // Cube root of 2 on a wide bracket, superlinear: far fewer steps than bisection's ~45.
    const auto c = findBracketedRoot([](double x) { return x * x * x - 2.0; }, 0.0, 100.0, 1e-12);
    EXPECT_NEAR(c.x, std::cbrt(2.0), 1e-11);
    EXPECT_LT(c.evaluations, 40);
}

TEST(BracketedRoot, StaysInBracketForAStepFunction)
{
    // A discontinuous sign change: Brent falls back to bisection and still
    // brackets the jump to the tolerance.
    const auto r = findBracketedRoot([](double x) { return x < 0.3 ? -1.0 : 1.0; }, 0.0, 1.0, 1e-10);
    EXPECT_NEAR(r.x, 0.3, 1e-9);
    EXPECT_GE(r.x, 0.0);
    EXPECT_LE(r.x, 1.0);
}

TEST(BracketedRoot, RootAtAnEnd)
{
    const auto r = findBracketedRoot([](double x) { return x - 2.0; }, 2.0, 5.0, 1e-12);
    EXPECT_EQ(r.x, 2.0);
}

TEST(BracketedRoot, AcceptingAShortInterpolationStepSavesEvaluations)
{
    // Dottie number as above (tolerance 1e-12): ending on an interpolation step
    // shorter than 1e-6 gives the root far closer than that step, with fewer
    // evaluations than collapsing the bracket to 1e-13.
    const auto f = [](double x) { return std::cos(x) - x; };
    const auto full = findBracketedRoot(f, 0.0, 1.0, f(0.0), f(1.0), 1e-13);
    const auto early = findBracketedRoot(f, 0.0, 1.0, f(0.0), f(1.0), 1e-13, 100, 1e-6);
    EXPECT_NEAR(early.x, 0.7390851332151607, 1e-12);
    EXPECT_LT(early.evaluations, full.evaluations);
    // On a step function an accepted step still ends within that step of the jump.
    const auto step = findBracketedRoot([](double x) { return x < 0.3 ? -1.0 : 1.0; }, 0.0, 1.0, -1.0, 1.0, 1e-10,
                                        100, 1e-3);
    EXPECT_NEAR(step.x, 0.3, 1e-3);
}

using Airwright::Core::Recovery::findRootFromWarmStart;

TEST(BracketedRoot, WarmStartFindsANearbyRoot)
{
    // Cube root of 2 from 1.3 with the tangent's slope, and from 1.0 with a slope
    // a hundred times too small (the steps then overshoot): both land on it.
    const auto f = [](double x) { return x * x * x - 2.0; };
    const auto near = findRootFromWarmStart(f, 1.3, f(1.3), 3.0 * 1.3 * 1.3, 0.0, 3.0, 1e-12, 1e-13, 100, 0.0);
    ASSERT_TRUE(near.has_value());
    EXPECT_NEAR(*near, std::cbrt(2.0), 1e-12);
    const auto rough = findRootFromWarmStart(f, 1.0, f(1.0), 0.03, 0.0, 3.0, 1e-12, 1e-13, 100, 0.0);
    ASSERT_TRUE(rough.has_value());
    EXPECT_NEAR(*rough, std::cbrt(2.0), 1e-12);
}

TEST(BracketedRoot, WarmStartGivesUpRatherThanLeaveItsRange)
{
    int evaluations = 0;
    const auto f = [&](double x) {
        ++evaluations;
        return x - 2.0; // root at 2
    };
    // The root lies beyond the upper end: no bracket, nothing returned, every
    // evaluation inside the range.
    const auto r = findRootFromWarmStart(
        [&](double x) {
            EXPECT_LE(x, 1.5);
            EXPECT_GE(x, 0.0);
            return f(x);
        },
        0.5, f(0.5), 1.0, 0.0, 1.5, 1e-9, 1e-12, 100, 0.0);
    EXPECT_FALSE(r.has_value());
    EXPECT_LE(evaluations, 5);
    // A vanishing slope gives nothing either (the caller solves on its full bracket).
    EXPECT_FALSE(findRootFromWarmStart(f, 0.5, f(0.5), 0.0, 0.0, 3.0, 1e-9, 1e-12, 100, 0.0).has_value());
    // A start on the root is the root.
    EXPECT_EQ(findRootFromWarmStart(f, 2.0, 0.0, 1.0, 0.0, 3.0, 1e-9, 1e-12, 100, 0.0), 2.0);
}
