#include "airwright/core/annual/SyntheticClimate.h"
#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <numbers>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

double percentile(const WeatherYear& year, double fraction)
{
    std::vector<double> t;
    for (const auto& h : year.hours())
        t.push_back(toCelsius(h.dryBulb));
    std::sort(t.begin(), t.end());
    return t[static_cast<std::size_t>(fraction * static_cast<double>(t.size() - 1) + 0.5)];
}

SyntheticClimateParameters withStream(std::uint64_t number)
{
    SyntheticClimateParameters p;
    p.site.elevation = metres(250.0);
    p.streamNumber = number;
    return p;
}

} // namespace

TEST(AnnualSyntheticClimate, SameParametersGiveTheSameYear)
{
    const WeatherYear a = SyntheticClimate::generate(withStream(5));
    const WeatherYear b = SyntheticClimate::generate(withStream(5));
    EXPECT_EQ(a.hours(), b.hours());
    const WeatherYear c = SyntheticClimate::generate(withStream(6));
    EXPECT_NE(a.hours(), c.hours());
}

class AnnualSyntheticClimatePlausible : public testing::TestWithParam<std::uint64_t> {};

TEST_P(AnnualSyntheticClimatePlausible, LooksLikeAColdWinterInlandClimate)
{
    const SyntheticClimateParameters p = withStream(GetParam());
    const WeatherYear year = SyntheticClimate::generate(p);
    ASSERT_EQ(year.size(), 8760u);

    // The noise is AR(1) with sigma 4.5 K and tau 60 h: the standard deviation of
    // its yearly mean is about sigma sqrt(2 tau / 8760 h) = 0.53 K; 2 K is ~4 sigma.
    EXPECT_NEAR(toCelsius(year.meanDryBulb()), toCelsius(p.annualMean), 2.0);
    // Ranges meant by the defaults (mid-European-like inland climate, common practice):
    // lows well below -8 C but not below -30 C, highs between 25 and 40 C.
    EXPECT_LT(toCelsius(year.minDryBulb()), -8.0);
    EXPECT_GT(toCelsius(year.minDryBulb()), -30.0);
    EXPECT_GT(toCelsius(year.maxDryBulb()), 25.0);
    EXPECT_LT(toCelsius(year.maxDryBulb()), 40.0);
    // Hourly 0.4 % value (winter design-like) between -16 and -8 C.
    EXPECT_GT(percentile(year, 0.004), -16.0);
    EXPECT_LT(percentile(year, 0.004), -8.0);

    const double minDepression = toKelvinDifference(p.minDewPointDepression);
    const double maxDepression = toKelvinDifference(p.maxDewPointDepression);
    for (std::size_t i = 0; i < year.size(); ++i) {
        const WeatherHour& h = year.hour(i);
        const double rh = toPercent(h.relativeHumidity());
        ASSERT_GE(rh, 0.0) << "hour " << i;
        ASSERT_LE(rh, 100.0) << "hour " << i;
        const double depression = toCelsius(h.dryBulb) - toCelsius(h.dewPoint());
        // Bounded depression, to the accuracy of the dew point inverse.
        ASSERT_GE(depression, minDepression - 1e-6) << "hour " << i;
        ASSERT_LE(depression, maxDepression + 1e-6) << "hour " << i;
        // ASHRAE Fundamentals 2017 ch. 1 eq. 3: p = 101325 (1 - 2.25577e-5 x 250)^5.2559
        // = 98357.6 Pa (hand calculation).
        ASSERT_NEAR(toPascals(h.pressure), 98357.6, 0.5) << "hour " << i;
    }
}

INSTANTIATE_TEST_SUITE_P(Streams, AnnualSyntheticClimatePlausible, testing::Values(1u, 2u, 3u, 4u, 20240611u));

TEST(AnnualSyntheticClimate, PureSeasonalCycleMatchesItsFormula)
{
    SyntheticClimateParameters p;
    p.dailyAmplitude = kelvinDifference(0.0);
    p.noiseStandardDeviation = kelvinDifference(0.0);
    p.annualMean = celsius(8.0);
    p.annualAmplitude = kelvinDifference(10.0);
    const WeatherYear year = SyntheticClimate::generate(p);
    // A whole period of a sampled cosine sums to zero: the mean is the annual mean.
    EXPECT_NEAR(toCelsius(year.meanDryBulb()), 8.0, 1e-9);
    // Lowest hour within half an hour of the coldest day's middle: 8 - 10 cos(2 pi / (48 x 365)).
    EXPECT_NEAR(toCelsius(year.minDryBulb()), -2.0, 1e-3);
    EXPECT_NEAR(toCelsius(year.maxDryBulb()), 18.0, 1e-3);
    // Hand calculation: heating degree hours below the mean of a cosine of amplitude
    // A over a year of N hours are A N / pi = 10 x 8760 / pi = 27 883.4 K h.
    EXPECT_NEAR(toKelvinHours(year.heatingDegreeHours(celsius(8.0))), 10.0 * 8760.0 / std::numbers::pi, 1.0);
    // Coldest around 20 January (hour index 19 x 24 + 12), warmest half a year later.
    const std::size_t coldest = 19 * 24 + 11;
    EXPECT_NEAR(toCelsius(year.hour(coldest).dryBulb), -2.0, 1e-3);
}

TEST(AnnualSyntheticClimate, DailyCyclePeaksAtTheWarmestHour)
{
    SyntheticClimateParameters p;
    p.annualAmplitude = kelvinDifference(0.0);
    p.noiseStandardDeviation = kelvinDifference(0.0);
    p.dailyAmplitude = kelvinDifference(5.0);
    p.warmestHourOfDay = 15.5; // the hour 15:00 .. 16:00, mid-hour 15.5
    const WeatherYear year = SyntheticClimate::generate(p);
    // Hour index 15 of a day is the hour ending 16:00, mid-hour 15.5: the peak.
    EXPECT_NEAR(toCelsius(year.hour(24 * 100 + 15).dryBulb), toCelsius(p.annualMean) + 5.0, 1e-9);
    EXPECT_NEAR(toCelsius(year.hour(24 * 100 + 3).dryBulb), toCelsius(p.annualMean) - 5.0, 1e-9);
}

TEST(AnnualSyntheticClimate, MakesALeapYear)
{
    SyntheticClimateParameters p;
    p.leapYear = true;
    EXPECT_EQ(SyntheticClimate::generate(p).size(), 8784u);
}

struct ParameterCase {
    const char* name;
    void (*change)(SyntheticClimateParameters&);
    bool valid;
};

class AnnualSyntheticClimateParameters : public testing::TestWithParam<ParameterCase> {};

TEST_P(AnnualSyntheticClimateParameters, AreChecked)
{
    SyntheticClimateParameters p;
    GetParam().change(p);
    if (GetParam().valid)
        EXPECT_NO_THROW(SyntheticClimate::generate(p));
    else
        EXPECT_THROW(SyntheticClimate::generate(p), InputError);
}

INSTANTIATE_TEST_SUITE_P(
    Rows, AnnualSyntheticClimateParameters,
    testing::Values(
        ParameterCase{"Defaults", [](SyntheticClimateParameters&) {}, true},
        ParameterCase{"ColdestDayLast", [](SyntheticClimateParameters& p) { p.coldestDay = 365; }, true},
        ParameterCase{"ColdestDayZero", [](SyntheticClimateParameters& p) { p.coldestDay = 0; }, false},
        ParameterCase{"ColdestDay366", [](SyntheticClimateParameters& p) { p.coldestDay = 366; }, false},
        ParameterCase{"NegativeAmplitude",
                      [](SyntheticClimateParameters& p) { p.annualAmplitude = kelvinDifference(-1.0); }, false},
        ParameterCase{"NegativeNoise",
                      [](SyntheticClimateParameters& p) { p.noiseStandardDeviation = kelvinDifference(-0.1); }, false},
        ParameterCase{"ZeroCorrelationTime", [](SyntheticClimateParameters& p) { p.noiseCorrelationTime = hours(0.0); },
                      false},
        ParameterCase{"CouplingAboveOne",
                      [](SyntheticClimateParameters& p) { p.diurnalDepressionCoupling = fraction(1.5); }, false},
        ParameterCase{"MinAboveMaxDepression",
                      [](SyntheticClimateParameters& p) {
                          p.minDewPointDepression = kelvinDifference(5.0);
                          p.maxDewPointDepression = kelvinDifference(4.0);
                      },
                      false},
        ParameterCase{"WarmestHour25", [](SyntheticClimateParameters& p) { p.warmestHourOfDay = 25.0; }, false},
        ParameterCase{"ElevationTooHigh", [](SyntheticClimateParameters& p) { p.site.elevation = metres(6000.0); },
                      false},
        ParameterCase{"MeanTooHot", [](SyntheticClimateParameters& p) { p.annualMean = celsius(60.0); }, false},
        ParameterCase{"GeneratedBeyond70C",
                      [](SyntheticClimateParameters& p) {
                          p.annualMean = celsius(45.0);
                          p.annualAmplitude = kelvinDifference(20.0);
                          p.dailyAmplitude = kelvinDifference(10.0);
                      },
                      false}),
    [](const testing::TestParamInfo<ParameterCase>& row) { return std::string(row.param.name); });
