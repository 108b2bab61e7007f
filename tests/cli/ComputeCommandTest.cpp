#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"

#include <nlohmann/json.hpp>

#include <gtest/gtest.h>

#include <cmath>
#include <filesystem>
#include <fstream>
#include <sstream>

using Airwright::Cli::CliApplication;
using nlohmann::json;

namespace {

const std::string kDemo = std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-library.awproj";

struct Run {
    int code;
    std::string out;
    std::string err;
};

Run run(const std::vector<std::string>& args)
{
    CliApplication app;
    std::ostringstream out, err;
    const int code = app.run(args, out, err);
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

TEST(ComputeCommand, DemoAsJsonFollowsTheContract)
{
    const auto r = run({"compute", kDemo, "--format", "json"});
    ASSERT_EQ(r.code, Airwright::Cli::Done) << r.err;
    const auto j = json::parse(r.out);
    expectFiniteNumbers(j, "$");
    ASSERT_TRUE(j["cases"].is_array());
    ASSERT_GE(j["cases"].size(), 2u);
    for (const auto& c : j["cases"]) {
        EXPECT_TRUE(c.contains("name"));
        for (const char* key : {"heating_kW", "cooling_kW", "humidification_kgh", "fan_power_kW", "sfp_W_per_m3s"})
            EXPECT_TRUE(c["totals"].contains(key)) << key;
        for (const char* path : {"supply", "extract"}) {
            for (const auto& s : c["paths"][path]) {
                for (const char* key : {"id", "type", "inlet", "outlet", "mdot_da_in_kgs", "mdot_da_out_kgs", "q_m3s",
                                        "face_velocity_ms", "dp_Pa", "duty_kW"})
                    EXPECT_TRUE(s.contains(key)) << path << " " << s.value("id", "?") << " " << key;
                for (const char* key : {"tdb_C", "w_gkg", "rh_pct", "h_kJkg", "p_Pa"})
                    EXPECT_TRUE(s["inlet"].contains(key)) << key;
                // duty = dry air x (h_out - h_in) where no air is added or removed (definition).
                if (s["type"] != "heat_recovery" && s["type"] != "mixing") {
                    const double expected = s["mdot_da_in_kgs"].get<double>()
                                            * (s["outlet"]["h_kJkg"].get<double>() - s["inlet"]["h_kJkg"].get<double>());
                    EXPECT_NEAR(s["duty_kW"].get<double>(), expected, 1e-9 + 1e-9 * std::abs(expected));
                }
            }
        }
        // The heat recovery appears in both paths under one id, with its block of figures.
        std::string hrId;
        for (const auto& s : c["paths"]["supply"])
            if (s["type"] == "heat_recovery")
                hrId = s["id"];
        ASSERT_FALSE(hrId.empty());
        bool inExtract = false;
        for (const auto& s : c["paths"]["extract"])
            if (s["id"] == hrId) {
                inExtract = true;
                for (const char* key : {"effectiveness_t", "eta_t_1253", "recovered_kW", "bypass_fraction", "frost",
                                        "leakage", "dp_clean_Pa", "frost_alarm_dp_Pa"})
                    EXPECT_TRUE(s.contains(key)) << key;
                EXPECT_TRUE(s["frost"].contains("onset_outdoor_C"));
            }
        EXPECT_TRUE(inExtract);
    }
}

TEST(ComputeCommand, OneCaseByName)
{
    const auto all = json::parse(run({"compute", kDemo, "--format", "json"}).out);
    const std::string name = all["cases"][1]["name"];
    const auto r = run({"compute", kDemo, "--case", name, "--format", "json"});
    ASSERT_EQ(r.code, 0) << r.err;
    const auto j = json::parse(r.out);
    ASSERT_EQ(j["cases"].size(), 1u);
    EXPECT_EQ(j["cases"][0]["name"], name);
}

TEST(ComputeCommand, TextNamesEverySection)
{
    const auto r = run({"compute", kDemo});
    ASSERT_EQ(r.code, 0) << r.err;
    const auto j = json::parse(run({"compute", kDemo, "--format", "json"}).out);
    for (const auto& s : j["cases"][0]["paths"]["supply"])
        EXPECT_NE(r.out.find(s["id"].get<std::string>()), std::string::npos);
    EXPECT_EQ(r.out.find("nan"), std::string::npos);
}

struct BadComputeRow {
    const char* name;
    std::vector<std::string> args;
    const char* messagePart;
};

class BadCompute : public ::testing::TestWithParam<BadComputeRow> {};

TEST_P(BadCompute, ExitsTwoWithOneClearLine)
{
    const auto r = run(GetParam().args);
    EXPECT_EQ(r.code, Airwright::Cli::InvalidInput);
    EXPECT_NE(r.err.find(GetParam().messagePart), std::string::npos) << r.err;
    EXPECT_TRUE(r.out.empty());
}

std::string badComputeName(const ::testing::TestParamInfo<BadComputeRow>& row)
{
    return row.param.name;
}

INSTANTIATE_TEST_SUITE_P(
    Rows, BadCompute,
    ::testing::Values(BadComputeRow{"no_file", {"compute"}, "one project FILE"},
                      BadComputeRow{"missing_file", {"compute", "/nonexistent/x.awproj"}, "x.awproj"},
                      BadComputeRow{"unknown_case", {"compute", kDemo, "--case", "monsoon"}, "no design case called"},
                      BadComputeRow{"bad_format", {"compute", kDemo, "--format", "xml"}, "--format"},
                      BadComputeRow{"unknown_option", {"compute", kDemo, "--colour"}, "--colour"}),
    badComputeName);

TEST(ComputeCommand, BrokenJsonIsInvalidInput)
{
    const auto dir = std::filesystem::temp_directory_path() / "airwright-compute-test";
    std::filesystem::create_directories(dir);
    const auto file = dir / "broken.awproj";
    std::ofstream(file) << "{ \"format\": \"airwright-project\", ";
    const auto r = run({"compute", file.string()});
    EXPECT_EQ(r.code, Airwright::Cli::InvalidInput);
    EXPECT_FALSE(r.err.empty());
    std::filesystem::remove_all(dir);
}
