#include "airwright/ui/export/PdfAxes.h"

#include "airwright/ui/export/PdfStyle.h"
#include "airwright/ui/export/ScheduleUnits.h"

#include <QPainter>
#include <QPen>

#include <algorithm>
#include <cmath>

namespace Airwright::Ui {

PdfAxes::PdfAxes(const QRectF& area, double xMin, double xMax, double yMin, double yMax, double mmUnit)
    : m_area(area), m_xMin(xMin), m_xMax(xMax > xMin ? xMax : xMin + 1.0), m_yMin(yMin),
      m_yMax(yMax > yMin ? yMax : yMin + 1.0), m_mm(mmUnit)
{
}

QPointF PdfAxes::map(double x, double y) const
{
    return {m_area.left() + (x - m_xMin) / (m_xMax - m_xMin) * m_area.width(),
            m_area.bottom() - (y - m_yMin) / (m_yMax - m_yMin) * m_area.height()};
}

double PdfAxes::niceStep(double span, int ticks)
{
    if (!(span > 0.0) || ticks < 1)
        return 1.0;
    const double raw = span / ticks;
    const double magnitude = std::pow(10.0, std::floor(std::log10(raw)));
    for (double m : {1.0, 2.0, 2.5, 5.0, 10.0})
        if (raw <= m * magnitude * 1.0000001)
            return m * magnitude;
    return 10.0 * magnitude;
}

std::vector<double> PdfAxes::ticks(double low, double high, double step)
{
    std::vector<double> out;
    if (!(step > 0.0))
        return out;
    const double first = std::ceil(low / step - 1e-9) * step;
    for (double v = first; v <= high + 1e-9 * std::max(1.0, std::abs(high)); v += step)
        out.push_back(std::abs(v) < 1e-12 ? 0.0 : v);
    return out;
}

void PdfAxes::drawGrid(QPainter& p, double xStep, double yStep, int xDecimals, int yDecimals, bool yOnRight) const
{
    p.save();
    const QFont font = PdfStyle::font(PdfStyle::Small);
    p.setFont(font);
    const QPen grid(PdfStyle::rule().lighter(140), mm(0.1), Qt::SolidLine);
    const QPen text(PdfStyle::mutedText());
    for (double x : ticks(m_xMin, m_xMax, xStep)) {
        const QPointF a = map(x, m_yMin);
        p.setPen(grid);
        p.drawLine(a, map(x, m_yMax));
        p.setPen(text);
        p.drawText(QRectF(a.x() - mm(8.0), a.y() + mm(0.8), mm(16.0), mm(3.5)), Qt::AlignHCenter | Qt::AlignTop,
                   ScheduleUnits::fixed(x, xDecimals));
    }
    for (double y : ticks(m_yMin, m_yMax, yStep)) {
        const QPointF a = map(m_xMin, y);
        const QPointF b = map(m_xMax, y);
        p.setPen(grid);
        p.drawLine(a, b);
        p.setPen(text);
        if (yOnRight)
            p.drawText(QRectF(b.x() + mm(1.0), b.y() - mm(2.0), mm(12.0), mm(4.0)), Qt::AlignLeft | Qt::AlignVCenter,
                       ScheduleUnits::fixed(y, yDecimals));
        else
            p.drawText(QRectF(a.x() - mm(13.0), a.y() - mm(2.0), mm(12.0), mm(4.0)), Qt::AlignRight | Qt::AlignVCenter,
                       ScheduleUnits::fixed(y, yDecimals));
    }
    p.setPen(QPen(PdfStyle::mutedText(), mm(0.2)));
    p.setBrush(Qt::NoBrush);
    p.drawRect(m_area);
    p.restore();
}

void PdfAxes::drawTitles(QPainter& p, const QString& xTitle, const QString& yTitle, bool yOnRight) const
{
    p.save();
    p.setFont(PdfStyle::font(PdfStyle::Small));
    p.setPen(PdfStyle::text());
    p.drawText(QRectF(m_area.left(), m_area.bottom() + mm(4.2), m_area.width(), mm(3.5)), Qt::AlignHCenter | Qt::AlignTop,
               xTitle);
    // The y title reads upwards along its axis, outside the tick labels.
    const double x = yOnRight ? m_area.right() + mm(11.0) : m_area.left() - mm(14.5);
    p.translate(x, m_area.center().y());
    p.rotate(-90.0);
    p.drawText(QRectF(-m_area.height() / 2.0, 0.0, m_area.height(), mm(3.5)), Qt::AlignHCenter | Qt::AlignTop, yTitle);
    p.restore();
}

} // namespace Airwright::Ui
