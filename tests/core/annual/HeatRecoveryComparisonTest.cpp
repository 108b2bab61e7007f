#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "AnnualTestSupport.h"
#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <map>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using AnnualTestSupport::demoBins;
using AnnualTestSupport::demoUnit;
using AnnualTestSupport::demoYear;

namespace {

const ComparisonResult& demoComparison()
{
    static const ComparisonResult result = [] {
        const HeatRecoveryComparison c(demoUnit(), defaultHeatRecoveryOptions(demoUnit().airflows.supply),
                                       ComparisonSettings{});
        return *c.run(demoYear());
    }();
    return result;
}

const OptionResult& find(const ComparisonResult& r, const std::string& key)
{
    const auto it = std::find_if(r.options.begin(), r.options.end(), [&](const auto& o) { return o.key == key; });
    if (it == r.options.end())
        throw InputError("no option " + key);
    return *it;
}

} // namespace

TEST(AnnualHeatRecoveryComparison, DefaultOptionsAreTheSixKinds)
{
    const auto options = defaultHeatRecoveryOptions(cubicMetresPerHour(9000.0));
    ASSERT_EQ(options.size(), 6u);
    std::map<std::string, std::optional<Recovery::ExchangerKind>> kinds;
    for (const auto& o : options)
        kinds[o.key] = o.spec ? std::optional(o.spec->kind) : std::nullopt;
    EXPECT_FALSE(kinds.at("none"));
    EXPECT_EQ(kinds.at("plate_cross_flow"), Recovery::ExchangerKind::PlateCrossFlow);
    EXPECT_EQ(kinds.at("plate_counter_flow"), Recovery::ExchangerKind::PlateCounterFlow);
    EXPECT_EQ(kinds.at("rotary_non_hygroscopic"), Recovery::ExchangerKind::RotaryNonHygroscopic);
    EXPECT_EQ(kinds.at("rotary_hygroscopic"), Recovery::ExchangerKind::RotaryHygroscopic);
    EXPECT_EQ(kinds.at("run_around_loop"), Recovery::ExchangerKind::RunAroundCoil);
    for (const auto& o : options) {
        if (!o.spec)
            continue;
        EXPECT_NO_THROW(o.spec->validate()) << o.key;
        // Sized to the unit: rated at its supply flow.
        ASSERT_TRUE(o.spec->ratedFlow);
        EXPECT_NEAR(toCubicMetresPerHour(*o.spec->ratedFlow), 9000.0, 1e-9);
        EXPECT_GT(o.extraCost, 0.0);
    }
}

TEST(AnnualHeatRecoveryComparison, UnitWithReplacesInsertsAndRemoves)
{
    const auto& base = demoUnit();
    const auto options = defaultHeatRecoveryOptions(base.airflows.supply);
    const auto none = HeatRecoveryComparison::unitWith(base, options[0]);
    EXPECT_EQ(none.supply.size(), base.supply.size() - 1);
    EXPECT_EQ(none.extract.size(), base.extract.size() - 1);
    EXPECT_NO_THROW(Chain::ChainSolver::validate(none));

    const auto wheel = HeatRecoveryComparison::unitWith(base, options[3]);
    ASSERT_EQ(wheel.supply.size(), base.supply.size());
    EXPECT_EQ(wheel.supply[2].id, "hr"); // the demo's section, same place
    EXPECT_EQ(std::get<Recovery::HeatRecovery>(wheel.supply[2].spec).kind, Recovery::ExchangerKind::RotaryNonHygroscopic);

    // Into a unit without heat recovery: after the leading damper and filter.
    const auto added = HeatRecoveryComparison::unitWith(none, options[1]);
    ASSERT_EQ(added.supply.size(), base.supply.size());
    EXPECT_EQ(added.supply[2].id, "heat-recovery");
    EXPECT_TRUE(std::holds_alternative<Chain::CoupledSide>(added.extract[1].spec));
    EXPECT_NO_THROW(Chain::ChainSolver::validate(added));
}

TEST(AnnualHeatRecoveryComparison, DemoComparisonFollowsThePhysics)
{
    const auto& r = demoComparison();
    ASSERT_EQ(r.options.size(), 6u);
    const auto& none = find(r, "none");
    const auto& cross = find(r, "plate_cross_flow");
    const auto& counter = find(r, "plate_counter_flow");
    const auto& wheel = find(r, "rotary_non_hygroscopic");
    const auto& enthalpy = find(r, "rotary_hygroscopic");
    const auto& loop = find(r, "run_around_loop");

    // The baseline saves nothing.
    EXPECT_NEAR(toMegawattHours(none.netSaving), 0.0, 1e-12);
    EXPECT_NEAR(none.costSaving, 0.0, 1e-9);
    EXPECT_FALSE(none.paybackYears);
    // Regulation figure: the model returns the rated efficiency at the 1253/2014
    // conditions by construction (docs/heat-recovery.md).
    EXPECT_NEAR(toPercent(cross.regulationEfficiency), 65.0, 0.1);
    EXPECT_NEAR(toPercent(counter.regulationEfficiency), 85.0, 0.1);
    // A higher rated efficiency recovers more heat (cross-flow 65 % vs counter-flow 85 %).
    EXPECT_GT(counter.energy.recoveredHeating, cross.energy.recoveredHeating);
    // A hygroscopic wheel also moves moisture: more total heat in winter and more
    // cooling (latent) in summer than the same wheel without sorption.
    EXPECT_GT(enthalpy.energy.recoveredHeating, wheel.energy.recoveredHeating);
    EXPECT_GT(enthalpy.energy.recoveredCooling, wheel.energy.recoveredCooling);
    // Frost: a sensible plate frosts near 0 C outdoor, a wheel only far below
    // (docs/frost.md): many more frost hours for the plates.
    EXPECT_GT(cross.energy.frostTime, wheel.energy.frostTime);
    EXPECT_GT(toHours(counter.energy.frostTime), 100.0);
    EXPECT_GT(toMegawattHours(counter.energy.frostProtection), 0.0);
    // Only the loop has a pump.
    EXPECT_GT(toMegawattHours(loop.energy.pump), 0.0);
    EXPECT_NEAR(toMegawattHours(counter.energy.pump), 0.0, 1e-12);
    // Every exchanger adds pressure drop, hence fan energy.
    for (const auto* o : {&cross, &counter, &wheel, &enthalpy, &loop}) {
        EXPECT_GT(toMegawattHours(o->addedFanEnergy), 0.0) << o->key;
        EXPECT_GT(toPascals(o->supplyPressureDrop), 0.0) << o->key;
        EXPECT_GT(toPascals(o->extractPressureDrop), 0.0) << o->key;
        EXPECT_GT(o->designEffectiveness.value(), 0.3) << o->key;
        EXPECT_LT(o->designEffectiveness.value(), 1.0) << o->key;
        // Definitions: payback = extra cost / annual cost saving; benefit = saving x years - extra cost.
        ASSERT_TRUE(o->paybackYears) << o->key;
        EXPECT_NEAR(*o->paybackYears, o->extraCost / o->costSaving, 1e-9) << o->key;
        EXPECT_NEAR(o->netBenefit, o->costSaving * 15.0 - o->extraCost, 1e-6) << o->key;
    }
    EXPECT_NEAR(toHours(r.climate.operatingTime), 8760.0, 1e-9);
    EXPECT_NEAR(toHours(r.climate.duration), 8760.0, 1e-9);
}

TEST(AnnualHeatRecoveryComparison, RankingIsOrderedAndExplained)
{
    const auto& r = demoComparison();
    ASSERT_EQ(r.ranking.size(), r.options.size());
    for (std::size_t i = 0; i < r.ranking.size(); ++i) {
        EXPECT_EQ(r.ranking[i].rank, static_cast<int>(i) + 1);
        EXPECT_FALSE(r.ranking[i].reason.empty());
        EXPECT_NEAR(r.ranking[i].netBenefit, find(r, r.ranking[i].key).netBenefit, 1e-9);
        if (i > 0) {
            EXPECT_GE(r.ranking[i - 1].netBenefit, r.ranking[i].netBenefit);
        }
    }
}

TEST(AnnualHeatRecoveryComparison, SensitivityTableHasEveryCell)
{
    const auto& r = demoComparison();
    // 3 humidity offsets x 3 heat price factors.
    ASSERT_EQ(r.sensitivity.size(), 9u);
    for (const auto& cell : r.sensitivity)
        EXPECT_EQ(cell.ranking.size(), r.options.size());
    // The cell at no offset and price factor 1 is the ranking itself.
    const auto it = std::find_if(r.sensitivity.begin(), r.sensitivity.end(), [](const SensitivityCell& c) {
        return std::abs(c.roomHumidityOffset.value()) < 1e-12 && std::abs(c.heatPriceFactor - 1.0) < 1e-12;
    });
    ASSERT_NE(it, r.sensitivity.end());
    for (std::size_t i = 0; i < r.ranking.size(); ++i)
        EXPECT_EQ(it->ranking[i], r.ranking[i].key);
    // At a heat price of zero no exchanger can pay its fan energy: no heat
    // recovery comes first (only electricity is saved or spent).
    ComparisonSettings free;
    free.heatPriceFactors = {0.0};
    free.roomHumidityOffsets = {percent(0.0)};
    const HeatRecoveryComparison c(demoUnit(), defaultHeatRecoveryOptions(demoUnit().airflows.supply), free);
    const auto zero = c.run(demoBins());
    ASSERT_TRUE(zero);
    ASSERT_EQ(zero->sensitivity.size(), 1u);
    EXPECT_EQ(zero->sensitivity.front().ranking.front(), "none");
}

TEST(AnnualHeatRecoveryComparison, BinTableRunsTheSameComparison)
{
    ComparisonSettings settings;
    settings.sensitivity = false;
    const HeatRecoveryComparison c(demoUnit(), defaultHeatRecoveryOptions(demoUnit().airflows.supply), settings);
    const auto bins = c.run(demoBins());
    ASSERT_TRUE(bins);
    EXPECT_EQ(bins->climate.method, ClimateMethod::Bins);
    EXPECT_TRUE(bins->sensitivity.empty());
    // The same options and, option by option, the hourly comparison's net saving
    // within 1 % of the heating without heat recovery (the bin method's tolerance in
    // AnnualSimulationTest). Close options may swap places: the two wheels differ by
    // less than that on the demo.
    const auto& hourly = demoComparison();
    const double scale = toMegawattHours(find(hourly, "none").energy.heating);
    ASSERT_EQ(bins->options.size(), hourly.options.size());
    for (const auto& o : bins->options)
        EXPECT_NEAR(toMegawattHours(o.netSaving), toMegawattHours(find(hourly, o.key).netSaving), 0.01 * scale) << o.key;
}

TEST(AnnualHeatRecoveryComparison, StopsWhenAsked)
{
    const HeatRecoveryComparison c(demoUnit(), defaultHeatRecoveryOptions(demoUnit().airflows.supply),
                                   ComparisonSettings{});
    std::stop_source source;
    RunControl control;
    control.stop = source.get_token();
    double last = 0.0;
    control.progress = [&](double f) {
        EXPECT_GE(f, last);
        last = f;
        if (f > 0.2)
            source.request_stop();
    };
    EXPECT_FALSE(c.run(demoYear(), control));
    EXPECT_GT(last, 0.2);
    EXPECT_LT(last, 0.3);
}

namespace {

struct OptionsRow {
    const char* what;
    std::vector<HeatRecoveryOption> options;
};

std::vector<HeatRecoveryOption> edited(void (*edit)(std::vector<HeatRecoveryOption>&))
{
    auto options = defaultHeatRecoveryOptions(cubicMetresPerHour(9000.0));
    edit(options);
    return options;
}

class AnnualComparisonOptions : public ::testing::TestWithParam<OptionsRow> {};

} // namespace

TEST_P(AnnualComparisonOptions, InvalidOptionsAreRejected)
{
    EXPECT_THROW(HeatRecoveryComparison(demoUnit(), GetParam().options, ComparisonSettings{}), InputError)
        << GetParam().what;
}

INSTANTIATE_TEST_SUITE_P(
    Rows, AnnualComparisonOptions,
    ::testing::Values(
        OptionsRow{"no options", {}},
        OptionsRow{"no baseline", edited([](auto& o) { o.erase(o.begin()); })},
        OptionsRow{"duplicate key", edited([](auto& o) { o[2].key = o[1].key; })},
        OptionsRow{"empty key", edited([](auto& o) { o[1].key.clear(); })},
        OptionsRow{"negative extra cost", edited([](auto& o) { o[1].extraCost = -1.0; })},
        OptionsRow{"efficiency out of range", edited([](auto& o) { o[1].spec->ratedEfficiency = percent(97.0); })},
        OptionsRow{"humidity efficiency on a plate",
                   edited([](auto& o) { o[2].spec->ratedHumidityEfficiency = percent(50.0); })}));

TEST(AnnualHeatRecoveryComparison, ValidOptionsAreAccepted)
{
    EXPECT_NO_THROW(HeatRecoveryComparison(demoUnit(), defaultHeatRecoveryOptions(cubicMetresPerHour(9000.0)),
                                           ComparisonSettings{}));
    ComparisonSettings bad;
    bad.evaluationYears = 0.0;
    EXPECT_THROW(HeatRecoveryComparison(demoUnit(), defaultHeatRecoveryOptions(cubicMetresPerHour(9000.0)), bad),
                 InputError);
    ComparisonSettings eer;
    eer.prices.coolingEer = 0.1;
    EXPECT_THROW(HeatRecoveryComparison(demoUnit(), defaultHeatRecoveryOptions(cubicMetresPerHour(9000.0)), eer),
                 InputError);
}
