// Heat recovery layer timings. BM_HeatRecovery: one coupled exchanger evaluation
// (both streams, condensation on the extract side, cold-corner frost check) at a
// winter design point; target <= 300 ns median.

#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/recovery/AirToAirExchanger.h"
#include "airwright/core/recovery/EffectivenessNtu.h"

#include <benchmark/benchmark.h>

using namespace Airwright::Core;
using namespace Airwright::Core::Recovery;
using Airwright::Core::Psychro::MoistAirState;

namespace {

AirToAirExchanger exchanger(ExchangerKind kind, double eps, double epsW = 0.0)
{
    ExchangerRating r;
    r.kind = kind;
    r.ratedTemperatureEfficiency = fraction(eps);
    r.ratedVolumeFlow = cubicMetresPerSecond(2.0);
    r.ratedSupplyPressureDrop = pascals(160.0);
    r.ratedExtractPressureDrop = pascals(150.0);
    r.ratedHumidityEfficiency = fraction(epsW);
    return AirToAirExchanger(r);
}

ExchangerOperatingPoint point(double tOut, double rhOut, double tExt, double rhExt, double flowRatio = 1.0)
{
    const Pressure p = pascals(101325.0);
    const double m = 2.0 * kReferenceAirDensity * flowRatio;
    return {MoistAirState::fromDryBulbRelativeHumidity(celsius(tOut), percent(rhOut), p), kilogramsPerSecond(m),
            MoistAirState::fromDryBulbRelativeHumidity(celsius(tExt), percent(rhExt), p),
            kilogramsPerSecond(0.95 * m)};
}

void runCase(benchmark::State& state, const AirToAirExchanger& x, const ExchangerOperatingPoint& p)
{
    for (auto _ : state) {
        ExchangerPerformance r = x.evaluate(p);
        benchmark::DoNotOptimize(r);
    }
}

} // namespace

static void BM_HeatRecovery(benchmark::State& state)
{
    // Cross-counter-flow plate, condensing extract, frost check at the cold corner.
    runCase(state, exchanger(ExchangerKind::PlateCrossCounterFlow, 0.8), point(-10.0, 90.0, 22.0, 40.0, 0.9));
}
BENCHMARK(BM_HeatRecovery);

static void BM_HeatRecoveryDry(benchmark::State& state)
{
    runCase(state, exchanger(ExchangerKind::PlateCounterFlow, 0.85), point(5.0, 60.0, 22.0, 20.0));
}
BENCHMARK(BM_HeatRecoveryDry);

static void BM_HeatRecoveryEnthalpyRotor(benchmark::State& state)
{
    runCase(state, exchanger(ExchangerKind::RotaryHygroscopic, 0.8, 0.7), point(-10.0, 90.0, 22.0, 40.0));
}
BENCHMARK(BM_HeatRecoveryEnthalpyRotor);

static void BM_HeatRecoveryRunAround(benchmark::State& state)
{
    runCase(state, exchanger(ExchangerKind::RunAroundCoil, 0.65), point(-10.0, 90.0, 22.0, 40.0));
}
BENCHMARK(BM_HeatRecoveryRunAround);

static void BM_CrossFlowSeries(benchmark::State& state)
{
    double n = 2.0;
    for (auto _ : state) {
        benchmark::DoNotOptimize(effectiveness(FlowArrangement::CrossFlowBothUnmixed, fraction(n), fraction(0.9)));
        n = n > 5.0 ? 2.0 : n + 0.01;
    }
}
BENCHMARK(BM_CrossFlowSeries);
