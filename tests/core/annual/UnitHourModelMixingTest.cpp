// The per-hour model of units with a mixing (recirculation) section: against the
// full chain solver at single hours, against the same unit without the section,
// with the exchanger tabulated, and the effect of recirculation on heating.

#include "airwright/core/annual/UnitHourModel.h"
#include "AnnualTestSupport.h"
#include "airwright/core/InputError.h"
#include "airwright/core/annual/AnnualSimulation.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using AnnualTestSupport::demoUnit;
using AnnualTestSupport::demoYear;

namespace {

HeatRecoveryOption defaultOption(const std::string& key)
{
    for (auto& o : defaultHeatRecoveryOptions(demoUnit().airflows.supply))
        if (o.key == key)
            return o;
    throw InputError("no option " + key);
}

// Where the mixing section sits relative to the exchanger "hr" of the demo unit
// (supply: damper, filter, hr, heating coil, cooling coil, fan, filter,
// silencer; extract: filter, hr, fan, damper).
enum class Layout {
    MixAfterExchanger,  // supply hr -> mix; extract fan -> take-off -> hr: the usual unit
    MixBeforeExchanger, // supply mix -> hr (the exchanger takes mixed air); extract as above
    ReturnAfterExchanger, // supply hr -> mix; extract hr -> fan -> take-off (return air passed the exchanger)
    Loop,               // supply mix -> hr; extract hr -> fan -> take-off (return air and exchanger feed each other)
};

const char* layoutName(Layout l)
{
    switch (l) {
    case Layout::MixAfterExchanger:
        return "MixAfter";
    case Layout::MixBeforeExchanger:
        return "MixBefore";
    case Layout::ReturnAfterExchanger:
        return "ReturnAfter";
    case Layout::Loop:
        return "Loop";
    }
    return "";
}

const Chain::Section& byId(const std::vector<Chain::Section>& path, const std::string& id)
{
    const auto it = std::find_if(path.begin(), path.end(), [&](const Chain::Section& s) { return s.id == id; });
    if (it == path.end())
        throw InputError("no section " + id);
    return *it;
}

// The demo unit with this heat recovery option ("none": without) and a mixing
// section "mix" placed as the layout says.
Chain::AirHandlingUnit mixingUnit(const std::string& option, Layout layout, double outdoorPct,
                                  double minimumOutdoorM3h = 0.0, double lossCoefficient = 1.0)
{
    auto unit = HeatRecoveryComparison::unitWith(demoUnit(), defaultOption(option));
    Sections::MixingBox box;
    box.outdoorAirFraction = percent(outdoorPct);
    if (minimumOutdoorM3h > 0.0)
        box.minimumOutdoorFlow = cubicMetresPerHour(minimumOutdoorM3h);
    box.lossCoefficient = lossCoefficient;
    const bool recovery = option != "none";
    const bool mixFirst = layout == Layout::MixBeforeExchanger || layout == Layout::Loop;
    const bool returnAfter = layout == Layout::ReturnAfterExchanger || layout == Layout::Loop;

    // Supply: the mixing section next to the exchanger (or after the filter).
    const auto at = std::find_if(unit.supply.begin(), unit.supply.end(),
                                 [](const Chain::Section& s) { return s.id == "heat-recovery" || s.id == "hr"; });
    const auto place = at != unit.supply.end() ? (mixFirst ? at : at + 1) : unit.supply.begin() + 2;
    unit.supply.insert(place, Chain::Section{"mix", box});

    // Extract: rebuilt in the layout's order.
    const auto old = unit.extract;
    const std::string hr = recovery ? (std::any_of(old.begin(), old.end(),
                                                   [](const Chain::Section& s) { return s.id == "hr"; })
                                           ? "hr"
                                           : "heat-recovery")
                                    : "";
    unit.extract = {byId(old, "eta-filter")};
    if (recovery && returnAfter)
        unit.extract.push_back(byId(old, hr));
    unit.extract.push_back(byId(old, "extract-fan"));
    unit.extract.push_back(Chain::Section{"mix", Chain::CoupledSide{}});
    if (recovery && !returnAfter)
        unit.extract.push_back(byId(old, hr));
    unit.extract.push_back(byId(old, "eha-damper"));
    Chain::ChainSolver::validate(unit);
    return unit;
}

HumidityRatio humidity(double tC, double rhPct)
{
    return Psychro::humidityRatioFromRelativeHumidity(celsius(tC), percent(rhPct), demoUnit().site.pressure());
}

struct MixRow {
    const char* option;
    Layout layout;
    double outdoorC;
    double outdoorRhPct;
    double outdoorAirPct;
    double minimumOutdoorM3h; // 0: none
};

std::string mixRowName(const ::testing::TestParamInfo<MixRow>& info)
{
    const auto& p = info.param;
    std::string name = std::string(p.option) + "_" + layoutName(p.layout) + "_"
                       + std::to_string(static_cast<int>(p.outdoorC + 100.0)) + "_"
                       + std::to_string(static_cast<int>(p.outdoorAirPct)) + (p.minimumOutdoorM3h > 0.0 ? "_min" : "");
    return name;
}

class AnnualMixingAgainstChain : public ::testing::TestWithParam<MixRow> {};

} // namespace

// The reference is our own full chain (ChainSolver::solveCase) at the same outdoor
// state with the room state and setpoints the annual model uses at that hour
// (SeasonalConditions::caseAt), as in UnitHourModelTest.cpp, with the same
// tolerances, our own: heating, cooling, recovered heat 0.05 kW + 0.3 %; supply
// air leaving the unit 0.05 K; fan power 1.5 %. The rows include the three design
// cases of the demo (-12 C / 90 %, 10 C / 70 %, 30 C / 40 %: the anchors, where
// the fans' rise is the chain's own) and hours between them.
TEST_P(AnnualMixingAgainstChain, MatchesTheFullChainAtTheSameOutdoorState)
{
    const auto& row = GetParam();
    const auto& base = demoUnit();
    const auto unit = mixingUnit(row.option, row.layout, row.outdoorAirPct, row.minimumOutdoorM3h);
    const auto sizing = Chain::ChainSolver::size(base);
    const SeasonalConditions conditions(base.cases, base.site.pressure());
    const UnitHourModel model(unit, sizing, conditions, percent(100.0), OperatingMode::Normal);

    const auto outdoor = celsius(row.outdoorC);
    const HourResult hour = model.evaluateExactly(outdoor, humidity(row.outdoorC, row.outdoorRhPct));
    const auto chain = Chain::ChainSolver::solveCase(
        unit, conditions.caseAt(outdoor, percent(row.outdoorRhPct), percent(100.0), "hour"), sizing);
    ASSERT_TRUE(chain.converged);
    // The chain did mix: the section's recirculated air is what the share leaves.
    const auto mix = std::find_if(chain.supply.begin(), chain.supply.end(),
                                  [](const Chain::SectionResult& s) { return s.id == "mix"; });
    ASSERT_NE(mix, chain.supply.end());
    ASSERT_GT(toKilogramsPerSecond(std::get<Sections::MixingBox::Detail>(mix->detail).recirculated), 0.1);

    const auto near = [](Power reference) { return 50.0 + 0.003 * std::abs(toWatts(reference)); };
    EXPECT_NEAR(toWatts(hour.heating), toWatts(chain.totals.heating), near(chain.totals.heating));
    EXPECT_NEAR(toWatts(hour.cooling), toWatts(chain.totals.cooling), near(chain.totals.cooling));
    EXPECT_NEAR(toWatts(hour.recovered), toWatts(chain.totals.heatRecovered), near(chain.totals.heatRecovered));
    EXPECT_NEAR(toWatts(hour.pumpPower), toWatts(chain.totals.pumpPower), 1e-6);
    EXPECT_NEAR(toCelsius(hour.supplyTemperature), toCelsius(chain.supply.back().outlet.state.dryBulb()), 0.05);
    EXPECT_NEAR(toWatts(hour.fanPower), toWatts(chain.totals.fanElectricPower),
                0.015 * toWatts(chain.totals.fanElectricPower));
}

INSTANTIATE_TEST_SUITE_P(
    Hours, AnnualMixingAgainstChain,
    ::testing::Values(
        // The design cases (anchors) and hours between them, the usual arrangement.
        MixRow{"plate_counter_flow", Layout::MixAfterExchanger, -12.0, 90.0, 40.0, 0.0},
        MixRow{"plate_counter_flow", Layout::MixAfterExchanger, 10.0, 70.0, 40.0, 0.0},
        MixRow{"plate_counter_flow", Layout::MixAfterExchanger, 30.0, 40.0, 40.0, 0.0},
        MixRow{"plate_counter_flow", Layout::MixAfterExchanger, 3.0, 80.0, 40.0, 0.0},
        // Minimum outdoor air above the fraction: 4500 of 9000 m3/h, 50 %.
        MixRow{"plate_counter_flow", Layout::MixAfterExchanger, -5.0, 85.0, 20.0, 4500.0},
        MixRow{"rotary_hygroscopic", Layout::MixAfterExchanger, -12.0, 90.0, 50.0, 0.0},
        MixRow{"rotary_hygroscopic", Layout::MixAfterExchanger, 30.0, 40.0, 50.0, 0.0},
        MixRow{"run_around_loop", Layout::MixAfterExchanger, 10.0, 70.0, 40.0, 0.0},
        // The exchanger takes mixed air.
        MixRow{"plate_counter_flow", Layout::MixBeforeExchanger, -12.0, 90.0, 40.0, 0.0},
        MixRow{"plate_counter_flow", Layout::MixBeforeExchanger, 10.0, 70.0, 40.0, 0.0},
        MixRow{"plate_counter_flow", Layout::MixBeforeExchanger, 30.0, 40.0, 40.0, 0.0},
        MixRow{"plate_cross_flow", Layout::MixBeforeExchanger, 3.0, 80.0, 60.0, 0.0},
        // The return air has passed the exchanger; and the loop of both.
        MixRow{"plate_counter_flow", Layout::ReturnAfterExchanger, -12.0, 90.0, 40.0, 0.0},
        // (At 10 C / 70 % the chain does not settle in this layout: its exchanger
        // control and the return air chase each other.)
        MixRow{"plate_counter_flow", Layout::ReturnAfterExchanger, 3.0, 80.0, 40.0, 0.0},
        MixRow{"plate_counter_flow", Layout::Loop, -12.0, 90.0, 50.0, 0.0},
        MixRow{"plate_counter_flow", Layout::Loop, 10.0, 70.0, 50.0, 0.0},
        // Without heat recovery.
        MixRow{"none", Layout::MixAfterExchanger, -12.0, 90.0, 40.0, 0.0},
        MixRow{"none", Layout::MixAfterExchanger, 10.0, 70.0, 40.0, 0.0},
        MixRow{"none", Layout::MixAfterExchanger, 30.0, 40.0, 40.0, 0.0},
        MixRow{"none", Layout::MixAfterExchanger, 20.0, 55.0, 25.0, 0.0}),
    mixRowName);

namespace {

struct SameRow {
    const char* option;
    Layout layout;
};

class AnnualMixingAllOutdoorAir : public ::testing::TestWithParam<SameRow> {};

std::string sameRowName(const ::testing::TestParamInfo<SameRow>& info)
{
    return std::string(info.param.option) + "_" + layoutName(info.param.layout);
}

} // namespace

// A mixing section at 100 % outdoor air recirculates nothing (MixingBox::mix
// passes the outdoor air), so with no pressure drop of its own (loss coefficient
// 0) the unit is the unit without it. Tolerance, our own: the chain settles the
// design cases to 1e-4 K (ChainSolver), so the fans' rises the model takes from
// them may differ by that much between the two units: 1 W, 1e-3 K.
TEST_P(AnnualMixingAllOutdoorAir, EqualsTheUnitWithoutTheSection)
{
    const auto& base = demoUnit();
    const auto sizing = Chain::ChainSolver::size(base);
    const SeasonalConditions conditions(base.cases, base.site.pressure());
    const auto without = HeatRecoveryComparison::unitWith(base, defaultOption(GetParam().option));
    const auto with = mixingUnit(GetParam().option, GetParam().layout, 100.0, 0.0, 0.0);
    // The same order of the other sections (the extract fan before the exchanger).
    auto reference = with;
    reference.supply.erase(std::find_if(reference.supply.begin(), reference.supply.end(),
                                        [](const Chain::Section& s) { return s.id == "mix"; }));
    reference.extract.erase(std::find_if(reference.extract.begin(), reference.extract.end(),
                                         [](const Chain::Section& s) { return s.id == "mix"; }));
    ASSERT_EQ(reference.supply.size(), without.supply.size());

    UnitHourModel a(with, sizing, conditions, percent(100.0), OperatingMode::Normal);
    UnitHourModel b(reference, sizing, conditions, percent(100.0), OperatingMode::Normal);
    ASSERT_TRUE(a.tabulate(celsius(-20.0), celsius(35.0), UnitHourModel::defaultTableStep()));
    ASSERT_TRUE(b.tabulate(celsius(-20.0), celsius(35.0), UnitHourModel::defaultTableStep()));
    for (const auto& [tC, rh] : {std::pair{-15.0, 90.0}, std::pair{-3.0, 85.0}, std::pair{8.0, 75.0},
                                 std::pair{17.0, 60.0}, std::pair{29.0, 45.0}}) {
        const auto w = humidity(tC, rh);
        for (const bool exact : {true, false}) {
            const HourResult x = exact ? a.evaluateExactly(celsius(tC), w) : a.evaluate(celsius(tC), w);
            const HourResult y = exact ? b.evaluateExactly(celsius(tC), w) : b.evaluate(celsius(tC), w);
            const std::string at = std::to_string(tC) + (exact ? " exact" : " table");
            EXPECT_NEAR(toWatts(x.heating), toWatts(y.heating), 1.0) << at;
            EXPECT_NEAR(toWatts(x.cooling), toWatts(y.cooling), 1.0) << at;
            EXPECT_NEAR(toWatts(x.recovered), toWatts(y.recovered), 1.0) << at;
            EXPECT_NEAR(toWatts(x.frostProtection), toWatts(y.frostProtection), 1.0) << at;
            EXPECT_NEAR(toWatts(x.fanPower), toWatts(y.fanPower), 1.0) << at;
            EXPECT_EQ(x.frost, y.frost) << at;
            EXPECT_NEAR(toCelsius(x.supplyTemperature), toCelsius(y.supplyTemperature), 1e-3) << at;
            EXPECT_NEAR(toCelsius(x.supplyAfterRecovery), toCelsius(y.supplyAfterRecovery), 1e-3) << at;
        }
    }
}

INSTANTIATE_TEST_SUITE_P(Units, AnnualMixingAllOutdoorAir,
                         ::testing::Values(SameRow{"plate_counter_flow", Layout::MixAfterExchanger},
                                           SameRow{"plate_counter_flow", Layout::MixBeforeExchanger},
                                           SameRow{"rotary_hygroscopic", Layout::Loop},
                                           SameRow{"none", Layout::MixAfterExchanger}),
                         sameRowName);

namespace {

struct WinterRow {
    const char* option;
    Layout layout;
    double outdoorC;
};

class AnnualMixingInWinter : public ::testing::TestWithParam<WinterRow> {};

std::string winterRowName(const ::testing::TestParamInfo<WinterRow>& info)
{
    return std::string(info.param.option) + "_" + layoutName(info.param.layout) + "_"
           + std::to_string(static_cast<int>(info.param.outdoorC + 100.0));
}

} // namespace

// Common practice (physical reasoning): in winter the return air is warmer than
// the outdoor air (and than the air an exchanger delivers), so at the same supply
// flow and setpoint more recirculation leaves less to heat. Checked hour by hour
// at falling outdoor-air fractions: strictly less heating while there is any
// (above 50 W, the tolerance of the model), never more.
TEST_P(AnnualMixingInWinter, MoreRecirculationNeedsLessHeating)
{
    const auto& row = GetParam();
    const auto& base = demoUnit();
    const auto sizing = Chain::ChainSolver::size(base);
    const SeasonalConditions conditions(base.cases, base.site.pressure());
    const auto w = humidity(row.outdoorC, 85.0);
    double previous = -1.0;
    for (const double outdoorPct : {100.0, 75.0, 50.0, 30.0}) {
        const UnitHourModel model(mixingUnit(row.option, row.layout, outdoorPct), sizing, conditions,
                                  percent(100.0), OperatingMode::Normal);
        const double heating = toWatts(model.evaluateExactly(celsius(row.outdoorC), w).heating);
        if (previous >= 0.0) {
            if (previous > 50.0)
                EXPECT_LT(heating, previous) << outdoorPct << " % outdoor air";
            else
                EXPECT_LE(heating, previous + 1e-6) << outdoorPct << " % outdoor air";
        }
        previous = heating;
    }
}

INSTANTIATE_TEST_SUITE_P(Hours, AnnualMixingInWinter,
                         ::testing::Values(WinterRow{"none", Layout::MixAfterExchanger, -12.0},
                                           WinterRow{"none", Layout::MixAfterExchanger, 0.0},
                                           WinterRow{"none", Layout::MixAfterExchanger, 8.0},
                                           WinterRow{"plate_cross_flow", Layout::MixAfterExchanger, -12.0},
                                           WinterRow{"plate_cross_flow", Layout::MixAfterExchanger, -3.0},
                                           WinterRow{"plate_counter_flow", Layout::MixBeforeExchanger, -12.0},
                                           WinterRow{"run_around_loop", Layout::MixAfterExchanger, -5.0}),
                         winterRowName);

// The same over the demo year (heating all year, winter dominated): the annual
// heating falls with the outdoor-air fraction. Common practice, as above.
TEST(AnnualMixing, AnnualHeatingFallsWithRecirculation)
{
    double previous = -1.0;
    for (const double outdoorPct : {100.0, 60.0, 30.0}) {
        const auto result =
            AnnualSimulation(mixingUnit("plate_cross_flow", Layout::MixAfterExchanger, outdoorPct)).run(demoYear());
        ASSERT_TRUE(result);
        const double heating = toMegawattHours(result->total.heating);
        if (previous >= 0.0) {
            EXPECT_LT(heating, previous) << outdoorPct << " % outdoor air";
        }
        previous = heating;
    }
}

namespace {

class AnnualMixingTable : public ::testing::TestWithParam<SameRow> {};

} // namespace

// The tabulated exchanger holds with mixing: its inlets are still functions of the
// outdoor state alone (mixed air from outdoor and return air, the return air from
// the room state and the extract fan, or the exchanger's own converged extract
// outlet). Tabulated against the exchanger evaluated every hour over the demo year;
// tolerances, our own, as in UnitHourModelTest.cpp (relative to the heating of the
// same unit without heat recovery): heating and recovered heating 0.2 %, cooling
// and recovered cooling 0.1 %, frost hours exactly.
TEST_P(AnnualMixingTable, AgreesWithTheExchangerEveryHour)
{
    AnnualSettings exact;
    exact.evaluation = ExchangerEvaluation::EveryHour;
    const double scale = toMegawattHours(
        AnnualSimulation(mixingUnit("none", Layout::MixAfterExchanger, 40.0), exact).run(demoYear())->total.heating);
    ASSERT_GT(scale, 10.0);

    const auto unit = mixingUnit(GetParam().option, GetParam().layout, 40.0);
    const auto tabulated = AnnualSimulation(unit, AnnualSettings{}).run(demoYear());
    const auto reference = AnnualSimulation(unit, exact).run(demoYear());
    ASSERT_TRUE(tabulated && reference);
    const auto& t = tabulated->total;
    const auto& r = reference->total;
    EXPECT_GT(tabulated->tableNodes, 0u);
    EXPECT_NEAR(toMegawattHours(t.heating), toMegawattHours(r.heating), 0.002 * scale);
    EXPECT_NEAR(toMegawattHours(t.recoveredHeating), toMegawattHours(r.recoveredHeating), 0.002 * scale);
    EXPECT_NEAR(toMegawattHours(t.cooling), toMegawattHours(r.cooling), 0.001 * scale);
    EXPECT_NEAR(toMegawattHours(t.recoveredCooling), toMegawattHours(r.recoveredCooling), 0.001 * scale);
    EXPECT_NEAR(toHours(t.frostTime), toHours(r.frostTime), 0.5);
}

INSTANTIATE_TEST_SUITE_P(Units, AnnualMixingTable,
                         ::testing::Values(SameRow{"plate_counter_flow", Layout::MixAfterExchanger},
                                           SameRow{"rotary_hygroscopic", Layout::MixBeforeExchanger},
                                           SameRow{"plate_counter_flow", Layout::ReturnAfterExchanger},
                                           SameRow{"plate_counter_flow", Layout::Loop}),
                         sameRowName);

// Invalid: more air recirculated than the extract path carries. The chain refuses
// it (CaseSolver's flows), and so the model, at construction.
TEST(AnnualMixing, RefusesMoreRecirculationThanExtractAir)
{
    const auto& base = demoUnit();
    auto unit = mixingUnit("plate_counter_flow", Layout::MixAfterExchanger, 20.0);
    unit.airflows.extract = cubicMetresPerHour(3000.0); // 7200 m3/h would be recirculated
    EXPECT_THROW(UnitHourModel(unit, Chain::ChainSolver::size(base), SeasonalConditions(base.cases, base.site.pressure()),
                               percent(100.0), OperatingMode::Normal),
                 InputError);
}

// The comparison adds an exchanger where a mixing unit has none on the outdoor
// side of the mixing section and after the take-off, and runs.
TEST(AnnualMixing, ComparisonAddsTheExchangerOutsideTheMixingSection)
{
    const auto unit = mixingUnit("none", Layout::MixAfterExchanger, 40.0);
    const auto added = HeatRecoveryComparison::unitWith(unit, defaultOption("plate_cross_flow"));
    const auto index = [](const std::vector<Chain::Section>& path, const std::string& id) {
        return std::find_if(path.begin(), path.end(), [&](const Chain::Section& s) { return s.id == id; })
               - path.begin();
    };
    EXPECT_LT(index(added.supply, "heat-recovery"), index(added.supply, "mix"));
    EXPECT_GT(index(added.extract, "heat-recovery"), index(added.extract, "mix"));
    EXPECT_NO_THROW(Chain::ChainSolver::validate(added));

    ComparisonSettings settings;
    settings.sensitivity = false;
    const HeatRecoveryComparison comparison(unit, defaultHeatRecoveryOptions(unit.airflows.supply), settings);
    const auto result = comparison.run(AnnualTestSupport::demoBins());
    ASSERT_TRUE(result);
    EXPECT_EQ(result->options.size(), 6u);
}
