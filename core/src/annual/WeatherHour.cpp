#include "airwright/core/annual/WeatherHour.h"

#include "airwright/core/psychro/Psychrometrics.h"

namespace Airwright::Core::Annual {

Psychro::MoistAirState WeatherHour::state() const
{
    return Psychro::MoistAirState::fromDryBulbHumidityRatio(dryBulb, humidityRatio, pressure);
}

AbsoluteTemperature WeatherHour::dewPoint() const
{
    return Psychro::dewPointFromHumidityRatio(humidityRatio, pressure);
}

Ratio WeatherHour::relativeHumidity() const
{
    return Psychro::relativeHumidityFromHumidityRatio(dryBulb, humidityRatio, pressure);
}

} // namespace Airwright::Core::Annual
