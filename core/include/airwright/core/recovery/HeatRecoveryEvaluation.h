#pragma once
// Evaluates a heat recovery section for one operating point: both streams in,
// both streams out, with rotary leakage (EATR, OACF), control towards a supply
// target, and frost assessment with the section's protection strategy.
//
// Rotary leakage as EN 308 / Eurovent practice defines the ratios: with supply
// outlet flow m, the outdoor side takes in OACF m; EATR m of extract air crosses
// into the supply, so the supply core carries (1 - EATR) m and the purge/carry-over
// (OACF - 1 + EATR) m of outdoor air goes to the exhaust. Where that is negative
// (OACF below 1 - EATR) no outdoor air goes to the exhaust and (1 - OACF) m of
// extract air crosses into the supply. Mass and energy of both streams balance
// with these crossing flows.

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

    // What one caller lets the evaluator keep between calls (the chain, pass
    // after pass): the last inputs with their outcome, and the control values
    // found. Same inputs give the kept outcome back; so does a new supply target
    // when full recovery fell short of the old one and falls short of the new one
    // too (the control cannot change). Otherwise the outcome is computed afresh,
    // its solves starting near the last control values. A Memory belongs to one
    // evaluator; handed to another it starts empty.
    class Memory {
        friend class HeatRecoveryEvaluator;
        const HeatRecoveryEvaluator* m_owner = nullptr;
        std::optional<HeatRecoveryInputs> m_inputs;
        std::optional<HeatRecoveryOutcome> m_outcome;
        // Supply outlet minus inlet at full recovery, K, when the last control
        // ran at full recovery because the target was out of reach.
        std::optional<double> m_fullReach;
        std::optional<Ratio> m_control; // bypass or rotor speed the control found
        std::optional<AbsoluteTemperature> m_fullOutlet; // supply outlet at full recovery, for m_inputs' streams
        std::optional<TemperatureDifference> m_outletChangePerControl; // slope the last control solve found
        std::optional<double> m_frostRoot; // bypass share or rotor speed where the last frost margin was zero
    public:
        // Outcomes computed (not taken from memory), for tests and benchmarks.
        int evaluations = 0;
    };

    HeatRecoveryOutcome evaluate(const HeatRecoveryInputs& inputs) const;
    // The same outcome as evaluate(inputs), kept in (and valid as long as) memory.
    const HeatRecoveryOutcome& evaluate(const HeatRecoveryInputs& inputs, Memory& memory) const;

    // Supply-side dry-air flow entering the exchanger for a supply outlet flow.
    MassFlow supplyInletFlow(MassFlow supplyOutletFlow) const;

    const AirToAirExchanger& exchanger() const { return m_exchanger; }
    static ExchangerRating ratingFor(const HeatRecovery& spec, VolumeFlow designSupplyFlow);

private:
    HeatRecoveryOutcome compute(const HeatRecoveryInputs& inputs, Memory* memory) const;

    HeatRecovery m_spec;
    AirToAirExchanger m_exchanger;
    Ratio m_regulationEfficiency;
};

} // namespace Airwright::Core::Recovery
