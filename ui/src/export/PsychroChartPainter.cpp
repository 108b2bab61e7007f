#include "airwright/ui/export/PsychroChartPainter.h"

#include "airwright/ui/export/PdfAxes.h"
#include "airwright/ui/export/PdfStyle.h"
#include "airwright/ui/views/PlotStyle.h"

#include <QFontMetricsF>
#include <QPainter>
#include <QPainterPath>
#include <QPen>

#include <algorithm>

namespace Airwright::Ui {

namespace {

QPainterPath pathThrough(const PdfAxes& axes, const QVector<QPointF>& points)
{
    QPainterPath path;
    for (qsizetype i = 0; i < points.size(); ++i) {
        const QPointF p = axes.map(points[i]);
        if (i == 0)
            path.moveTo(p);
        else
            path.lineTo(p);
    }
    return path;
}

QVector<QPointF> positions(const QVector<PsychroChartModel::StatePoint>& states)
{
    QVector<QPointF> out;
    for (const auto& s : states)
        out.push_back(s.position);
    return out;
}

} // namespace

void PsychroChartPainter::paint(QPainter& p, const QRectF& rect, const PsychroChartModel& model, double mmUnit)
{
    const auto mm = [mmUnit](double v) { return v * mmUnit; };
    const auto& f = model.frame();
    // Tick labels and titles: left margin small, humidity axis on the right.
    const QRectF area = rect.adjusted(mm(4.0), mm(2.0), -mm(15.0), -mm(9.0));
    const PdfAxes axes(area, f.xMin, f.xMax, f.yMin, f.yMax, mmUnit);
    const double xStep = PdfAxes::niceStep(f.xMax - f.xMin, 12);
    const double yStep = PdfAxes::niceStep(f.yMax - f.yMin, 10);
    axes.drawGrid(p, xStep, yStep, xStep < 1.0 ? 1 : 0, yStep < 1.0 ? 1 : 0, true);
    axes.drawTitles(p, model.xLabel(), model.yLabel(), true);

    p.save();
    p.setClipRect(area);
    p.setRenderHint(QPainter::Antialiasing, true);
    const QFont small = PdfStyle::font(PdfStyle::Small);
    p.setFont(small);
    const QFontMetricsF fm(small, p.device());
    for (const auto& line : model.lines()) {
        QPen pen;
        switch (line.role) {
        case PsychroChartModel::LineRole::Saturation:
            pen = QPen(PdfStyle::text(), mm(0.35));
            break;
        case PsychroChartModel::LineRole::RelativeHumidity:
            pen = QPen(PdfStyle::rule(), mm(0.15));
            break;
        case PsychroChartModel::LineRole::Enthalpy:
            pen = QPen(PdfStyle::rule().lighter(115), mm(0.12), Qt::DashLine);
            break;
        case PsychroChartModel::LineRole::WetBulb:
        case PsychroChartModel::LineRole::Isotherm:
            continue; // kept off the printed chart: enthalpy lines carry the same reading
        }
        p.setPen(pen);
        p.setBrush(Qt::NoBrush);
        p.drawPath(pathThrough(axes, line.points));
        if (line.role == PsychroChartModel::LineRole::Saturation)
            continue;
        // Labels: relative humidity at the line's upper end, enthalpy just above the saturation curve.
        const QPointF at = axes.map(line.labelAt);
        const double w = fm.horizontalAdvance(line.label);
        const QRectF box = line.role == PsychroChartModel::LineRole::Enthalpy
                               ? QRectF(at.x() - w - mm(1.2), at.y() - fm.height() - mm(0.6), w, fm.height())
                               : QRectF(at.x() - w / 2.0, at.y() - fm.height() / 2.0, w, fm.height());
        p.fillRect(box.adjusted(-mm(0.3), 0, mm(0.3), 0), Qt::white);
        p.setPen(PdfStyle::mutedText());
        p.drawText(box, Qt::AlignCenter, line.label);
    }

    // Process lines: supply solid, extract dashed, one colour per case.
    const auto& processes = model.processes();
    for (int i = 0; i < processes.size(); ++i) {
        const QColor colour = PlotStyle::caseColour(i);
        const auto& process = processes[i];
        for (const auto* states : {&process.supply, &process.extract}) {
            if (states->isEmpty())
                continue;
            const bool supply = states == &process.supply;
            p.setPen(QPen(colour, mm(supply ? 0.45 : 0.35), supply ? Qt::SolidLine : Qt::DashLine, Qt::RoundCap,
                          Qt::RoundJoin));
            p.setBrush(Qt::NoBrush);
            p.drawPath(pathThrough(axes, positions(*states)));
            p.setPen(Qt::NoPen);
            p.setBrush(colour);
            for (const auto& s : *states)
                p.drawEllipse(axes.map(s.position), mm(supply ? 0.6 : 0.45), mm(supply ? 0.6 : 0.45));
        }
    }
    p.restore();

    // Legend in the empty corner above the saturation curve (low temperature, high humidity).
    p.save();
    p.setFont(small);
    const double row = fm.height() * 1.25;
    const int n = int(processes.size());
    const QString styleNote = QStringLiteral("solid: supply path, dashed: extract path");
    double width = fm.horizontalAdvance(styleNote) + mm(3.5);
    for (const auto& process : processes)
        width = std::max(width, fm.horizontalAdvance(process.caseName) + mm(14.0));
    const QRectF legend(area.left() + mm(2.0), area.top() + mm(2.0), width, row * (n + 1) + mm(2.0));
    p.setPen(QPen(PdfStyle::rule(), mm(0.15)));
    p.setBrush(Qt::white);
    p.drawRect(legend);
    double y = legend.top() + mm(1.0);
    for (int i = 0; i < n; ++i) {
        const QColor colour = PlotStyle::caseColour(i);
        p.setPen(QPen(colour, mm(0.45)));
        p.drawLine(QPointF(legend.left() + mm(1.5), y + row / 2.0), QPointF(legend.left() + mm(10.0), y + row / 2.0));
        p.setPen(PdfStyle::text());
        p.drawText(QRectF(legend.left() + mm(12.0), y, width - mm(12.0), row), Qt::AlignLeft | Qt::AlignVCenter,
                   processes[i].caseName);
        y += row;
    }
    p.setPen(PdfStyle::mutedText());
    p.drawText(QRectF(legend.left() + mm(1.5), y, width - mm(2.0), row), Qt::AlignLeft | Qt::AlignVCenter,
               styleNote);
    p.restore();
}

} // namespace Airwright::Ui
