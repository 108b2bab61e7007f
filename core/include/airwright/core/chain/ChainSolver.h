#pragma once
// Solves a unit: sizes the casing, then for each design case walks both paths
// section by section. Coupled sections (heat recovery, mixing) tie the paths
// together; the solver repeats supply and extract passes (Gauss-Seidel) until
// states, flows and fan pressures settle, at most kMaxIterations times, and
// reports non-convergence as a finding. Controls act in sequence: recovery,
// then heating, cooling, humidification.

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"

namespace Airwright::Core::Chain {

class ChainSolver {
public:
    static constexpr int kMaxIterations = 60;

    // Validates the unit (throws InputError with the offending item named), then
    // computes every case.
    static UnitResult solve(const AirHandlingUnit& unit);

    static UnitSizing size(const AirHandlingUnit& unit);
    static CaseResult solveCase(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing);

    // Structural checks: ids unique and non-empty, every coupled section has its
    // marker in the other path, at least one case, specs in range.
    static void validate(const AirHandlingUnit& unit);
};

} // namespace Airwright::Core::Chain
