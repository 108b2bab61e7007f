#include "airwright/core/annual/DemoClimate.h"
#include "airwright/core/annual/BinTableReader.h"
#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/EpwWriter.h"
#include "airwright/core/annual/SyntheticClimate.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

std::filesystem::path demoFile(const std::string& name)
{
    return std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / name;
}

const EpwReadResult& shippedDemo()
{
    static const EpwReadResult result = EpwReader().readFile(demoFile("demo-climate.epw"));
    return result;
}

std::vector<std::string> dataFields(const std::string& line)
{
    std::vector<std::string> fields;
    std::stringstream in(line);
    std::string field;
    while (std::getline(in, field, ','))
        fields.push_back(field);
    return fields;
}

} // namespace

TEST(AnnualDemoClimate, ShippedFileReadsAsAnInventedFullYear)
{
    const EpwReadResult& demo = shippedDemo();
    EXPECT_EQ(demo.weather.size(), 8760u);
    EXPECT_TRUE(demo.filledGaps.empty());
    EXPECT_NE(demo.weather.site().name.find("(invented)"), std::string::npos);
    EXPECT_NEAR(toMetres(demo.weather.site().elevation), 250.0, 1e-9);
}

TEST(AnnualDemoClimate, ShippedFileMatchesTheGenerator)
{
    // The shipped file is what DemoClimate::parameters() generates, to the file's
    // rounding (0.1 K, 1 Pa).
    const WeatherYear generated = SyntheticClimate::generate(DemoClimate::parameters());
    const WeatherYear& shipped = shippedDemo().weather;
    ASSERT_EQ(generated.size(), shipped.size());
    EXPECT_EQ(generated.site(), shipped.site());
    for (std::size_t i = 0; i < shipped.size(); ++i) {
        ASSERT_NEAR(toCelsius(shipped.hour(i).dryBulb), toCelsius(generated.hour(i).dryBulb), 0.05 + 1e-6)
            << "hour " << i;
        ASSERT_NEAR(toCelsius(shipped.hour(i).dewPoint()), toCelsius(generated.hour(i).dewPoint()), 0.05 + 1e-5)
            << "hour " << i;
        ASSERT_NEAR(toPascals(shipped.hour(i).pressure), toPascals(generated.hour(i).pressure), 0.5 + 1e-6);
    }
}

TEST(AnnualDemoClimate, ShippedFileHasTheDocumentedCharacter)
{
    // The figures promised in resources/demo/demo-climate.md: winter design near
    // -12 C, summer peaks near 30 C.
    const WeatherYear& year = shippedDemo().weather;
    std::vector<double> t;
    for (const auto& h : year.hours())
        t.push_back(toCelsius(h.dryBulb));
    std::sort(t.begin(), t.end());
    const double low = t[static_cast<std::size_t>(0.004 * 8759.0 + 0.5)];
    EXPECT_NEAR(low, -12.0, 1.0);
    EXPECT_NEAR(toCelsius(year.maxDryBulb()), 30.0, 2.0);
    EXPECT_NEAR(toCelsius(year.meanDryBulb()), 8.5, 1.0);
}

TEST(AnnualDemoClimate, ShippedFileRoundTripsThroughReaderAndWriter)
{
    std::ifstream in(demoFile("demo-climate.epw"), std::ios::binary);
    std::vector<std::string> original;
    for (std::string line; std::getline(in, line);)
        original.push_back(line);

    std::ostringstream out;
    EpwWriter::write(shippedDemo().weather, out, "c1", "c2");
    std::istringstream rewritten(out.str());
    std::vector<std::string> again;
    for (std::string line; std::getline(rewritten, line);)
        again.push_back(line);

    ASSERT_EQ(again.size(), original.size());
    EXPECT_EQ(again[0], original[0]); // LOCATION
    for (std::size_t i = 8; i < original.size(); ++i) {
        const auto a = dataFields(original[i]);
        const auto b = dataFields(again[i]);
        ASSERT_EQ(a.size(), 35u) << "line " << i + 1;
        ASSERT_EQ(b.size(), 35u) << "line " << i + 1;
        // Date, dry bulb, dew point and pressure come back as written.
        for (std::size_t field : {1u, 2u, 3u, 4u, 7u, 8u, 10u})
            ASSERT_EQ(a[field - 1], b[field - 1]) << "line " << i + 1 << " field " << field;
    }
}

TEST(AnnualDemoClimate, ShippedBinsAreTheBinsOfTheShippedYear)
{
    const WeatherYear& year = shippedDemo().weather;
    const BinTable expected = year.toBins(DemoClimate::binWidth());
    const BinTable shipped = BinTableReader(year.meanPressure()).readFile(demoFile("demo-bins.csv"));
    ASSERT_EQ(shipped.bins().size(), expected.bins().size());
    EXPECT_NEAR(toHours(shipped.totalDuration()), 8760.0, 1e-9);
    for (std::size_t i = 0; i < expected.bins().size(); ++i) {
        const auto& a = shipped.bins()[i];
        const auto& b = expected.bins()[i];
        // Written with two decimals of C and three of g/kg.
        EXPECT_NEAR(toCelsius(a.dryBulb), toCelsius(b.dryBulb), 0.005 + 1e-9);
        EXPECT_NEAR(toHours(a.duration), toHours(b.duration), 1e-9);
        EXPECT_NEAR(toGramsPerKilogram(a.humidityRatio), toGramsPerKilogram(b.humidityRatio), 0.0005 + 1e-9);
    }
}
