#pragma once
// Private to the chain: solves one design case of one unit. See ChainSolver.h for
// the method; this class holds the per-case working state between passes.
//
// Every section keeps the inputs of its last computation (inlet stream, fan
// pressure, control target) with the outcome. A pass recomputes a section only
// when one of those inputs differs (sections are pure functions of them), so the
// sections before the first control and whatever the controls leave unchanged
// cost nothing after the first pass. Heat recovery keeps its own memory
// (HeatRecoveryEvaluator::Memory) for the same purpose and for warm starts.
//
// Order of one iteration: supply, then extract, so the extract side of each
// exchanger takes the outcome of the same iteration. Before the first iteration
// the extract path is computed up to its first exchanger, which gives the supply
// pass the extract air reaching the exchangers. Fans take the path's pressure
// drops as known at the time: this pass's for the sections before them, the last
// pass's for those after (in the first pass those are computed ahead once, with
// the air at the fan's inlet). From the second iteration on, a fan whose drops
// moved in its own pass is computed again with the sections after it (up to
// kFanSweeps passes); the first iteration leaves that to the second.

#include "airwright/core/InputError.h"
#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include <memory>
#include <optional>
#include <vector>

namespace Airwright::Core::Chain {

class CaseSolver {
public:
    // An input error met at one section while solving a case (the flows of the
    // case contradict each other there, or the section cannot compute its air):
    // where, as the section's place in the unit ("supply[3]", "extract[1]", the
    // same as in the project file), and why, the case named in the message.
    // ChainSolver::check reports it at that place.
    class SectionError : public InputError {
    public:
        SectionError(std::string place, const std::string& message)
            : InputError(place + ": " + message), m_place(std::move(place)), m_message(message)
        {
        }
        const std::string& place() const noexcept { return m_place; }
        const std::string& message() const noexcept { return m_message; }

    private:
        std::string m_place;
        std::string m_message;
    };

    // The heat recovery model of each supply section (null for other sections),
    // rated at the unit's design supply flow where the section gives no rated
    // flow: the same device in every case, so that a case at part airflow sees
    // the exchanger at part flow. Built once and shared by the cases of a solve.
    using Evaluators = std::vector<std::shared_ptr<const Recovery::HeatRecoveryEvaluator>>;
    static Evaluators makeEvaluators(const AirHandlingUnit& unit);

    CaseSolver(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing);
    CaseSolver(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing,
               const Evaluators& evaluators);
    // Couplings point into their own evaluator memories: never copied or moved.
    CaseSolver(const CaseSolver&) = delete;
    CaseSolver& operator=(const CaseSolver&) = delete;
    CaseResult run();

private:
    // The state a coupled section carries between the two paths.
    struct Coupling {
        std::string id;
        std::size_t supplyIndex = 0;
        std::size_t extractIndex = 0;
        std::optional<Sections::AirStream> extractInlet;
        std::shared_ptr<const Recovery::HeatRecoveryEvaluator> evaluator;
        Recovery::HeatRecoveryEvaluator::Memory memory;
        const Recovery::HeatRecoveryOutcome* recovery = nullptr; // in memory, from the last supply pass
        MassFlow recirculated;
    };

    // One section on one path: the inputs of its last computation and what came out.
    struct Slot {
        bool computed = false;
        // Inputs.
        Sections::AirStream inlet;
        Sections::AirStream recirculated; // mixing boxes
        Pressure fanPressure;
        double target = 0.0; // kelvin, NaN when none (or ignored by the section)
        bool dehumidify = false;
        // Outcome (heat recovery keeps its detail and findings in the coupling).
        Sections::AirStream outlet;
        Pressure pressureDrop;
        MassFlow waterAdded;
        MassFlow waterRemoved;
        Velocity faceVelocity;
        SectionDetail detail;
        std::vector<Finding> findings;
        bool cooledBelowTarget = false; // cooling coils: dehumidifying
        // Static pressures of the last pass.
        Pressure staticPressureIn;
        Pressure staticPressureOut;
    };

    void computeFlows();
    // A pass from section `from` on (the sections before it unchanged since the last).
    void extractPass(bool untilFirstExchanger, std::size_t from);
    void updateDrift();
    void supplyPass(std::size_t from);
    bool fansSettled(const std::vector<Section>& path, const std::vector<Slot>& slots, Pressure externalTotal) const;
    // Outlet temperature, humidity ratio and static pressure of every section, in order.
    void snapshot(std::vector<double>& values) const;
    double largestChange(const std::vector<double>& before, const std::string*& where) const;
    // Pressure the fan at index k of a path must deliver, from the drops known now.
    Pressure fanPressure(const std::vector<Section>& path, std::vector<Slot>& slots, std::size_t k,
                         const Sections::AirStream& air, Pressure externalTotal, bool supply);
    // Computes a plain (uncoupled) section into its slot unless its inputs are unchanged.
    void computeSection(const Section& section, Slot& slot, const Sections::AirStream& air,
                        const Sections::SectionContext& ctx, Pressure pIn);
    void finish(CaseResult& result, int iterations, bool converged, const std::string& unsettled);
    Coupling& coupling(const std::string& id);
    // "supply[k]" or "extract[k]" for a section of the unit.
    std::string placeOf(const Section& section) const;
    // Dry-air mass flow of extract air as m3/h on the file's flow basis, for messages.
    double extractCubicMetresPerHour(MassFlow m) const;
    Sections::SectionContext contextFor(const Sections::AirStream& inlet, Pressure fanPressure) const;
    // What a control at supply index k aims at: the setpoint less the drift after
    // it, kept inside the psychrometric range (a drift that pushes it out cannot be
    // met anyway, and the setpoint findings say so).
    AbsoluteTemperature aimAt(std::size_t k) const;

    const AirHandlingUnit& m_unit;
    const DesignCase& m_case;
    const UnitSizing& m_sizing;
    Pressure m_pressure;
    std::optional<Psychro::MoistAirState> m_outdoor;
    std::optional<Psychro::MoistAirState> m_room;
    VolumeFlow m_supplyDesignFlow;
    VolumeFlow m_extractDesignFlow;
    MassFlow m_supplyFlow;  // dry air leaving the supply path
    MassFlow m_extractFlow; // dry air entering the extract path
    std::optional<HumidityRatio> m_minHumidity;
    std::optional<HumidityRatio> m_maxHumidity;

    std::vector<MassFlow> m_supplyInFlow; // dry air entering each supply section
    std::vector<MassFlow> m_extractInFlow;
    std::vector<Coupling> m_couplings;
    std::vector<std::size_t> m_supplyCoupling; // index into m_couplings, or npos
    std::vector<std::size_t> m_extractCoupling;
    std::vector<bool> m_supplyControlled; // temperature-controlled sections

    std::vector<Slot> m_supply;
    std::vector<Slot> m_extract;
    std::vector<TemperatureDifference> m_drift;
    std::vector<Finding> m_caseFindings;
};

} // namespace Airwright::Core::Chain
