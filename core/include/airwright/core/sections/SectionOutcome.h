#pragma once

#include "airwright/core/Finding.h"
#include "airwright/core/Quantities.h"
#include "airwright/core/sections/AirStream.h"

#include <vector>

namespace Airwright::Core::Sections {

// The common result of computing one section. Type-specific figures go into the
// section's own Detail struct.
struct SectionOutcome {
    AirStream outlet;
    Pressure pressureDrop;     // static pressure lost (fans: negative, a rise)
    MassFlow waterAdded;       // humidifiers (kg/s of water into the air)
    MassFlow waterRemoved;     // condensate leaving the air
    std::vector<Finding> findings;
};

// Sensible outlet for a stream whose temperature changes at constant W; supersaturation
// is clamped and the condensate reported in the outcome.
SectionOutcome outcomeAtTemperature(const AirStream& inlet, AbsoluteTemperature outletTdb, Pressure pressureDrop);

// Pressure drop that scales with the square of face velocity from a loss coefficient.
Pressure dynamicPressureDrop(double lossCoefficient, Density density, Velocity velocity);

// dp = dpRated (v / vRated)^exponent, for rated pressure drops of coils, silencers.
Pressure scaledPressureDrop(Pressure ratedDrop, Velocity ratedVelocity, Velocity velocity, double exponent);

} // namespace Airwright::Core::Sections
