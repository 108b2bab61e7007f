#pragma once
// The bin-method alternative to an hourly year: temperature bins with hours and
// coincident mean humidity ratio, all at one station pressure. Always valid: the
// constructor rejects unordered bins, negative hours, more hours than a leap year
// and humidity above saturation.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/DegreeHours.h"
#include "airwright/core/annual/TemperatureBin.h"

#include <vector>

namespace Airwright::Core::Annual {

class BinTable {
public:
    // Bins in strictly ascending dry bulb; duration >= 0; total <= 8784 h.
    BinTable(std::vector<TemperatureBin> bins, Pressure pressure);

    const std::vector<TemperatureBin>& bins() const { return m_bins; }
    Pressure pressure() const { return m_pressure; }
    Duration totalDuration() const;

    // Hours-weighted mean dry bulb; throws InputError for a table with no hours.
    AbsoluteTemperature meanDryBulb() const;

    // Sum over bins of hours x max(0, base - t) (heating) or max(0, t - base)
    // (cooling), t the bin's representative dry bulb.
    DegreeHours heatingDegreeHours(AbsoluteTemperature base) const;
    DegreeHours coolingDegreeHours(AbsoluteTemperature base) const;

private:
    std::vector<TemperatureBin> m_bins;
    Pressure m_pressure;
};

} // namespace Airwright::Core::Annual
