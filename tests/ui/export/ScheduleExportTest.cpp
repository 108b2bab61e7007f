// File > Export Section Schedule writes the same CSV as the command line and a PDF
// of the current results, and says why when it cannot.
#include "../views/DemoProject.h"
#include "PdfText.h"

#include "airwright/cli/CompareHrCommand.h"
#include "airwright/cli/ScheduleCsv.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/export/ScheduleExport.h"

#include <QFile>
#include <QFileInfo>
#include <QTemporaryDir>

#include <gtest/gtest.h>

#include <sstream>

using namespace Airwright;
using Airwright::Ui::ScheduleExport;

namespace {

class ScheduleExportTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        ASSERT_TRUE(dir.isValid());
        Ui::TestSupport::DemoProject::open(document);
        ASSERT_TRUE(document.result().has_value());
    }

    Ui::ProjectDocument document;
    QTemporaryDir dir;
};

} // namespace

TEST_F(ScheduleExportTest, CsvIsTheCommandLineCsv)
{
    const QString file = dir.filePath(QStringLiteral("schedule.csv"));
    EXPECT_TRUE(ScheduleExport::write(document, file, ScheduleExport::Format::Csv, Ui::UnitSystem::System::SI).isEmpty());
    QFile in(file);
    ASSERT_TRUE(in.open(QIODevice::ReadOnly));
    EXPECT_EQ(in.readAll().toStdString(), Cli::ScheduleCsv::write(*document.result()));
}

TEST_F(ScheduleExportTest, PdfOnLetterPaperNamesTheSections)
{
    const QString file = dir.filePath(QStringLiteral("schedule.pdf"));
    EXPECT_TRUE(
        ScheduleExport::write(document, file, ScheduleExport::Format::PdfLetter, Ui::UnitSystem::System::IP).isEmpty());
    ASSERT_GT(QFileInfo(file).size(), 1000);
    if (!Ui::Test::PdfText::toolsAvailable())
        GTEST_SKIP() << "poppler-utils not found";
    const auto size = Ui::Test::PdfText::pageSizePoints(file);
    ASSERT_TRUE(size.has_value());
    EXPECT_NEAR(size->first, 612.0, 1.0); // US Letter, 8.5 in x 72 pt
    const QString text = Ui::Test::PdfText::text(file);
    for (const auto& s : document.project().unit.supply)
        EXPECT_TRUE(text.contains(QString::fromStdString(s.id))) << s.id;
}

TEST_F(ScheduleExportTest, PdfCarriesAComparisonWhenGiven)
{
    if (!Ui::Test::PdfText::toolsAvailable())
        GTEST_SKIP() << "poppler-utils not found";
    std::ostringstream warnings;
    const auto comparison = Cli::CompareHrCommand::compareWithDefaults(
        document.project(), std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-bins.csv", warnings);
    const QString file = dir.filePath(QStringLiteral("with-comparison.pdf"));
    EXPECT_TRUE(ScheduleExport::write(document, file, ScheduleExport::Format::PdfA4, Ui::UnitSystem::System::SI,
                                      &comparison)
                    .isEmpty());
    const QString text = Ui::Test::PdfText::text(file).simplified();
    EXPECT_TRUE(text.contains(QStringLiteral("Heat recovery options over a year")));
    EXPECT_TRUE(text.contains(QStringLiteral("rotary wheel, hygroscopic")));
}

TEST_F(ScheduleExportTest, AFolderThatDoesNotExistIsReported)
{
    const QString file = dir.filePath(QStringLiteral("no-such-folder/schedule.csv"));
    const QString error = ScheduleExport::write(document, file, ScheduleExport::Format::Csv, Ui::UnitSystem::System::SI);
    EXPECT_FALSE(error.isEmpty());
    EXPECT_TRUE(error.contains(QStringLiteral("Cannot write"))) << error.toStdString();
    EXPECT_FALSE(QFileInfo::exists(file));
}
