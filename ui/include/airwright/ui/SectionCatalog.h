#pragma once
// The section types a user can add, with their plain names, the symbol each is
// drawn with and a sensible starting description. One table, so the palette, the
// drawing and the editor agree on what a type is called.

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/SectionResult.h"

#include <QString>

#include <vector>

namespace Airwright::Ui {

class SectionCatalog {
public:
    enum class Entry {
        Damper,
        Filter,
        HeatingCoil,
        ElectricHeater,
        CoolingCoil,
        Humidifier,
        Fan,
        Silencer,
        EmptySection,
        Mixing,
        HeatRecovery,
    };

    // What the drawing shows for a section: one symbol per kind of equipment.
    enum class Symbol {
        Damper,
        Filter,
        HeatingCoil,
        ElectricHeater,
        CoolingCoil,
        Humidifier,
        Fan,
        Silencer,
        Empty,
        Access,
        Mixing,
        PlateExchanger,
        RotaryWheel,
        RunAroundCoil,
    };

    static const std::vector<Entry>& entries();
    static QString label(Entry entry);       // "Cooling coil"
    static QString description(Entry entry); // one sentence for tooltips
    static Symbol symbol(Entry entry);
    static bool isCoupled(Entry entry);      // spans both paths
    static QString baseId(Entry entry);      // "cooling-coil": new ids are this, this-2, ...

    // A new section's description; a damper on the extract path is an exhaust damper.
    static Core::Chain::SectionSpec defaultSpec(Entry entry, Core::Chain::PathKind path);

    // The symbol of a section as placed in the unit (a coupled-side marker takes the
    // symbol of its supply-side description).
    static Symbol symbolOf(const Core::Chain::AirHandlingUnit& unit, const Core::Chain::Section& section);
    static Symbol symbolOf(const Core::Chain::SectionSpec& spec);

    // Plain words for the type of a section ("water heating coil", "heat recovery, counter-flow plate").
    static QString typeLabel(const Core::Chain::SectionSpec& spec);
};

} // namespace Airwright::Ui
