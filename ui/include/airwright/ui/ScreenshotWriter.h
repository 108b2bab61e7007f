#pragma once
// Renders the main window and each of its panels and views to PNG files, for
// `airwright --screenshot DIR [PROJECT]` and for checking the layout by eye.

#include <QString>
#include <QStringList>

namespace Airwright::Ui {

class MainWindow;

class ScreenshotWriter {
public:
    // Writes main-window.png, one file per panel (unit-drawing.png, ...) and the
    // psychrometric view's other diagram (psychrometric-chart-hx.png); then the
    // same set in IP units (*-ip.png) and in the dark palette (*-dark.png). Returns
    // the files written; on failure error says what went wrong and the list may be
    // partial. The unit system and palette are put back as they were.
    static QStringList write(MainWindow& window, const QString& directory, QString* error);
};

} // namespace Airwright::Ui
