// Must not compile: a pressure plus a volume flow is a dimension error.
#include "airwright/core/Quantities.h"

using namespace Airwright::Core;

int main()
{
    const auto sum = pascals(100.0) + cubicMetresPerSecond(1.0);
    return static_cast<int>(sum.value());
}
