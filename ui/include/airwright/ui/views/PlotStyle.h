#pragma once
// Colours and axis styling shared by the plot views. Everything but the case and
// path colours derives from the widget palette, so the plots read in light and
// dark palettes alike; the case colours are mid tones chosen to stand out on both.

#include <QColor>
#include <QPalette>

class QCustomPlot;
class QCPAxis;

namespace Airwright::Ui {

class PlotStyle {
public:
    static QColor caseColour(int index);           // cycles through our set
    static QColor supplyColour();
    static QColor extractColour();
    static QColor mix(const QColor& a, const QColor& b, double towardsB);
    static QColor lineColour(const QPalette& palette);  // reference lines, faint
    static QColor labelColour(const QPalette& palette); // reference line labels

    // Background, axes, tick labels, legend and grid from the palette.
    static void apply(QCustomPlot& plot, const QPalette& palette);
    static void styleAxis(QCPAxis& axis, const QPalette& palette);
};

} // namespace Airwright::Ui
