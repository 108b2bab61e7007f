// Every class of problem a project file can have, with the exact line reported.
// Each row changes the demo project in one way (or gives raw text) and lists every
// error the load must report, in order; rows without errors must load.

#include "ProjectTestSupport.h"

#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/project/ProjectFileError.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <functional>
#include <string>
#include <vector>

namespace Airwright::Core::Project {
using namespace TestSupport;

using Json = nlohmann::ordered_json;

namespace {

struct Row {
    const char* name;
    std::function<std::string()> text;
    std::vector<std::string> errors; // empty: the file is valid
};

std::function<std::string()> edit(std::function<void(Json&)> change)
{
    return [change] {
        Json json = demoJson();
        change(json);
        return json.dump(2);
    };
}

std::function<std::string()> raw(std::string text)
{
    return [text] { return text; };
}

const char* const kAllTypes = "damper, filter, heating_coil_water, heating_coil_electric, cooling_coil, humidifier, "
                              "fan, passive, mixing, heat_recovery, coupled";
const std::string kHrMarkerMissing = "supply[2]: heat_recovery 'hr' couples both paths: the extract path needs "
                                     "{\"id\": \"hr\", \"type\": \"coupled\"} where its extract side sits";

std::vector<Row> rows()
{
    return {
        // Valid files.
        {"demo", edit([](Json&) {}), {}},
        {"info_left_out", edit([](Json& j) { j.erase("info"); }), {}},
        {"casing_left_out", edit([](Json& j) { j.erase("casing"); }), {}},
        {"site_by_pressure",
         edit([](Json& j) {
             j["site"] = Json{{"pressure_Pa", 98000}};
         }),
         {}},
        {"whole_number_written_with_point", edit([](Json& j) { j["supply"][3]["rows"] = 2.0; }), {}},
        {"glycol_fluid",
         edit([](Json& j) {
             j["supply"][3]["fluid"] = Json{{"kind", "propylene_glycol"}, {"mass_concentration_pct", 30}};
         }),
         {}},
        {"supply_only_unit",
         edit([](Json& j) {
             j["supply"].erase(2);
             j["extract"] = Json::array();
             j["airflows"]["extract_m3h"] = 0;
         }),
         {}},
        {"rotary_wheel_with_moisture",
         edit([](Json& j) {
             j["supply"][2]["kind"] = "rotary_enthalpy";
             j["supply"][2]["humidity_efficiency_pct"] = 70;
             j["supply"][2]["rotor_speed_rpm"] = 12;
             j["supply"][2]["frost_strategy"] = "rotor_speed";
         }),
         {}},

        // Ranges and relations between values.
        {"final_below_initial",
         edit([](Json& j) { j["supply"][1]["final_dp_Pa"] = 50; }),
         {"supply[1].final_dp_Pa: must exceed initial_dp_Pa (70)"}},
        {"humidity_over_100",
         edit([](Json& j) { j["cases"][0]["outdoor"]["rh_pct"] = 120; }),
         {"cases[0].outdoor.rh_pct: 120 is outside 0 .. 100"}},
        {"supply_flow_zero",
         edit([](Json& j) { j["airflows"]["supply_m3h"] = 0; }),
         {"airflows.supply_m3h: must be positive"}},
        {"supply_flow_huge",
         edit([](Json& j) { j["airflows"]["supply_m3h"] = 2.5e6; }),
         {"airflows.supply_m3h: 2500000 is outside the allowed range above 0 .. 720000"}},
        // The unit-level ranges are the solver's (ChainSolver::validate), so that a
        // file that loads is one the solver takes; the limits themselves load.
        {"solver_limits_load",
         edit([](Json& j) {
             j["site"]["altitude_m"] = 5500;
             j["airflows"]["supply_m3h"] = 720000;
             j["airflows"]["extract_m3h"] = 720000;
             j["casing"]["max_face_velocity_mps"] = 6;
             j["casing"]["width_mm"] = 200;
             j["casing"]["sizing_grid_mm"] = 10;
             j["supply"][3]["flow_temperature_C"] = 100;
         }),
         {}},
        {"extract_flow_above_solver",
         edit([](Json& j) { j["airflows"]["extract_m3h"] = 800000; }),
         {"airflows.extract_m3h: 800000 is outside 0 .. 720000"}},
        {"altitude_above_solver",
         edit([](Json& j) { j["site"]["altitude_m"] = 6000; }),
         {"site.altitude_m: 6000 is outside -500 .. 5500"}},
        {"pressure_below_solver",
         edit([](Json& j) { j["site"] = Json{{"pressure_Pa", 45000}}; }),
         {"site.pressure_Pa: 45000 is outside 50000 .. 110000"}},
        {"face_velocity_outside_solver",
         edit([](Json& j) { j["casing"]["max_face_velocity_mps"] = 8; }),
         {"casing.max_face_velocity_mps: 8 is outside 0.5 .. 6"}},
        {"face_velocity_below_solver",
         edit([](Json& j) { j["casing"]["max_face_velocity_mps"] = 0.2; }),
         {"casing.max_face_velocity_mps: 0.2 is outside 0.5 .. 6"}},
        {"casing_narrower_than_solver",
         edit([](Json& j) {
             j["casing"]["width_mm"] = 150;
             j["casing"]["height_mm"] = 150;
         }),
         {"casing.width_mm: 150 is outside 200 .. 10000", "casing.height_mm: 150 is outside 200 .. 10000"}},
        {"sizing_grid_outside_solver",
         edit([](Json& j) { j["casing"]["sizing_grid_mm"] = 600; }),
         {"casing.sizing_grid_mm: 600 is outside 10 .. 500"}},
        {"heating_flow_above_fluid_tables",
         edit([](Json& j) { j["supply"][3]["flow_temperature_C"] = 120; }),
         {"supply[3].flow_temperature_C: 120 is outside the allowed range above 0 .. 100"}},
        {"extract_zero_with_sections",
         edit([](Json& j) { j["airflows"]["extract_m3h"] = 0; }),
         {"airflows.extract_m3h: must be positive when the extract path has sections"}},
        {"recovery_efficiency_96",
         edit([](Json& j) { j["supply"][2]["efficiency_pct"] = 96; }),
         {"supply[2].efficiency_pct: 96 is outside the allowed range above 0 .. below 95"}},
        {"epm1_below_50",
         edit([](Json& j) { j["supply"][6]["efficiency_pct"] = 40; }),
         {"supply[6].efficiency_pct: 40 is outside 50 .. 100 for group epm1 (ISO 16890-1: below 50 % the filter "
          "is iso_coarse)"}},
        {"initial_above_group_default_final",
         edit([](Json& j) { j["supply"][1]["initial_dp_Pa"] = 250; }),
         {"supply[1].initial_dp_Pa: 250 must be below the default final pressure drop of group epm10 (200); give "
          "final_dp_Pa"}},
        {"heating_return_not_below_flow",
         edit([](Json& j) { j["supply"][3]["return_temperature_C"] = 60; }),
         {"supply[3].return_temperature_C: must be below flow_temperature_C (60)"}},
        {"chilled_return_not_above_flow",
         edit([](Json& j) { j["supply"][4]["return_temperature_C"] = 6.5; }),
         {"supply[4].return_temperature_C: must exceed flow_temperature_C (7)"}},
        {"rows_13", edit([](Json& j) { j["supply"][3]["rows"] = 13; }), {"supply[3].rows: 13 is outside 1 .. 12"}},
        {"rows_fraction",
         edit([](Json& j) { j["supply"][3]["rows"] = 2.5; }),
         {"supply[3].rows: must be a whole number, got 2.5"}},
        {"plate_with_moisture",
         edit([](Json& j) { j["supply"][2]["humidity_efficiency_pct"] = 50; }),
         {"supply[2].humidity_efficiency_pct: must be 0 for a plate_counter_flow exchanger (only hygroscopic and "
          "sorption wheels transfer moisture)"}},
        {"plate_with_rotor_speed_frost",
         edit([](Json& j) { j["supply"][2]["frost_strategy"] = "rotor_speed"; }),
         {"supply[2].frost_strategy: 'rotor_speed' is for rotary wheels only, not for a plate_counter_flow "
          "exchanger"}},
        {"rh_max_below_min",
         edit([](Json& j) {
             j["cases"][1]["supply_rh_min_pct"] = 40;
             j["cases"][1]["supply_rh_max_pct"] = 30;
         }),
         {"cases[1].supply_rh_max_pct: must be at least supply_rh_min_pct (40)"}},
        {"airflow_fraction_200",
         edit([](Json& j) { j["cases"][2]["airflow_pct"] = 200; }),
         {"cases[2].airflow_pct: 200 is outside 5 .. 150"}},
        {"glycol_too_strong",
         edit([](Json& j) {
             j["supply"][4]["fluid"] = Json{{"kind", "ethylene_glycol"}, {"mass_concentration_pct", 70}};
         }),
         {"supply[4].fluid.mass_concentration_pct: 70 is outside 10 .. 60"}},
        {"water_with_concentration",
         edit([](Json& j) { j["supply"][4]["fluid"]["mass_concentration_pct"] = 20; }),
         {"supply[4].fluid.mass_concentration_pct: must be 0 or left out for water"}},
        {"site_empty", edit([](Json& j) { j["site"] = Json::object(); }), {"site: give altitude_m or pressure_Pa"}},
        {"bad_date",
         edit([](Json& j) { j["info"]["date"] = "2025-02-30"; }),
         {"info.date: '2025-02-30' is not a calendar date in the form yyyy-mm-dd"}},

        // Names, types and keys.
        {"unknown_section_type",
         edit([](Json& j) { j["supply"][2]["type"] = "heatr"; }),
         {std::string("supply[2].type: unknown section type 'heatr' (allowed: ") + kAllTypes + ")",
          "extract[1].id: coupled marker 'hr' has no section with this id in the supply path"}},
        {"unknown_filter_group",
         edit([](Json& j) { j["supply"][1]["group"] = "epm3"; }),
         {"supply[1].group: unknown filter group 'epm3' (allowed: iso_coarse, epm10, epm2_5, epm1)"}},
        {"unknown_flow_basis",
         edit([](Json& j) { j["airflows"]["basis"] = "normal"; }),
         {"airflows.basis: unknown flow basis 'normal' (allowed: standard_air, actual)"}},
        {"wrong_json_type",
         edit([](Json& j) { j["airflows"]["supply_m3h"] = "9000"; }),
         {"airflows.supply_m3h: must be a number, got a string"}},
        {"wrong_json_type_bool",
         edit([](Json& j) { j["supply"][5]["motor_in_airstream"] = "yes"; }),
         {"supply[5].motor_in_airstream: must be true or false, got a string"}},
        {"section_not_an_object",
         edit([](Json& j) { j["supply"][0] = 5; }),
         {"supply[0]: must be an object, got a number"}},
        {"paths_not_arrays",
         edit([](Json& j) { j["cases"] = Json::object(); }),
         {"cases: must be an array, got an object"}},
        {"missing_required_key",
         edit([](Json& j) { j["cases"][1].erase("supply_tdb_C"); }),
         {"cases[1].supply_tdb_C: required key missing"}},
        {"missing_required_section_key",
         edit([](Json& j) { j["supply"][1].erase("group"); }),
         {"supply[1].group: required key missing"}},
        {"missing_airflows", edit([](Json& j) { j.erase("airflows"); }), {"airflows: required key missing"}},
        {"empty_id", edit([](Json& j) { j["supply"][0]["id"] = ""; }), {"supply[0].id: must not be empty"}},
        {"duplicate_id",
         edit([](Json& j) { j["supply"][6]["id"] = "oda-filter"; }),
         {"supply[6].id: duplicate id 'oda-filter' (first used at supply[1])"}},
        {"duplicate_id_across_paths",
         edit([](Json& j) { j["extract"][2]["id"] = "supply-fan"; }),
         {"extract[2].id: duplicate id 'supply-fan' (first used at supply[5])"}},
        {"duplicate_case_name",
         edit([](Json& j) { j["cases"][2]["name"] = "winter design"; }),
         {"cases[2].name: duplicate name 'winter design' (first used at cases[0])"}},
        {"no_cases", edit([](Json& j) { j["cases"] = Json::array(); }), {"cases: must hold at least one design case"}},

        // Coupled sections.
        {"marker_missing", edit([](Json& j) { j["extract"].erase(1); }), {kHrMarkerMissing}},
        {"marker_without_section",
         edit([](Json& j) { j["extract"][1]["id"] = "hr2"; }),
         {"extract[1].id: coupled marker 'hr2' has no section with this id in the supply path", kHrMarkerMissing}},
        {"marker_on_a_filter",
         edit([](Json& j) { j["extract"][1]["id"] = "oda-filter"; }),
         {"extract[1].id: 'oda-filter' at supply[1] is a filter, not a coupled section (heat_recovery or mixing)",
          kHrMarkerMissing}},
        {"marker_twice",
         edit([](Json& j) {
             j["extract"].push_back(Json{{"id", "hr"}, {"type", "coupled"}});
         }),
         {"extract[4].id: duplicate coupled marker 'hr' (first at extract[1])"}},
        {"marker_in_supply",
         edit([](Json& j) {
             j["supply"].push_back(Json{{"id", "m"}, {"type", "coupled"}});
         }),
         {"supply[8].type: 'coupled' marks a coupled section's place in the extract path; the supply path holds the "
          "section itself"}},
        {"recovery_in_extract",
         edit([](Json& j) {
             j["extract"][1] =
                 Json{{"id", "hr"}, {"type", "heat_recovery"}, {"kind", "plate_cross_flow"}, {"efficiency_pct", 60}};
         }),
         {"extract[1].type: 'heat_recovery' is described in the supply path; put {\"id\": \"hr\", \"type\": "
          "\"coupled\"} in the extract path",
          "extract[1].id: duplicate id 'hr' (first used at supply[2])", kHrMarkerMissing}},

        // Every problem at once, in the order of the file.
        {"several_problems",
         edit([](Json& j) {
             j["airflows"]["supply_m3h"] = -1;
             j["supply"][1]["final_dp_Pa"] = 10;
             j["supply"][3].erase("flow_temperature_C");
             j["cases"][0]["outdoor"]["rh_pct"] = 120;
             j["cases"][2]["room"]["tdb_C"] = 70;
         }),
         {"airflows.supply_m3h: must be positive", "supply[1].final_dp_Pa: must exceed initial_dp_Pa (70)",
          "supply[3].flow_temperature_C: required key missing", "cases[0].outdoor.rh_pct: 120 is outside 0 .. 100",
          "cases[2].room.tdb_C: 70 is outside 0 .. 50"}},

        // The file as a whole.
        {"syntax_error",
         raw("{\n  \"format\": \"airwright-project\",\n  \"format_version\": }\n"),
         {"line 3, column 21: syntax error while parsing value - unexpected '}'; expected '[', '{', or a literal"}},
        {"empty_text",
         raw(""),
         {"line 1, column 1: syntax error while parsing value - unexpected end of input; expected '[', '{', or a "
          "literal"}},
        {"not_an_object", raw("[1, 2]"), {"a project file holds one JSON object, got an array"}},
        {"other_format",
         raw(R"({"format": "something-else", "format_version": 1})"),
         {"format: 'something-else' is not an Airwright project file (expected 'airwright-project')"}},
        {"format_missing",
         raw(R"({"format_version": 1})"),
         {"format: required key missing (\"airwright-project\" marks an Airwright project file)"}},
        {"version_not_whole",
         raw(R"({"format": "airwright-project", "format_version": 1.5})"),
         {"format_version: must be a whole number, got 1.5"}},
        {"version_negative",
         raw(R"({"format": "airwright-project", "format_version": -3})"),
         {"format_version: -3 is outside 0 .. 1"}},
    };
}

void PrintTo(const Row& row, std::ostream* os)
{
    *os << row.name;
}

class ProjectFileValidation : public ::testing::TestWithParam<Row> {};

} // namespace

TEST_P(ProjectFileValidation, ReportsEveryProblemWithItsPath)
{
    const Row& row = GetParam();
    const std::string text = row.text();
    LoadReport report;
    if (row.errors.empty()) {
        EXPECT_NO_THROW({
            try {
                ProjectFile::parse(text, report);
            } catch (const ProjectFileError& e) {
                ADD_FAILURE() << e.what();
            }
        });
        return;
    }
    try {
        ProjectFile::parse(text, report);
        FAIL() << "no error for " << row.name;
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(), row.errors);
        std::string joined;
        for (const auto& line : row.errors)
            joined += (joined.empty() ? "" : "\n") + line;
        EXPECT_EQ(std::string(e.what()), joined);
        EXPECT_TRUE(e.file().empty());
    }
}

INSTANTIATE_TEST_SUITE_P(Files, ProjectFileValidation, ::testing::ValuesIn(rows()),
                         [](const ::testing::TestParamInfo<Row>& row) { return std::string(row.param.name); });

TEST(ProjectFileValidationExtra, KeyGivenTwiceIsAnError)
{
    std::string text = demoJson().dump(2);
    const std::string first = "\"name\": \"winter design\",";
    const auto at = text.find(first);
    ASSERT_NE(at, std::string::npos);
    text.insert(at + first.size(), " \"name\": \"again\",");
    LoadReport report;
    try {
        ProjectFile::parse(text, report);
        FAIL() << "a key given twice was accepted";
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(),
                  std::vector<std::string>{"cases[0].name: key given twice in the same object; give it once"});
    }
}

TEST(ProjectFileValidationExtra, DeeplyNestedValuesAreReportedNotACrash)
{
    // A hostile file within the size limit: a million nested arrays where the
    // site should be. Parsing and reporting must not recurse on the depth.
    const std::size_t depth = 1000000;
    const std::string text = R"({"format": "airwright-project", "format_version": 1, "site": )" +
                             std::string(depth, '[') + std::string(depth, ']') + "}";
    LoadReport report;
    try {
        ProjectFile::parse(text, report);
        FAIL() << "accepted";
    } catch (const ProjectFileError& e) {
        ASSERT_FALSE(e.errors().empty());
        EXPECT_EQ(e.errors()[0], "site: must be an object, got an array");
    }
    const std::string format = R"({"format": )" + std::string(depth, '[') + std::string(depth, ']') + "}";
    try {
        ProjectFile::parse(format, report);
        FAIL() << "accepted";
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(), std::vector<std::string>{"format: an array is not an Airwright project file (expected "
                                                       "'airwright-project')"});
    }
}

TEST(ProjectFileValidationExtra, ProblemsAreAnInputError)
{
    LoadReport report;
    EXPECT_THROW(ProjectFile::parse("{}", report), Airwright::Core::InputError);
}

TEST(ProjectFileValidationExtra, UnknownKeysAreWarningsNotErrors)
{
    Json json = demoJson();
    json["colour"] = "blue";
    json["supply"][0]["motorised"] = true;
    json["cases"][2]["outdoor"]["wind_ms"] = 3;
    json["extract"][1]["note"] = "marker";
    LoadReport report;
    const Project p = ProjectFile::parse(json.dump(), report);
    EXPECT_EQ(p.unit.supply.size(), 8u);
    std::vector<std::string> lines;
    for (const auto& w : report.warnings)
        lines.push_back(w.text());
    EXPECT_EQ(lines, (std::vector<std::string>{
                         "supply[0].motorised: unknown key, ignored", "extract[1].note: unknown key, ignored",
                         "cases[2].outdoor.wind_ms: unknown key, ignored", "colour: unknown key, ignored"}));
}

TEST(ProjectFileValidationExtra, NewerFormatVersionIsRefusedNamingBothVersions)
{
    Json json = demoJson();
    json["format_version"] = 7;
    LoadReport report;
    try {
        ProjectFile::parse(json.dump(), report);
        FAIL() << "a newer format was accepted";
    } catch (const ProjectFileError& e) {
        ASSERT_EQ(e.errors().size(), 1u);
        EXPECT_EQ(e.errors()[0], "format_version: the file is format version 7; this Airwright reads versions up "
                                 "to 1: open it with a newer Airwright");
    }
}

} // namespace Airwright::Core::Project
