#include "airwright/ui/views/PsychroChartView.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/PlotStyle.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QButtonGroup>
#include <QEvent>
#include <QFontMetricsF>
#include <QHBoxLayout>
#include <QLabel>
#include <QToolButton>
#include <QToolTip>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <cmath>
#include <limits>

namespace Airwright::Ui {

namespace {

using Diagram = PsychroChartModel::Diagram;
using LineRole = PsychroChartModel::LineRole;

constexpr double kHitRadius = 9.0; // px

// psi: lbf/in2 = 0.45359237 kg x 9.80665 m/s2 / (0.0254 m)^2 (NIST SP 811 B.8: 6894.757 Pa).
constexpr double kPascalsPerPsi = 0.45359237 * 9.80665 / (0.0254 * 0.0254);

QCPCurve* addCurve(QCustomPlot* plot, const QVector<QPointF>& points, const QPen& pen)
{
    auto* curve = new QCPCurve(plot->xAxis, plot->yAxis);
    QVector<double> keys;
    QVector<double> values;
    keys.reserve(points.size());
    values.reserve(points.size());
    for (const QPointF& p : points) {
        keys.push_back(p.x());
        values.push_back(p.y());
    }
    curve->setData(keys, values);
    curve->setPen(pen);
    curve->setSelectable(QCP::stNone);
    curve->removeFromLegend();
    return curve;
}

QCPItemText* addLabel(QCustomPlot* plot, const QPointF& at, const QString& text, Qt::Alignment align,
                      const QColor& colour, const QFont& font)
{
    auto* item = new QCPItemText(plot);
    item->position->setType(QCPItemPosition::ptPlotCoords);
    item->position->setCoords(at);
    item->setPositionAlignment(align);
    item->setText(text);
    item->setColor(colour);
    item->setFont(font);
    item->setSelectable(false);
    item->setClipToAxisRect(true);
    return item;
}

} // namespace

PsychroChartView::PsychroChartView(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document), m_units(units)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);

    auto* bar = new QHBoxLayout;
    bar->setContentsMargins(4, 2, 4, 0);
    m_chartButton = new QToolButton(this);
    m_chartButton->setText(tr("t-W chart"));
    m_chartButton->setToolTip(tr("Dry bulb across, humidity ratio up"));
    m_mollierButton = new QToolButton(this);
    m_mollierButton->setText(tr("h-x diagram"));
    m_mollierButton->setToolTip(tr("Humidity ratio across, oblique enthalpy (Mollier form)"));
    auto* group = new QButtonGroup(this);
    for (QToolButton* b : {m_chartButton, m_mollierButton}) {
        b->setCheckable(true);
        b->setAutoRaise(true);
        group->addButton(b);
        bar->addWidget(b);
    }
    group->setExclusive(true);
    m_chartButton->setChecked(true);
    bar->addStretch(1);
    m_pressureLabel = new QLabel(this);
    bar->addWidget(m_pressureLabel);
    layout->addLayout(bar);

    m_plot = new QCustomPlot(this);
    m_plot->setMinimumSize(320, 240);
    m_plot->setMouseTracking(true);
    layout->addWidget(m_plot, 1);

    connect(m_chartButton, &QToolButton::toggled, this, [this](bool on) {
        if (on)
            setDiagram(Diagram::DryBulbHumidity);
    });
    connect(m_mollierButton, &QToolButton::toggled, this, [this](bool on) {
        if (on)
            setDiagram(Diagram::Mollier);
    });
    connect(m_document, &ProjectDocument::resultsChanged, this, &PsychroChartView::rebuild);
    connect(m_document, &ProjectDocument::selectionChanged, this, &PsychroChartView::redraw);
    connect(m_units, &UnitSystem::changed, this, &PsychroChartView::rebuild);
    connect(m_plot, &QCustomPlot::mouseMove, this, &PsychroChartView::onMouseMove);
    connect(m_plot, &QCustomPlot::mousePress, this, &PsychroChartView::onMousePress);
    connect(m_plot, &QCustomPlot::afterLayout, this, &PsychroChartView::placeReferenceLabels);
    rebuild();
}

void PsychroChartView::setDiagram(Diagram diagram)
{
    if (diagram == m_diagram)
        return;
    m_diagram = diagram;
    (diagram == Diagram::Mollier ? m_mollierButton : m_chartButton)->setChecked(true);
    rebuild();
}

void PsychroChartView::changeEvent(QEvent* event)
{
    QWidget::changeEvent(event);
    if (event->type() == QEvent::PaletteChange || event->type() == QEvent::FontChange)
        redraw();
}

void PsychroChartView::rebuild()
{
    m_model.rebuild(m_document->project(), m_document->result(), *m_units, m_diagram);
    const double p = m_model.pressurePa();
    m_pressureLabel->setText(m_units->system() == UnitSystem::System::IP
                                 ? tr("site pressure %1 psia").arg(QString::number(p / kPascalsPerPsi, 'f', 2))
                                 : tr("site pressure %1 kPa").arg(QString::number(p / 1000.0, 'f', 1)));
    redraw();
}

void PsychroChartView::redraw()
{
    m_plot->clearPlottables();
    m_plot->clearItems();
    m_referenceLabels.clear();
    const QPalette pal = palette();
    PlotStyle::apply(*m_plot, pal);
    const QColor base = pal.color(QPalette::Base);
    const QColor text = pal.color(QPalette::Text);
    const QColor lineColour = PlotStyle::lineColour(pal);
    const QColor labelColour = PlotStyle::labelColour(pal);
    QFont small = font();
    small.setPointSizeF(std::max(6.5, font().pointSizeF() * 0.8));

    const auto& f = m_model.frame();
    const bool tw = m_model.diagram() == Diagram::DryBulbHumidity;
    m_plot->xAxis->setRange(f.xMin, f.xMax);
    m_plot->yAxis->setRange(f.yMin, f.yMax);
    m_plot->xAxis->setLabel(m_model.xLabel());
    m_plot->yAxis->setLabel(m_model.yLabel());
    m_plot->xAxis2->setVisible(true);
    m_plot->yAxis2->setVisible(true);
    m_plot->xAxis2->setTickLabels(false);
    m_plot->yAxis2->setTickLabels(false);
    m_plot->xAxis2->setRange(f.xMin, f.xMax);
    m_plot->yAxis2->setRange(f.yMin, f.yMax);
    for (QCPAxis* axis : m_plot->axisRect()->axes()) {
        axis->grid()->setVisible(false); // the reference lines are the grid
        axis->setLabelFont(font());
        axis->setTickLabelFont(small);
    }

    // Reference lines; their labels are kept in priority order for hideCrowdedLabels.
    QVector<ReferenceLabel> enthalpyLabels;
    for (const auto& line : m_model.lines()) {
        QPen pen(lineColour, 1.0);
        Qt::Alignment align = Qt::AlignCenter;
        bool withBackground = false;
        QString label = line.label;
        switch (line.role) {
        case LineRole::Saturation:
            pen = QPen(text, 1.8);
            label = QStringLiteral("100 %");
            withBackground = true;
            break;
        case LineRole::RelativeHumidity:
            withBackground = true;
            break;
        case LineRole::Enthalpy:
            pen.setStyle(Qt::DashLine);
            // t-W: beside the saturation curve, in the empty space above it; h-x:
            // at the dry-air end on the left.
            align = tw ? (Qt::AlignRight | Qt::AlignBottom) : (Qt::AlignLeft | Qt::AlignBottom);
            break;
        case LineRole::WetBulb:
            pen.setStyle(Qt::DotLine);
            align = Qt::AlignLeft | Qt::AlignTop;
            label.clear(); // read against the dry-bulb scale where it meets saturation
            break;
        case LineRole::Isotherm:
            label.clear(); // the temperature axis names them
            break;
        }
        addCurve(m_plot, line.points, pen);
        if (!label.isEmpty()) {
            auto* item = addLabel(m_plot, line.labelAt, label, align, labelColour, small);
            if (withBackground) {
                item->setBrush(base);
                item->setPadding(QMargins(1, 0, 1, 0));
            } else {
                item->setPadding(QMargins(2, 0, 2, 1));
            }
            const ReferenceLabel placed{item, line.points, line.role == LineRole::RelativeHumidity, line.labelAt};
            if (line.role == LineRole::Saturation)
                m_referenceLabels.prepend(placed);
            else if (line.role == LineRole::Enthalpy)
                enthalpyLabels.push_back(placed);
            else
                m_referenceLabels.push_back(placed);
        }
    }
    m_referenceLabels += enthalpyLabels;

    // The selected section, underneath the processes.
    const QString selected = m_document->selectedSection();
    QColor halo = pal.color(QPalette::Highlight);
    halo.setAlphaF(0.45f);
    for (const auto& [a, b] : m_model.segmentsOf(selected)) {
        auto* c = addCurve(m_plot, {a, b}, QPen(halo, 9.0, Qt::SolidLine, Qt::RoundCap));
        c->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssDisc, halo, halo, 14));
    }

    // Processes: supply solid and in the legend, extract dashed and lighter.
    const auto& processes = m_model.processes();
    for (int i = 0; i < int(processes.size()); ++i) {
        const auto& process = processes[i];
        const QColor colour = PlotStyle::caseColour(i);
        const QColor light = PlotStyle::mix(colour, base, 0.3);
        QVector<QPointF> extract;
        for (const auto& p : process.extract)
            extract.push_back(p.position);
        auto* e = addCurve(m_plot, extract, QPen(light, 1.6, Qt::DashLine));
        e->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(light, 1.4), base, 6));
        QVector<QPointF> supply;
        for (const auto& p : process.supply)
            supply.push_back(p.position);
        auto* s = addCurve(m_plot, supply, QPen(colour, 2.2));
        s->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(colour, 1.8), base, 7));
        s->setName(process.caseName);
        s->addToLegend();
    }
    if (!processes.isEmpty()) {
        // A legend key for the line style of the extract path.
        auto* key = addCurve(m_plot, {}, QPen(labelColour, 1.6, Qt::DashLine));
        key->setName(tr("extract air (dashed)"));
        key->addToLegend();
    }
    // Keys for the thin reference lines that carry no label of their own: the
    // dashed enthalpy lines would otherwise read like an extract process.
    auto* enthalpyKey = addCurve(m_plot, {}, QPen(lineColour, 1.0, Qt::DashLine));
    enthalpyKey->setName(tr("constant enthalpy"));
    enthalpyKey->addToLegend();
    if (tw) {
        auto* wetBulbKey = addCurve(m_plot, {}, QPen(lineColour, 1.0, Qt::DotLine));
        wetBulbKey->setName(tr("constant wet bulb"));
        wetBulbKey->addToLegend();
    }
    m_plot->legend->setVisible(true);
    m_plot->legend->setFont(small);
    m_plot->axisRect()->insetLayout()->setInsetAlignment(
        0, tw ? (Qt::AlignTop | Qt::AlignLeft) : (Qt::AlignBottom | Qt::AlignRight));

    if (!m_document->result()) {
        const QString why = MessageUnits::toDisplay(m_document->computeError(), *m_units);
        auto* item = new QCPItemText(m_plot);
        item->position->setType(QCPItemPosition::ptAxisRectRatio);
        item->position->setCoords(0.5, 0.5);
        item->setText(why.isEmpty() ? tr("No results yet") : tr("No results: %1").arg(why));
        item->setColor(text);
        item->setBrush(base);
        item->setPen(QPen(lineColour));
        item->setPadding(QMargins(6, 4, 6, 4));
    }
    m_plot->replot();
}

void PsychroChartView::placeReferenceLabels()
{
    // A label may overhang the frame by a few pixels and still be read whole.
    const QRectF frame = QRectF(m_plot->axisRect()->rect()).adjusted(-3, -3, 3, 3);
    QVector<QRectF> taken;
    if (m_plot->legend->visible())
        taken.push_back(m_plot->legend->outerRect());
    auto toPixel = [this](const QPointF& p) {
        return QPointF(m_plot->xAxis->coordToPixel(p.x()), m_plot->yAxis->coordToPixel(p.y()));
    };
    for (const ReferenceLabel& label : m_referenceLabels) {
        QCPItemText* item = label.item;
        const QMargins pad = item->padding();
        const QSizeF size = QSizeF(QFontMetricsF(item->font()).size(0, item->text()))
                            + QSizeF(pad.left() + pad.right(), pad.top() + pad.bottom());
        const Qt::Alignment align = item->positionAlignment();
        auto boxAt = [&](const QPointF& anchor) {
            double x = anchor.x() - size.width() / 2;
            if (align & Qt::AlignLeft)
                x = anchor.x();
            else if (align & Qt::AlignRight)
                x = anchor.x() - size.width();
            double y = anchor.y() - size.height() / 2;
            if (align & Qt::AlignTop)
                y = anchor.y();
            else if (align & Qt::AlignBottom)
                y = anchor.y() - size.height();
            return QRectF(QPointF(x, y), size);
        };
        auto isFree = [&](const QRectF& box) {
            if (!frame.contains(box))
                return false;
            for (const QRectF& other : taken)
                if (other.intersects(box))
                    return false;
            return true;
        };

        // Candidate anchors in pixels: the preferred one, then (for a sliding
        // label) steps of a label height back down the line from it.
        QVector<QPointF> candidates{toPixel(label.preferred)};
        if (label.slides && label.line.size() >= 2) {
            QVector<QPointF> pixels;
            for (const QPointF& p : label.line)
                pixels.push_back(toPixel(p));
            // The piece of the line before the preferred anchor, walked backwards.
            qsizetype k = pixels.size() - 1;
            double best = std::numeric_limits<double>::max();
            for (qsizetype i = 0; i < pixels.size(); ++i) {
                const QPointF d = pixels[i] - candidates.front();
                const double distance = std::hypot(d.x(), d.y());
                if (distance < best) {
                    best = distance;
                    k = i;
                }
            }
            const double step = size.height() + 2.0;
            double travelled = 0.0;
            double next = step;
            for (qsizetype i = k; i > 0 && candidates.size() < 12; --i) {
                const QPointF a = pixels[i];
                const QPointF b = pixels[i - 1];
                const double length = std::hypot(b.x() - a.x(), b.y() - a.y());
                while (length > 0.0 && travelled + length >= next && candidates.size() < 12) {
                    candidates.push_back(a + (b - a) * ((next - travelled) / length));
                    next += step;
                }
                travelled += length;
            }
        }
        bool shown = false;
        for (const QPointF& anchor : candidates) {
            const QRectF box = boxAt(anchor);
            if (!isFree(box))
                continue;
            item->position->setPixelPosition(anchor);
            taken.push_back(box.adjusted(-3, -1, 3, 1)); // a little air between neighbours
            shown = true;
            break;
        }
        item->setVisible(shown);
    }
}

PsychroChartView::Hit PsychroChartView::hitAt(const QPointF& pixel) const
{
    Hit best;
    double bestDistance = kHitRadius;
    const auto& processes = m_model.processes();
    for (int i = 0; i < int(processes.size()); ++i)
        for (bool extract : {false, true}) {
            const auto& points = extract ? processes[i].extract : processes[i].supply;
            for (int k = 0; k < int(points.size()); ++k) {
                const QPointF p(m_plot->xAxis->coordToPixel(points[k].position.x()),
                                m_plot->yAxis->coordToPixel(points[k].position.y()));
                const double d = std::hypot(p.x() - pixel.x(), p.y() - pixel.y());
                // Supply before extract on a tie: it is drawn on top.
                if (d < bestDistance) {
                    bestDistance = d;
                    best = {i, extract, k};
                }
            }
        }
    return best;
}

QString PsychroChartView::tipAt(const QPoint& plotPixel) const
{
    const Hit hit = hitAt(plotPixel);
    if (hit.process < 0)
        return {};
    // Sections that change only the pressure leave the state where it was: name
    // every boundary of this path drawn on the same spot.
    const auto& process = m_model.processes()[hit.process];
    const auto& points = hit.extract ? process.extract : process.supply;
    const QPointF at = points[hit.point].position;
    QVector<PsychroChartModel::StatePoint> samePlace;
    for (const auto& p : points) {
        const double dx = m_plot->xAxis->coordToPixel(p.position.x()) - m_plot->xAxis->coordToPixel(at.x());
        const double dy = m_plot->yAxis->coordToPixel(p.position.y()) - m_plot->yAxis->coordToPixel(at.y());
        if (std::hypot(dx, dy) < 1.5)
            samePlace.push_back(p);
    }
    return m_model.describe(process, samePlace, *m_units);
}

void PsychroChartView::onMouseMove(QMouseEvent* event)
{
    const QString tip = tipAt(event->position().toPoint());
    if (tip.isEmpty())
        QToolTip::hideText();
    else
        QToolTip::showText(event->globalPosition().toPoint(), tip, m_plot);
}

void PsychroChartView::onMousePress(QMouseEvent* event)
{
    const Hit hit = hitAt(event->position());
    if (hit.process < 0)
        return;
    const auto& process = m_model.processes()[hit.process];
    m_document->selectSection((hit.extract ? process.extract : process.supply)[hit.point].sectionId);
}

} // namespace Airwright::Ui
