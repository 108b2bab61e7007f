#include "airwright/core/chain/Section.h"

#include <type_traits>

namespace Airwright::Core::Chain {

namespace {
template <class> inline constexpr bool kAlwaysFalse = false;
} // namespace

const char* sectionTypeKey(const SectionSpec& spec)
{
    return std::visit(
        [](const auto& s) -> const char* {
            using T = std::decay_t<decltype(s)>;
            if constexpr (std::is_same_v<T, Sections::Damper>)
                return "damper";
            else if constexpr (std::is_same_v<T, Sections::Filter>)
                return "filter";
            else if constexpr (std::is_same_v<T, Sections::WaterHeatingCoil>)
                return "heating_coil_water";
            else if constexpr (std::is_same_v<T, Sections::ElectricHeater>)
                return "heating_coil_electric";
            else if constexpr (std::is_same_v<T, Sections::CoolingCoil>)
                return "cooling_coil";
            else if constexpr (std::is_same_v<T, Sections::Humidifier>)
                return "humidifier";
            else if constexpr (std::is_same_v<T, Sections::Fan>)
                return "fan";
            else if constexpr (std::is_same_v<T, Sections::PassiveSection>)
                return "passive";
            else if constexpr (std::is_same_v<T, Sections::MixingBox>)
                return "mixing";
            else if constexpr (std::is_same_v<T, Recovery::HeatRecovery>)
                return "heat_recovery";
            else if constexpr (std::is_same_v<T, CoupledSide>)
                return "coupled";
            else
                static_assert(kAlwaysFalse<T>, "every section type needs a key");
        },
        spec);
}

const char* sectionTypeLabel(const SectionSpec& spec)
{
    return std::visit(
        [](const auto& s) -> const char* {
            using T = std::decay_t<decltype(s)>;
            if constexpr (std::is_same_v<T, Sections::Damper>)
                return "damper";
            else if constexpr (std::is_same_v<T, Sections::Filter>)
                return "filter";
            else if constexpr (std::is_same_v<T, Sections::WaterHeatingCoil>)
                return "water heating coil";
            else if constexpr (std::is_same_v<T, Sections::ElectricHeater>)
                return "electric heater";
            else if constexpr (std::is_same_v<T, Sections::CoolingCoil>)
                return "cooling coil";
            else if constexpr (std::is_same_v<T, Sections::Humidifier>)
                return "humidifier";
            else if constexpr (std::is_same_v<T, Sections::Fan>)
                return "fan";
            else if constexpr (std::is_same_v<T, Sections::PassiveSection>)
                return Sections::passiveKindKey(s.kind);
            else if constexpr (std::is_same_v<T, Sections::MixingBox>)
                return "mixing section";
            else if constexpr (std::is_same_v<T, Recovery::HeatRecovery>)
                return "heat recovery";
            else
                return "coupled section";
        },
        spec);
}

bool isCoupled(const SectionSpec& spec)
{
    return std::holds_alternative<Recovery::HeatRecovery>(spec) || std::holds_alternative<Sections::MixingBox>(spec);
}

Length sectionLength(const SectionSpec& spec)
{
    return std::visit(
        [](const auto& s) -> Length {
            using T = std::decay_t<decltype(s)>;
            if constexpr (std::is_same_v<T, CoupledSide>)
                return metres(0.0);
            else
                return s.length;
        },
        spec);
}

} // namespace Airwright::Core::Chain
