// Energy and mass balance of every section and of each path, for every case of
// the example unit and of variants with a wheel, a run-around loop, mixing and a
// humidifier. Balances are physics (conservation), so the checks need no outside
// numbers; tolerances are stated per check.

#include "ExampleUnits.h"

#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <cmath>

using namespace Airwright::Core;
using namespace Airwright::Core::Chain;

namespace {

double enthalpyFlow(const Sections::AirStream& s)
{
    return s.dryAir.value() * s.state.enthalpy().value();
}

AirHandlingUnit variant(int which)
{
    auto unit = Testing::exampleUnit();
    DesignCase humidWinter = Testing::winterCase();
    humidWinter.name = "humidified winter";
    humidWinter.minimumSupplyHumidity = percent(40.0);
    unit.cases.push_back(humidWinter);
    auto& hr = std::get<Recovery::HeatRecovery>(unit.supply[2].spec);
    switch (which) {
    case 1:
        hr.kind = Recovery::ExchangerKind::RotaryHygroscopic;
        hr.ratedEfficiency = percent(78.0);
        hr.ratedHumidityEfficiency = percent(65.0);
        hr.exhaustAirTransfer = percent(3.0);
        hr.outdoorAirCorrection = 1.08;
        break;
    case 2:
        hr.kind = Recovery::ExchangerKind::RunAroundCoil;
        hr.ratedEfficiency = percent(55.0);
        hr.pumpPower = kilowatts(0.4);
        break;
    case 3: {
        Sections::MixingBox mixing;
        mixing.outdoorAirFraction = percent(40.0);
        unit.supply.insert(unit.supply.begin() + 1, Section{"MIX", mixing});
        unit.extract.insert(unit.extract.begin() + 1, Section{"MIX", CoupledSide{}});
        break;
    }
    default:
        break;
    }
    Sections::Humidifier humidifier;
    humidifier.kind = which == 2 ? Sections::HumidifierKind::Adiabatic : Sections::HumidifierKind::Steam;
    unit.supply.insert(unit.supply.end() - 1, Section{"HU", humidifier});
    return unit;
}

} // namespace

class ChainBalance : public ::testing::TestWithParam<int> {};

TEST_P(ChainBalance, EverySectionAndPathBalances)
{
    const auto unit = variant(GetParam());
    const auto result = ChainSolver::solve(unit);
    for (const auto& c : result.cases) {
        SCOPED_TRACE(c.caseName);
        ASSERT_TRUE(c.converged);
        for (const auto* path : {&c.supply, &c.extract}) {
            for (std::size_t k = 0; k < path->size(); ++k) {
                const auto& s = (*path)[k];
                SCOPED_TRACE(s.id);
                // Continuity: what leaves one section enters the next (same state, same flow).
                if (k + 1 < path->size()) {
                    const auto& next = (*path)[k + 1];
                    EXPECT_NEAR(next.inlet.dryAir.value(), s.outlet.dryAir.value(), 1e-12);
                    EXPECT_NEAR(toCelsius(next.inlet.state.dryBulb()), toCelsius(s.outlet.state.dryBulb()), 2e-4);
                    EXPECT_NEAR(next.staticPressureIn.value(), s.staticPressureOut.value(), 0.05);
                }
                // Duty is the enthalpy flow change (definition), to rounding.
                EXPECT_NEAR(s.duty.value(), enthalpyFlow(s.outlet) - enthalpyFlow(s.inlet),
                            1e-9 * std::abs(enthalpyFlow(s.inlet)) + 1e-6);
                // Dry air is conserved unless the section couples the paths.
                if (s.typeKey != "heat_recovery" && s.typeKey != "mixing") {
                    EXPECT_NEAR(s.outlet.dryAir.value(), s.inlet.dryAir.value(), 1e-12);
                }
                // Water: W change times dry air equals water added minus water removed.
                if (s.typeKey != "heat_recovery" && s.typeKey != "mixing") {
                    const double dW = s.outlet.state.humidityRatio().value() - s.inlet.state.humidityRatio().value();
                    EXPECT_NEAR(s.inlet.dryAir.value() * dW, (s.waterAdded - s.waterRemoved).value(), 1e-10);
                }
                std::visit(
                    [&](const auto& d) {
                        using T = std::decay_t<decltype(d)>;
                        if constexpr (std::is_same_v<T, Sections::Fan::Detail>) {
                            // Motor in the airstream: all electric input ends up in the air (0.1 %).
                            EXPECT_NEAR(s.duty.value(), d.electricPower.value(), 1e-3 * d.electricPower.value() + 1e-6);
                        } else if constexpr (std::is_same_v<T, Sections::CoolingCoil::Detail>) {
                            // ASHRAE Fundamentals 2017 ch. 1: q = m (h1 - h2) - m (W1 - W2) h_w.
                            if (d.apparatusDewPoint) {
                                const double hw = Psychro::liquidWaterEnthalpy(*d.apparatusDewPoint).value();
                                EXPECT_NEAR(d.totalLoad.value(), -s.duty.value() - d.condensate.value() * hw,
                                            1e-6 * std::abs(d.totalLoad.value()) + 1e-6);
                            }
                        } else if constexpr (std::is_same_v<T, Sections::Humidifier::Detail>) {
                            if (GetParam() != 2) { // steam in all variants but the run-around one
                                // Steam brings its own enthalpy: duty = m_w h_g(t_steam) (0.1 %).
                                const double hg = Psychro::waterVapourEnthalpy(celsius(100.0)).value();
                                EXPECT_NEAR(s.duty.value(), d.waterAdded.value() * hg,
                                            1e-3 * std::abs(s.duty.value()) + 1e-6);
                            }
                        }
                    },
                    s.detail);
            }
        }
        // Exchangers: what the supply gains the extract loses, condensate included (0.1 %).
        const auto* hs = c.find(PathKind::Supply, "HR");
        const auto* he = c.find(PathKind::Extract, "HR");
        ASSERT_TRUE(hs && he);
        const auto& d = std::get<Recovery::HeatRecoveryDetail>(hs->detail);
        const double condensateEnthalpy =
            d.condensate.value()
            * Psychro::liquidWaterEnthalpy(std::min(he->outlet.state.dryBulb(), hs->outlet.state.dryBulb())).value();
        const double imbalance = hs->duty.value() + he->duty.value() + condensateEnthalpy;
        EXPECT_NEAR(imbalance, 0.0, 1e-3 * std::abs(hs->duty.value()) + 1.0);
        // Mass through the exchanger and its crossing flows.
        EXPECT_NEAR(hs->inlet.dryAir.value() + he->inlet.dryAir.value(),
                    hs->outlet.dryAir.value() + he->outlet.dryAir.value(), 1e-9);
    }
}

std::string variantName(const ::testing::TestParamInfo<int>& row)
{
    static const char* const kNames[] = {"plate", "enthalpy_wheel", "run_around", "mixing"};
    return kNames[row.param];
}

INSTANTIATE_TEST_SUITE_P(Variants, ChainBalance, ::testing::Values(0, 1, 2, 3), variantName);
