#include "airwright/ui/ProjectEditor.h"

#include "airwright/ui/EditAirflowsCommand.h"
#include "airwright/ui/EditCasingCommand.h"
#include "airwright/ui/EditInfoCommand.h"
#include "airwright/ui/EditSiteCommand.h"
#include "airwright/ui/EditValidator.h"
#include "airwright/ui/FieldForm.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"

#include <QGroupBox>
#include <QScrollArea>
#include <QVBoxLayout>

namespace Airwright::Ui {

using namespace Airwright::Core;
using Kind = UnitSystem::Kind;
using Type = FieldRow::Type;

namespace {

template <class T>
FieldSpec<T> field(Type type, const QString& label, const QString& tip, std::function<QVariant(const T&)> get,
                   std::function<void(T&, const QVariant&)> set, FieldQuantity quantity = {})
{
    FieldSpec<T> spec;
    spec.type = type;
    spec.label = label;
    spec.options.tooltip = tip;
    spec.options.quantity = quantity;
    spec.get = std::move(get);
    spec.set = std::move(set);
    return spec;
}

template <class T>
FieldSpec<T> optionalField(const QString& label, const QString& tip, const QString& offText, double defaultOn,
                           FieldQuantity quantity, std::function<QVariant(const T&)> get,
                           std::function<void(T&, const QVariant&)> set)
{
    FieldSpec<T> spec = field<T>(Type::OptionalReal, label, tip, std::move(get), std::move(set), quantity);
    spec.options.offText = offText;
    spec.options.defaultOn = defaultOn;
    return spec;
}

// Binds the fields of one part of the project (read by `part`, written back by
// `place`, committed by `command`).
template <class T, class Command>
void bindPart(FieldForm* form, ProjectDocument* document, const std::vector<FieldSpec<T>>& specs,
              std::function<const T&(const Project::Project&)> part,
              std::function<void(Project::Project&, const T&)> place)
{
    auto read = [document, part]() -> std::optional<T> { return part(document->project()); };
    auto check = [document, place](const T& candidate) -> QString {
        Project::Project project = document->project();
        place(project, candidate);
        return EditValidator::newProblem(document->project(), project);
    };
    auto commit = [document](const T& candidate) { document->undoStack()->push(new Command(document, candidate)); };
    for (const auto& spec : specs)
        form->bind<T>(spec, read, check, commit);
}

QVariant optionalValue(const std::optional<double>& v)
{
    return v ? QVariant(*v) : QVariant();
}

} // namespace

ProjectEditor::ProjectEditor(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document), m_units(units)
{
    auto* outer = new QVBoxLayout(this);
    outer->setContentsMargins(0, 0, 0, 0);
    auto* scroll = new QScrollArea(this);
    scroll->setWidgetResizable(true);
    scroll->setFrameShape(QFrame::NoFrame);
    outer->addWidget(scroll);
    auto* page = new QWidget(scroll);
    auto* layout = new QVBoxLayout(page);
    layout->setContentsMargins(6, 6, 6, 6);
    scroll->setWidget(page);

    auto group = [&](const QString& title, FieldForm*& form) {
        auto* box = new QGroupBox(title, page);
        auto* boxLayout = new QVBoxLayout(box);
        boxLayout->setContentsMargins(2, 2, 2, 2);
        form = new FieldForm(m_units, box);
        boxLayout->addWidget(form);
        layout->addWidget(box);
    };
    group(tr("Project"), m_info);
    group(tr("Site"), m_site);
    group(tr("Airflows"), m_airflows);
    group(tr("Casing"), m_casing);
    layout->addStretch(1);

    // Project facts.
    using Info = Project::ProjectInfo;
    auto text = [](const QString& label, const QString& tip, std::string Info::*member, Type type = Type::Text) {
        return field<Info>(
            type, label, tip, [member](const Info& i) { return QVariant(QString::fromStdString(i.*member)); },
            [member](Info& i, const QVariant& v) { i.*member = v.toString().toStdString(); });
    };
    bindPart<Info, EditInfoCommand>(
        m_info, m_document,
        {text(tr("Name"), tr("Name of the project or of the unit, as on the schedule."), &Info::name),
         text(tr("Reference"), tr("Your job or tender number."), &Info::reference),
         text(tr("Designer"), tr("Who designed the unit."), &Info::designer),
         text(tr("Date"), tr("Calendar date as yyyy-mm-dd (ISO 8601), or empty."), &Info::date),
         text(tr("Revision"), tr("Revision mark of this design."), &Info::revision),
         text(tr("Notes"), tr("Anything the schedule should carry: scope, assumptions, open points."), &Info::notes,
              Type::LongText)},
        [](const Project::Project& p) -> const Info& { return p.info; },
        [](Project::Project& p, const Info& v) { p.info = v; });

    // Site.
    using Site = Chain::Site;
    bindPart<Site, EditSiteCommand>(
        m_site, m_document,
        {optionalField<Site>(
             tr("Altitude"),
             tr("Height above sea level; the barometric pressure follows from the standard atmosphere."),
             tr("sea level"), 0.0, FieldQuantity::altitude(),
             [](const Site& s) {
                 return optionalValue(s.altitude ? std::optional<double>(toMetres(*s.altitude)) : std::nullopt);
             },
             [](Site& s, const QVariant& v) {
                 s.altitude = v.isValid() ? std::optional<Length>(metres(v.toDouble())) : std::nullopt;
             }),
         optionalField<Site>(
             tr("Measured barometric pressure"),
             tr("A measured or design barometric pressure; when given it replaces the one from the altitude."),
             tr("from the altitude"), 101325.0, FieldQuantity::barometric(),
             [](const Site& s) {
                 return optionalValue(s.barometricPressure
                                          ? std::optional<double>(toPascals(*s.barometricPressure))
                                          : std::nullopt);
             },
             [](Site& s, const QVariant& v) {
                 s.barometricPressure = v.isValid() ? std::optional<Pressure>(pascals(v.toDouble())) : std::nullopt;
             })},
        [](const Project::Project& p) -> const Site& { return p.unit.site; },
        [](Project::Project& p, const Site& v) { p.unit.site = v; });
    m_site->addInfo(
        tr("Pressure used"),
        [this] {
            const double pa = toPascals(m_document->project().unit.site.pressure());
            const FieldQuantity q = FieldQuantity::barometric();
            return QStringLiteral("%1 %2").arg(FieldQuantity::editText(q.toDisplay(*m_units, pa)), q.unit(*m_units));
        },
        tr("The barometric pressure every moist-air state of the unit is computed at."));

    // Airflows.
    using Flows = Chain::Airflows;
    auto flow = [](const QString& label, const QString& tip, VolumeFlow Flows::*member) {
        return field<Flows>(
            Type::Real, label, tip, [member](const Flows& f) { return QVariant(toCubicMetresPerHour(f.*member)); },
            [member](Flows& f, const QVariant& v) { f.*member = cubicMetresPerHour(v.toDouble()); },
            Kind::AirVolumeFlow);
    };
    auto pressure = [](const QString& label, const QString& tip, Pressure Flows::*member) {
        return field<Flows>(
            Type::Real, label, tip, [member](const Flows& f) { return QVariant(toPascals(f.*member)); },
            [member](Flows& f, const QVariant& v) { f.*member = pascals(v.toDouble()); }, Kind::Pressure);
    };
    auto basis = field<Flows>(
        Type::Choice, tr("Flow basis"),
        tr("Standard air: the flows are at 1.2 kg/m³. Actual: at the state entering the path (outdoor air for "
           "the supply, extract air for the extract)."),
        [](const Flows& f) { return QVariant(static_cast<int>(f.basis)); },
        [](Flows& f, const QVariant& v) { f.basis = static_cast<Chain::FlowBasis>(v.toInt()); });
    basis.options.choices = {tr("standard air (1.2 kg/m³)"), tr("actual, at the path's inlet")};
    bindPart<Flows, EditAirflowsCommand>(
        m_airflows, m_document,
        {flow(tr("Supply airflow"), tr("Design airflow delivered to the rooms."), &Flows::supply),
         flow(tr("Extract airflow"), tr("Design airflow taken from the rooms."), &Flows::extract), basis,
         pressure(tr("External Δp, outdoor air duct"),
                  tr("Pressure lost in the outdoor air duct and intake before the unit."),
                  &Flows::supplyExternalBefore),
         pressure(tr("External Δp, supply duct"),
                  tr("Pressure lost in the supply ductwork and terminals after the unit."),
                  &Flows::supplyExternalAfter),
         pressure(tr("External Δp, extract duct"),
                  tr("Pressure lost in the extract ductwork and grilles before the unit."),
                  &Flows::extractExternalBefore),
         pressure(tr("External Δp, exhaust duct"), tr("Pressure lost in the exhaust duct and outlet after the unit."),
                  &Flows::extractExternalAfter)},
        [](const Project::Project& p) -> const Flows& { return p.unit.airflows; },
        [](Project::Project& p, const Flows& v) { p.unit.airflows = v; });

    // Casing.
    using Casing = Chain::Casing;
    auto optionalLength = [](const QString& label, const QString& tip, std::optional<Length> Casing::*member) {
        return optionalField<Casing>(
            label, tip, tr("sized to the face velocity"), 1200.0, FieldQuantity::length(),
            [member](const Casing& c) {
                return optionalValue((c.*member) ? std::optional<double>(toMillimetres(*(c.*member))) : std::nullopt);
            },
            [member](Casing& c, const QVariant& v) {
                c.*member = v.isValid() ? std::optional<Length>(millimetres(v.toDouble())) : std::nullopt;
            });
    };
    bindPart<Casing, EditCasingCommand>(
        m_casing, m_document,
        {field<Casing>(
             Type::Real, tr("Largest face velocity"),
             tr("The casing is sized as the smallest grid rectangle at or under this velocity, 0.5 .. 6 m/s."),
             [](const Casing& c) { return QVariant(toMetresPerSecond(c.targetFaceVelocity)); },
             [](Casing& c, const QVariant& v) { c.targetFaceVelocity = metresPerSecond(v.toDouble()); },
             Kind::Velocity),
         optionalLength(tr("Inner width"), tr("Fix the inner width of the casing, 200 .. 10000 mm."), &Casing::width),
         optionalLength(tr("Inner height of a deck"), tr("Fix the inner height of one deck, 200 .. 10000 mm."),
                        &Casing::height),
         field<Casing>(
             Type::Real, tr("Sizing grid"), tr("Width and height are sized in steps of this length, 10 .. 500 mm."),
             [](const Casing& c) { return QVariant(toMillimetres(c.sizingGrid)); },
             [](Casing& c, const QVariant& v) { c.sizingGrid = millimetres(v.toDouble()); }, FieldQuantity::length())},
        [](const Project::Project& p) -> const Casing& { return p.unit.casing; },
        [](Project::Project& p, const Casing& v) { p.unit.casing = v; });
    m_casing->addInfo(
        tr("Sized casing"),
        [this]() -> QString {
            const auto& result = m_document->result();
            if (!result)
                return tr("not computed");
            const auto& s = result->sizing;
            const FieldQuantity len = FieldQuantity::length();
            // A result, not an input: rounded to what a drawing would state (whole
            // millimetres, tenths of an inch), not the editors' five digits.
            const int decimals = m_units->system() == UnitSystem::System::IP ? 1 : 0;
            auto mm = [&](Length l) {
                return QString::number(len.toDisplay(*m_units, toMillimetres(l)), 'f', decimals);
            };
            return tr("%1 × %2 %3 (width × height of a deck), unit length %4 %3")
                .arg(mm(s.width), mm(s.height), len.unit(*m_units), mm(s.unitLength));
        },
        tr("Inner size of one deck as sized by the chain, and the longer path's length."));

    connect(m_document, &ProjectDocument::changed, this, [this] { refresh(); });
    connect(m_document, &ProjectDocument::resultsChanged, this, [this] { refresh(); });
    connect(m_units, &UnitSystem::changed, this, [this] {
        for (auto* form : {m_info, m_site, m_airflows, m_casing})
            form->refreshUnits();
    });
    refresh();
}

void ProjectEditor::refresh()
{
    for (auto* form : {m_info, m_site, m_airflows, m_casing})
        form->refresh();
}

} // namespace Airwright::Ui
