#include "airwright/ui/GuiApplication.h"

#include "airwright/ui/AppSettings.h"
#include "airwright/ui/Appearance.h"
#include "airwright/ui/MainWindow.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/ResourceLocator.h"
#include "airwright/ui/ScreenshotWriter.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QDir>
#include <QIcon>
#include <QTemporaryDir>
#include <QTextStream>
#include <QTimer>

#include <cstdlib>

// Resources compiled into the static library must be registered by name, outside
// any namespace.
static void initialiseResources()
{
    Q_INIT_RESOURCE(resources);
}

namespace Airwright::Ui {

namespace {

bool hasDisplay()
{
    return !qEnvironmentVariableIsEmpty("DISPLAY") || !qEnvironmentVariableIsEmpty("WAYLAND_DISPLAY");
}

int runScreenshots(const QString& directory, const QString& project)
{
    QTextStream err(stderr);
    // Nothing of the user's is read or written: settings and the recovery folder
    // are temporary, and no dialog may wait for an answer.
    QTemporaryDir scratch;
    if (!scratch.isValid()) {
        err << "airwright: cannot create a temporary folder\n";
        return 1;
    }
    MainWindow::Options options;
    options.interactive = false;
    options.autosave = false;
    options.settingsFile = scratch.filePath(QStringLiteral("settings.ini"));
    options.recoveryDirectory = scratch.filePath(QStringLiteral("recovery"));
    Appearance::apply(false);
    MainWindow window(options);
    window.resize(1600, 1000);

    const QString file = project.isEmpty() ? ResourceLocator::demoProject() : project;
    if (file.isEmpty()) {
        err << "airwright: the demo project was not found; give a project file\n";
        return 1;
    }
    if (!window.openFile(file)) {
        err << "airwright: " << window.lastError() << "\n";
        return 1;
    }
    // Show a section's inputs and results rather than an empty editor.
    const auto& supply = window.document()->project().unit.supply;
    for (const auto& section : supply)
        if (section.id.find("heating") != std::string::npos || &section == &supply.back()) {
            window.document()->selectSection(QString::fromStdString(section.id));
            break;
        }

    QString error;
    const QStringList written = ScreenshotWriter::write(window, directory, &error);
    if (!error.isEmpty()) {
        err << "airwright: " << error << "\n";
        return 1;
    }
    for (const QString& path : written)
        err << "wrote " << QDir::toNativeSeparators(path) << "\n";
    return 0;
}

int runQuitAfterShow(const QString& project)
{
    // The user's settings and recovery file stay untouched, and no dialog may wait
    // for an answer; otherwise the same start as a user's very first one.
    QTemporaryDir scratch;
    if (!scratch.isValid()) {
        QTextStream(stderr) << "airwright: cannot create a temporary folder\n";
        return 1;
    }
    MainWindow::Options options;
    options.interactive = false;
    options.autosave = false;
    options.settingsFile = scratch.filePath(QStringLiteral("settings.ini"));
    options.recoveryDirectory = scratch.filePath(QStringLiteral("recovery"));
    Appearance::apply(false);
    MainWindow window(options);
    const bool opened = window.startUp(project);
    window.show();
    // Once the event loop has delivered the show, paint the whole window (the
    // charts included) and leave.
    QTimer::singleShot(0, &window, [&window] {
        window.repaint();
        QApplication::quit();
    });
    const int code = QApplication::exec();
    // A project that could not be opened was reported on stderr already.
    return opened ? code : 1;
}

} // namespace

int runGuiApplication(int argc, char** argv)
{
    // Screenshots, the start timing, --help and --version need no display: fall
    // back to the offscreen platform.
    bool noDisplayNeeded = false;
    for (int i = 1; i < argc; ++i) {
        const QByteArray arg(argv[i]);
        if (arg == "--screenshot" || arg.startsWith("--screenshot=") || arg == "--quit-after-show"
            || arg == "--help" || arg == "-h" || arg == "--help-all" || arg == "--version" || arg == "-v")
            noDisplayNeeded = true;
    }
    if (noDisplayNeeded && !hasDisplay() && qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    if (!noDisplayNeeded && !hasDisplay() && qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM")) {
        QTextStream(stderr) << "airwright: no display found (DISPLAY and WAYLAND_DISPLAY are empty).\n"
                               "Run 'airwright --screenshot DIR [PROJECT]' to render the window to PNG files.\n";
        return 1;
    }

    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Airwright"));
    QApplication::setOrganizationName(QStringLiteral("Airwright"));
    QApplication::setApplicationVersion(QStringLiteral(AIRWRIGHT_VERSION));
    initialiseResources();
    QApplication::setWindowIcon(QIcon(QStringLiteral(":/airwright/icons/airwright.svg")));

    QCommandLineParser parser;
    parser.setApplicationDescription(QStringLiteral("Air handling unit design"));
    parser.addHelpOption();
    parser.addVersionOption();
    QCommandLineOption screenshotOption(QStringList{QStringLiteral("screenshot")},
                                        QStringLiteral("Render the window and each panel to PNG files in DIR "
                                                       "(offscreen) and exit."),
                                        QStringLiteral("DIR"));
    parser.addOption(screenshotOption);
    QCommandLineOption quitAfterShowOption(
        QStringList{QStringLiteral("quit-after-show")},
        QStringLiteral("Start as on a first start (temporary settings, no dialogs), open PROJECT or the demo, "
                       "show and paint the window once, then exit; for timing the start "
                       "(bench/time-cold-start)."));
    parser.addOption(quitAfterShowOption);
    parser.addPositionalArgument(QStringLiteral("project"), QStringLiteral("Project file to open (.awproj)."),
                                 QStringLiteral("[PROJECT]"));
    parser.process(app);
    const QStringList positional = parser.positionalArguments();
    if (positional.size() > 1) {
        QTextStream(stderr) << "airwright: give at most one project file\n";
        return 1;
    }
    const QString project = positional.isEmpty() ? QString() : positional.front();

    if (parser.isSet(screenshotOption))
        return runScreenshots(parser.value(screenshotOption), project);
    if (parser.isSet(quitAfterShowOption))
        return runQuitAfterShow(project);

    MainWindow window;
    window.setDarkPalette(window.settings()->darkPalette());
    window.startUp(project);
    window.show();
    return QApplication::exec();
}

} // namespace Airwright::Ui
