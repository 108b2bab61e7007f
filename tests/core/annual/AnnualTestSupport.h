#pragma once
// Shared inputs of the annual simulation tests: the demo project and the demo
// climate, loaded once.

#include "airwright/core/annual/BinTableReader.h"
#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/WeatherYear.h"
#include "airwright/core/project/ProjectFile.h"

#include <filesystem>
#include <string>
#include <vector>

namespace AnnualTestSupport {

inline std::filesystem::path demoFile(const std::string& name)
{
    return std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / name;
}

inline const Airwright::Core::Chain::AirHandlingUnit& demoUnit()
{
    static const auto unit = [] {
        Airwright::Core::Project::LoadReport report;
        return Airwright::Core::Project::ProjectFile::load(demoFile("demo-library.awproj"), report).unit;
    }();
    return unit;
}

inline const Airwright::Core::Annual::WeatherYear& demoYear()
{
    static const auto year = Airwright::Core::Annual::EpwReader().readFile(demoFile("demo-climate.epw")).weather;
    return year;
}

inline const Airwright::Core::Annual::BinTable& demoBins()
{
    static const auto bins =
        Airwright::Core::Annual::BinTableReader(demoUnit().site.pressure()).readFile(demoFile("demo-bins.csv"));
    return bins;
}

// A year of one constant outdoor state.
inline Airwright::Core::Annual::WeatherYear constantYear(double dryBulbC, double humidityGkg, double pressurePa)
{
    using namespace Airwright::Core;
    return Annual::WeatherYear(
        Annual::SiteInfo{}, std::vector<Annual::WeatherHour>(Annual::WeatherYear::kHoursInYear,
                                                             {celsius(dryBulbC), gramsPerKilogram(humidityGkg),
                                                              pascals(pressurePa)}));
}

} // namespace AnnualTestSupport
