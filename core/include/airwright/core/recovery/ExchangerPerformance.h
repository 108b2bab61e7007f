#pragma once
// Result of one exchanger evaluation. Heat flows are positive when the supply air
// gains; condensate is liquid (or frost) left by each stream in the device.

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/recovery/RunAroundLoopState.h"

#include <optional>

namespace Airwright::Core::Recovery {

struct ExchangerPerformance {
    Psychro::MoistAirState supplyOutlet;   // after the bypass has rejoined
    Psychro::MoistAirState extractOutlet;
    Power sensibleHeat;                    // m_supply cp (t_out - t_in)
    Power totalHeat;                       // m_supply (h_out - h_in)
    // Supply side: (t_sup,out - t_sup,in) / (t_ext,in - t_sup,in), likewise in W;
    // zero when the inlet difference is zero.
    Ratio temperatureEffectiveness;
    Ratio humidityEffectiveness;
    MassFlow moistureTransfer;             // vapour moved into the supply stream (negative: out of it)
    MassFlow supplyCondensate;
    MassFlow extractCondensate;
    Pressure supplyPressureDrop;           // over the core at the core flow
    Pressure extractPressureDrop;
    Power auxiliaryPower;                  // loop pump
    // Coldest heat-transfer surface (plates: the cold corner; loop: the coldest
    // fluid; rotors: the cold inlet air) and the frost criterion of FrostOnset.h.
    AbsoluteTemperature coldestSurfaceTemperature;
    bool frostRisk = false;
    // How far the point is from frosting, continuous so that protection can be
    // solved for by a root finder; frostRisk == (frostMargin < 0). Plates and loops:
    // kelvin of the coldest surface above min(0 C, dew/frost point of the warm
    // stream); rotors: g/kg of the mixing line below saturation (1 when it cannot frost).
    double frostMargin = 1.0;
    Ratio bypassFraction;
    Ratio rotorSpeedRatio;
    std::optional<RunAroundLoopState> loop; // run-around coil systems only
};

} // namespace Airwright::Core::Recovery
