#include "airwright/core/psychro/AirProcesses.h"

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <cmath>
#include <functional>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Psychro;

// Balances per kg dry air on ASHRAE Fundamentals 2017 ch. 1 eq. 30 (enthalpy)
// and the liquid enthalpy 4.186 t kJ/kg of the condensate leaving at the outlet
// temperature (ch. 1, "Typical air-conditioning processes").

namespace {

const Pressure kAtm = pascals(101325.0);

double h(const MoistAirState& s) { return toJoulesPerKilogram(s.enthalpy()); }
double w(const MoistAirState& s) { return toKilogramsPerKilogram(s.humidityRatio()); }
double t(const MoistAirState& s) { return toCelsius(s.dryBulb()); }
double cond(const ProcessOutcome& o) { return toKilogramsPerKilogram(o.condensate); }
double condensateEnthalpy(const ProcessOutcome& o)
{
    return cond(o) * toJoulesPerKilogram(liquidWaterEnthalpy(o.outlet.dryBulb()));
}
MoistAirState state(double tC, double rhPct, Pressure p = kAtm)
{
    return MoistAirState::fromDryBulbRelativeHumidity(celsius(tC), percent(rhPct), p);
}

} // namespace

TEST(AirProcesses, ClampLeavesAnUnsaturatedStateAlone)
{
    const ProcessOutcome o = clampToSaturation(celsius(20.0), gramsPerKilogram(7.0), kAtm);
    EXPECT_FALSE(o.clamped);
    EXPECT_EQ(cond(o), 0.0);
    EXPECT_EQ(w(o.outlet), 0.007);
    EXPECT_NEAR(t(o.outlet), 20.0, 1e-12);
}

TEST(AirProcesses, ClampConservesWaterAndEnergy)
{
    for (const double tC : {-20.0, 2.0, 15.0, 30.0}) {
        const double ws = toKilogramsPerKilogram(saturationHumidityRatio(celsius(tC), kAtm));
        const double w1 = ws + 0.002;
        const ProcessOutcome o = clampToSaturation(celsius(tC), kilogramsPerKilogram(w1), kAtm);
        EXPECT_TRUE(o.clamped);
        EXPECT_NEAR(w(o.outlet) + cond(o), w1, 1e-15) << tC;                                         // water
        EXPECT_NEAR(h(o.outlet) + condensateEnthalpy(o), toJoulesPerKilogram(enthalpy(celsius(tC), kilogramsPerKilogram(w1))), 1e-6) << tC; // energy
        EXPECT_NEAR(toFraction(o.outlet.relativeHumidity()), 1.0, 1e-9) << tC;
        EXPECT_GT(t(o.outlet), tC); // latent heat released by the fog warms the air
        EXPECT_GT(cond(o), 0.0);
        EXPECT_LT(cond(o), 0.002);
    }
}

TEST(AirProcesses, HeatingKeepsHumidityRatio)
{
    const MoistAirState in = state(5.0, 80.0);
    const ProcessOutcome o = heatToTemperature(in, celsius(22.0));
    EXPECT_FALSE(o.clamped);
    EXPECT_EQ(w(o.outlet), w(in));
    EXPECT_NEAR(t(o.outlet), 22.0, 1e-12);
    // eq. 30 at constant W: dh = (1006 + 1860 W) dt
    EXPECT_NEAR(h(o.outlet) - h(in), (1006.0 + 1860.0 * w(in)) * 17.0, 1e-6);
}

TEST(AirProcesses, CoolingBelowTheDewPointCondenses)
{
    const MoistAirState in = state(26.0, 60.0);
    const ProcessOutcome o = heatToTemperature(in, celsius(12.0));
    EXPECT_TRUE(o.clamped);
    EXPECT_NEAR(t(o.outlet), 12.0, 1e-12);
    EXPECT_NEAR(toFraction(o.outlet.relativeHumidity()), 1.0, 1e-12);
    EXPECT_NEAR(w(o.outlet) + cond(o), w(in), 1e-15);
}

TEST(AirProcesses, HeatByDutyBalancesEnergy)
{
    const MoistAirState in = state(10.0, 50.0);
    const MassFlow m = kilogramsPerSecond(2.0);
    for (const double q : {30000.0, -5000.0, -40000.0}) {
        const ProcessOutcome o = heatByDuty(in, watts(q), m);
        // Q = m (h2 + condensate h_w(t2) - h1)
        EXPECT_NEAR(2.0 * (h(o.outlet) + condensateEnthalpy(o) - h(in)), q, 1e-5) << q;
        EXPECT_NEAR(w(o.outlet) + cond(o), w(in), 1e-15) << q;
    }
    EXPECT_TRUE(heatByDuty(in, watts(-40000.0), m).clamped); // 10 C - 20 K: far below the dew point
    EXPECT_NEAR(t(heatByDuty(in, watts(30000.0), m).outlet), 10.0 + 15000.0 / (1006.0 + 1860.0 * w(in)), 1e-9);
}

TEST(AirProcesses, MixingBalancesMassAndEnergy)
{
    const MoistAirState a = state(-10.0, 80.0);
    const MoistAirState b = state(22.0, 40.0);
    const ProcessOutcome o = mix(a, kilogramsPerSecond(1.0), b, kilogramsPerSecond(3.0));
    EXPECT_FALSE(o.clamped);
    EXPECT_NEAR(w(o.outlet), 0.25 * w(a) + 0.75 * w(b), 1e-15);
    EXPECT_NEAR(h(o.outlet), 0.25 * h(a) + 0.75 * h(b), 1e-6);
}

TEST(AirProcesses, MixingIntoFogIsClampedWithCondensate)
{
    // Cold outdoor air and warm, humid air: the straight mixing line crosses the
    // saturation curve (common practice: fog in mixing boxes in winter).
    const MoistAirState a = state(-15.0, 90.0);
    const MoistAirState b = state(35.0, 95.0);
    const ProcessOutcome o = mix(a, kilogramsPerSecond(1.0), b, kilogramsPerSecond(1.0));
    EXPECT_TRUE(o.clamped);
    EXPECT_GT(cond(o), 0.0);
    EXPECT_NEAR(w(o.outlet) + cond(o), 0.5 * (w(a) + w(b)), 1e-15);
    EXPECT_NEAR(h(o.outlet) + condensateEnthalpy(o), 0.5 * (h(a) + h(b)), 1e-6);
    EXPECT_NEAR(toFraction(o.outlet.relativeHumidity()), 1.0, 1e-9);
}

TEST(AirProcesses, SteamHumidifierAddsWaterAndVapourEnthalpy)
{
    const MoistAirState in = state(20.0, 20.0);
    const HumidityRatio target = gramsPerKilogram(8.0);
    const ProcessOutcome o = steamHumidify(in, target, celsius(100.0));
    EXPECT_FALSE(o.clamped);
    const double added = 0.008 - w(in);
    EXPECT_NEAR(w(o.outlet), 0.008, 1e-15);
    // h2 = h1 + dW h_g(ts), h_g = 2501 + 1.86 t kJ/kg (ASHRAE ch. 1 eq. 30's vapour term)
    EXPECT_NEAR(h(o.outlet), h(in) + added * (2501000.0 + 1860.0 * 100.0), 1e-6);
    EXPECT_GT(t(o.outlet), 20.0); // steam at 100 C warms the air slightly
    EXPECT_LT(t(o.outlet), 21.0);
}

TEST(AirProcesses, SteamBeyondSaturationCondenses)
{
    const MoistAirState in = state(15.0, 50.0);
    const ProcessOutcome o = steamHumidify(in, gramsPerKilogram(20.0), celsius(100.0));
    EXPECT_TRUE(o.clamped);
    EXPECT_NEAR(w(o.outlet) + cond(o), 0.020, 1e-15);
    EXPECT_NEAR(h(o.outlet) + condensateEnthalpy(o), h(in) + (0.020 - w(in)) * (2501000.0 + 1860.0 * 100.0), 1e-6);
}

TEST(AirProcesses, AdiabaticHumidifierFollowsTheWetBulbLine)
{
    const MoistAirState in = state(32.0, 25.0);
    const double twb = toCelsius(in.wetBulb());
    // Saturation efficiency 1: saturated at the wet bulb (eq. 33 is this balance).
    const ProcessOutcome full = adiabaticHumidify(in, fraction(1.0));
    EXPECT_NEAR(t(full.outlet), twb, 1e-9);
    EXPECT_NEAR(toFraction(full.outlet.relativeHumidity()), 1.0, 1e-9);
    EXPECT_LT(cond(full), 1e-12);
    // 70 %: h2 = h1 + (W2 - W1) 4.186 twb, and the wet bulb stays where it was.
    const ProcessOutcome part = adiabaticHumidify(in, fraction(0.7));
    EXPECT_NEAR(t(part.outlet), 32.0 - 0.7 * (32.0 - twb), 1e-12);
    EXPECT_NEAR(h(part.outlet), h(in) + (w(part.outlet) - w(in)) * 4186.0 * twb, 1e-6);
    EXPECT_NEAR(toCelsius(part.outlet.wetBulb()), twb, 1e-6);
    EXPECT_FALSE(part.clamped);
    // Efficiency 0: nothing happens.
    EXPECT_NEAR(w(adiabaticHumidify(in, fraction(0.0)).outlet), w(in), 1e-15);
}

TEST(AirProcesses, CoilByApparatusDewPointAndBypassFactor)
{
    const MoistAirState in = state(28.0, 55.0);
    const double adp = 9.0;
    const double wAdp = toKilogramsPerKilogram(saturationHumidityRatio(celsius(adp), kAtm));
    const ProcessOutcome o = coolDehumidify(in, celsius(adp), fraction(0.15));
    // BF = (t2 - tadp) / (t1 - tadp), the same in W (ASHRAE ch. 1 coil relations).
    EXPECT_NEAR((t(o.outlet) - adp) / (28.0 - adp), 0.15, 1e-12);
    EXPECT_NEAR((w(o.outlet) - wAdp) / (w(in) - wAdp), 0.15, 1e-9);
    EXPECT_NEAR(cond(o), w(in) - w(o.outlet), 1e-15);
    EXPECT_GT(cond(o), 0.0);
    // Coil load from the balance: q = (h1 - h2) - (W1 - W2) h_w(t2) > sensible part alone.
    const double load = (h(in) - h(o.outlet)) - condensateEnthalpy(o);
    EXPECT_GT(load, (1006.0 + 1860.0 * w(in)) * (28.0 - t(o.outlet)));
    // Bypass factor 0: the outlet is the apparatus dew point, saturated.
    const ProcessOutcome zero = coolDehumidify(in, celsius(adp), fraction(0.0));
    EXPECT_NEAR(t(zero.outlet), adp, 1e-12);
    EXPECT_NEAR(w(zero.outlet), wAdp, 1e-15);
}

TEST(AirProcesses, CoilAboveTheDewPointIsDry)
{
    const MoistAirState in = state(24.0, 30.0); // dew point about 5.4 C
    const ProcessOutcome o = coolDehumidify(in, celsius(12.0), fraction(0.2));
    EXPECT_EQ(cond(o), 0.0);
    EXPECT_EQ(w(o.outlet), w(in));
    EXPECT_NEAR(t(o.outlet), 12.0 + 0.2 * 12.0, 1e-12);
}

namespace {
struct InvalidRow {
    std::string name;
    std::string quantity;
    std::function<void()> call;
};
void PrintTo(const InvalidRow& row, std::ostream* os) { *os << row.name; }
class InvalidProcess : public ::testing::TestWithParam<InvalidRow> {};
} // namespace

TEST_P(InvalidProcess, ThrowsInputError)
{
    const InvalidRow& row = GetParam();
    try {
        row.call();
        FAIL() << row.name << ": no InputError";
    } catch (const InputError& e) {
        EXPECT_EQ(e.quantity(), row.quantity) << e.what();
    }
}

INSTANTIATE_TEST_SUITE_P(
    Rows, InvalidProcess,
    ::testing::Values(
        InvalidRow{"BypassAboveOne", "bypass factor",
                   [] { coolDehumidify(state(28.0, 50.0), celsius(10.0), fraction(1.5)); }},
        InvalidRow{"AdpAboveInlet", "apparatus dew point",
                   [] { coolDehumidify(state(28.0, 50.0), celsius(30.0), fraction(0.1)); }},
        InvalidRow{"EfficiencyNegative", "saturation efficiency",
                   [] { adiabaticHumidify(state(28.0, 50.0), fraction(-0.1)); }},
        InvalidRow{"ZeroFlow", "dry-air mass flow",
                   [] { heatByDuty(state(20.0, 50.0), watts(1000.0), kilogramsPerSecond(0.0)); }},
        InvalidRow{"HugeDuty", "heat duty",
                   [] { heatByDuty(state(20.0, 50.0), kilowatts(1e6), kilogramsPerSecond(1.0)); }},
        InvalidRow{"NoFlowToMix", "total dry-air mass flow",
                   [] {
                       mix(state(20.0, 50.0), kilogramsPerSecond(0.0), state(10.0, 50.0), kilogramsPerSecond(0.0));
                   }},
        InvalidRow{"NegativeFlowToMix", "dry-air mass flow of the second stream",
                   [] {
                       mix(state(20.0, 50.0), kilogramsPerSecond(1.0), state(10.0, 50.0), kilogramsPerSecond(-1.0));
                   }},
        InvalidRow{"SteamTargetBelowInlet", "target humidity ratio",
                   [] { steamHumidify(state(20.0, 50.0), gramsPerKilogram(1.0), celsius(100.0)); }},
        InvalidRow{"OutletTooCold", "outlet temperature",
                   [] { heatToTemperature(state(20.0, 50.0), celsius(-150.0)); }},
        InvalidRow{"ClampNegativeW", "humidity ratio",
                   [] { clampToSaturation(celsius(20.0), gramsPerKilogram(-1.0), kAtm); }},
        InvalidRow{"ClampTooHot", "temperature",
                   [] { clampToSaturation(celsius(300.0), gramsPerKilogram(1.0), kAtm); }}),
    [](const ::testing::TestParamInfo<InvalidRow>& rowInfo) { return rowInfo.param.name; });
