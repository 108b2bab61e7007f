#pragma once
// Evaluates a heat recovery section for one operating point: both streams in,
// both streams out, with rotary leakage (EATR, OACF), control towards a supply
// target, and frost assessment with the section's protection strategy.
//
// Rotary leakage as EN 308 / Eurovent practice defines the ratios: with supply
// outlet flow m, the outdoor side takes in OACF m; EATR m of extract air crosses
// into the supply, so the supply core carries (1 - EATR) m and the purge/carry-over
// (OACF - 1 + EATR) m of outdoor air goes to the exhaust. Mass and energy of both
// streams balance with these crossing flows.

#include "airwright/core/Finding.h"
#include "airwright/core/recovery/AirToAirExchanger.h"
#include "airwright/core/recovery/HeatRecovery.h"
#include "airwright/core/recovery/HeatRecoveryDetail.h"
#include "airwright/core/sections/AirStream.h"

#include <optional>
#include <vector>

namespace Airwright::Core::Recovery {

struct HeatRecoveryInputs {
    Sections::AirStream supplyIn;   // outdoor side, as it reaches the exchanger
    Sections::AirStream extractIn;  // room side, as it reaches the exchanger
    std::optional<AbsoluteTemperature> supplyTarget; // control aims here (empty: full recovery)
    // Control values fixed from an earlier evaluation (the chain's extract pass
    // reuses the supply pass's values).
    std::optional<Ratio> fixedBypass;
    std::optional<Ratio> fixedRotorSpeed;
};

struct HeatRecoveryOutcome {
    Sections::AirStream extractIn;  // as evaluated
    Sections::AirStream supplyOut;
    Sections::AirStream extractOut;
    Pressure supplyPressureDrop;
    Pressure extractPressureDrop;
    Ratio rotorSpeedRatio = fraction(1.0);
    Power preheat;                  // built-in frost preheat (FrostStrategy::Preheat)
    HeatRecoveryDetail detail;
    std::vector<Finding> findings;
};

class HeatRecoveryEvaluator {
public:
    // Rise of the extract-side pressure drop that signals frost (common practice:
    // 5 to 10 Pa above the clean value).
    static constexpr double kFrostAlarmRisePa = 10.0;

    // designSupplyFlow stands in for the rated flow when the section gives none.
    HeatRecoveryEvaluator(const HeatRecovery& spec, VolumeFlow designSupplyFlow);

    HeatRecoveryOutcome evaluate(const HeatRecoveryInputs& inputs) const;

    // Supply-side dry-air flow entering the exchanger for a supply outlet flow.
    MassFlow supplyInletFlow(MassFlow supplyOutletFlow) const;

    const AirToAirExchanger& exchanger() const { return m_exchanger; }
    static ExchangerRating ratingFor(const HeatRecovery& spec, VolumeFlow designSupplyFlow);

private:
    HeatRecovery m_spec;
    AirToAirExchanger m_exchanger;
    Ratio m_regulationEfficiency;
};

} // namespace Airwright::Core::Recovery
