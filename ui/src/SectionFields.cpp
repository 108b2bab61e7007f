#include "airwright/ui/SectionFields.h"

#include "airwright/core/recovery/HeatRecovery.h"

#include <QStringList>

#include <type_traits>

namespace Airwright::Ui {

using namespace Airwright::Core;
using Kind = UnitSystem::Kind;
using Type = FieldRow::Type;
using Spec = SectionFields::Spec;

namespace {

// Appends the fields of one section type S; getters and setters work on S and are
// wrapped to reach it inside a Section.
template <class S>
class Fields {
public:
    explicit Fields(std::vector<Spec>& out) : m_out(out) {}

    void real(const QString& label, FieldQuantity quantity, const QString& tip, std::function<double(const S&)> get,
              std::function<void(S&, double)> set, std::function<bool(const S&)> applies = {})
    {
        Spec spec = base(Type::Real, label, tip, applies);
        spec.options.quantity = quantity;
        spec.get = [get](const Chain::Section& s) { return QVariant(get(std::get<S>(s.spec))); };
        spec.set = [set](Chain::Section& s, const QVariant& v) { set(std::get<S>(s.spec), v.toDouble()); };
        m_out.push_back(std::move(spec));
    }

    void optional(const QString& label, FieldQuantity quantity, const QString& tip, const QString& offText,
                  double defaultOn, std::function<std::optional<double>(const S&)> get,
                  std::function<void(S&, std::optional<double>)> set, std::function<bool(const S&)> applies = {})
    {
        Spec spec = base(Type::OptionalReal, label, tip, applies);
        spec.options.quantity = quantity;
        spec.options.offText = offText;
        spec.options.defaultOn = defaultOn;
        spec.get = [get](const Chain::Section& s) {
            const auto v = get(std::get<S>(s.spec));
            return v ? QVariant(*v) : QVariant();
        };
        spec.set = [set](Chain::Section& s, const QVariant& v) {
            set(std::get<S>(s.spec), v.isValid() ? std::optional<double>(v.toDouble()) : std::nullopt);
        };
        m_out.push_back(std::move(spec));
    }

    void integer(const QString& label, int minimum, int maximum, const QString& tip, std::function<int(const S&)> get,
                 std::function<void(S&, int)> set, std::function<bool(const S&)> applies = {})
    {
        Spec spec = base(Type::Integer, label, tip, applies);
        spec.options.minimum = minimum;
        spec.options.maximum = maximum;
        spec.get = [get](const Chain::Section& s) { return QVariant(get(std::get<S>(s.spec))); };
        spec.set = [set](Chain::Section& s, const QVariant& v) { set(std::get<S>(s.spec), v.toInt()); };
        m_out.push_back(std::move(spec));
    }

    void choice(const QString& label, const QStringList& choices, const QString& tip, std::function<int(const S&)> get,
                std::function<void(S&, int)> set, std::function<bool(const S&)> applies = {})
    {
        Spec spec = base(Type::Choice, label, tip, applies);
        spec.options.choices = choices;
        spec.get = [get](const Chain::Section& s) { return QVariant(get(std::get<S>(s.spec))); };
        spec.set = [set](Chain::Section& s, const QVariant& v) { set(std::get<S>(s.spec), v.toInt()); };
        m_out.push_back(std::move(spec));
    }

    void flag(const QString& label, const QString& tip, std::function<bool(const S&)> get,
              std::function<void(S&, bool)> set, std::function<bool(const S&)> applies = {})
    {
        Spec spec = base(Type::Flag, label, tip, applies);
        spec.get = [get](const Chain::Section& s) { return QVariant(get(std::get<S>(s.spec))); };
        spec.set = [set](Chain::Section& s, const QVariant& v) { set(std::get<S>(s.spec), v.toBool()); };
        m_out.push_back(std::move(spec));
    }

    // Water or a glycol solution with its mass concentration.
    void coolant(const QString& what, Sections::Coolant S::*member, std::function<bool(const S&)> applies = {})
    {
        choice(what, {tr("water"), tr("ethylene glycol"), tr("propylene glycol")},
               tr("The liquid in the coil. Glycol lowers the freezing point and the heat transfer."),
               [member](const S& s) { return static_cast<int>((s.*member).kind()); },
               [member](S& s, int i) {
                   auto& fluid = s.*member;
                   const auto kind = static_cast<Sections::CoolantKind>(i);
                   if (kind == Sections::CoolantKind::Water)
                       fluid = Sections::Coolant();
                   else if (kind != fluid.kind())
                       fluid = Sections::Coolant(kind, fluid.kind() == Sections::CoolantKind::Water
                                                           ? percent(30.0)
                                                           : fluid.massConcentration());
               },
               applies);
        real(tr("Glycol concentration"), Kind::Percent,
             tr("Glycol mass fraction of the solution, 10 .. 60 % (by weight, as a refractometer reading "
                "converted to mass)."),
             [member](const S& s) { return toPercent((s.*member).massConcentration()); },
             [member](S& s, double v) {
                 auto& fluid = s.*member;
                 fluid = Sections::Coolant(fluid.kind(), percent(v));
             },
             [member, applies](const S& s) {
                 return (!applies || applies(s)) && (s.*member).kind() != Sections::CoolantKind::Water;
             });
    }

    void length()
    {
        real(tr("Length"), FieldQuantity::length(), tr("Casing length of the section along the airflow."),
             [](const S& s) { return toMillimetres(s.length); }, [](S& s, double v) { s.length = millimetres(v); });
    }

    static QString tr(const char* text) { return QString::fromUtf8(text); }

private:
    static Spec base(Type type, const QString& label, const QString& tip, std::function<bool(const S&)> applies)
    {
        Spec spec;
        spec.type = type;
        spec.label = label;
        spec.options.tooltip = tip;
        if (applies)
            spec.applies = [applies](const Chain::Section& s) { return applies(std::get<S>(s.spec)); };
        return spec;
    }

    std::vector<Spec>& m_out;
};

QString tr(const char* text)
{
    return QString::fromUtf8(text);
}

void addFields(std::vector<Spec>& out, const Sections::Damper&)
{
    using S = Sections::Damper;
    Fields<S> f(out);
    f.choice(tr("Purpose"), {tr("outdoor air"), tr("exhaust air"), tr("recirculation"), tr("shut-off")},
             tr("Where the damper sits; recorded for the schedule."),
             [](const S& s) { return static_cast<int>(s.role); },
             [](S& s, int i) { s.role = static_cast<Sections::DamperRole>(i); });
    f.real(tr("Loss coefficient ζ"), Kind::Number,
           tr("Pressure loss of the open damper in dynamic pressures at the face velocity, 0 .. 50."),
           [](const S& s) { return s.lossCoefficient; }, [](S& s, double v) { s.lossCoefficient = v; });
    f.integer(tr("Leakage class (EN 1751)"), 0, 4,
              tr("Closed-blade air tightness class of EN 1751, 0 .. 4 (4 is the tightest)."),
              [](const S& s) { return s.leakageClass; }, [](S& s, int v) { s.leakageClass = v; });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::Filter&)
{
    using S = Sections::Filter;
    Fields<S> f(out);
    f.choice(tr("ISO 16890 group"), {tr("ISO Coarse"), tr("ISO ePM10"), tr("ISO ePM2.5"), tr("ISO ePM1")},
             tr("Filter group of ISO 16890-1; it sets the default final pressure drop."),
             [](const S& s) { return static_cast<int>(s.group); },
             [](S& s, int i) { s.group = static_cast<Sections::FilterGroup>(i); });
    f.real(tr("Efficiency"), Kind::Percent,
           tr("Efficiency the group is named after (ePM1, ePM2.5, ePM10), or the arrestance for ISO Coarse."),
           [](const S& s) { return toPercent(s.efficiency); }, [](S& s, double v) { s.efficiency = percent(v); });
    f.choice(tr("Construction"), {tr("panel"), tr("bag"), tr("compact")}, tr("Build of the filter element."),
             [](const S& s) { return static_cast<int>(s.construction); },
             [](S& s, int i) { s.construction = static_cast<Sections::FilterConstruction>(i); });
    f.real(tr("Initial pressure drop"), Kind::Pressure,
           tr("Pressure drop of the clean filter at its nominal flow (manufacturer's data)."),
           [](const S& s) { return toPascals(s.initialPressureDrop); },
           [](S& s, double v) { s.initialPressureDrop = pascals(v); });
    f.optional(tr("Final pressure drop"), Kind::Pressure,
               tr("Pressure drop at which the filter is changed. The design drop is the mean of initial and "
                  "final (EN 13053)."),
               tr("default of the group"), 250.0,
               [](const S& s) -> std::optional<double> {
                   return s.finalPressureDrop ? std::optional<double>(toPascals(*s.finalPressureDrop)) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.finalPressureDrop = v ? std::optional<Pressure>(pascals(*v)) : std::nullopt;
               });
    f.optional(tr("Nominal flow"), Kind::AirVolumeFlow,
               tr("Flow at which the pressure drops above are given; they scale with (flow / nominal)^exponent."),
               tr("the path's design flow"), 10000.0,
               [](const S& s) -> std::optional<double> {
                   return s.nominalFlow ? std::optional<double>(toCubicMetresPerHour(*s.nominalFlow)) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.nominalFlow = v ? std::optional<VolumeFlow>(cubicMetresPerHour(*v)) : std::nullopt;
               });
    f.real(tr("Flow exponent"), Kind::Number,
           tr("Exponent of the pressure drop over flow, 1 .. 2 (about 1.3 for pleated media, common practice)."),
           [](const S& s) { return s.flowExponent; }, [](S& s, double v) { s.flowExponent = v; });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::WaterHeatingCoil&)
{
    using S = Sections::WaterHeatingCoil;
    Fields<S> f(out);
    f.real(tr("Flow temperature"), Kind::Temperature, tr("Heating water temperature entering the coil."),
           [](const S& s) { return toCelsius(s.flowTemperature); },
           [](S& s, double v) { s.flowTemperature = celsius(v); });
    f.real(tr("Return temperature"), Kind::Temperature,
           tr("Heating water temperature leaving the coil; below the flow temperature."),
           [](const S& s) { return toCelsius(s.returnTemperature); },
           [](S& s, double v) { s.returnTemperature = celsius(v); });
    f.coolant(tr("Fluid"), &S::fluid);
    f.integer(tr("Rows"), 1, 12, tr("Tube rows in the direction of the airflow, 1 .. 12."),
              [](const S& s) { return s.rows; }, [](S& s, int v) { s.rows = v; });
    f.real(tr("Air pressure drop per row"), Kind::Pressure,
           tr("Air-side pressure drop of one dry row at 2 m/s face velocity; scaled to the actual velocity."),
           [](const S& s) { return toPascals(s.pressureDropPerRow); },
           [](S& s, double v) { s.pressureDropPerRow = pascals(v); });
    f.optional(tr("Capacity"), Kind::Power, tr("Largest duty the coil can give; leave unset to size it to the demand."),
               tr("as the demand needs"), 50.0,
               [](const S& s) -> std::optional<double> {
                   return s.capacity ? std::optional<double>(toKilowatts(*s.capacity)) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.capacity = v ? std::optional<Power>(kilowatts(*v)) : std::nullopt;
               });
    f.optional(tr("Fixed outlet temperature"), Kind::Temperature,
               tr("Preheater duty: heat to this temperature whatever the setpoint. Leave unset to control to "
                  "the supply setpoint."),
               tr("controlled to the setpoint"), 5.0,
               [](const S& s) -> std::optional<double> {
                   return s.fixedOutletTemperature ? std::optional<double>(toCelsius(*s.fixedOutletTemperature))
                                                   : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.fixedOutletTemperature = v ? std::optional<AbsoluteTemperature>(celsius(*v)) : std::nullopt;
               });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::ElectricHeater&)
{
    using S = Sections::ElectricHeater;
    Fields<S> f(out);
    f.optional(tr("Rated power"), Kind::Power,
               tr("Electric rating at 400 V three-phase; leave unset to size it to the largest demand."),
               tr("sized to the largest demand"), 20.0,
               [](const S& s) -> std::optional<double> {
                   return s.ratedPower ? std::optional<double>(toKilowatts(*s.ratedPower)) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.ratedPower = v ? std::optional<Power>(kilowatts(*v)) : std::nullopt;
               });
    f.integer(tr("Steps"), 0, 32, tr("Equal switching steps, 0 for continuous (thyristor) control, up to 32."),
              [](const S& s) { return s.steps; }, [](S& s, int v) { s.steps = v; });
    f.real(tr("Air pressure drop"), Kind::Pressure, tr("Air-side pressure drop at 2 m/s face velocity."),
           [](const S& s) { return toPascals(s.pressureDrop); }, [](S& s, double v) { s.pressureDrop = pascals(v); });
    f.optional(tr("Fixed outlet temperature"), Kind::Temperature,
               tr("Preheater duty: heat to this temperature whatever the setpoint (-40 .. 60 °C)."),
               tr("controlled to the setpoint"), 5.0,
               [](const S& s) -> std::optional<double> {
                   return s.fixedOutletTemperature ? std::optional<double>(toCelsius(*s.fixedOutletTemperature))
                                                   : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.fixedOutletTemperature = v ? std::optional<AbsoluteTemperature>(celsius(*v)) : std::nullopt;
               });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::CoolingCoil&)
{
    using S = Sections::CoolingCoil;
    Fields<S> f(out);
    f.real(tr("Water inlet temperature"), Kind::Temperature, tr("Chilled water temperature entering the coil."),
           [](const S& s) { return toCelsius(s.waterInletTemperature); },
           [](S& s, double v) { s.waterInletTemperature = celsius(v); });
    f.real(tr("Water outlet temperature"), Kind::Temperature,
           tr("Chilled water temperature leaving the coil; above the inlet temperature."),
           [](const S& s) { return toCelsius(s.waterOutletTemperature); },
           [](S& s, double v) { s.waterOutletTemperature = celsius(v); });
    f.coolant(tr("Fluid"), &S::fluid);
    f.integer(tr("Rows"), 1, 12, tr("Tube rows in the direction of the airflow, 1 .. 12."),
              [](const S& s) { return s.rows; }, [](S& s, int v) { s.rows = v; });
    f.optional(tr("Bypass factor"), Kind::Number,
               tr("Share of the air passing the coil unaffected, above 0 and below 1; leave unset to take it "
                  "from the number of rows."),
               tr("from the rows"), 0.1,
               [](const S& s) -> std::optional<double> {
                   return s.bypassFactor ? std::optional<double>(s.bypassFactor->value()) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.bypassFactor = v ? std::optional<Ratio>(fraction(*v)) : std::nullopt;
               });
    f.real(tr("Air pressure drop per row"), Kind::Pressure,
           tr("Air-side pressure drop of one dry row at 2 m/s face velocity."),
           [](const S& s) { return toPascals(s.pressureDropPerRow); },
           [](S& s, double v) { s.pressureDropPerRow = pascals(v); });
    f.real(tr("Wet pressure drop factor"), Kind::Number,
           tr("Pressure drop of wet fins over dry fins, 1 .. 3 (about 1.4, common practice)."),
           [](const S& s) { return s.wetPressureDropFactor; }, [](S& s, double v) { s.wetPressureDropFactor = v; });
    f.optional(tr("Capacity"), Kind::Power, tr("Largest coil load; leave unset to size it to the demand."),
               tr("as the demand needs"), 50.0,
               [](const S& s) -> std::optional<double> {
                   return s.capacity ? std::optional<double>(toKilowatts(*s.capacity)) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.capacity = v ? std::optional<Power>(kilowatts(*v)) : std::nullopt;
               });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::Humidifier&)
{
    using S = Sections::Humidifier;
    Fields<S> f(out);
    const auto adiabatic = [](const S& s) { return s.kind == Sections::HumidifierKind::Adiabatic; };
    const auto steam = [](const S& s) { return s.kind == Sections::HumidifierKind::Steam; };
    f.choice(tr("Kind"), {tr("steam"), tr("adiabatic (evaporative)")},
             tr("Steam adds vapour at the steam temperature; adiabatic humidification cools the air along the "
                "wet-bulb line."),
             [](const S& s) { return static_cast<int>(s.kind); },
             [](S& s, int i) { s.kind = static_cast<Sections::HumidifierKind>(i); });
    f.real(tr("Saturation efficiency"), Kind::Percent,
           tr("Share of the wet-bulb depression the humidifier achieves, above 0 .. 100 %."),
           [](const S& s) { return toPercent(s.saturationEfficiency); },
           [](S& s, double v) { s.saturationEfficiency = percent(v); }, adiabatic);
    f.real(tr("Steam temperature"), Kind::Temperature, tr("Temperature of the steam injected, 100 .. 180 °C."),
           [](const S& s) { return toCelsius(s.steamTemperature); },
           [](S& s, double v) { s.steamTemperature = celsius(v); }, steam);
    f.real(tr("Feed water temperature"), Kind::Temperature,
           tr("Temperature of the water fed to the steam generator, above 0 .. 60 °C."),
           [](const S& s) { return toCelsius(s.feedWaterTemperature); },
           [](S& s, double v) { s.feedWaterTemperature = celsius(v); }, steam);
    f.optional(tr("Capacity"), Kind::MassFlowPerHour, tr("Largest water output; leave unset to size it to the demand."),
               tr("as the demand needs"), 20.0,
               [](const S& s) -> std::optional<double> {
                   return s.capacity ? std::optional<double>(toKilogramsPerSecond(*s.capacity) * 3600.0)
                                     : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.capacity = v ? std::optional<MassFlow>(kilogramsPerSecond(*v / 3600.0)) : std::nullopt;
               });
    f.real(tr("Air pressure drop"), Kind::Pressure, tr("Air-side pressure drop at 2 m/s face velocity."),
           [](const S& s) { return toPascals(s.pressureDrop); }, [](S& s, double v) { s.pressureDrop = pascals(v); });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::Fan&)
{
    using S = Sections::Fan;
    Fields<S> f(out);
    f.real(tr("Fan efficiency"), Kind::Percent, tr("Total efficiency of the impeller at the duty point."),
           [](const S& s) { return toPercent(s.fanEfficiency); }, [](S& s, double v) { s.fanEfficiency = percent(v); });
    f.real(tr("Motor efficiency"), Kind::Percent, tr("Efficiency of the motor at the duty point."),
           [](const S& s) { return toPercent(s.motorEfficiency); },
           [](S& s, double v) { s.motorEfficiency = percent(v); });
    f.integer(tr("Motor class IE (IEC 60034-30-1)"), 1, 5, tr("Efficiency class of the motor, IE1 .. IE5; recorded."),
              [](const S& s) { return s.motorIeClass; }, [](S& s, int v) { s.motorIeClass = v; });
    f.real(tr("Drive efficiency"), Kind::Percent, tr("Direct drive 100 %, belt drive about 93 % (common practice)."),
           [](const S& s) { return toPercent(s.driveEfficiency); },
           [](S& s, double v) { s.driveEfficiency = percent(v); });
    f.real(tr("Speed controller efficiency"), Kind::Percent, tr("Efficiency of the variable speed drive."),
           [](const S& s) { return toPercent(s.controllerEfficiency); },
           [](S& s, double v) { s.controllerEfficiency = percent(v); });
    f.flag(tr("Motor in the airstream"),
           tr("Plug fan: the motor's losses heat the air too. Otherwise only the shaft power does."),
           [](const S& s) { return s.motorInAirstream; }, [](S& s, bool v) { s.motorInAirstream = v; });
    f.optional(tr("Inlet ring k-factor (m³/h per √Pa)"), Kind::Number,
               tr("Flow measurement at the inlet ring: flow [m³/h] = k √(Δp [Pa]). Gives the ring pressure to "
                  "set the flow."),
               tr("no flow measurement"), 100.0,
               [](const S& s) { return s.kFactor; }, [](S& s, std::optional<double> v) { s.kFactor = v; });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::PassiveSection&)
{
    using S = Sections::PassiveSection;
    Fields<S> f(out);
    f.choice(tr("Kind"), {tr("silencer"), tr("access section"), tr("empty section"), tr("plenum")},
             tr("What the section is; all of them cost pressure and length only."),
             [](const S& s) { return static_cast<int>(s.kind); },
             [](S& s, int i) { s.kind = static_cast<Sections::PassiveKind>(i); });
    f.real(tr("Rated pressure drop"), Kind::Pressure,
           tr("Pressure drop at the rated face velocity; scales with the square of the velocity."),
           [](const S& s) { return toPascals(s.ratedPressureDrop); },
           [](S& s, double v) { s.ratedPressureDrop = pascals(v); });
    f.real(tr("Rated face velocity"), Kind::Velocity, tr("Face velocity at which the pressure drop is given."),
           [](const S& s) { return toMetresPerSecond(s.ratedVelocity); },
           [](S& s, double v) { s.ratedVelocity = metresPerSecond(v); });
    f.length();
}

void addFields(std::vector<Spec>& out, const Sections::MixingBox&)
{
    using S = Sections::MixingBox;
    Fields<S> f(out);
    f.real(tr("Outdoor air share"), Kind::Percent,
           tr("Outdoor air as a share of the supply; the rest is recirculated extract air."),
           [](const S& s) { return toPercent(s.outdoorAirFraction); },
           [](S& s, double v) { s.outdoorAirFraction = percent(v); });
    f.optional(tr("Minimum outdoor airflow"), Kind::AirVolumeFlow,
               tr("Hygienic minimum; overrides the share when it asks for more outdoor air."), tr("none"), 2000.0,
               [](const S& s) -> std::optional<double> {
                   return s.minimumOutdoorFlow ? std::optional<double>(toCubicMetresPerHour(*s.minimumOutdoorFlow))
                                               : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.minimumOutdoorFlow = v ? std::optional<VolumeFlow>(cubicMetresPerHour(*v)) : std::nullopt;
               });
    f.real(tr("Loss coefficient ζ"), Kind::Number,
           tr("Pressure loss of both dampers in dynamic pressures at the face velocity, 0 .. 50."),
           [](const S& s) { return s.lossCoefficient; }, [](S& s, double v) { s.lossCoefficient = v; });
    f.length();
}

void addFields(std::vector<Spec>& out, const Recovery::HeatRecovery&)
{
    using S = Recovery::HeatRecovery;
    Fields<S> f(out);
    const auto rotary = [](const S& s) { return Recovery::isRotary(s.kind); };
    const auto loop = [](const S& s) { return s.kind == Recovery::ExchangerKind::RunAroundCoil; };
    QStringList kinds;
    for (int i = 0; i <= static_cast<int>(Recovery::ExchangerKind::RunAroundCoil); ++i)
        kinds << QString::fromUtf8(Recovery::exchangerKindLabel(static_cast<Recovery::ExchangerKind>(i)));
    f.choice(tr("Exchanger"), kinds, tr("Kind of air-to-air exchanger, grouped as in EN 308."),
             [](const S& s) { return static_cast<int>(s.kind); },
             [](S& s, int i) {
                 s.kind = static_cast<Recovery::ExchangerKind>(i);
                 // Rotor speed control of frost only exists for wheels.
                 if (!Recovery::isRotary(s.kind) && s.frostStrategy == Recovery::FrostStrategy::RotorSpeed)
                     s.frostStrategy = Recovery::FrostStrategy::Bypass;
                 if (!Recovery::transfersMoisture(s.kind))
                     s.ratedHumidityEfficiency = percent(0.0);
             });
    f.real(tr("Rated temperature efficiency"), Kind::Percent,
           tr("Dry temperature efficiency at balanced rated flows (EN 308), above 0 .. below 95 %."),
           [](const S& s) { return toPercent(s.ratedEfficiency); },
           [](S& s, double v) { s.ratedEfficiency = percent(v); });
    f.optional(tr("Rated flow"), Kind::AirVolumeFlow, tr("Flow at which the efficiency and pressure drops are rated."),
               tr("the supply design flow"), 10000.0,
               [](const S& s) -> std::optional<double> {
                   return s.ratedFlow ? std::optional<double>(toCubicMetresPerHour(*s.ratedFlow)) : std::nullopt;
               },
               [](S& s, std::optional<double> v) {
                   s.ratedFlow = v ? std::optional<VolumeFlow>(cubicMetresPerHour(*v)) : std::nullopt;
               });
    f.real(tr("Rated humidity efficiency"), Kind::Percent,
           tr("Moisture recovery of a hygroscopic or sorption wheel at rated flows (EN 308)."),
           [](const S& s) { return toPercent(s.ratedHumidityEfficiency); },
           [](S& s, double v) { s.ratedHumidityEfficiency = percent(v); },
           [](const S& s) { return Recovery::transfersMoisture(s.kind); });
    f.real(tr("Pressure drop, supply side"), Kind::Pressure, tr("Air pressure drop on the supply side at rated flow."),
           [](const S& s) { return toPascals(s.ratedPressureDropSupply); },
           [](S& s, double v) { s.ratedPressureDropSupply = pascals(v); });
    f.real(tr("Pressure drop, extract side"), Kind::Pressure,
           tr("Air pressure drop on the extract side at rated flow."),
           [](const S& s) { return toPascals(s.ratedPressureDropExtract); },
           [](S& s, double v) { s.ratedPressureDropExtract = pascals(v); });
    f.real(tr("Rotor speed (rpm)"), Kind::Number, tr("Wheel speed in revolutions per minute, above 0.5 .. 30."),
           [](const S& s) { return s.rotorSpeed; }, [](S& s, double v) { s.rotorSpeed = v; }, rotary);
    f.real(tr("Exhaust air transfer (EATR)"), Kind::Percent,
           tr("Share of supply air that is carried-over extract air (EN 308), 0 .. 20 %."),
           [](const S& s) { return toPercent(s.exhaustAirTransfer); },
           [](S& s, double v) { s.exhaustAirTransfer = percent(v); }, rotary);
    f.real(tr("Outdoor air correction (OACF)"), Kind::Number,
           tr("Outdoor air entering over supply air leaving, 0.8 .. 1.5; above 1 outdoor air short-circuits to "
              "the exhaust."),
           [](const S& s) { return s.outdoorAirCorrection; }, [](S& s, double v) { s.outdoorAirCorrection = v; },
           rotary);
    f.flag(tr("Purge sector"), tr("A purge sector flushes the wheel before it turns into the supply."),
           [](const S& s) { return s.purgeSector; }, [](S& s, bool v) { s.purgeSector = v; }, rotary);
    f.coolant(tr("Loop fluid"), &S::loopFluid, loop);
    f.real(tr("Loop pump power"), Kind::Power, tr("Electric power of the loop pump, 0 .. 100 kW."),
           [](const S& s) { return toKilowatts(s.pumpPower); }, [](S& s, double v) { s.pumpPower = kilowatts(v); },
           loop);
    f.flag(tr("Modulated to the setpoint"),
           tr("Bypass or speed control reduces recovery when it would overshoot the supply setpoint."),
           [](const S& s) { return s.bypassControl; }, [](S& s, bool v) { s.bypassControl = v; });
    f.choice(tr("Frost protection"),
             {tr("none"), tr("bypass"), tr("preheat outdoor air"), tr("sectional defrost"), tr("reduced supply"),
              tr("rotor speed (wheels)")},
             tr("How the exchanger is kept free of ice when the exhaust side would freeze."),
             [](const S& s) { return static_cast<int>(s.frostStrategy); },
             [](S& s, int i) { s.frostStrategy = static_cast<Recovery::FrostStrategy>(i); });
    f.integer(tr("Defrost sections"), 2, 16, tr("Sections of the core defrosted one at a time, 2 .. 16."),
              [](const S& s) { return s.defrostSections; }, [](S& s, int v) { s.defrostSections = v; },
              [](const S& s) { return s.frostStrategy == Recovery::FrostStrategy::SectionalDefrost; });
    f.length();
}

void addFields(std::vector<Spec>&, const Chain::CoupledSide&) {}

} // namespace

std::vector<Spec> SectionFields::fieldsFor(const Chain::SectionSpec& sectionSpec)
{
    std::vector<Spec> out;
    Spec id;
    id.type = Type::Text;
    id.label = QStringLiteral("Id");
    id.options.tooltip = QStringLiteral("Name of the section, unique in the unit; results, findings and the "
                                        "schedule refer to it.");
    id.get = [](const Chain::Section& s) { return QVariant(QString::fromStdString(s.id)); };
    id.set = [](Chain::Section& s, const QVariant& v) { s.id = v.toString().toStdString(); };
    out.push_back(std::move(id));
    std::visit([&](const auto& s) { addFields(out, s); }, sectionSpec);
    return out;
}

} // namespace Airwright::Ui
