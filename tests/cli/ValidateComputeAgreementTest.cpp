// validate and compute must agree on every file: a file that validate accepts is
// computed (exit 0), one it refuses is refused by compute with the same line.
// Each row is the demo project with values at or just past the edges of what the
// file and the solver allow (ranges, supply-only unit, recirculation and crossing
// flows larger than the extract path brings, fans and drops that heat the air
// beyond 200 C). Whether a row is accepted is stated, so a row cannot pass by
// both commands failing the same way unnoticed.

#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <filesystem>
#include <fstream>
#include <functional>
#include <random>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;
using Json = nlohmann::ordered_json;

namespace {

struct EdgeRow {
    std::string name;
    std::function<void(Json&)> change;
    bool valid; // what validate must say
};

Json demo()
{
    std::ifstream in(fs::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj");
    return Json::parse(in);
}

// The demo as a supply-only unit: no heat recovery, no extract path.
void supplyOnly(Json& j)
{
    j["supply"].erase(2);
    j["extract"] = Json::array();
}

struct Outcome {
    int code;
    std::string err;
};

Outcome run(const std::vector<std::string>& args)
{
    Airwright::Cli::CliApplication app;
    std::ostringstream out, err;
    const int code = app.run(args, out, err);
    return {code, err.str()};
}

class ValidateComputeAgreement : public ::testing::TestWithParam<EdgeRow> {
protected:
    static void SetUpTestSuite()
    {
        std::random_device seed;
        s_dir = fs::temp_directory_path() / ("airwright-agreement-" + std::to_string(seed()));
        fs::create_directories(s_dir);
    }
    static void TearDownTestSuite()
    {
        std::error_code ignored;
        fs::remove_all(s_dir, ignored);
    }
    static fs::path s_dir;
};

fs::path ValidateComputeAgreement::s_dir;

} // namespace

TEST_P(ValidateComputeAgreement, ValidateAcceptsExactlyWhatComputeComputes)
{
    const auto& row = GetParam();
    Json json = demo();
    row.change(json);
    const fs::path file = s_dir / (row.name + ".awproj");
    {
        std::ofstream out(file, std::ios::binary | std::ios::trunc);
        out << json.dump(2);
    }
    const Outcome validated = run({"validate", file.string()});
    const Outcome computed = run({"compute", file.string()});
    EXPECT_EQ(validated.code, row.valid ? Airwright::Cli::Done : Airwright::Cli::InvalidInput) << validated.err;
    EXPECT_EQ(computed.code, validated.code) << "validate:\n" << validated.err << "compute:\n" << computed.err;
    if (validated.code == Airwright::Cli::InvalidInput && computed.code == Airwright::Cli::InvalidInput) {
        // compute stops at the first problem; validate lists it among all of them.
        const std::string first = computed.err.substr(0, computed.err.find('\n'));
        ASSERT_EQ(first.rfind("error: ", 0), 0u) << first;
        EXPECT_NE(validated.err.find(first.substr(7)), std::string::npos)
            << "compute: " << first << "\nvalidate:\n" << validated.err;
    }
}

std::vector<EdgeRow> edgeRows()
{
    return {
        {"demo", [](Json&) {}, true},
        // A supply-only unit, as docs/project-format.md documents it.
        {"supply_only_extract_zero",
         [](Json& j) {
             supplyOnly(j);
             j["airflows"]["extract_m3h"] = 0;
         },
         true},
        {"supply_only_extract_given", [](Json& j) { supplyOnly(j); }, true},
        {"extract_zero_with_sections", [](Json& j) { j["airflows"]["extract_m3h"] = 0; }, false},
        // Site and flows at the limits and past them.
        {"altitude_5500", [](Json& j) { j["site"]["altitude_m"] = 5500; }, true},
        {"altitude_6000", [](Json& j) { j["site"]["altitude_m"] = 6000; }, false},
        {"altitude_minus_500", [](Json& j) { j["site"]["altitude_m"] = -500; }, true},
        {"pressure_50000", [](Json& j) { j["site"] = Json{{"pressure_Pa", 50000}}; }, true},
        {"pressure_45000", [](Json& j) { j["site"] = Json{{"pressure_Pa", 45000}}; }, false},
        {"pressure_110000", [](Json& j) { j["site"] = Json{{"pressure_Pa", 110000}}; }, true},
        {"flows_720000",
         [](Json& j) {
             j["airflows"]["supply_m3h"] = 720000;
             j["airflows"]["extract_m3h"] = 720000;
         },
         true},
        {"supply_1000000", [](Json& j) { j["airflows"]["supply_m3h"] = 1000000; }, false},
        {"flows_small",
         [](Json& j) {
             j["airflows"]["supply_m3h"] = 50;
             j["airflows"]["extract_m3h"] = 50;
         },
         true},
        {"external_3000",
         [](Json& j) {
             for (const char* key : {"supply_external_before_Pa", "supply_external_after_Pa",
                                     "extract_external_before_Pa", "extract_external_after_Pa"})
                 j["airflows"][key] = 3000;
         },
         true},
        // Casing.
        {"face_velocity_0_5", [](Json& j) { j["casing"]["max_face_velocity_mps"] = 0.5; }, true},
        {"face_velocity_6", [](Json& j) { j["casing"]["max_face_velocity_mps"] = 6; }, true},
        {"face_velocity_8", [](Json& j) { j["casing"]["max_face_velocity_mps"] = 8; }, false},
        {"sizing_grid_10", [](Json& j) { j["casing"]["sizing_grid_mm"] = 10; }, true},
        {"sizing_grid_500", [](Json& j) { j["casing"]["sizing_grid_mm"] = 500; }, true},
        {"sizing_grid_1000", [](Json& j) { j["casing"]["sizing_grid_mm"] = 1000; }, false},
        {"width_10000", [](Json& j) { j["casing"]["width_mm"] = 10000; }, true},
        {"width_150", [](Json& j) { j["casing"]["width_mm"] = 150; }, false},
        // 9000 m3/h through 0.2 m x 0.2 m: over 60 m/s, drops that scale with the
        // velocity squared reach megapascals, and the fans would heat the air
        // beyond 200 C.
        {"casing_200_by_200",
         [](Json& j) {
             j["casing"]["width_mm"] = 200;
             j["casing"]["height_mm"] = 200;
         },
         false},
        // Cases.
        {"airflow_5_pct", [](Json& j) { j["cases"][0]["airflow_pct"] = 5; }, true},
        {"airflow_150_pct", [](Json& j) { j["cases"][0]["airflow_pct"] = 150; }, true},
        {"outdoor_minus_60", [](Json& j) { j["cases"][0]["outdoor"]["tdb_C"] = -60; }, true},
        {"outdoor_60_saturated",
         [](Json& j) {
             j["cases"][1]["outdoor"]["tdb_C"] = 60;
             j["cases"][1]["outdoor"]["rh_pct"] = 100;
         },
         true},
        // Sections at their limits.
        {"heating_flow_100", [](Json& j) { j["supply"][3]["flow_temperature_C"] = 100; }, true},
        {"heating_flow_120", [](Json& j) { j["supply"][3]["flow_temperature_C"] = 120; }, false},
        {"fan_efficiencies_lowest",
         [](Json& j) {
             for (auto* fan : {&j["supply"][5], &j["extract"][2]}) {
                 (*fan)["fan_efficiency_pct"] = 5;
                 (*fan)["motor_efficiency_pct"] = 30;
                 (*fan)["drive_efficiency_pct"] = 50;
                 (*fan)["controller_efficiency_pct"] = 50;
             }
         },
         false},
        {"fan_efficiency_5_only", [](Json& j) { j["supply"][5]["fan_efficiency_pct"] = 5; }, true},
        {"filters_final_2000",
         [](Json& j) {
             j["supply"][1]["final_dp_Pa"] = 2000;
             j["supply"][6]["final_dp_Pa"] = 2000;
             j["cases"][0]["filter_condition"] = "final";
         },
         true},
        // Recirculation and crossing flows.
        {"mixing_within_extract",
         [](Json& j) {
             j["supply"].insert(j["supply"].begin(), Json{{"id", "mix"}, {"type", "mixing"}, {"outdoor_air_pct", 60}});
             j["extract"].insert(j["extract"].begin(), Json{{"id", "mix"}, {"type", "coupled"}});
         },
         true},
        {"mixing_more_than_extract",
         [](Json& j) {
             j["supply"].insert(j["supply"].begin(), Json{{"id", "mix"}, {"type", "mixing"}, {"outdoor_air_pct", 10}});
             j["extract"].insert(j["extract"].begin(), Json{{"id", "mix"}, {"type", "coupled"}});
             j["airflows"]["extract_m3h"] = 5000;
         },
         false},
        {"wheel_draws_more_than_extract",
         [](Json& j) {
             j["supply"][2]["kind"] = "rotary_condensation";
             j["supply"][2]["rotor_speed_rpm"] = 10;
             j["supply"][2]["oacf"] = 0.8;
             j["airflows"]["extract_m3h"] = 1500;
         },
         false},
        {"wheel_draws_within_extract",
         [](Json& j) {
             j["supply"][2]["kind"] = "rotary_condensation";
             j["supply"][2]["rotor_speed_rpm"] = 10;
             j["supply"][2]["oacf"] = 0.8;
         },
         true},
    };
}

INSTANTIATE_TEST_SUITE_P(Edges, ValidateComputeAgreement, ::testing::ValuesIn(edgeRows()),
                         [](const ::testing::TestParamInfo<EdgeRow>& row) { return row.param.name; });
