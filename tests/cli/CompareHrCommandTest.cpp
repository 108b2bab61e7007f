#include "airwright/cli/CompareHrCommand.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"

#include <nlohmann/json.hpp>

#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <sstream>

using Airwright::Cli::CompareHrCommand;
using nlohmann::json;

namespace {

const std::filesystem::path kDemoDir = std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo";
const std::string kProject = (kDemoDir / "demo-library.awproj").string();
const std::string kEpw = (kDemoDir / "demo-climate.epw").string();
const std::string kBins = (kDemoDir / "demo-bins.csv").string();

struct Run {
    int code;
    std::string out;
    std::string err;
};

// Runs the command in process with the demo climate as its default, as the
// application does (exceptions become exit codes there; here they propagate).
Run run(const std::vector<std::string>& args)
{
    CompareHrCommand command({kDemoDir / "demo-climate.epw"});
    std::ostringstream out, err;
    const int code = command.run(args, out, err);
    return {code, out.str(), err.str()};
}

void expectFiniteNumbers(const json& j, const std::string& where)
{
    if (j.is_number())
        EXPECT_TRUE(std::isfinite(j.get<double>())) << where;
    else if (j.is_object())
        for (const auto& [key, value] : j.items())
            expectFiniteNumbers(value, where + "." + key);
    else if (j.is_array())
        for (std::size_t i = 0; i < j.size(); ++i)
            expectFiniteNumbers(j[i], where + "[" + std::to_string(i) + "]");
}

} // namespace

TEST(CompareHrCommand, JsonFollowsTheContract)
{
    const auto r = run({kProject, "--climate", kEpw, "--format", "json"});
    ASSERT_EQ(r.code, Airwright::Cli::Done) << r.err;
    const auto j = json::parse(r.out);
    expectFiniteNumbers(j, "$");
    for (const char* key : {"method", "hours", "mean_tdb_C", "min_tdb_C", "max_tdb_C", "heating_degree_hours_Kh",
                            "operating_hours"})
        EXPECT_TRUE(j["climate"].contains(key)) << key;
    EXPECT_EQ(j["climate"]["method"], "hourly");
    EXPECT_NEAR(j["climate"]["hours"].get<double>(), 8760.0, 1e-9);
    ASSERT_EQ(j["options"].size(), 6u);
    for (std::size_t i = 0; i < j["options"].size(); ++i) {
        for (const char* key : {"name", "kind", "effectiveness_t", "eta_t_1253", "dp_supply_Pa", "dp_extract_Pa",
                                "recovered_heating_MWh", "recovered_cooling_MWh", "frost_protection_MWh", "frost_hours",
                                "added_fan_MWh", "net_saving_MWh", "cost_saving", "co2_saving_t", "payback_years"})
            EXPECT_TRUE(j["options"][i].contains(key)) << "option " << i << " " << key;
    }
    EXPECT_EQ(j["options"][0]["kind"], "none");
    EXPECT_TRUE(j["options"][0]["payback_years"].is_null());
    // Definition: cost saving = heat saved x heat price + electricity saved x its price.
    for (const auto& o : j["options"]) {
        const double expected = o["heat_saving_MWh"].get<double>() * 1000.0 * 0.10
                                + o["electricity_saving_MWh"].get<double>() * 1000.0 * 0.25;
        EXPECT_NEAR(o["cost_saving"].get<double>(), expected, 1e-6 * std::abs(expected) + 1e-9) << o["name"];
    }
    ASSERT_EQ(j["ranking"].size(), 6u);
    EXPECT_EQ(j["ranking"][0]["rank"], 1);
    EXPECT_FALSE(j["ranking"][0]["reason"].get<std::string>().empty());
    EXPECT_EQ(j["sensitivity"]["cells"].size(), 9u);
}

TEST(CompareHrCommand, OptionsReachTheComparison)
{
    const auto r = run({kProject, "--climate", kEpw, "--format", "json", "--heat-price", "0.2", "--electricity-price",
                        "0.3", "--heat-co2", "0.25", "--electricity-co2", "0.1", "--hours-per-day", "12",
                        "--first-hour", "6", "--days-per-week", "5", "--holiday-weeks", "4", "--extra-cost",
                        "plate_counter_flow=12345,run_around_loop=20000", "--no-sensitivity"});
    ASSERT_EQ(r.code, Airwright::Cli::Done) << r.err;
    const auto j = json::parse(r.out);
    // Hand calculation (tests/core/annual/OperatingScheduleTest.cpp): 241 days x 12 h.
    EXPECT_NEAR(j["climate"]["operating_hours"].get<double>(), 2892.0, 1e-9);
    EXPECT_NEAR(j["settings"]["heat_price_per_kWh"].get<double>(), 0.2, 1e-12);
    EXPECT_TRUE(j["sensitivity"]["cells"].empty());
    for (const auto& o : j["options"]) {
        if (o["key"] == "plate_counter_flow") {
            EXPECT_NEAR(o["extra_cost"].get<double>(), 12345.0, 1e-9);
            // Definition: payback = extra cost / cost saving.
            EXPECT_NEAR(o["payback_years"].get<double>(), 12345.0 / o["cost_saving"].get<double>(), 1e-9);
        }
        // Definition: CO2 saved = heat saved x 0.25 + electricity saved x 0.1 (kg -> t).
        const double co2 = (o["heat_saving_MWh"].get<double>() * 0.25 + o["electricity_saving_MWh"].get<double>() * 0.1);
        EXPECT_NEAR(o["co2_saving_t"].get<double>(), co2, 1e-9 + 1e-9 * std::abs(co2)) << o["name"];
    }
}

// A unit with a mixing (recirculation) section is compared like any other
// (issue 5: the annual model used to refuse it). The demo with 40 % outdoor air
// mixed in after its exchanger and the recirculated air taken before it.
TEST(CompareHrCommand, ComparesAUnitWithAMixingSection)
{
    std::ifstream in(kProject);
    json project = json::parse(in);
    auto& supply = project["supply"];
    auto& extract = project["extract"];
    supply.insert(supply.begin() + 3, json{{"id", "mix"}, {"type", "mixing"}, {"outdoor_air_pct", 40}});
    extract.insert(extract.begin() + 1, json{{"id", "mix"}, {"type", "coupled"}});
    const auto file = std::filesystem::temp_directory_path() / "airwright-compare-hr-mixing.awproj";
    std::ofstream(file) << project.dump(2);

    const auto r = run({file.string(), "--climate", kBins, "--format", "json", "--no-sensitivity"});
    std::filesystem::remove(file);
    ASSERT_EQ(r.code, Airwright::Cli::Done) << r.err;
    const auto j = json::parse(r.out);
    expectFiniteNumbers(j, "$");
    ASSERT_EQ(j["options"].size(), 6u);
    // Common practice: with heat recovery the unit needs less heat than without.
    double none = 0.0;
    for (const auto& o : j["options"])
        if (o["key"] == "none")
            none = o["heating_MWh"].get<double>();
    EXPECT_GT(none, 0.0);
    for (const auto& o : j["options"]) {
        if (o["key"] != "none") {
            EXPECT_LT(o["heating_MWh"].get<double>(), none) << o["key"];
        }
    }
}

TEST(CompareHrCommand, BinsCsvAndText)
{
    const auto csv = run({kProject, "--climate", kBins, "--format", "csv", "--no-sensitivity"});
    ASSERT_EQ(csv.code, Airwright::Cli::Done) << csv.err;
    std::istringstream lines(csv.out);
    std::string header;
    std::getline(lines, header);
    EXPECT_EQ(header.rfind("key,name,kind,effectiveness_t,eta_t_1253,dp_supply_Pa,dp_extract_Pa,", 0), 0u) << header;
    std::string line;
    int rows = 0;
    while (std::getline(lines, line))
        ++rows;
    EXPECT_EQ(rows, 6);
    // Names with commas are quoted (RFC 4180).
    EXPECT_NE(csv.out.find("\"plate, cross-flow\""), std::string::npos);

    const auto text = run({kProject, "--no-sensitivity"}); // default climate, text
    ASSERT_EQ(text.code, Airwright::Cli::Done) << text.err;
    EXPECT_NE(text.out.find("Ranking:"), std::string::npos);
    EXPECT_NE(text.out.find("demo-climate.epw"), std::string::npos);
}

namespace {

TEST(CompareHrCommand, SetChangesAnOptionsDatasheet)
{
    auto option = [](const json& j, const std::string& key) {
        for (const auto& o : j["options"])
            if (o["key"] == key)
                return o;
        return json();
    };
    // Both with preheat frost protection: with bypass protection a more effective
    // plate may frost earlier and give up more than it gains.
    const auto base = run({kProject, "--climate", kBins, "--format", "json", "--no-sensitivity", "--set",
                           "plate_cross_flow.frost_strategy=preheat"});
    const auto set = run({kProject, "--climate", kBins, "--format", "json", "--no-sensitivity", "--set",
                          "plate_cross_flow.frost_strategy=preheat,plate_cross_flow.efficiency_pct=80,"
                          "plate_cross_flow.supply_dp_Pa=250,none.extra_cost=5"});
    ASSERT_EQ(base.code, Airwright::Cli::Done) << base.err;
    ASSERT_EQ(set.code, Airwright::Cli::Done) << set.err;
    const auto before = option(json::parse(base.out), "plate_cross_flow");
    const auto after = option(json::parse(set.out), "plate_cross_flow");
    // A more effective exchanger recovers more; a larger rated drop costs fan energy.
    EXPECT_NEAR(after["eta_t_1253"].get<double>(), 0.80, 1e-9);
    EXPECT_GT(after["recovered_heating_MWh"].get<double>(), before["recovered_heating_MWh"].get<double>() + 1.0);
    EXPECT_GT(after["dp_supply_Pa"].get<double>(), before["dp_supply_Pa"].get<double>());
    EXPECT_GT(after["added_fan_MWh"].get<double>(), before["added_fan_MWh"].get<double>());
    EXPECT_NEAR(option(json::parse(set.out), "none")["extra_cost"].get<double>(), 5.0, 1e-12);
}

struct BadRow {
    const char* what;
    std::vector<std::string> args;
};

class CompareHrCommandInvalid : public ::testing::TestWithParam<BadRow> {};

} // namespace

TEST_P(CompareHrCommandInvalid, ThrowsInputError)
{
    // The application maps InputError to exit code 2 (CliApplication).
    EXPECT_THROW(run(GetParam().args), Airwright::Core::InputError) << GetParam().what;
}

INSTANTIATE_TEST_SUITE_P(
    Rows, CompareHrCommandInvalid,
    ::testing::Values(BadRow{"no file", {}}, BadRow{"two files", {kProject, kProject}},
                      BadRow{"bad format", {kProject, "--format", "xml"}},
                      BadRow{"negative price", {kProject, "--heat-price", "-1"}},
                      BadRow{"hours per day 25", {kProject, "--hours-per-day", "25"}},
                      BadRow{"fractional days", {kProject, "--days-per-week", "4.5"}},
                      BadRow{"unknown off-hours mode", {kProject, "--off-hours", "sleep"}},
                      BadRow{"unknown option key", {kProject, "--extra-cost", "heat_pipe=100"}},
                      BadRow{"extra cost not a number", {kProject, "--extra-cost", "plate_cross_flow=abc"}},
                      BadRow{"climate of unknown type", {kProject, "--climate", kProject}},
                      BadRow{"missing climate file", {kProject, "--climate", "/nonexistent/x.epw"}},
                      BadRow{"missing project", {"/nonexistent/p.awproj"}},
                      BadRow{"unknown option", {kProject, "--speed", "1"}},
                      BadRow{"set without a field", {kProject, "--set", "plate_cross_flow=80"}},
                      BadRow{"set of an unknown field", {kProject, "--set", "plate_cross_flow.colour=2"}},
                      BadRow{"set of an unknown option", {kProject, "--set", "heat_pipe.efficiency_pct=60"}},
                      BadRow{"efficiency of 100 %", {kProject, "--set", "plate_counter_flow.efficiency_pct=100"}},
                      BadRow{"exchanger data for no exchanger", {kProject, "--set", "none.efficiency_pct=50"}},
                      BadRow{"unknown frost strategy", {kProject, "--set", "plate_cross_flow.frost_strategy=hope"}}));

TEST(CompareHrCommand, WithoutTheDemoClimateAsksForOne)
{
    CompareHrCommand command({std::filesystem::path("/nonexistent/demo-climate.epw")});
    std::ostringstream out, err;
    EXPECT_THROW(command.run({kProject}, out, err), Airwright::Core::InputError);
    // The default candidates look next to the executable.
    EXPECT_FALSE(CompareHrCommand::defaultClimateCandidates().empty());
}
