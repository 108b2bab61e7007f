#pragma once
// One operating case of an exchanger: both inlet states with their dry-air mass
// flows and the capacity control. "Supply" is the outdoor air stream on its way
// in, "extract" the room air on its way out; winter or summer is only a matter
// of which is warmer.

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"

namespace Airwright::Core::Recovery {

struct ExchangerOperatingPoint {
    Psychro::MoistAirState supplyInlet;
    MassFlow supplyDryAirFlow;
    Psychro::MoistAirState extractInlet;
    MassFlow extractDryAirFlow;
    // Fraction of the supply air led round the core (for a run-around loop,
    // round the supply coil), 0 .. 1.
    Ratio bypassFraction = fraction(0.0);
    // Rotor speed over rated speed, 0 .. 1 (rotors only).
    Ratio rotorSpeedRatio = fraction(1.0);
};

} // namespace Airwright::Core::Recovery
