#include "airwright/ui/views/PressureProfileView.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/PlotStyle.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QComboBox>
#include <QEvent>
#include <QHBoxLayout>
#include <QLabel>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <algorithm>
#include <cmath>

namespace Airwright::Ui {

namespace {

using Kind = UnitSystem::Kind;
using Core::Chain::PathKind;

QString signedText(const UnitSystem& units, double pa)
{
    const QString s = units.format(Kind::Pressure, pa);
    return pa > 0.0 && !s.startsWith(QLatin1Char('0')) ? QLatin1Char('+') + s : s;
}

} // namespace

PressureProfileView::PressureProfileView(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document), m_units(units)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto* bar = new QHBoxLayout;
    bar->setContentsMargins(4, 2, 4, 0);
    auto* label = new QLabel(tr("Case:"), this);
    m_cases = new QComboBox(this);
    m_cases->setSizeAdjustPolicy(QComboBox::AdjustToContents);
    label->setBuddy(m_cases);
    bar->addWidget(label);
    bar->addWidget(m_cases);
    bar->addStretch(1);
    layout->addLayout(bar);

    m_plot = new QCustomPlot(this);
    m_plot->setMinimumSize(320, 220);
    layout->addWidget(m_plot, 1);

    connect(m_cases, &QComboBox::currentIndexChanged, this, [this](int index) {
        if (index >= 0)
            setCaseIndex(index);
    });
    connect(m_document, &ProjectDocument::resultsChanged, this, &PressureProfileView::rebuild);
    connect(m_units, &UnitSystem::changed, this, &PressureProfileView::redraw);
    rebuild();
}

int PressureProfileView::caseIndex() const
{
    return m_caseIndex;
}

void PressureProfileView::setCaseIndex(int index)
{
    if (index == m_caseIndex)
        return;
    m_caseIndex = index;
    if (m_cases->currentIndex() != index && index < m_cases->count())
        m_cases->setCurrentIndex(index);
    rebuild();
}

void PressureProfileView::changeEvent(QEvent* event)
{
    QWidget::changeEvent(event);
    if (event->type() == QEvent::PaletteChange || event->type() == QEvent::FontChange)
        redraw();
}

void PressureProfileView::refreshCaseList()
{
    const QStringList& names = m_model.caseNames();
    QStringList shown;
    for (int i = 0; i < m_cases->count(); ++i)
        shown.push_back(m_cases->itemText(i));
    if (shown != names) {
        const QSignalBlocker block(m_cases);
        m_cases->clear();
        m_cases->addItems(names);
    }
    const QSignalBlocker block(m_cases);
    m_cases->setCurrentIndex(m_caseIndex < m_cases->count() ? m_caseIndex : -1);
    m_cases->setEnabled(m_cases->count() > 0);
}

void PressureProfileView::rebuild()
{
    const auto& result = m_document->result();
    if (result && !result->cases.empty())
        m_caseIndex = std::clamp(m_caseIndex, 0, int(result->cases.size()) - 1);
    m_model.rebuild(result, m_caseIndex);
    refreshCaseList();
    redraw();
}

void PressureProfileView::redraw()
{
    m_plot->clearPlottables();
    m_plot->clearItems();
    const QPalette pal = palette();
    PlotStyle::apply(*m_plot, pal);
    const QColor base = pal.color(QPalette::Base);
    const QColor text = pal.color(QPalette::Text);
    QFont small = font();
    small.setPointSizeF(std::max(6.5, font().pointSizeF() * 0.85));

    const UnitSystem& u = *m_units;
    auto y = [&u](double pa) { return u.toDisplay(Kind::Pressure, pa); };
    const double length = std::max(0.5, m_model.length());
    const double lo = std::min(0.0, m_model.minimumPa());
    const double hi = std::max(0.0, m_model.maximumPa());
    const double margin = std::max(20.0, 0.14 * (hi - lo));
    const double yMin = y(lo - margin);
    const double yMax = y(hi + margin);

    m_plot->xAxis->setRange(-0.02 * length, 1.02 * length);
    m_plot->xAxis2->setRange(-0.02 * length, 1.02 * length);
    m_plot->yAxis->setRange(yMin, yMax);
    m_plot->yAxis->setLabel(tr("static pressure relative to ambient [%1]").arg(u.unit(Kind::Pressure)));
    m_plot->xAxis->setLabel(tr("supply path, in flow direction"));
    m_plot->xAxis2->setLabel(tr("extract path, in flow direction"));
    m_plot->xAxis2->setVisible(true);
    m_plot->yAxis2->setVisible(true);
    m_plot->yAxis2->setTickLabels(false);
    m_plot->yAxis2->setRange(yMin, yMax);
    m_plot->yAxis->grid()->setVisible(true);

    // Section names as tick labels at the middle of each section.
    for (PathKind path : {PathKind::Supply, PathKind::Extract}) {
        auto ticker = QSharedPointer<QCPAxisTickerText>::create();
        const auto& spans = path == PathKind::Supply ? m_model.supply() : m_model.extract();
        for (const auto& s : spans)
            ticker->addTick(s.middle(), s.id);
        QCPAxis* axis = path == PathKind::Supply ? m_plot->xAxis : m_plot->xAxis2;
        axis->setTicker(ticker);
        axis->setTickLabelRotation(path == PathKind::Supply ? 35 : -35);
        axis->setSubTicks(false);
        axis->setTickLabelFont(small);
        axis->setLabelFont(font());
        axis->grid()->setVisible(false);
    }
    m_plot->yAxis->setTickLabelFont(small);
    m_plot->yAxis->setLabelFont(font());

    // Ambient.
    auto* zero = new QCPItemStraightLine(m_plot);
    zero->point1->setCoords(0.0, 0.0);
    zero->point2->setCoords(1.0, 0.0);
    zero->setPen(QPen(PlotStyle::labelColour(pal), 1.0, Qt::DashLine));
    auto* ambient = new QCPItemText(m_plot);
    ambient->position->setCoords(-0.01 * length, 0.0);
    ambient->setPositionAlignment(Qt::AlignLeft | Qt::AlignBottom);
    ambient->setText(tr("ambient"));
    ambient->setFont(small);
    ambient->setColor(PlotStyle::labelColour(pal));

    // Fans: their span shaded in the path's colour, the rise written above.
    for (PathKind path : {PathKind::Supply, PathKind::Extract}) {
        const QColor colour = path == PathKind::Supply ? PlotStyle::supplyColour() : PlotStyle::extractColour();
        for (const auto& s : path == PathKind::Supply ? m_model.supply() : m_model.extract()) {
            if (!s.fan)
                continue;
            QColor shade = colour;
            shade.setAlphaF(0.14f);
            auto* rect = new QCPItemRect(m_plot);
            rect->topLeft->setCoords(s.xStart, yMax);
            rect->bottomRight->setCoords(s.xEnd, yMin);
            rect->setPen(Qt::NoPen);
            rect->setBrush(shade);
            auto* label = new QCPItemText(m_plot);
            label->position->setCoords(s.middle(), y(std::max(s.pressureInPa, s.pressureOutPa)));
            label->setPositionAlignment(Qt::AlignHCenter | Qt::AlignBottom);
            // Named, since the bands of both paths share one x axis.
            label->setText(tr("%1 fan %2")
                               .arg(path == PathKind::Supply ? tr("supply") : tr("extract"),
                                    signedText(u, s.pressureOutPa - s.pressureInPa)));
            label->setFont(small);
            label->setColor(text);
            label->setPadding(QMargins(2, 0, 2, 3));
        }
    }

    // The two profiles.
    for (PathKind path : {PathKind::Supply, PathKind::Extract}) {
        const QColor colour = path == PathKind::Supply ? PlotStyle::supplyColour() : PlotStyle::extractColour();
        QVector<double> keys;
        QVector<double> values;
        for (const QPointF& p : m_model.polyline(path)) {
            keys.push_back(p.x());
            values.push_back(y(p.y()));
        }
        auto* curve = new QCPCurve(m_plot->xAxis, m_plot->yAxis);
        curve->setData(keys, values);
        curve->setPen(QPen(colour, 2.2));
        curve->setScatterStyle(QCPScatterStyle(QCPScatterStyle::ssCircle, QPen(colour, 1.5), base, 6));
        curve->setName(path == PathKind::Supply ? tr("supply") : tr("extract"));
        curve->setSelectable(QCP::stNone);
    }

    // Supply minus extract at each coupled section: a dimension line and its value.
    for (const auto& k : m_model.couplings()) {
        auto* line = new QCPItemLine(m_plot);
        line->start->setCoords(k.x, y(k.extractPa));
        line->end->setCoords(k.x, y(k.supplyPa));
        line->setPen(QPen(text, 1.2));
        line->setHead(QCPLineEnding(QCPLineEnding::esBar, 8));
        line->setTail(QCPLineEnding(QCPLineEnding::esBar, 8));
        auto* label = new QCPItemText(m_plot);
        // A little to the right, clear of the line.
        label->position->setCoords(k.x + 0.015 * length, y(0.5 * (k.supplyPa + k.extractPa)));
        label->setPositionAlignment(Qt::AlignLeft | Qt::AlignVCenter);
        label->setText(tr("%1: supply − extract\n%2").arg(k.id, signedText(u, k.differencePa)));
        label->setFont(small);
        label->setColor(text);
        label->setBrush(base);
        label->setPen(QPen(PlotStyle::lineColour(pal)));
        label->setPadding(QMargins(4, 2, 4, 2));
    }

    m_plot->legend->setVisible(!m_model.isEmpty());
    m_plot->legend->setFont(small);
    m_plot->axisRect()->insetLayout()->setInsetAlignment(0, Qt::AlignTop | Qt::AlignLeft);

    if (m_model.isEmpty()) {
        const QString why = MessageUnits::toDisplay(m_document->computeError(), *m_units);
        auto* item = new QCPItemText(m_plot);
        item->position->setType(QCPItemPosition::ptAxisRectRatio);
        item->position->setCoords(0.5, 0.5);
        item->setText(why.isEmpty() ? tr("No results yet") : tr("No results: %1").arg(why));
        item->setColor(text);
        item->setBrush(base);
        item->setPadding(QMargins(6, 4, 6, 4));
    }
    m_plot->replot();
}

} // namespace Airwright::Ui
