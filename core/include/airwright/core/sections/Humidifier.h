#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>
#include <string_view>

namespace Airwright::Core::Sections {

enum class HumidifierKind { Steam, Adiabatic };
const char* humidifierKindKey(HumidifierKind kind);
std::optional<HumidifierKind> humidifierKindFromKey(std::string_view key);

// A humidifier controlled to the supply's minimum humidity. Steam adds vapour at
// the steam temperature; adiabatic humidification follows the wet-bulb line and is
// limited by its saturation efficiency.
class Humidifier {
public:
    HumidifierKind kind = HumidifierKind::Steam;
    Ratio saturationEfficiency = percent(85.0);  // adiabatic only
    AbsoluteTemperature steamTemperature = celsius(100.0);
    AbsoluteTemperature feedWaterTemperature = celsius(10.0);
    std::optional<MassFlow> capacity;            // water, kg/s
    Pressure pressureDrop = pascals(20.0);       // at 2 m/s
    Length length = metres(0.9);

    struct Detail {
        MassFlow waterAdded;      // steam or evaporated water into the air
        Power steamGeneratorPower; // steam: heat to raise the steam from feed water
        bool capacityLimited = false;
        bool targetReached = true;
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const Humidifier&) const = default;
};

} // namespace Airwright::Core::Sections
