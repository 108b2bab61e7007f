// Crash recovery: the window writes the recovery file while the project is
// modified, a clean save removes it, and a window started while one exists offers
// it and restores it (or drops it when declined).

#include "UiTestSupport.h"

#include "airwright/ui/EditInfoCommand.h"
#include "airwright/ui/MainWindow.h"
#include "airwright/ui/RecoveryFile.h"

#include <QFile>
#include <QTemporaryDir>

#include <csignal>
#include <memory>

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;

class RecoveryTest : public ::testing::Test {
protected:
    void SetUp() override { ASSERT_TRUE(dir.isValid()); }

    MainWindow::Options options(std::function<bool(const QString&)> confirm = {})
    {
        MainWindow::Options o;
        o.interactive = false;
        o.autosave = false;
        o.settingsFile = dir.filePath(QStringLiteral("settings.ini"));
        o.recoveryDirectory = dir.filePath(QStringLiteral("recovery"));
        o.confirmRestore = std::move(confirm);
        return o;
    }

    // Opens the demo and changes its name, leaving the project modified.
    static void edit(MainWindow& window, const std::string& name)
    {
        ASSERT_TRUE(window.openFile(ShellTest::demoPath())) << window.lastError().toStdString();
        auto info = window.document()->project().info;
        info.name = name;
        window.document()->undoStack()->push(new EditInfoCommand(window.document(), info));
        ASSERT_TRUE(window.document()->isModified());
    }

    QTemporaryDir dir;
};

TEST_F(RecoveryTest, WrittenOnlyWhileModified)
{
    MainWindow window(options());
    ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
    EXPECT_FALSE(window.autosaveNow());
    EXPECT_FALSE(QFile::exists(window.recoveryFilePath()));

    edit(window, "edited before a crash");
    EXPECT_TRUE(window.autosaveNow());
    ASSERT_TRUE(QFile::exists(window.recoveryFilePath()));
    const auto contents = RecoveryFile(dir.filePath(QStringLiteral("recovery"))).read();
    EXPECT_EQ(contents.project, window.document()->project());
    EXPECT_EQ(contents.originalPath, ShellTest::demoPath());

    // Undoing back to the saved state leaves nothing to recover.
    window.document()->undoStack()->undo();
    EXPECT_FALSE(QFile::exists(window.recoveryFilePath()));
}

TEST_F(RecoveryTest, CleanSaveRemovesIt)
{
    MainWindow window(options());
    edit(window, "saved");
    ASSERT_TRUE(window.autosaveNow());
    ASSERT_TRUE(window.saveTo(dir.filePath(QStringLiteral("saved.awproj")))) << window.lastError().toStdString();
    EXPECT_FALSE(window.document()->isModified());
    EXPECT_FALSE(QFile::exists(window.recoveryFilePath()));
}

TEST_F(RecoveryTest, OfferedAndRestoredAfterACrash)
{
    Project::Project edited;
    {
        // The window goes away without closing (as in a crash): its recovery file stays.
        auto crashed = std::make_unique<MainWindow>(options());
        edit(*crashed, "unsaved work");
        ASSERT_TRUE(crashed->autosaveNow());
        edited = crashed->document()->project();
    }
    ASSERT_TRUE(QFile::exists(dir.filePath(QStringLiteral("recovery/recovery.awproj"))));

    QString offered;
    MainWindow restarted(options([&offered](const QString& description) {
        offered = description;
        return true;
    }));
    EXPECT_TRUE(restarted.startUp());
    EXPECT_TRUE(offered.contains(QStringLiteral("unsaved work"))) << offered.toStdString();
    EXPECT_EQ(restarted.document()->project(), edited);
    EXPECT_TRUE(restarted.document()->isModified());
    EXPECT_EQ(restarted.document()->filePath(), ShellTest::demoPath());
}

// A real crash: a forked process edits, autosaves and is killed with SIGKILL (no
// destructor, no close); the next start offers what it had.
TEST_F(RecoveryTest, OfferedAfterTheProcessIsKilled)
{
    GTEST_FLAG_SET(death_test_style, "fast");
    EXPECT_EXIT(
        {
            MainWindow doomed(options());
            edit(doomed, "work of a killed process");
            if (doomed.autosaveNow())
                std::raise(SIGKILL);
            std::_Exit(1); // the autosave failed: not the death we look for
        },
        ::testing::KilledBySignal(SIGKILL), "");
    ASSERT_TRUE(QFile::exists(dir.filePath(QStringLiteral("recovery/recovery.awproj"))));

    QString offered;
    MainWindow restarted(options([&offered](const QString& description) {
        offered = description;
        return true;
    }));
    EXPECT_TRUE(restarted.startUp());
    EXPECT_TRUE(offered.contains(QStringLiteral("work of a killed process"))) << offered.toStdString();
    EXPECT_EQ(restarted.document()->project().info.name, "work of a killed process");
    EXPECT_TRUE(restarted.document()->isModified());
}

TEST_F(RecoveryTest, DeclinedRecoveryIsDropped)
{
    {
        auto crashed = std::make_unique<MainWindow>(options());
        edit(*crashed, "not wanted");
        ASSERT_TRUE(crashed->autosaveNow());
    }
    int asked = 0;
    MainWindow restarted(options([&asked](const QString&) {
        ++asked;
        return false;
    }));
    restarted.startUp();
    EXPECT_EQ(asked, 1);
    EXPECT_FALSE(QFile::exists(restarted.recoveryFilePath()));
    EXPECT_NE(restarted.document()->project().info.name, "not wanted");
    EXPECT_FALSE(restarted.document()->isModified());
}

TEST_F(RecoveryTest, NormalCloseRemovesIt)
{
    MainWindow window(options());
    edit(window, "closing");
    ASSERT_TRUE(window.autosaveNow());
    EXPECT_TRUE(window.close()); // not interactive: closes without asking
    EXPECT_FALSE(QFile::exists(window.recoveryFilePath()));
}

} // namespace
} // namespace Airwright::Ui
