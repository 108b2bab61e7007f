#pragma once
// Energies and times summed over a year (or over any set of hours).

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/Energy.h"
#include "airwright/core/annual/HourResult.h"

namespace Airwright::Core::Annual {

struct AnnualEnergy {
    Energy heating;
    Energy cooling;
    Energy humidifier;       // steam generation, electric
    Energy fan;
    Energy pump;
    Energy recoveredHeating; // exchanger heat to the supply air, in hours it heats
    Energy recoveredCooling; // exchanger heat from the supply air, in hours it cools (positive)
    Energy frostProtection;
    Mass humidificationWater;
    Duration operatingTime;  // normal and setback hours
    Duration frostTime;

    // Adds an hour's powers over duration (bins: the bin's hours in that mode).
    // An Off hour adds nothing.
    void add(const HourResult& hour, Duration duration);
    AnnualEnergy& operator+=(const AnnualEnergy& other);
};

} // namespace Airwright::Core::Annual
