#include "airwright/ui/export/PressureProfilePainter.h"

#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/export/PdfAxes.h"
#include "airwright/ui/export/PdfStyle.h"
#include "airwright/ui/views/PlotStyle.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>
#include <QPen>

#include <algorithm>
#include <cmath>

namespace Airwright::Ui {

namespace {

constexpr double kFootM = 0.3048;

} // namespace

void PressureProfilePainter::paint(QPainter& p, const QRectF& rect, const PressureProfileModel& model,
                                   const UnitSystem& units, double mmUnit)
{
    const auto mm = [mmUnit](double v) { return v * mmUnit; };
    const bool ip = units.system() == UnitSystem::System::IP;
    const auto x = [ip](double metres) { return ip ? metres / kFootM : metres; };
    const auto y = [&units](double pa) { return units.toDisplay(UnitSystem::Kind::Pressure, pa); };

    // Bands: section numbers above (supply) and below the x axis title (extract).
    const QRectF area = rect.adjusted(mm(16.0), mm(5.0), -mm(4.0), -mm(14.0));
    const double lo = std::min(0.0, y(model.minimumPa()));
    const double hi = std::max(0.0, y(model.maximumPa()));
    const double yStep = PdfAxes::niceStep(hi - lo, 6);
    const double yLo = std::floor(lo / yStep) * yStep;
    const double yHi = std::ceil(hi / yStep) * yStep;
    const double xHi = x(model.length());
    const PdfAxes axes(area, 0.0, xHi > 0.0 ? xHi : 1.0, yLo, yHi > yLo ? yHi : yLo + yStep, mmUnit);
    const double xStep = PdfAxes::niceStep(xHi, 10);
    axes.drawGrid(p, xStep, yStep, xStep < 1.0 ? 1 : 0, yStep < 1.0 ? (yStep < 0.1 ? 2 : 1) : 0, false);
    axes.drawTitles(p, ip ? QStringLiteral("distance along the unit [ft]") : QStringLiteral("distance along the unit [m]"),
                    QStringLiteral("static pressure [%1]").arg(units.unit(UnitSystem::Kind::Pressure)), false);

    p.save();
    p.setRenderHint(QPainter::Antialiasing, true);
    // Ambient: the zero line.
    p.setPen(QPen(PdfStyle::mutedText(), mm(0.2), Qt::DashLine));
    p.drawLine(axes.map(0.0, 0.0), axes.map(xHi > 0.0 ? xHi : 1.0, 0.0));

    const QFont small = PdfStyle::font(PdfStyle::Small);
    p.setFont(small);
    const QFontMetricsF fm(small, p.device());
    const auto drawPath = [&](Core::Chain::PathKind kind, const QColor& colour) {
        const auto line = model.polyline(kind);
        QPainterPath path;
        for (qsizetype i = 0; i < line.size(); ++i) {
            const QPointF q = axes.map(x(line[i].x()), y(line[i].y()));
            if (i == 0)
                path.moveTo(q);
            else
                path.lineTo(q);
        }
        p.setPen(QPen(colour, mm(0.45), Qt::SolidLine, Qt::RoundCap, Qt::RoundJoin));
        p.setBrush(Qt::NoBrush);
        p.drawPath(path);
    };
    drawPath(Core::Chain::PathKind::Supply, PlotStyle::supplyColour());
    drawPath(Core::Chain::PathKind::Extract, PlotStyle::extractColour());

    // Section marks: boundaries as ticks, numbers centred on the span.
    const auto marks = [&](const QVector<PressureProfileModel::Span>& spans, const QString& prefix, bool above,
                           const QColor& colour) {
        const double edge = above ? area.top() : area.bottom() + mm(8.5);
        for (int i = 0; i < spans.size(); ++i) {
            const auto& s = spans[i];
            const QPointF a = axes.map(x(s.xStart), 0.0);
            const QPointF b = axes.map(x(s.xEnd), 0.0);
            p.setPen(QPen(colour, mm(0.15)));
            const double t0 = above ? edge - mm(4.0) : edge;
            p.drawLine(QPointF(a.x(), t0), QPointF(a.x(), t0 + mm(4.0)));
            p.drawLine(QPointF(b.x(), t0), QPointF(b.x(), t0 + mm(4.0)));
            const QString label = prefix + QString::number(i + 1);
            const double w = b.x() - a.x();
            if (fm.horizontalAdvance(label) <= w + mm(0.5)) {
                p.setPen(colour.darker(130));
                p.drawText(QRectF(a.x(), t0, w, mm(4.0)), Qt::AlignCenter, label);
            }
        }
    };
    marks(model.supply(), QStringLiteral("S"), true, PlotStyle::supplyColour());
    marks(model.extract(), QStringLiteral("E"), false, PlotStyle::extractColour());
    p.restore();

    // Legend, top right inside the plot.
    p.save();
    p.setFont(small);
    const QStringList entries{QStringLiteral("supply path"), QStringLiteral("extract path")};
    double width = 0.0;
    for (const auto& e : entries)
        width = std::max(width, fm.horizontalAdvance(e));
    width += mm(12.0);
    const double row = fm.height() * 1.25;
    const QRectF legend(area.right() - width - mm(2.0), area.top() + mm(2.0), width, row * 2 + mm(1.5));
    p.setPen(QPen(PdfStyle::rule(), mm(0.15)));
    p.setBrush(Qt::white);
    p.drawRect(legend);
    for (int i = 0; i < 2; ++i) {
        const double yy = legend.top() + mm(0.75) + row * i;
        const QColor colour = i == 0 ? PlotStyle::supplyColour() : PlotStyle::extractColour();
        p.setPen(QPen(colour, mm(0.45)));
        p.drawLine(QPointF(legend.left() + mm(1.5), yy + row / 2), QPointF(legend.left() + mm(9.0), yy + row / 2));
        p.setPen(PdfStyle::text());
        p.drawText(QRectF(legend.left() + mm(10.5), yy, width - mm(10.5), row), Qt::AlignLeft | Qt::AlignVCenter,
                   entries[i]);
    }
    p.restore();
}

} // namespace Airwright::Ui
