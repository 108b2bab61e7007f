// Extreme but legal inputs on the demo project, all at once: -40 C outdoor air,
// 3000 m altitude, saturated outdoor air, 5 % airflow and a 60-section unit. The
// solver must not throw, every number must be finite, and a case that does not
// settle must say so in a finding naming a section.

#include "ResultChecks.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include <gtest/gtest.h>

#include <cctype>
#include <filesystem>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Chain;
using Airwright::Core::Project::ProjectFile;

namespace {

AirHandlingUnit demoUnit()
{
    Project::LoadReport report;
    return ProjectFile::load(std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj",
                             report)
        .unit;
}

DesignCase extremeCase(const std::string& name, double outdoorC, double outdoorRhPct, double airflowPct)
{
    DesignCase c;
    c.name = name;
    c.outdoorTemperature = celsius(outdoorC);
    c.outdoorHumidity = percent(outdoorRhPct);
    c.roomTemperature = celsius(21.0);
    c.roomHumidity = percent(40.0);
    c.supplySetpoint = celsius(19.0);
    c.airflowFraction = percent(airflowPct);
    return c;
}

void padToSixtySections(AirHandlingUnit& unit)
{
    int n = 0;
    while (unit.supply.size() + unit.extract.size() < 60) {
        Sections::PassiveSection s;
        s.kind = n % 2 ? Sections::PassiveKind::Access : Sections::PassiveKind::Silencer;
        s.ratedPressureDrop = pascals(n % 2 ? 3.0 : 30.0);
        auto& path = n % 3 ? unit.supply : unit.extract;
        path.insert(path.begin() + 1, Section{"pad-" + std::to_string(n), s});
        ++n;
    }
}

void solveAndCheck(const AirHandlingUnit& unit)
{
    UnitResult result;
    ASSERT_NO_THROW(result = ChainSolver::solve(unit));
    Property::expectAllFinite(result);
    for (const auto& c : result.cases) {
        Property::expectConvergenceReported(c, unit);
        Property::expectBalances(c);
    }
}

} // namespace

class ExtremeInputs : public ::testing::TestWithParam<bool> {};

TEST_P(ExtremeInputs, SolveFiniteAtTheEdgesOfTheRanges)
{
    auto unit = demoUnit();
    unit.site.altitude = metres(3000.0);
    unit.site.barometricPressure.reset();
    unit.cases = {extremeCase("-40 C saturated, 5 % flow", -40.0, 100.0, 5.0),
                  extremeCase("-40 C dry", -40.0, 0.0, 100.0), extremeCase("saturated summer", 35.0, 100.0, 100.0),
                  extremeCase("trickle", 10.0, 100.0, 5.0)};
    if (GetParam())
        padToSixtySections(unit);
    EXPECT_EQ(unit.supply.size() + unit.extract.size(), GetParam() ? 60u : 12u);
    solveAndCheck(unit);
}

INSTANTIATE_TEST_SUITE_P(Units, ExtremeInputs, ::testing::Bool(),
                         [](const ::testing::TestParamInfo<bool>& row) {
                             return row.param ? std::string("sixty_sections") : std::string("demo_sections");
                         });

// The invalid neighbours of the extremes are refused with InputError, not solved.
class ExtremeInputsOutsideRange : public ::testing::TestWithParam<DesignCase> {};

TEST_P(ExtremeInputsOutsideRange, Refused)
{
    auto unit = demoUnit();
    unit.cases = {GetParam()};
    EXPECT_THROW(ChainSolver::solve(unit), InputError);
}

INSTANTIATE_TEST_SUITE_P(Cases, ExtremeInputsOutsideRange,
                         ::testing::Values(extremeCase("rh above 100", -40.0, 100.5, 100.0),
                                           extremeCase("outdoor below -60", -60.5, 50.0, 100.0),
                                           extremeCase("airflow below 5", 10.0, 50.0, 4.9)),
                         [](const ::testing::TestParamInfo<DesignCase>& row) {
                             std::string name = row.param.name;
                             for (auto& ch : name)
                                 if (!std::isalnum(static_cast<unsigned char>(ch)))
                                     ch = '_';
                             return name;
                         });
