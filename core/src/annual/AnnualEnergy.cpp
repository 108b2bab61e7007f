#include "airwright/core/annual/AnnualEnergy.h"

namespace Airwright::Core::Annual {

void AnnualEnergy::add(const HourResult& hour, Duration duration)
{
    if (hour.mode == OperatingMode::Off)
        return;
    heating += hour.heating * duration;
    cooling += hour.cooling * duration;
    humidifier += hour.humidifierPower * duration;
    fan += hour.fanPower * duration;
    pump += hour.pumpPower * duration;
    if (hour.recovered.value() > 0.0)
        recoveredHeating += hour.recovered * duration;
    else
        recoveredCooling -= hour.recovered * duration;
    frostProtection += hour.frostProtection * duration;
    humidificationWater += hour.humidification * duration;
    operatingTime += duration;
    if (hour.frost)
        frostTime += duration;
}

AnnualEnergy& AnnualEnergy::operator+=(const AnnualEnergy& o)
{
    heating += o.heating;
    cooling += o.cooling;
    humidifier += o.humidifier;
    fan += o.fan;
    pump += o.pump;
    recoveredHeating += o.recoveredHeating;
    recoveredCooling += o.recoveredCooling;
    frostProtection += o.frostProtection;
    humidificationWater += o.humidificationWater;
    operatingTime += o.operatingTime;
    frostTime += o.frostTime;
    return *this;
}

} // namespace Airwright::Core::Annual
