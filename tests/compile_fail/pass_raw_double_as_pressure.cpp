// Must not compile: a raw number does not silently become a pressure.
#include "airwright/core/Quantities.h"

using namespace Airwright::Core;

static double pressureInPascals(Pressure p) { return toPascals(p); }

int main()
{
    return static_cast<int>(pressureInPascals(101325.0));
}
