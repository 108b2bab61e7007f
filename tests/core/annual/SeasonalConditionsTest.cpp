#include "airwright/core/annual/SeasonalConditions.h"
#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

Chain::DesignCase designCase(const char* name, double outdoorC, double roomC, double roomRhPct, double setpointC)
{
    Chain::DesignCase c;
    c.name = name;
    c.outdoorTemperature = celsius(outdoorC);
    c.outdoorHumidity = percent(80.0);
    c.roomTemperature = celsius(roomC);
    c.roomHumidity = percent(roomRhPct);
    c.supplySetpoint = celsius(setpointC);
    return c;
}

const Pressure kPressure = pascals(101325.0);

} // namespace

TEST(AnnualSeasonalConditions, LinearBetweenCasesConstantBeyond)
{
    // Cases out of order on purpose: they are sorted by outdoor temperature.
    const SeasonalConditions s({designCase("summer", 30.0, 25.0, 50.0, 18.0), designCase("winter", -10.0, 21.0, 35.0, 20.0)},
                               kPressure);
    ASSERT_EQ(s.anchorCount(), 2u);
    EXPECT_NEAR(toCelsius(s.anchorOutdoorTemperature(0)), -10.0, 1e-12);

    // Hand calculation at 10 C outdoor, halfway: room (21 + 25) / 2 = 23 C,
    // setpoint (20 + 18) / 2 = 19 C, room humidity ratio the mean of the two.
    const auto mid = s.at(celsius(10.0));
    EXPECT_NEAR(toCelsius(mid.roomTemperature), 23.0, 1e-9);
    EXPECT_NEAR(toCelsius(mid.supplySetpoint), 19.0, 1e-9);
    const double wWinter = toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(celsius(21.0), percent(35.0), kPressure));
    const double wSummer = toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(celsius(25.0), percent(50.0), kPressure));
    EXPECT_NEAR(toKilogramsPerKilogram(mid.roomHumidity), 0.5 * (wWinter + wSummer), 1e-12);

    // Beyond the coldest and the warmest case the values stay at that case's.
    EXPECT_NEAR(toCelsius(s.at(celsius(-25.0)).roomTemperature), 21.0, 1e-12);
    EXPECT_NEAR(toCelsius(s.at(celsius(38.0)).supplySetpoint), 18.0, 1e-12);
    EXPECT_FALSE(mid.minimumSupplyHumidity);
    EXPECT_FALSE(mid.maximumSupplyHumidity);

    const auto w = s.weightsAt(0.0);
    EXPECT_EQ(w.lower, 0u);
    EXPECT_NEAR(w.upperWeight, 0.25, 1e-12); // (0 - -10) / (30 - -10)
}

TEST(AnnualSeasonalConditions, HumidityLimitsHoldAllYear)
{
    auto winter = designCase("winter", -10.0, 21.0, 35.0, 20.0);
    winter.minimumSupplyHumidity = percent(30.0);
    auto summer = designCase("summer", 30.0, 25.0, 50.0, 18.0);
    summer.maximumSupplyHumidity = percent(60.0);
    summer.dehumidifyWithReheat = true;
    const SeasonalConditions s({winter, summer}, kPressure);
    const auto at = s.at(celsius(25.0));
    ASSERT_TRUE(at.minimumSupplyHumidity);
    ASSERT_TRUE(at.maximumSupplyHumidity);
    // Each limit is the relative humidity of its case at that case's setpoint.
    EXPECT_NEAR(toKilogramsPerKilogram(*at.minimumSupplyHumidity),
                toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(celsius(20.0), percent(30.0), kPressure)),
                1e-12);
    EXPECT_NEAR(toKilogramsPerKilogram(*at.maximumSupplyHumidity),
                toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(celsius(18.0), percent(60.0), kPressure)),
                1e-12);
    EXPECT_TRUE(at.dehumidifyWithReheat);
}

TEST(AnnualSeasonalConditions, SetbackLowersTemperaturesKeepsHumidityRatio)
{
    const SeasonalConditions s({designCase("winter", -10.0, 21.0, 35.0, 20.0)}, kPressure);
    const auto low = s.lowered(kelvinDifference(3.0));
    EXPECT_NEAR(toCelsius(low.at(celsius(0.0)).roomTemperature), 18.0, 1e-9);
    EXPECT_NEAR(toCelsius(low.at(celsius(0.0)).supplySetpoint), 17.0, 1e-9);
    EXPECT_NEAR(toKilogramsPerKilogram(low.at(celsius(0.0)).roomHumidity),
                toKilogramsPerKilogram(s.at(celsius(0.0)).roomHumidity), 1e-12);
    EXPECT_THROW(s.lowered(kelvinDifference(12.0)), InputError);
}

TEST(AnnualSeasonalConditions, HumidityOffsetMovesRelativeHumidity)
{
    const SeasonalConditions s({designCase("winter", -10.0, 21.0, 35.0, 20.0)}, kPressure);
    const auto wetter = s.withRoomHumidityOffset(percent(15.0));
    // 35 % + 15 points = 50 % at 21 C (ASHRAE Fundamentals 2017 ch. 1 eq. 20 via
    // the psychro layer).
    EXPECT_NEAR(toKilogramsPerKilogram(wetter.at(celsius(0.0)).roomHumidity),
                toKilogramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(celsius(21.0), percent(50.0), kPressure)),
                1e-12);
    EXPECT_NEAR(toPercent(wetter.anchorCase(0, percent(100.0)).roomHumidity), 50.0, 1e-9);
    // Kept within 5 .. 95 %.
    EXPECT_NEAR(toPercent(s.withRoomHumidityOffset(percent(-60.0)).anchorCase(0, percent(100.0)).roomHumidity), 5.0, 1e-9);
}

TEST(AnnualSeasonalConditions, CaseAtAnOutdoorStateCarriesTheTargets)
{
    const SeasonalConditions s({designCase("winter", -10.0, 21.0, 35.0, 20.0), designCase("summer", 30.0, 25.0, 50.0, 18.0)},
                               kPressure);
    const auto c = s.caseAt(celsius(10.0), percent(70.0), percent(50.0), "probe");
    EXPECT_EQ(c.name, "probe");
    EXPECT_NEAR(toCelsius(c.outdoorTemperature), 10.0, 1e-12);
    EXPECT_NEAR(toPercent(c.outdoorHumidity), 70.0, 1e-12);
    EXPECT_NEAR(toCelsius(c.roomTemperature), 23.0, 1e-9);
    EXPECT_NEAR(toCelsius(c.supplySetpoint), 19.0, 1e-9);
    EXPECT_NEAR(toPercent(c.airflowFraction), 50.0, 1e-12);
}

TEST(AnnualSeasonalConditions, RejectsNoCasesAndInvalidCases)
{
    EXPECT_THROW(SeasonalConditions({}, kPressure), InputError);
    auto bad = designCase("bad", -10.0, 21.0, 135.0, 20.0);
    EXPECT_THROW(SeasonalConditions({bad}, kPressure), InputError);
}
