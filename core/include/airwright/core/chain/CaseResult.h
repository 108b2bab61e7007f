#pragma once

#include "airwright/core/Finding.h"
#include "airwright/core/chain/SectionResult.h"

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Core::Chain {

struct CaseTotals {
    Power heating;          // all heating coils and electric heaters
    Power cooling;          // coil loads
    Power heatRecovered;    // by heat recovery, to the supply
    MassFlow humidification;
    Power fanElectricPower;
    Power pumpPower;
    VolumeFlow supplyFlow;  // actual at the supply outlet
    VolumeFlow extractFlow; // actual at the extract inlet
    SpecificFanPower specificFanPower; // both fans over the larger flow (EN 16798-3)
};

struct CaseResult {
    std::string caseName;
    std::vector<SectionResult> supply;
    std::vector<SectionResult> extract;
    CaseTotals totals;
    std::vector<Finding> findings;
    int iterations = 0;
    bool converged = true;

    const SectionResult* find(PathKind path, const std::string& id) const;
};

struct UnitSizing {
    Length width;
    Length height;          // one deck
    Area crossSection;
    bool sizedAutomatically = true;
    Length supplyLength;
    Length extractLength;
    Length unitLength;
};

struct UnitResult {
    UnitSizing sizing;
    std::vector<CaseResult> cases;
};

} // namespace Airwright::Core::Chain
