#pragma once

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/HeatRecovery.h"

#include <optional>

namespace Airwright::Core::Recovery {

struct FrostAssessment {
    bool risk = false;                              // frost would form without protection
    std::optional<AbsoluteTemperature> onsetOutdoorTemperature;
    FrostStrategy strategy = FrostStrategy::None;
    Power protectionPower;                          // preheat duty, or recovery given up
    Ratio recoveredFraction = percent(100.0);       // of the unprotected recovery kept
};

struct LeakageFigures {
    Ratio exhaustAirTransfer;                       // EATR
    double outdoorAirCorrection = 1.0;              // OACF
};

// What a heat recovery section reports per case, on top of the per-side states.
struct HeatRecoveryDetail {
    ExchangerKind kind = ExchangerKind::PlateCounterFlow;
    Ratio temperatureEffectiveness;                 // actual, supply side
    std::optional<Ratio> humidityEffectiveness;     // wheels
    Ratio regulationThermalEfficiency;              // Regulation (EU) 1253/2014 definition
    Power recovered;                                // to the supply air (+ heats it)
    Ratio bypassFraction;
    MassFlow condensate;                            // both sides, with fog from the crossing flows
    FrostAssessment frost;
    LeakageFigures leakage;
    Pressure cleanExtractPressureDrop;              // at the actual flow: frost detection base
    Pressure frostAlarmPressureDrop;                // base + rise (common practice 5 .. 10 Pa)
    std::optional<Pressure> supplyMinusExtract;     // static pressures at the exchanger
    std::optional<AbsoluteTemperature> loopSupplyTemperature; // run-around loops
    std::optional<AbsoluteTemperature> loopReturnTemperature;
    Power pumpPower;
};

} // namespace Airwright::Core::Recovery
