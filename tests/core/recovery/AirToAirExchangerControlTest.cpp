// The shortcuts the control and frost solves take (AirToAirExchanger::
// controlFigures, the warm-started controlSupplyTemperature) against the full
// evaluation and the cold solve: the model against itself, so no outside source
// applies; tolerances are those of the solves.

#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/recovery/AirToAirExchanger.h"

#include <gtest/gtest.h>

#include <cmath>
#include <optional>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Recovery;
using Airwright::Core::Psychro::MoistAirState;

namespace {

const Pressure kP = pascals(101325.0);

MoistAirState air(double tC, double rhPercent)
{
    return MoistAirState::fromDryBulbRelativeHumidity(celsius(tC), percent(rhPercent), kP);
}

AirToAirExchanger exchanger(ExchangerKind kind)
{
    ExchangerRating r;
    r.kind = kind;
    r.ratedTemperatureEfficiency = fraction(kind == ExchangerKind::PlateCrossFlow ? 0.62 : 0.75);
    r.ratedVolumeFlow = cubicMetresPerSecond(2.0);
    r.ratedSupplyPressureDrop = pascals(150.0);
    r.ratedExtractPressureDrop = pascals(140.0);
    if (kind == ExchangerKind::RotaryHygroscopic)
        r.ratedHumidityEfficiency = fraction(0.7);
    return AirToAirExchanger(r);
}

struct FigureCase {
    const char* name;
    ExchangerKind kind;
    double tSup, rhSup, tExt, rhExt;
    double bypass, speed;
};

class ControlFigures : public ::testing::TestWithParam<FigureCase> {};

} // namespace

TEST_P(ControlFigures, AgreeWithTheFullEvaluation)
{
    const FigureCase& c = GetParam();
    const AirToAirExchanger x = exchanger(c.kind);
    const double m = toKilogramsPerSecond(x.ratedDryAirFlow());
    const ExchangerOperatingPoint p{air(c.tSup, c.rhSup), kilogramsPerSecond(m), air(c.tExt, c.rhExt),
                                    kilogramsPerSecond(0.95 * m), fraction(c.bypass), fraction(c.speed)};
    const ExchangerPerformance full = x.evaluate(p);
    const AirToAirExchanger::ControlFigures quick = x.controlFigures(p);
    // Same core computation; the mixing of core and bypass air repeats
    // Psychro::mix's arithmetic, so agreement to rounding (1e-9 K).
    EXPECT_NEAR(toCelsius(quick.supplyOutlet), toCelsius(full.supplyOutlet.dryBulb()), 1e-9) << c.name;
    EXPECT_EQ(quick.frostMargin, full.frostMargin) << c.name;
    EXPECT_EQ(quick.frostMargin < 0.0, full.frostRisk) << c.name;

    // With what a solve works out once, from the point at another control value:
    // the same figures, the flow scaling split as (m/m_r)^n (1 - bypass)^n (rounding).
    ExchangerOperatingPoint other = p;
    other.bypassFraction = fraction(0.0);
    other.rotorSpeedRatio = fraction(1.0);
    const AirToAirExchanger::ControlFigures reused = x.controlFigures(p, x.invariants(other));
    EXPECT_NEAR(toCelsius(reused.supplyOutlet), toCelsius(quick.supplyOutlet), 1e-9) << c.name;
    EXPECT_NEAR(reused.frostMargin, quick.frostMargin, 1e-9) << c.name;
    EXPECT_EQ(reused.frostMargin < 0.0, full.frostRisk) << c.name;
}

INSTANTIATE_TEST_SUITE_P(
    AirToAirExchanger, ControlFigures,
    ::testing::Values(FigureCase{"counter_wet_frosting", ExchangerKind::PlateCounterFlow, -15, 80, 22, 40, 0, 1},
                      FigureCase{"counter_bypass", ExchangerKind::PlateCounterFlow, 10, 70, 22, 45, 0.35, 1},
                      FigureCase{"cross_counter_wet_bypass", ExchangerKind::PlateCrossCounterFlow, -8, 90, 22, 50,
                                 0.2, 1},
                      FigureCase{"cross_summer_condensing_supply", ExchangerKind::PlateCrossFlow, 32, 70, 24, 50,
                                 0.5, 1},
                      FigureCase{"rotor_slow", ExchangerKind::RotaryHygroscopic, -10, 85, 22, 40, 0, 0.3},
                      FigureCase{"loop_bypass", ExchangerKind::RunAroundCoil, -5, 80, 21, 40, 0.25, 1},
                      FigureCase{"all_bypassed", ExchangerKind::PlateCounterFlow, 0, 80, 22, 40, 1, 1}),
    [](const ::testing::TestParamInfo<FigureCase>& i) { return std::string(i.param.name); });

TEST(AirToAirExchanger, WarmStartedControlFindsTheSameRoot)
{
    for (ExchangerKind kind : {ExchangerKind::PlateCounterFlow, ExchangerKind::PlateCrossCounterFlow,
                               ExchangerKind::RotaryHygroscopic, ExchangerKind::RunAroundCoil}) {
        const AirToAirExchanger x = exchanger(kind);
        const double m = toKilogramsPerSecond(x.ratedDryAirFlow());
        const ExchangerOperatingPoint p{air(10, 70), kilogramsPerSecond(m), air(22, 45), kilogramsPerSecond(m)};
        const SetpointControlResult cold = x.controlSupplyTemperature(p, celsius(16.5));
        ASSERT_TRUE(cold.setpointReached) << toString(kind);
        // Starts near, far, at either end, and one with the full-recovery outlet known.
        const auto fullOutlet = x.controlSupplyTemperature(p, celsius(40.0)).performance.supplyOutlet.dryBulb();
        // The solve reports the full-recovery outlet it used and a slope of the sign
        // of the chord from no to full recovery.
        ASSERT_TRUE(cold.fullRecoveryOutlet.has_value()) << toString(kind);
        EXPECT_NEAR(toCelsius(*cold.fullRecoveryOutlet), toCelsius(fullOutlet), 1e-9) << toString(kind);
        ASSERT_TRUE(cold.outletChangePerControl.has_value()) << toString(kind);
        const double chordSign = isRotary(kind) ? 1.0 : -1.0;
        EXPECT_GT(cold.outletChangePerControl->value() * chordSign, 0.0) << toString(kind);
        // Slopes given to the warm start: none, the one found, a poor one, one of
        // the wrong sign (ignored).
        const double found = cold.outletChangePerControl->value();
        const std::optional<double> slopes[] = {std::nullopt, found, 5.0 * found, -found};
        for (double startAt : {toFraction(cold.control) + 1e-4, toFraction(cold.control) - 0.2, 0.0, 1.0}) {
            for (int variant = 0; variant < 8; ++variant) {
                const bool knowFull = variant % 2 == 1;
                const std::optional<double> slope = slopes[variant / 2];
                AirToAirExchanger::ControlStart start{fraction(startAt), {}, {}};
                if (knowFull)
                    start.fullRecoveryOutlet = fullOutlet;
                if (slope)
                    start.outletChangePerControl = kelvinDifference(*slope);
                const SetpointControlResult warm = x.controlSupplyTemperature(p, celsius(16.5), start);
                EXPECT_TRUE(warm.setpointReached) << toString(kind) << " from " << startAt;
                // Both solves stop within 1e-9 of the root.
                EXPECT_NEAR(toFraction(warm.control), toFraction(cold.control), 2e-9)
                    << toString(kind) << " from " << startAt;
                EXPECT_NEAR(toCelsius(warm.performance.supplyOutlet.dryBulb()), 16.5, 1e-6) << toString(kind);
            }
        }
    }
}
