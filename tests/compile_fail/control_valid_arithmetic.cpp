// Control: the legal forms of the expressions the other files get wrong.
#include "airwright/core/Quantities.h"

using namespace Airwright::Core;

int main()
{
    const AbsoluteTemperature a = celsius(20.0);
    const AbsoluteTemperature b = celsius(5.0);
    const TemperatureDifference d = a - b;       // absolute - absolute = difference
    const AbsoluteTemperature c = b + d;         // absolute + difference = absolute
    const Pressure p = pascals(100.0) + pascals(50.0);
    const VolumeFlow q = cubicMetresPerSecond(1.0) + cubicMetresPerSecond(2.0);
    return (toCelsius(c) > 0.0 && toPascals(p) > 0.0 && toCubicMetresPerSecond(q) > 0.0) ? 0 : 1;
}
