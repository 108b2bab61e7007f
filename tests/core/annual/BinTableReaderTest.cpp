#include "airwright/core/annual/BinTableReader.h"
#include "airwright/core/annual/BinTableWriter.h"
#include "airwright/core/annual/WeatherFileError.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <sstream>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {
const Pressure kPressure = pascals(98000.0);
} // namespace

TEST(AnnualBinTableReader, ReadsHumidityRatioColumns)
{
    const BinTable table = BinTableReader(kPressure).readText("# demo\n"
                                                              "tdb_C,hours,w_gkg\n"
                                                              "-11,14,1.2\n"
                                                              "\n"
                                                              "-9,37.5,1.5\n"
                                                              "+1e1,100,5\n");
    ASSERT_EQ(table.bins().size(), 3u);
    EXPECT_NEAR(toCelsius(table.bins()[0].dryBulb), -11.0, 1e-12);
    EXPECT_NEAR(toHours(table.bins()[1].duration), 37.5, 1e-12);
    EXPECT_NEAR(toGramsPerKilogram(table.bins()[1].humidityRatio), 1.5, 1e-12);
    EXPECT_NEAR(toCelsius(table.bins()[2].dryBulb), 10.0, 1e-12);
    EXPECT_NEAR(toHours(table.totalDuration()), 151.5, 1e-12);
    EXPECT_NEAR(toPascals(table.pressure()), 98000.0, 1e-12);
}

TEST(AnnualBinTableReader, ReadsRelativeHumidityColumnsInAnyOrderWithCrlf)
{
    const BinTable table = BinTableReader(kPressure).readText("hours,RH_PCT,tdb_C\r\n"
                                                              "120,80,0\r\n"
                                                              "60,55,20\r\n");
    ASSERT_EQ(table.bins().size(), 2u);
    // Consistency with the psychrometric layer: the relative humidity read back.
    EXPECT_NEAR(toPercent(Psychro::relativeHumidityFromHumidityRatio(table.bins()[0].dryBulb,
                                                                     table.bins()[0].humidityRatio, kPressure)),
                80.0, 1e-6);
    EXPECT_NEAR(toPercent(Psychro::relativeHumidityFromHumidityRatio(table.bins()[1].dryBulb,
                                                                     table.bins()[1].humidityRatio, kPressure)),
                55.0, 1e-6);
    EXPECT_NEAR(toHours(table.bins()[0].duration), 120.0, 1e-12);
}

TEST(AnnualBinTableReader, RoundTripsThroughTheWriter)
{
    const BinTable original({{celsius(-7.25), hours(100.0), gramsPerKilogram(1.875)},
                             {celsius(3.5), hours(2000.0), gramsPerKilogram(4.25)}},
                            kPressure);
    std::ostringstream out;
    BinTableWriter::write(original, out, {"a comment", "another"});
    const BinTable back = BinTableReader(kPressure).readText(out.str());
    ASSERT_EQ(back.bins().size(), 2u);
    for (std::size_t i = 0; i < 2; ++i) {
        // The writer keeps two decimals of C and three of g/kg; these values need no rounding.
        EXPECT_NEAR(toCelsius(back.bins()[i].dryBulb), toCelsius(original.bins()[i].dryBulb), 1e-12);
        EXPECT_NEAR(toHours(back.bins()[i].duration), toHours(original.bins()[i].duration), 1e-12);
        EXPECT_NEAR(toGramsPerKilogram(back.bins()[i].humidityRatio),
                    toGramsPerKilogram(original.bins()[i].humidityRatio), 1e-12);
    }
}

TEST(AnnualBinTableReader, RefusesOversizedInput)
{
    std::string text = "tdb_C,hours,w_gkg\n";
    while (text.size() < 2000)
        text += "# padding padding padding padding\n";
    text += "0,1,1\n";
    try {
        BinTableReader(kPressure, 1000).readText(text);
        FAIL() << "expected an error";
    } catch (const WeatherFileError& e) {
        EXPECT_EQ(e.line(), 0u);
    }
    EXPECT_NO_THROW(BinTableReader(kPressure, 4000).readText(text));
}

struct BrokenBins {
    const char* name;
    const char* text;
    std::size_t line;
    std::size_t column;
};

class AnnualBinTableReaderBroken : public testing::TestWithParam<BrokenBins> {};

TEST_P(AnnualBinTableReaderBroken, ReportsLineAndField)
{
    const BrokenBins& c = GetParam();
    if (c.line == 0 && c.column == 0) { // the valid row of the table
        EXPECT_NO_THROW(BinTableReader(kPressure).readText(c.text));
        return;
    }
    try {
        BinTableReader(kPressure).readText(c.text, "bins.csv");
        FAIL() << "expected an error";
    } catch (const WeatherFileError& e) {
        EXPECT_EQ(e.line(), c.line) << e.what();
        EXPECT_EQ(e.column(), c.column) << e.what();
        EXPECT_EQ(e.source(), "bins.csv");
    }
}

INSTANTIATE_TEST_SUITE_P(
    Rows, AnnualBinTableReaderBroken,
    testing::Values(BrokenBins{"Valid", "# c\ntdb_C,hours,w_gkg\n-5,10,1.5\n5,20,4\n", 0, 0},
                    BrokenBins{"UnknownColumn", "tdb,hours,w_gkg\n0,1,1\n", 1, 1},
                    BrokenBins{"RepeatedColumn", "tdb_C,hours,hours,w_gkg\n0,1,1,1\n", 1, 3},
                    BrokenBins{"NoHumidityColumn", "tdb_C,hours\n0,1\n", 1, 0},
                    BrokenBins{"BothHumidityColumns", "tdb_C,hours,w_gkg,rh_pct\n0,1,1,50\n", 1, 0},
                    BrokenBins{"NoHoursColumn", "# c\ntdb_C,w_gkg\n0,1\n", 2, 0},
                    BrokenBins{"HoursNotANumber", "tdb_C,hours,w_gkg\n-5,10,1.5\n0,ten,2\n", 3, 2},
                    BrokenBins{"DecimalComma", "tdb_C,hours,w_gkg\n-5,10,1.5\n0,10,2,5\n", 3, 4},
                    BrokenBins{"MissingField", "tdb_C,hours,w_gkg\n-5,10,1.5\r\n0,10\r\n", 3, 3},
                    BrokenBins{"NotAscending", "tdb_C,hours,w_gkg\n5,10,4\n-5,10,1.5\n", 3, 1},
                    BrokenBins{"RepeatedTemperature", "tdb_C,hours,w_gkg\n5,10,4\n5,10,4\n", 3, 1},
                    BrokenBins{"NegativeHours", "tdb_C,hours,w_gkg\n5,-1,4\n", 2, 2},
                    BrokenBins{"TooManyHoursInAll", "tdb_C,hours,w_gkg\n0,5000,3\n10,4000,5\n", 3, 2},
                    BrokenBins{"RelativeHumidityAbove100", "tdb_C,hours,rh_pct\n0,10,120\n", 2, 3},
                    BrokenBins{"NegativeHumidityRatio", "tdb_C,w_gkg,hours\n0,-0.5,10\n", 2, 2},
                    // Saturation at -10 C is under 2 g/kg (ASHRAE Fundamentals 2017 ch. 1 table 2,
                    // from memory: 1.6 g/kg at 101.325 kPa); 5 g/kg is far above it.
                    BrokenBins{"Supersaturated", "tdb_C,hours,w_gkg\n-10,10,5\n", 2, 3},
                    BrokenBins{"TemperatureOutOfRange", "tdb_C,hours,w_gkg\n80,10,5\n", 2, 1},
                    BrokenBins{"NaN", "tdb_C,hours,w_gkg\nnan,10,5\n", 2, 1},
                    BrokenBins{"NoHeader", "# only a comment\n\n", 3, 0},
                    BrokenBins{"NoRows", "tdb_C,hours,w_gkg\n", 2, 0}),
    [](const testing::TestParamInfo<BrokenBins>& row) { return std::string(row.param.name); });
