#pragma once

#include "airwright/core/Quantities.h"
#include "airwright/core/sections/SectionContext.h"

#include <optional>
#include <string>

namespace Airwright::Core::Chain {

// One design condition the unit must meet: winter design, summer design, or any
// case the user adds (mid-season, part load).
struct DesignCase {
    std::string name;
    AbsoluteTemperature outdoorTemperature = celsius(-12.0);
    Ratio outdoorHumidity = percent(85.0);          // relative humidity
    AbsoluteTemperature roomTemperature = celsius(21.0);
    Ratio roomHumidity = percent(35.0);             // of the extract air
    AbsoluteTemperature supplySetpoint = celsius(19.0);
    std::optional<Ratio> minimumSupplyHumidity;     // relative, at the supply setpoint
    std::optional<Ratio> maximumSupplyHumidity;
    bool dehumidifyWithReheat = false;
    Sections::FilterCondition filterCondition = Sections::FilterCondition::Design;
    Ratio airflowFraction = percent(100.0);

    void validate() const; // throws InputError
    bool operator==(const DesignCase&) const = default;
};

} // namespace Airwright::Core::Chain
