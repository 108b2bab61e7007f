#pragma once
// Datasheet-style rating of an air-to-air heat recovery device. Efficiencies are
// the dry temperature ratio on the supply side at balanced rated flow under the
// EN 308 test conditions (from memory: outdoor 5 C, extract 25 C, dry air).

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/ExchangerKind.h"

#include <optional>

namespace Airwright::Core::Recovery {

// Reference density that turns a rated volume flow into a mass flow (common
// practice: standard air, 1.2 kg/m3).
inline constexpr double kReferenceAirDensity = 1.2;

struct ExchangerRating {
    ExchangerKind kind = ExchangerKind::PlateCounterFlow;
    Ratio ratedTemperatureEfficiency = fraction(0.0); // 0 .. below 1
    VolumeFlow ratedVolumeFlow = cubicMetresPerSecond(0.0); // per side, balanced
    Pressure ratedSupplyPressureDrop = pascals(0.0);
    Pressure ratedExtractPressureDrop = pascals(0.0);
    std::optional<Ratio> pressureDropExponent;  // empty: defaultPressureDropExponent(kind)
    std::optional<Ratio> heatTransferExponent;  // empty: defaultHeatTransferExponent(kind)

    // Rotors.
    Ratio ratedHumidityEfficiency = fraction(0.0); // hygroscopic and sorption rotors only
    // Rotor matrix heat capacity rate over the air capacity rate at rated speed
    // and flow. Rarely published; 5 is our estimate for an aluminium wheel at
    // about 10 rev/min (about 40 kg matrix per m3/s, c = 900 J/(kg K)).
    Ratio ratedRotorCapacityRatio = fraction(5.0);

    // Run-around coil loop.
    SpecificHeatCapacity loopFluidSpecificHeat = joulesPerKilogramKelvin(4186.0); // water; glycol mixes lower
    std::optional<MassFlow> loopFluidFlow; // empty: capacity rate equal to the air's at rated flow
    Power pumpPower = watts(0.0);
};

} // namespace Airwright::Core::Recovery
