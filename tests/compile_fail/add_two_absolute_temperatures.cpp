// Must not compile: the sum of two absolute temperatures has no meaning.
#include "airwright/core/Quantities.h"

using namespace Airwright::Core;

int main()
{
    const auto sum = celsius(20.0) + celsius(5.0);
    return static_cast<int>(sum.value());
}
