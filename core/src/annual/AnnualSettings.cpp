#include "airwright/core/annual/AnnualSettings.h"

#include "airwright/core/InputError.h"

namespace Airwright::Core::Annual {

void AnnualSettings::validate() const
{
    schedule.validate();
    const double step = toKelvinDifference(tableStep);
    if (!(step >= 0.1 && step <= 5.0))
        throw InputError("exchanger table step", step, "K", "0.1 .. 5 K");
}

} // namespace Airwright::Core::Annual
