#include "airwright/cli/CliApplication.h"
#include "airwright/cli/CsvWriter.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/cli/ScheduleCsv.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include "CsvTestReader.h"

#include <nlohmann/json.hpp>

#include <gtest/gtest.h>

#include <algorithm>
#include <clocale>
#include <limits>
#include <filesystem>
#include <map>
#include <sstream>
#include <stdexcept>
#include <string>

using namespace Airwright;
using Cli::Test::csvNumber;
using Cli::Test::readCsv;
using nlohmann::json;

namespace {

const std::string kDemo = std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-library.awproj";

std::string demoCsv()
{
    Core::Project::LoadReport report;
    const auto project = Core::Project::ProjectFile::load(kDemo, report);
    return Cli::ScheduleCsv::write(Core::Chain::ChainSolver::solve(project.unit));
}

json computeJson()
{
    Cli::CliApplication app;
    std::ostringstream out, err;
    const int code = app.run({"compute", kDemo, "--format", "json"}, out, err);
    EXPECT_EQ(code, Cli::Done) << err.str();
    return json::parse(out.str());
}

// The compute JSON of a section flattened to the CSV's column names: the two
// states get inlet_ / outlet_ prefixes; the heat recovery's nested frost and
// leakage blocks map to their SectionFigures keys.
void flatten(const json& section, std::map<std::string, json>& out)
{
    for (const auto& [key, value] : section.items()) {
        if (key == "inlet" || key == "outlet") {
            for (const auto& [k, v] : value.items())
                out[key + "_" + k] = v;
        } else if (key == "frost") {
            for (const auto& [k, v] : value.items())
                out[k == "recovered_fraction" ? k : "frost_" + k] = v;
        } else if (key == "leakage") {
            for (const auto& [k, v] : value.items())
                out[k] = v;
        } else {
            out[key] = value;
        }
    }
}

} // namespace

TEST(ScheduleCsv, MatchesComputeNumberForNumber)
{
    const auto records = readCsv(demoCsv());
    const json compute = computeJson();
    ASSERT_GE(records.size(), 2u);
    const auto& header = records.front();
    std::map<std::string, std::size_t> column;
    for (std::size_t i = 0; i < header.size(); ++i) {
        EXPECT_EQ(column.count(header[i]), 0u) << "duplicate column " << header[i];
        column[header[i]] = i;
    }

    std::size_t row = 1;
    std::size_t numbersCompared = 0;
    for (const auto& c : compute["cases"]) {
        for (const char* path : {"supply", "extract"}) {
            int number = 0;
            for (const auto& section : c["paths"][path]) {
                ASSERT_LT(row, records.size());
                const auto& r = records[row++];
                ASSERT_EQ(r.size(), header.size()) << "row " << row;
                EXPECT_EQ(r[column.at("case")], c["name"].get<std::string>());
                EXPECT_EQ(r[column.at("path")], path);
                EXPECT_EQ(csvNumber(r[column.at("number")]), ++number);
                EXPECT_EQ(r[column.at("id")], section["id"].get<std::string>());
                EXPECT_EQ(r[column.at("type")], section["type"].get<std::string>());

                std::map<std::string, json> flat;
                flatten(section, flat);
                for (const auto& [key, value] : flat) {
                    if (!value.is_number())
                        continue;
                    ASSERT_TRUE(column.count(key)) << "no CSV column for compute key " << key;
                    const auto v = csvNumber(r[column.at(key)]);
                    ASSERT_TRUE(v.has_value()) << key << " = '" << r[column.at(key)] << "'";
                    // Both are written with round-trip precision from the same
                    // computation: they must be the same double, not just close.
                    EXPECT_EQ(*v, value.get<double>()) << section["id"] << " " << key;
                    ++numbersCompared;
                }
                // The other way round: every number in the row is in the JSON (the
                // CSV writes the water columns as 0 where the JSON leaves them out).
                for (const auto& [name, index] : column) {
                    const auto v = csvNumber(r[index]);
                    if (!v || name == "number")
                        continue;
                    if (flat.count(name) == 0) {
                        EXPECT_TRUE((name == "water_added_kgh" || name == "water_removed_kgh") && *v == 0.0)
                            << section["id"] << " " << name << " is in the CSV only";
                    }
                }
            }
        }
    }
    EXPECT_EQ(row, records.size()) << "the CSV has rows the compute output does not";
    EXPECT_GT(numbersCompared, 300u);
}

TEST(ScheduleCsv, HeaderNamesCarryUnits)
{
    const auto records = readCsv(demoCsv());
    ASSERT_FALSE(records.empty());
    const auto& header = records.front();
    // Common columns by their documented names, each with its unit.
    for (const char* name : {"length_mm", "q_m3s", "face_velocity_ms", "dp_Pa", "inlet_tdb_C", "outlet_w_gkg",
                             "outlet_rh_pct", "outlet_h_kJkg", "duty_kW", "initial_dp_Pa", "final_dp_Pa",
                             "water_flow_ls", "power_kW", "sfp_W_per_m3s"})
        EXPECT_NE(std::find(header.begin(), header.end(), name), header.end()) << name;
}

TEST(ScheduleCsv, IsTheSameUnderAnotherNumericLocale)
{
    const std::string before = demoCsv();
    const std::string saved = std::setlocale(LC_ALL, nullptr);
    if (std::setlocale(LC_ALL, "de_DE.UTF-8") == nullptr && std::setlocale(LC_ALL, "de_DE.utf8") == nullptr)
        GTEST_SKIP() << "no German locale on this machine";
    const std::string after = demoCsv();
    std::setlocale(LC_ALL, saved.c_str());
    EXPECT_EQ(before, after);
    EXPECT_EQ(before.find(';'), std::string::npos);
}

struct QuoteRow {
    std::string field;
    std::string written;
};

class CsvQuoting : public ::testing::TestWithParam<QuoteRow> {};

// RFC 4180 section 2, rules 5 to 7: quote fields with commas, quotes or line
// breaks, double the quotes inside.
TEST_P(CsvQuoting, FollowsRfc4180)
{
    EXPECT_EQ(Cli::CsvWriter::quote(GetParam().field), GetParam().written);
    Cli::CsvWriter csv;
    csv.text(GetParam().field).text("next");
    csv.endRow();
    const auto records = readCsv(csv.str());
    ASSERT_EQ(records.size(), 1u);
    ASSERT_EQ(records.front().size(), 2u);
    EXPECT_EQ(records.front().front(), GetParam().field);
}

INSTANTIATE_TEST_SUITE_P(Fields, CsvQuoting,
                         ::testing::Values(QuoteRow{"plain", "plain"}, QuoteRow{"", ""},
                                           QuoteRow{"a,b", "\"a,b\""}, QuoteRow{"say \"hi\"", "\"say \"\"hi\"\"\""},
                                           QuoteRow{"two\r\nlines", "\"two\r\nlines\""},
                                           QuoteRow{"line\nfeed", "\"line\nfeed\""},
                                           QuoteRow{"winter design, -12 °C", "\"winter design, -12 °C\""}));

TEST(CsvWriter, RefusesNonFiniteNumbers)
{
    Cli::CsvWriter csv;
    EXPECT_THROW(csv.number(std::numeric_limits<double>::quiet_NaN()), std::runtime_error);
    EXPECT_THROW(csv.number(std::numeric_limits<double>::infinity()), std::runtime_error);
    csv.number(0.1).number(-2.5e-7);
    csv.endRow();
    // Round-trip: the shortest text that reads back to the same double.
    EXPECT_EQ(csv.str(), "0.1,-2.5e-07\r\n");
}
