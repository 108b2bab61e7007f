#include "airwright/core/annual/ComparisonSettings.h"

#include "airwright/core/InputError.h"

namespace Airwright::Core::Annual {

void ComparisonSettings::validate() const
{
    annual.validate();
    prices.validate();
    if (!(evaluationYears >= 1.0 && evaluationYears <= 50.0))
        throw InputError("evaluation period", evaluationYears, "years", "1 .. 50 years");
    for (const Ratio& offset : roomHumidityOffsets)
        if (!(offset.value() >= -0.9 && offset.value() <= 0.9))
            throw InputError("room humidity offset of the sensitivity table", toPercent(offset), "percentage points",
                             "-90 .. 90");
    for (const double factor : heatPriceFactors)
        if (!(factor >= 0.0 && factor <= 100.0))
            throw InputError("heat price factor of the sensitivity table", factor, "", "0 .. 100");
}

} // namespace Airwright::Core::Annual
