#pragma once
// Kinds of air-to-air heat recovery, named as EN 308 groups them: recuperators
// (plates), regenerators (rotors, non-hygroscopic or hygroscopic) and coupled
// coils with an intermediate fluid (run-around loop).

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/FlowArrangement.h"

#include <string_view>

namespace Airwright::Core::Recovery {

enum class ExchangerKind {
    PlateCrossFlow,
    PlateCounterFlow,
    PlateCrossCounterFlow,
    RotaryNonHygroscopic, // condensation rotor: moisture moves only as condensate picked up again
    RotaryHygroscopic,    // enthalpy rotor
    RotarySorption,       // sorption-coated rotor
    RunAroundCoil,        // two coils coupled by a pumped water or glycol loop
};

std::string_view toString(ExchangerKind kind);

bool isPlate(ExchangerKind kind);
bool isRotary(ExchangerKind kind);
// Rotors whose matrix takes up vapour (the humidity efficiency applies).
bool transfersMoisture(ExchangerKind kind);

// The eps-NTU arrangement of a plate exchanger (counter-flow for a rotor's
// NTU_o and for each coil of a run-around loop).
FlowArrangement arrangementOf(ExchangerKind kind);

// Defaults when a datasheet gives no exponent (common practice, see
// docs/heat-recovery.md): pressure drop ~ flow^x with x = 1.5 for plates (laminar
// channels plus entry and exit losses), 1.2 for rotors (fine laminar matrix
// channels), 1.8 for finned coils; per-side heat-transfer conductance ~ flow^n
// with n = 0.6 for plates and rotors, 0.7 for coils.
Ratio defaultPressureDropExponent(ExchangerKind kind);
Ratio defaultHeatTransferExponent(ExchangerKind kind);

} // namespace Airwright::Core::Recovery
