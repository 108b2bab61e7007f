#include "airwright/core/annual/WeatherYear.h"
#include "airwright/core/InputError.h"
#include "airwright/core/annual/SyntheticClimate.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

WeatherHour hourAt(double dryBulbC, double humidityGkg = 3.0, double pressurePa = 100000.0)
{
    return {celsius(dryBulbC), gramsPerKilogram(humidityGkg), pascals(pressurePa)};
}

WeatherYear constantYear(double dryBulbC, std::size_t count = 8760)
{
    return WeatherYear(SiteInfo{}, std::vector<WeatherHour>(count, hourAt(dryBulbC)));
}

// Hours alternating between a and b, 4380 of each.
WeatherYear alternatingYear(double a, double b)
{
    std::vector<WeatherHour> hours;
    for (std::size_t i = 0; i < 8760; ++i)
        hours.push_back(hourAt(i % 2 == 0 ? a : b));
    return WeatherYear(SiteInfo{}, std::move(hours));
}

} // namespace

TEST(AnnualWeatherYear, HeatingDegreeHoursOfAConstantYear)
{
    // Hand calculation: (15 C - 5 C) x 8760 h = 87 600 K h.
    EXPECT_NEAR(toKelvinHours(constantYear(5.0).heatingDegreeHours(celsius(15.0))), 87600.0, 1e-6);
    // Hand calculation: no hour above the base, so no cooling degree hours.
    EXPECT_NEAR(toKelvinHours(constantYear(5.0).coolingDegreeHours(celsius(15.0))), 0.0, 1e-9);
    // Hand calculation, leap year: 10 K x 8784 h = 87 840 K h.
    EXPECT_NEAR(toKelvinHours(constantYear(5.0, 8784).heatingDegreeHours(celsius(15.0))), 87840.0, 1e-6);
}

TEST(AnnualWeatherYear, DegreeHoursOfATwoLevelYear)
{
    const WeatherYear year = alternatingYear(0.0, 20.0);
    // Hand calculation: 4380 h at 0 C, 15 K below the 15 C base: 65 700 K h.
    EXPECT_NEAR(toKelvinHours(year.heatingDegreeHours(celsius(15.0))), 65700.0, 1e-6);
    // Hand calculation: 4380 h at 20 C, 5 K above the base: 21 900 K h.
    EXPECT_NEAR(toKelvinHours(year.coolingDegreeHours(celsius(15.0))), 21900.0, 1e-6);
    // Hand calculation: mean (0 + 20) / 2 = 10 C, extremes 0 and 20 C.
    EXPECT_NEAR(toCelsius(year.meanDryBulb()), 10.0, 1e-9);
    EXPECT_NEAR(toCelsius(year.minDryBulb()), 0.0, 1e-12);
    EXPECT_NEAR(toCelsius(year.maxDryBulb()), 20.0, 1e-12);
}

TEST(AnnualWeatherYear, HourAccessChecksTheIndex)
{
    const WeatherYear year = constantYear(5.0);
    EXPECT_NEAR(toCelsius(year.hour(8759).dryBulb), 5.0, 1e-12);
    EXPECT_THROW(year.hour(8760), InputError);
}

struct InvalidYear {
    const char* name;
    std::size_t count;
    WeatherHour bad;
};

class AnnualWeatherYearInvalid : public testing::TestWithParam<InvalidYear> {};

TEST_P(AnnualWeatherYearInvalid, IsRejected)
{
    const InvalidYear& c = GetParam();
    std::vector<WeatherHour> hours(c.count, hourAt(5.0));
    hours[c.count / 2] = c.bad;
    EXPECT_THROW(WeatherYear(SiteInfo{}, std::move(hours)), InputError);
}

INSTANTIATE_TEST_SUITE_P(Rows, AnnualWeatherYearInvalid,
                         testing::Values(InvalidYear{"TooFewHours", 8759, hourAt(5.0)},
                                         InvalidYear{"TooManyHours", 8785, hourAt(5.0)},
                                         InvalidYear{"DryBulbTooLow", 8760, hourAt(-71.0, 0.0)},
                                         InvalidYear{"DryBulbTooHigh", 8760, hourAt(71.0)},
                                         InvalidYear{"PressureTooLow", 8760, hourAt(5.0, 3.0, 30000.0)},
                                         InvalidYear{"NegativeHumidity", 8760, hourAt(5.0, -0.1)},
                                         // Saturation at 5 C is about 5.4 g/kg at 101.325 kPa (ASHRAE Fundamentals
                                         // 2017 ch. 1 table 2, from memory), a little more at 100 kPa; 8 g/kg is
                                         // well above it.
                                         InvalidYear{"Supersaturated", 8760, hourAt(5.0, 8.0)}),
                         [](const testing::TestParamInfo<InvalidYear>& row) { return std::string(row.param.name); });

TEST(AnnualWeatherYear, ValidRowOfTheInvalidTableIsAccepted)
{
    EXPECT_NO_THROW(constantYear(5.0));
    EXPECT_NO_THROW(constantYear(5.0, 8784));
}

// ---- hourly to bins ----------------------------------------------------------

TEST(AnnualWeatherYear, BinsConserveHoursAndTemperatureHours)
{
    const WeatherYear year = SyntheticClimate::generate(SyntheticClimateParameters{});
    for (const double width : {0.5, 1.0, 2.0, 5.0}) {
        const BinTable bins = year.toBins(kelvinDifference(width));
        double hoursSum = 0.0;
        double temperatureHours = 0.0;
        double previous = -1e9;
        for (const auto& bin : bins.bins()) {
            hoursSum += toHours(bin.duration);
            temperatureHours += toHours(bin.duration) * toCelsius(bin.dryBulb);
            EXPECT_GT(toCelsius(bin.dryBulb), previous);
            previous = toCelsius(bin.dryBulb);
        }
        double expectedTemperatureHours = 0.0;
        for (const auto& h : year.hours())
            expectedTemperatureHours += toCelsius(h.dryBulb);
        // Conservation by construction (each bin carries the mean of its hours):
        // hours exactly, temperature-hours to rounding.
        EXPECT_NEAR(hoursSum, 8760.0, 1e-9) << "width " << width;
        EXPECT_NEAR(temperatureHours, expectedTemperatureHours, 1e-6 * std::abs(expectedTemperatureHours))
            << "width " << width;
        EXPECT_NEAR(toCelsius(bins.meanDryBulb()), toCelsius(year.meanDryBulb()), 1e-9);
    }
}

TEST(AnnualWeatherYear, BinMeansLieInTheirBands)
{
    const WeatherYear year = SyntheticClimate::generate(SyntheticClimateParameters{});
    const double width = 2.0;
    const BinTable bins = year.toBins(kelvinDifference(width));
    for (const auto& bin : bins.bins()) {
        const double t = toCelsius(bin.dryBulb);
        const double lower = std::floor(t / width) * width;
        EXPECT_GE(t, lower);
        EXPECT_LT(t, lower + width);
    }
}

TEST(AnnualWeatherYear, BinsKeepHeatingDegreeHoursWhenTheBaseIsABinEdge)
{
    // Hand derivation: with the base on a bin edge every hour of a bin lies on the
    // same side of the base, so sum_bins n (base - mean) = sum_hours (base - t).
    const WeatherYear year = SyntheticClimate::generate(SyntheticClimateParameters{});
    const BinTable bins = year.toBins(kelvinDifference(2.0));
    const double hourly = toKelvinHours(year.heatingDegreeHours(celsius(16.0)));
    EXPECT_NEAR(toKelvinHours(bins.heatingDegreeHours(celsius(16.0))), hourly, 1e-9 * hourly);
    const double cooling = toKelvinHours(year.coolingDegreeHours(celsius(24.0)));
    EXPECT_NEAR(toKelvinHours(bins.coolingDegreeHours(celsius(24.0))), cooling, 1e-9 * cooling + 1e-9);
}

TEST(AnnualWeatherYear, BinsCarryTheMeanHumidityOfTheirHours)
{
    // Two-level year, humidity 2 g/kg at 0 C and 6 g/kg at 20 C: two bins with
    // exactly those values (hand calculation).
    std::vector<WeatherHour> hours;
    for (std::size_t i = 0; i < 8760; ++i)
        hours.push_back(i % 2 == 0 ? hourAt(0.0, 2.0) : hourAt(20.0, 6.0));
    const BinTable bins = WeatherYear(SiteInfo{}, std::move(hours)).toBins(kelvinDifference(1.0));
    ASSERT_EQ(bins.bins().size(), 2u);
    EXPECT_NEAR(toHours(bins.bins()[0].duration), 4380.0, 1e-9);
    EXPECT_NEAR(toGramsPerKilogram(bins.bins()[0].humidityRatio), 2.0, 1e-12);
    EXPECT_NEAR(toGramsPerKilogram(bins.bins()[1].humidityRatio), 6.0, 1e-12);
    EXPECT_NEAR(toPascals(bins.pressure()), 100000.0, 1e-9);
}

TEST(AnnualWeatherYear, RejectsABinWidthOutOfRange)
{
    const WeatherYear year = constantYear(5.0);
    EXPECT_THROW(year.toBins(kelvinDifference(0.0)), InputError);
    EXPECT_THROW(year.toBins(kelvinDifference(-1.0)), InputError);
    EXPECT_THROW(year.toBins(kelvinDifference(11.0)), InputError);
    EXPECT_NO_THROW(year.toBins(kelvinDifference(10.0)));
}

TEST(AnnualBinTable, RejectsInvalidTables)
{
    const Pressure p = pascals(100000.0);
    const TemperatureBin cold{celsius(-5.0), hours(100.0), gramsPerKilogram(1.5)};
    const TemperatureBin warm{celsius(10.0), hours(100.0), gramsPerKilogram(5.0)};
    EXPECT_NO_THROW(BinTable({cold, warm}, p));
    EXPECT_THROW(BinTable({warm, cold}, p), InputError);                                           // not ascending
    EXPECT_THROW(BinTable({cold, cold}, p), InputError);                                           // repeated
    EXPECT_THROW(BinTable({{celsius(0.0), hours(-1.0), gramsPerKilogram(1.0)}}, p), InputError);   // negative hours
    EXPECT_THROW(BinTable({{celsius(0.0), hours(9000.0), gramsPerKilogram(1.0)}}, p), InputError); // > 8784 h
    EXPECT_THROW(BinTable({{celsius(-5.0), hours(1.0), gramsPerKilogram(5.0)}}, p), InputError);   // supersaturated
    EXPECT_THROW(BinTable({cold}, pascals(20000.0)), InputError);                                  // pressure
    EXPECT_THROW(BinTable({}, p).meanDryBulb(), InputError);                                       // no hours
}

TEST(AnnualBinTable, DegreeHoursOfAHandMadeTable)
{
    const BinTable table({{celsius(-5.0), hours(100.0), gramsPerKilogram(1.5)},
                          {celsius(10.0), hours(200.0), gramsPerKilogram(5.0)},
                          {celsius(25.0), hours(50.0), gramsPerKilogram(10.0)}},
                         pascals(100000.0));
    // Hand calculation, base 15 C: 100 h x 20 K + 200 h x 5 K = 3000 K h.
    EXPECT_NEAR(toKelvinHours(table.heatingDegreeHours(celsius(15.0))), 3000.0, 1e-9);
    // Hand calculation: 50 h x 10 K = 500 K h above 15 C.
    EXPECT_NEAR(toKelvinHours(table.coolingDegreeHours(celsius(15.0))), 500.0, 1e-9);
    // Hand calculation: (100 x -5 + 200 x 10 + 50 x 25) / 350 = 2750 / 350 = 7.857 C.
    EXPECT_NEAR(toCelsius(table.meanDryBulb()), 2750.0 / 350.0, 1e-9);
    EXPECT_NEAR(toHours(table.totalDuration()), 350.0, 1e-12);
}
