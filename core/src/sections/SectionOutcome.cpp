#include "airwright/core/sections/SectionOutcome.h"
#include "airwright/core/PowerLaw.h"

#include "airwright/core/psychro/AirProcesses.h"

#include <cmath>

namespace Airwright::Core::Sections {

SectionOutcome outcomeAtTemperature(const AirStream& inlet, AbsoluteTemperature outletTdb, Pressure pressureDrop)
{
    const auto process = Psychro::heatToTemperature(inlet.state, outletTdb);
    SectionOutcome outcome{{process.outlet, inlet.dryAir}, pressureDrop, MassFlow{}, inlet.dryAir * process.condensate,
                           {}};
    return outcome;
}

Pressure dynamicPressureDrop(double lossCoefficient, Density density, Velocity velocity)
{
    return lossCoefficient * 0.5 * density * velocity * velocity;
}

Pressure scaledPressureDrop(Pressure ratedDrop, Velocity ratedVelocity, Velocity velocity, double exponent)
{
    if (ratedVelocity.value() <= 0.0)
        return ratedDrop;
    return ratedDrop * powerLaw(velocity.value() / ratedVelocity.value(), exponent);
}

} // namespace Airwright::Core::Sections
