// HeatRecoveryEvaluator::Memory: what the chain keeps between passes must never
// hand back an outcome for other inputs. Every check compares the remembered
// evaluation with a fresh one of the same inputs (the model against itself, so
// no outside source applies; the tolerances are those of the solves inside).

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include <gtest/gtest.h>

#include <cmath>
#include <functional>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Recovery;
using Airwright::Core::Psychro::MoistAirState;

namespace {

const Pressure kP = pascals(101325.0);
const VolumeFlow kDesignFlow = cubicMetresPerSecond(2.5);

Sections::AirStream stream(double tC, double rhPercent, double kgPerS)
{
    return {MoistAirState::fromDryBulbRelativeHumidity(celsius(tC), percent(rhPercent), kP),
            kilogramsPerSecond(kgPerS)};
}

HeatRecovery plate(FrostStrategy frost = FrostStrategy::Bypass)
{
    HeatRecovery spec;
    spec.kind = ExchangerKind::PlateCounterFlow;
    spec.ratedEfficiency = percent(82.0);
    spec.frostStrategy = frost;
    return spec;
}

HeatRecoveryInputs mildDay()
{
    // Mid-season: full recovery would overheat, so the bypass holds the target.
    HeatRecoveryInputs in;
    in.supplyIn = stream(10.0, 70.0, 3.0);
    in.extractIn = stream(22.0, 45.0, 3.0);
    in.supplyTarget = celsius(17.7);
    return in;
}

void expectSameOutcome(const HeatRecoveryOutcome& a, const HeatRecoveryOutcome& b, const std::string& what)
{
    // Same inputs, same solves: equal to the last bit.
    EXPECT_EQ(a.supplyOut.state, b.supplyOut.state) << what;
    EXPECT_EQ(a.extractOut.state, b.extractOut.state) << what;
    EXPECT_EQ(a.supplyOut.dryAir.value(), b.supplyOut.dryAir.value()) << what;
    EXPECT_EQ(a.detail.bypassFraction.value(), b.detail.bypassFraction.value()) << what;
    EXPECT_EQ(a.detail.recovered.value(), b.detail.recovered.value()) << what;
    EXPECT_EQ(a.supplyPressureDrop.value(), b.supplyPressureDrop.value()) << what;
    EXPECT_EQ(a.findings, b.findings) << what;
}

} // namespace

TEST(HeatRecoveryEvaluator, MemoryReturnsTheSameOutcomeForTheSameInputs)
{
    const HeatRecoveryEvaluator evaluator(plate(), kDesignFlow);
    HeatRecoveryEvaluator::Memory memory;
    const HeatRecoveryInputs in = mildDay();
    const HeatRecoveryOutcome first = evaluator.evaluate(in, memory);
    EXPECT_EQ(memory.evaluations, 1);
    const HeatRecoveryOutcome again = evaluator.evaluate(in, memory);
    EXPECT_EQ(memory.evaluations, 1); // taken from memory
    expectSameOutcome(again, first, "repeat");
    expectSameOutcome(again, evaluator.evaluate(in), "fresh");
}

// One changed input per row; the remembered evaluation must follow it.
struct InputChange {
    const char* name;
    std::function<void(HeatRecoveryInputs&)> change;
    bool valid = true; // false: the changed input is out of range and must throw
};

class MemoryFollowsInputs : public ::testing::TestWithParam<InputChange> {};

TEST_P(MemoryFollowsInputs, NoStaleOutcome)
{
    const InputChange& row = GetParam();
    const HeatRecoveryEvaluator evaluator(plate(), kDesignFlow);
    HeatRecoveryEvaluator::Memory memory;
    const HeatRecoveryInputs before = mildDay();
    const HeatRecoveryOutcome old = evaluator.evaluate(before, memory);
    HeatRecoveryInputs after = before;
    row.change(after);
    if (!row.valid) {
        EXPECT_THROW(evaluator.evaluate(after, memory), InputError) << row.name;
        EXPECT_THROW(evaluator.evaluate(after), InputError) << row.name;
        // The memory still holds the last good evaluation, and only for its inputs.
        expectSameOutcome(evaluator.evaluate(before, memory), old, row.name);
        return;
    }
    const HeatRecoveryOutcome remembered = evaluator.evaluate(after, memory);
    const HeatRecoveryOutcome fresh = evaluator.evaluate(after);
    EXPECT_EQ(memory.evaluations, 2) << row.name;
    // The warm-started control finds the same root to its tolerance (1e-9 in the
    // bypass share, well below 1e-6 K at the outlet).
    EXPECT_NEAR(remembered.detail.bypassFraction.value(), fresh.detail.bypassFraction.value(), 1e-8) << row.name;
    EXPECT_NEAR(toCelsius(remembered.supplyOut.state.dryBulb()), toCelsius(fresh.supplyOut.state.dryBulb()), 1e-6)
        << row.name;
    EXPECT_NEAR(toCelsius(remembered.extractOut.state.dryBulb()), toCelsius(fresh.extractOut.state.dryBulb()), 1e-6)
        << row.name;
    EXPECT_NEAR(remembered.detail.recovered.value(), fresh.detail.recovered.value(),
                1e-6 * std::abs(fresh.detail.recovered.value()))
        << row.name;
    EXPECT_EQ(remembered.findings, fresh.findings) << row.name;
    // And the outcome did move: the change was not lost.
    const bool moved = remembered.supplyOut.state != old.supplyOut.state
                       || remembered.extractOut.state != old.extractOut.state
                       || remembered.detail.bypassFraction.value() != old.detail.bypassFraction.value();
    EXPECT_TRUE(moved) << row.name;
}

INSTANTIATE_TEST_SUITE_P(
    HeatRecoveryEvaluator, MemoryFollowsInputs,
    ::testing::Values(
        InputChange{"supply_temperature", [](HeatRecoveryInputs& in) { in.supplyIn = stream(10.001, 70.0, 3.0); }},
        InputChange{"supply_humidity", [](HeatRecoveryInputs& in) { in.supplyIn = stream(10.0, 71.0, 3.0); }},
        InputChange{"supply_flow", [](HeatRecoveryInputs& in) { in.supplyIn.dryAir = kilogramsPerSecond(2.9); }},
        InputChange{"extract_temperature", [](HeatRecoveryInputs& in) { in.extractIn = stream(22.5, 45.0, 3.0); }},
        InputChange{"extract_flow", [](HeatRecoveryInputs& in) { in.extractIn.dryAir = kilogramsPerSecond(3.2); }},
        InputChange{"target_small_step", [](HeatRecoveryInputs& in) { in.supplyTarget = celsius(17.7001); }},
        InputChange{"target_large_step", [](HeatRecoveryInputs& in) { in.supplyTarget = celsius(16.0); }},
        InputChange{"target_removed", [](HeatRecoveryInputs& in) { in.supplyTarget.reset(); }},
        InputChange{"fixed_bypass", [](HeatRecoveryInputs& in) { in.fixedBypass = fraction(0.5); }},
        InputChange{"no_extract_air", [](HeatRecoveryInputs& in) { in.extractIn.dryAir = kilogramsPerSecond(0.0); },
                    false},
        InputChange{"bypass_above_one", [](HeatRecoveryInputs& in) { in.fixedBypass = fraction(1.5); }, false}),
    [](const ::testing::TestParamInfo<InputChange>& i) { return std::string(i.param.name); });

TEST(HeatRecoveryEvaluator, TargetOutOfReachKeepsTheOutcomeUntilItComesIntoReach)
{
    // Cold day with frost protection: full recovery falls short of any usual
    // target, so a new target changes nothing (the chain's later passes).
    const HeatRecoveryEvaluator evaluator(plate(), kDesignFlow);
    HeatRecoveryEvaluator::Memory memory;
    HeatRecoveryInputs in;
    in.supplyIn = stream(-12.0, 90.0, 3.0);
    in.extractIn = stream(21.0, 35.0, 3.0);
    in.supplyTarget = celsius(18.7);
    const HeatRecoveryOutcome first = evaluator.evaluate(in, memory);
    ASSERT_TRUE(first.detail.frost.risk);
    in.supplyTarget = celsius(18.6);
    const HeatRecoveryOutcome second = evaluator.evaluate(in, memory);
    EXPECT_EQ(memory.evaluations, 1);
    expectSameOutcome(second, evaluator.evaluate(in), "out of reach");
    // A target below what full recovery reaches brings the bypass control in.
    in.supplyTarget = celsius(-5.0);
    const HeatRecoveryOutcome third = evaluator.evaluate(in, memory);
    EXPECT_EQ(memory.evaluations, 2);
    const HeatRecoveryOutcome fresh = evaluator.evaluate(in);
    EXPECT_NEAR(toCelsius(third.supplyOut.state.dryBulb()), toCelsius(fresh.supplyOut.state.dryBulb()), 1e-6);
    EXPECT_NEAR(third.detail.bypassFraction.value(), fresh.detail.bypassFraction.value(), 1e-8);
    EXPECT_GT(third.detail.bypassFraction.value(), first.detail.bypassFraction.value());
}

TEST(HeatRecoveryEvaluator, MemoryOfAnotherEvaluatorStartsEmpty)
{
    const HeatRecoveryEvaluator a(plate(), kDesignFlow);
    HeatRecovery other = plate();
    other.ratedEfficiency = percent(70.0);
    const HeatRecoveryEvaluator b(other, kDesignFlow);
    HeatRecoveryEvaluator::Memory memory;
    const HeatRecoveryInputs in = mildDay();
    a.evaluate(in, memory);
    const HeatRecoveryOutcome fromB = b.evaluate(in, memory);
    EXPECT_EQ(memory.evaluations, 1); // started afresh for b
    const HeatRecoveryOutcome freshB = b.evaluate(in);
    EXPECT_NEAR(fromB.detail.temperatureEffectiveness.value(), freshB.detail.temperatureEffectiveness.value(), 1e-9);
    EXPECT_EQ(fromB.detail.regulationThermalEfficiency.value(), freshB.detail.regulationThermalEfficiency.value());
}

TEST(HeatRecoveryEvaluator, WarmStartedFrostProtectionFindsTheSameBypass)
{
    // Frost protection by bypass, solved from the last pass's root (the chain's
    // next pass) and afresh: the same root to the solve's tolerance (1e-4 of
    // bypass share, kControlTolerance), as the outdoor air moves between passes by
    // small steps and by a large one. The model against itself.
    const HeatRecoveryEvaluator evaluator(plate(FrostStrategy::Bypass), kDesignFlow);
    HeatRecoveryEvaluator::Memory memory;
    HeatRecoveryInputs in;
    in.extractIn = stream(21.0, 35.0, 3.0);
    int protectedCases = 0;
    for (double outdoor : {-12.0, -12.01, -11.9, -15.0, -8.0, -20.0}) {
        in.supplyIn = stream(outdoor, 80.0, 3.0);
        const HeatRecoveryOutcome& warm = evaluator.evaluate(in, memory);
        const HeatRecoveryOutcome cold = evaluator.evaluate(in);
        ASSERT_TRUE(cold.detail.frost.risk) << outdoor;
        protectedCases += cold.detail.bypassFraction.value() > 0.0 ? 1 : 0;
        EXPECT_NEAR(warm.detail.bypassFraction.value(), cold.detail.bypassFraction.value(), 2e-4) << outdoor;
        EXPECT_NEAR(warm.detail.recovered.value(), cold.detail.recovered.value(),
                    1e-3 * std::abs(cold.detail.recovered.value()))
            << outdoor;
    }
    EXPECT_EQ(protectedCases, 6); // each point needed the bypass
}
