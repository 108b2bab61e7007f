#pragma once
// One hour of outdoor air: dry bulb, humidity ratio and station pressure, the
// state the hour ends with (EPW hour 1 covers 00:00 .. 01:00). Dew point and
// relative humidity are derived, never stored, so they cannot disagree.

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"

namespace Airwright::Core::Annual {

struct WeatherHour {
    AbsoluteTemperature dryBulb;
    HumidityRatio humidityRatio;
    Pressure pressure;

    Psychro::MoistAirState state() const;
    AbsoluteTemperature dewPoint() const;
    Ratio relativeHumidity() const;

    bool operator==(const WeatherHour&) const = default;
};

} // namespace Airwright::Core::Annual
