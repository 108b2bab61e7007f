#include "airwright/core/checks/RecoveryReferenceDrop.h"
#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/checks/UnitAssessment.h"

#include "ResultBuilders.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <limits>
#include <optional>
#include <variant>

using namespace Airwright::Core;
using namespace Airwright::Core::Checks;
using namespace Airwright::Core::Checks::TestSupport;
using Airwright::Core::Chain::PathKind;
using Airwright::Core::Recovery::ExchangerKind;

// The rating law of docs/regulation.md, dp = dp_rated (m / (q_rated 1.2))^x 1.2 / rho,
// with the exponents of ExchangerKind.h (common practice: plates 1.5, rotors 1.2,
// coils 1.8). rho of dry air at 20 C, 101325 Pa by the ideal gas law (ASHRAE
// Fundamentals 2017, ch. 1, eq. 26, W = 0). Expected values worked by hand.

namespace {

constexpr double kRho20 = 101325.0 / (287.042 * 293.15);

struct DropRow {
    ExchangerKind kind;
    PathKind side;
    double ratedFlow;             // m3/s
    double dryAir;                // kg/s through the side
    std::optional<double> dropPa; // empty: invalid input
};

class ReferenceDropTable : public ::testing::TestWithParam<DropRow> {};

} // namespace

TEST_P(ReferenceDropTable, FollowsTheRatingLaw)
{
    const DropRow& row = GetParam();
    Recovery::HeatRecovery spec;
    spec.kind = row.kind;
    spec.ratedPressureDropSupply = pascals(150.0);
    spec.ratedPressureDropExtract = pascals(120.0);
    const Chain::SectionResult side = recoveryResult("HR", row.side, row.kind, 0.8, 0.0, 2.0, row.dryAir);
    if (!row.dropPa) {
        EXPECT_THROW(recoveryReferenceDrop(spec, cubicMetresPerSecond(row.ratedFlow), side), InputError);
        return;
    }
    EXPECT_NEAR(toPascals(recoveryReferenceDrop(spec, cubicMetresPerSecond(row.ratedFlow), side)), *row.dropPa, 1e-6);
}

INSTANTIATE_TEST_SUITE_P(
    Checks, ReferenceDropTable,
    ::testing::Values(
        // At rated mass flow only the density term is left: 150 x 1.2 / 1.20415 = 149.48.
        DropRow{ExchangerKind::PlateCounterFlow, PathKind::Supply, 2.0, 2.4, 150.0 * 1.2 / kRho20},
        // Plate, 2.0 kg/s of 2.4 rated: 150 x (2.0/2.4)^1.5 x 1.2/rho = 113.72.
        DropRow{ExchangerKind::PlateCrossFlow, PathKind::Supply, 2.0, 2.0,
                150.0 * std::pow(2.0 / 2.4, 1.5) * 1.2 / kRho20},
        // Extract side of a rotor: 120 x (3.0/2.4)^1.2 x 1.2/rho.
        DropRow{ExchangerKind::RotaryHygroscopic, PathKind::Extract, 2.0, 3.0,
                120.0 * std::pow(3.0 / 2.4, 1.2) * 1.2 / kRho20},
        // Run-around coil: 150 x (1.2/2.4)^1.8 x 1.2/rho.
        DropRow{ExchangerKind::RunAroundCoil, PathKind::Supply, 2.0, 1.2, 150.0 * std::pow(0.5, 1.8) * 1.2 / kRho20},
        DropRow{ExchangerKind::PlateCounterFlow, PathKind::Extract, 2.0, 0.0, 0.0}, // no air, no drop
        // invalid
        DropRow{ExchangerKind::PlateCounterFlow, PathKind::Supply, 0.0, 2.4, std::nullopt},
        DropRow{ExchangerKind::PlateCounterFlow, PathKind::Supply, -1.0, 2.4, std::nullopt},
        DropRow{ExchangerKind::PlateCounterFlow, PathKind::Supply, std::numeric_limits<double>::quiet_NaN(), 2.4,
                std::nullopt}));

TEST(RecoveryReferenceDrop, MatchesTheChainWhereTheBypassIsClosed)
{
    // A unit solved by the chain: wherever a case runs its exchanger with the
    // bypass closed, the rating law here must give the chain's own drop; where the
    // bypass is open the reference drop is the larger.
    Chain::AirHandlingUnit unit;
    Sections::Filter fine;
    fine.group = Sections::FilterGroup::IsoEpm1;
    Sections::Filter medium;
    medium.group = Sections::FilterGroup::IsoEpm10;
    medium.efficiency = percent(60.0);
    unit.supply = {{"F1", fine}, {"HR", Recovery::HeatRecovery{}}, {"SF", Sections::Fan{}}};
    unit.extract = {{"F2", medium}, {"HR", Chain::CoupledSide{}}, {"EF", Sections::Fan{}}};
    Chain::DesignCase winter;
    winter.name = "winter";
    Chain::DesignCase summer;
    summer.name = "summer";
    summer.outdoorTemperature = celsius(32.0);
    summer.outdoorHumidity = percent(40.0);
    summer.roomTemperature = celsius(26.0);
    summer.roomHumidity = percent(50.0);
    summer.supplySetpoint = celsius(18.0);
    unit.cases = {winter, summer};
    const Chain::UnitResult result = Chain::ChainSolver::solve(unit);
    const auto& spec = std::get<Recovery::HeatRecovery>(unit.supply[1].spec);

    int closed = 0;
    for (const auto& c : result.cases)
        for (const auto* path : {&c.supply, &c.extract})
            for (const auto& r : *path) {
                const auto* d = std::get_if<Recovery::HeatRecoveryDetail>(&r.detail);
                if (!d)
                    continue;
                const double reference = toPascals(recoveryReferenceDrop(spec, unit.airflows.supply, r));
                if (toFraction(d->bypassFraction) == 0.0) {
                    ++closed;
                    EXPECT_NEAR(reference, toPascals(r.pressureDrop), 1e-6 * reference) << c.caseName;
                } else {
                    EXPECT_GE(reference, toPascals(r.pressureDrop) - 1e-9) << c.caseName;
                }
            }
    EXPECT_GE(closed, 2) << "the summer case should run the exchanger with the bypass closed";

    // And the assessment of the solved unit holds together: a two-direction plate
    // unit with both filters, its limit worked from its own figures.
    const UnitAssessment a = assessUnit(unit, result);
    ASSERT_EQ(a.cases.size(), 2u);
    for (const CaseAssessment& c : a.cases) {
        ASSERT_TRUE(c.sfpIntLimit.has_value());
        EXPECT_TRUE(c.sfpIntLimit->fineFilter && c.sfpIntLimit->mediumFilter);
        const double eta = toFraction(c.sfpIntLimit->thermalEfficiency);
        // qnom = 10000 m3/h = 2.78 m3/s >= 2: 800 + max(0, eta - 0.73) x 3000 (from memory).
        EXPECT_NEAR(toWattsPerCubicMetrePerSecond(c.sfpIntLimit->limit), 800.0 + std::max(0.0, eta - 0.73) * 3000.0,
                    1e-6);
        EXPECT_NE(c.compliance, Compliance::NotAssessed);
    }
}
