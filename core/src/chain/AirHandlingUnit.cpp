#include "airwright/core/chain/AirHandlingUnit.h"

#include "airwright/core/psychro/Psychrometrics.h"

namespace Airwright::Core::Chain {

Pressure Site::pressure() const
{
    if (barometricPressure)
        return *barometricPressure;
    return Psychro::standardPressureAtAltitude(altitude.value_or(metres(0.0)));
}

} // namespace Airwright::Core::Chain
