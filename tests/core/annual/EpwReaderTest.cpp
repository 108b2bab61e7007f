#include "EpwTestText.h"

#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/WeatherFileError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <sstream>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using namespace Airwright::Core::Annual::Test;

namespace {

std::filesystem::path epwData(const std::string& name)
{
    return std::filesystem::path(AIRWRIGHT_TEST_DATA_DIR) / "epw" / name;
}

// Runs fn, expects a WeatherFileError, returns it.
template <typename Fn> WeatherFileError expectFileError(Fn fn)
{
    try {
        fn();
    } catch (const WeatherFileError& e) {
        return e;
    }
    ADD_FAILURE() << "expected a WeatherFileError";
    return WeatherFileError("none", 0, 0, "none");
}

} // namespace

TEST(AnnualEpwReader, ReadsAConstantYear)
{
    const EpwReadResult result = EpwReader().readText(constantEpwText(), "constant");
    const WeatherYear& year = result.weather;
    ASSERT_EQ(year.size(), 8760u);
    EXPECT_FALSE(year.isLeapYear());
    EXPECT_TRUE(result.filledGaps.empty());
    EXPECT_EQ(year.site().name, "Test Site (invented)");
    EXPECT_EQ(year.site().region, "Test Region");
    EXPECT_EQ(year.site().country, "ZZ");
    EXPECT_NEAR(year.site().latitudeDegrees, 50.0, 1e-12);
    EXPECT_NEAR(year.site().longitudeDegrees, 10.0, 1e-12);
    EXPECT_NEAR(toHours(year.site().timeZone), 1.0, 1e-12);
    EXPECT_NEAR(toMetres(year.site().elevation), 200.0, 1e-12);

    const WeatherHour& h = year.hour(4000);
    EXPECT_NEAR(toCelsius(h.dryBulb), 5.0, 1e-12);
    EXPECT_NEAR(toPascals(h.pressure), 98000.0, 1e-9);
    // ASHRAE Fundamentals 2017 ch. 1 eq. 20, W = 0.621945 pw / (p - pw), with the
    // saturation pressure at the 1.0 C dew point, pws(1 C) = 657.1 Pa from ch. 1
    // table 3 (from memory): W = 0.621945 x 657.1 / (98000 - 657.1) = 4.198 g/kg.
    // Tolerance 0.01 g/kg covers the table's four digits.
    EXPECT_NEAR(toGramsPerKilogram(h.humidityRatio), 4.198, 0.01);
    // Dew point read back through the psychrometric inverse: the file's 1.0 C.
    EXPECT_NEAR(toCelsius(h.dewPoint()), 1.0, 1e-6);
}

TEST(AnnualEpwReader, ReadsCrlfAndByteOrderMark)
{
    const std::string lf = constantEpwText();
    const std::string crlf = epwText([](std::size_t) { return EpwFields{}; }, false, true);
    ASSERT_NE(crlf.find("\r\n"), std::string::npos);
    const WeatherYear a = EpwReader().readText(lf).weather;
    const WeatherYear b = EpwReader().readText(crlf).weather;
    const WeatherYear c = EpwReader().readText("\xEF\xBB\xBF" + crlf).weather;
    EXPECT_EQ(a.hours(), b.hours());
    EXPECT_EQ(a.hours(), c.hours());
    EXPECT_EQ(a.site(), b.site());
}

TEST(AnnualEpwReader, IgnoresTrailingBlankLines)
{
    const WeatherYear year = EpwReader().readText(constantEpwText() + "\n\n  \n").weather;
    EXPECT_EQ(year.size(), 8760u);
}

TEST(AnnualEpwReader, ReadsALeapYear)
{
    const WeatherYear year = EpwReader().readText(epwText([](std::size_t) { return EpwFields{}; }, true)).weather;
    EXPECT_EQ(year.size(), 8784u);
    EXPECT_TRUE(year.isLeapYear());
}

TEST(AnnualEpwReader, ReadsFromAStreamAndAFile)
{
    const std::string text = constantEpwText();
    std::istringstream in(text);
    EXPECT_EQ(EpwReader().readStream(in).weather.size(), 8760u);

    const auto path = std::filesystem::temp_directory_path() / "airwright-annual-constant.epw";
    {
        std::ofstream out(path, std::ios::binary);
        out << text;
    }
    EXPECT_EQ(EpwReader().readFile(path).weather.size(), 8760u);
    std::filesystem::remove(path);
}

TEST(AnnualEpwReader, RefusesOversizedInput)
{
    EpwReadOptions options;
    options.maxBytes = 4096;
    const std::string text = constantEpwText();

    auto e = expectFileError([&] { EpwReader(options).readText(text); });
    EXPECT_EQ(e.line(), 0u);
    EXPECT_NE(std::string(e.what()).find("limit"), std::string::npos);

    std::istringstream in(text);
    e = expectFileError([&] { EpwReader(options).readStream(in); });
    EXPECT_EQ(e.line(), 0u);

    const auto path = std::filesystem::temp_directory_path() / "airwright-annual-oversized.epw";
    {
        std::ofstream out(path, std::ios::binary);
        out << text;
    }
    e = expectFileError([&] { EpwReader(options).readFile(path); });
    EXPECT_EQ(e.line(), 0u);
    EXPECT_NE(std::string(e.what()).find("bytes"), std::string::npos);
    std::filesystem::remove(path);

    // The default limit is 50 MB.
    EXPECT_EQ(EpwReadOptions{}.maxBytes, 50u * 1024u * 1024u);
}

TEST(AnnualEpwReader, ReportsAMissingFile)
{
    const auto e = expectFileError([] { EpwReader().readFile(epwData("no-such-file.epw")); });
    EXPECT_EQ(e.line(), 0u);
    EXPECT_EQ(e.column(), 0u);
}

TEST(AnnualEpwReader, ErrorIsAnInputErrorWithLineAndFieldInItsMessage)
{
    try {
        EpwReader().readFile(epwData("dry-bulb-range.epw"));
        FAIL() << "expected an error";
    } catch (const InputError& e) {
        const std::string what = e.what();
        EXPECT_NE(what.find("line 12, field 7"), std::string::npos) << what;
        EXPECT_NE(what.find("75"), std::string::npos) << what;
        EXPECT_NE(what.find("dry bulb"), std::string::npos) << what;
    }
}

// ---- missing values: the documented rule -----------------------------------

TEST(AnnualEpwReader, InterpolatesAShortDryBulbGapLinearly)
{
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i == 99)
            f.dryBulb = "10.0";
        if (i == 100 || i == 101)
            f.dryBulb = "99.9";
        if (i == 102)
            f.dryBulb = "16.0";
        return f;
    });
    const EpwReadResult result = EpwReader().readText(text);
    // Hand calculation: linear in time between 10.0 C and 16.0 C over three steps.
    EXPECT_NEAR(toCelsius(result.weather.hour(100).dryBulb), 12.0, 1e-9);
    EXPECT_NEAR(toCelsius(result.weather.hour(101).dryBulb), 14.0, 1e-9);
    ASSERT_EQ(result.filledGaps.size(), 1u);
    EXPECT_EQ(result.filledGaps[0].firstLine, kFirstDataLine + 100);
    EXPECT_EQ(result.filledGaps[0].column, 7u);
    EXPECT_EQ(result.filledGaps[0].hours, 2u);
}

TEST(AnnualEpwReader, HoldsTheNeighbourForAGapAtTheStartOfTheYear)
{
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i < 3)
            f.pressure = "999999";
        if (i == 3)
            f.pressure = "97000";
        return f;
    });
    const EpwReadResult result = EpwReader().readText(text);
    for (std::size_t i = 0; i < 3; ++i)
        EXPECT_NEAR(toPascals(result.weather.hour(i).pressure), 97000.0, 1e-9);
    ASSERT_EQ(result.filledGaps.size(), 1u);
    EXPECT_EQ(result.filledGaps[0].column, 10u);
    EXPECT_EQ(result.filledGaps[0].firstLine, kFirstDataLine);
}

TEST(AnnualEpwReader, RejectsAGapLongerThanTheLimit)
{
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i >= 500 && i < 507) // 7 hours, one more than the default 6
            f.dryBulb = "99.9";
        return f;
    });
    const auto e = expectFileError([&] { EpwReader().readText(text); });
    EXPECT_EQ(e.line(), kFirstDataLine + 500);
    EXPECT_EQ(e.column(), 7u);
}

TEST(AnnualEpwReader, RejectsTooManyMissingHoursInTheYear)
{
    // 30 gaps of 6 hours, every 100 hours: each within the gap rule, 180 in all
    // against the default limit of 168.
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i < 3000 && i % 100 >= 10 && i % 100 < 16)
            f.pressure = "999999";
        return f;
    });
    const auto e = expectFileError([&] { EpwReader().readText(text); });
    EXPECT_EQ(e.line(), kFirstDataLine + 10);
    EXPECT_EQ(e.column(), 10u);

    EpwReadOptions lenient;
    lenient.maxMissingHours = 200;
    EXPECT_EQ(EpwReader(lenient).readText(text).filledGaps.size(), 30u);
}

TEST(AnnualEpwReader, RejectsAQuantityMissingEverywhere)
{
    const std::string text = epwText([](std::size_t) {
        EpwFields f;
        f.dryBulb = "99.9";
        return f;
    });
    EpwReadOptions lenient;
    lenient.maxGapHours = 9000;
    lenient.maxMissingHours = 9000;
    const auto e = expectFileError([&] { EpwReader(lenient).readText(text); });
    EXPECT_EQ(e.line(), kFirstDataLine);
    EXPECT_EQ(e.column(), 7u);
}

TEST(AnnualEpwReader, TakesHumidityFromRelativeHumidityWhenTheDewPointIsMissing)
{
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i == 2000) {
            f.dewPoint = "99.9";
            f.relativeHumidity = "50";
        }
        return f;
    });
    const EpwReadResult result = EpwReader().readText(text);
    EXPECT_TRUE(result.filledGaps.empty());
    // Consistency with the psychrometric layer: 50 % at 5.0 C and 98000 Pa.
    EXPECT_NEAR(toPercent(result.weather.hour(2000).relativeHumidity()), 50.0, 1e-6);
}

TEST(AnnualEpwReader, InterpolatesHumidityWhenDewPointAndRelativeHumidityAreMissing)
{
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i == 2000) {
            f.dewPoint = "99.9";
            f.relativeHumidity = "999";
        }
        return f;
    });
    const EpwReadResult result = EpwReader().readText(text);
    ASSERT_EQ(result.filledGaps.size(), 1u);
    EXPECT_EQ(result.filledGaps[0].column, 8u);
    // Both neighbours carry the same humidity, so the gap takes it exactly.
    EXPECT_NEAR(toKilogramsPerKilogram(result.weather.hour(2000).humidityRatio),
                toKilogramsPerKilogram(result.weather.hour(1999).humidityRatio), 1e-15);
}

TEST(AnnualEpwReader, TakesADewPointJustAboveTheDryBulbAsSaturated)
{
    const std::string text = epwText([](std::size_t i) {
        EpwFields f;
        if (i == 10)
            f.dewPoint = "5.3"; // 0.3 K above the 5.0 C dry bulb, within the 0.5 K tolerance
        return f;
    });
    const WeatherYear year = EpwReader().readText(text).weather;
    EXPECT_NEAR(toPercent(year.hour(10).relativeHumidity()), 100.0, 1e-6);
}

// ---- broken files: every error carries line and field ------------------------

struct BrokenEpw {
    const char* file;
    std::size_t line;
    std::size_t column;
    const char* messagePart;
};

class AnnualEpwReaderBrokenFile : public testing::TestWithParam<BrokenEpw> {};

TEST_P(AnnualEpwReaderBrokenFile, ReportsLineAndField)
{
    const BrokenEpw& c = GetParam();
    const auto e = expectFileError([&] { EpwReader().readFile(epwData(c.file)); });
    EXPECT_EQ(e.line(), c.line) << e.what();
    EXPECT_EQ(e.column(), c.column) << e.what();
    EXPECT_NE(std::string(e.what()).find(c.messagePart), std::string::npos) << e.what();
}

INSTANTIATE_TEST_SUITE_P(Files, AnnualEpwReaderBrokenFile,
                         testing::Values(BrokenEpw{"bad-header.epw", 3, 1, "TYPICAL/EXTREME PERIODS"},
                                         BrokenEpw{"location-latitude.epw", 1, 7, "latitude 95"},
                                         BrokenEpw{"location-fields.epw", 1, 10, "has 9 fields; expected 10"},
                                         BrokenEpw{"data-periods-per-hour.epw", 8, 3, "records per hour is 4"},
                                         BrokenEpw{"data-periods-count.epw", 8, 2, "data periods is 2"},
                                         BrokenEpw{"field-count.epw", 11, 35, "has 34 fields; expected 35"},
                                         BrokenEpw{"non-numeric.epw", 10, 7, "'warm' is not a number"},
                                         BrokenEpw{"non-numeric-crlf.epw", 10, 10, "'98 000' is not a number"},
                                         BrokenEpw{"dry-bulb-range.epw", 12, 7, "75 C is outside"},
                                         BrokenEpw{"pressure-range.epw", 9, 10, "25000 Pa is outside"},
                                         BrokenEpw{"humidity-range.epw", 10, 9, "130 % is outside"},
                                         BrokenEpw{"minute-range.epw", 10, 5, "minute 61"},
                                         BrokenEpw{"month-range.epw", 9, 2, "month 13"},
                                         BrokenEpw{"missing-hour.epw", 11, 4, "expected 1/1 hour 3"},
                                         BrokenEpw{"skipped-day.epw", 33, 3, "expected 1/2 hour 1"},
                                         BrokenEpw{"dew-point-above-dry-bulb.epw", 9, 8, "above the dry bulb"},
                                         BrokenEpw{"truncated.epw", 12, 0, "ends after 3 hourly records"},
                                         BrokenEpw{"truncated-crlf.epw", 12, 0, "ends after 3 hourly records"},
                                         BrokenEpw{"blank-line.epw", 10, 0, "blank line"},
                                         BrokenEpw{"empty.epw", 1, 0, "within the header"}));

// Errors placed in a full in-memory year, where the line is far from the header.
struct BrokenHour {
    const char* name;
    std::size_t hourIndex;
    EpwFields fields;
    std::size_t column;
};

class AnnualEpwReaderBrokenHour : public testing::TestWithParam<BrokenHour> {};

TEST_P(AnnualEpwReaderBrokenHour, ReportsLineAndField)
{
    const BrokenHour& c = GetParam();
    const std::string text =
        epwText([&](std::size_t i) { return i == c.hourIndex ? c.fields : EpwFields{}; }, false, true);
    const auto e = expectFileError([&] { EpwReader().readText(text, "memory"); });
    EXPECT_EQ(e.line(), kFirstDataLine + c.hourIndex) << e.what();
    EXPECT_EQ(e.column(), c.column) << e.what();
    EXPECT_EQ(e.source(), "memory");
}

INSTANTIATE_TEST_SUITE_P(
    Hours, AnnualEpwReaderBrokenHour,
    testing::Values(BrokenHour{"DryBulbBelowRange", 8000, {"-70.0", "-71.0", "50", "98000"}, 7},
                    BrokenHour{"DryBulbAboveRangeBelowMissingCode", 7000, {"80.0", "1.0", "50", "98000"}, 7},
                    BrokenHour{"DewPointNotANumber", 6000, {"5.0", "1.0.0", "50", "98000"}, 8},
                    BrokenHour{"DewPointFarAboveDryBulb", 5000, {"5.0", "5.6", "100", "98000"}, 8},
                    BrokenHour{"NegativeHumidity", 4000, {"5.0", "1.0", "-1", "98000"}, 9},
                    BrokenHour{"PressureAtUpperLimit", 3000, {"5.0", "1.0", "50", "120000"}, 10},
                    BrokenHour{"PressureNaN", 2000, {"5.0", "1.0", "50", "nan"}, 10},
                    BrokenHour{"DryBulbInfinite", 1000, {"inf", "1.0", "50", "98000"}, 7},
                    BrokenHour{"LastHour", 8759, {"5.0", "1.0", "50", "abc"}, 10}),
    [](const testing::TestParamInfo<BrokenHour>& row) { return std::string(row.param.name); });

TEST(AnnualEpwReader, RejectsARecordAfterTheLastHour)
{
    std::string text = constantEpwText();
    text += "2001,12,31,24,0,*,5.0,1.0,76,98000," + std::string(kUnusedFields) + "\n";
    const auto e = expectFileError([&] { EpwReader().readText(text); });
    EXPECT_EQ(e.line(), kFirstDataLine + 8760);
    EXPECT_EQ(e.column(), 0u);
}

TEST(AnnualEpwReader, RejectsTwentyNinthOfFebruaryInAYearThatEndsAt8760)
{
    // Leap day present but 31 December missing its last day: the file ends early.
    std::string text = epwText([](std::size_t) { return EpwFields{}; }, true);
    text.erase(text.size() - 1);
    for (int i = 0; i < 24; ++i)
        text.erase(text.rfind('\n'));
    text += "\n";
    const auto e = expectFileError([&] { EpwReader().readText(text); });
    EXPECT_EQ(e.column(), 0u);
    EXPECT_NE(std::string(e.what()).find("12/30 hour 24"), std::string::npos) << e.what();
}
