#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>
#include <string>

namespace Airwright::Core::Sections {

// A fan with its motor, drive and speed controller. The chain gives it the total
// pressure it must deliver (its path's internal drops plus external pressure).
// Heat into the air: the shaft power; with the motor in the airstream (plug fan)
// the whole electric input.
class Fan {
public:
    Ratio fanEfficiency = percent(68.0);        // total efficiency of the impeller
    Ratio motorEfficiency = percent(93.0);
    int motorIeClass = 4;                       // IEC 60034-30-1, 1..5, recorded
    Ratio driveEfficiency = percent(100.0);     // direct drive 100 %, belt about 93 %
    Ratio controllerEfficiency = percent(97.0); // variable speed drive
    bool motorInAirstream = true;
    std::optional<double> kFactor;              // inlet ring: q[m3/h] = k sqrt(dp[Pa])
    Length length = metres(1.0);

    Ratio overallEfficiency() const;

    struct Detail {
        VolumeFlow flow;
        Pressure totalPressure;
        Power shaftPower;
        Power electricPower;
        Ratio overallEfficiency;
        TemperatureDifference temperatureRise;
        SpecificFanPower specificFanPower;
        std::optional<Pressure> inletRingPressure; // for the kFactor measurement
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const Fan&) const = default;
};

} // namespace Airwright::Core::Sections
