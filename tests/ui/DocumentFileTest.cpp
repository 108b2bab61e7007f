// Saving and opening through the document: a saved project reads back equal, the
// document is clean after saving, and a broken file is refused with every problem
// while the open project stays as it was.

#include "UiTestSupport.h"

#include "airwright/core/project/ProjectFileError.h"
#include "airwright/ui/EditInfoCommand.h"
#include "airwright/ui/EditSectionCommand.h"

#include <QFile>
#include <QTemporaryDir>

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;

TEST(DocumentFileTest, SaveLoadCompare)
{
    QTemporaryDir dir;
    ASSERT_TRUE(dir.isValid());
    ProjectDocument document;
    ShellTest::openDemo(document);

    auto info = document.project().info;
    info.revision = "B";
    info.notes = "Saved by the UI test; umlauts too: Düsseldorf, 2 °C.";
    document.undoStack()->push(new EditInfoCommand(&document, info));
    Chain::Section coil = document.project().unit.supply[3];
    std::get<Sections::WaterHeatingCoil>(coil.spec).flowTemperature = celsius(55.5);
    document.undoStack()->push(new EditSectionCommand(&document, coil.id, coil));
    ASSERT_TRUE(document.isModified());

    const QString path = dir.filePath(QStringLiteral("saved.awproj"));
    int pathChanges = 0;
    QObject::connect(&document, &ProjectDocument::filePathChanged, [&pathChanges] { ++pathChanges; });
    document.save(path);
    EXPECT_FALSE(document.isModified());
    EXPECT_EQ(document.filePath(), path);
    EXPECT_EQ(pathChanges, 1);
    EXPECT_TRUE(QFile::exists(path));

    ProjectDocument reopened;
    reopened.load(path);
    EXPECT_EQ(reopened.project(), document.project());
    EXPECT_FALSE(reopened.isModified());
    EXPECT_TRUE(reopened.loadReport().warnings.empty());

    // Undo after saving makes the document differ from its file again.
    document.undoStack()->undo();
    EXPECT_TRUE(document.isModified());
}

TEST(DocumentFileTest, BrokenFileIsRefusedWithEveryProblem)
{
    QTemporaryDir dir;
    ASSERT_TRUE(dir.isValid());
    ProjectDocument document;
    ShellTest::openDemo(document);
    const Project::Project before = document.project();

    QFile demo(ShellTest::demoPath());
    ASSERT_TRUE(demo.open(QIODevice::ReadOnly));
    QByteArray text = demo.readAll();
    // Two independent problems: a negative airflow and an unknown filter group.
    text.replace("\"supply_m3h\": 9000", "\"supply_m3h\": -5");
    text.replace("\"group\": \"epm10\"", "\"group\": \"epm99\"");
    const QString path = dir.filePath(QStringLiteral("broken.awproj"));
    QFile broken(path);
    ASSERT_TRUE(broken.open(QIODevice::WriteOnly));
    broken.write(text);
    broken.close();

    try {
        document.load(path);
        FAIL() << "a broken file was accepted";
    } catch (const Project::ProjectFileError& e) {
        EXPECT_GE(e.errors().size(), 2u);
        const std::string all = e.what();
        EXPECT_NE(all.find("supply_m3h"), std::string::npos) << all;
        EXPECT_NE(all.find("group"), std::string::npos) << all;
    }
    EXPECT_EQ(document.project(), before);
    EXPECT_EQ(document.filePath(), ShellTest::demoPath());
}

TEST(DocumentFileTest, InvalidProjectIsNotSaved)
{
    QTemporaryDir dir;
    ASSERT_TRUE(dir.isValid());
    ProjectDocument document;
    ShellTest::openDemo(document);
    auto info = document.project().info;
    info.date = "14 March";
    document.undoStack()->push(new EditInfoCommand(&document, info));
    const QString path = dir.filePath(QStringLiteral("never.awproj"));
    EXPECT_THROW(document.save(path), Core::Error);
    EXPECT_FALSE(QFile::exists(path));
    EXPECT_TRUE(document.isModified());
}

} // namespace
} // namespace Airwright::Ui
