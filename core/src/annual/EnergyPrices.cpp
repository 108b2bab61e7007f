#include "airwright/core/annual/EnergyPrices.h"

#include "airwright/core/InputError.h"

namespace Airwright::Core::Annual {

void EnergyPrices::validate() const
{
    const auto perKwh = [](const char* what, double v, const char* unit) {
        if (!(v >= 0.0 && v <= 100.0))
            throw InputError(what, v, unit, "0 .. 100");
    };
    perKwh("heat price", heatPricePerKilowattHour, "per kWh");
    perKwh("electricity price", electricityPricePerKilowattHour, "per kWh");
    perKwh("CO2 factor of heat", heatCo2KilogramsPerKilowattHour, "kg/kWh");
    perKwh("CO2 factor of electricity", electricityCo2KilogramsPerKilowattHour, "kg/kWh");
    if (!(coolingEer >= 0.5 && coolingEer <= 20.0))
        throw InputError("seasonal EER of the cold source", coolingEer, "", "0.5 .. 20");
}

} // namespace Airwright::Core::Annual
