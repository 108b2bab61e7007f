#include "airwright/ui/UnitDrawing.h"

#include "airwright/ui/AddSectionCommand.h"
#include "airwright/ui/MoveSectionCommand.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/SectionCatalog.h"
#include "airwright/ui/SectionPaths.h"
#include "airwright/ui/SectionSymbol.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QApplication>
#include <QDrag>
#include <QDragEnterEvent>
#include <QFontMetricsF>
#include <QHelpEvent>
#include <QKeyEvent>
#include <QMimeData>
#include <QMouseEvent>
#include <QPainter>
#include <QToolTip>

#include <algorithm>
#include <cmath>

namespace Airwright::Ui {

using namespace Airwright::Core;
using Chain::PathKind;
using Kind = UnitSystem::Kind;

namespace {

// Width of a block: a fixed part (room for the id and the figure) plus the
// section's length, in metres.
constexpr double kBaseWeight = 0.3;
constexpr double kPartition = 16.0;
constexpr double kMaxStretch = 1.8;

double weightOf(const Chain::AirHandlingUnit& unit, const Chain::Section& section)
{
    const Chain::Section* described = SectionPaths::described(unit, section.id);
    const double length = described ? toMetres(Chain::sectionLength(described->spec)) : 0.0;
    return kBaseWeight + std::clamp(length, 0.0, 4.0);
}

void arrow(QPainter& p, const QPointF& from, const QPointF& to, const QColor& colour)
{
    p.setPen(QPen(colour, 1.6));
    p.drawLine(from, to);
    const double dx = to.x() - from.x();
    const double dir = dx >= 0.0 ? 1.0 : -1.0;
    QPolygonF head;
    head << to << QPointF(to.x() - dir * 9.0, to.y() - 4.5) << QPointF(to.x() - dir * 9.0, to.y() + 4.5);
    p.setBrush(colour);
    p.drawPolygon(head);
    p.setBrush(Qt::NoBrush);
}

} // namespace

UnitDrawing::UnitDrawing(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document), m_units(units)
{
    setFocusPolicy(Qt::StrongFocus);
    setAcceptDrops(true);
    setMouseTracking(false);
    setAutoFillBackground(false);
    setAccessibleName(tr("Unit drawing"));
    connect(m_document, &ProjectDocument::changed, this, [this] {
        invalidateLayout();
        update();
    });
    // Block widths depend on the figures shown, so results and units re-lay out too.
    connect(m_document, &ProjectDocument::resultsChanged, this, [this] {
        invalidateLayout();
        update();
    });
    connect(m_document, &ProjectDocument::selectionChanged, this, [this](const QString& id) {
        const auto& unit = m_document->project().unit;
        if (SectionPaths::indexOf(SectionPaths::path(unit, m_selectedPath), id.toStdString()) < 0)
            m_selectedPath = SectionPaths::other(m_selectedPath);
        update();
    });
    connect(m_units, &UnitSystem::changed, this, [this] {
        invalidateLayout();
        update();
    });
}

QSize UnitDrawing::sizeHint() const
{
    return {1000, 330};
}

QSize UnitDrawing::minimumSizeHint() const
{
    return {520, 240};
}

void UnitDrawing::setCaseIndex(int index)
{
    m_caseIndex = index;
    invalidateLayout();
    update();
}

void UnitDrawing::invalidateLayout()
{
    m_layout.reset();
}

const UnitDrawing::Layout& UnitDrawing::layout() const
{
    if (!m_layout)
        m_layout = computeLayout();
    return *m_layout;
}

void UnitDrawing::resizeEvent(QResizeEvent* event)
{
    invalidateLayout();
    QWidget::resizeEvent(event);
}

UnitDrawing::Layout UnitDrawing::computeLayout() const
{
    Layout l;
    const auto& unit = m_document->project().unit;
    const QRectF area = QRectF(rect()).adjusted(8.0, 6.0, -8.0, -4.0);
    const QFontMetricsF fm(font());
    l.labelWidth = std::clamp(area.width() * 0.12, 96.0, 136.0);
    const double footerHeight = fm.height() * 2.0 + 8.0;
    const double available = area.height() - footerHeight;
    const double deckHeight = std::clamp((available - kPartition) / 2.0, 56.0, 160.0);
    const double total = 2.0 * deckHeight + kPartition;
    const double top = area.top() + std::max(0.0, (available - total) / 2.0);
    const double left = area.left() + l.labelWidth;
    const double width = std::max(10.0, area.width() - 2.0 * l.labelWidth);
    l.supplyDeck = QRectF(left, top, width, deckHeight);
    l.extractDeck = QRectF(left, top + deckHeight + kPartition, width, deckHeight);
    l.footer = QRectF(area.left(), l.extractDeck.bottom() + 6.0, area.width(), footerHeight);

    const auto& supply = unit.supply;
    const auto& extract = unit.extract;
    l.supplyBlock.assign(supply.size(), -1);
    l.extractBlock.assign(extract.size(), -1);

    // Extract entries in drawing order, left to right (the extract runs right to left).
    std::vector<int> extractShown;
    for (int i = static_cast<int>(extract.size()) - 1; i >= 0; --i)
        extractShown.push_back(i);

    std::vector<std::string> supplyAnchors;
    std::vector<std::string> extractAnchors;
    for (const auto& s : supply)
        if (SectionPaths::isCoupledEntry(s))
            supplyAnchors.push_back(s.id);
    for (int i : extractShown)
        if (SectionPaths::isCoupledEntry(extract[static_cast<std::size_t>(i)]))
            extractAnchors.push_back(extract[static_cast<std::size_t>(i)].id);
    l.aligned = supplyAnchors == extractAnchors;

    // Columns: runs of ordinary sections between the coupled ones, which take a
    // column of their own across both decks.
    struct Column {
        std::vector<int> supply;
        std::vector<int> extract; // in drawing order
        std::optional<int> anchorSupply;
        std::optional<int> anchorExtract;
    };
    std::vector<Column> columns(1);
    if (l.aligned) {
        std::size_t e = 0;
        for (std::size_t s = 0; s < supply.size(); ++s) {
            if (!SectionPaths::isCoupledEntry(supply[s])) {
                columns.back().supply.push_back(static_cast<int>(s));
                continue;
            }
            while (e < extractShown.size()
                   && !SectionPaths::isCoupledEntry(extract[static_cast<std::size_t>(extractShown[e])])) {
                columns.back().extract.push_back(extractShown[e]);
                ++e;
            }
            Column anchor;
            anchor.anchorSupply = static_cast<int>(s);
            anchor.anchorExtract = extractShown[e];
            ++e;
            columns.push_back(anchor);
            columns.emplace_back();
        }
        for (; e < extractShown.size(); ++e)
            columns.back().extract.push_back(extractShown[e]);
    } else {
        for (std::size_t s = 0; s < supply.size(); ++s)
            columns.back().supply.push_back(static_cast<int>(s));
        columns.back().extract = extractShown;
    }

    // Each block is at least as wide as its id and its figure need; beyond that,
    // widths follow the sections' lengths (pixels per metre found by bisection so
    // the columns fill the deck).
    QFont small = font();
    small.setPointSizeF(small.pointSizeF() * 0.92);
    QFont idFont = small;
    idFont.setBold(true);
    const QFontMetricsF fmId(idFont);
    const QFontMetricsF fmSmall(small);
    auto minimumOf = [&](const Chain::Section& s, PathKind kind) {
        const double idWidth = fmId.horizontalAdvance(QString::fromStdString(s.id));
        const double figureWidth = fmSmall.horizontalAdvance(keyFigure(kind, s.id));
        return std::clamp(std::max(idWidth, figureWidth) + 10.0, 44.0, 150.0);
    };
    struct Entry {
        double weight = 0.0;
        double minimum = 0.0;
        double width(double perMetre) const { return std::max(minimum, weight * perMetre); }
    };
    auto entriesOf = [&](const std::vector<int>& list, const std::vector<Chain::Section>& path, PathKind kind) {
        std::vector<Entry> out;
        for (int i : list) {
            const auto& s = path[static_cast<std::size_t>(i)];
            out.push_back({weightOf(unit, s), minimumOf(s, kind)});
        }
        return out;
    };
    auto widthOf = [](const std::vector<Entry>& list, double perMetre) {
        double w = 0.0;
        for (const auto& e : list)
            w += e.width(perMetre);
        return w;
    };
    struct ColumnEntries {
        std::vector<Entry> supply;
        std::vector<Entry> extract;
        Entry anchor;
    };
    std::vector<ColumnEntries> entries;
    for (const auto& c : columns) {
        ColumnEntries e;
        if (c.anchorSupply) {
            const auto& s = supply[static_cast<std::size_t>(*c.anchorSupply)];
            e.anchor = {weightOf(unit, s), std::max(minimumOf(s, PathKind::Supply), minimumOf(s, PathKind::Extract))};
        } else {
            e.supply = entriesOf(c.supply, supply, PathKind::Supply);
            e.extract = entriesOf(c.extract, extract, PathKind::Extract);
        }
        entries.push_back(std::move(e));
    }
    auto columnWidth = [&](std::size_t c, double perMetre) {
        if (columns[c].anchorSupply)
            return entries[c].anchor.width(perMetre);
        return std::max(widthOf(entries[c].supply, perMetre), widthOf(entries[c].extract, perMetre));
    };
    auto allColumns = [&](double perMetre) {
        double w = 0.0;
        for (std::size_t c = 0; c < columns.size(); ++c)
            w += columnWidth(c, perMetre);
        return w;
    };
    double perMetre = 0.0;
    double shrink = 1.0;
    const double minimumTotal = allColumns(0.0);
    if (minimumTotal <= 0.0)
        return l;
    if (minimumTotal >= width) {
        shrink = width / minimumTotal; // too many sections: everything narrower
    } else {
        double lo = 0.0;
        double hi = width * 10.0;
        for (int i = 0; i < 60; ++i) {
            const double mid = (lo + hi) / 2.0;
            (allColumns(mid) > width ? hi : lo) = mid;
        }
        perMetre = lo;
    }

    double x = left;
    for (std::size_t c = 0; c < columns.size(); ++c) {
        const Column& column = columns[c];
        const double thisWidth = columnWidth(c, perMetre) * shrink;
        if (column.anchorSupply) {
            Block b;
            b.id = supply[static_cast<std::size_t>(*column.anchorSupply)].id;
            b.spansBoth = true;
            b.supplyIndex = column.anchorSupply;
            b.extractIndex = column.anchorExtract;
            b.rect = QRectF(x, l.supplyDeck.top(), thisWidth, l.extractDeck.bottom() - l.supplyDeck.top());
            b.supplyPart = QRectF(x, l.supplyDeck.top(), thisWidth, deckHeight);
            b.extractPart = QRectF(x, l.extractDeck.top(), thisWidth, deckHeight);
            l.supplyBlock[static_cast<std::size_t>(*column.anchorSupply)] = static_cast<int>(l.blocks.size());
            l.extractBlock[static_cast<std::size_t>(*column.anchorExtract)] = static_cast<int>(l.blocks.size());
            l.blocks.push_back(b);
        } else {
            // Supply blocks start at the column's upstream (left) end, extract blocks
            // at theirs (right); what is left over is plain casing.
            auto place = [&](const std::vector<int>& list, const std::vector<Entry>& sizes,
                             const std::vector<Chain::Section>& path, PathKind kind) {
                const double natural = widthOf(sizes, perMetre) * shrink;
                if (natural <= 0.0)
                    return;
                const double stretch = std::min(thisWidth / natural, kMaxStretch);
                double used = 0.0;
                std::vector<double> widths;
                for (const auto& e : sizes) {
                    widths.push_back(e.width(perMetre) * shrink * stretch);
                    used += widths.back();
                }
                double cursor = kind == PathKind::Supply ? x : x + thisWidth - used;
                const QRectF& deck = kind == PathKind::Supply ? l.supplyDeck : l.extractDeck;
                for (std::size_t k = 0; k < list.size(); ++k) {
                    Block b;
                    const int index = list[k];
                    b.id = path[static_cast<std::size_t>(index)].id;
                    (kind == PathKind::Supply ? b.supplyIndex : b.extractIndex) = index;
                    b.rect = QRectF(cursor, deck.top(), widths[k], deck.height());
                    (kind == PathKind::Supply ? b.supplyPart : b.extractPart) = b.rect;
                    auto& map = kind == PathKind::Supply ? l.supplyBlock : l.extractBlock;
                    map[static_cast<std::size_t>(index)] = static_cast<int>(l.blocks.size());
                    l.blocks.push_back(b);
                    cursor += widths[k];
                }
            };
            place(column.supply, entries[c].supply, supply, PathKind::Supply);
            place(column.extract, entries[c].extract, extract, PathKind::Extract);
        }
        x += thisWidth;
    }
    return l;
}

QRectF UnitDrawing::entryRect(const Layout& l, PathKind path, int index) const
{
    const auto& map = path == PathKind::Supply ? l.supplyBlock : l.extractBlock;
    if (index < 0 || index >= static_cast<int>(map.size()) || map[static_cast<std::size_t>(index)] < 0)
        return {};
    const Block& b = l.blocks[static_cast<std::size_t>(map[static_cast<std::size_t>(index)])];
    return path == PathKind::Supply ? b.supplyPart : b.extractPart;
}

QRectF UnitDrawing::blockRect(PathKind path, int index) const
{
    return entryRect(layout(), path, index);
}

std::optional<PathKind> UnitDrawing::deckAt(double y) const
{
    const Layout& l = layout();
    const double middle = (l.supplyDeck.bottom() + l.extractDeck.top()) / 2.0;
    if (y >= l.supplyDeck.top() - 4.0 && y < middle)
        return PathKind::Supply;
    if (y >= middle && y <= l.extractDeck.bottom() + 4.0)
        return PathKind::Extract;
    return std::nullopt;
}

std::optional<UnitDrawing::Place> UnitDrawing::placeAt(const QPointF& point) const
{
    const auto deck = deckAt(point.y());
    if (!deck)
        return std::nullopt;
    const Layout& l = layout();
    const auto& map = *deck == PathKind::Supply ? l.supplyBlock : l.extractBlock;
    for (std::size_t i = 0; i < map.size(); ++i) {
        const QRectF r = entryRect(l, *deck, static_cast<int>(i));
        if (point.x() >= r.left() && point.x() < r.right())
            return Place{*deck, static_cast<int>(i)};
    }
    return std::nullopt;
}

int UnitDrawing::insertionIndexAt(PathKind path, double x) const
{
    const Layout& l = layout();
    const auto& map = path == PathKind::Supply ? l.supplyBlock : l.extractBlock;
    int gap = 0;
    for (std::size_t i = 0; i < map.size(); ++i) {
        const double centre = entryRect(l, path, static_cast<int>(i)).center().x();
        if (path == PathKind::Supply ? centre < x : centre > x)
            gap = static_cast<int>(i) + 1;
    }
    return gap;
}

double UnitDrawing::markerX(PathKind path, int gap) const
{
    const Layout& l = layout();
    const QRectF& deck = path == PathKind::Supply ? l.supplyDeck : l.extractDeck;
    const auto& map = path == PathKind::Supply ? l.supplyBlock : l.extractBlock;
    const int n = static_cast<int>(map.size());
    if (n == 0)
        return path == PathKind::Supply ? deck.left() + 3.0 : deck.right() - 3.0;
    if (gap <= 0) {
        const QRectF first = entryRect(l, path, 0);
        return path == PathKind::Supply ? first.left() : first.right();
    }
    const QRectF before = entryRect(l, path, std::min(gap, n) - 1);
    return path == PathKind::Supply ? before.right() : before.left();
}

std::optional<UnitDrawing::Place> UnitDrawing::selectedPlace() const
{
    const std::string id = m_document->selectedSection().toStdString();
    if (id.empty())
        return std::nullopt;
    const auto& unit = m_document->project().unit;
    int index = SectionPaths::indexOf(SectionPaths::path(unit, m_selectedPath), id);
    if (index >= 0)
        return Place{m_selectedPath, index};
    const PathKind other = SectionPaths::other(m_selectedPath);
    index = SectionPaths::indexOf(SectionPaths::path(unit, other), id);
    if (index >= 0)
        return Place{other, index};
    return std::nullopt;
}

void UnitDrawing::selectPlace(const Place& place)
{
    const auto& list = SectionPaths::path(m_document->project().unit, place.path);
    if (place.index < 0 || place.index >= static_cast<int>(list.size()))
        return;
    m_selectedPath = place.path;
    m_document->selectSection(QString::fromStdString(list[static_cast<std::size_t>(place.index)].id));
    update();
}

QString UnitDrawing::keyFigure(PathKind path, const std::string& id) const
{
    const auto& result = m_document->result();
    if (!result || result->cases.empty())
        return {};
    const int index = std::clamp(m_caseIndex, 0, static_cast<int>(result->cases.size()) - 1);
    const Chain::SectionResult* r = result->cases[static_cast<std::size_t>(index)].find(path, id);
    if (!r)
        return {};
    const QString dp = QStringLiteral("Δp %1").arg(m_units->format(Kind::Pressure, toPascals(r->pressureDrop)));
    if (std::holds_alternative<Sections::Fan::Detail>(r->detail))
        return QStringLiteral("+%1").arg(m_units->format(Kind::Pressure, -toPascals(r->pressureDrop)));
    if (std::holds_alternative<Sections::WaterHeatingCoil::Detail>(r->detail)
        || std::holds_alternative<Sections::ElectricHeater::Detail>(r->detail)
        || std::holds_alternative<Sections::CoolingCoil::Detail>(r->detail))
        return m_units->format(Kind::Power, std::abs(toKilowatts(r->duty)));
    if (const auto* h = std::get_if<Sections::Humidifier::Detail>(&r->detail))
        return m_units->format(Kind::MassFlowPerHour, toKilogramsPerSecond(h->waterAdded) * 3600.0);
    if (path == PathKind::Supply) {
        if (std::holds_alternative<Recovery::HeatRecoveryDetail>(r->detail))
            return m_units->format(Kind::Power, toKilowatts(r->duty));
        if (const auto* m = std::get_if<Sections::MixingBox::Detail>(&r->detail))
            return tr("outdoor %1").arg(m_units->format(Kind::Percent, toPercent(m->outdoorShare), 0));
    }
    return dp;
}

void UnitDrawing::paintEvent(QPaintEvent*)
{
    QPainter p(this);
    p.setRenderHint(QPainter::Antialiasing, true);
    const QPalette& pal = palette();
    const QColor background = pal.color(QPalette::Base);
    const QColor text = pal.color(QPalette::Text);
    const QColor casing = pal.color(QPalette::AlternateBase);
    p.fillRect(rect(), background);
    const Layout& l = layout();

    // Casing of both decks and the partition between them.
    p.setPen(QPen(text, 1.6));
    p.setBrush(casing);
    p.drawRect(l.supplyDeck);
    p.drawRect(l.extractDeck);
    const QRectF partition(l.supplyDeck.left(), l.supplyDeck.bottom(), l.supplyDeck.width(),
                           l.extractDeck.top() - l.supplyDeck.bottom());
    p.setPen(Qt::NoPen);
    p.setBrush(QBrush(pal.color(QPalette::Mid), Qt::BDiagPattern));
    p.drawRect(partition);
    p.setBrush(Qt::NoBrush);

    const auto& unit = m_document->project().unit;
    if (unit.supply.empty() && unit.extract.empty()) {
        p.setPen(pal.color(QPalette::PlaceholderText));
        p.drawText(l.supplyDeck, Qt::AlignCenter, tr("Supply path: drag sections here from the section list"));
        p.drawText(l.extractDeck, Qt::AlignCenter, tr("Extract path: drag sections here from the section list"));
    }
    for (const Block& b : l.blocks)
        paintBlock(p, b);
    paintDeckEnds(p, l);

    // Non-aligned coupled sections: join their two halves with a dashed line.
    if (!l.aligned) {
        p.setPen(QPen(text, 1.0, Qt::DashLine));
        for (const Block& b : l.blocks) {
            if (!b.supplyIndex || !SectionPaths::isCoupledEntry(unit.supply[static_cast<std::size_t>(*b.supplyIndex)]))
                continue;
            const int e = SectionPaths::indexOf(unit.extract, b.id);
            if (e >= 0) {
                const QRectF other = entryRect(l, PathKind::Extract, e);
                p.drawLine(QPointF(b.rect.center().x(), b.rect.bottom()), QPointF(other.center().x(), other.top()));
            }
        }
    }

    // Drop or move marker.
    if (m_marker) {
        const QRectF& deck = m_marker->path == PathKind::Supply ? l.supplyDeck : l.extractDeck;
        const double x = markerX(m_marker->path, m_marker->gap);
        p.setPen(QPen(pal.color(QPalette::Highlight), 3.0));
        p.drawLine(QPointF(x, deck.top() - 4.0), QPointF(x, deck.bottom() + 4.0));
    }

    // Footer: casing size and the case the figures belong to, or why there are none.
    const QFontMetricsF fm(font());
    const QRectF line1(l.footer.left(), l.footer.top(), l.footer.width(), fm.height());
    const QRectF line2(l.footer.left(), l.footer.top() + fm.height() + 2.0, l.footer.width(), fm.height());
    const auto& result = m_document->result();
    p.setPen(text);
    if (result && !result->cases.empty()) {
        const int index = std::clamp(m_caseIndex, 0, static_cast<int>(result->cases.size()) - 1);
        const auto& c = result->cases[static_cast<std::size_t>(index)];
        const auto& s = result->sizing;
        const bool ip = m_units->system() == UnitSystem::System::IP;
        auto length = [&](Length v) {
            return ip ? QStringLiteral("%1 in").arg(toMillimetres(v) / 25.4, 0, 'f', 1)
                      : QStringLiteral("%1 mm").arg(toMillimetres(v), 0, 'f', 0);
        };
        const QString legend = tr("Figures for case \"%1\": duty of coils and heaters, heat recovered, fan "
                                  "pressure rise, Δp pressure drop of the section.")
                                   .arg(QString::fromStdString(c.caseName));
        p.drawText(line1, Qt::AlignLeft | Qt::AlignVCenter, fm.elidedText(legend, Qt::ElideRight, line1.width()));
        int attention = 0;
        for (const auto& f : c.findings)
            if (f.severity != Severity::Info)
                ++attention;
        QString second = tr("Deck inside: %1 wide, %2 high. Unit length %3.")
                             .arg(length(s.width), length(s.height), length(s.unitLength));
        if (!c.findings.empty())
            second += QLatin1String("   ")
                      + tr("Findings in this case: %1, %2 needing attention (see the Findings tab).")
                            .arg(c.findings.size())
                            .arg(attention);
        p.drawText(line2, Qt::AlignLeft | Qt::AlignVCenter, fm.elidedText(second, Qt::ElideRight, line2.width()));
    } else {
        p.setPen(QColor(0xd0, 0x30, 0x30));
        const QString message = tr("Not computed: %1").arg(MessageUnits::toDisplay(m_document->computeError(), *m_units));
        p.drawText(QRectF(line1.topLeft(), line2.bottomRight()), Qt::AlignLeft | Qt::AlignTop | Qt::TextWordWrap,
                   message);
    }
}

void UnitDrawing::paintDeckEnds(QPainter& p, const Layout& l) const
{
    const QColor text = palette().color(QPalette::Text);
    const QFontMetricsF fm(font());
    const auto& result = m_document->result();
    const Chain::CaseResult* c = nullptr;
    if (result && !result->cases.empty())
        c = &result->cases[static_cast<std::size_t>(
            std::clamp(m_caseIndex, 0, static_cast<int>(result->cases.size()) - 1))];

    auto state = [&](const Sections::AirStream& s) {
        return QStringLiteral("%1, %2 RH")
            .arg(m_units->format(Kind::Temperature, toCelsius(s.state.dryBulb())),
                 m_units->format(Kind::Percent, toPercent(s.state.relativeHumidity()), 0));
    };
    struct End {
        QRectF zone;
        QString name;
        QString state;
        bool pointsRight;
        bool intoDeck;
    };
    const double w = l.labelWidth - 10.0;
    const double leftX = l.supplyDeck.left() - l.labelWidth + 2.0;
    const double rightX = l.supplyDeck.right() + 8.0;
    std::vector<End> ends{
        {QRectF(leftX, l.supplyDeck.top(), w, l.supplyDeck.height()), tr("Outdoor air"),
         c && !c->supply.empty() ? state(c->supply.front().inlet) : QString(), true, true},
        {QRectF(rightX, l.supplyDeck.top(), w, l.supplyDeck.height()), tr("Supply air"),
         c && !c->supply.empty() ? state(c->supply.back().outlet) : QString(), true, false},
        {QRectF(rightX, l.extractDeck.top(), w, l.extractDeck.height()), tr("Extract air"),
         c && !c->extract.empty() ? state(c->extract.front().inlet) : QString(), false, true},
        {QRectF(leftX, l.extractDeck.top(), w, l.extractDeck.height()), tr("Exhaust air"),
         c && !c->extract.empty() ? state(c->extract.back().outlet) : QString(), false, false},
    };
    QFont bold = font();
    bold.setBold(true);
    for (const End& e : ends) {
        const double y = e.zone.center().y();
        const QPointF a(e.zone.left() + 2.0, y);
        const QPointF b(e.zone.right() - 2.0, y);
        arrow(p, e.pointsRight ? a : b, e.pointsRight ? b : a, text);
        p.setPen(text);
        p.setFont(bold);
        p.drawText(QRectF(e.zone.left(), y - fm.height() - 6.0, e.zone.width(), fm.height()),
                   Qt::AlignHCenter | Qt::AlignBottom, e.name);
        p.setFont(font());
        p.drawText(QRectF(e.zone.left() - 6.0, y + 6.0, e.zone.width() + 12.0, fm.height() * 2.0),
                   Qt::AlignHCenter | Qt::AlignTop | Qt::TextWordWrap, e.state);
    }
}

void UnitDrawing::paintBlock(QPainter& p, const Block& b) const
{
    const QPalette& pal = palette();
    const QColor text = pal.color(QPalette::Text);
    const QColor background = pal.color(QPalette::Base);
    const auto colours = SectionSymbol::coloursFor(text, background);
    const auto& unit = m_document->project().unit;
    const Chain::Section* entry = nullptr;
    if (b.supplyIndex)
        entry = &unit.supply[static_cast<std::size_t>(*b.supplyIndex)];
    else if (b.extractIndex)
        entry = &unit.extract[static_cast<std::size_t>(*b.extractIndex)];
    if (!entry)
        return;
    const auto symbol = SectionCatalog::symbolOf(unit, *entry);
    const bool selected = m_document->selectedSection().toStdString() == b.id;

    p.setPen(QPen(text, 1.0));
    p.setBrush(background);
    p.drawRect(b.rect);
    p.setBrush(Qt::NoBrush);

    QFont small = font();
    small.setPointSizeF(small.pointSizeF() * 0.92);
    QFont idFont = small;
    idFont.setBold(true);
    const QFontMetricsF fmId(idFont);
    const QFontMetricsF fmSmall(small);
    const double lineHeight = fmSmall.height();

    auto textTop = [&](const QRectF& part, const QString& s, const QFont& f, const QFontMetricsF& fm) {
        p.setFont(f);
        p.setPen(text);
        const QRectF r(part.left() + 2.0, part.top() + 2.0, part.width() - 4.0, lineHeight);
        p.drawText(r, Qt::AlignHCenter | Qt::AlignVCenter, fm.elidedText(s, Qt::ElideMiddle, r.width()));
    };
    auto textBottom = [&](const QRectF& part, const QString& s) {
        p.setFont(small);
        p.setPen(text);
        const QRectF r(part.left() + 2.0, part.bottom() - lineHeight - 2.0, part.width() - 4.0, lineHeight);
        p.drawText(r, Qt::AlignHCenter | Qt::AlignVCenter, fmSmall.elidedText(s, Qt::ElideRight, r.width()));
    };
    auto symbolArea = [&](const QRectF& part) {
        return part.adjusted(4.0, lineHeight + 5.0, -4.0, -lineHeight - 5.0);
    };

    const QString id = QString::fromStdString(b.id);
    if (b.spansBoth) {
        // The id and the supply-side figure on top, the extract-side figure at the
        // foot; the symbol spans the decks between them.
        const QRectF supplyArea = b.supplyPart.adjusted(4.0, 2.0 * lineHeight + 6.0, -4.0, 0.0);
        const QRectF extractArea = b.extractPart.adjusted(4.0, 0.0, -4.0, -lineHeight - 5.0);
        SectionSymbol::paintCoupled(p, supplyArea, extractArea, symbol, colours, true);
        textTop(b.supplyPart, id, idFont, fmId);
        textTop(b.supplyPart.translated(0.0, lineHeight), keyFigure(PathKind::Supply, b.id), small, fmSmall);
        textBottom(b.extractPart, keyFigure(PathKind::Extract, b.id));
    } else {
        const PathKind path = b.supplyIndex ? PathKind::Supply : PathKind::Extract;
        SectionSymbol::paint(p, symbolArea(b.rect), symbol, colours);
        textTop(b.rect, id, idFont, fmId);
        textBottom(b.rect, keyFigure(path, b.id));
    }
    p.setFont(font());

    if (selected) {
        QColor highlight = pal.color(QPalette::Highlight);
        p.setPen(QPen(highlight, 2.5));
        highlight.setAlpha(40);
        p.setBrush(highlight);
        p.drawRoundedRect(b.rect.adjusted(1.5, 1.5, -1.5, -1.5), 3.0, 3.0);
        p.setBrush(Qt::NoBrush);
    }
}

bool UnitDrawing::event(QEvent* event)
{
    if (event->type() == QEvent::ToolTip) {
        auto* help = static_cast<QHelpEvent*>(event);
        const auto place = placeAt(help->pos());
        if (!place) {
            QToolTip::hideText();
            event->ignore();
            return true;
        }
        const auto& unit = m_document->project().unit;
        const auto& entry = SectionPaths::path(unit, place->path)[static_cast<std::size_t>(place->index)];
        const Chain::Section* described = SectionPaths::described(unit, entry.id);
        QString tip = QStringLiteral("<b>%1</b><br>%2, %3 path")
                          .arg(QString::fromStdString(entry.id).toHtmlEscaped(),
                               described ? SectionCatalog::typeLabel(described->spec) : QString(),
                               place->path == PathKind::Supply ? tr("supply") : tr("extract"));
        const QString figure = keyFigure(place->path, entry.id);
        if (!figure.isEmpty())
            tip += QStringLiteral("<br>%1").arg(figure.toHtmlEscaped());
        tip += tr("<br><i>Drag to move within the path; Delete removes, Ctrl+D duplicates.</i>");
        QToolTip::showText(help->globalPos(), tip, this);
        return true;
    }
    return QWidget::event(event);
}

void UnitDrawing::mousePressEvent(QMouseEvent* event)
{
    setFocus(Qt::MouseFocusReason);
    if (event->button() != Qt::LeftButton && event->button() != Qt::RightButton) {
        QWidget::mousePressEvent(event);
        return;
    }
    const auto place = placeAt(event->position());
    if (place) {
        selectPlace(*place);
    } else if (event->button() == Qt::LeftButton) {
        m_document->selectSection({});
    }
    m_pressed = event->button() == Qt::LeftButton ? place : std::nullopt;
    m_pressPoint = event->position();
    m_dragging = false;
}

void UnitDrawing::mouseMoveEvent(QMouseEvent* event)
{
    if (!m_pressed || !(event->buttons() & Qt::LeftButton))
        return;
    if (!m_dragging
        && (event->position() - m_pressPoint).manhattanLength() < QApplication::startDragDistance())
        return;
    m_dragging = true;
    setCursor(Qt::ClosedHandCursor);
    m_marker = DropMarker{m_pressed->path, insertionIndexAt(m_pressed->path, event->position().x())};
    update();
}

void UnitDrawing::mouseReleaseEvent(QMouseEvent* event)
{
    if (m_dragging && m_pressed && event->button() == Qt::LeftButton) {
        const int gap = insertionIndexAt(m_pressed->path, event->position().x());
        const int from = m_pressed->index;
        const int to = gap > from ? gap - 1 : gap;
        if (to != from)
            m_document->undoStack()->push(new MoveSectionCommand(m_document, m_pressed->path, from, to));
    }
    m_pressed.reset();
    m_dragging = false;
    m_marker.reset();
    unsetCursor();
    update();
}

void UnitDrawing::mouseDoubleClickEvent(QMouseEvent* event)
{
    if (const auto place = placeAt(event->position())) {
        selectPlace(*place);
        emit sectionActivated(m_document->selectedSection());
    }
}

void UnitDrawing::keyPressEvent(QKeyEvent* event)
{
    const auto& unit = m_document->project().unit;
    const auto current = selectedPlace();
    switch (event->key()) {
    case Qt::Key_Left:
    case Qt::Key_Right: {
        if (!current) {
            if (!unit.supply.empty())
                selectPlace({PathKind::Supply, 0});
            return;
        }
        // The extract deck is drawn right to left: "left" is downstream there.
        const bool left = event->key() == Qt::Key_Left;
        const int step = (current->path == PathKind::Supply) == left ? -1 : +1;
        const int next = current->index + step;
        if (next >= 0 && next < static_cast<int>(SectionPaths::path(unit, current->path).size()))
            selectPlace({current->path, next});
        return;
    }
    case Qt::Key_Up:
    case Qt::Key_Down: {
        const PathKind target = event->key() == Qt::Key_Up ? PathKind::Supply : PathKind::Extract;
        const auto& list = SectionPaths::path(unit, target);
        if (list.empty())
            return;
        const double x = current ? blockRect(current->path, current->index).center().x() : 0.0;
        int best = 0;
        double bestDistance = 1e300;
        for (int i = 0; i < static_cast<int>(list.size()); ++i) {
            const double d = std::abs(blockRect(target, i).center().x() - x);
            if (d < bestDistance) {
                bestDistance = d;
                best = i;
            }
        }
        selectPlace({target, best});
        return;
    }
    case Qt::Key_Escape:
        m_document->selectSection({});
        return;
    default:
        QWidget::keyPressEvent(event);
    }
}

void UnitDrawing::dragEnterEvent(QDragEnterEvent* event)
{
    if (event->mimeData()->hasFormat(QString::fromLatin1(sectionMimeType())))
        event->acceptProposedAction();
}

void UnitDrawing::dragMoveEvent(QDragMoveEvent* event)
{
    const auto deck = deckAt(event->position().y());
    if (!deck || !event->mimeData()->hasFormat(QString::fromLatin1(sectionMimeType()))) {
        m_marker.reset();
        event->ignore();
        update();
        return;
    }
    m_marker = DropMarker{*deck, insertionIndexAt(*deck, event->position().x())};
    event->acceptProposedAction();
    update();
}

void UnitDrawing::dragLeaveEvent(QDragLeaveEvent*)
{
    m_marker.reset();
    update();
}

void UnitDrawing::dropEvent(QDropEvent* event)
{
    m_marker.reset();
    update();
    const QByteArray payload = event->mimeData()->data(QString::fromLatin1(sectionMimeType()));
    bool ok = false;
    const int entry = payload.toInt(&ok);
    if (ok && dropSection(entry, event->position())) {
        event->acceptProposedAction();
        setFocus(Qt::OtherFocusReason);
    }
}

bool UnitDrawing::dropSection(int catalogueEntry, const QPointF& point)
{
    const auto deck = deckAt(point.y());
    const auto& entries = SectionCatalog::entries();
    if (!deck || catalogueEntry < 0 || catalogueEntry >= static_cast<int>(entries.size()))
        return false;
    const int gap = insertionIndexAt(*deck, point.x());
    m_selectedPath = *deck;
    m_document->undoStack()->push(
        new AddSectionCommand(m_document, entries[static_cast<std::size_t>(catalogueEntry)], *deck, gap));
    return true;
}

} // namespace Airwright::Ui
