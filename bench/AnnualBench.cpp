// Annual simulation and heat recovery comparison on the demo project and the demo
// climate (resources/demo). BM_AnnualCompare: the six default options over 8760
// hours, 24 h a day, tabulated exchanger, without the sensitivity table; target
// <= 20 ms median (about 380 ns per option-hour, everything included: the
// design solves of the chain, the exchanger tables and the hours).

#include "airwright/core/annual/AnnualSimulation.h"
#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include <benchmark/benchmark.h>

#include <string>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

const Chain::AirHandlingUnit& unit()
{
    static const auto u = [] {
        Project::LoadReport report;
        return Project::ProjectFile::load(std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-library.awproj",
                                          report)
            .unit;
    }();
    return u;
}

const WeatherYear& year()
{
    static const auto y =
        EpwReader().readFile(std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-climate.epw").weather;
    return y;
}

HeatRecoveryOption option(const std::string& key)
{
    for (auto& o : defaultHeatRecoveryOptions(unit().airflows.supply))
        if (o.key == key)
            return o;
    return {};
}

void BM_AnnualCompare(benchmark::State& state)
{
    ComparisonSettings settings;
    settings.sensitivity = false;
    const HeatRecoveryComparison comparison(unit(), defaultHeatRecoveryOptions(unit().airflows.supply), settings);
    for (auto _ : state)
        benchmark::DoNotOptimize(comparison.run(year()));
    state.counters["per_option_hour"] = benchmark::Counter(
        static_cast<double>(state.iterations()) * 6.0 * 8760.0, benchmark::Counter::kIsRate | benchmark::Counter::kInvert);
}
BENCHMARK(BM_AnnualCompare)->Unit(benchmark::kMillisecond);

// What the command line runs by default: the comparison and its 3 x 3
// sensitivity table (two more simulations of every option).
void BM_AnnualCompareWithSensitivity(benchmark::State& state)
{
    const HeatRecoveryComparison comparison(unit(), defaultHeatRecoveryOptions(unit().airflows.supply),
                                            ComparisonSettings{});
    for (auto _ : state)
        benchmark::DoNotOptimize(comparison.run(year()));
}
BENCHMARK(BM_AnnualCompareWithSensitivity)->Unit(benchmark::kMillisecond);

// One option, hourly, tabulated exchanger: the simulation the GUI reruns on an edit.
void BM_AnnualOneOption(benchmark::State& state)
{
    const AnnualSimulation simulation(HeatRecoveryComparison::unitWith(unit(), option("plate_counter_flow")));
    for (auto _ : state)
        benchmark::DoNotOptimize(simulation.run(year()));
}
BENCHMARK(BM_AnnualOneOption)->Unit(benchmark::kMillisecond);

// The reference the table is checked against: the exchanger evaluated every hour.
void BM_AnnualOneOptionEveryHour(benchmark::State& state)
{
    AnnualSettings settings;
    settings.evaluation = ExchangerEvaluation::EveryHour;
    const AnnualSimulation simulation(HeatRecoveryComparison::unitWith(unit(), option("plate_counter_flow")), settings);
    for (auto _ : state)
        benchmark::DoNotOptimize(simulation.run(year()));
}
BENCHMARK(BM_AnnualOneOptionEveryHour)->Unit(benchmark::kMillisecond)->Iterations(5);

// One hour of the per-hour model from a built table (no exact evaluations: a
// mild hour away from every threshold).
void BM_AnnualHourFromTable(benchmark::State& state)
{
    const auto u = HeatRecoveryComparison::unitWith(unit(), option("plate_counter_flow"));
    UnitHourModel model(u, Chain::ChainSolver::size(u), SeasonalConditions(u.cases, u.site.pressure()), percent(100.0),
                        OperatingMode::Normal);
    model.tabulate(year().minDryBulb(), year().maxDryBulb(), UnitHourModel::defaultTableStep());
    const auto t = celsius(6.3);
    const auto w = gramsPerKilogram(4.8);
    for (auto _ : state)
        benchmark::DoNotOptimize(model.evaluate(t, w));
}
BENCHMARK(BM_AnnualHourFromTable);

} // namespace
