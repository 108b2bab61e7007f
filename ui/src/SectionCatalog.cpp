#include "airwright/ui/SectionCatalog.h"

#include "airwright/core/recovery/HeatRecovery.h"

#include <type_traits>

namespace Airwright::Ui {

using namespace Airwright::Core;
using Entry = SectionCatalog::Entry;
using Symbol = SectionCatalog::Symbol;

const std::vector<Entry>& SectionCatalog::entries()
{
    static const std::vector<Entry> all{Entry::Damper,      Entry::Filter,       Entry::HeatingCoil,
                                        Entry::ElectricHeater, Entry::CoolingCoil, Entry::Humidifier,
                                        Entry::Fan,         Entry::Silencer,     Entry::EmptySection,
                                        Entry::Mixing,      Entry::HeatRecovery};
    return all;
}

QString SectionCatalog::label(Entry entry)
{
    switch (entry) {
    case Entry::Damper:
        return QStringLiteral("Damper");
    case Entry::Filter:
        return QStringLiteral("Filter");
    case Entry::HeatingCoil:
        return QStringLiteral("Heating coil (water)");
    case Entry::ElectricHeater:
        return QStringLiteral("Electric heater");
    case Entry::CoolingCoil:
        return QStringLiteral("Cooling coil (chilled water)");
    case Entry::Humidifier:
        return QStringLiteral("Humidifier");
    case Entry::Fan:
        return QStringLiteral("Fan");
    case Entry::Silencer:
        return QStringLiteral("Silencer");
    case Entry::EmptySection:
        return QStringLiteral("Empty or access section");
    case Entry::Mixing:
        return QStringLiteral("Mixing (recirculation)");
    case Entry::HeatRecovery:
        return QStringLiteral("Heat recovery");
    }
    return {};
}

QString SectionCatalog::description(Entry entry)
{
    switch (entry) {
    case Entry::Damper:
        return QStringLiteral("Shut-off or control damper; pressure drop from its open loss coefficient.");
    case Entry::Filter:
        return QStringLiteral("Filter stage graded by ISO 16890; design pressure drop is the mean of initial "
                              "and final (EN 13053).");
    case Entry::HeatingCoil:
        return QStringLiteral("Hot-water or glycol heating coil controlled to the supply setpoint.");
    case Entry::ElectricHeater:
        return QStringLiteral("Electric air heater, stepped or continuous. Needs an airflow interlock and "
                              "an overheat cut-out.");
    case Entry::CoolingCoil:
        return QStringLiteral("Chilled-water cooling coil, wet or dry, with condensate.");
    case Entry::Humidifier:
        return QStringLiteral("Steam or adiabatic humidifier controlled to the minimum supply humidity.");
    case Entry::Fan:
        return QStringLiteral("Fan with motor, drive and speed controller; delivers the path's internal "
                              "and external pressure.");
    case Entry::Silencer:
        return QStringLiteral("Splitter silencer: costs pressure and length only.");
    case Entry::EmptySection:
        return QStringLiteral("Empty, access or plenum section: costs pressure and length only.");
    case Entry::Mixing:
        return QStringLiteral("Mixing section: takes recirculated air from the extract path into the supply. "
                              "Spans both decks.");
    case Entry::HeatRecovery:
        return QStringLiteral("Air-to-air heat recovery (plate, rotary wheel or run-around coils). Spans "
                              "both decks.");
    }
    return {};
}

Symbol SectionCatalog::symbol(Entry entry)
{
    switch (entry) {
    case Entry::Damper:
        return Symbol::Damper;
    case Entry::Filter:
        return Symbol::Filter;
    case Entry::HeatingCoil:
        return Symbol::HeatingCoil;
    case Entry::ElectricHeater:
        return Symbol::ElectricHeater;
    case Entry::CoolingCoil:
        return Symbol::CoolingCoil;
    case Entry::Humidifier:
        return Symbol::Humidifier;
    case Entry::Fan:
        return Symbol::Fan;
    case Entry::Silencer:
        return Symbol::Silencer;
    case Entry::EmptySection:
        return Symbol::Access;
    case Entry::Mixing:
        return Symbol::Mixing;
    case Entry::HeatRecovery:
        return Symbol::PlateExchanger;
    }
    return Symbol::Empty;
}

bool SectionCatalog::isCoupled(Entry entry)
{
    return entry == Entry::Mixing || entry == Entry::HeatRecovery;
}

QString SectionCatalog::baseId(Entry entry)
{
    switch (entry) {
    case Entry::Damper:
        return QStringLiteral("damper");
    case Entry::Filter:
        return QStringLiteral("filter");
    case Entry::HeatingCoil:
        return QStringLiteral("heating-coil");
    case Entry::ElectricHeater:
        return QStringLiteral("electric-heater");
    case Entry::CoolingCoil:
        return QStringLiteral("cooling-coil");
    case Entry::Humidifier:
        return QStringLiteral("humidifier");
    case Entry::Fan:
        return QStringLiteral("fan");
    case Entry::Silencer:
        return QStringLiteral("silencer");
    case Entry::EmptySection:
        return QStringLiteral("empty");
    case Entry::Mixing:
        return QStringLiteral("mixing");
    case Entry::HeatRecovery:
        return QStringLiteral("hr");
    }
    return QStringLiteral("section");
}

Chain::SectionSpec SectionCatalog::defaultSpec(Entry entry, Chain::PathKind path)
{
    switch (entry) {
    case Entry::Damper: {
        Sections::Damper damper;
        damper.role = path == Chain::PathKind::Supply ? Sections::DamperRole::OutdoorAir
                                                       : Sections::DamperRole::Exhaust;
        return damper;
    }
    case Entry::Filter:
        return Sections::Filter{};
    case Entry::HeatingCoil:
        return Sections::WaterHeatingCoil{};
    case Entry::ElectricHeater:
        return Sections::ElectricHeater{};
    case Entry::CoolingCoil:
        return Sections::CoolingCoil{};
    case Entry::Humidifier:
        return Sections::Humidifier{};
    case Entry::Fan:
        return Sections::Fan{};
    case Entry::Silencer:
        return Sections::PassiveSection{};
    case Entry::EmptySection: {
        Sections::PassiveSection empty;
        empty.kind = Sections::PassiveKind::Access;
        empty.ratedPressureDrop = pascals(5.0);
        empty.length = metres(0.6);
        return empty;
    }
    case Entry::Mixing: {
        // A new mixing section recirculates: all outdoor air would make it pointless.
        Sections::MixingBox mixing;
        mixing.outdoorAirFraction = percent(30.0);
        return mixing;
    }
    case Entry::HeatRecovery:
        return Recovery::HeatRecovery{};
    }
    return Sections::PassiveSection{};
}

Symbol SectionCatalog::symbolOf(const Chain::SectionSpec& spec)
{
    return std::visit(
        [](const auto& s) -> Symbol {
            using T = std::decay_t<decltype(s)>;
            if constexpr (std::is_same_v<T, Sections::Damper>)
                return Symbol::Damper;
            else if constexpr (std::is_same_v<T, Sections::Filter>)
                return Symbol::Filter;
            else if constexpr (std::is_same_v<T, Sections::WaterHeatingCoil>)
                return Symbol::HeatingCoil;
            else if constexpr (std::is_same_v<T, Sections::ElectricHeater>)
                return Symbol::ElectricHeater;
            else if constexpr (std::is_same_v<T, Sections::CoolingCoil>)
                return Symbol::CoolingCoil;
            else if constexpr (std::is_same_v<T, Sections::Humidifier>)
                return Symbol::Humidifier;
            else if constexpr (std::is_same_v<T, Sections::Fan>)
                return Symbol::Fan;
            else if constexpr (std::is_same_v<T, Sections::PassiveSection>) {
                switch (s.kind) {
                case Sections::PassiveKind::Silencer:
                    return Symbol::Silencer;
                case Sections::PassiveKind::Access:
                    return Symbol::Access;
                case Sections::PassiveKind::Empty:
                case Sections::PassiveKind::Plenum:
                    return Symbol::Empty;
                }
                return Symbol::Empty;
            } else if constexpr (std::is_same_v<T, Sections::MixingBox>)
                return Symbol::Mixing;
            else if constexpr (std::is_same_v<T, Recovery::HeatRecovery>) {
                if (Recovery::isRotary(s.kind))
                    return Symbol::RotaryWheel;
                if (s.kind == Recovery::ExchangerKind::RunAroundCoil)
                    return Symbol::RunAroundCoil;
                return Symbol::PlateExchanger;
            } else
                return Symbol::Empty;
        },
        spec);
}

Symbol SectionCatalog::symbolOf(const Chain::AirHandlingUnit& unit, const Chain::Section& section)
{
    if (std::holds_alternative<Chain::CoupledSide>(section.spec)) {
        for (const auto& s : unit.supply)
            if (s.id == section.id && Chain::isCoupled(s.spec))
                return symbolOf(s.spec);
        return Symbol::Empty;
    }
    return symbolOf(section.spec);
}

QString SectionCatalog::typeLabel(const Chain::SectionSpec& spec)
{
    if (const auto* hr = std::get_if<Recovery::HeatRecovery>(&spec))
        return QStringLiteral("heat recovery, %1").arg(QString::fromUtf8(Recovery::exchangerKindLabel(hr->kind)));
    if (const auto* passive = std::get_if<Sections::PassiveSection>(&spec)) {
        switch (passive->kind) {
        case Sections::PassiveKind::Silencer:
            return QStringLiteral("silencer");
        case Sections::PassiveKind::Access:
            return QStringLiteral("access section");
        case Sections::PassiveKind::Empty:
            return QStringLiteral("empty section");
        case Sections::PassiveKind::Plenum:
            return QStringLiteral("plenum");
        }
    }
    return QString::fromUtf8(Chain::sectionTypeLabel(spec));
}

} // namespace Airwright::Ui
