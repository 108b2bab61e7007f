// The window as a whole: first start opens the demo as an unsaved copy, the title
// shows the file and the modified mark, the Edit commands act on the drawing's
// selection, units and recent files are remembered, and every panel renders.

#include "UiTestSupport.h"

#include "airwright/ui/AppSettings.h"
#include "airwright/ui/CautionsDialog.h"
#include "airwright/ui/EditInfoCommand.h"
#include "airwright/ui/MainWindow.h"
#include "airwright/ui/ProjectEditor.h"
#include "airwright/ui/SectionEditor.h"
#include "airwright/ui/SectionPalette.h"
#include "airwright/ui/ScreenshotWriter.h"
#include "airwright/ui/SectionCatalog.h"
#include "airwright/ui/SectionPaths.h"
#include "airwright/ui/UnitDrawing.h"
#include "airwright/ui/UnitSystem.h"

#include <QAction>
#include <QApplication>
#include <QElapsedTimer>
#include <QFileInfo>
#include <QMenu>
#include <QMenuBar>
#include <QTimer>
#include <QImage>
#include <QListWidget>
#include <QScrollArea>
#include <QScrollBar>
#include <QTemporaryDir>

#include <functional>
#include <set>

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;
using Chain::PathKind;

class MainWindowTest : public ::testing::Test {
protected:
    void SetUp() override { ASSERT_TRUE(dir.isValid()); }

    MainWindow::Options options()
    {
        MainWindow::Options o;
        o.interactive = false;
        o.autosave = false;
        o.settingsFile = dir.filePath(QStringLiteral("settings.ini"));
        o.recoveryDirectory = dir.filePath(QStringLiteral("recovery"));
        return o;
    }

    QTemporaryDir dir;
};

TEST_F(MainWindowTest, FirstStartOpensDemoCopyThenNewProject)
{
    {
        MainWindow window(options());
        EXPECT_TRUE(window.startUp());
        EXPECT_EQ(window.document()->project().info.reference, "DEMO-0001");
        // A copy: saving must ask for a new name instead of overwriting the demo.
        EXPECT_TRUE(window.document()->filePath().isEmpty());
        EXPECT_TRUE(window.windowTitle().startsWith(QStringLiteral("Demo project")));
    }
    MainWindow second(options());
    EXPECT_TRUE(second.startUp());
    EXPECT_EQ(second.document()->project().info.name, "New unit");
}

TEST_F(MainWindowTest, TitleShowsFileAndModifiedMark)
{
    MainWindow window(options());
    ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
    EXPECT_TRUE(window.windowTitle().contains(QStringLiteral("demo-library.awproj")));
    EXPECT_FALSE(window.isWindowModified());
    auto info = window.document()->project().info;
    info.designer = "someone else";
    window.document()->undoStack()->push(new EditInfoCommand(window.document(), info));
    EXPECT_TRUE(window.isWindowModified());
    window.document()->undoStack()->undo();
    EXPECT_FALSE(window.isWindowModified());
}

TEST_F(MainWindowTest, OpeningABrokenFileKeepsTheProjectAndSaysWhy)
{
    MainWindow window(options());
    ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
    const auto before = window.document()->project();
    EXPECT_FALSE(window.openFile(dir.filePath(QStringLiteral("missing.awproj"))));
    EXPECT_TRUE(window.lastError().contains(QStringLiteral("missing.awproj"))) << window.lastError().toStdString();
    EXPECT_EQ(window.document()->project(), before);
}

TEST_F(MainWindowTest, EditCommandsActOnTheSelection)
{
    MainWindow window(options());
    ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
    UnitDrawing* drawing = window.drawing();
    drawing->selectPlace({PathKind::Supply, 1}); // oda-filter
    const auto before = ShellTest::ids(window.document()->project().unit.supply);

    window.moveSelected(+1);
    auto supply = ShellTest::ids(window.document()->project().unit.supply);
    EXPECT_EQ(supply[2], "oda-filter");
    EXPECT_EQ(window.document()->selectedSection(), QStringLiteral("oda-filter"));

    window.duplicateSelected();
    supply = ShellTest::ids(window.document()->project().unit.supply);
    EXPECT_EQ(supply[3], "oda-filter-2");

    window.deleteSelected();
    window.document()->selectSection(QStringLiteral("oda-filter"));
    window.moveSelected(-1);
    EXPECT_EQ(ShellTest::ids(window.document()->project().unit.supply), before);

    // Adding from the palette goes after the selected section of that path.
    drawing->selectPlace({PathKind::Extract, 0});
    window.addSection(static_cast<int>(SectionCatalog::Entry::Silencer), static_cast<int>(PathKind::Extract));
    EXPECT_EQ(window.document()->project().unit.extract[1].id, "silencer-2");
    EXPECT_EQ(window.document()->selectedSection(), QStringLiteral("silencer-2"));
    EXPECT_EQ(window.document()->undoStack()->count(), 5);
}

TEST_F(MainWindowTest, RemembersUnitsAndRecentFiles)
{
    {
        MainWindow window(options());
        ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
        window.setUnitSystemIp(true);
        EXPECT_EQ(window.units()->system(), UnitSystem::System::IP);
        window.close();
    }
    MainWindow again(options());
    EXPECT_EQ(again.units()->system(), UnitSystem::System::IP);
    const QStringList recent = again.settings()->recentFiles();
    ASSERT_FALSE(recent.isEmpty());
    EXPECT_EQ(recent.front(), QFileInfo(ShellTest::demoPath()).absoluteFilePath());
}

// The cautions (electric heaters, frost, humidifier hygiene, design aid) open by
// themselves on the first interactive start only, and Help > Cautions opens them
// at any time.
TEST_F(MainWindowTest, CautionsShownOnceAndReachableFromHelp)
{
    // Counts the cautions dialogs that open while events run, closing each.
    auto cautionsOpened = [](const std::function<void()>& act) {
        int opened = 0;
        QTimer closer;
        closer.setInterval(5);
        QObject::connect(&closer, &QTimer::timeout, [&opened] {
            if (auto* dialog = qobject_cast<CautionsDialog*>(QApplication::activeModalWidget())) {
                ++opened;
                dialog->accept();
            }
        });
        closer.start();
        act();
        QElapsedTimer waited;
        waited.start();
        while (waited.elapsed() < 300)
            QApplication::processEvents(QEventLoop::AllEvents, 20);
        return opened;
    };

    auto o = options();
    o.interactive = true;
    {
        MainWindow first(o);
        EXPECT_EQ(cautionsOpened([&first] { EXPECT_TRUE(first.startUp()); }), 1);
        EXPECT_TRUE(first.settings()->cautionsShown());
    }
    MainWindow second(o);
    EXPECT_EQ(cautionsOpened([&second] { EXPECT_TRUE(second.startUp()); }), 0);

    QAction* help = nullptr;
    for (QAction* menu : second.menuBar()->actions())
        if (menu->menu())
            for (QAction* a : menu->menu()->actions())
                if (a->text().remove(QLatin1Char('&')).startsWith(QStringLiteral("Cautions")))
                    help = a;
    ASSERT_NE(help, nullptr);
    EXPECT_EQ(cautionsOpened([help] { help->trigger(); }), 1);

    const QString text = CautionsDialog::text();
    for (const char* topic : {"Electric heaters", "Frost", "Humidifier hygiene", "design aid", "Local codes"})
        EXPECT_TRUE(text.contains(QString::fromLatin1(topic), Qt::CaseInsensitive)) << topic;
}

// What the screenshots showed once: a palette name cut short, an editor wider
// than its dock. At the window's default size, in SI and IP, every section type
// reads in full and the editors need no sideways scrolling.
TEST_F(MainWindowTest, PanelsFitTheirTextAtTheDefaultSize)
{
    MainWindow window(options());
    window.resize(1600, 1000);
    ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
    window.document()->selectSection(QStringLiteral("heating-coil"));
    window.show();
    for (bool ip : {false, true}) {
        window.setUnitSystemIp(ip);
        for (QWidget* panel : {static_cast<QWidget*>(window.projectEditor()), static_cast<QWidget*>(window.sectionEditor())}) {
            window.bringToFront(panel);
            for (int i = 0; i < 5; ++i)
                QApplication::processEvents();
            for (const QScrollArea* area : panel->findChildren<QScrollArea*>())
                EXPECT_FALSE(area->horizontalScrollBar()->isVisible())
                    << panel->objectName().toStdString() << (ip ? " IP" : " SI");
        }
    }
    // Each name with its symbol and the style's margins, as the item delegate
    // measures it, within the list's visible width.
    QListWidget* list = window.palette()->list();
    for (int row = 0; row < list->count(); ++row)
        EXPECT_LE(list->sizeHintForIndex(list->model()->index(row, 0)).width(), list->viewport()->width())
            << list->item(row)->text().toStdString();
}

TEST_F(MainWindowTest, ScreenshotsOfEveryPanel)
{
    MainWindow window(options());
    window.resize(1400, 900);
    ASSERT_TRUE(window.openFile(ShellTest::demoPath()));
    window.document()->selectSection(QStringLiteral("hr"));
    QString error;
    const QStringList files = ScreenshotWriter::write(window, dir.filePath(QStringLiteral("shots")), &error);
    EXPECT_TRUE(error.isEmpty()) << error.toStdString();
    // The window, every panel, the second psychrometric diagram and the two input
    // tabs of the heat recovery comparison, in SI, IP and dark.
    EXPECT_EQ(static_cast<std::size_t>(files.size()), 3 * (window.panels().size() + 4));
    EXPECT_TRUE(files.contains(dir.filePath(QStringLiteral("shots/heat-recovery-comparison-options-ip.png"))));
    EXPECT_TRUE(files.contains(dir.filePath(QStringLiteral("shots/heat-recovery-comparison-prices.png"))));
    EXPECT_TRUE(files.contains(dir.filePath(QStringLiteral("shots/psychrometric-chart-hx.png"))));
    EXPECT_TRUE(files.contains(dir.filePath(QStringLiteral("shots/main-window-dark.png"))));
    EXPECT_TRUE(files.contains(dir.filePath(QStringLiteral("shots/measuring-points.png"))));
    EXPECT_TRUE(files.contains(dir.filePath(QStringLiteral("shots/measuring-points-ip.png"))));
    // Left as it was found: SI, light.
    EXPECT_EQ(window.units()->system(), UnitSystem::System::SI);
    EXPECT_FALSE(window.settings()->darkPalette());
    for (const QString& file : files) {
        const QImage image(file);
        ASSERT_FALSE(image.isNull()) << file.toStdString();
        // Something is drawn: more than a background and a frame.
        std::set<QRgb> colours;
        for (int y = 0; y < image.height(); y += 3)
            for (int x = 0; x < image.width(); x += 3)
                colours.insert(image.pixel(x, y));
        EXPECT_GT(colours.size(), 8u) << file.toStdString();
    }
}

} // namespace
} // namespace Airwright::Ui
