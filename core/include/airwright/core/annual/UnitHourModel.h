#pragma once
// The per-hour model of one unit in one operating mode, derived from the chain.
//
// The full chain solver takes about 0.1 ms per case, far too slow for 8760 hours
// times several options, so the year is not solved with it hour by hour. Instead
// (docs/annual.md has the method and its simplifications):
//  1. At construction the chain is solved (ChainSolver::solveCase, with the unit's
//     sizing) once per anchor case of SeasonalConditions at the mode's airflow
//     fraction. From those results it keeps, per anchor, the electric power of
//     the fans and the temperature rise of every fan; at any outdoor temperature
//     they are interpolated between anchors like the room state.
//  2. Per hour the supply path is walked section by section on raw doubles:
//     fans add their rise; heating coils and heaters heat to the setpoint less
//     the rise of the uncontrolled sections after them, with their load from the
//     enthalpy difference; cooling coils follow the apparatus-dew-point / bypass
//     factor relation of the CoolingCoil section (wet or dry) with the ASHRAE coil
//     load; steam humidifiers add water up to the minimum humidity; the heat
//     recovery is the HeatRecoveryEvaluator (control to the setpoint less the rise
//     after it, frost assessment and protection) at the hour's inlet states and
//     dry-air flows. As in the chain, a heating coil after a dehumidifying
//     cooling coil reheats only when a case asks for reheat.
//     Mixing (recirculation) sections work as in the chain, in every hour (the
//     chain has no economiser control): the outdoor share is MixingBox::outdoorShare at the
//     mode's supply flow, the dry-air flows follow from the supply outlet back to
//     the intake, the return air is the extract air at the take-off (room state
//     plus the extract fans' rise and fixed heaters before it, or the exchanger's
//     extract outlet when the take-off follows the exchanger), mixed by dry-air
//     mass (fog settles as in Psychro::mix), and the extract air after the
//     take-off, so an exchanger after it, carries that much less dry air. A
//     controlled section before a mixing section aims at the mixer's inlet
//     temperature that gives the setpoint less the rise after it: the point the
//     chain's passes converge to, reached here in 2 passes when the return air is
//     taken before the exchanger; return air taken after it depends on the
//     exchanger's control and the exchanger on it, which takes more passes (at
//     most 40; 10 to 17 on the demo unit).
//  3. Tabulated evaluation: the exchanger's outcome depends on the hour only
//     through the outdoor state (room state and setpoints are functions of the
//     outdoor temperature; so is mixed air before the exchanger, and the return
//     air the exchanger's own extract outlet feeds back is its converged value),
//     so it can be evaluated once on a grid of outdoor dry bulb (tabulate's step)
//     and humidity (0.2, 0.6 and 1.0 of saturation at each grid temperature) and
//     interpolated (linear in humidity ratio, then in dry bulb). Hours outside
//     the tabulated range are evaluated exactly.
//
// Not modelled: more than one heat recovery section (InputError), changes of fan
// power within an hour or with the bypass position, the steps of a stepped
// electric heater (its energy is taken as what the setpoint needs). Extract
// sections are walked only as far as the exchanger and the take-offs need.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/HourResult.h"
#include "airwright/core/annual/RunControl.h"
#include "airwright/core/annual/SeasonalConditions.h"
#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include <cstddef>
#include <memory>
#include <optional>
#include <vector>

namespace Airwright::Core::Annual {

class ExchangerTable; // private to the annual layer (core/src/annual)

class UnitHourModel {
public:
    // Throws InputError for a unit the model cannot represent (see above) or that
    // the chain rejects (ChainSolver::validate).
    UnitHourModel(const Chain::AirHandlingUnit& unit, const Chain::UnitSizing& sizing,
                  const SeasonalConditions& conditions, Ratio airflowFraction, OperatingMode mode);

    // Grid step of the exchanger table: 1 K keeps the annual figures within the
    // tolerances of tests/core/annual/UnitHourModelTest.cpp.
    static TemperatureDifference defaultTableStep() { return kelvinDifference(1.0); }

    // Tabulates the exchanger for outdoor dry bulbs from lowest to highest (the
    // grid is aligned to multiples of step, 0.1 .. 5 K). Returns false when
    // control.stop was requested before the table was complete (then the model
    // stays untabulated). Without heat recovery there is nothing to tabulate.
    bool tabulate(AbsoluteTemperature lowest, AbsoluteTemperature highest, TemperatureDifference step,
                  const RunControl& control = {});
    bool tabulated() const { return m_table != nullptr; }
    std::size_t tableNodes() const;

    // One hour at this outdoor state (dry bulb -70 .. 70 C, humidity ratio 0 ..
    // saturation at the site pressure): from the table where it covers the dry
    // bulb, exactly otherwise.
    HourResult evaluate(AbsoluteTemperature outdoor, HumidityRatio humidity) const;
    // The same with the exchanger evaluated at this state, never from the table.
    HourResult evaluateExactly(AbsoluteTemperature outdoor, HumidityRatio humidity) const;

    OperatingMode mode() const { return m_mode; }
    Ratio airflowFraction() const { return m_airflowFraction; }
    const SeasonalConditions& conditions() const { return m_conditions; }
    const Chain::AirHandlingUnit& unit() const { return m_unit; }
    // The chain's result at each anchor case (anchor order of conditions()).
    const std::vector<Chain::CaseResult>& anchorResults() const { return m_anchorResults; }
    bool hasRecovery() const { return m_recovery.has_value(); }
    // The exchanger as the chain evaluates it; nullptr without heat recovery.
    const Recovery::HeatRecoveryEvaluator* recoveryEvaluator() const;

    // What the exchanger did at one state: the values the table holds. Public for
    // the table builder in the source file; not for general use.
    struct RecoveryValues {
        double supplyC = 0.0;  // supply air leaving the exchanger
        double supplyW = 0.0;
        double recoveredW = 0.0;
        double frostProtectionW = 0.0;
        double preheatW = 0.0;
        double frostRisk = 0.0; // 0 or 1; interpolated values count from 0.5
        double pumpW = 0.0;
        double extractC = 0.0; // extract air leaving the exchanger (return air of a take-off after it)
        double extractW = 0.0;
    };

private:
    enum class StepKind {
        Passive,
        Fan,
        Heater,
        FixedHeater,
        CoolingCoil,
        Humidifier,
        Recovery,
        UncontrolledRecovery,
        Mixing, // supply side of a mixing section
        TakeOff // extract side of a mixing section
    };
    struct Step {
        StepKind kind = StepKind::Passive;
        std::size_t section = 0;
        std::vector<double> riseByAnchor; // fans, K
        std::optional<double> capacityW;  // heaters
        double fixedC = 0.0;              // fixed-outlet heaters
        double outdoorShare = 1.0;        // mixing: outdoor share of the supply's dry air
        std::size_t partner = 0;          // take-off: its mixing step in the supply path
    };
    struct Walk {
        HourResult result;
        RecoveryValues recovery;
    };

    Walk walk(double outdoorC, double outdoorW, const RecoveryValues* tabulated) const;
    RecoveryValues evaluateRecovery(double inletC, double inletW, double inletFlow, double extractC,
                                    double extractW, double extractFlow, std::optional<double> targetC) const;

    Chain::AirHandlingUnit m_unit;
    SeasonalConditions m_conditions;
    Ratio m_airflowFraction;
    OperatingMode m_mode;
    double m_pressure = 101325.0;
    double m_supplyFlow = 0.0;  // m3/s at the mode's airflow fraction
    double m_extractFlow = 0.0;
    bool m_standardAir = true;
    std::vector<Step> m_supply;
    // Extract path as far as the exchanger and the last take-off need (the
    // exchanger's extract side is a Recovery step).
    std::vector<Step> m_extract;
    bool m_driftPasses = false; // uncontrolled sections other than fans change the temperature
    bool m_mixing = false;
    std::vector<double> m_fanPowerByAnchor;
    std::vector<Chain::CaseResult> m_anchorResults;
    std::optional<Recovery::HeatRecoveryEvaluator> m_recovery;
    bool m_recoveryControlled = false;
    std::shared_ptr<const ExchangerTable> m_table;
};

} // namespace Airwright::Core::Annual
