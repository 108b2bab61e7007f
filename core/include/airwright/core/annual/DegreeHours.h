#pragma once
// Degree hours (kelvin x time): the integral of a temperature difference over time,
// e.g. heating degree hours below a base temperature. Quantities.h has no alias for
// it, so the annual layer defines one with named conversions in K·h.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Annual {

using DegreeHours = bu::quantity<decltype(si::kelvin * si::second)>;

inline DegreeHours kelvinHours(double v)
{
    return DegreeHours::from_value(v * 3600.0);
}
inline double toKelvinHours(DegreeHours d)
{
    return d.value() / 3600.0;
}

} // namespace Airwright::Core::Annual
