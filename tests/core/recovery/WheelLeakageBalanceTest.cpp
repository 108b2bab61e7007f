// Energy and water balance of a wheel with crossing flows (EATR, OACF). The
// points are those of random projects (ChainPropertyTest) where the two sides
// missed the balance by up to about 1 % of the duty: water condensed in the core
// and then mixed with the leakage air was counted at the core's temperature while
// the air it left with ended at another.
//
// Principle: steady-flow energy balance of an adiabatic device (ASHRAE
// Fundamentals 2017 ch. 1 and ch. 2, moist-air mixing and processes):
//   sum m_da h (in) = sum m_da h (out) + m_condensate h_w(t),
// with liquid water at 4186 t J/kg (the psychro layer's convention) leaving at
// the temperature of the air it drops out of; dry air and water balance likewise.
// Leakage ratios as EN 308 defines them (EATR: extract air carried into the
// supply; OACF: outdoor air taken in over supply air delivered).

#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include <gtest/gtest.h>

#include <cmath>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Recovery;
using Airwright::Core::Psychro::MoistAirState;

namespace {

struct WheelPoint {
    const char* name;
    ExchangerKind kind;
    double ratedEfficiencyPct, ratedHumidityPct;
    double eatrPct, oacf;
    double pressurePa;
    double outdoorC, outdoorWgkg, outdoorKgs;
    double extractC, extractWgkg, extractKgs;
    bool supplyFogs; // which side ends saturated with the condensate (the other stays below)
};

void PrintTo(const WheelPoint& p, std::ostream* os) { *os << p.name; }

Sections::AirStream stream(double tC, double wGkg, double kgs, double pPa)
{
    return {MoistAirState::fromDryBulbHumidityRatio(celsius(tC), kilogramsPerKilogram(wGkg / 1000.0), pascals(pPa)),
            kilogramsPerSecond(kgs)};
}

double enthalpyFlow(const Sections::AirStream& s) { return s.dryAir.value() * s.state.enthalpy().value(); }
double waterFlow(const Sections::AirStream& s) { return s.dryAir.value() * s.state.humidityRatio().value(); }

class WheelLeakageBalance : public ::testing::TestWithParam<WheelPoint> {};

} // namespace

TEST_P(WheelLeakageBalance, BothSidesAndCondensateBalance)
{
    const WheelPoint& p = GetParam();
    HeatRecovery spec;
    spec.kind = p.kind;
    spec.ratedEfficiency = percent(p.ratedEfficiencyPct);
    spec.ratedHumidityEfficiency = percent(p.ratedHumidityPct);
    spec.exhaustAirTransfer = percent(p.eatrPct);
    spec.outdoorAirCorrection = p.oacf;
    spec.frostStrategy = FrostStrategy::None; // full recovery: the most water moved
    const HeatRecoveryEvaluator evaluator(spec, cubicMetresPerSecond(p.outdoorKgs / 1.2));
    HeatRecoveryInputs in;
    in.supplyIn = stream(p.outdoorC, p.outdoorWgkg, p.outdoorKgs, p.pressurePa);
    in.extractIn = stream(p.extractC, p.extractWgkg, p.extractKgs, p.pressurePa);
    const HeatRecoveryOutcome out = evaluator.evaluate(in);

    // Dry air: what crosses leaves on the other side (rounding, 1e-12 kg/s).
    EXPECT_NEAR(in.supplyIn.dryAir.value() + in.extractIn.dryAir.value(),
                out.supplyOut.dryAir.value() + out.extractOut.dryAir.value(), 1e-12);
    const double condensate = out.detail.condensate.value();
    ASSERT_GT(condensate, 0.0) << "the point must condense to test the condensate's enthalpy";
    // Water: in = out + condensate (1e-12 kg/s: rounding).
    EXPECT_NEAR(waterFlow(in.supplyIn) + waterFlow(in.extractIn),
                waterFlow(out.supplyOut) + waterFlow(out.extractOut) + condensate, 1e-12);
    // The condensate drops out of one side, which ends saturated; the other ends
    // below saturation, so all the water leaves at the first side's outlet.
    const auto& wet = p.supplyFogs ? out.supplyOut : out.extractOut;
    const auto& dry = p.supplyFogs ? out.extractOut : out.supplyOut;
    EXPECT_NEAR(wet.state.relativeHumidity().value(), 1.0, 1e-6);
    ASSERT_LT(dry.state.relativeHumidity().value(), 0.999);
    // Energy to 1e-3 of the duty (the reliability issue's 0.1 %).
    const double duty = enthalpyFlow(out.supplyOut) - enthalpyFlow(in.supplyIn);
    const double in_ = enthalpyFlow(in.supplyIn) + enthalpyFlow(in.extractIn);
    const double out_ = enthalpyFlow(out.supplyOut) + enthalpyFlow(out.extractOut)
                        + condensate * Psychro::liquidWaterEnthalpy(wet.state.dryBulb()).value();
    EXPECT_NEAR(in_, out_, 1e-3 * std::abs(duty));
}

INSTANTIATE_TEST_SUITE_P(
    CrossingFlowPoints, WheelLeakageBalance,
    ::testing::Values(
        // Summer case of random project 87: humid extract condenses on the cold
        // wheel, then the purge (OACF 1.18) mixes cold outdoor air into it.
        WheelPoint{"enthalpy_cold_purge", ExchangerKind::RotaryHygroscopic, 75.0, 70.0, 4.2, 1.184, 94000.0, -16.6, 0.6,
                   3.65, 38.4, 30.0, 3.6, false},
        // A condensation wheel in winter with a large purge.
        WheelPoint{"condensation_cold_purge", ExchangerKind::RotaryNonHygroscopic, 70.0, 0.0, 5.7, 1.228, 101325.0,
                   -10.0, 1.0, 1.5, 22.0, 12.0, 1.3, false},
        // OACF below 1 - EATR: extract air crosses beyond EATR into the supply.
        WheelPoint{"enthalpy_oacf_below_one", ExchangerKind::RotaryHygroscopic, 78.0, 72.0, 2.9, 0.93, 101325.0, -5.0,
                   2.0, 2.0, 30.0, 24.0, 2.6, false}),
    [](const ::testing::TestParamInfo<WheelPoint>& row) { return std::string(row.param.name); });
