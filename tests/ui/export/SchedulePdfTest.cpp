#include "PdfText.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"
#include "airwright/ui/export/SchedulePdf.h"

#include <QFileInfo>
#include <QTemporaryDir>

#include <gtest/gtest.h>

#include <filesystem>

using namespace Airwright;
using Ui::SchedulePdf;
using Ui::Test::PdfText;

namespace {

Core::Project::Project demo()
{
    Core::Project::LoadReport report;
    return Core::Project::ProjectFile::load(
        std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj", report);
}

// pdftotext keeps words but not always their line breaks: compare on single spaces.
QString squeezed(QString text)
{
    return text.simplified();
}

class SchedulePdfDemo : public ::testing::Test {
protected:
    void SetUp() override
    {
        if (!PdfText::toolsAvailable())
            GTEST_SKIP() << "pdftotext, pdfinfo or pdfimages (poppler-utils) not found";
        ASSERT_TRUE(dir.isValid());
        project = demo();
        result = Core::Chain::ChainSolver::solve(project.unit);
    }

    QString write(SchedulePdf::Paper paper, Ui::UnitSystem::System units, const QString& name)
    {
        const QString file = dir.filePath(name);
        SchedulePdf::Options options;
        options.paper = paper;
        options.units = units;
        outcome = SchedulePdf::write(file, project, result, options);
        return file;
    }

    QTemporaryDir dir;
    Core::Project::Project project;
    Core::Chain::UnitResult result;
    SchedulePdf::Outcome outcome;
};

} // namespace

TEST_F(SchedulePdfDemo, TextNamesEverySectionAndTheSfp)
{
    const QString file = write(SchedulePdf::Paper::A4, Ui::UnitSystem::System::SI, QStringLiteral("demo.pdf"));
    ASSERT_TRUE(QFileInfo(file).size() > 1000);
    const QString text = PdfText::text(file);
    ASSERT_FALSE(text.isEmpty()) << "no text extracted: is text drawn as text?";
    for (const auto* path : {&project.unit.supply, &project.unit.extract})
        for (const auto& s : *path)
            EXPECT_TRUE(text.contains(QString::fromStdString(s.id))) << s.id;
    // The unit SFP of every case as the schedule prints it: W/(m3/s), no decimals.
    for (const auto& c : result.cases) {
        const std::string sfp = Core::formatFixed(Core::toWattsPerCubicMetrePerSecond(c.totals.specificFanPower), 0);
        EXPECT_TRUE(text.contains(QString::fromStdString(sfp))) << c.caseName << " SFP " << sfp;
    }
    const QString flat = squeezed(text);
    for (const char* phrase : {"Section schedule, supply path", "Section schedule, extract path", "SFP category EN 16798-3",
                               "velocity class EN 13053", "SFPint", "Measuring and control points", "Frost analysis",
                               "Cautions and disclaimer", "design aid", "certified data"})
        EXPECT_TRUE(flat.contains(QString::fromLatin1(phrase))) << phrase;
    // Project block.
    for (const auto& field : {project.info.name, project.info.reference, project.info.designer, project.info.date})
        EXPECT_TRUE(flat.contains(QString::fromStdString(field).simplified())) << field;
}

TEST_F(SchedulePdfDemo, EveryPageSaysPageNOfM)
{
    const QString file = write(SchedulePdf::Paper::A4, Ui::UnitSystem::System::SI, QStringLiteral("pages.pdf"));
    const int pages = PdfText::pageCount(file);
    ASSERT_EQ(pages, outcome.pages);
    ASSERT_GE(pages, 4);
    for (int i = 1; i <= pages; ++i)
        EXPECT_TRUE(PdfText::text(file, i).contains(QStringLiteral("page %1 of %2").arg(i).arg(pages))) << "page " << i;
}

TEST_F(SchedulePdfDemo, PaperSizes)
{
    const QString a4 = write(SchedulePdf::Paper::A4, Ui::UnitSystem::System::SI, QStringLiteral("a4.pdf"));
    const QString letter = write(SchedulePdf::Paper::Letter, Ui::UnitSystem::System::SI, QStringLiteral("letter.pdf"));
    const auto a4Size = PdfText::pageSizePoints(a4);
    const auto letterSize = PdfText::pageSizePoints(letter);
    ASSERT_TRUE(a4Size && letterSize);
    // ISO 216 A4: 210 x 297 mm = 595.28 x 841.89 pt (1 pt = 1/72 in, 1 in = 25.4 mm).
    EXPECT_NEAR(a4Size->first, 210.0 / 25.4 * 72.0, 0.5);
    EXPECT_NEAR(a4Size->second, 297.0 / 25.4 * 72.0, 0.5);
    // ANSI Letter: 8.5 x 11 in = 612 x 792 pt.
    EXPECT_NEAR(letterSize->first, 612.0, 0.5);
    EXPECT_NEAR(letterSize->second, 792.0, 0.5);
}

TEST_F(SchedulePdfDemo, VectorPagesWithoutImages)
{
    const QString file = write(SchedulePdf::Paper::A4, Ui::UnitSystem::System::SI, QStringLiteral("vector.pdf"));
    EXPECT_EQ(PdfText::imageCount(file), 0);
}

TEST_F(SchedulePdfDemo, ImperialUnits)
{
    const QString file = write(SchedulePdf::Paper::Letter, Ui::UnitSystem::System::IP, QStringLiteral("ip.pdf"));
    const QString text = PdfText::text(file);
    for (const char* unit : {"in. w.g.", "°F", "cfm", "Btu/h", "W/cfm", "fpm"})
        EXPECT_TRUE(text.contains(QString::fromUtf8(unit))) << unit;
    // SI units of the same quantities are gone from the tables (the cautions
    // quote "0 °C" and +5 °C as trade practice, and transmitter spans keep their
    // SI span in brackets, so look at the unit summary's wording).
    EXPECT_FALSE(text.contains(QStringLiteral("W/(m³/s)")));
    // The SFP of the first case in W/cfm: W/(m3/s) x (0.3048^3 / 60) m3/s per cfm (exact foot).
    const double wPerCfm = Core::toWattsPerCubicMetrePerSecond(result.cases.front().totals.specificFanPower)
                           * 0.3048 * 0.3048 * 0.3048 / 60.0;
    EXPECT_TRUE(text.contains(QString::number(wPerCfm, 'f', 3))) << wPerCfm;
}

TEST(SchedulePdf, PaperNames)
{
    EXPECT_EQ(SchedulePdf::paperFromName("A4"), SchedulePdf::Paper::A4);
    EXPECT_EQ(SchedulePdf::paperFromName("letter"), SchedulePdf::Paper::Letter);
    EXPECT_FALSE(SchedulePdf::paperFromName("A5").has_value());
    EXPECT_FALSE(SchedulePdf::paperFromName("").has_value());
}

TEST(SchedulePdf, RefusesAnUnwritableFile)
{
    auto project = demo();
    const auto result = Core::Chain::ChainSolver::solve(project.unit);
    EXPECT_THROW(SchedulePdf::write(QStringLiteral("/nonexistent-folder/x.pdf"), project, result, {}),
                 Core::InputError);
}
