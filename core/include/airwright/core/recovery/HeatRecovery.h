#pragma once
// The heat recovery section of a unit: a datasheet-described air-to-air exchanger
// coupling the supply and extract paths, with its control and frost protection.

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/ExchangerKind.h"
#include "airwright/core/sections/Coolant.h"

#include <optional>
#include <string_view>

namespace Airwright::Core::Recovery {

// File keys and labels of the exchanger kinds (ExchangerKind.h).
const char* exchangerKindKey(ExchangerKind kind);
const char* exchangerKindLabel(ExchangerKind kind);
std::optional<ExchangerKind> exchangerKindFromKey(std::string_view key);

// How the exchanger is kept free of ice at low outdoor temperatures.
enum class FrostStrategy {
    None,
    Bypass,           // open the bypass, reducing recovery until the exhaust stays above its limit
    Preheat,          // preheater lifts outdoor air to the frost-onset temperature
    SectionalDefrost, // bypass one section of the core at a time, the rest keeps recovering
    ReducedSupply,    // cut the supply flow during defrost (unbalanced)
    RotorSpeed,       // wheels: slow the rotor
};
const char* frostStrategyKey(FrostStrategy strategy);
std::optional<FrostStrategy> frostStrategyFromKey(std::string_view key);

struct HeatRecovery {
    ExchangerKind kind = ExchangerKind::PlateCounterFlow;
    Ratio ratedEfficiency = percent(80.0);       // dry temperature efficiency, balanced, EN 308
    std::optional<VolumeFlow> ratedFlow;         // empty: the supply design flow
    Ratio ratedHumidityEfficiency = percent(0.0); // wheels
    Pressure ratedPressureDropSupply = pascals(150.0);
    Pressure ratedPressureDropExtract = pascals(150.0);
    double rotorSpeed = 10.0;                    // rpm, wheels
    Ratio exhaustAirTransfer = percent(0.0);     // EATR, wheels (EN 308)
    double outdoorAirCorrection = 1.0;           // OACF, wheels
    bool purgeSector = true;
    Sections::Coolant loopFluid;                 // run-around loops
    Power pumpPower = watts(0.0);                // run-around loops
    bool bypassControl = true;                   // modulate recovery to the setpoint
    FrostStrategy frostStrategy = FrostStrategy::Bypass;
    int defrostSections = 4;                     // sectional defrost
    Length length = metres(1.6);

    void validate() const;
    bool operator==(const HeatRecovery&) const = default;
};

} // namespace Airwright::Core::Recovery
