#pragma once
// Energy over a period (power x time). Quantities.h has no alias for it, so the
// annual layer defines one with named conversions in kWh and MWh, the units
// energy is billed and reported in.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Annual {

using Energy = bu::quantity<si::energy>;

inline constexpr double kJoulesPerKilowattHour = 3.6e6;

inline Energy kilowattHours(double v)
{
    return Energy::from_value(v * kJoulesPerKilowattHour);
}
inline double toKilowattHours(Energy e)
{
    return e.value() / kJoulesPerKilowattHour;
}
inline Energy megawattHours(double v)
{
    return Energy::from_value(v * 1000.0 * kJoulesPerKilowattHour);
}
inline double toMegawattHours(Energy e)
{
    return e.value() / (1000.0 * kJoulesPerKilowattHour);
}

} // namespace Airwright::Core::Annual
