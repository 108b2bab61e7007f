#pragma once
// Costs, savings and ranking of heat recovery options from their annual
// energies; separate from the simulation so that other prices (the sensitivity
// table, a user editing a price) need no new simulation.
//
// Savings are against the option without heat recovery. The ranking orders by
// net benefit over the evaluation period (annual cost saving x years - extra
// cost, undiscounted), ties by key. Each entry's reason names, for the best, its
// benefit, saving and payback; for the others the gap to the best and the one
// item that contributes most to it (heat saved, fan energy, cooling, pump,
// humidification or extra cost), plus the frost-protection loss where it exceeds
// 5 % of the heat recovered.

#include "airwright/core/annual/ComparisonResult.h"
#include "airwright/core/annual/EnergyPrices.h"

#include <vector>

namespace Airwright::Core::Annual {

class OptionRanking {
public:
    // Fills the saving, cost, CO2, payback and benefit fields of every option
    // from its energy and extraCost. Throws InputError when no option is without
    // heat recovery (the baseline).
    static void appraise(std::vector<OptionResult>& options, const EnergyPrices& prices, double evaluationYears);

    static std::vector<RankingEntry> rank(const std::vector<OptionResult>& options, const EnergyPrices& prices,
                                          double evaluationYears);
};

} // namespace Airwright::Core::Annual
