// Every class of bad input in docs/bad-input.md through the whole application
// (CliApplication::run, in memory): the exit code and the shape of the one-line
// message. Files are written to a scratch folder from the demo project and demo
// climate with one thing broken each.

#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"

#include <gtest/gtest.h>

#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>
#include <string>
#include <vector>

namespace fs = std::filesystem;

namespace {

std::string readText(const fs::path& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

void writeText(const fs::path& path, const std::string& text)
{
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out << text;
}

std::string replaced(std::string text, const std::string& from, const std::string& to)
{
    const auto at = text.find(from);
    EXPECT_NE(at, std::string::npos) << from;
    if (at != std::string::npos)
        text.replace(at, from.size(), to);
    return text;
}

// The EPW text with one field of one data record (0-based record, 1-based field) replaced.
std::string epwWithField(const std::string& epw, int record, int field, const std::string& value)
{
    std::istringstream in(epw);
    std::ostringstream out;
    std::string line;
    for (int n = 0; std::getline(in, line); ++n) {
        if (n == 8 + record) {
            std::vector<std::string> fields;
            std::stringstream ss(line);
            for (std::string f; std::getline(ss, f, ',');)
                fields.push_back(f);
            fields[static_cast<std::size_t>(field - 1)] = value;
            line.clear();
            for (std::size_t i = 0; i < fields.size(); ++i)
                line += (i ? "," : "") + fields[i];
        }
        out << line << "\n";
    }
    return out.str();
}

struct BadInputRow {
    std::string name;
    std::vector<std::string> args; // "{dir}" is replaced by the scratch folder
    int exitCode;
    std::string messagePart;       // must appear in the first line of stderr (stdout when stderr is empty)
};

class BadInput : public ::testing::TestWithParam<BadInputRow> {
protected:
    static void SetUpTestSuite()
    {
        std::random_device seed;
        s_dir = fs::temp_directory_path() / ("airwright-bad-input-" + std::to_string(seed()));
        fs::create_directories(s_dir);
        const fs::path source(AIRWRIGHT_SOURCE_DIR);
        const std::string demo = readText(source / "resources" / "demo" / "demo-library.awproj");
        const std::string epw = readText(source / "resources" / "demo" / "demo-climate.epw");
        writeText(s_dir / "good.awproj", demo);
        writeText(s_dir / "syntax.awproj", replaced(demo, "\"altitude_m\": 250", "\"altitude_m\": 250,"));
        writeText(s_dir / "type.awproj", replaced(demo, "\"altitude_m\": 250", "\"altitude_m\": \"250\""));
        writeText(s_dir / "range.awproj", replaced(demo, "\"rh_pct\": 90", "\"rh_pct\": 120"));
        writeText(s_dir / "unknown-key.awproj", replaced(demo, "\"altitude_m\": 250", "\"altitude_m\": 250, \"colour\": 1"));
        writeText(s_dir / "newer.awproj", replaced(demo, "\"format_version\": 1", "\"format_version\": 2"));
        writeText(s_dir / "altitude.awproj", replaced(demo, "\"altitude_m\": 250", "\"altitude_m\": 6000"));
        // Recirculation that the extract path can feed at 100 % airflow but not at
        // the 150 % of the winter case, where the minimum outdoor air is a smaller share.
        std::string recirculation = replaced(demo, "\"extract_m3h\": 9000", "\"extract_m3h\": 5000");
        recirculation = replaced(recirculation, "\"supply\": [",
                                 "\"supply\": [{\"id\": \"mix\", \"type\": \"mixing\", \"outdoor_air_pct\": 0, "
                                 "\"min_outdoor_air_m3h\": 4500},");
        recirculation = replaced(recirculation, "\"extract\": [", "\"extract\": [{\"id\": \"mix\", \"type\": \"coupled\"},");
        recirculation = replaced(recirculation, "\"airflow_pct\": 100", "\"airflow_pct\": 150");
        writeText(s_dir / "recirculation.awproj", recirculation);
        // A silencer rated 2000 Pa at 0.5 m/s (32 kPa at 2 m/s, the drop scaling
        // with the velocity squared) behind a fan of 5 % efficiency.
        std::string fanHeat = replaced(demo, "\"rated_dp_Pa\": 40", "\"rated_dp_Pa\": 2000");
        fanHeat = replaced(fanHeat, "\"rated_velocity_mps\": 2", "\"rated_velocity_mps\": 0.5");
        fanHeat = replaced(fanHeat, "\"fan_efficiency_pct\": 70", "\"fan_efficiency_pct\": 5");
        fanHeat = replaced(fanHeat, "\"motor_efficiency_pct\": 93", "\"motor_efficiency_pct\": 30");
        writeText(s_dir / "fan-heat.awproj", fanHeat);
        writeText(s_dir / "big.awproj", std::string(16u * 1024u * 1024u + 1u, ' '));
        fs::create_directories(s_dir / "folder.awproj");
        writeText(s_dir / "bad-number.epw", epwWithField(epw, 100, 7, "abc"));
        writeText(s_dir / "bad-rh.epw", epwWithField(epw, 5, 9, "150"));
        writeText(s_dir / "no-humidity.csv", "tdb_C,hours\n-5,100\n");
        writeText(s_dir / "bad-hours.csv", "tdb_C,hours,rh_pct\n-5,abc,80\n");
    }
    static void TearDownTestSuite()
    {
        std::error_code ignored;
        fs::remove_all(s_dir, ignored);
    }
    static fs::path s_dir;
};

fs::path BadInput::s_dir;

} // namespace

TEST_P(BadInput, ExitCodeAndOneClearLine)
{
    const auto& row = GetParam();
    std::vector<std::string> args;
    for (std::string arg : row.args) {
        if (const auto at = arg.find("{dir}"); at != std::string::npos)
            arg.replace(at, 5, s_dir.string());
        args.push_back(arg);
    }
    Airwright::Cli::CliApplication app;
    std::ostringstream out, err;
    const int code = app.run(args, out, err);
    EXPECT_EQ(code, row.exitCode) << err.str();
    // A valid file says so on stdout; every problem goes to stderr.
    const std::string text = err.str().empty() ? out.str() : err.str();
    const std::string firstLine = text.substr(0, text.find('\n'));
    EXPECT_NE(firstLine.find(row.messagePart), std::string::npos) << "stderr: " << text;
    EXPECT_EQ(text.find("internal error"), std::string::npos) << text;
}

std::vector<BadInputRow> badInputRows()
{
    using Airwright::Cli::Done;
    using Airwright::Cli::InvalidInput;
    const std::string noSens = "--no-sensitivity";
    return {
        {"valid_file_is_valid", {"validate", "{dir}/good.awproj"}, Done, "valid ("},
        {"json_syntax", {"validate", "{dir}/syntax.awproj"}, InvalidInput, "syntax.awproj: line 14, column "},
        {"wrong_type", {"validate", "{dir}/type.awproj"}, InvalidInput, "site.altitude_m: must be a number, got a string"},
        {"out_of_range", {"validate", "{dir}/range.awproj"}, InvalidInput, "cases[0].outdoor.rh_pct: 120 is outside 0 .. 100"},
        {"unknown_key_warns", {"validate", "{dir}/unknown-key.awproj"}, Done, "warning: site.colour: unknown key, ignored"},
        {"altitude_beyond_solver", {"validate", "{dir}/altitude.awproj"}, InvalidInput,
         "site.altitude_m: 6000 is outside -500 .. 5500"},
        // Problems that show only in a computed case: validate computes every case,
        // compute refuses with the same line.
        {"recirculation_in_one_case", {"validate", "{dir}/recirculation.awproj"}, InvalidInput,
         "recirculation.awproj: extract[0]: in case 'winter design' the mixing section 'mix' recirculates "},
        {"recirculation_in_one_case_compute", {"compute", "{dir}/recirculation.awproj"}, InvalidInput,
         "error: extract[0]: in case 'winter design' the mixing section 'mix' recirculates "},
        {"recirculation_other_case_computes", {"compute", "{dir}/recirculation.awproj", "--case", "summer design"},
         Done, "Fernholt Public Library"},
        {"fan_heats_beyond_200", {"validate", "{dir}/fan-heat.awproj"}, InvalidInput,
         "fan-heat.awproj: supply[5]: in case 'winter design', fan 'supply-fan': the fan's heat "},
        {"fan_heats_beyond_200_compute", {"compute", "{dir}/fan-heat.awproj"}, InvalidInput,
         "error: supply[5]: in case 'winter design', fan 'supply-fan': the fan's heat "},
        {"supply_only_unit_validates", {"validate", std::string(AIRWRIGHT_TEST_DATA_DIR) + "/projects/minimal-valid.awproj"},
         Done, "minimal-valid.awproj: valid (2 sections, 1 case)"},
        {"supply_only_unit_computes", {"compute", std::string(AIRWRIGHT_TEST_DATA_DIR) + "/projects/minimal-valid.awproj"},
         Done, "(unnamed project)"},
        {"newer_version", {"validate", "{dir}/newer.awproj"}, InvalidInput, "the file is format version 2; this Airwright reads versions up to 1"},
        {"too_large", {"validate", "{dir}/big.awproj"}, InvalidInput, "project files are limited to 16 MiB (16777216 bytes)"},
        {"missing_file", {"validate", "{dir}/missing.awproj"}, InvalidInput, "missing.awproj: cannot open: "},
        {"folder_not_file", {"compute", "{dir}/folder.awproj"}, InvalidInput, "cannot open: is a folder, not a project file"},
        {"epw_not_a_number", {"compare-hr", "{dir}/good.awproj", "--climate", "{dir}/bad-number.epw", noSens}, InvalidInput,
         "bad-number.epw, line 109, field 7: dry bulb temperature 'abc' is not a number"},
        {"epw_out_of_range", {"compare-hr", "{dir}/good.awproj", "--climate", "{dir}/bad-rh.epw", noSens}, InvalidInput,
         "bad-rh.epw, line 14, field 9: relative humidity 150 % is outside 0 .. 110 %"},
        {"epw_missing", {"compare-hr", "{dir}/good.awproj", "--climate", "{dir}/none.epw", noSens}, InvalidInput,
         "none.epw: cannot open"},
        {"bins_header", {"compare-hr", "{dir}/good.awproj", "--climate", "{dir}/no-humidity.csv", noSens}, InvalidInput,
         "no-humidity.csv, line 1: the header row needs exactly one of the columns w_gkg or rh_pct"},
        {"bins_value", {"compare-hr", "{dir}/good.awproj", "--climate", "{dir}/bad-hours.csv", noSens}, InvalidInput,
         "bad-hours.csv, line 2, field 2: value 'abc' is not a number"},
        {"unknown_command", {"frobnicate"}, InvalidInput, "error: unknown command 'frobnicate'"},
        {"no_command", {}, InvalidInput, "usage: airwright-cli COMMAND"},
        {"unknown_option", {"compute", "{dir}/good.awproj", "--bogus"}, InvalidInput, "error: unknown option '--bogus'"},
        {"option_without_value", {"compute", "{dir}/good.awproj", "--case"}, InvalidInput, "error: option --case needs a value"},
        {"extra_argument", {"validate", "a", "b"}, InvalidInput, "error: unexpected argument 'b'"},
        {"missing_argument", {"validate"}, InvalidInput, "error: missing FILE"},
        {"bad_number_argument", {"state", "--tdb", "20,5", "--rh", "50"}, InvalidInput,
         "error: --tdb expects a number (like 20 or -5.5), got '20,5'"},
        {"bad_choice", {"compute", "{dir}/good.awproj", "--format", "xml"}, InvalidInput,
         "error: --format must be json or text, not 'xml'"},
        {"unknown_case", {"compute", "{dir}/good.awproj", "--case", "nope"}, InvalidInput, "error: no design case called 'nope'"},
        {"rh_above_100", {"state", "--tdb", "20", "--rh", "120"}, InvalidInput,
         "error: relative humidity 120 % is outside the allowed range 0 .. 100 %"},
        {"dew_point_above_dry_bulb", {"state", "--tdb", "20", "--tdp", "25"}, InvalidInput,
         "error: dew-point temperature 25 °C is outside the allowed range"},
    };
}

INSTANTIATE_TEST_SUITE_P(Rows, BadInput, ::testing::ValuesIn(badInputRows()),
                         [](const ::testing::TestParamInfo<BadInputRow>& row) { return row.param.name; });
