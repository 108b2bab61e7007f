#pragma once
// A section of a unit: its id and its type-specific description. Sections are
// values; a unit's paths are ordered lists of them. A section that couples both
// paths (heat recovery, mixing) has its full description in the supply path and
// a CoupledSide marker with the same id in the extract path.

#include "airwright/core/recovery/HeatRecovery.h"
#include "airwright/core/sections/CoolingCoil.h"
#include "airwright/core/sections/Damper.h"
#include "airwright/core/sections/ElectricHeater.h"
#include "airwright/core/sections/Fan.h"
#include "airwright/core/sections/Filter.h"
#include "airwright/core/sections/Humidifier.h"
#include "airwright/core/sections/MixingBox.h"
#include "airwright/core/sections/PassiveSection.h"
#include "airwright/core/sections/WaterHeatingCoil.h"

#include <optional>
#include <string>
#include <string_view>
#include <variant>

namespace Airwright::Core::Chain {

// The extract-path place of a coupled section described in the supply path.
struct CoupledSide {
    bool operator==(const CoupledSide&) const = default;
};

using SectionSpec = std::variant<Sections::Damper, Sections::Filter, Sections::WaterHeatingCoil,
                                 Sections::ElectricHeater, Sections::CoolingCoil, Sections::Humidifier,
                                 Sections::Fan, Sections::PassiveSection, Sections::MixingBox,
                                 Recovery::HeatRecovery, CoupledSide>;

struct Section {
    std::string id;
    SectionSpec spec;

    bool operator==(const Section&) const = default;
};

// Stable type keys used in files and output: "damper", "filter", "heating_coil_water",
// "heating_coil_electric", "cooling_coil", "humidifier", "fan", "passive", "mixing",
// "heat_recovery", "coupled".
const char* sectionTypeKey(const SectionSpec& spec);
const char* sectionTypeLabel(const SectionSpec& spec); // plain words for people
bool isCoupled(const SectionSpec& spec);               // heat recovery or mixing
Length sectionLength(const SectionSpec& spec);         // CoupledSide: 0 (the supply side carries it)

} // namespace Airwright::Core::Chain
