#include "airwright/ui/views/PsychroChartModel.h"

#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/ui/UnitSystem.h"

#include <QStringList>

#include <algorithm>
#include <cmath>

namespace Airwright::Ui {

namespace {

namespace raw = Core::Psychro::detail;
using Kind = UnitSystem::Kind;

// Constants of ASHRAE Fundamentals 2017 ch. 1 eq. 30, kJ/kg.
constexpr double kCpAir = 1.006;       // kJ/(kg K)
constexpr double kCpVapour = 1.86;     // kJ/(kg K)
constexpr double kR0 = 2501.0;         // kJ/kg
// Btu_IT per pound: 2.326 kJ/kg exactly (NIST SP 811 B.8).
constexpr double kKJkgPerBtuLb = 2.326;
// Dry air from 0 °C to 0 °F: the datum shift between SI and IP enthalpy.
constexpr double kDatumShiftKJkg = kCpAir * 160.0 / 9.0; // 17.78 K

// Default extent of the diagrams (SI); widened to show every state of the result.
constexpr double kDefaultTMin = -20.0;
constexpr double kDefaultTMax = 45.0;
constexpr double kDefaultWMax = 22.0; // g/kg
// Hard limits keep the reference lines inside the ranges of the raw kernels.
constexpr double kLimitTMin = -50.0;
constexpr double kLimitTMax = 60.0;

double floorTo(double v, double step) { return std::floor(v / step) * step; }
double ceilTo(double v, double step) { return std::ceil(v / step) * step; }

// Clips a polyline to the frame; keeps the first visible run (the reference lines
// are monotone, so they cross the frame once).
QVector<QPointF> clip(const QVector<QPointF>& in, const PsychroChartModel::Frame& f)
{
    QVector<QPointF> out;
    for (qsizetype i = 1; i < in.size(); ++i) {
        const QPointF a = in[i - 1];
        const QPointF b = in[i];
        // Liang-Barsky on the segment a..b.
        double t0 = 0.0;
        double t1 = 1.0;
        const double dx = b.x() - a.x();
        const double dy = b.y() - a.y();
        const double dir[4] = {-dx, dx, -dy, dy};
        const double room[4] = {a.x() - f.xMin, f.xMax - a.x(), a.y() - f.yMin, f.yMax - a.y()};
        bool visible = true;
        for (int k = 0; k < 4 && visible; ++k) {
            if (dir[k] == 0.0) {
                visible = room[k] >= 0.0;
                continue;
            }
            const double r = room[k] / dir[k];
            if (dir[k] < 0.0)
                t0 = std::max(t0, r);
            else
                t1 = std::min(t1, r);
            visible = t0 <= t1;
        }
        if (!visible) {
            if (!out.isEmpty())
                break;
            continue;
        }
        if (out.isEmpty())
            out.push_back(QPointF(a.x() + t0 * dx, a.y() + t0 * dy));
        out.push_back(QPointF(a.x() + t1 * dx, a.y() + t1 * dy));
        if (t1 < 1.0)
            break; // left the frame
    }
    return out;
}

QPointF pointAlong(const QVector<QPointF>& line, double fraction, const PsychroChartModel::Frame& f)
{
    if (line.isEmpty())
        return {};
    // Length measured in frame fractions so that x and y weigh alike.
    const double sx = 1.0 / std::max(1e-12, f.xMax - f.xMin);
    const double sy = 1.0 / std::max(1e-12, f.yMax - f.yMin);
    auto len = [&](QPointF a, QPointF b) { return std::hypot((b.x() - a.x()) * sx, (b.y() - a.y()) * sy); };
    double total = 0.0;
    for (qsizetype i = 1; i < line.size(); ++i)
        total += len(line[i - 1], line[i]);
    double target = std::clamp(fraction, 0.0, 1.0) * total;
    for (qsizetype i = 1; i < line.size(); ++i) {
        const double l = len(line[i - 1], line[i]);
        if (target <= l && l > 0.0) {
            const double u = target / l;
            return line[i - 1] + u * (line[i] - line[i - 1]);
        }
        target -= l;
    }
    return line.back();
}

// Saturated-air enthalpy, kJ/kg, for the inverse below.
double saturatedEnthalpy(double tC, double p) { return raw::enthalpy(tC, raw::satHumidityRatio(tC, p)) / 1000.0; }

// Dry bulb of saturated air with enthalpy h (kJ/kg), by bisection: h_sat rises with t.
std::optional<double> saturationTemperatureForEnthalpy(double h, double p)
{
    double lo = kLimitTMin;
    double hi = kLimitTMax;
    if (h < saturatedEnthalpy(lo, p) || h > saturatedEnthalpy(hi, p))
        return std::nullopt;
    for (int i = 0; i < 80; ++i) {
        const double mid = 0.5 * (lo + hi);
        (saturatedEnthalpy(mid, p) < h ? lo : hi) = mid;
    }
    return 0.5 * (lo + hi);
}

QString number(double v, int decimals) { return QString::number(v, 'f', decimals); }

} // namespace

double PsychroChartModel::enthalpyToDisplay(double kJkg, bool ip)
{
    return ip ? (kJkg + kDatumShiftKJkg) / kKJkgPerBtuLb : kJkg;
}

double PsychroChartModel::enthalpyFromDisplay(double shown, bool ip)
{
    return ip ? shown * kKJkgPerBtuLb - kDatumShiftKJkg : shown;
}

QPointF PsychroChartModel::position(double temperatureC, double humidityRatio) const
{
    const double gkg = humidityRatio * 1000.0;
    const double w = m_ip ? gkg * 7.0 : gkg; // gr/lb: 7000 gr per lb, so 7 gr/lb per g/kg
    if (m_diagram == Diagram::DryBulbHumidity) {
        const double t = m_ip ? temperatureC * 1.8 + 32.0 : temperatureC;
        return {t, w};
    }
    // Oblique h-x coordinate in temperature units: (h - r0 x) / cpa.
    const double yC = temperatureC * (1.0 + kCpVapour * humidityRatio / kCpAir);
    return {w, m_ip ? yC * 1.8 + 32.0 : yC};
}

void PsychroChartModel::rebuild(const Core::Project::Project& project,
                                const std::optional<Core::Chain::UnitResult>& result, const UnitSystem& units,
                                Diagram diagram)
{
    m_diagram = diagram;
    m_ip = units.system() == UnitSystem::System::IP;
    m_pressure = Core::toPascals(project.unit.site.pressure());
    m_temperatureUnit = units.unit(Kind::Temperature);
    m_humidityUnit = units.unit(Kind::HumidityRatio);
    const QString tAxis = QStringLiteral("dry bulb temperature [%1]").arg(m_temperatureUnit);
    const QString wAxis = QStringLiteral("humidity ratio [%1 dry air]").arg(m_humidityUnit);
    if (m_diagram == Diagram::DryBulbHumidity) {
        m_xLabel = tAxis;
        m_yLabel = wAxis;
    } else {
        m_xLabel = wAxis;
        m_yLabel = tAxis;
    }

    m_processes.clear();
    if (result) {
        for (const auto& c : result->cases) {
            Process process;
            process.caseName = QString::fromStdString(c.caseName);
            if (!c.supply.empty()) {
                process.supply.push_back(makePoint(c.supply.front().inlet, Core::Chain::PathKind::Supply,
                                                   c.supply.front().id, true));
                for (const auto& s : c.supply)
                    process.supply.push_back(makePoint(s.outlet, Core::Chain::PathKind::Supply, s.id, false));
            }
            if (!c.extract.empty()) {
                process.extract.push_back(makePoint(c.extract.front().inlet, Core::Chain::PathKind::Extract,
                                                    c.extract.front().id, true));
                for (const auto& s : c.extract)
                    process.extract.push_back(makePoint(s.outlet, Core::Chain::PathKind::Extract, s.id, false));
            }
            m_processes.push_back(std::move(process));
        }
    }
    buildFrame(result);
    buildLines();
}

PsychroChartModel::StatePoint PsychroChartModel::makePoint(const Core::Sections::AirStream& air,
                                                           Core::Chain::PathKind path, const std::string& id,
                                                           bool atInlet) const
{
    const auto& state = air.state;
    StatePoint p;
    p.path = path;
    p.sectionId = QString::fromStdString(id);
    p.atInlet = atInlet;
    p.temperatureC = Core::toCelsius(state.dryBulb());
    p.humidityRatioGkg = Core::toGramsPerKilogram(state.humidityRatio());
    p.relativeHumidityPct = Core::toPercent(state.relativeHumidity());
    p.enthalpyKJkg = Core::toKilojoulesPerKilogram(state.enthalpy());
    p.position = position(p.temperatureC, p.humidityRatioGkg / 1000.0);
    return p;
}

void PsychroChartModel::buildFrame(const std::optional<Core::Chain::UnitResult>& result)
{
    double tMin = kDefaultTMin;
    double tMax = kDefaultTMax;
    double wMax = kDefaultWMax;
    if (result) {
        for (const auto& c : result->cases)
            for (const auto* path : {&c.supply, &c.extract})
                for (const auto& s : *path)
                    for (const auto* air : {&s.inlet, &s.outlet}) {
                        const double t = Core::toCelsius(air->state.dryBulb());
                        const double w = Core::toGramsPerKilogram(air->state.humidityRatio());
                        tMin = std::min(tMin, floorTo(t - 5.0, 5.0));
                        tMax = std::max(tMax, ceilTo(t + 5.0, 5.0));
                        wMax = std::max(wMax, ceilTo(w * 1.15, 2.0));
                    }
    }
    tMin = std::max(tMin, kLimitTMin);
    tMax = std::min(tMax, kLimitTMax);

    // Round the ends in display units so the axes start and end on whole ticks.
    const double tStep = m_ip ? 10.0 : 5.0;
    const double wStep = m_ip ? 10.0 : 2.0;
    const double t0 = floorTo(m_ip ? tMin * 1.8 + 32.0 : tMin, tStep);
    const double t1 = ceilTo(m_ip ? tMax * 1.8 + 32.0 : tMax, tStep);
    const double w1 = ceilTo(m_ip ? wMax * 7.0 : wMax, wStep);
    if (m_diagram == Diagram::DryBulbHumidity)
        m_frame = {t0, t1, 0.0, w1};
    else
        m_frame = {0.0, w1, t0, t1};
}

void PsychroChartModel::addLine(LineRole role, const QString& label, const QVector<QPointF>& raw,
                                double labelFraction)
{
    Line line;
    line.role = role;
    line.label = label;
    line.points = clip(raw, m_frame);
    if (line.points.size() < 2)
        return;
    line.labelAt = pointAlong(line.points, labelFraction, m_frame);
    m_lines.push_back(std::move(line));
}

void PsychroChartModel::buildLines()
{
    m_lines.clear();
    const double p = m_pressure;
    // Temperature range of the frame in °C (for the Mollier frame the y range is
    // close to it; isotherms rise a little with x, so add a margin).
    double tLo = m_diagram == Diagram::DryBulbHumidity ? m_frame.xMin : m_frame.yMin;
    double tHi = m_diagram == Diagram::DryBulbHumidity ? m_frame.xMax : m_frame.yMax;
    if (m_ip) {
        tLo = (tLo - 32.0) / 1.8;
        tHi = (tHi - 32.0) / 1.8;
    }
    tLo = std::max(kLimitTMin, tLo - 2.0);
    tHi = std::min(kLimitTMax, tHi + 2.0);
    const double dt = 0.25;

    auto curve = [&](auto humidityAt) {
        QVector<QPointF> pts;
        for (double t = tLo; t <= tHi + 1e-9; t += dt)
            pts.push_back(position(t, humidityAt(t)));
        return pts;
    };
    const bool tw = m_diagram == Diagram::DryBulbHumidity;

    addLine(LineRole::Saturation, QStringLiteral("saturation"), curve([&](double t) {
                return raw::satHumidityRatio(t, p);
            }),
            tw ? 0.93 : 0.9);

    for (int rh = 10; rh <= 90; rh += 10) {
        const double f = rh / 100.0;
        // Labels sit near the upper end, staggered a little so neighbours do not touch.
        addLine(LineRole::RelativeHumidity, QStringLiteral("%1 %").arg(rh), curve([&](double t) {
                    return raw::humidityRatioFromVapourPressure(f * raw::satPressure(t), p);
                }),
                tw ? 0.97 - 0.01 * (rh / 10 % 2) : 0.96);
    }

    // Constant enthalpy: from dry air (x = 0) to saturation.
    const double hStep = m_ip ? 5.0 : 10.0;
    const double hLoSI = raw::enthalpy(tLo, 0.0) / 1000.0;
    const double hHiSI = saturatedEnthalpy(tHi, p);
    const double hFirst = ceilTo(enthalpyToDisplay(hLoSI, m_ip), hStep);
    const double hLast = floorTo(enthalpyToDisplay(hHiSI, m_ip), hStep);
    const QString hUnit = m_ip ? QStringLiteral("Btu/lb") : QStringLiteral("kJ/kg");
    for (double shown = hFirst; shown <= hLast + 1e-9; shown += hStep) {
        const double h = enthalpyFromDisplay(shown, m_ip);
        const auto tSat = saturationTemperatureForEnthalpy(h, p);
        if (!tSat)
            continue;
        const double wSat = raw::satHumidityRatio(*tSat, p);
        QVector<QPointF> pts;
        const int n = 24;
        // From saturation to dry air, so the label fraction 0 is on the saturation curve.
        for (int i = 0; i <= n; ++i) {
            const double w = wSat * (1.0 - double(i) / n);
            pts.push_back(position(raw::dryBulbFromEnthalpy(h * 1000.0, w), w));
        }
        addLine(LineRole::Enthalpy, QStringLiteral("%1 %2").arg(number(shown, 0), hUnit), pts, tw ? 0.0 : 1.0);
    }

    if (tw) {
        // Wet bulb lines: from saturation (t = t*) to dry air.
        const double step = m_ip ? 10.0 : 5.0;
        const double first = ceilTo(m_ip ? tLo * 1.8 + 32.0 : tLo, step);
        const double last = floorTo(m_ip ? tHi * 1.8 + 32.0 : tHi, step);
        for (double shown = first; shown <= last + 1e-9; shown += step) {
            const double twb = m_ip ? (shown - 32.0) / 1.8 : shown;
            QVector<QPointF> pts;
            double prevT = twb;
            double prevW = raw::satHumidityRatio(twb, p);
            pts.push_back(position(prevT, prevW));
            for (double t = twb + 1.0; t <= kLimitTMax; t += 1.0) {
                const double w = raw::humidityRatioFromWetBulb(t, twb, p);
                if (w <= 0.0) {
                    // End on the dry-air axis.
                    const double u = prevW / (prevW - w);
                    pts.push_back(position(prevT + u * (t - prevT), 0.0));
                    break;
                }
                pts.push_back(position(t, w));
                prevT = t;
                prevW = w;
            }
            addLine(LineRole::WetBulb, QStringLiteral("%1 %2 wb").arg(number(shown, 0), m_temperatureUnit), pts,
                    0.0);
        }
    } else {
        // Isotherms of the h-x diagram: from dry air to saturation.
        const double step = m_ip ? 10.0 : 5.0;
        const double first = ceilTo(m_ip ? tLo * 1.8 + 32.0 : tLo, step);
        const double last = floorTo(m_ip ? tHi * 1.8 + 32.0 : tHi, step);
        for (double shown = first; shown <= last + 1e-9; shown += step) {
            const double t = m_ip ? (shown - 32.0) / 1.8 : shown;
            const double wSat = raw::satHumidityRatio(t, p);
            const QVector<QPointF> pts{position(t, 0.0), position(t, 0.5 * wSat), position(t, wSat)};
            addLine(LineRole::Isotherm, QStringLiteral("%1 %2").arg(number(shown, 0), m_temperatureUnit), pts, 1.0);
        }
    }
}

QVector<std::pair<QPointF, QPointF>> PsychroChartModel::segmentsOf(const QString& sectionId) const
{
    QVector<std::pair<QPointF, QPointF>> out;
    if (sectionId.isEmpty())
        return out;
    for (const auto& process : m_processes)
        for (const auto* path : {&process.supply, &process.extract})
            for (qsizetype i = 1; i < path->size(); ++i)
                if ((*path)[i].sectionId == sectionId)
                    out.push_back({(*path)[i - 1].position, (*path)[i].position});
    return out;
}

QString PsychroChartModel::describe(const Process& process, const StatePoint& point, const UnitSystem& units) const
{
    return describe(process, QVector<StatePoint>{point}, units);
}

QString PsychroChartModel::describe(const Process& process, const QVector<StatePoint>& samePlace,
                                    const UnitSystem& units) const
{
    if (samePlace.isEmpty())
        return {};
    const StatePoint& point = samePlace.front();
    const bool ip = units.system() == UnitSystem::System::IP;
    const QString pathName =
        point.path == Core::Chain::PathKind::Supply ? QStringLiteral("supply air") : QStringLiteral("extract air");
    QStringList where;
    for (const auto& p : samePlace)
        where.push_back(p.atInlet ? QStringLiteral("entering %1").arg(p.sectionId)
                                  : QStringLiteral("leaving %1").arg(p.sectionId));
    const QString h = QStringLiteral("%1 %2").arg(number(enthalpyToDisplay(point.enthalpyKJkg, ip), 1),
                                                  ip ? QStringLiteral("Btu/lb") : QStringLiteral("kJ/kg"));
    return QStringLiteral("%1, %2\n%3\nt %4   RH %5 %\nW %6   h %7")
        .arg(process.caseName, pathName, where.join(QStringLiteral(", ")),
             units.format(Kind::Temperature, point.temperatureC), number(point.relativeHumidityPct, 0),
             units.format(Kind::HumidityRatio, point.humidityRatioGkg), h);
}

} // namespace Airwright::Ui
