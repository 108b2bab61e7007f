#include "airwright/core/psychro/MoistAirState.h"

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <cmath>
#include <functional>
#include <limits>
#include <optional>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Psychro;

namespace {

const Pressure kAtm = pascals(101325.0);

void expectSameState(const MoistAirState& a, const MoistAirState& b, const std::string& how)
{
    EXPECT_NEAR(toCelsius(a.dryBulb()), toCelsius(b.dryBulb()), 1e-9) << how;
    // The wet bulb is solved to 2e-7 K; dW/dtwb is below 1e-3 kg/kg per K here.
    EXPECT_NEAR(toKilogramsPerKilogram(a.humidityRatio()), toKilogramsPerKilogram(b.humidityRatio()), 2e-10) << how;
    EXPECT_EQ(toPascals(a.pressure()), toPascals(b.pressure())) << how;
}

struct StateRow {
    double tC, rhPct, pPa;
};
class RoundTrip : public ::testing::TestWithParam<StateRow> {};

} // namespace

TEST_P(RoundTrip, EveryFactoryPairGivesTheSameState)
{
    const StateRow row = GetParam();
    const Pressure p = pascals(row.pPa);
    const MoistAirState s = MoistAirState::fromDryBulbRelativeHumidity(celsius(row.tC), percent(row.rhPct), p);
    EXPECT_NEAR(toPercent(s.relativeHumidity()), row.rhPct, 1e-9);
    expectSameState(MoistAirState::fromDryBulbWetBulb(s.dryBulb(), s.wetBulb(), p), s, "tdb, twb");
    if (row.rhPct > 0.0)
        expectSameState(MoistAirState::fromDryBulbDewPoint(s.dryBulb(), s.dewPoint(), p), s, "tdb, tdp");
    expectSameState(MoistAirState::fromDryBulbHumidityRatio(s.dryBulb(), s.humidityRatio(), p), s, "tdb, W");
    expectSameState(MoistAirState::fromEnthalpyHumidityRatio(s.enthalpy(), s.humidityRatio(), p), s, "h, W");
    expectSameState(MoistAirState::fromDryBulbEnthalpy(s.dryBulb(), s.enthalpy(), p), s, "tdb, h");
}

INSTANTIATE_TEST_SUITE_P(States, RoundTrip,
                         ::testing::Values(StateRow{20.0, 50.0, 101325.0}, StateRow{-25.0, 80.0, 101325.0},
                                           StateRow{35.0, 100.0, 101325.0}, StateRow{45.0, 8.0, 85000.0},
                                           StateRow{7.5, 14.0, 101325.0}, StateRow{0.0, 60.0, 70000.0},
                                           StateRow{-5.0, 3.0, 110000.0}, StateRow{60.0, 30.0, 60000.0},
                                           StateRow{25.0, 0.0, 101325.0}));

TEST(MoistAirState, PropertiesAreThoseOfTheFreeFunctions)
{
    const MoistAirState s = MoistAirState::fromDryBulbRelativeHumidity(celsius(26.0), percent(45.0), pascals(98000.0));
    const HumidityRatio w = s.humidityRatio();
    EXPECT_EQ(toJoulesPerKilogram(s.enthalpy()), toJoulesPerKilogram(enthalpy(celsius(26.0), w)));
    EXPECT_EQ(toCubicMetresPerKilogram(s.specificVolume()),
              toCubicMetresPerKilogram(specificVolume(celsius(26.0), w, pascals(98000.0))));
    EXPECT_NEAR(toKilogramsPerCubicMetre(s.density()) * toCubicMetresPerKilogram(s.specificVolume()),
                1.0 + toKilogramsPerKilogram(w), 1e-14);
    EXPECT_NEAR(toPascals(s.vapourPressure()), 0.45 * toPascals(s.saturationPressure()), 1e-9);
    EXPECT_NEAR(toFraction(s.degreeOfSaturation()),
                toKilogramsPerKilogram(w) / toKilogramsPerKilogram(s.saturationHumidityRatio()), 1e-15);
    EXPECT_LT(toCelsius(s.dewPoint()), toCelsius(s.wetBulb()));
    EXPECT_LT(toCelsius(s.wetBulb()), 26.0);
}

TEST(MoistAirState, SaturatedAirHasAllThreeTemperaturesEqual)
{
    const MoistAirState s = MoistAirState::fromDryBulbRelativeHumidity(celsius(18.0), percent(100.0), kAtm);
    EXPECT_NEAR(toCelsius(s.dewPoint()), 18.0, 1e-8);
    EXPECT_NEAR(toCelsius(s.wetBulb()), 18.0, 1e-8);
    EXPECT_LE(toCelsius(s.dewPoint()), 18.0);
    EXPECT_NEAR(toFraction(s.degreeOfSaturation()), 1.0, 1e-12);
}

TEST(MoistAirState, HumidityRatioARoundingAboveSaturationIsStoredAsSaturated)
{
    const double ws = toKilogramsPerKilogram(saturationHumidityRatio(celsius(22.0), kAtm));
    const MoistAirState s =
        MoistAirState::fromDryBulbHumidityRatio(celsius(22.0), kilogramsPerKilogram(ws * (1.0 + 1e-12)), kAtm);
    EXPECT_LE(toKilogramsPerKilogram(s.humidityRatio()), ws);
    EXPECT_LE(toFraction(s.relativeHumidity()), 1.0);
}

TEST(MoistAirState, OutletFactoryGivesTheCheckedStateAtAndBelowSaturation)
{
    // detail::stateBelowSaturation skips only the pws(t) comparison; for any W up
    // to Ws(t) it must store exactly what the checked factory stores.
    for (double t : {-30.0, -0.5, 0.0, 12.0, 35.0, 80.0})
        for (double share : {0.0, 0.4, 0.999, 1.0}) {
            const double ws = toKilogramsPerKilogram(saturationHumidityRatio(celsius(t), kAtm));
            const HumidityRatio w = kilogramsPerKilogram(share * ws);
            EXPECT_EQ(detail::stateBelowSaturation(celsius(t), w, kAtm),
                      MoistAirState::fromDryBulbHumidityRatio(celsius(t), w, kAtm))
                << t << " C, " << share << " Ws";
        }
}

TEST(MoistAirState, DryAirHasNoDewPointInRange)
{
    // Perfectly dry air is a valid state (EN 308 dry tests use it), but its dew
    // point lies below the -100 C limit of eq. 5: InputError, not a made-up number.
    const MoistAirState s = MoistAirState::fromDryBulbRelativeHumidity(celsius(20.0), percent(0.0), kAtm);
    EXPECT_THROW(s.dewPoint(), InputError);
    EXPECT_LT(toCelsius(s.wetBulb()), 20.0);
    EXPECT_GT(toCelsius(s.wetBulb()), 0.0);
}

namespace {
struct InvalidRow {
    std::string name;
    std::string quantity;
    std::function<void()> call;
};
void PrintTo(const InvalidRow& row, std::ostream* os) { *os << row.name; }
class InvalidState : public ::testing::TestWithParam<InvalidRow> {};
constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();
} // namespace

TEST_P(InvalidState, FactoryThrowsInputError)
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
    Rows, InvalidState,
    ::testing::Values(
        InvalidRow{"Rh120", "relative humidity",
                   [] { MoistAirState::fromDryBulbRelativeHumidity(celsius(20.0), percent(120.0), kAtm); }},
        InvalidRow{"WetBulbAboveDryBulb", "wet-bulb temperature",
                   [] { MoistAirState::fromDryBulbWetBulb(celsius(20.0), celsius(20.5), kAtm); }},
        InvalidRow{"DewPointAboveDryBulb", "dew-point temperature",
                   [] { MoistAirState::fromDryBulbDewPoint(celsius(20.0), celsius(20.5), kAtm); }},
        InvalidRow{"DewPointBelowRange", "dew-point temperature",
                   [] { MoistAirState::fromDryBulbDewPoint(celsius(20.0), celsius(-120.0), kAtm); }},
        InvalidRow{"WAboveSaturation", "humidity ratio",
                   [] { MoistAirState::fromDryBulbHumidityRatio(celsius(20.0), gramsPerKilogram(20.0), kAtm); }},
        InvalidRow{"WNegative", "humidity ratio",
                   [] { MoistAirState::fromDryBulbHumidityRatio(celsius(20.0), gramsPerKilogram(-1.0), kAtm); }},
        InvalidRow{"DryBulbTooHot", "dry-bulb temperature",
                   [] { MoistAirState::fromDryBulbRelativeHumidity(celsius(250.0), percent(10.0), kAtm); }},
        InvalidRow{"DryBulbNaN", "dry-bulb temperature",
                   [] { MoistAirState::fromDryBulbHumidityRatio(kelvin(kNaN), gramsPerKilogram(5.0), kAtm); }},
        InvalidRow{"PressureZero", "pressure",
                   [] { MoistAirState::fromDryBulbRelativeHumidity(celsius(20.0), percent(50.0), pascals(0.0)); }},
        InvalidRow{"EnthalpySupersaturated", "humidity ratio",
                   [] {
                       MoistAirState::fromEnthalpyHumidityRatio(kilojoulesPerKilogram(40.0), gramsPerKilogram(20.0),
                                                                kAtm);
                   }},
        InvalidRow{"EnthalpyBelowDryAir", "enthalpy",
                   [] { MoistAirState::fromDryBulbEnthalpy(celsius(20.0), kilojoulesPerKilogram(5.0), kAtm); }},
        InvalidRow{"EnthalpyNaN", "enthalpy",
                   [] {
                       MoistAirState::fromEnthalpyHumidityRatio(joulesPerKilogram(kNaN), gramsPerKilogram(5.0), kAtm);
                   }},
        // The exchanger's outlet factory keeps every check but the saturation one.
        InvalidRow{"BelowSaturationDryBulbTooHot", "dry-bulb temperature",
                   [] { detail::stateBelowSaturation(celsius(250.0), gramsPerKilogram(5.0), kAtm); }},
        InvalidRow{"BelowSaturationWNegative", "humidity ratio",
                   [] { detail::stateBelowSaturation(celsius(20.0), gramsPerKilogram(-1.0), kAtm); }},
        InvalidRow{"BelowSaturationPressureZero", "pressure",
                   [] { detail::stateBelowSaturation(celsius(20.0), gramsPerKilogram(5.0), pascals(0.0)); }}),
    [](const ::testing::TestParamInfo<InvalidRow>& rowInfo) { return rowInfo.param.name; });

TEST(MoistAirState, UncheckedRelativeHumidityEqualsTheCheckedOne)
{
    // detail::relativeHumidityOf skips the input checks of relativeHumidity() for
    // states that are valid by construction; the value must be the same (1e-15,
    // rounding), saturated and above the boiling point included.
    int states = 0;
    for (double t = -40.0; t <= 120.0; t += 7.5) {
        for (double rh = 0.0; rh <= 1.0; rh += 0.125) {
            for (double p : {60000.0, 101325.0}) {
                std::optional<MoistAirState> s;
                try {
                    s = MoistAirState::fromDryBulbRelativeHumidity(celsius(t), fraction(rh), pascals(p));
                } catch (const InputError&) {
                    continue; // not a state (vapour above the total pressure)
                }
                ++states;
                EXPECT_NEAR(detail::relativeHumidityOf(*s).value(), s->relativeHumidity().value(), 1e-15)
                    << t << " C, " << rh << ", " << p << " Pa";
            }
        }
    }
    EXPECT_GT(states, 300); // most of the grid is a state
}
