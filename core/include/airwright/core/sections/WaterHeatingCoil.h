#pragma once

#include "airwright/core/sections/Coolant.h"
#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>

namespace Airwright::Core::Sections {

// A hot-water (or glycol) heating coil. It heats to the control target (or to its
// own fixed outlet temperature when used as a preheater), limited by an optional
// capacity. Water flow from the design flow and return temperatures; LMTD and the
// UA the coil must have (counter-flow connection).
class WaterHeatingCoil {
public:
    AbsoluteTemperature flowTemperature = celsius(70.0);
    AbsoluteTemperature returnTemperature = celsius(40.0);
    Coolant fluid;
    int rows = 2;
    Pressure pressureDropPerRow = pascals(12.0); // air side, dry, at 2 m/s face velocity
    std::optional<Power> capacity;               // empty: whatever the target needs
    std::optional<AbsoluteTemperature> fixedOutletTemperature; // preheater duty
    Length length = metres(0.4);

    struct Detail {
        Power duty;
        MassFlow fluidFlow;
        VolumeFlow fluidVolumeFlow;
        AbsoluteTemperature flowTemperature;
        AbsoluteTemperature returnTemperature;
        std::optional<TemperatureDifference> lmtd;       // empty when no duty
        std::optional<ThermalConductance> requiredUa;
        bool capacityLimited = false;
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const WaterHeatingCoil&) const = default;
};

// Log-mean temperature difference of a counter-flow exchange; nullopt when one end
// has no positive difference (the duty cannot be done with these temperatures).
std::optional<TemperatureDifference> logMeanTemperatureDifference(TemperatureDifference hotEnd,
                                                                  TemperatureDifference coldEnd);

} // namespace Airwright::Core::Sections
