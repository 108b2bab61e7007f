#pragma once
// A plot frame for the charts of the printed schedule, drawn with QPainter as
// vectors: maps data to the page, draws the grid, tick labels and axis titles.

#include <QPointF>
#include <QRectF>
#include <QString>

#include <vector>

class QPainter;

namespace Airwright::Ui {

class PdfAxes {
public:
    // area: the plot area on the page (inside the tick labels); mmUnit: device
    // units per millimetre.
    PdfAxes(const QRectF& area, double xMin, double xMax, double yMin, double yMax, double mmUnit);

    QPointF map(double x, double y) const;
    QPointF map(const QPointF& p) const { return map(p.x(), p.y()); }
    const QRectF& area() const { return m_area; }
    double mm(double v) const { return v * m_mm; }

    // A step of 1, 2, 2.5 or 5 times a power of ten giving about `ticks` intervals.
    static double niceStep(double span, int ticks);
    static std::vector<double> ticks(double low, double high, double step);

    // Grid lines and tick labels (y labels on the right when yOnRight), the frame,
    // and the axis titles. decimals: of the tick labels.
    void drawGrid(QPainter& painter, double xStep, double yStep, int xDecimals, int yDecimals, bool yOnRight) const;
    void drawTitles(QPainter& painter, const QString& xTitle, const QString& yTitle, bool yOnRight) const;

private:
    QRectF m_area;
    double m_xMin;
    double m_xMax;
    double m_yMin;
    double m_yMax;
    double m_mm;
};

} // namespace Airwright::Ui
