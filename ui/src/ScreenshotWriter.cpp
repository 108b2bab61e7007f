#include "airwright/ui/ScreenshotWriter.h"

#include "airwright/ui/MainWindow.h"
#include "airwright/ui/AppSettings.h"
#include "airwright/ui/ProjectEditor.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/HeatRecoveryComparisonView.h"
#include "airwright/ui/views/PsychroChartView.h"

#include <QApplication>
#include <QDir>
#include <QPixmap>
#include <QTabWidget>
#include <QWidget>

#include <utility>

namespace Airwright::Ui {

namespace {

using Diagram = PsychroChartModel::Diagram;

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

// One full set: the window, then every panel; the psychrometric view in both of
// its diagrams. `suffix` tells the sets apart ("", "-ip", "-dark").
bool writeSet(MainWindow& window, const QDir& dir, const QString& suffix, QStringList& written, QString* error)
{
    window.bringToFront(window.projectEditor());
    settle();
    const QString main = dir.filePath(QStringLiteral("main-window") + suffix + QStringLiteral(".png"));
    if (!grabTo(&window, main, error))
        return false;
    written << main;

    const int currentView = window.views()->currentIndex();
    for (const auto& panel : window.panels()) {
        window.bringToFront(panel.widget);
        settle();
        // The comparison runs on a worker thread once its view is shown: wait for it.
        if (auto* comparison = qobject_cast<HeatRecoveryComparisonView*>(panel.widget)) {
            if (!comparison->waitUntilIdle(60000)) {
                if (error)
                    *error = QStringLiteral("the heat recovery comparison did not finish within a minute");
                return false;
            }
            settle();
        }
        const QString path = dir.filePath(panel.fileName + suffix + QStringLiteral(".png"));
        if (!grabTo(panel.widget, path, error))
            return false;
        written << path;
        if (auto* comparison = qobject_cast<HeatRecoveryComparisonView*>(panel.widget)) {
            // Its input tabs too.
            using View = HeatRecoveryComparisonView;
            for (const auto& [tab, name] : {std::pair{View::OptionsTab, QStringLiteral("-options")},
                                            std::pair{View::PricesTab, QStringLiteral("-prices")}}) {
                comparison->showTab(tab);
                settle();
                const QString page = dir.filePath(panel.fileName + name + suffix + QStringLiteral(".png"));
                if (!grabTo(panel.widget, page, error))
                    return false;
                written << page;
            }
            comparison->showTab(View::ResultsTab);
            continue;
        }
        auto* chart = qobject_cast<PsychroChartView*>(panel.widget);
        if (!chart)
            continue;
        const Diagram shown = chart->diagram();
        chart->setDiagram(shown == Diagram::Mollier ? Diagram::DryBulbHumidity : Diagram::Mollier);
        settle();
        const QString other = dir.filePath(panel.fileName
                                           + (shown == Diagram::Mollier ? QStringLiteral("-tw") : QStringLiteral("-hx"))
                                           + suffix + QStringLiteral(".png"));
        const bool ok = grabTo(panel.widget, other, error);
        chart->setDiagram(shown);
        if (!ok)
            return false;
        written << other;
    }
    window.views()->setCurrentIndex(currentView);
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

    const bool wasIp = window.units()->system() == UnitSystem::System::IP;
    const bool wasDark = window.settings()->darkPalette();
    if (!writeSet(window, dir, {}, written, error))
        return written;

    // Again in IP units, to check that every unit label fits.
    window.setUnitSystemIp(true);
    bool ok = writeSet(window, dir, QStringLiteral("-ip"), written, error);
    window.setUnitSystemIp(wasIp);

    // And in the dark palette, to check that every line and label stays readable.
    if (ok) {
        window.setDarkPalette(true);
        ok = writeSet(window, dir, QStringLiteral("-dark"), written, error);
        window.setDarkPalette(wasDark);
    }
    window.bringToFront(window.projectEditor());
    settle();
    return written;
}

} // namespace Airwright::Ui
