#include "ExampleUnits.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/chain/SectionFigures.h"

#include <gtest/gtest.h>

#include <algorithm>

using namespace Airwright::Core;
using namespace Airwright::Core::Chain;
using Testing::exampleUnit;

namespace {

bool hasFinding(const CaseResult& r, const std::string& code)
{
    return std::any_of(r.findings.begin(), r.findings.end(), [&](const Finding& f) { return f.code == code; });
}

const SectionResult& section(const CaseResult& r, PathKind path, const std::string& id)
{
    const auto* s = r.find(path, id);
    EXPECT_NE(s, nullptr) << id;
    return *s;
}

} // namespace

TEST(ChainSolver, WinterReachesSetpointWithRecoveryThenHeating)
{
    const auto result = ChainSolver::solve(exampleUnit());
    const auto& winter = result.cases.at(0);
    ASSERT_TRUE(winter.converged);
    // The supply leaves at the setpoint: the heating coil aims below it by the fan's
    // temperature rise downstream. Tolerance: the solver's convergence (1e-4 K).
    EXPECT_NEAR(toCelsius(winter.supply.back().outlet.state.dryBulb()), 19.0, 2e-3);
    const auto& hr = section(winter, PathKind::Supply, "HR");
    const auto& coil = section(winter, PathKind::Supply, "HC");
    const auto& cooler = section(winter, PathKind::Supply, "CC");
    EXPECT_GT(hr.duty.value(), 0.0);
    EXPECT_GT(coil.duty.value(), 0.0);
    EXPECT_NEAR(cooler.duty.value(), 0.0, 1e-6); // no simultaneous heating and cooling
    // At -10 C the counter-flow plate would frost (extract 21 C / 35 %): the default
    // protection opens the bypass just enough, and says what it costs.
    const auto& detail = std::get<Recovery::HeatRecoveryDetail>(hr.detail);
    EXPECT_TRUE(detail.frost.risk);
    EXPECT_EQ(detail.frost.strategy, Recovery::FrostStrategy::Bypass);
    EXPECT_GT(detail.bypassFraction.value(), 0.0);
    EXPECT_LT(detail.frost.recoveredFraction.value(), 1.0);
    EXPECT_GT(detail.frost.protectionPower.value(), 0.0);
    ASSERT_TRUE(detail.frost.onsetOutdoorTemperature.has_value());
    EXPECT_GT(toCelsius(*detail.frost.onsetOutdoorTemperature), -10.0);
}

TEST(ChainSolver, PartAirflowCaseSeesTheExchangerAtPartFlow)
{
    // The exchanger is one device rated at the unit's design flow: in a case at
    // half the airflow its NTU = UA / C rises (UA ~ m^0.6, C ~ m; Incropera,
    // Fundamentals of Heat and Mass Transfer, 6th ed., sec. 11.4), so its
    // effectiveness rises. Frost protection is left out (no strategy) so that
    // only the exchanger itself is compared.
    auto unit = exampleUnit();
    std::get<Recovery::HeatRecovery>(unit.supply[2].spec).frostStrategy = Recovery::FrostStrategy::None;
    unit.cases.resize(1);
    unit.cases.push_back(unit.cases.front());
    unit.cases.back().name = "half airflow";
    unit.cases.back().airflowFraction = fraction(0.5);
    const auto result = ChainSolver::solve(unit);
    const auto effectiveness = [&](std::size_t i) {
        return std::get<Recovery::HeatRecoveryDetail>(section(result.cases.at(i), PathKind::Supply, "HR").detail)
            .temperatureEffectiveness.value();
    };
    EXPECT_GT(effectiveness(1), effectiveness(0) + 0.02);
    // The same device: the regulation figure at rated flow does not move with the case.
    EXPECT_EQ(std::get<Recovery::HeatRecoveryDetail>(section(result.cases.at(1), PathKind::Supply, "HR").detail)
                  .regulationThermalEfficiency.value(),
              std::get<Recovery::HeatRecoveryDetail>(section(result.cases.at(0), PathKind::Supply, "HR").detail)
                  .regulationThermalEfficiency.value());
}

TEST(ChainSolver, UnprotectedFrostIsAnErrorFindingAndRecoveryRunsFull)
{
    auto unit = exampleUnit();
    std::get<Recovery::HeatRecovery>(unit.supply[2].spec).frostStrategy = Recovery::FrostStrategy::None;
    const auto result = ChainSolver::solve(unit);
    const auto& winter = result.cases.at(0);
    EXPECT_TRUE(hasFinding(winter, "frost.unprotected"));
    const auto& detail = std::get<Recovery::HeatRecoveryDetail>(section(winter, PathKind::Supply, "HR").detail);
    // Full recovery cannot overshoot 19 C from -10 C: no bypass.
    EXPECT_NEAR(detail.bypassFraction.value(), 0.0, 1e-9);
    EXPECT_NEAR(toCelsius(winter.supply.back().outlet.state.dryBulb()), 19.0, 2e-3);
}

TEST(ChainSolver, PreheatProtectionAddsItsDutyToHeating)
{
    auto unit = exampleUnit();
    std::get<Recovery::HeatRecovery>(unit.supply[2].spec).frostStrategy = Recovery::FrostStrategy::Preheat;
    const auto result = ChainSolver::solve(unit);
    const auto& winter = result.cases.at(0);
    EXPECT_TRUE(hasFinding(winter, "frost.preheat"));
    const auto& detail = std::get<Recovery::HeatRecoveryDetail>(section(winter, PathKind::Supply, "HR").detail);
    EXPECT_GT(detail.frost.protectionPower.value(), 0.0);
    const auto& coil = std::get<Sections::WaterHeatingCoil::Detail>(section(winter, PathKind::Supply, "HC").detail);
    EXPECT_NEAR(winter.totals.heating.value(), coil.duty.value() + detail.frost.protectionPower.value(), 1e-6);
}

TEST(ChainSolver, SummerCoolsAndDoesNotHeat)
{
    const auto result = ChainSolver::solve(exampleUnit());
    const auto& summer = result.cases.at(1);
    ASSERT_TRUE(summer.converged);
    EXPECT_NEAR(toCelsius(summer.supply.back().outlet.state.dryBulb()), 17.0, 2e-3);
    EXPECT_LT(section(summer, PathKind::Supply, "CC").duty.value(), 0.0);
    EXPECT_NEAR(section(summer, PathKind::Supply, "HC").duty.value(), 0.0, 1e-6);
    // Extract air (25 C) is cooler than outdoor air (30 C): the exchanger pre-cools.
    EXPECT_LT(section(summer, PathKind::Supply, "HR").duty.value(), 0.0);
}

TEST(ChainSolver, BypassLimitsRecoveryInMildWeather)
{
    auto unit = exampleUnit();
    DesignCase mild = Testing::winterCase();
    mild.name = "mild";
    mild.outdoorTemperature = celsius(14.0);
    mild.outdoorHumidity = percent(60.0);
    unit.cases = {mild};
    const auto result = ChainSolver::solve(unit);
    const auto& c = result.cases.at(0);
    const auto& detail = std::get<Recovery::HeatRecoveryDetail>(section(c, PathKind::Supply, "HR").detail);
    EXPECT_GT(detail.bypassFraction.value(), 0.05);
    EXPECT_NEAR(section(c, PathKind::Supply, "HC").duty.value(), 0.0, 1e-3);
    EXPECT_NEAR(toCelsius(c.supply.back().outlet.state.dryBulb()), 19.0, 0.05);
}

TEST(ChainSolver, DehumidificationWithReheat)
{
    auto unit = exampleUnit();
    DesignCase humid = Testing::summerCase();
    humid.outdoorHumidity = percent(70.0);
    humid.maximumSupplyHumidity = percent(60.0);
    humid.dehumidifyWithReheat = true;
    unit.cases = {humid};
    // A reheat coil after the cooling coil.
    unit.supply.insert(unit.supply.begin() + 5, Section{"RH", Sections::WaterHeatingCoil{}});
    const auto result = ChainSolver::solve(unit);
    const auto& c = result.cases.at(0);
    const auto& leaving = c.supply.back().outlet.state;
    EXPECT_NEAR(toCelsius(leaving.dryBulb()), 17.0, 0.01);
    EXPECT_LE(toPercent(leaving.relativeHumidity()), 60.0 + 0.1);
    EXPECT_GT(section(c, PathKind::Supply, "RH").duty.value(), 0.0); // reheat
    EXPECT_NEAR(section(c, PathKind::Supply, "HC").duty.value(), 0.0, 1e-6); // no heating before cooling
    const auto& coil = std::get<Sections::CoolingCoil::Detail>(section(c, PathKind::Supply, "CC").detail);
    EXPECT_TRUE(coil.wet);
    EXPECT_GT(coil.condensate.value(), 0.0);
}

TEST(ChainSolver, CapacityShortfallIsAFindingNotACrash)
{
    auto unit = exampleUnit();
    std::get<Sections::WaterHeatingCoil>(unit.supply[3].spec).capacity = kilowatts(5.0);
    const auto result = ChainSolver::solve(unit);
    const auto& winter = result.cases.at(0);
    EXPECT_TRUE(hasFinding(winter, "coil.capacity"));
    EXPECT_TRUE(hasFinding(winter, "setpoint.too_cold"));
    EXPECT_NEAR(toKilowatts(section(winter, PathKind::Supply, "HC").duty), 5.0, 1e-6);
}

TEST(ChainSolver, FanPressureIsPathDropsPlusExternal)
{
    const auto unit = exampleUnit();
    const auto result = ChainSolver::solve(unit);
    const auto& c = result.cases.at(0);
    Pressure internal{};
    for (const auto& s : c.supply)
        if (s.typeKey != "fan")
            internal += s.pressureDrop;
    const auto& fan = std::get<Sections::Fan::Detail>(section(c, PathKind::Supply, "SF").detail);
    const Pressure external = unit.airflows.supplyExternalBefore + unit.airflows.supplyExternalAfter;
    EXPECT_NEAR(fan.totalPressure.value(), (internal + external).value(), 0.05);
    // The static pressure profile starts at minus the duct before and ends at the duct after.
    EXPECT_NEAR(c.supply.front().staticPressureIn.value(), -unit.airflows.supplyExternalBefore.value(), 1e-9);
    EXPECT_NEAR(c.supply.back().staticPressureOut.value(), unit.airflows.supplyExternalAfter.value(), 0.05);
    EXPECT_NEAR(c.extract.back().staticPressureOut.value(), unit.airflows.extractExternalAfter.value(), 0.05);
}

TEST(ChainSolver, LeakageDirectionIsReported)
{
    auto unit = exampleUnit();
    // Extract fan before the exchanger: the extract side is pressurised.
    std::swap(unit.extract[1], unit.extract[2]);
    const auto result = ChainSolver::solve(unit);
    const auto& c = result.cases.at(0);
    EXPECT_TRUE(hasFinding(c, "recovery.leakage_direction"));
    const auto& detail = std::get<Recovery::HeatRecoveryDetail>(section(c, PathKind::Supply, "HR").detail);
    ASSERT_TRUE(detail.supplyMinusExtract.has_value());
    EXPECT_LT(detail.supplyMinusExtract->value(), 0.0);
}

TEST(ChainSolver, SizingKeepsFaceVelocityAtOrBelowTarget)
{
    const auto unit = exampleUnit();
    const auto sizing = ChainSolver::size(unit);
    const double q = toCubicMetresPerSecond(unit.airflows.supply);
    EXPECT_LE(q / toSquareMetres(sizing.crossSection), 2.0 + 1e-9);
    // On the 100 mm grid.
    EXPECT_NEAR(std::fmod(toMillimetres(sizing.width) + 1e-6, 100.0), 0.0, 1e-3);
    EXPECT_NEAR(std::fmod(toMillimetres(sizing.height) + 1e-6, 100.0), 0.0, 1e-3);
    EXPECT_GE(sizing.width, sizing.height);
    EXPECT_NEAR(toMetres(sizing.unitLength), std::max(toMetres(sizing.supplyLength), toMetres(sizing.extractLength)),
                1e-12);
}

TEST(ChainSolver, FiguresCarryTheContractKeys)
{
    const auto result = ChainSolver::solve(exampleUnit());
    const auto figures = sectionFigures(*result.cases.at(0).find(PathKind::Supply, "HR"));
    for (const char* key : {"effectiveness_t", "eta_t_1253", "recovered_kW", "bypass_fraction", "dp_clean_Pa",
                            "frost_alarm_dp_Pa", "frost_strategy"})
        EXPECT_TRUE(std::any_of(figures.begin(), figures.end(), [&](const Figure& f) { return f.key == key; })) << key;
}

// A supply-only unit (no extract path, zero extract flow) is a unit of its own:
// it solves, and check() finds nothing.
TEST(ChainSolver, SupplyOnlyUnitWithZeroExtractSolves)
{
    auto unit = exampleUnit();
    std::erase_if(unit.supply, [](const Section& s) { return s.id == "HR"; });
    unit.extract.clear();
    unit.airflows.extract = cubicMetresPerHour(0.0);
    EXPECT_TRUE(ChainSolver::check(unit).empty());
    const auto result = ChainSolver::solve(unit);
    ASSERT_EQ(result.cases.size(), 2u);
    for (const auto& c : result.cases) {
        EXPECT_TRUE(c.extract.empty());
        EXPECT_EQ(c.totals.extractFlow.value(), 0.0);
        EXPECT_GT(c.totals.supplyFlow.value(), 0.0);
        EXPECT_FALSE(hasFinding(c, "fan.missing"));
    }
}

// A mixing section whose minimum outdoor air is a smaller share at the winter
// case's 150 % airflow: only that case recirculates more than the extract path
// brings. check() names the place, the case and what would fit; solve() refuses
// with the same text.
TEST(ChainSolver, CheckFindsRecirculationBeyondTheExtractAirInOneCase)
{
    auto unit = exampleUnit(); // 8000 m3/h both paths
    Sections::MixingBox mix;
    mix.outdoorAirFraction = percent(0.0);
    mix.minimumOutdoorFlow = cubicMetresPerHour(4000.0);
    unit.supply.insert(unit.supply.begin(), Section{"MIX", mix});
    unit.extract.insert(unit.extract.begin() + 1, Section{"MIX", CoupledSide{}});
    unit.airflows.extract = cubicMetresPerHour(4500.0);
    unit.cases[0].airflowFraction = percent(150.0); // 12000 m3/h: 8000 recirculated, 6750 extract
    const auto problems = ChainSolver::check(unit);
    ASSERT_EQ(problems.size(), 1u);
    EXPECT_EQ(problems[0].path, "extract[1]");
    const std::string& message = problems[0].message;
    EXPECT_EQ(message.rfind("in case 'winter' the mixing section 'MIX' recirculates ", 0), 0u) << message;
    // 8000 of 12000 m3/h recirculated against 6750 arriving: at least 1 - 6750/12000
    // = 43.75 % outdoor air, as a whole percent 44 (standard air, so up to the
    // small difference of humidity ratio between outdoor and room air).
    EXPECT_NE(message.find("raise outdoor_air_pct of supply[0] (now 0) to at least 4"), std::string::npos) << message;
    try {
        ChainSolver::solve(unit);
        FAIL() << "expected InputError";
    } catch (const InputError& e) {
        EXPECT_EQ(std::string(e.what()), problems[0].path + ": " + problems[0].message);
    }
    unit.cases.erase(unit.cases.begin()); // the summer case alone fits
    EXPECT_TRUE(ChainSolver::check(unit).empty());
    EXPECT_NO_THROW(ChainSolver::solve(unit));
}

struct InvalidUnitRow {
    const char* name;
    void (*breakIt)(AirHandlingUnit&);
    const char* messagePart;
};

std::string invalidRowName(const ::testing::TestParamInfo<InvalidUnitRow>& row)
{
    return row.param.name;
}

class InvalidUnit : public ::testing::TestWithParam<InvalidUnitRow> {};

TEST_P(InvalidUnit, IsRejectedWithANamedProblem)
{
    auto unit = exampleUnit();
    GetParam().breakIt(unit);
    try {
        ChainSolver::solve(unit);
        FAIL() << "expected InputError";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find(GetParam().messagePart), std::string::npos) << e.what();
    }
}

INSTANTIATE_TEST_SUITE_P(
    Rows, InvalidUnit,
    ::testing::Values(
        InvalidUnitRow{"duplicate_id", [](AirHandlingUnit& u) { u.supply[1].id = "OAD"; }, "used twice"},
        InvalidUnitRow{"missing_marker", [](AirHandlingUnit& u) { u.extract.erase(u.extract.begin() + 1); },
                       "needs one entry of type 'coupled'"},
        InvalidUnitRow{"marker_without_section", [](AirHandlingUnit& u) { u.extract[0] = {"X1", CoupledSide{}}; },
                       "marked coupled"},
        InvalidUnitRow{"no_cases", [](AirHandlingUnit& u) { u.cases.clear(); }, "at least one design case"},
        InvalidUnitRow{"negative_flow", [](AirHandlingUnit& u) { u.airflows.supply = cubicMetresPerHour(-5.0); },
                       "supply airflow"},
        InvalidUnitRow{"rh_over_100", [](AirHandlingUnit& u) { u.cases[0].outdoorHumidity = percent(120.0); },
                       "outdoor relative humidity"},
        InvalidUnitRow{"final_below_initial",
                       [](AirHandlingUnit& u) {
                           std::get<Sections::Filter>(u.supply[1].spec).finalPressureDrop = pascals(30.0);
                       },
                       "final filter pressure drop"},
        InvalidUnitRow{"return_above_flow",
                       [](AirHandlingUnit& u) {
                           std::get<Sections::WaterHeatingCoil>(u.supply[3].spec).returnTemperature = celsius(70.0);
                       },
                       "return temperature"},
        InvalidUnitRow{"empty_id", [](AirHandlingUnit& u) { u.supply[0].id.clear(); }, "needs an id"},
        InvalidUnitRow{"zero_extract_with_extract_path",
                       [](AirHandlingUnit& u) { u.airflows.extract = cubicMetresPerHour(0.0); },
                       "extract airflow 0 m3/h is outside the allowed range above 0 .. 720000 m3/h (0 only for a "
                       "unit without an extract path)"},
        InvalidUnitRow{"wheel_draws_more_than_extract",
                       [](AirHandlingUnit& u) {
                           auto& hr = std::get<Recovery::HeatRecovery>(u.supply[2].spec);
                           hr.kind = Recovery::ExchangerKind::RotaryNonHygroscopic;
                           hr.outdoorAirCorrection = 0.8;
                           u.airflows.extract = cubicMetresPerHour(1000.0); // 8000 x 0.2 = 1600 drawn across
                       },
                       "extract[1]: in case 'winter' the wheel 'HR' draws "},
        InvalidUnitRow{"fan_heats_beyond_200",
                       [](AirHandlingUnit& u) {
                           auto& fan = std::get<Sections::Fan>(u.supply[5].spec);
                           fan.fanEfficiency = percent(5.0);
                           fan.motorEfficiency = percent(30.0);
                           u.airflows.supplyExternalAfter = pascals(5000.0);
                       },
                       "supply[5]: in case 'winter', fan 'SF': the fan's heat "}),
    invalidRowName);
