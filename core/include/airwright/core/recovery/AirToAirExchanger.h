#pragma once
// Performance model of an air-to-air heat recovery device from its datasheet
// rating (docs/heat-recovery.md).
//
// At construction the rated dry efficiency at balanced rated flow is turned into
// an NTU (per coil for a run-around loop) and a heat-transfer conductance per
// side, split equally. Off-design each side's conductance scales as
// (dry-air flow / rated flow)^n and the device follows its eps-NTU relation:
// plates by their arrangement, rotors as regenerators (counter-flow eps times the
// rotor capacity factor, the rotor capacity ratio proportional to speed), coil
// loops as two counter-flow coils coupled by the loop fluid (closed form).
//
// Condensation on the stream being cooled (plates and loops): when its outlet
// would fall below its dew point the wet part of the surface transfers heat by
// enthalpy difference; we express that as a warm side whose capacity rate and
// conductance are both multiplied by b = (h_in - h_out,total) / (cp (t_in - t_out)),
// the path-mean slope of the enthalpy line, and solve for the outlet temperature
// at which the eps-NTU heat rate equals the enthalpy drop (bracketed). The
// outlet is saturated, the excess water is condensate, and the energy of both
// streams balances including the condensate's enthalpy.
//
// Rotors: sensible heat by eps-NTU; vapour moved by the humidity effectiveness
// (hygroscopic, sorption: rated value scaled by actual / rated temperature
// effectiveness, applied to the dry-air flow of the smaller stream and the W
// difference); a non-hygroscopic rotor moves only the water that condenses on the
// cooled side and that the heated side can take up unsaturated. Any stream left
// supersaturated is clamped to saturation (Psychro::clampToSaturation).

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/recovery/ExchangerOperatingPoint.h"
#include "airwright/core/recovery/ExchangerPerformance.h"
#include "airwright/core/recovery/ExchangerRating.h"
#include "airwright/core/recovery/SetpointControlResult.h"

#include <optional>

namespace Airwright::Core::Recovery {

class AirToAirExchanger {
public:
    // Throws InputError for a rating out of range or an efficiency the model
    // cannot reach (e.g. above the cross-flow limit at balanced flow).
    explicit AirToAirExchanger(ExchangerRating rating);

    const ExchangerRating& rating() const { return m_rating; }
    MassFlow ratedDryAirFlow() const { return kilogramsPerSecond(m_ratedMassFlow); }
    // Plates and rotors: overall NTU at rated flow; run-around loop: NTU of one coil.
    Ratio ratedNtu() const { return fraction(m_ratedNtu); }

    // Rated efficiency above 90 %: the best plates and rotors reach 85 to 90 %
    // (common practice), so such a figure deserves a second look.
    bool exceedsTypicalEfficiency() const;

    // Flows 0 .. 5x rated (exclusive of 0), bypass and speed ratio 0 .. 1.
    ExchangerPerformance evaluate(const ExchangerOperatingPoint& point) const;

    // Regulation (EU) 1253/2014 thermal efficiency: the model at nominal
    // (rated) balanced flow, dry air, outdoor 5 C and extract 25 C (20 K).
    Ratio thermalEfficiencyEu1253() const;

    // What the control and frost-protection solves need of an evaluation: the
    // supply outlet temperature (after the bypass) and the frost margin, the same
    // numbers as evaluate() gives, without building the outlet states.
    struct ControlFigures {
        AbsoluteTemperature supplyOutlet;
        double frostMargin = 1.0;
    };
    ControlFigures controlFigures(const ExchangerOperatingPoint& point) const;

    // What a solve that varies only bypass or speed (or nothing else of the point)
    // can work out once: the conductances' (flow / rated flow)^n at the point's
    // full supply flow and its extract flow (the bypass share enters as
    // (1 - bypass)^n), and the dew point of the warmer inlet (empty when too dry
    // to have one in range). Passed back with a point that differs from the one
    // it came from in bypass or speed only; anything else gives wrong figures.
    struct Invariants {
        double supply = 1.0, extract = 1.0;
        std::optional<double> warmDewPoint; // C
    };
    Invariants invariants(const ExchangerOperatingPoint& point) const;
    ControlFigures controlFigures(const ExchangerOperatingPoint& point, const Invariants& known) const;

    // Bypass fraction (plates, loops) or rotor speed ratio (rotors) that brings
    // the supply outlet to the setpoint without overshooting it, by a bracketed
    // solve between zero and full recovery (the rest of the point unchanged).
    // A warm start (the chain's previous pass): where to start looking, and the
    // supply outlet at full recovery if already known for this very point, and the
    // outlet's change per unit of control found last time (the first secant step
    // uses it instead of the chord from no to full recovery). It only saves
    // evaluations: the result is the same root to the same tolerance.
    struct ControlStart {
        Ratio control;
        std::optional<AbsoluteTemperature> fullRecoveryOutlet;
        std::optional<TemperatureDifference> outletChangePerControl;
    };
    SetpointControlResult controlSupplyTemperature(const ExchangerOperatingPoint& point, AbsoluteTemperature setpoint,
                                                   const std::optional<ControlStart>& start = std::nullopt) const;

    // Frost onset at the rated efficiencies (FrostOnset.h).
    std::optional<AbsoluteTemperature> frostOnsetOutdoorTemperature(const Psychro::MoistAirState& extract,
                                                                    Ratio outdoorRelativeHumidity) const;

private:
    struct CoreOutcome;
    // frostFigures false: the cold-corner surface, frost risk and margin are left
    // out (the setpoint control needs only the supply outlet). known: the point's
    // invariants() when the caller has them.
    CoreOutcome core(const ExchangerOperatingPoint& point, bool frostFigures,
                     const std::optional<Invariants>& known = std::nullopt) const;
    ControlFigures figures(const ExchangerOperatingPoint& point, bool frostFigures,
                           const std::optional<Invariants>& known = std::nullopt) const;
    ExchangerPerformance evaluate(const ExchangerOperatingPoint& point, const std::optional<Invariants>& known) const;

    ExchangerRating m_rating;
    double m_ratedMassFlow = 0.0;        // kg/s dry air
    double m_ratedCapacityRate = 0.0;    // W/K, dry air
    double m_ratedNtu = 0.0;
    double m_ratedSideConductance = 0.0; // W/K, each side (plates, rotors)
    double m_ratedCoilConductance = 0.0; // W/K, each coil (loop)
    double m_loopCapacityRate = 0.0;     // W/K
    double m_dpExponent = 1.0;
    double m_htExponent = 0.6;
};

} // namespace Airwright::Core::Recovery
