#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/cli/PointsCommand.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/checks/MeasurementPoints.h"
#include "airwright/core/project/ProjectFile.h"

#include "CsvTestReader.h"

#include <nlohmann/json.hpp>

#include <gtest/gtest.h>

#include <cmath>
#include <memory>
#include <sstream>
#include <string>

using namespace Airwright;
using Cli::Test::csvNumber;
using Cli::Test::readCsv;
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
    Cli::CliApplication app;
    // Registered here too, so the test does not depend on the application's list
    // (a second registration is harmless: the first of a name answers).
    app.addCommand(std::make_unique<Cli::PointsCommand>());
    std::ostringstream out, err;
    const int code = app.run(args, out, err);
    return {code, out.str(), err.str()};
}

std::vector<Core::Checks::MeasurementPoint> corePoints()
{
    Core::Project::LoadReport report;
    const auto project = Core::Project::ProjectFile::load(kDemo, report);
    return Core::Checks::measurementPoints(project.unit, Core::Chain::ChainSolver::solve(project.unit));
}

} // namespace

TEST(PointsCommand, JsonCarriesEveryPointOfTheCore)
{
    const auto r = run({"points", kDemo, "--format", "json"});
    ASSERT_EQ(r.code, Cli::Done) << r.err;
    const auto j = json::parse(r.out);
    const auto points = corePoints();
    ASSERT_EQ(j["points"].size(), points.size());
    for (std::size_t i = 0; i < points.size(); ++i) {
        const auto& p = j["points"][i];
        const auto& c = points[i];
        EXPECT_EQ(p["tag"], c.tag);
        EXPECT_EQ(p["position"], Core::Checks::pointPosition(c));
        EXPECT_EQ(p["unit"], Core::Checks::pointUnit(c.quantity));
        // Same computation, round-trip numbers: equal, not just close.
        EXPECT_EQ(p["expected"]["low"].get<double>(), Core::Checks::toPointUnit(c.expectedLow)) << c.tag;
        EXPECT_EQ(p["expected"]["high"].get<double>(), Core::Checks::toPointUnit(c.expectedHigh)) << c.tag;
        ASSERT_EQ(p["setpoints"].size(), c.setpoints.size()) << c.tag;
        for (std::size_t k = 0; k < c.setpoints.size(); ++k)
            EXPECT_EQ(p["setpoints"][k]["value"].get<double>(), Core::Checks::toPointUnit(c.setpoints[k].value));
        EXPECT_EQ(p["transmitter"].is_null(), !c.transmitter.has_value()) << c.tag;
        for (const char* key : {"purpose", "label", "quantity", "path", "placement", "note"})
            EXPECT_TRUE(p.contains(key)) << key;
    }
}

TEST(PointsCommand, CsvHasOneRecordPerPoint)
{
    const auto r = run({"points", kDemo, "--format", "csv"});
    ASSERT_EQ(r.code, Cli::Done) << r.err;
    const auto records = readCsv(r.out);
    const auto points = corePoints();
    ASSERT_EQ(records.size(), points.size() + 1);
    const auto& header = records.front();
    const auto col = [&](const std::string& name) {
        const auto it = std::find(header.begin(), header.end(), name);
        EXPECT_NE(it, header.end()) << name;
        return static_cast<std::size_t>(it - header.begin());
    };
    for (std::size_t i = 0; i < points.size(); ++i) {
        const auto& rec = records[i + 1];
        ASSERT_EQ(rec.size(), header.size());
        EXPECT_EQ(rec[col("tag")], points[i].tag);
        EXPECT_EQ(csvNumber(rec[col("expected_high")]), Core::Checks::toPointUnit(points[i].expectedHigh));
        if (points[i].transmitter)
            EXPECT_EQ(csvNumber(rec[col("transmitter_high")]), Core::Checks::toPointUnit(points[i].transmitter->high));
        else
            EXPECT_TRUE(rec[col("transmitter_high")].empty());
    }
}

TEST(PointsCommand, TextNamesEveryTagAndPosition)
{
    const auto r = run({"points", kDemo});
    ASSERT_EQ(r.code, Cli::Done) << r.err;
    for (const auto& p : corePoints()) {
        EXPECT_NE(r.out.find(p.tag), std::string::npos) << p.tag;
        EXPECT_NE(r.out.find(Core::Checks::pointPosition(p)), std::string::npos) << p.tag;
    }
    EXPECT_NE(r.out.find("common practice"), std::string::npos);
}

struct BadArgs {
    std::vector<std::string> args;
};

class PointsCommandInvalid : public ::testing::TestWithParam<BadArgs> {};

TEST_P(PointsCommandInvalid, ExitsWithInvalidInput)
{
    const auto r = run(GetParam().args);
    EXPECT_EQ(r.code, Cli::InvalidInput) << r.out;
    EXPECT_FALSE(r.err.empty());
}

INSTANTIATE_TEST_SUITE_P(
    Arguments, PointsCommandInvalid,
    ::testing::Values(BadArgs{{"points"}}, BadArgs{{"points", kDemo, "--format", "xml"}},
                      BadArgs{{"points", kDemo, kDemo}}, BadArgs{{"points", "/nonexistent/file.awproj"}},
                      BadArgs{{"points", std::string(AIRWRIGHT_TEST_DATA_DIR) + "/projects/broken-values.awproj"}}));

TEST(PointsCommand, HelpDescribesTheFormats)
{
    const auto r = run({"points", "--help"});
    EXPECT_EQ(r.code, Cli::Done);
    EXPECT_NE(r.out.find("--format"), std::string::npos);
}
