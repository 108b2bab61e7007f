// Must not compile: a temperature difference is not an absolute temperature.
#include "airwright/core/Quantities.h"

using namespace Airwright::Core;

int main()
{
    const AbsoluteTemperature t = celsius(20.0) - celsius(5.0);
    return static_cast<int>(toCelsius(t));
}
