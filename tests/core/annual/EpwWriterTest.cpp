#include "airwright/core/annual/EpwWriter.h"
#include "airwright/core/InputError.h"
#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/SyntheticClimate.h"

#include <gtest/gtest.h>

#include <cmath>
#include <sstream>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

SyntheticClimateParameters testParameters(bool leap = false)
{
    SyntheticClimateParameters p;
    p.site.name = "Writer Test Site (invented)";
    p.site.country = "ZZ";
    p.site.latitudeDegrees = -33.25;
    p.site.longitudeDegrees = 151.5;
    p.site.timeZone = hours(10.0);
    p.site.elevation = metres(40.0);
    p.leapYear = leap;
    p.streamNumber = 99;
    return p;
}

std::string written(const WeatherYear& year, int calendarYear = 0)
{
    std::ostringstream out;
    EpwWriter::write(year, out, "first, with a comma", "second", calendarYear);
    return out.str();
}

} // namespace

TEST(AnnualEpwWriter, RoundTripsThroughTheReader)
{
    const WeatherYear original = SyntheticClimate::generate(testParameters());
    const EpwReadResult back = EpwReader().readText(written(original), "written");
    ASSERT_EQ(back.weather.size(), original.size());
    EXPECT_TRUE(back.filledGaps.empty());
    EXPECT_EQ(back.weather.site().name, original.site().name);
    EXPECT_NEAR(back.weather.site().latitudeDegrees, -33.25, 1e-12);
    EXPECT_NEAR(back.weather.site().longitudeDegrees, 151.5, 1e-12);
    EXPECT_NEAR(toHours(back.weather.site().timeZone), 10.0, 1e-12);
    EXPECT_NEAR(toMetres(back.weather.site().elevation), 40.0, 1e-12);
    for (std::size_t i = 0; i < original.size(); ++i) {
        const WeatherHour& a = original.hour(i);
        const WeatherHour& b = back.weather.hour(i);
        // One decimal in the file: 0.05 K of rounding (plus floating-point slack).
        ASSERT_NEAR(toCelsius(b.dryBulb), toCelsius(a.dryBulb), 0.05 + 1e-9) << "hour " << i;
        ASSERT_NEAR(toCelsius(b.dewPoint()), toCelsius(a.dewPoint()), 0.05 + 1e-6) << "hour " << i;
        // Whole pascals.
        ASSERT_NEAR(toPascals(b.pressure), toPascals(a.pressure), 0.5 + 1e-9) << "hour " << i;
    }
}

TEST(AnnualEpwWriter, WritingWhatWasReadIsStable)
{
    const WeatherYear once = EpwReader().readText(written(SyntheticClimate::generate(testParameters()))).weather;
    const std::string text = written(once);
    const WeatherYear twice = EpwReader().readText(text).weather;
    EXPECT_EQ(written(twice), text);
}

TEST(AnnualEpwWriter, WritesALeapYearWithItsCalendar)
{
    const WeatherYear leap = SyntheticClimate::generate(testParameters(true));
    const std::string text = written(leap);
    EXPECT_NE(text.find("\n2004,2,29,24,"), std::string::npos);
    // 1 January 2004 was a Thursday (calendar).
    EXPECT_NE(text.find("DATA PERIODS,1,1,Data,Thursday"), std::string::npos);
    EXPECT_EQ(EpwReader().readText(text).weather.size(), 8784u);
    // 1 January 2001 was a Monday (calendar).
    EXPECT_NE(written(SyntheticClimate::generate(testParameters())).find("Data,Monday"), std::string::npos);
}

TEST(AnnualEpwWriter, RejectsWhatTheFormatCannotCarry)
{
    const WeatherYear normal = SyntheticClimate::generate(testParameters());
    std::ostringstream out;
    EXPECT_THROW(EpwWriter::write(normal, out, {}, {}, 2004), InputError); // leap calendar, 8760 hours
    EXPECT_THROW(EpwWriter::write(normal, out, "two\nlines"), InputError);

    SyntheticClimateParameters p = testParameters();
    p.site.name = "Comma, Town";
    EXPECT_THROW(EpwWriter::write(SyntheticClimate::generate(p), out), InputError);
}
