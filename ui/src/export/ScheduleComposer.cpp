#include "ScheduleComposer.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/checks/Regulation1253.h"
#include "airwright/core/checks/SfpCategory.h"
#include "airwright/core/checks/VelocityClass.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/export/PdfPager.h"
#include "airwright/ui/export/PdfTable.h"
#include "airwright/ui/export/PressureProfilePainter.h"
#include "airwright/ui/export/PsychroChartPainter.h"
#include "airwright/ui/views/PressureProfileModel.h"
#include "airwright/ui/views/PsychroChartModel.h"

#include <QPainter>

#include <algorithm>
#include <cmath>
#include <map>
#include <set>

namespace Airwright::Ui {

using namespace Airwright::Core;
using Chain::FigureKind;
using Chain::PathKind;

namespace {

// Design cases side by side: at most this many value columns per table; more
// cases continue in a second table under the first.
constexpr int kCasesPerTable = 4;

QString q(const std::string& text) { return QString::fromStdString(text); }

// Dimensionless ratios the figures carry as 0..1, printed as percentages.
bool printedAsPercent(const std::string& key)
{
    static const std::set<std::string> keys = {"effectiveness_t", "effectiveness_x", "eta_t_1253", "bypass_fraction",
                                               "recovered_fraction"};
    return keys.count(key) > 0;
}

QString plainWords(const std::string& key)
{
    QString text = q(key);
    text.replace(QLatin1Char('_'), QLatin1Char(' '));
    return text;
}

QString severityWord(Severity s)
{
    switch (s) {
    case Severity::Info:
        return QStringLiteral("note");
    case Severity::Warning:
        return QStringLiteral("warning");
    case Severity::Error:
        return QStringLiteral("error");
    }
    return {};
}

QString complianceWord(Checks::Compliance c)
{
    switch (c) {
    case Checks::Compliance::Pass:
        return QStringLiteral("meets");
    case Checks::Compliance::Fail:
        return QStringLiteral("does not meet");
    case Checks::Compliance::NotAssessed:
        return QStringLiteral("not assessed");
    }
    return {};
}

QString filterConstructionWord(Sections::FilterConstruction c)
{
    return q(Sections::filterConstructionKey(c));
}

} // namespace

ScheduleComposer::ScheduleComposer(PdfPager& pager, const Project::Project& project, const Chain::UnitResult& result,
                                   const UnitSystem& units, const Core::Annual::ComparisonResult* comparison)
    : m_pager(pager), m_project(project), m_result(result), m_units(units), m_comparison(comparison), m_format(units)
{
    // The checks need results that fit the unit; a schedule is still worth
    // printing without them, so their failure is reported in the document.
    try {
        m_assessment = Checks::assessUnit(project.unit, result);
    } catch (const Core::Error& e) {
        m_assessmentError = QString::fromUtf8(e.what());
    }
    try {
        m_points = Checks::measurementPoints(project.unit, result);
    } catch (const Core::Error& e) {
        m_pointsError = QString::fromUtf8(e.what());
    }
}

void ScheduleComposer::compose()
{
    titleBlock();
    siteAndAirflows();
    designCases();
    unitSummary();
    pathSchedule(PathKind::Supply);
    pathSchedule(PathKind::Extract);
    filterGroups();
    fans();
    heatRecovery();
    comparison();
    charts();
    pointsSheet();
    findings();
    cautions();
}

// ---------------------------------------------------------------------------
// Building blocks

QString ScheduleComposer::nextChapter(const QString& title)
{
    return QStringLiteral("%1  %2").arg(++m_chapter).arg(title);
}

void ScheduleComposer::heading(const QString& text)
{
    const QFont font = PdfStyle::font(PdfStyle::Heading);
    const double h = m_pager.metrics(font).height() + m_pager.mm(2.5);
    // A heading keeps at least a few rows of its content with it.
    if (m_pager.remaining() < h + m_pager.mm(35.0))
        m_pager.newPage();
    if (!m_pager.pageIsEmpty())
        m_pager.space(m_pager.mm(3.0));
    const QRectF r = m_pager.take(h);
    const double rule = m_pager.mm(0.3);
    m_pager.draw([=](QPainter& p) {
        p.setFont(font);
        p.setPen(PdfStyle::accent());
        p.drawText(r.adjusted(0, 0, 0, -rule * 4), Qt::AlignLeft | Qt::AlignBottom, text);
        p.setPen(QPen(PdfStyle::accent(), rule));
        p.drawLine(r.bottomLeft() - QPointF(0, rule * 2), r.bottomRight() - QPointF(0, rule * 2));
    });
    m_pager.space(m_pager.mm(1.5));
}

void ScheduleComposer::subheading(const QString& text, double keepWithNextMm)
{
    const QFont font = PdfStyle::font(PdfStyle::Subheading);
    const QFontMetricsF fm = m_pager.metrics(font);
    const double w = m_pager.width();
    const double h = fm.boundingRect(QRectF(0, 0, w, 1e9), Qt::TextWordWrap, text).height() + m_pager.mm(1.5);
    if (m_pager.remaining() < h + m_pager.mm(keepWithNextMm))
        m_pager.newPage();
    if (!m_pager.pageIsEmpty())
        m_pager.space(m_pager.mm(2.0));
    const QRectF r = m_pager.take(h);
    m_pager.draw([=](QPainter& p) {
        p.setFont(font);
        p.setPen(PdfStyle::text());
        p.drawText(r, Qt::AlignLeft | Qt::AlignBottom | Qt::TextWordWrap, text);
    });
    m_pager.space(m_pager.mm(0.8));
}

void ScheduleComposer::paragraph(const QString& text, PdfStyle::Role role, const QColor& colour)
{
    const QFont font = PdfStyle::font(role);
    const QFontMetricsF fm = m_pager.metrics(font);
    const double w = m_pager.width();
    const double h = fm.boundingRect(QRectF(0, 0, w, 1e9), Qt::TextWordWrap, text).height() + m_pager.mm(1.2);
    const QRectF r = m_pager.take(h);
    const QColor c = colour.isValid() ? colour : PdfStyle::text();
    m_pager.draw([=](QPainter& p) {
        p.setFont(font);
        p.setPen(c);
        p.drawText(r, Qt::AlignLeft | Qt::AlignTop | Qt::TextWordWrap, text);
    });
}

std::vector<PdfTable> ScheduleComposer::caseTables(const std::vector<CaseRow>& rows) const
{
    std::vector<PdfTable> tables;
    const int cases = static_cast<int>(m_result.cases.size());
    for (int first = 0; first < std::max(cases, 1); first += kCasesPerTable) {
        const int count = std::min(kCasesPerTable, cases - first);
        std::vector<PdfTable::Column> columns{{QStringLiteral("quantity"), 3.2, Qt::AlignLeft},
                                              {QStringLiteral("unit"), 0.9, Qt::AlignLeft}};
        for (int i = 0; i < count; ++i)
            columns.push_back({q(m_result.cases[static_cast<std::size_t>(first + i)].caseName), 1.9, Qt::AlignRight});
        // Narrow tables for few cases: the value columns keep a readable width.
        for (int i = count; i < kCasesPerTable; ++i)
            columns.push_back({QString(), 1.9, Qt::AlignRight});
        PdfTable table(columns);
        for (const auto& row : rows) {
            if (row.values.isEmpty() && row.unit.isEmpty()) {
                table.addGroup(row.label);
                continue;
            }
            QStringList cells{row.label, row.unit};
            for (int i = 0; i < count; ++i)
                cells << row.values.value(first + i);
            table.addRow(cells);
        }
        tables.push_back(std::move(table));
    }
    return tables;
}

void ScheduleComposer::caseTable(const std::vector<CaseRow>& rows, bool keepTogether)
{
    auto tables = caseTables(rows);
    for (std::size_t i = 0; i < tables.size(); ++i) {
        tables[i].setKeepTogether(keepTogether);
        tables[i].place(m_pager);
        if (i + 1 < tables.size())
            m_pager.space(m_pager.mm(2.0));
    }
}

void ScheduleComposer::keyValues(const std::vector<std::pair<QString, QString>>& rows)
{
    PdfTable table({{QString(), 1.0, Qt::AlignLeft}, {QString(), 2.2, Qt::AlignLeft}});
    table.setShowHeader(false);
    for (const auto& [key, value] : rows)
        table.addRow({key, value});
    table.place(m_pager);
}

const Chain::SectionResult* ScheduleComposer::resultOf(std::size_t caseIndex, PathKind path,
                                                       const std::string& id) const
{
    if (caseIndex >= m_result.cases.size())
        return nullptr;
    return m_result.cases[caseIndex].find(path, id);
}

const Chain::Section* ScheduleComposer::specOf(const std::string& id) const
{
    for (const auto* path : {&m_project.unit.supply, &m_project.unit.extract})
        for (const auto& s : *path)
            if (s.id == id && !std::holds_alternative<Chain::CoupledSide>(s.spec))
                return &s;
    return nullptr;
}

QString ScheduleComposer::sectionNumber(PathKind path, std::size_t index) const
{
    return QStringLiteral("%1%2").arg(path == PathKind::Supply ? QStringLiteral("S") : QStringLiteral("E")).arg(index + 1);
}

QString ScheduleComposer::typeLabel(PathKind path, const Chain::Section& section) const
{
    if (std::holds_alternative<Chain::CoupledSide>(section.spec)) {
        const auto* spec = specOf(section.id);
        return spec ? q(Chain::sectionTypeLabel(spec->spec)) + QStringLiteral(", extract side")
                    : QStringLiteral("coupled section");
    }
    QString label = q(Chain::sectionTypeLabel(section.spec));
    if (const auto* hr = std::get_if<Recovery::HeatRecovery>(&section.spec))
        label += QStringLiteral(" (%1)").arg(q(Recovery::exchangerKindLabel(hr->kind)));
    if (const auto* passive = std::get_if<Sections::PassiveSection>(&section.spec))
        label = plainWords(Sections::passiveKindKey(passive->kind)) + QStringLiteral(" section");
    if (path == PathKind::Supply && Chain::isCoupled(section.spec))
        label += QStringLiteral(", supply side");
    return label;
}

const Chain::DesignCase* ScheduleComposer::designCase(const std::string& name) const
{
    for (const auto& c : m_project.unit.cases)
        if (c.name == name)
            return &c;
    return nullptr;
}

QString ScheduleComposer::figureValue(const Chain::Figure& f) const
{
    using K = FigureKind;
    if (f.kind == K::Text)
        return plainWords(f.text);
    if (printedAsPercent(f.key))
        return ScheduleUnits::fixed(f.value * 100.0, 1);
    if (f.key == "sfp_W_per_m3s")
        return m_format.sfp(f.value).section(QLatin1Char(' '), 0, 0);
    if (f.key == "shr" || f.key == "bypass_factor" || f.key == "loss_coefficient")
        return ScheduleUnits::fixed(f.value, 2);
    if (f.key == "oacf")
        return ScheduleUnits::fixed(f.value, 3);
    return m_format.number(f.kind, f.value);
}

QString ScheduleComposer::figureUnit(const Chain::Figure& f) const
{
    if (f.kind == FigureKind::Text)
        return {};
    if (printedAsPercent(f.key))
        return QStringLiteral("%");
    if (f.key == "sfp_W_per_m3s")
        return m_format.sfpUnit();
    return m_format.unit(f.kind);
}

QString ScheduleComposer::pointValue(const Checks::PointValue& value) const
{
    return std::visit(
        [this](const auto& v) -> QString {
            using Q = std::decay_t<decltype(v)>;
            if constexpr (std::is_same_v<Q, AbsoluteTemperature>)
                return m_format.withUnit(FigureKind::Temperature, toCelsius(v));
            else if constexpr (std::is_same_v<Q, Ratio>)
                return ScheduleUnits::fixed(toPercent(v), 0) + QStringLiteral(" %");
            else if constexpr (std::is_same_v<Q, Pressure>)
                return m_format.withUnit(FigureKind::Pressure, toPascals(v));
            else
                return m_format.withUnit(FigureKind::AirVolumeFlow, toCubicMetresPerHour(v));
        },
        value);
}

// ---------------------------------------------------------------------------
// Chapters

void ScheduleComposer::titleBlock()
{
    const auto& info = m_project.info;
    const QFont title = PdfStyle::font(PdfStyle::Title);
    const QString name = info.name.empty() ? QStringLiteral("(unnamed project)") : q(info.name);
    const QFontMetricsF fm = m_pager.metrics(title);
    const double nameHeight =
        fm.boundingRect(QRectF(0, 0, m_pager.width(), 1e9), Qt::TextWordWrap, name).height();
    const QRectF r = m_pager.take(m_pager.mm(7.0) + nameHeight + m_pager.mm(2.0));
    const QFont sub = PdfStyle::font(PdfStyle::Subheading);
    const double line = m_pager.mm(7.0);
    m_pager.draw([=](QPainter& p) {
        p.setFont(sub);
        p.setPen(PdfStyle::accent());
        p.drawText(QRectF(r.left(), r.top(), r.width(), line), Qt::AlignLeft | Qt::AlignVCenter,
                   QStringLiteral("Air handling unit: section schedule"));
        p.setFont(title);
        p.setPen(PdfStyle::text());
        p.drawText(QRectF(r.left(), r.top() + line, r.width(), nameHeight), Qt::AlignLeft | Qt::TextWordWrap, name);
    });
    m_pager.space(m_pager.mm(1.5));
    std::vector<std::pair<QString, QString>> rows{
        {QStringLiteral("Project"), name},
        {QStringLiteral("Reference"), info.reference.empty() ? QStringLiteral("-") : q(info.reference)},
        {QStringLiteral("Designer"), info.designer.empty() ? QStringLiteral("-") : q(info.designer)},
        {QStringLiteral("Date"), info.date.empty() ? QStringLiteral("-") : q(info.date)},
        {QStringLiteral("Revision"), info.revision.empty() ? QStringLiteral("-") : q(info.revision)},
        {QStringLiteral("Units"), m_format.ip() ? QStringLiteral("IP (inch-pound)") : QStringLiteral("SI")},
    };
    if (!info.notes.empty())
        rows.push_back({QStringLiteral("Notes"), q(info.notes)});
    keyValues(rows);
    m_pager.space(m_pager.mm(1.5));
    paragraph(QStringLiteral("A design aid: every figure below is computed from the inputs and methods named in this "
                             "schedule, not taken from any product's certified data. Read the cautions in the last "
                             "chapter before using it."),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::siteAndAirflows()
{
    heading(nextChapter(QStringLiteral("Site, airflows and casing")));
    const auto& unit = m_project.unit;
    const auto& a = unit.airflows;
    const auto& s = m_result.sizing;
    std::vector<std::pair<QString, QString>> rows;
    if (unit.site.barometricPressure)
        rows.push_back({QStringLiteral("Site pressure"),
                        m_format.sitePressurePa(toPascals(*unit.site.barometricPressure)) + QStringLiteral(" (given)")});
    else
        rows.push_back({QStringLiteral("Site"),
                        QStringLiteral("altitude %1, standard atmosphere %2")
                            .arg(m_format.altitudeM(toMetres(unit.site.altitude.value_or(metres(0.0)))),
                                 m_format.sitePressurePa(toPascals(unit.site.pressure())))});
    const QString basis = a.basis == Chain::FlowBasis::StandardAir
                              ? QStringLiteral("standard air, 1.2 kg/m³")
                              : QStringLiteral("actual, at the path's inlet state");
    rows.push_back({QStringLiteral("Supply airflow"),
                    m_format.withUnit(FigureKind::AirVolumeFlow, toCubicMetresPerHour(a.supply)) + QStringLiteral(" (")
                        + basis + QStringLiteral(")")});
    rows.push_back({QStringLiteral("Extract airflow"),
                    m_format.withUnit(FigureKind::AirVolumeFlow, toCubicMetresPerHour(a.extract))});
    rows.push_back({QStringLiteral("External pressure, supply"),
                    QStringLiteral("%1 before the unit, %2 after it")
                        .arg(m_format.withUnit(FigureKind::Pressure, toPascals(a.supplyExternalBefore)),
                             m_format.withUnit(FigureKind::Pressure, toPascals(a.supplyExternalAfter)))});
    rows.push_back({QStringLiteral("External pressure, extract"),
                    QStringLiteral("%1 before the unit, %2 after it")
                        .arg(m_format.withUnit(FigureKind::Pressure, toPascals(a.extractExternalBefore)),
                             m_format.withUnit(FigureKind::Pressure, toPascals(a.extractExternalAfter)))});
    rows.push_back({QStringLiteral("Casing, inner (one deck)"),
                    QStringLiteral("%1 wide x %2 high, cross-section %3 (%4)")
                        .arg(m_format.lengthMm(toMillimetres(s.width)), m_format.lengthMm(toMillimetres(s.height)),
                             m_format.areaM2(toSquareMetres(s.crossSection)),
                             s.sizedAutomatically
                                 ? QStringLiteral("sized for at most %1 face velocity")
                                       .arg(m_format.withUnit(FigureKind::Velocity,
                                                              toMetresPerSecond(unit.casing.targetFaceVelocity)))
                                 : QStringLiteral("fixed by the designer"))});
    rows.push_back({QStringLiteral("Length"), QStringLiteral("supply path %1, extract path %2, unit %3")
                                                  .arg(m_format.lengthMm(toMillimetres(s.supplyLength)),
                                                       m_format.lengthMm(toMillimetres(s.extractLength)),
                                                       m_format.lengthMm(toMillimetres(s.unitLength)))});
    keyValues(rows);
}

void ScheduleComposer::designCases()
{
    heading(nextChapter(QStringLiteral("Design conditions and results per case")));
    const auto n = m_result.cases.size();
    auto row = [&](const QString& label, const QString& unit, auto valueOf) {
        CaseRow r{label, unit, {}};
        for (std::size_t i = 0; i < n; ++i) {
            const auto* dc = designCase(m_result.cases[i].caseName);
            r.values << (dc ? valueOf(*dc, m_result.cases[i]) : QStringLiteral("-"));
        }
        return r;
    };
    using DC = Chain::DesignCase;
    using CR = Chain::CaseResult;
    const auto t = [&](AbsoluteTemperature v) { return m_format.number(FigureKind::Temperature, toCelsius(v)); };
    const auto pct = [](Ratio v) { return ScheduleUnits::fixed(toPercent(v), 0); };
    std::vector<CaseRow> rows;
    rows.push_back({QStringLiteral("Conditions"), {}, {}});
    rows.push_back(row(QStringLiteral("outdoor air, dry bulb"), m_format.unit(FigureKind::Temperature),
                       [&](const DC& c, const CR&) { return t(c.outdoorTemperature); }));
    rows.push_back(row(QStringLiteral("outdoor air, relative humidity"), QStringLiteral("%"),
                       [&](const DC& c, const CR&) { return pct(c.outdoorHumidity); }));
    rows.push_back(row(QStringLiteral("room (extract) air, dry bulb"), m_format.unit(FigureKind::Temperature),
                       [&](const DC& c, const CR&) { return t(c.roomTemperature); }));
    rows.push_back(row(QStringLiteral("room (extract) air, relative humidity"), QStringLiteral("%"),
                       [&](const DC& c, const CR&) { return pct(c.roomHumidity); }));
    rows.push_back(row(QStringLiteral("supply air setpoint"), m_format.unit(FigureKind::Temperature),
                       [&](const DC& c, const CR&) { return t(c.supplySetpoint); }));
    rows.push_back(row(QStringLiteral("supply humidity, minimum / maximum"), QStringLiteral("%"),
                       [&](const DC& c, const CR&) {
                           return (c.minimumSupplyHumidity ? pct(*c.minimumSupplyHumidity) : QStringLiteral("-"))
                                  + QStringLiteral(" / ")
                                  + (c.maximumSupplyHumidity ? pct(*c.maximumSupplyHumidity) : QStringLiteral("-"));
                       }));
    rows.push_back(row(QStringLiteral("dehumidify with reheat"), {},
                       [](const DC& c, const CR&) { return c.dehumidifyWithReheat ? QStringLiteral("yes") : QStringLiteral("no"); }));
    rows.push_back(row(QStringLiteral("filter condition (EN 13053 design = mean)"), {},
                       [](const DC& c, const CR&) { return q(Sections::filterConditionKey(c.filterCondition)); }));
    rows.push_back(row(QStringLiteral("airflow, share of design"), QStringLiteral("%"),
                       [&](const DC& c, const CR&) { return pct(c.airflowFraction); }));

    const auto kw = [&](Power p) { return m_format.number(FigureKind::Power, toKilowatts(p)); };
    rows.push_back({QStringLiteral("Results"), {}, {}});
    rows.push_back(row(QStringLiteral("supply airflow at the outlet (actual)"), m_format.unit(FigureKind::AirVolumeFlow),
                       [&](const DC&, const CR& r) {
                           return m_format.number(FigureKind::AirVolumeFlow, toCubicMetresPerHour(r.totals.supplyFlow));
                       }));
    rows.push_back(row(QStringLiteral("extract airflow at the inlet (actual)"), m_format.unit(FigureKind::AirVolumeFlow),
                       [&](const DC&, const CR& r) {
                           return m_format.number(FigureKind::AirVolumeFlow, toCubicMetresPerHour(r.totals.extractFlow));
                       }));
    rows.push_back(row(QStringLiteral("supply air leaving the unit"), m_format.unit(FigureKind::Temperature),
                       [&](const DC&, const CR& r) {
                           return r.supply.empty() ? QStringLiteral("-") : t(r.supply.back().outlet.state.dryBulb());
                       }));
    rows.push_back(row(QStringLiteral("heating, all coils and heaters"), m_format.unit(FigureKind::Power),
                       [&](const DC&, const CR& r) { return kw(r.totals.heating); }));
    rows.push_back(row(QStringLiteral("cooling, coil loads"), m_format.unit(FigureKind::Power),
                       [&](const DC&, const CR& r) { return kw(r.totals.cooling); }));
    rows.push_back(row(QStringLiteral("heat recovered to the supply"), m_format.unit(FigureKind::Power),
                       [&](const DC&, const CR& r) { return kw(r.totals.heatRecovered); }));
    rows.push_back(row(QStringLiteral("humidification"), m_format.unit(FigureKind::MassFlowPerHour),
                       [&](const DC&, const CR& r) {
                           return m_format.number(FigureKind::MassFlowPerHour,
                                                  toKilogramsPerSecond(r.totals.humidification) * 3600.0);
                       }));
    rows.push_back(row(QStringLiteral("fan electric power, both fans"), m_format.unit(FigureKind::Power),
                       [&](const DC&, const CR& r) { return kw(r.totals.fanElectricPower); }));
    rows.push_back(row(QStringLiteral("pump power (run-around loops)"), m_format.unit(FigureKind::Power),
                       [&](const DC&, const CR& r) { return kw(r.totals.pumpPower); }));
    rows.push_back(row(QStringLiteral("specific fan power SFP (EN 16798-3)"), m_format.sfpUnit(),
                       [&](const DC&, const CR& r) {
                           return m_format.sfp(toWattsPerCubicMetrePerSecond(r.totals.specificFanPower))
                               .section(QLatin1Char(' '), 0, 0);
                       }));
    rows.push_back(row(QStringLiteral("solver"), {}, [](const DC&, const CR& r) {
        return r.converged ? QStringLiteral("converged, %1 passes").arg(r.iterations) : QStringLiteral("NOT CONVERGED");
    }));
    caseTable(rows, false);
}

void ScheduleComposer::unitSummary()
{
    heading(nextChapter(QStringLiteral("Unit summary and classes")));
    if (!m_assessment) {
        paragraph(QStringLiteral("Classes and regulation checks could not be assessed: %1").arg(m_assessmentError),
                  PdfStyle::Body, PdfStyle::warning());
        return;
    }
    const auto& a = *m_assessment;
    const auto& s = m_result.sizing;
    std::vector<std::pair<QString, QString>> rows;
    rows.push_back({QStringLiteral("Dimensions"),
                    QStringLiteral("%1 wide x %2 high per deck, %3 long")
                        .arg(m_format.lengthMm(toMillimetres(s.width)), m_format.lengthMm(toMillimetres(s.height)),
                             m_format.lengthMm(toMillimetres(s.unitLength)))});
    rows.push_back({QStringLiteral("Nominal flow (larger design flow)"),
                    m_format.withUnit(FigureKind::AirVolumeFlow, toCubicMetresPerHour(a.nominalFlow))});
    rows.push_back({QStringLiteral("Velocity class EN 13053"),
                    QStringLiteral("%1: %2 over the inner cross-section at nominal flow")
                        .arg(q(Checks::velocityClassLabel(a.velocityClass)),
                             m_format.withUnit(FigureKind::Velocity, toMetresPerSecond(a.faceVelocity)))});
    rows.push_back({QStringLiteral("Unit type"), a.twoDirection ? QStringLiteral("two-direction (a fan in each path)")
                                                                 : QStringLiteral("one-direction")});
    rows.push_back({QStringLiteral("Heat recovery"),
                    a.recoveryKind ? q(Recovery::exchangerKindLabel(*a.recoveryKind)) : QStringLiteral("none")});
    rows.push_back({QStringLiteral("Regulation (EU) No 1253/2014 (2018 tier)"),
                    QStringLiteral("%1 the requirements checked here").arg(complianceWord(a.compliance))});
    keyValues(rows);
    m_pager.space(m_pager.mm(2.0));

    std::vector<CaseRow> table;
    const auto perCase = [&](const QString& label, const QString& unit, auto valueOf) {
        CaseRow r{label, unit, {}};
        for (const auto& c : m_result.cases) {
            const auto it = std::find_if(a.cases.begin(), a.cases.end(),
                                         [&](const Checks::CaseAssessment& x) { return x.caseName == c.caseName; });
            r.values << (it == a.cases.end() ? QStringLiteral("-") : valueOf(*it));
        }
        table.push_back(r);
    };
    using CA = Checks::CaseAssessment;
    const auto sfpNumber = [&](SpecificFanPower v) {
        return m_format.sfp(toWattsPerCubicMetrePerSecond(v)).section(QLatin1Char(' '), 0, 0);
    };
    perCase(QStringLiteral("SFP, both fans over the larger flow"), m_format.sfpUnit(),
            [&](const CA& c) { return sfpNumber(c.specificFanPower); });
    perCase(QStringLiteral("SFP category EN 16798-3"), {},
            [&](const CA& c) { return q(Checks::sfpCategoryLabel(c.sfpCategory)); });
    perCase(QStringLiteral("largest section face velocity (at full flow)"), m_format.unit(FigureKind::Velocity),
            [&](const CA& c) { return m_format.number(FigureKind::Velocity, toMetresPerSecond(c.faceVelocity)); });
    perCase(QStringLiteral("velocity class EN 13053 of it"), {},
            [&](const CA& c) { return q(Checks::velocityClassLabel(c.velocityClass)); });
    perCase(QStringLiteral("SFPint, supply + extract (EU 1253/2014)"), m_format.sfpUnit(),
            [&](const CA& c) { return c.sfpInt ? sfpNumber(c.sfpInt->total) : QStringLiteral("-"); });
    perCase(QStringLiteral("SFPint limit = base + E - F"), m_format.sfpUnit(), [&](const CA& c) {
        return c.sfpIntLimit ? sfpNumber(c.sfpIntLimit->limit) : QStringLiteral("-");
    });
    perCase(QStringLiteral("  base / bonus E / filter correction F"), m_format.sfpUnit(), [&](const CA& c) {
        if (!c.sfpIntLimit)
            return QStringLiteral("-");
        const auto& l = *c.sfpIntLimit;
        return sfpNumber(l.base) + QStringLiteral(" / ") + sfpNumber(l.efficiencyBonus) + QStringLiteral(" / ")
               + sfpNumber(l.filterCorrection);
    });
    perCase(QStringLiteral("heat recovery thermal efficiency (EU 1253/2014)"), QStringLiteral("%"), [&](const CA& c) {
        return c.sfpIntLimit && a.recoveryKind ? ScheduleUnits::fixed(toPercent(c.sfpIntLimit->thermalEfficiency), 1)
                                               : QStringLiteral("-");
    });
    perCase(QStringLiteral("  its minimum"), QStringLiteral("%"), [&](const CA& c) {
        return c.sfpIntLimit ? ScheduleUnits::fixed(toPercent(Checks::minimumThermalEfficiency(c.sfpIntLimit->runAround)), 0)
                             : QStringLiteral("-");
    });
    perCase(QStringLiteral("Regulation (EU) No 1253/2014"), {},
            [&](const CA& c) { return complianceWord(c.compliance); });
    caseTable(table, true);
    paragraph(QStringLiteral("SFPint uses the fans' overall efficiency in place of the static one the regulation "
                             "names, so it reads slightly low; only cases at 100 % airflow are held against the "
                             "regulation (docs/regulation.md lists every figure and its source)."),
              PdfStyle::Small, PdfStyle::mutedText());
}

std::vector<ScheduleComposer::CaseRow> ScheduleComposer::sectionRows(PathKind path, const std::string& id) const
{
    const std::size_t n = m_result.cases.size();
    std::vector<const Chain::SectionResult*> results;
    for (std::size_t i = 0; i < n; ++i)
        results.push_back(resultOf(i, path, id));
    const auto anyResult = std::find_if(results.begin(), results.end(), [](const auto* r) { return r != nullptr; });
    std::vector<CaseRow> rows;
    if (anyResult == results.end())
        return rows;

    const auto perCase = [&](const QString& label, const QString& unit, auto valueOf) {
        CaseRow r{label, unit, {}};
        for (const auto* s : results)
            r.values << (s ? valueOf(*s) : QStringLiteral("-"));
        rows.push_back(r);
    };
    const auto anyNonZero = [&](auto get) {
        return std::any_of(results.begin(), results.end(), [&](const auto* s) { return s && std::abs(get(*s)) > 1e-9; });
    };
    using SR = Chain::SectionResult;
    const QString tUnit = m_format.unit(FigureKind::Temperature);
    const auto stateText = [&](const Sections::AirStream& air) {
        const auto& st = air.state;
        return m_format.number(FigureKind::Temperature, toCelsius(st.dryBulb())) + QStringLiteral(" / ")
               + ScheduleUnits::fixed(toPercent(st.relativeHumidity()), 0) + QStringLiteral(" / ")
               + m_format.number(FigureKind::HumidityRatio, toGramsPerKilogram(st.humidityRatio()));
    };
    const QString stateUnit = tUnit + QStringLiteral(" / % / ") + m_format.unit(FigureKind::HumidityRatio);
    const bool fan = (*anyResult)->typeKey == "fan";

    perCase(QStringLiteral("air flow at inlet (actual)"), m_format.unit(FigureKind::AirVolumeFlow), [&](const SR& s) {
        return m_format.number(FigureKind::AirVolumeFlow, toCubicMetresPerHour(s.inletFlow));
    });
    perCase(QStringLiteral("face velocity"), m_format.unit(FigureKind::Velocity),
            [&](const SR& s) { return m_format.number(FigureKind::Velocity, toMetresPerSecond(s.faceVelocity)); });
    perCase(fan ? QStringLiteral("pressure rise") : QStringLiteral("pressure drop"), m_format.unit(FigureKind::Pressure),
            [&](const SR& s) {
                return m_format.number(FigureKind::Pressure, fan ? -toPascals(s.pressureDrop) : toPascals(s.pressureDrop));
            });
    perCase(QStringLiteral("static pressure in > out"), m_format.unit(FigureKind::Pressure), [&](const SR& s) {
        return m_format.number(FigureKind::Pressure, toPascals(s.staticPressureIn)) + QStringLiteral(" > ")
               + m_format.number(FigureKind::Pressure, toPascals(s.staticPressureOut));
    });
    perCase(QStringLiteral("air in: t / RH / W"), stateUnit, [&](const SR& s) { return stateText(s.inlet); });
    perCase(QStringLiteral("air out: t / RH / W"), stateUnit, [&](const SR& s) { return stateText(s.outlet); });
    perCase(QStringLiteral("enthalpy in > out"), m_format.enthalpyUnit(), [&](const SR& s) {
        return m_format.enthalpyKJkg(toKilojoulesPerKilogram(s.inlet.state.enthalpy())).section(QLatin1Char(' '), 0, 0)
               + QStringLiteral(" > ")
               + m_format.enthalpyKJkg(toKilojoulesPerKilogram(s.outlet.state.enthalpy())).section(QLatin1Char(' '), 0, 0);
    });
    if (anyNonZero([](const SR& s) { return toKilowatts(s.duty); }))
        perCase(QStringLiteral("duty to the air (+ heats)"), m_format.unit(FigureKind::Power),
                [&](const SR& s) { return m_format.number(FigureKind::Power, toKilowatts(s.duty)); });
    if (anyNonZero([](const SR& s) { return toKilogramsPerSecond(s.waterRemoved); }))
        perCase(QStringLiteral("condensate leaving the air"), m_format.unit(FigureKind::MassFlowPerHour), [&](const SR& s) {
            return m_format.number(FigureKind::MassFlowPerHour, toKilogramsPerSecond(s.waterRemoved) * 3600.0);
        });

    // The type's own figures, in the order SectionFigures gives them. The extract
    // side of a heat exchanger repeats only what belongs to that side.
    static const std::set<std::string> extractSideKeys = {"condensate_kgh", "dp_clean_Pa", "frost_alarm_dp_Pa",
                                                          "supply_minus_extract_Pa", "recirculated_kgs"};
    const bool coupledExtract = path == PathKind::Extract
                                && ((*anyResult)->typeKey == "heat_recovery" || (*anyResult)->typeKey == "mixing");
    std::vector<std::vector<Chain::Figure>> figures;
    for (const auto* s : results)
        figures.push_back(s ? Chain::sectionFigures(*s) : std::vector<Chain::Figure>{});
    std::vector<Chain::Figure> keys;
    for (const auto& list : figures)
        for (const auto& f : list)
            if (std::none_of(keys.begin(), keys.end(), [&](const Chain::Figure& k) { return k.key == f.key; }))
                keys.push_back(f);
    for (const auto& key : keys) {
        if (coupledExtract && extractSideKeys.count(key.key) == 0)
            continue;
        if (key.key == "water_added_kgh" && !anyNonZero([](const SR& s) { return toKilogramsPerSecond(s.waterAdded); }))
            continue;
        CaseRow r{q(key.label), figureUnit(key), {}};
        for (const auto& list : figures) {
            const auto it = std::find_if(list.begin(), list.end(), [&](const Chain::Figure& f) { return f.key == key.key; });
            r.values << (it == list.end() ? QStringLiteral("-") : figureValue(*it));
        }
        rows.push_back(r);
    }
    return rows;
}

void ScheduleComposer::pathSchedule(PathKind path)
{
    const auto& sections = path == PathKind::Supply ? m_project.unit.supply : m_project.unit.extract;
    const QString pathName = path == PathKind::Supply ? QStringLiteral("supply") : QStringLiteral("extract");
    heading(nextChapter(QStringLiteral("Section schedule, %1 path").arg(pathName)));
    if (sections.empty()) {
        paragraph(QStringLiteral("This unit has no %1 path.").arg(pathName));
        return;
    }
    paragraph(QStringLiteral("Sections in the direction of air flow, numbered %1. Every section has the casing's "
                             "inner cross-section, %2 wide x %3 high. Pressure drops for each design case; then each "
                             "section with its figures, the design cases side by side.")
                  .arg(path == PathKind::Supply ? QStringLiteral("S1, S2, ...") : QStringLiteral("E1, E2, ..."),
                       m_format.lengthMm(toMillimetres(m_result.sizing.width)),
                       m_format.lengthMm(toMillimetres(m_result.sizing.height))),
              PdfStyle::Small, PdfStyle::mutedText());

    const int cases = std::min(static_cast<int>(m_result.cases.size()), kCasesPerTable);
    std::vector<PdfTable::Column> columns{{QStringLiteral("No."), 0.6, Qt::AlignLeft},
                                          {QStringLiteral("section"), 2.0, Qt::AlignLeft},
                                          {QStringLiteral("type"), 2.6, Qt::AlignLeft},
                                          {QStringLiteral("length [%1]").arg(m_format.ip() ? QStringLiteral("in") : QStringLiteral("mm")), 1.1, Qt::AlignRight},
                                          {QStringLiteral("face velocity [%1]").arg(m_format.unit(FigureKind::Velocity)), 1.2, Qt::AlignRight}};
    for (int i = 0; i < cases; ++i)
        columns.push_back({QStringLiteral("dp [%1] %2").arg(m_format.unit(FigureKind::Pressure),
                                                            q(m_result.cases[static_cast<std::size_t>(i)].caseName)),
                           1.3, Qt::AlignRight});
    PdfTable overview(columns);
    overview.setKeepTogether(true);
    for (std::size_t i = 0; i < sections.size(); ++i) {
        const auto& section = sections[i];
        const auto* first = resultOf(0, path, section.id);
        const double length = toMillimetres(first ? first->length : Chain::sectionLength(section.spec));
        QStringList cells{sectionNumber(path, i), q(section.id), typeLabel(path, section),
                          m_format.lengthMm(length).section(QLatin1Char(' '), 0, 0),
                          first ? m_format.number(FigureKind::Velocity, toMetresPerSecond(first->faceVelocity))
                                : QStringLiteral("-")};
        for (int c = 0; c < cases; ++c) {
            const auto* r = resultOf(static_cast<std::size_t>(c), path, section.id);
            cells << (r ? m_format.number(FigureKind::Pressure, toPascals(r->pressureDrop)) : QStringLiteral("-"));
        }
        overview.addRow(cells);
    }
    overview.place(m_pager);
    paragraph(QStringLiteral("Fans show their pressure rise as a negative drop. The extract side of a coupled section "
                             "has no length of its own: the supply side carries it."),
              PdfStyle::Small, PdfStyle::mutedText());

    for (std::size_t i = 0; i < sections.size(); ++i)
        sectionBlock(path, i);
}

void ScheduleComposer::sectionBlock(PathKind path, std::size_t index)
{
    const auto& sections = path == PathKind::Supply ? m_project.unit.supply : m_project.unit.extract;
    const auto& section = sections[index];
    const auto* first = resultOf(0, path, section.id);
    const double length = toMillimetres(first ? first->length : Chain::sectionLength(section.spec));
    const auto rows = sectionRows(path, section.id);
    // The heading stays with its (kept-together) first table, up to a full page.
    const auto tables = caseTables(rows);
    const double tableHeight = tables.empty() ? 0.0 : tables.front().height(m_pager);
    const double keepMm = std::min(tableHeight, m_pager.contentHeight() * 0.8) / m_pager.mm(1.0);
    subheading(QStringLiteral("%1  %2: %3, %4 long")
                   .arg(sectionNumber(path, index), q(section.id), typeLabel(path, section), m_format.lengthMm(length)),
               std::max(40.0, keepMm));
    caseTable(rows, true);

    // Findings about this section, case by case.
    std::vector<std::pair<QString, QString>> notes;
    for (const auto& c : m_result.cases)
        for (const auto& f : c.findings)
            if (f.sectionId == section.id) {
                const QString line = severityWord(f.severity) + QStringLiteral(": ") + q(f.message);
                const auto it = std::find_if(notes.begin(), notes.end(), [&](const auto& n) { return n.second == line; });
                if (it == notes.end())
                    notes.push_back({q(c.caseName), line});
                else
                    it->first += QStringLiteral(", ") + q(c.caseName);
            }
    for (const auto& [cases, line] : notes)
        paragraph(cases + QStringLiteral(": ") + line, PdfStyle::Small,
                  line.startsWith(QStringLiteral("note")) ? PdfStyle::mutedText() : PdfStyle::warning());
}

void ScheduleComposer::filterGroups()
{
    std::vector<std::pair<PathKind, const Chain::Section*>> filters;
    for (const auto* path : {&m_project.unit.supply, &m_project.unit.extract})
        for (const auto& s : *path)
            if (std::holds_alternative<Sections::Filter>(s.spec))
                filters.push_back({path == &m_project.unit.supply ? PathKind::Supply : PathKind::Extract, &s});
    if (filters.empty())
        return;
    heading(nextChapter(QStringLiteral("Filters")));
    const QString pu = m_format.unit(FigureKind::Pressure);
    PdfTable table({{QStringLiteral("section"), 1.7, Qt::AlignLeft},
                    {QStringLiteral("path"), 0.9, Qt::AlignLeft},
                    {QStringLiteral("ISO 16890 group"), 1.3, Qt::AlignLeft},
                    {QStringLiteral("efficiency [%]"), 1.0, Qt::AlignRight},
                    {QStringLiteral("construction"), 1.1, Qt::AlignLeft},
                    {QStringLiteral("initial [%1]").arg(pu), 1.0, Qt::AlignRight},
                    {QStringLiteral("design [%1]").arg(pu), 1.0, Qt::AlignRight},
                    {QStringLiteral("final = alarm [%1]").arg(pu), 1.2, Qt::AlignRight},
                    {QStringLiteral("highest RH at filter [%]"), 1.2, Qt::AlignRight}});
    table.setKeepTogether(true);
    bool humid = false;
    for (const auto& [path, section] : filters) {
        const auto& f = std::get<Sections::Filter>(section->spec);
        const VolumeFlow design = path == PathKind::Supply ? m_project.unit.airflows.supply : m_project.unit.airflows.extract;
        const double scale = std::pow(toCubicMetresPerSecond(design) / toCubicMetresPerSecond(f.nominalFlow.value_or(design)),
                                      f.flowExponent);
        double rh = 0.0;
        for (std::size_t i = 0; i < m_result.cases.size(); ++i)
            if (const auto* r = resultOf(i, path, section->id))
                if (const auto* d = std::get_if<Sections::Filter::Detail>(&r->detail))
                    rh = std::max(rh, toPercent(d->relativeHumidity));
        humid = humid || rh > 90.0;
        table.addRow({q(section->id), path == PathKind::Supply ? QStringLiteral("supply") : QStringLiteral("extract"),
                      q(Sections::filterGroupLabel(f.group)), ScheduleUnits::fixed(toPercent(f.efficiency), 0),
                      filterConstructionWord(f.construction),
                      m_format.number(FigureKind::Pressure, toPascals(f.initialPressureDrop) * scale),
                      m_format.number(FigureKind::Pressure, toPascals(f.designDrop()) * scale),
                      m_format.number(FigureKind::Pressure, toPascals(f.finalDrop()) * scale),
                      ScheduleUnits::fixed(rh, 0)},
                     rh > 90.0 ? PdfTable::RowStyle::Warning : PdfTable::RowStyle::Normal);
    }
    table.place(m_pager);
    paragraph(QStringLiteral("Pressure drops at the path's design flow. Design = mean of initial and final (EN 13053); "
                             "the differential pressure alarm is set at the final drop. EN 13053 keeps the relative "
                             "humidity at filters at or below 90 %.%1")
                  .arg(humid ? QStringLiteral(" Rows in red exceed it in at least one case.") : QString()),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::fans()
{
    std::vector<std::pair<PathKind, const Chain::Section*>> list;
    for (const auto* path : {&m_project.unit.supply, &m_project.unit.extract})
        for (const auto& s : *path)
            if (std::holds_alternative<Sections::Fan>(s.spec))
                list.push_back({path == &m_project.unit.supply ? PathKind::Supply : PathKind::Extract, &s});
    if (list.empty())
        return;
    heading(nextChapter(QStringLiteral("Fans")));
    PdfTable spec({{QStringLiteral("section"), 1.6, Qt::AlignLeft},
                   {QStringLiteral("impeller efficiency (total) [%]"), 1.3, Qt::AlignRight},
                   {QStringLiteral("motor efficiency [%]"), 1.1, Qt::AlignRight},
                   {QStringLiteral("motor class IEC 60034-30-1"), 1.2, Qt::AlignLeft},
                   {QStringLiteral("drive [%]"), 0.8, Qt::AlignRight},
                   {QStringLiteral("speed control [%]"), 1.0, Qt::AlignRight},
                   {QStringLiteral("overall [%]"), 0.9, Qt::AlignRight},
                   {QStringLiteral("motor in airstream"), 1.0, Qt::AlignLeft},
                   {QStringLiteral("inlet ring k [m³/h per √Pa]"), 1.3, Qt::AlignRight}});
    spec.setKeepTogether(true);
    for (const auto& [path, section] : list) {
        const auto& f = std::get<Sections::Fan>(section->spec);
        spec.addRow({q(section->id), ScheduleUnits::fixed(toPercent(f.fanEfficiency), 1),
                     ScheduleUnits::fixed(toPercent(f.motorEfficiency), 1), QStringLiteral("IE%1").arg(f.motorIeClass),
                     ScheduleUnits::fixed(toPercent(f.driveEfficiency), 1),
                     ScheduleUnits::fixed(toPercent(f.controllerEfficiency), 1),
                     ScheduleUnits::fixed(toPercent(f.overallEfficiency()), 1),
                     f.motorInAirstream ? QStringLiteral("yes") : QStringLiteral("no"),
                     f.kFactor ? ScheduleUnits::fixed(*f.kFactor, 0) : QStringLiteral("-")});
    }
    spec.place(m_pager);
    m_pager.space(m_pager.mm(2.0));

    const QString pu = m_format.unit(FigureKind::Pressure);
    const QString wu = m_format.unit(FigureKind::Power);
    PdfTable duty({{QStringLiteral("section"), 1.6, Qt::AlignLeft},
                   {QStringLiteral("case"), 1.6, Qt::AlignLeft},
                   {QStringLiteral("flow [%1]").arg(m_format.unit(FigureKind::AirVolumeFlow)), 1.1, Qt::AlignRight},
                   {QStringLiteral("total pressure [%1]").arg(pu), 1.1, Qt::AlignRight},
                   {QStringLiteral("shaft power [%1]").arg(wu), 1.0, Qt::AlignRight},
                   {QStringLiteral("electric power [%1]").arg(wu), 1.0, Qt::AlignRight},
                   {QStringLiteral("SFP [%1]").arg(m_format.sfpUnit()), 1.0, Qt::AlignRight},
                   {QStringLiteral("air heated by [%1]").arg(m_format.unit(FigureKind::TemperatureDifference)), 1.0, Qt::AlignRight},
                   {QStringLiteral("inlet ring dp [%1]").arg(pu), 1.0, Qt::AlignRight}});
    duty.setKeepTogether(true);
    for (const auto& [path, section] : list)
        for (std::size_t i = 0; i < m_result.cases.size(); ++i) {
            const auto* r = resultOf(i, path, section->id);
            const auto* d = r ? std::get_if<Sections::Fan::Detail>(&r->detail) : nullptr;
            if (!d)
                continue;
            duty.addRow({q(section->id), q(m_result.cases[i].caseName),
                         m_format.number(FigureKind::AirVolumeFlow, toCubicMetresPerHour(d->flow)),
                         m_format.number(FigureKind::Pressure, toPascals(d->totalPressure)),
                         m_format.number(FigureKind::Power, toKilowatts(d->shaftPower)),
                         m_format.number(FigureKind::Power, toKilowatts(d->electricPower)),
                         m_format.sfp(toWattsPerCubicMetrePerSecond(d->specificFanPower)).section(QLatin1Char(' '), 0, 0),
                         m_format.number(FigureKind::TemperatureDifference, toKelvinDifference(d->temperatureRise)),
                         d->inletRingPressure ? m_format.number(FigureKind::Pressure, toPascals(*d->inletRingPressure))
                                              : QStringLiteral("-")});
        }
    duty.place(m_pager);
    paragraph(QStringLiteral("Total pressure = the path's internal pressure drops plus its external pressure. Overall "
                             "efficiency = impeller x motor x drive x speed control. SFP of one fan: its electric power "
                             "over its flow."),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::comparison()
{
    if (!m_comparison)
        return;
    const auto& r = *m_comparison;
    const bool ip = m_format.ip();
    // Energy a year: MWh, or million Btu (1 MWh = 3.412142 MMBtu).
    const QString energyUnit = ip ? QStringLiteral("MMBtu") : QStringLiteral("MWh");
    auto energy = [&](Core::Annual::Energy e) {
        const double mwh = Core::Annual::toMegawattHours(e);
        return ScheduleUnits::fixed(ip ? mwh * 3.412142 : mwh, 1);
    };
    auto pressure = [&](Pressure p) { return m_format.number(FigureKind::Pressure, toPascals(p)); };
    auto rankOf = [&](const std::string& key) {
        for (const auto& e : r.ranking)
            if (e.key == key)
                return QString::number(e.rank);
        return QStringLiteral("-");
    };

    heading(nextChapter(QStringLiteral("Heat recovery options over a year")));
    const auto& c = r.climate;
    paragraph(QStringLiteral("Climate: %1, %2, %3 h, mean %4, lowest %5; unit in operation %6 h a year. Savings are "
                             "against the option without heat recovery; energy in %7 a year.")
                  .arg(c.site.empty() ? QStringLiteral("bin table") : q(c.site),
                       c.method == Core::Annual::ClimateMethod::Hourly ? QStringLiteral("hour by hour")
                                                                        : QStringLiteral("by temperature bins"),
                       ScheduleUnits::fixed(toHours(c.duration), 0),
                       m_format.withUnit(FigureKind::Temperature, toCelsius(c.meanDryBulb)),
                       m_format.withUnit(FigureKind::Temperature, toCelsius(c.minDryBulb)),
                       ScheduleUnits::fixed(toHours(c.operatingTime), 0), energyUnit),
              PdfStyle::Body);
    const QString pu = m_format.unit(FigureKind::Pressure);
    PdfTable table({{QStringLiteral("rank"), 0.8, Qt::AlignRight},
                    {QStringLiteral("option"), 2.9, Qt::AlignLeft},
                    {QStringLiteral("eff. [%]"), 0.9, Qt::AlignRight},
                    {QStringLiteral("EU 1253 [%]"), 1.0, Qt::AlignRight},
                    {QStringLiteral("dp s / e [%1]").arg(pu), 1.4, Qt::AlignRight},
                    {QStringLiteral("heat rec. [%1]").arg(energyUnit), 1.2, Qt::AlignRight},
                    {QStringLiteral("frost [%1]").arg(energyUnit), 1.1, Qt::AlignRight},
                    {QStringLiteral("frost [h]"), 0.9, Qt::AlignRight},
                    {QStringLiteral("+ fan [%1]").arg(energyUnit), 1.1, Qt::AlignRight},
                    {QStringLiteral("net [%1]").arg(energyUnit), 1.1, Qt::AlignRight},
                    {QStringLiteral("cost / year"), 1.1, Qt::AlignRight},
                    {QStringLiteral("CO2 [t]"), 0.9, Qt::AlignRight},
                    {QStringLiteral("payback [years]"), 1.1, Qt::AlignRight}});
    for (const auto& o : r.options) {
        table.addRow({rankOf(o.key), q(o.name),
                      o.hasRecovery ? ScheduleUnits::fixed(toPercent(o.designEffectiveness), 1) : QStringLiteral("-"),
                      o.hasRecovery ? ScheduleUnits::fixed(toPercent(o.regulationEfficiency), 1) : QStringLiteral("-"),
                      o.hasRecovery ? pressure(o.supplyPressureDrop) + QStringLiteral(" / ") + pressure(o.extractPressureDrop)
                                    : QStringLiteral("-"),
                      energy(o.energy.recoveredHeating), energy(o.energy.frostProtection),
                      ScheduleUnits::fixed(toHours(o.energy.frostTime), 0), energy(o.addedFanEnergy),
                      energy(o.netSaving), ScheduleUnits::fixed(o.costSaving, 0),
                      ScheduleUnits::fixed(toKilograms(o.co2Saving) / 1000.0, 1),
                      o.paybackYears ? ScheduleUnits::fixed(*o.paybackYears, 1) : QStringLiteral("-")},
                     r.ranking.empty() || r.ranking.front().key != o.key ? PdfTable::RowStyle::Normal
                                                                         : PdfTable::RowStyle::Bold);
    }
    table.setKeepTogether(true);
    table.place(m_pager);
    paragraph(QStringLiteral("eff.: temperature effectiveness at the coldest design case, full recovery; EU 1253: "
                             "thermal efficiency as Regulation (EU) No 1253/2014 defines it; dp s / e: pressure drop "
                             "on the supply and extract side; heat rec.: heat recovered a year; frost: energy given up "
                             "to frost protection and the hours it acts; + fan: fan energy added by the exchanger's "
                             "pressure drops; net: delivered energy saved, heat and electricity; cost, CO2: saved a "
                             "year; payback: extra cost over the cost saved a year."),
              PdfStyle::Small, PdfStyle::mutedText());
    subheading(QStringLiteral("Ranking by net benefit"), 20.0);
    for (const auto& e : r.ranking) {
        QString name = q(e.key);
        for (const auto& o : r.options)
            if (o.key == e.key)
                name = q(o.name);
        paragraph(QStringLiteral("%1. %2: %3").arg(e.rank).arg(name, q(e.reason)), PdfStyle::Small);
    }
    paragraph(QStringLiteral("Prices, emission factors, extra costs and the option data are the inputs of the "
                             "comparison (illustrative defaults unless entered); confirm them before a decision."),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::heatRecovery()
{
    std::vector<const Chain::Section*> list;
    for (const auto& s : m_project.unit.supply)
        if (std::holds_alternative<Recovery::HeatRecovery>(s.spec))
            list.push_back(&s);
    if (list.empty())
        return;
    heading(nextChapter(QStringLiteral("Heat recovery and frost")));
    for (const auto* section : list) {
        const auto& hr = std::get<Recovery::HeatRecovery>(section->spec);
        subheading(QStringLiteral("%1: %2").arg(q(section->id), q(Recovery::exchangerKindLabel(hr.kind))), 30.0);
        std::vector<std::pair<QString, QString>> rows;
        rows.push_back({QStringLiteral("Rated (EN 308, dry, balanced)"),
                        QStringLiteral("temperature efficiency %1 %%2 at %3")
                            .arg(ScheduleUnits::fixed(toPercent(hr.ratedEfficiency), 1),
                                 Recovery::isRotary(hr.kind)
                                     ? QStringLiteral(", humidity efficiency %1 %").arg(ScheduleUnits::fixed(toPercent(hr.ratedHumidityEfficiency), 1))
                                     : QString(),
                                 hr.ratedFlow ? m_format.withUnit(FigureKind::AirVolumeFlow, toCubicMetresPerHour(*hr.ratedFlow))
                                              : QStringLiteral("the supply design flow"))});
        rows.push_back({QStringLiteral("Rated pressure drop"),
                        QStringLiteral("supply %1, extract %2")
                            .arg(m_format.withUnit(FigureKind::Pressure, toPascals(hr.ratedPressureDropSupply)),
                                 m_format.withUnit(FigureKind::Pressure, toPascals(hr.ratedPressureDropExtract)))});
        rows.push_back({QStringLiteral("Control"), hr.bypassControl ? QStringLiteral("bypass modulates recovery to the supply setpoint")
                                                                    : QStringLiteral("no modulation: full recovery")});
        rows.push_back({QStringLiteral("Frost protection"), plainWords(Recovery::frostStrategyKey(hr.frostStrategy))});
        if (Recovery::isRotary(hr.kind))
            rows.push_back({QStringLiteral("Leakage (EN 308)"),
                            QStringLiteral("EATR %1 %, OACF %2, purge sector %3")
                                .arg(ScheduleUnits::fixed(toPercent(hr.exhaustAirTransfer), 1),
                                     ScheduleUnits::fixed(hr.outdoorAirCorrection, 2),
                                     hr.purgeSector ? QStringLiteral("yes") : QStringLiteral("no"))});
        keyValues(rows);
        m_pager.space(m_pager.mm(1.5));

        const auto detailOf = [&](std::size_t i) -> const Recovery::HeatRecoveryDetail* {
            const auto* r = resultOf(i, PathKind::Supply, section->id);
            return r ? std::get_if<Recovery::HeatRecoveryDetail>(&r->detail) : nullptr;
        };
        std::vector<CaseRow> table;
        const auto perCase = [&](const QString& label, const QString& unit, auto valueOf) {
            CaseRow r{label, unit, {}};
            for (std::size_t i = 0; i < m_result.cases.size(); ++i) {
                const auto* d = detailOf(i);
                r.values << (d ? valueOf(*d) : QStringLiteral("-"));
            }
            table.push_back(r);
        };
        using D = Recovery::HeatRecoveryDetail;
        const QString pu = m_format.unit(FigureKind::Pressure);
        const QString wu = m_format.unit(FigureKind::Power);
        table.push_back({QStringLiteral("Exchanger"), {}, {}});
        perCase(QStringLiteral("temperature effectiveness, actual"), QStringLiteral("%"),
                [](const D& d) { return ScheduleUnits::fixed(toPercent(d.temperatureEffectiveness), 1); });
        perCase(QStringLiteral("thermal efficiency (EU 1253/2014 definition)"), QStringLiteral("%"),
                [](const D& d) { return ScheduleUnits::fixed(toPercent(d.regulationThermalEfficiency), 1); });
        perCase(QStringLiteral("heat recovered to the supply"), wu,
                [&](const D& d) { return m_format.number(FigureKind::Power, toKilowatts(d.recovered)); });
        perCase(QStringLiteral("bypass open"), QStringLiteral("%"),
                [](const D& d) { return ScheduleUnits::fixed(toPercent(d.bypassFraction), 0); });
        perCase(QStringLiteral("condensate, extract side"), m_format.unit(FigureKind::MassFlowPerHour), [&](const D& d) {
            return m_format.number(FigureKind::MassFlowPerHour, toKilogramsPerSecond(d.condensate) * 3600.0);
        });
        perCase(QStringLiteral("static pressure supply minus extract"), pu, [&](const D& d) {
            return d.supplyMinusExtract ? m_format.number(FigureKind::Pressure, toPascals(*d.supplyMinusExtract))
                                        : QStringLiteral("-");
        });
        table.push_back({QStringLiteral("Frost analysis"), {}, {}});
        perCase(QStringLiteral("frost would form unprotected"), {},
                [](const D& d) { return d.frost.risk ? QStringLiteral("yes") : QStringLiteral("no"); });
        perCase(QStringLiteral("frost onset, outdoor temperature"), m_format.unit(FigureKind::Temperature), [&](const D& d) {
            return d.frost.onsetOutdoorTemperature
                       ? m_format.number(FigureKind::Temperature, toCelsius(*d.frost.onsetOutdoorTemperature))
                       : QStringLiteral("none");
        });
        perCase(QStringLiteral("strategy"), {}, [](const D& d) { return plainWords(Recovery::frostStrategyKey(d.frost.strategy)); });
        perCase(QStringLiteral("cost: preheat or recovery given up"), wu,
                [&](const D& d) { return m_format.number(FigureKind::Power, toKilowatts(d.frost.protectionPower)); });
        perCase(QStringLiteral("recovery kept under protection"), QStringLiteral("%"),
                [](const D& d) { return ScheduleUnits::fixed(toPercent(d.frost.recoveredFraction), 0); });
        perCase(QStringLiteral("extract side pressure drop, clean"), pu,
                [&](const D& d) { return m_format.number(FigureKind::Pressure, toPascals(d.cleanExtractPressureDrop)); });
        perCase(QStringLiteral("frost alarm (clean + 5 to 10 Pa, common practice)"), pu,
                [&](const D& d) { return m_format.number(FigureKind::Pressure, toPascals(d.frostAlarmPressureDrop)); });
        caseTable(table, true);
    }
    paragraph(QStringLiteral("Frost onset depends strongly on extract humidity and effectiveness; the figures are "
                             "model results for the cases above, not a guarantee that the exchanger stays free of ice."),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::charts()
{
    heading(nextChapter(QStringLiteral("Psychrometric chart and pressure profiles")));
    PsychroChartModel chart;
    chart.rebuild(m_project, std::optional<Chain::UnitResult>(m_result), m_units, PsychroChartModel::Diagram::DryBulbHumidity);
    subheading(QStringLiteral("Psychrometric chart at %1: air states at every section boundary")
                   .arg(m_format.sitePressurePa(chart.pressurePa())),
               100.0);
    const double chartHeight = std::min(m_pager.mm(125.0), m_pager.contentHeight() * 0.55);
    const QRectF r = m_pager.take(chartHeight);
    const double unit = m_pager.mm(1.0);
    m_pager.draw([chart, r, unit](QPainter& p) { PsychroChartPainter::paint(p, r, chart, unit); });
    paragraph(QStringLiteral("Saturation curve (bold), relative humidity every 10 %, enthalpy (dashed) every %1. Each "
                             "design case is one colour; a dot marks the air entering the path and leaving each section.")
                  .arg(m_format.ip() ? QStringLiteral("5 Btu/lb") : QStringLiteral("10 kJ/kg")),
              PdfStyle::Small, PdfStyle::mutedText());

    const std::optional<Chain::UnitResult> result(m_result);
    const UnitSystem* units = &m_units;
    for (int i = 0; i < static_cast<int>(m_result.cases.size()); ++i) {
        PressureProfileModel profile;
        profile.rebuild(result, i);
        if (profile.isEmpty())
            continue;
        subheading(QStringLiteral("Static pressure along both paths, %1").arg(q(m_result.cases[static_cast<std::size_t>(i)].caseName)),
                   70.0);
        const QRectF area = m_pager.take(m_pager.mm(72.0));
        m_pager.draw([profile, area, units, unit](QPainter& p) { PressureProfilePainter::paint(p, area, profile, *units, unit); });
    }
    paragraph(QStringLiteral("Static pressure relative to ambient, from minus the external pressure before the unit; fans "
                             "are the steps up. S and E numbers mark the sections of the supply and extract paths as in "
                             "chapters 4 and 5; a coupled section lines both paths up."),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::pointsSheet()
{
    heading(nextChapter(QStringLiteral("Measuring and control points")));
    if (!m_pointsError.isEmpty()) {
        paragraph(QStringLiteral("The points could not be derived: %1").arg(m_pointsError), PdfStyle::Body,
                  PdfStyle::warning());
        return;
    }
    PdfTable table({{QStringLiteral("tag"), 1.3, Qt::AlignLeft},
                    {QStringLiteral("measures"), 2.9, Qt::AlignLeft},
                    {QStringLiteral("position"), 2.2, Qt::AlignLeft},
                    {QStringLiteral("expected over the cases"), 1.5, Qt::AlignLeft},
                    {QStringLiteral("setpoints"), 2.4, Qt::AlignLeft},
                    {QStringLiteral("transmitter span"), 1.4, Qt::AlignLeft}});
    for (const auto& p : m_points) {
        QString setpoints;
        for (const auto& s : p.setpoints)
            setpoints += (setpoints.isEmpty() ? QString() : QStringLiteral("\n")) + q(s.label) + QStringLiteral(": ")
                         + pointValue(s.value);
        if (setpoints.isEmpty())
            setpoints = QStringLiteral("-");
        QString span = QStringLiteral("-");
        if (p.transmitter) {
            span = pointValue(p.transmitter->low).section(QLatin1Char(' '), 0, 0) + QStringLiteral(" .. ")
                   + pointValue(p.transmitter->high);
            if (m_format.ip() && p.quantity == Checks::PointQuantity::DifferentialPressure)
                span += QStringLiteral("\n(0 .. %1 Pa)").arg(Checks::toPointUnit(p.transmitter->high), 0, 'f', 0);
            if (m_format.ip() && p.quantity == Checks::PointQuantity::Temperature)
                span += QStringLiteral("\n(%1 .. %2 °C)")
                            .arg(Checks::toPointUnit(p.transmitter->low), 0, 'f', 0)
                            .arg(Checks::toPointUnit(p.transmitter->high), 0, 'f', 0);
        } else if (p.quantity != Checks::PointQuantity::AirVolumeFlow) {
            span = QStringLiteral("beyond the standard spans");
        }
        QString measures = q(Checks::pointPurposeLabel(p.purpose));
        if (p.kFactor)
            measures += QStringLiteral(" (k = %1)").arg(*p.kFactor, 0, 'f', 0);
        if (!p.note.empty())
            measures += QStringLiteral("\n") + q(p.note);
        const QString expected = pointValue(p.expectedLow).section(QLatin1Char(' '), 0, 0) + QStringLiteral(" .. ")
                                 + pointValue(p.expectedHigh);
        table.addRow({q(p.tag), measures, q(Checks::pointPosition(p)), expected, setpoints, span});
    }
    table.place(m_pager);
    paragraph(QStringLiteral("Transmitter span: the next standard span above the highest value the point must show "
                             "(differential pressure 0-100/250/500/1000/2500 Pa, temperature -50..50 °C (then 0..100, "
                             "-50..150 °C), humidity 0-100 % RH): common practice, confirm with the controls supplier. "
                             "Frost thermostat about +5 °C: common practice (ASHRAE Guideline 36-2021 describes staged "
                             "freeze protection). Filter alarms at the final pressure drop; heat exchanger frost alarm at "
                             "the clean drop plus 5 to 10 Pa (common practice). Inlet ring airflow q = k x sqrt(dp) with "
                             "q in m³/h and dp in Pa: use the fitted fan's own factor."),
              PdfStyle::Small, PdfStyle::mutedText());
}

void ScheduleComposer::findings()
{
    heading(nextChapter(QStringLiteral("Findings")));
    struct Line {
        Severity severity;
        QString section;
        QString message;
        QString cases;
    };
    std::vector<Line> lines;
    const auto add = [&](const Finding& f, const QString& caseName) {
        const auto it = std::find_if(lines.begin(), lines.end(), [&](const Line& l) {
            return l.message == q(f.message) && l.section == q(f.sectionId) && l.severity == f.severity;
        });
        if (it == lines.end())
            lines.push_back({f.severity, q(f.sectionId), q(f.message), caseName});
        else if (!caseName.isEmpty())
            it->cases += QStringLiteral(", ") + caseName;
    };
    for (const auto& c : m_result.cases)
        for (const auto& f : c.findings)
            add(f, q(c.caseName));
    if (m_assessment) {
        for (const auto& f : m_assessment->findings)
            add(f, QStringLiteral("unit"));
        for (const auto& c : m_assessment->cases)
            for (const auto& f : c.findings)
                add(f, q(c.caseName));
    }
    if (lines.empty()) {
        paragraph(QStringLiteral("No findings: every case met its setpoints without warnings."));
        return;
    }
    std::stable_sort(lines.begin(), lines.end(), [](const Line& a, const Line& b) {
        return static_cast<int>(a.severity) > static_cast<int>(b.severity);
    });
    PdfTable table({{QStringLiteral("kind"), 0.9, Qt::AlignLeft},
                    {QStringLiteral("section"), 1.4, Qt::AlignLeft},
                    {QStringLiteral("cases"), 1.9, Qt::AlignLeft},
                    {QStringLiteral("finding"), 6.0, Qt::AlignLeft}});
    for (const auto& l : lines)
        table.addRow({severityWord(l.severity), l.section.isEmpty() ? QStringLiteral("unit") : l.section, l.cases,
                      l.message},
                     l.severity == Severity::Info ? PdfTable::RowStyle::Normal : PdfTable::RowStyle::Warning);
    table.place(m_pager);
}

void ScheduleComposer::cautions()
{
    heading(nextChapter(QStringLiteral("Cautions and disclaimer")));
    const auto has = [&](auto pred) {
        return std::any_of(m_project.unit.supply.begin(), m_project.unit.supply.end(), pred);
    };
    const bool electric = has([](const Chain::Section& s) { return std::holds_alternative<Sections::ElectricHeater>(s.spec); });
    const bool water = has([](const Chain::Section& s) { return std::holds_alternative<Sections::WaterHeatingCoil>(s.spec); })
                       || has([](const Chain::Section& s) { return std::holds_alternative<Sections::CoolingCoil>(s.spec); });
    const bool recovery = has([](const Chain::Section& s) { return std::holds_alternative<Recovery::HeatRecovery>(s.spec); });
    const bool humidifier = has([](const Chain::Section& s) { return std::holds_alternative<Sections::Humidifier>(s.spec); });
    const auto applies = [](bool present, const QString& what) {
        return present ? QStringLiteral("This unit has %1.").arg(what)
                       : QStringLiteral("This unit has no %1; kept here for a later change.").arg(what);
    };

    subheading(QStringLiteral("A design aid"), 15.0);
    paragraph(QStringLiteral(
        "This schedule is a design aid. Its figures come from the models, inputs and sources named in it and in the "
        "program's documentation; they are not the certified performance of any product. Before equipment is ordered, "
        "confirm every figure with the chosen manufacturer's certified data for the selected equipment and operating "
        "points. Local codes, standards and licensed engineering practice govern the design and its installation; where "
        "they ask for more than this schedule, they apply. The person who issues the design remains responsible for it."));
    subheading(QStringLiteral("Electric heaters"), 15.0);
    paragraph(applies(electric, QStringLiteral("an electric heater"))
              + QStringLiteral(
                  " Interlock an electric heater with proven airflow, fit an automatic high-limit cut-out and a "
                  "manual-reset overheat cut-out, keep the face velocity at or above the heater maker's minimum, and "
                  "let the fan run on after switch-off to carry the residual heat away. Supply, protection and "
                  "isolation follow the local electrical code."));
    subheading(QStringLiteral("Frost and freezing"), 15.0);
    paragraph(applies(water || recovery, QStringLiteral("water coils or heat recovery"))
              + QStringLiteral(
                  " A water coil freezes when air below 0 °C reaches it with the valve shut or the pump stopped. Fit the "
                  "frost thermostat of the measuring sheet after each heating coil, keep a minimum water flow or "
                  "temperature, and define a safe state on a trip (outdoor damper closed, fans off, valve open, pump "
                  "running). Use glycol where a coil cannot be kept full and circulating, and drain coils that stand "
                  "idle in winter. Below its frost-onset temperature a heat exchanger needs the protection the frost "
                  "analysis shows; protect condensate drains and traps from freezing."));
    subheading(QStringLiteral("Humidifier hygiene"), 15.0);
    paragraph(applies(humidifier, QStringLiteral("a humidifier"))
              + QStringLiteral(
                  " Standing water and wetted surfaces in a unit breed microbes. Feed the humidifier with water treated "
                  "as its maker requires, drain and dry it when idle, keep its absorption distance clear of filters, "
                  "coils and bends, slope drip trays to a trapped drain, and keep it on a cleaning and inspection "
                  "schedule. Local hygiene rules for air handling units apply."));
    subheading(QStringLiteral("Limits of the figures"), 15.0);
    paragraph(QStringLiteral(
        "Class limits and regulation figures marked 'from memory' in the program's documentation were not read in the "
        "primary text and must be checked there. Setpoints and transmitter spans marked 'common practice' are trade "
        "custom without a standard behind them. Pressure drops of coils, dampers and silencers come from the rated "
        "values entered for them."));
}

} // namespace Airwright::Ui
