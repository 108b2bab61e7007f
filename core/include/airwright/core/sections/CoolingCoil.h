#pragma once

#include "airwright/core/sections/Coolant.h"
#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>

namespace Airwright::Core::Sections {

// A chilled-water cooling coil, wet or dry, by the apparatus dew point / bypass
// factor method (ASHRAE Fundamentals 2017 ch. 1). It cools to the control target,
// or below it to reach the maximum humidity when dehumidification is asked for.
// Coil load includes the condensate enthalpy term.
class CoolingCoil {
public:
    AbsoluteTemperature waterInletTemperature = celsius(6.0);
    AbsoluteTemperature waterOutletTemperature = celsius(12.0);
    Coolant fluid;
    int rows = 6;
    std::optional<Ratio> bypassFactor;             // empty: from rows (common practice)
    Pressure pressureDropPerRow = pascals(14.0);   // dry, at 2 m/s
    double wetPressureDropFactor = 1.4;            // wet fins, common practice
    std::optional<Power> capacity;
    Length length = metres(0.6);

    Ratio effectiveBypassFactor() const;

    struct Detail {
        Power totalLoad;       // positive = heat removed, includes condensate term
        Power sensibleLoad;
        Power latentLoad;
        Ratio sensibleHeatRatio;
        MassFlow condensate;
        std::optional<AbsoluteTemperature> apparatusDewPoint;
        Ratio bypassFactor;
        MassFlow fluidFlow;
        VolumeFlow fluidVolumeFlow;
        bool wet = false;
        bool capacityLimited = false;
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const CoolingCoil&) const = default;
};

} // namespace Airwright::Core::Sections
