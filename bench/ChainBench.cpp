// The chain solver on the demo project (all cases) and on a unit of 60 sections:
// the GUI recomputes on every keystroke, so these bound the edit-to-view latency.

#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include <benchmark/benchmark.h>

#include <string>

using namespace Airwright::Core;

namespace {

Chain::AirHandlingUnit demoUnit()
{
    Project::LoadReport report;
    return Project::ProjectFile::load(std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-library.awproj", report)
        .unit;
}

Chain::AirHandlingUnit sixtySections()
{
    auto unit = demoUnit();
    int n = 0;
    while (unit.supply.size() + unit.extract.size() < 60) {
        Sections::PassiveSection s;
        s.kind = n % 2 ? Sections::PassiveKind::Access : Sections::PassiveKind::Silencer;
        s.ratedPressureDrop = pascals(n % 2 ? 2.0 : 20.0);
        auto& path = n % 3 ? unit.supply : unit.extract;
        path.insert(path.begin() + 1, Chain::Section{"P" + std::to_string(n), s});
        ++n;
    }
    return unit;
}

void BM_ChainDemo(benchmark::State& state)
{
    const auto unit = demoUnit();
    for (auto _ : state)
        benchmark::DoNotOptimize(Chain::ChainSolver::solve(unit));
}
BENCHMARK(BM_ChainDemo)->Unit(benchmark::kMicrosecond);

void BM_Chain60(benchmark::State& state)
{
    const auto unit = sixtySections();
    for (auto _ : state)
        benchmark::DoNotOptimize(Chain::ChainSolver::solve(unit));
}
BENCHMARK(BM_Chain60)->Unit(benchmark::kMicrosecond);

} // namespace
