#include "airwright/ui/SectionSymbol.h"

#include <QPainter>
#include <QPainterPath>
#include <QPixmap>

#include <algorithm>
#include <cmath>
#include <numbers>

namespace Airwright::Ui {

using Symbol = SectionCatalog::Symbol;

namespace {

QRectF centred(const QRectF& area, double width, double height)
{
    return QRectF(area.center().x() - width / 2.0, area.center().y() - height / 2.0, width, height);
}

// The narrow upright band most symbols are drawn in (a coil face seen from the side).
QRectF band(const QRectF& area, double share)
{
    const double h = area.height() * 0.84;
    const double w = std::min(area.width() * share, h * 0.62);
    return centred(area, w, h);
}

QPen pen(const QColor& colour, double width, Qt::PenStyle style = Qt::SolidLine)
{
    QPen p(colour, width, style);
    p.setCapStyle(Qt::RoundCap);
    p.setJoinStyle(Qt::RoundJoin);
    return p;
}

void sign(QPainter& p, const QRectF& b, bool plus, const QColor& colour)
{
    const double s = std::clamp(b.width() * 0.22, 3.0, 6.0);
    const QPointF c(b.right() + s * 1.6, b.top() + s * 1.2);
    p.setPen(pen(colour, 1.6));
    p.drawLine(QPointF(c.x() - s, c.y()), QPointF(c.x() + s, c.y()));
    if (plus)
        p.drawLine(QPointF(c.x(), c.y() - s), QPointF(c.x(), c.y() + s));
}

void filter(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF b = band(area, 0.42);
    p.setPen(pen(c.line, 1.0));
    p.setBrush(Qt::NoBrush);
    p.drawRect(b);
    const int pleats = 8;
    QPolygonF zigzag;
    for (int i = 0; i <= pleats; ++i) {
        const double y = b.top() + b.height() * i / pleats;
        zigzag << QPointF(i % 2 == 0 ? b.left() + 1.0 : b.right() - 1.0, y);
    }
    p.setPen(pen(c.line, 1.6));
    p.drawPolyline(zigzag);
}

void coil(QPainter& p, const QRectF& area, const QColor& tube, const SectionSymbol::Colours& c, int signKind)
{
    const QRectF b = band(area, 0.5);
    // Fins: thin lines across the face.
    p.setPen(pen(c.line, 0.6));
    for (double y = b.top() + 3.0; y < b.bottom() - 1.0; y += 4.0)
        p.drawLine(QPointF(b.left(), y), QPointF(b.right(), y));
    p.setPen(pen(c.line, 1.2));
    p.setBrush(Qt::NoBrush);
    p.drawRect(b);
    // Tubes: two rows deep, staggered.
    const double r = std::max(1.5, b.width() / 7.0);
    p.setPen(pen(tube, 1.4));
    p.setBrush(c.fill);
    const int perRow = 4;
    for (int col = 0; col < 2; ++col) {
        const double x = b.left() + b.width() * (col == 0 ? 0.3 : 0.7);
        for (int i = 0; i < perRow; ++i) {
            const double y = b.top() + b.height() * (i + (col == 0 ? 0.35 : 0.65)) / perRow;
            p.drawEllipse(QPointF(x, y), r, r);
        }
    }
    p.setBrush(Qt::NoBrush);
    if (signKind != 0)
        sign(p, b, signKind > 0, tube);
}

void electricHeater(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF b = band(area, 0.5);
    p.setPen(pen(c.line, 1.2));
    p.setBrush(Qt::NoBrush);
    p.drawRect(b);
    // The heating element: a meander of wire across the face.
    QPolygonF meander;
    const int runs = 7;
    const double left = b.left() + b.width() * 0.2;
    const double right = b.right() - b.width() * 0.2;
    for (int i = 0; i < runs; ++i) {
        const double y = b.top() + b.height() * (i + 0.5) / runs;
        if (i % 2 == 0)
            meander << QPointF(left, y) << QPointF(right, y);
        else
            meander << QPointF(right, y) << QPointF(left, y);
    }
    p.setPen(pen(c.heat, 1.5));
    p.drawPolyline(meander);
    sign(p, b, true, c.heat);
}

void fan(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const double radius = std::min(area.width(), area.height()) * 0.42;
    const QPointF centre = area.center();
    p.setPen(pen(c.line, 1.4));
    p.setBrush(Qt::NoBrush);
    p.drawEllipse(centre, radius, radius);
    const double hub = radius * 0.22;
    p.drawEllipse(centre, hub, hub);
    const int blades = 7;
    for (int i = 0; i < blades; ++i) {
        const double a = 2.0 * std::numbers::pi * i / blades;
        auto at = [&](double angle, double r) {
            return QPointF(centre.x() + r * std::cos(angle), centre.y() - r * std::sin(angle));
        };
        QPainterPath blade;
        blade.moveTo(at(a, hub));
        blade.quadTo(at(a + 0.25, radius * 0.65), at(a + 0.75, radius * 0.9));
        p.drawPath(blade);
    }
}

void damper(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF b = band(area, 0.36);
    p.setPen(pen(c.line, 1.0));
    p.setBrush(Qt::NoBrush);
    p.drawLine(b.topLeft(), b.topRight());
    p.drawLine(b.bottomLeft(), b.bottomRight());
    const int blades = 4;
    const double half = b.width() * 0.55;
    const double angle = 0.6; // blades drawn partly open
    for (int i = 0; i < blades; ++i) {
        const QPointF pivot(b.center().x(), b.top() + b.height() * (i + 0.5) / blades);
        const QPointF d(half * std::cos(angle), half * std::sin(angle));
        p.setPen(pen(c.line, 1.8));
        p.drawLine(pivot - d, pivot + d);
        p.setBrush(c.line);
        p.drawEllipse(pivot, 1.6, 1.6);
        p.setBrush(Qt::NoBrush);
    }
}

void droplet(QPainter& p, const QPointF& centre, double s)
{
    QPainterPath path;
    path.moveTo(centre.x(), centre.y() - 2.0 * s);
    path.lineTo(centre.x() + s * 0.866, centre.y() - s * 0.5);
    path.arcTo(QRectF(centre.x() - s, centre.y() - s, 2.0 * s, 2.0 * s), 30.0, -240.0);
    path.closeSubpath();
    p.drawPath(path);
}

void humidifier(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF b = centred(area, std::min(area.width() * 0.7, area.height() * 0.9), area.height() * 0.84);
    const double lance = b.left() + b.width() * 0.2;
    p.setPen(pen(c.line, 1.8));
    p.drawLine(QPointF(lance, b.top()), QPointF(lance, b.bottom()));
    const int nozzles = 3;
    const double s = std::clamp(b.height() / 22.0, 1.6, 3.5);
    for (int i = 0; i < nozzles; ++i) {
        const double y = b.top() + b.height() * (i + 0.5) / nozzles;
        p.setPen(pen(c.line, 1.6));
        p.drawLine(QPointF(lance, y), QPointF(lance + b.width() * 0.12, y));
        p.setPen(pen(c.water, 1.0));
        p.setBrush(c.water);
        for (int k = 0; k < 3; ++k) {
            const double dx = b.width() * (0.3 + 0.2 * k);
            const double dy = (k - 1) * s * 2.6 * (0.6 + 0.3 * k);
            droplet(p, QPointF(lance + dx, y + dy), s);
        }
        p.setBrush(Qt::NoBrush);
    }
}

void silencer(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF b = centred(area, std::min(area.width() * 0.7, area.height() * 0.9), area.height() * 0.84);
    const int baffles = 3;
    const double w = b.width() / 6.0;
    p.setPen(pen(c.line, 1.2));
    p.setBrush(c.fill);
    for (int i = 0; i < baffles; ++i) {
        const double x = b.left() + b.width() * (i + 0.5) / baffles - w / 2.0;
        p.drawRoundedRect(QRectF(x, b.top(), w, b.height()), w / 2.0, w / 2.0);
    }
    p.setBrush(Qt::NoBrush);
}

void access(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF door = band(area, 0.42);
    p.setPen(pen(c.line, 1.2));
    p.setBrush(Qt::NoBrush);
    p.drawRect(door);
    p.drawEllipse(QPointF(door.right() - door.width() * 0.2, door.center().y()), 1.8, 1.8);
}

void empty(QPainter& p, const QRectF& area, const SectionSymbol::Colours& c)
{
    const QRectF b = band(area, 0.42);
    p.setPen(pen(c.line, 1.0, Qt::DashLine));
    p.setBrush(Qt::NoBrush);
    p.drawRect(b);
}

void arrowHead(QPainter& p, const QPointF& tip, const QPointF& direction, double size)
{
    const double length = std::hypot(direction.x(), direction.y());
    if (length <= 0.0)
        return;
    const QPointF d(direction.x() / length, direction.y() / length);
    const QPointF n(-d.y(), d.x());
    QPolygonF head;
    head << tip << tip - d * size + n * size * 0.5 << tip - d * size - n * size * 0.5;
    p.drawPolygon(head);
}

} // namespace

SectionSymbol::Colours SectionSymbol::coloursFor(const QColor& line, const QColor& background)
{
    const bool dark = background.lightness() < 128;
    Colours c;
    c.line = line;
    c.heat = dark ? QColor(0xf0, 0x7a, 0x6a) : QColor(0xb8, 0x32, 0x27);
    c.cool = dark ? QColor(0x6f, 0xa8, 0xf0) : QColor(0x1f, 0x5f, 0xb0);
    c.water = dark ? QColor(0x5f, 0xc8, 0xe0) : QColor(0x1a, 0x8a, 0xb0);
    c.fill = dark ? background.lighter(160) : background.darker(112);
    return c;
}

void SectionSymbol::paint(QPainter& p, const QRectF& area, Symbol symbol, const Colours& c)
{
    p.save();
    p.setRenderHint(QPainter::Antialiasing, true);
    switch (symbol) {
    case Symbol::Filter:
        filter(p, area, c);
        break;
    case Symbol::HeatingCoil:
        coil(p, area, c.heat, c, +1);
        break;
    case Symbol::CoolingCoil:
        coil(p, area, c.cool, c, -1);
        break;
    case Symbol::ElectricHeater:
        electricHeater(p, area, c);
        break;
    case Symbol::Fan:
        fan(p, area, c);
        break;
    case Symbol::Damper:
        damper(p, area, c);
        break;
    case Symbol::Humidifier:
        humidifier(p, area, c);
        break;
    case Symbol::Silencer:
        silencer(p, area, c);
        break;
    case Symbol::Access:
        access(p, area, c);
        break;
    case Symbol::Empty:
        empty(p, area, c);
        break;
    case Symbol::Mixing:
    case Symbol::PlateExchanger:
    case Symbol::RotaryWheel:
    case Symbol::RunAroundCoil: {
        // One deck only (e.g. a coupled section drawn out of line): the upper and
        // lower halves of the area stand for the two decks.
        const QRectF top(area.left(), area.top(), area.width(), area.height() * 0.46);
        const QRectF bottom(area.left(), area.top() + area.height() * 0.54, area.width(), area.height() * 0.46);
        paintCoupled(p, top, bottom, symbol, c, true);
        break;
    }
    }
    p.restore();
}

void SectionSymbol::paintCoupled(QPainter& p, const QRectF& supplyArea, const QRectF& extractArea, Symbol symbol,
                                 const Colours& c, bool supplyOnTop)
{
    p.save();
    p.setRenderHint(QPainter::Antialiasing, true);
    const QRectF upper = supplyOnTop ? supplyArea : extractArea;
    const QRectF lower = supplyOnTop ? extractArea : supplyArea;
    const QRectF span(std::min(upper.left(), lower.left()), upper.top(),
                      std::max(upper.right(), lower.right()) - std::min(upper.left(), lower.left()),
                      lower.bottom() - upper.top());
    switch (symbol) {
    case Symbol::PlateExchanger: {
        const double w = std::min(span.width() * 0.6, span.height() * 0.55);
        const QRectF r = centred(span, w, span.height() * 0.92);
        p.setPen(pen(c.line, 1.3));
        p.setBrush(Qt::NoBrush);
        p.drawRect(r);
        p.setPen(pen(c.line, 1.6));
        p.drawLine(r.topLeft(), r.bottomRight());
        p.drawLine(r.bottomLeft(), r.topRight());
        break;
    }
    case Symbol::RotaryWheel: {
        const double w = std::min(span.width() * 0.28, span.height() * 0.2);
        const QRectF r = centred(span, w, span.height() * 0.92);
        p.setPen(pen(c.line, 0.6));
        for (double y = r.top() + 4.0; y < r.bottom() - 2.0; y += 4.0)
            p.drawLine(QPointF(r.left(), y), QPointF(r.right(), y));
        p.setPen(pen(c.line, 1.4));
        p.setBrush(Qt::NoBrush);
        p.drawRoundedRect(r, w / 2.0, w / 2.0);
        // Axis and the sense of rotation.
        p.setBrush(c.line);
        p.drawEllipse(r.center(), 2.2, 2.2);
        p.setBrush(Qt::NoBrush);
        const double rr = std::min(span.width() * 0.3, span.height() * 0.18);
        const QRectF arc = centred(QRectF(r.right(), r.center().y() - rr, 2.0 * rr, 2.0 * rr), rr * 1.2, rr * 2.0);
        p.drawArc(arc, 120 * 16, -240 * 16);
        const double a = -120.0 * std::numbers::pi / 180.0;
        const QPointF end(arc.center().x() + arc.width() / 2.0 * std::cos(a),
                          arc.center().y() - arc.height() / 2.0 * std::sin(a));
        p.setBrush(c.line);
        arrowHead(p, end, QPointF(std::sin(a) * arc.width() / 2.0, std::cos(a) * arc.height() / 2.0), 5.0);
        p.setBrush(Qt::NoBrush);
        break;
    }
    case Symbol::RunAroundCoil: {
        coil(p, upper, c.water, c, 0);
        coil(p, lower, c.water, c, 0);
        const QRectF bu = band(upper, 0.5);
        const QRectF bl = band(lower, 0.5);
        p.setPen(pen(c.water, 1.4));
        const double xl = std::min(bu.left(), bl.left()) - 6.0;
        const double xr = std::max(bu.right(), bl.right()) + 6.0;
        p.drawLine(QPointF(bu.left(), bu.top() + 4.0), QPointF(xl, bu.top() + 4.0));
        p.drawLine(QPointF(xl, bu.top() + 4.0), QPointF(xl, bl.bottom() - 4.0));
        p.drawLine(QPointF(xl, bl.bottom() - 4.0), QPointF(bl.left(), bl.bottom() - 4.0));
        p.drawLine(QPointF(bu.right(), bu.bottom() - 4.0), QPointF(xr, bu.bottom() - 4.0));
        p.drawLine(QPointF(xr, bu.bottom() - 4.0), QPointF(xr, bl.top() + 4.0));
        p.drawLine(QPointF(xr, bl.top() + 4.0), QPointF(bl.right(), bl.top() + 4.0));
        // The loop pump on the returning pipe.
        const QPointF pump(xr, (bu.bottom() + bl.top()) / 2.0);
        p.setBrush(c.fill);
        p.drawEllipse(pump, 5.0, 5.0);
        p.setBrush(Qt::NoBrush);
        break;
    }
    case Symbol::Mixing: {
        // The opening in the partition with its damper, and the recirculated air
        // passing from the extract deck into the supply deck.
        const double gapTop = upper.bottom();
        const double gapBottom = lower.top();
        const double w = std::min(span.width() * 0.5, 60.0);
        const QRectF opening(span.center().x() - w / 2.0, gapTop, w, gapBottom - gapTop);
        p.setPen(pen(c.line, 1.0));
        for (int i = 0; i < 3; ++i) {
            const QPointF pivot(opening.left() + opening.width() * (i + 0.5) / 3.0, opening.center().y());
            const QPointF d(opening.width() / 7.0, -opening.height() * 0.35);
            p.setPen(pen(c.line, 1.8));
            p.drawLine(pivot - d, pivot + d);
        }
        const QPointF from = supplyOnTop ? QPointF(span.center().x(), lower.center().y())
                                         : QPointF(span.center().x(), upper.center().y());
        const QPointF to = supplyOnTop ? QPointF(span.center().x(), upper.center().y())
                                       : QPointF(span.center().x(), lower.center().y());
        p.setPen(pen(c.line, 1.6, Qt::DashLine));
        p.drawLine(from, to);
        p.setPen(pen(c.line, 1.2));
        p.setBrush(c.line);
        arrowHead(p, to, to - from, 8.0);
        p.setBrush(Qt::NoBrush);
        break;
    }
    default:
        paint(p, upper, symbol, c);
        break;
    }
    p.restore();
}

QIcon SectionSymbol::icon(Symbol symbol, const QColor& line, const QColor& background)
{
    QIcon icon;
    for (int size : {24, 32, 48}) {
        QPixmap pixmap(size, size);
        pixmap.fill(Qt::transparent);
        QPainter p(&pixmap);
        const Colours c = coloursFor(line, background);
        const QRectF area(1.0, 1.0, size - 2.0, size - 2.0);
        switch (symbol) {
        case Symbol::Mixing:
        case Symbol::PlateExchanger:
        case Symbol::RotaryWheel:
        case Symbol::RunAroundCoil: {
            const QRectF top(area.left(), area.top(), area.width(), area.height() * 0.42);
            const QRectF bottom(area.left(), area.top() + area.height() * 0.58, area.width(), area.height() * 0.42);
            paintCoupled(p, top, bottom, symbol, c, true);
            break;
        }
        default:
            paint(p, area, symbol, c);
            break;
        }
        p.end();
        icon.addPixmap(pixmap);
    }
    return icon;
}

} // namespace Airwright::Ui
