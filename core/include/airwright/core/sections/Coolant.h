#pragma once
// The liquid on the water side of a coil: water, or an aqueous ethylene or
// propylene glycol solution (heating coils on district heating water, chilled
// water coils, run-around loops). Specific heat and density come from published
// tables interpolated bilinearly in concentration and temperature; sources and
// limits are in docs/coolant-properties.md.
//
// Glycol concentration is a MASS fraction, as a loop is filled by weighing or by
// a refractometer reading converted to mass. The handbook's glycol tables are in
// volume percent; volumeConcentration() gives the conversion used to read them.

#include "airwright/core/Quantities.h"

#include <optional>
#include <string>
#include <string_view>

namespace Airwright::Core::Sections {

enum class CoolantKind { Water, EthyleneGlycol, PropyleneGlycol };

class Coolant {
public:
    Coolant() = default; // water

    // Water takes exactly 0; a glycol 0.10 .. 0.60. Anything else (or NaN) throws
    // InputError naming the allowed range.
    Coolant(CoolantKind kind, Ratio massConcentration);

    // For a fill quoted in volume percent (glycol volume over glycol plus water
    // volume, measured apart at 20 C). The resulting mass fraction must still be
    // within 0.10 .. 0.60.
    static Coolant fromVolumeConcentration(CoolantKind kind, Ratio volumeConcentration);

    CoolantKind kind() const { return m_kind; }
    Ratio massConcentration() const { return m_massConcentration; }
    Ratio volumeConcentration() const;

    // Both throw InputError outside [lowestTemperature(), highestTemperature()].
    SpecificHeatCapacity specificHeat(AbsoluteTemperature t) const;
    Density density(AbsoluteTemperature t) const;

    AbsoluteTemperature freezingPoint() const;

    // The usable range: from 1 K above the freezing point (but not below where the
    // table starts for this concentration) up to 100 C.
    AbsoluteTemperature lowestTemperature() const;
    AbsoluteTemperature highestTemperature() const;

    std::string description() const; // "water", "ethylene glycol 30 %"

    bool operator==(const Coolant&) const = default;

private:
    CoolantKind m_kind = CoolantKind::Water;
    Ratio m_massConcentration = fraction(0.0);
};

// Keys used in project files: "water", "ethylene_glycol", "propylene_glycol".
const char* coolantKindKey(CoolantKind kind);
std::optional<CoolantKind> coolantKindFromKey(std::string_view key);

} // namespace Airwright::Core::Sections
