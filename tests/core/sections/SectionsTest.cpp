// Single sections, computed alone: the formulas of each section against hand
// calculations (each check says how its number was obtained), and a table of
// invalid descriptions that validate() must reject.

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/core/sections/CoolingCoil.h"
#include "airwright/core/sections/Damper.h"
#include "airwright/core/sections/ElectricHeater.h"
#include "airwright/core/sections/Fan.h"
#include "airwright/core/sections/Filter.h"
#include "airwright/core/sections/Humidifier.h"
#include "airwright/core/sections/PassiveSection.h"
#include "airwright/core/sections/WaterHeatingCoil.h"

#include <gtest/gtest.h>

#include <cmath>
#include <functional>

using namespace Airwright::Core;
using namespace Airwright::Core::Sections;

namespace {

const Pressure kSea = pascals(101325.0);

AirStream stream(double tdb, double rhPct, double dryAirKgs)
{
    return {Psychro::MoistAirState::fromDryBulbRelativeHumidity(celsius(tdb), percent(rhPct), kSea),
            kilogramsPerSecond(dryAirKgs)};
}

SectionContext contextAt(double velocity)
{
    SectionContext ctx;
    ctx.crossSection = squareMetres(1.0);
    ctx.faceVelocity = metresPerSecond(velocity);
    ctx.pathDesignFlow = cubicMetresPerSecond(2.0);
    return ctx;
}

} // namespace

TEST(Damper, PressureDropFromLossCoefficient)
{
    Damper damper;
    damper.lossCoefficient = 0.4;
    const auto in = stream(20.0, 50.0, 2.0);
    Damper::Detail d;
    const auto out = damper.compute(in, contextAt(2.5), d);
    // Hand calculation: dp = zeta rho v^2 / 2 with the moist-air density at the inlet.
    const double rho = in.state.density().value();
    EXPECT_NEAR(out.pressureDrop.value(), 0.4 * rho * 2.5 * 2.5 / 2.0, 1e-12);
    EXPECT_EQ(out.outlet.state, in.state);
}

TEST(Filter, DesignDropIsMeanOfInitialAndFinalAndScalesWithFlow)
{
    Filter filter;
    filter.group = FilterGroup::IsoEpm1;
    filter.initialPressureDrop = pascals(80.0);
    filter.finalPressureDrop = pascals(300.0);
    filter.flowExponent = 1.3;
    // EN 13053: the design value for fan sizing is the mean of initial and final.
    EXPECT_NEAR(filter.designDrop().value(), 190.0, 1e-12);

    const auto in = stream(20.0, 50.0, 1.0);
    auto ctx = contextAt(2.0);
    ctx.pathDesignFlow = in.volumeFlow() / 1.2; // running at 120 % of nominal
    Filter::Detail d;
    ctx.filterCondition = FilterCondition::Final;
    const auto out = filter.compute(in, ctx, d);
    // Hand calculation: 300 Pa x 1.2^1.3.
    EXPECT_NEAR(out.pressureDrop.value(), 300.0 * std::pow(1.2, 1.3), 1e-9);
    EXPECT_NEAR(d.initialDrop.value(), 80.0 * std::pow(1.2, 1.3), 1e-9);
    EXPECT_NEAR(d.alarmSetpoint.value(), d.finalDrop.value(), 1e-12);
}

TEST(Filter, DefaultFinalDropPerGroup)
{
    // EN 13053 recommended final pressure drops (from memory): coarse 150, medium 200, fine 300 Pa.
    EXPECT_NEAR(Filter::defaultFinalPressureDrop(FilterGroup::IsoCoarse).value(), 150.0, 0.0);
    EXPECT_NEAR(Filter::defaultFinalPressureDrop(FilterGroup::IsoEpm10).value(), 200.0, 0.0);
    EXPECT_NEAR(Filter::defaultFinalPressureDrop(FilterGroup::IsoEpm1).value(), 300.0, 0.0);
}

TEST(Filter, WarnsAboveNinetyPercentHumidity)
{
    Filter filter;
    Filter::Detail d;
    const auto out = filter.compute(stream(5.0, 95.0, 1.0), contextAt(2.0), d);
    ASSERT_EQ(out.findings.size(), 1u);
    EXPECT_EQ(out.findings[0].code, "filter.humidity"); // EN 13053: at most 90 % RH at filters
}

TEST(WaterHeatingCoil, LogMeanTemperatureDifference)
{
    // Hand calculation: (30 - 10) / ln(30 / 10) = 18.2048 K.
    EXPECT_NEAR(logMeanTemperatureDifference(kelvinDifference(30.0), kelvinDifference(10.0))->value(), 18.20478, 1e-5);
    EXPECT_NEAR(logMeanTemperatureDifference(kelvinDifference(40.0), kelvinDifference(40.0))->value(), 40.0, 1e-12);
    EXPECT_FALSE(logMeanTemperatureDifference(kelvinDifference(-1.0), kelvinDifference(10.0)).has_value());
}

TEST(WaterHeatingCoil, HeatsToTargetAndBalancesWithTheWaterSide)
{
    WaterHeatingCoil coil;
    coil.flowTemperature = celsius(60.0);
    coil.returnTemperature = celsius(40.0);
    const auto in = stream(0.0, 80.0, 2.0);
    auto ctx = contextAt(2.0);
    ctx.target.outletTemperature = celsius(20.0);
    WaterHeatingCoil::Detail d;
    const auto out = coil.compute(in, ctx, d);
    EXPECT_NEAR(toCelsius(out.outlet.state.dryBulb()), 20.0, 1e-9);
    const double airSide = 2.0 * (out.outlet.state.enthalpy() - in.state.enthalpy()).value();
    EXPECT_NEAR(d.duty.value(), airSide, 1e-6);
    // Water side: Q = m cp (t_flow - t_return), cp of water at the 50 C mean.
    const double cp = coil.fluid.specificHeat(celsius(50.0)).value();
    EXPECT_NEAR(d.fluidFlow.value() * cp * 20.0, airSide, 1e-6 * airSide);
    // Both ends 40 K apart (60 - 20, 40 - 0): LMTD 40 K, UA = Q / 40.
    EXPECT_NEAR(d.lmtd->value(), 40.0, 1e-9);
    EXPECT_NEAR(d.requiredUa->value(), airSide / 40.0, 1e-6);
    // Air-side pressure drop: 2 rows x 12 Pa at 2 m/s.
    EXPECT_NEAR(out.pressureDrop.value(), 24.0, 1e-9);
}

TEST(WaterHeatingCoil, CapacityLimitIsAFinding)
{
    WaterHeatingCoil coil;
    coil.capacity = kilowatts(10.0);
    auto ctx = contextAt(2.0);
    ctx.target.outletTemperature = celsius(20.0);
    WaterHeatingCoil::Detail d;
    const auto out = coil.compute(stream(-10.0, 80.0, 2.0), ctx, d);
    EXPECT_TRUE(d.capacityLimited);
    EXPECT_NEAR(toKilowatts(d.duty), 10.0, 1e-9);
    EXPECT_LT(toCelsius(out.outlet.state.dryBulb()), 20.0);
}

TEST(ElectricHeater, StepsAndLineCurrent)
{
    ElectricHeater heater;
    heater.ratedPower = kilowatts(30.0);
    heater.steps = 3;
    const auto in = stream(10.0, 50.0, 1.0);
    auto ctx = contextAt(2.0);
    // Demand: about 1 kg/s x 1.01 kJ/kgK x 12 K = 12 kW: the second of three 10 kW steps.
    ctx.target.outletTemperature = celsius(22.0);
    ElectricHeater::Detail d;
    heater.compute(in, ctx, d);
    EXPECT_EQ(d.stepsOn, 2);
    EXPECT_NEAR(toKilowatts(d.duty), 20.0, 1e-9);
    // Hand calculation: I = P / (sqrt(3) x 400 V) = 30000 / 692.82 = 43.30 A.
    EXPECT_NEAR(toAmperes(d.lineCurrent), 43.30127, 1e-4);
}

TEST(Fan, PowerFromFlowPressureAndEfficiencies)
{
    Fan fan;
    fan.fanEfficiency = percent(68.0);
    fan.motorEfficiency = percent(93.0);
    fan.driveEfficiency = percent(100.0);
    fan.controllerEfficiency = percent(97.0);
    const auto in = stream(20.0, 50.0, 2.0);
    auto ctx = contextAt(2.0);
    ctx.fanTotalPressure = pascals(800.0);
    Fan::Detail d;
    const auto out = fan.compute(in, ctx, d);
    const double q = in.volumeFlow().value();
    // Hand calculation: P = q pt / (0.68 x 0.93 x 1.0 x 0.97).
    EXPECT_NEAR(d.electricPower.value(), q * 800.0 / (0.68 * 0.93 * 0.97), 1e-9);
    EXPECT_NEAR(d.shaftPower.value(), q * 800.0 / 0.68, 1e-9);
    EXPECT_NEAR(out.pressureDrop.value(), -800.0, 0.0);
    // All electric power heats the air (motor in the airstream): dt = P / (m cp).
    const double cp = 1006.0 + 1860.0 * in.state.humidityRatio().value();
    EXPECT_NEAR(d.temperatureRise.value(), d.electricPower.value() / (2.0 * cp), 1e-3);
}

TEST(Humidifier, SteamReachesMinimumHumidity)
{
    Humidifier humidifier;
    const auto in = stream(20.0, 10.0, 1.0);
    auto ctx = contextAt(2.0);
    ctx.target.minHumidity = gramsPerKilogram(6.0);
    Humidifier::Detail d;
    const auto out = humidifier.compute(in, ctx, d);
    EXPECT_NEAR(toGramsPerKilogram(out.outlet.state.humidityRatio()), 6.0, 1e-9);
    EXPECT_NEAR(d.waterAdded.value(), 1.0 * (gramsPerKilogram(6.0) - in.state.humidityRatio()).value(), 1e-12);
    // Steam at 100 C brings (2501 + 1.86 x 100) kJ/kg, about 149 kJ/kg more than
    // vapour at 20 C: 4.5 g/kg x 149 kJ/kg / 1.01 kJ/kgK = about 0.66 K (hand calculation).
    EXPECT_NEAR(toCelsius(out.outlet.state.dryBulb()) - 20.0, 0.66, 0.03);
    EXPECT_GT(toCelsius(out.outlet.state.dryBulb()) - 20.0, 0.0);
}

TEST(Humidifier, AdiabaticFollowsWetBulbAndIsLimitedByEfficiency)
{
    Humidifier humidifier;
    humidifier.kind = HumidifierKind::Adiabatic;
    humidifier.saturationEfficiency = percent(80.0);
    const auto in = stream(30.0, 10.0, 1.0);
    auto ctx = contextAt(2.0);
    ctx.target.minHumidity = gramsPerKilogram(30.0); // unreachable
    Humidifier::Detail d;
    const auto out = humidifier.compute(in, ctx, d);
    const double twb = toCelsius(in.state.wetBulb());
    // t2 = t1 - eff (t1 - twb): the definition of saturation efficiency.
    EXPECT_NEAR(toCelsius(out.outlet.state.dryBulb()), 30.0 - 0.8 * (30.0 - twb), 0.02);
    EXPECT_FALSE(d.targetReached);
}

TEST(PassiveSection, ScalesWithVelocitySquared)
{
    PassiveSection silencer;
    silencer.ratedPressureDrop = pascals(40.0);
    PassiveSection::Detail d;
    EXPECT_NEAR(silencer.compute(stream(20, 50, 1), contextAt(3.0), d).pressureDrop.value(), 40.0 * 2.25, 1e-12);
}

struct InvalidSectionRow {
    const char* name;
    std::function<void()> validate;
};

class InvalidSection : public ::testing::TestWithParam<InvalidSectionRow> {};

TEST_P(InvalidSection, ValidateThrows)
{
    EXPECT_THROW(GetParam().validate(), InputError);
}

std::string invalidSectionName(const ::testing::TestParamInfo<InvalidSectionRow>& row)
{
    return row.param.name;
}

INSTANTIATE_TEST_SUITE_P(
    Rows, InvalidSection,
    ::testing::Values(
        InvalidSectionRow{"damper_negative_zeta", [] { Damper d; d.lossCoefficient = -1.0; d.validate(); }},
        InvalidSectionRow{"damper_class_5", [] { Damper d; d.leakageClass = 5; d.validate(); }},
        InvalidSectionRow{"filter_epm1_below_50", [] { Filter f; f.efficiency = percent(40.0); f.validate(); }},
        InvalidSectionRow{"filter_final_below_initial",
                          [] { Filter f; f.finalPressureDrop = pascals(50.0); f.validate(); }},
        InvalidSectionRow{"filter_nan_dp", [] { Filter f; f.initialPressureDrop = pascals(std::nan("")); f.validate(); }},
        InvalidSectionRow{"coil_return_above_flow",
                          [] { WaterHeatingCoil c; c.returnTemperature = celsius(80.0); c.validate(); }},
        InvalidSectionRow{"coil_zero_rows", [] { WaterHeatingCoil c; c.rows = 0; c.validate(); }},
        InvalidSectionRow{"cooling_outlet_below_inlet",
                          [] { CoolingCoil c; c.waterOutletTemperature = celsius(5.0); c.validate(); }},
        InvalidSectionRow{"cooling_bypass_one", [] { CoolingCoil c; c.bypassFactor = fraction(1.0); c.validate(); }},
        InvalidSectionRow{"heater_negative_rating",
                          [] { ElectricHeater h; h.ratedPower = kilowatts(-3.0); h.validate(); }},
        InvalidSectionRow{"humidifier_zero_efficiency",
                          [] { Humidifier h; h.saturationEfficiency = percent(0.0); h.validate(); }},
        InvalidSectionRow{"fan_efficiency_over_100", [] { Fan f; f.fanEfficiency = percent(120.0); f.validate(); }},
        InvalidSectionRow{"fan_ie6", [] { Fan f; f.motorIeClass = 6; f.validate(); }},
        InvalidSectionRow{"silencer_negative_length", [] { PassiveSection p; p.length = metres(-1.0); p.validate(); }}),
    invalidSectionName);

TEST(ValidSections, DefaultsAreValid)
{
    EXPECT_NO_THROW(Damper{}.validate());
    EXPECT_NO_THROW(Filter{}.validate());
    EXPECT_NO_THROW(WaterHeatingCoil{}.validate());
    EXPECT_NO_THROW(ElectricHeater{}.validate());
    EXPECT_NO_THROW(CoolingCoil{}.validate());
    EXPECT_NO_THROW(Humidifier{}.validate());
    EXPECT_NO_THROW(Fan{}.validate());
    EXPECT_NO_THROW(PassiveSection{}.validate());
}
