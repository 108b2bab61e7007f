#pragma once
// Private to the chain: solves one design case of one unit. See ChainSolver.h for
// the method; this class holds the per-case working state between passes.

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include <optional>
#include <vector>

namespace Airwright::Core::Chain {

class CaseSolver {
public:
    CaseSolver(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing);
    CaseResult run();

private:
    // The state a coupled section carries between the two paths.
    struct Coupling {
        std::string id;
        std::size_t supplyIndex = 0;
        std::size_t extractIndex = 0;
        std::optional<Sections::AirStream> supplyInlet;
        std::optional<Sections::AirStream> extractInlet;
        std::optional<Recovery::HeatRecoveryOutcome> recovery;
        std::optional<Recovery::HeatRecoveryEvaluator> evaluator;
        std::optional<Ratio> bypass;
        std::optional<Ratio> rotorSpeed;
        MassFlow recirculated;
    };

    void computeFlows();
    void extractPass();
    void supplyPass();
    void updateFanPressures();
    double largestChange(std::string& where) const;
    void finish(CaseResult& result, int iterations, bool converged, const std::string& unsettled);
    Coupling& coupling(const std::string& id);
    Sections::SectionContext contextFor(const Sections::AirStream& inlet, Pressure fanPressure) const;

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
    std::vector<Pressure> m_supplyFanPressure; // per section, fans only
    std::vector<Pressure> m_extractFanPressure;
    std::vector<Coupling> m_couplings;

    std::vector<SectionResult> m_supply;
    std::vector<SectionResult> m_extract;
    std::vector<SectionResult> m_previousSupply;
    std::vector<SectionResult> m_previousExtract;
    std::vector<std::vector<Finding>> m_supplyFindings;
    std::vector<std::vector<Finding>> m_extractFindings;
    std::vector<Finding> m_caseFindings;
};

} // namespace Airwright::Core::Chain
