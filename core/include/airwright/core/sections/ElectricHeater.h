#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>

namespace Airwright::Core::Sections {

// An electric air heater on a 400 V three-phase supply. With steps = 0 it modulates
// continuously (thyristor control); otherwise it switches in equal steps and the
// outlet is the step at or above what the target needs, up to its rating.
class ElectricHeater {
public:
    std::optional<Power> ratedPower;     // empty: sized to the largest case demand
    int steps = 0;
    Pressure pressureDrop = pascals(15.0); // at 2 m/s
    std::optional<AbsoluteTemperature> fixedOutletTemperature;
    Length length = metres(0.4);

    static constexpr double kLineVoltage = 400.0;

    struct Detail {
        Power duty;
        std::optional<Power> rated;
        int stepsOn = 0;
        ElectricCurrent lineCurrent;   // at full rating (or at the duty when unrated)
        bool capacityLimited = false;
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const ElectricHeater&) const = default;
};

} // namespace Airwright::Core::Sections
