// Extreme but legal inputs: the solver converges and no number is NaN or
// infinite (-40 C outdoor, 3000 m altitude, saturated outdoor air, 5 % airflow,
// 60 sections).

#include "ExampleUnits.h"

#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/chain/SectionFigures.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace Airwright::Core;
using namespace Airwright::Core::Chain;

namespace {

void expectAllFinite(const UnitResult& result)
{
    for (const auto& c : result.cases) {
        EXPECT_TRUE(c.converged) << c.caseName;
        for (const auto* path : {&c.supply, &c.extract}) {
            for (const auto& s : *path) {
                for (double v : {s.inlet.state.dryBulb().value(), s.outlet.state.dryBulb().value(),
                                 s.outlet.state.humidityRatio().value(), s.outlet.state.enthalpy().value(),
                                 s.staticPressureOut.value(), s.duty.value(), s.faceVelocity.value(),
                                 s.inletFlow.value(), s.pressureDrop.value()})
                    EXPECT_TRUE(std::isfinite(v)) << c.caseName << " " << s.id;
                for (const auto& f : sectionFigures(s))
                    EXPECT_TRUE(std::isfinite(f.value)) << s.id << " " << f.key;
            }
        }
        EXPECT_TRUE(std::isfinite(c.totals.specificFanPower.value()));
    }
}

} // namespace

TEST(ChainExtremes, ColdHighAndSaturated)
{
    auto unit = Testing::exampleUnit();
    unit.site.altitude = metres(3000.0);
    auto cold = Testing::winterCase();
    cold.name = "arctic";
    cold.outdoorTemperature = celsius(-40.0);
    cold.outdoorHumidity = percent(100.0);
    auto saturated = Testing::summerCase();
    saturated.name = "saturated";
    saturated.outdoorHumidity = percent(100.0);
    auto trickle = Testing::winterCase();
    trickle.name = "trickle";
    trickle.airflowFraction = percent(5.0);
    unit.cases = {cold, saturated, trickle};
    const auto result = ChainSolver::solve(unit);
    expectAllFinite(result);
}

TEST(ChainExtremes, SixtySections)
{
    auto unit = Testing::exampleUnit();
    // Pad both paths with silencers and access sections to 60 sections in all.
    int n = 0;
    while (unit.supply.size() + unit.extract.size() < 60) {
        Sections::PassiveSection s;
        s.kind = n % 2 ? Sections::PassiveKind::Access : Sections::PassiveKind::Silencer;
        s.ratedPressureDrop = pascals(n % 2 ? 2.0 : 25.0);
        auto& path = n % 3 ? unit.supply : unit.extract;
        path.insert(path.begin() + 1, Section{"P" + std::to_string(n), s});
        ++n;
    }
    const auto result = ChainSolver::solve(unit);
    expectAllFinite(result);
    EXPECT_NEAR(toCelsius(result.cases[0].supply.back().outlet.state.dryBulb()), 19.0, 0.01);
}
