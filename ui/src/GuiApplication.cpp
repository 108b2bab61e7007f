#include "airwright/ui/GuiApplication.h"

#include "airwright/ui/MainWindow.h"

#include <QApplication>
#include <QCommandLineParser>
#include <QDir>
#include <QTextStream>

namespace Airwright::Ui {

int runGuiApplication(int argc, char** argv)
{
    QApplication app(argc, argv);
    QApplication::setApplicationName(QStringLiteral("Airwright"));
    QApplication::setOrganizationName(QStringLiteral("Airwright"));

    QCommandLineParser parser;
    parser.setApplicationDescription(QStringLiteral("Air handling unit design"));
    parser.addHelpOption();
    QCommandLineOption screenshot(QStringList{QStringLiteral("screenshot")},
                                  QStringLiteral("Render the window to PNG files in DIR and exit."),
                                  QStringLiteral("DIR"));
    parser.addOption(screenshot);
    parser.addPositionalArgument(QStringLiteral("project"), QStringLiteral("Project file to open."));
    parser.process(app);

    MainWindow window;
    if (parser.isSet(screenshot)) {
        const QString dir = parser.value(screenshot);
        QDir().mkpath(dir);
        window.show();
        QApplication::processEvents();
        const bool ok = window.grab().save(QDir(dir).filePath(QStringLiteral("main-window.png")));
        QTextStream(stderr) << (ok ? "wrote " : "could not write ") << QDir(dir).filePath("main-window.png") << "\n";
        return ok ? 0 : 1;
    }
    window.show();
    return QApplication::exec();
}

} // namespace Airwright::Ui
