#include "airwright/core/annual/OptionRanking.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

#include <algorithm>
#include <cmath>
#include <string>

namespace Airwright::Core::Annual {

namespace {

// Frost protection worth naming in a reason: above this share of the heat recovered.
constexpr double kNotableFrostShare = 0.05;

const OptionResult& baselineOf(const std::vector<OptionResult>& options)
{
    const auto it = std::find_if(options.begin(), options.end(), [](const OptionResult& o) { return !o.hasRecovery; });
    if (it == options.end())
        throw InputError("the comparison needs the option without heat recovery as the baseline for its savings");
    return *it;
}

std::string money(double v)
{
    return formatFixed(v, 0);
}

std::string mwh(Energy e)
{
    return formatFixed(toMegawattHours(e), 1) + " MWh/a";
}

// The parts of an option's annual cost saving, per item, in money per year.
struct Parts {
    double heating = 0.0;
    double cooling = 0.0;
    double fan = 0.0;
    double pump = 0.0;
    double humidifier = 0.0;
};

Parts partsOf(const OptionResult& o, const OptionResult& base, const EnergyPrices& prices)
{
    const double heat = prices.heatPricePerKilowattHour;
    const double el = prices.electricityPricePerKilowattHour;
    return {toKilowattHours(base.energy.heating - o.energy.heating) * heat,
            toKilowattHours(base.energy.cooling - o.energy.cooling) / prices.coolingEer * el,
            toKilowattHours(base.energy.fan - o.energy.fan) * el,
            toKilowattHours(base.energy.pump - o.energy.pump) * el,
            toKilowattHours(base.energy.humidifier - o.energy.humidifier) * el};
}

} // namespace

void OptionRanking::appraise(std::vector<OptionResult>& options, const EnergyPrices& prices, double evaluationYears)
{
    const OptionResult base = baselineOf(options);
    for (auto& o : options) {
        o.heatSaving = base.energy.heating - o.energy.heating;
        const Energy baseElectricity =
            base.energy.fan + base.energy.pump + base.energy.humidifier + base.energy.cooling / prices.coolingEer;
        const Energy electricity = o.energy.fan + o.energy.pump + o.energy.humidifier + o.energy.cooling / prices.coolingEer;
        o.electricitySaving = baseElectricity - electricity;
        o.addedFanEnergy = o.energy.fan - base.energy.fan;
        o.netSaving = o.heatSaving + o.electricitySaving;
        o.costSaving = toKilowattHours(o.heatSaving) * prices.heatPricePerKilowattHour
                       + toKilowattHours(o.electricitySaving) * prices.electricityPricePerKilowattHour;
        o.co2Saving = kilograms(toKilowattHours(o.heatSaving) * prices.heatCo2KilogramsPerKilowattHour
                                + toKilowattHours(o.electricitySaving) * prices.electricityCo2KilogramsPerKilowattHour);
        o.paybackYears.reset();
        if (o.costSaving > 0.0)
            o.paybackYears = o.extraCost / o.costSaving;
        o.netBenefit = o.costSaving * evaluationYears - o.extraCost;
    }
}

std::vector<RankingEntry> OptionRanking::rank(const std::vector<OptionResult>& options, const EnergyPrices& prices,
                                              double evaluationYears)
{
    const OptionResult& base = baselineOf(options);
    std::vector<const OptionResult*> order;
    for (const auto& o : options)
        order.push_back(&o);
    std::stable_sort(order.begin(), order.end(), [](const OptionResult* a, const OptionResult* b) {
        if (a->netBenefit != b->netBenefit)
            return a->netBenefit > b->netBenefit;
        return a->key < b->key;
    });

    const std::string years = formatFixed(evaluationYears, 0) + " years";
    const OptionResult& best = *order.front();
    const Parts bestParts = partsOf(best, base, prices);
    std::vector<RankingEntry> ranking;
    for (std::size_t i = 0; i < order.size(); ++i) {
        const OptionResult& o = *order[i];
        RankingEntry e;
        e.rank = static_cast<int>(i) + 1;
        e.key = o.key;
        e.netBenefit = o.netBenefit;
        if (i == 0) {
            if (!o.hasRecovery) {
                e.reason = "no heat recovery option pays back its extra cost within " + years
                           + " at these prices";
            } else {
                e.reason = "largest net benefit over " + years + ": " + money(o.netBenefit) + " (saves "
                           + money(o.costSaving) + " a year, " + mwh(o.netSaving) + " delivered energy, for an extra cost of "
                           + money(o.extraCost);
                e.reason += o.paybackYears ? ", payback " + formatFixed(*o.paybackYears, 1) + " years)" : ")";
            }
        } else {
            const double gap = best.netBenefit - o.netBenefit;
            e.reason = money(gap) + " less net benefit over " + years + " than " + best.name;
            if (!o.hasRecovery) {
                e.reason += ": without heat recovery nothing is saved";
            } else {
                // The item that contributes most to the gap, in money over the period.
                const Parts p = partsOf(o, base, prices);
                struct Item {
                    double money;
                    std::string text;
                };
                const double ey = evaluationYears;
                const auto more = [](Energy difference) { return mwh(difference); };
                const Item items[] = {
                    {(bestParts.heating - p.heating) * ey,
                     more(o.energy.heating - best.energy.heating) + " more heating"},
                    {(bestParts.fan - p.fan) * ey,
                     more(o.energy.fan - best.energy.fan) + " more fan energy (the exchanger's pressure drop)"},
                    {(bestParts.cooling - p.cooling) * ey,
                     more(o.energy.cooling - best.energy.cooling) + " more cooling"},
                    {(bestParts.pump - p.pump) * ey, more(o.energy.pump - best.energy.pump) + " more pump energy"},
                    {(bestParts.humidifier - p.humidifier) * ey,
                     more(o.energy.humidifier - best.energy.humidifier) + " more humidification energy"},
                    {o.extraCost - best.extraCost, money(o.extraCost - best.extraCost) + " more extra cost"},
                };
                const auto* main = std::max_element(std::begin(items), std::end(items),
                                                    [](const Item& a, const Item& b) { return a.money < b.money; });
                if (main->money > 0.0)
                    e.reason += ", mainly " + main->text;
                if (!o.paybackYears)
                    e.reason += "; it saves nothing at these prices";
                else if (*o.paybackYears > evaluationYears)
                    e.reason += "; payback " + formatFixed(*o.paybackYears, 1) + " years, beyond " + years;
            }
        }
        if (o.hasRecovery && o.energy.recoveredHeating.value() > 0.0
            && o.energy.frostProtection > o.energy.recoveredHeating * kNotableFrostShare)
            e.reason += "; frost protection gives up " + mwh(o.energy.frostProtection) + " in "
                        + formatFixed(toHours(o.energy.frostTime), 0) + " frost hours";
        ranking.push_back(std::move(e));
    }
    return ranking;
}

} // namespace Airwright::Core::Annual
