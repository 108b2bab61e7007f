#pragma once
// One heat recovery alternative for the comparison: a datasheet-style
// HeatRecovery description the user can edit, or none, and the extra cost of
// the unit with it over the unit without heat recovery.
//
// defaultHeatRecoveryOptions gives the six alternatives the comparison starts
// from, sized to the unit (rated flow = the unit's supply design flow). Their
// figures are typical values of current products, common practice, not taken
// from any datasheet:
//
// | option | rated eff. | humidity eff. | dp each side | frost protection |
// | plate, cross-flow | 65 % | - | 150 Pa | bypass |
// | plate, counter-flow | 85 % | - | 200 Pa | bypass |
// | rotary, non-hygroscopic | 78 % | - | 130 Pa | rotor speed |
// | rotary, hygroscopic | 78 % | 70 % | 130 Pa | rotor speed |
// | run-around loop | 70 % | - | 180 Pa | bypass (three-way valve) |
//
// Wheels are taken as sealed (EATR 0, OACF 1) so that leakage does not count as
// recovery; the loop runs on 30 % propylene glycol with a pump of 30 W per
// 1000 m3/h. Extra costs are illustrative, our own round figures per m3/h of
// supply air (plate cross-flow 0.8, counter-flow 1.2, wheel 1.0, hygroscopic
// wheel 1.3, loop 2.0, including the loop's piping and pump): enter real quotes.

#include "airwright/core/Quantities.h"
#include "airwright/core/recovery/HeatRecovery.h"

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Core::Annual {

struct HeatRecoveryOption {
    std::string key;  // stable, unique within a comparison: "none", "plate_cross_flow", ...
    std::string name; // plain words
    std::optional<Recovery::HeatRecovery> spec; // empty: no heat recovery
    double extraCost = 0.0; // in the price currency, >= 0

    bool operator==(const HeatRecoveryOption&) const = default;
};

// none, plate_cross_flow, plate_counter_flow, rotary_non_hygroscopic,
// rotary_hygroscopic, run_around_loop.
std::vector<HeatRecoveryOption> defaultHeatRecoveryOptions(VolumeFlow supplyDesignFlow);

} // namespace Airwright::Core::Annual
