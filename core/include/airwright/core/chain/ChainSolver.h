#pragma once
// Solves a unit: sizes the casing, then for each design case walks both paths
// section by section. Coupled sections (heat recovery, mixing) tie the paths
// together; the solver repeats supply and extract passes (Gauss-Seidel) until
// states, flows and fan pressures settle, at most kMaxIterations times, and
// reports non-convergence as a finding. Controls act in sequence: recovery,
// then heating, cooling, humidification.

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"

#include <string>
#include <vector>

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
    // marker in the other path, at least one case, specs in range. A unit without
    // an extract path may have zero extract flow (a supply-only unit).
    static void validate(const AirHandlingUnit& unit);

    // One problem check() finds: where, as a place in the unit that is also the
    // JSON path in a project file ("extract[1]", "cases[0]"; empty for the unit
    // as a whole), and what, with the allowed range or what would fix it.
    struct Problem {
        std::string path;
        std::string message;
        bool operator==(const Problem&) const = default;
    };

    // Everything solve() would refuse, all at once: validate(), then every case
    // computed, since some problems show only in a computed case (more air
    // recirculated than the extract path brings at a case's airflow, a fan that
    // would heat the air beyond 200 C). Empty: solve() returns results. Costs as
    // much as solve(); for checking a project before use (airwright-cli validate).
    static std::vector<Problem> check(const AirHandlingUnit& unit);
};

} // namespace Airwright::Core::Chain
