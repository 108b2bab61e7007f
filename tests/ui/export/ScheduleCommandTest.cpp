#include "PdfText.h"

#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ComputeReport.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"
#include "airwright/ui/export/ScheduleCommand.h"

#include "../../cli/CsvTestReader.h"

#include <QFile>
#include <QFileInfo>
#include <QTemporaryDir>

#include <nlohmann/json.hpp>

#include <gtest/gtest.h>

#include <fstream>
#include <map>
#include <memory>
#include <sstream>

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

// Through the application, so errors map to exit codes as they do for users.
Run run(std::vector<std::string> args)
{
    Cli::CliApplication app;
    app.addCommand(std::make_unique<Ui::ScheduleCommand>());
    std::ostringstream out, err;
    args.insert(args.begin(), "schedule");
    const int code = app.run(args, out, err);
    return {code, out.str(), err.str()};
}

std::string readFile(const QString& file)
{
    std::ifstream in(file.toStdString(), std::ios::binary);
    std::stringstream s;
    s << in.rdbuf();
    return s.str();
}

} // namespace

TEST(ScheduleCommand, WritesThePdf)
{
    if (!Ui::Test::PdfText::toolsAvailable())
        GTEST_SKIP() << "poppler-utils not found";
    QTemporaryDir dir;
    const QString file = dir.filePath(QStringLiteral("demo.pdf"));
    const auto r = run({kDemo, "-o", file.toStdString(), "--paper", "Letter", "--units", "IP"});
    ASSERT_EQ(r.code, Cli::Done) << r.err;
    EXPECT_NE(r.out.find("Letter"), std::string::npos);
    const auto size = Ui::Test::PdfText::pageSizePoints(file);
    ASSERT_TRUE(size.has_value());
    EXPECT_NEAR(size->first, 612.0, 0.5); // ANSI Letter, 8.5 in x 72 pt/in
    EXPECT_TRUE(Ui::Test::PdfText::text(file).contains(QStringLiteral("in. w.g.")));
}

TEST(ScheduleCommand, AddsTheHeatRecoveryComparison)
{
    if (!Ui::Test::PdfText::toolsAvailable())
        GTEST_SKIP() << "poppler-utils not found";
    QTemporaryDir dir;
    const QString file = dir.filePath(QStringLiteral("with-comparison.pdf"));
    const std::string bins = std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-bins.csv";
    const auto r = run({kDemo, "-o", file.toStdString(), "--compare-hr", "--climate", bins});
    ASSERT_EQ(r.code, Cli::Done) << r.err;
    const QString text = Ui::Test::PdfText::text(file).simplified();
    EXPECT_TRUE(text.contains(QStringLiteral("Heat recovery options over a year")));
    EXPECT_TRUE(text.contains(QStringLiteral("by temperature bins")));
    for (const char* option : {"no heat recovery", "plate, cross-flow", "plate, counter-flow", "run-around coil loop"})
        EXPECT_TRUE(text.contains(QString::fromLatin1(option))) << option;
    EXPECT_TRUE(text.contains(QStringLiteral("Ranking by net benefit")));
    // Without --compare-hr the chapter is absent.
    const QString plain = dir.filePath(QStringLiteral("plain.pdf"));
    ASSERT_EQ(run({kDemo, "-o", plain.toStdString()}).code, Cli::Done);
    EXPECT_FALSE(Ui::Test::PdfText::text(plain).contains(QStringLiteral("Heat recovery options over a year")));
}

// The CSV the command writes, read back as RFC 4180, against the compute JSON of
// the same project: every number of the JSON is the same double in the CSV.
TEST(ScheduleCommand, CsvMatchesComputeNumberForNumber)
{
    QTemporaryDir dir;
    const QString file = dir.filePath(QStringLiteral("demo.csv"));
    const auto r = run({kDemo, "-o", file.toStdString()});
    ASSERT_EQ(r.code, Cli::Done) << r.err;
    const auto records = readCsv(readFile(file));
    ASSERT_GE(records.size(), 2u);
    std::map<std::string, std::size_t> column;
    for (std::size_t i = 0; i < records.front().size(); ++i)
        column[records.front()[i]] = i;

    Core::Project::LoadReport report;
    const auto project = Core::Project::ProjectFile::load(kDemo, report);
    const json compute = Cli::computeReportJson(project, Core::Chain::ChainSolver::solve(project.unit));
    std::size_t row = 1;
    std::size_t compared = 0;
    for (const auto& c : compute["cases"])
        for (const char* path : {"supply", "extract"})
            for (const auto& s : c["paths"][path]) {
                ASSERT_LT(row, records.size());
                const auto& rec = records[row++];
                ASSERT_EQ(rec[column.at("id")], s["id"].get<std::string>());
                for (const auto& [key, value] : s.items()) {
                    if (key == "inlet" || key == "outlet") {
                        for (const auto& [k, v] : value.items()) {
                            EXPECT_EQ(csvNumber(rec[column.at(key + "_" + k)]), v.get<double>()) << key << "_" << k;
                            ++compared;
                        }
                    } else if (value.is_number() && column.count(key)) {
                        EXPECT_EQ(csvNumber(rec[column.at(key)]), value.get<double>()) << s["id"] << " " << key;
                        ++compared;
                    }
                }
            }
    EXPECT_EQ(row, records.size());
    EXPECT_GT(compared, 300u);
}

struct BadRun {
    std::vector<std::string> args;
};

class ScheduleCommandInvalid : public ::testing::TestWithParam<BadRun> {};

TEST_P(ScheduleCommandInvalid, ExitsWithInvalidInput)
{
    const auto r = run(GetParam().args);
    EXPECT_EQ(r.code, Cli::InvalidInput) << r.out;
    EXPECT_FALSE(r.err.empty());
}

INSTANTIATE_TEST_SUITE_P(
    Arguments, ScheduleCommandInvalid,
    ::testing::Values(BadRun{{}}, BadRun{{kDemo}}, BadRun{{kDemo, "-o", "/tmp/x.txt"}},
                      BadRun{{kDemo, "-o", "/tmp/x.pdf", "--paper", "A5"}},
                      BadRun{{kDemo, "-o", "/tmp/x.pdf", "--units", "metric"}},
                      BadRun{{kDemo, "-o", "/tmp/x.csv", "--units", "IP"}},
                      BadRun{{"/nonexistent/project.awproj", "-o", "/tmp/x.pdf"}},
                      BadRun{{kDemo, "-o", "/nonexistent-folder/x.pdf"}},
                      BadRun{{kDemo, "-o", "/nonexistent-folder/x.csv"}},
                      BadRun{{kDemo, "-o", "/tmp/x.pdf", "--climate", "/tmp/none.epw"}},
                      BadRun{{kDemo, "-o", "/tmp/x.csv", "--compare-hr"}},
                      BadRun{{kDemo, "-o", "/tmp/x.pdf", "--compare-hr", "--climate", "/nonexistent/x.epw"}}));
