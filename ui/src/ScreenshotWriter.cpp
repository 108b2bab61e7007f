#include "airwright/ui/ScreenshotWriter.h"

#include "airwright/ui/MainWindow.h"
#include "airwright/ui/ProjectEditor.h"

#include <QApplication>
#include <QDir>
#include <QPixmap>
#include <QTabWidget>
#include <QWidget>

namespace Airwright::Ui {

namespace {

void settle()
{
    // Layouts, deferred updates and the plots' replots run from the event loop.
    for (int i = 0; i < 5; ++i)
        QApplication::processEvents();
}

bool grabTo(QWidget* widget, const QString& path, QString* error)
{
    const QPixmap pixmap = widget->grab();
    if (pixmap.isNull() || pixmap.width() < 8 || pixmap.height() < 8) {
        if (error)
            *error = QStringLiteral("nothing to render for %1").arg(path);
        return false;
    }
    if (!pixmap.save(path, "PNG")) {
        if (error)
            *error = QStringLiteral("cannot write %1").arg(path);
        return false;
    }
    return true;
}

} // namespace

QStringList ScreenshotWriter::write(MainWindow& window, const QString& directory, QString* error)
{
    QStringList written;
    if (!QDir().mkpath(directory)) {
        if (error)
            *error = QStringLiteral("cannot create the folder %1").arg(directory);
        return written;
    }
    const QDir dir(directory);
    window.show();
    settle();

    const QString main = dir.filePath(QStringLiteral("main-window.png"));
    if (!grabTo(&window, main, error))
        return written;
    written << main;

    const int currentView = window.views()->currentIndex();
    for (const auto& panel : window.panels()) {
        window.bringToFront(panel.widget);
        settle();
        const QString path = dir.filePath(panel.fileName + QStringLiteral(".png"));
        if (!grabTo(panel.widget, path, error))
            return written;
        written << path;
    }
    window.views()->setCurrentIndex(currentView);

    // The same window in IP units, to check that every unit label fits.
    window.setUnitSystemIp(true);
    window.bringToFront(window.projectEditor());
    settle();
    const QString ip = dir.filePath(QStringLiteral("main-window-ip.png"));
    const bool ok = grabTo(&window, ip, error);
    window.setUnitSystemIp(false);
    if (!ok)
        return written;
    written << ip;
    return written;
}

} // namespace Airwright::Ui
