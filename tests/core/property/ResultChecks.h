#pragma once
// Checks shared by the property tests: every number of a solved unit is finite,
// every section balances, and non-convergence names a section.

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"

namespace Airwright::Core::Property {

// Adds a GoogleTest failure for each non-finite number (states, flows, pressures,
// duties, figures, totals), naming the case, section and quantity.
void expectAllFinite(const Chain::UnitResult& result);

// Per section: dry air, water and energy balances (tolerances in the .cpp); per
// coupled section: both sides together.
void expectBalances(const Chain::CaseResult& result);

// A case that did not settle carries a chain.not_converged finding that names a
// section of the unit.
void expectConvergenceReported(const Chain::CaseResult& result, const Chain::AirHandlingUnit& unit);

} // namespace Airwright::Core::Property
