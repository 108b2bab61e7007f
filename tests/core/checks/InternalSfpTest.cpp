#include "airwright/core/checks/InternalSfp.h"
#include "airwright/core/InputError.h"

#include "ResultBuilders.h"

#include <gtest/gtest.h>

#include <limits>

using namespace Airwright::Core;
using namespace Airwright::Core::Checks;
using namespace Airwright::Core::Checks::TestSupport;
using Airwright::Core::Chain::PathKind;
using Airwright::Core::Recovery::ExchangerKind;
using Airwright::Core::Sections::FilterGroup;

// SFPint as Regulation (EU) No 1253/2014 defines it (Annex I, from memory):
// internal static pressure drop of the ventilation components of the reference
// configuration (heat recovery, clean filters) over the fan efficiency, summed for
// supply and extract. Expected values worked by hand; tolerance 1e-9 W/(m3/s).

TEST(InternalSfp, CleanFiltersAndRecoveryOverFanEfficiency)
{
    Chain::CaseResult c;
    c.supply = {filterResult("F1", PathKind::Supply, FilterGroup::IsoEpm1, 0.55, 60.0, 120.0, 180.0),
                recoveryResult("HR", PathKind::Supply, ExchangerKind::PlateCounterFlow, 0.8, 150.0),
                otherResult("coil", PathKind::Supply, 45.0), fanResult("SF", PathKind::Supply, 0.60, 700.0)};
    c.extract = {filterResult("F2", PathKind::Extract, FilterGroup::IsoEpm10, 0.6, 50.0, 100.0, 150.0),
                 recoveryResult("HR", PathKind::Extract, ExchangerKind::PlateCounterFlow, 0.8, 140.0),
                 fanResult("EF", PathKind::Extract, 0.65, 600.0)};
    const InternalSfp s = internalSfp(c);
    // Supply: (60 + 150) / 0.60 = 350; the design filter drop (120) and the coil
    // (45) do not count.
    EXPECT_NEAR(toPascals(s.supply.filterDrop), 60.0, 1e-9);
    EXPECT_NEAR(toPascals(s.supply.recoveryDrop), 150.0, 1e-9);
    EXPECT_NEAR(toPascals(s.supply.internalDrop), 210.0, 1e-9);
    EXPECT_NEAR(toFraction(s.supply.fanEfficiency), 0.60, 1e-12);
    EXPECT_NEAR(toWattsPerCubicMetrePerSecond(s.supply.sfpInt), 350.0, 1e-9);
    // Extract: (50 + 140) / 0.65 = 292.3077
    EXPECT_NEAR(toWattsPerCubicMetrePerSecond(s.extract.sfpInt), 190.0 / 0.65, 1e-9);
    EXPECT_NEAR(toWattsPerCubicMetrePerSecond(s.total), 350.0 + 190.0 / 0.65, 1e-9);
}

TEST(InternalSfp, FansInSeriesCombineByTheirPower)
{
    // Two fans moving one flow: 300 Pa at 50 % and 100 Pa at 80 % take
    // q (600 + 125) W for q x 400 Pa of air power, so eta = 400 / 725.
    const std::vector<Chain::SectionResult> path = {
        filterResult("F", PathKind::Supply, FilterGroup::IsoEpm1, 0.6, 80.0, 130.0, 180.0),
        fanResult("A", PathKind::Supply, 0.50, 300.0), fanResult("B", PathKind::Supply, 0.80, 100.0)};
    const PathInternalSfp p = pathInternalSfp(path);
    EXPECT_NEAR(toFraction(p.fanEfficiency), 400.0 / 725.0, 1e-12);
    EXPECT_NEAR(toWattsPerCubicMetrePerSecond(p.sfpInt), 80.0 * 725.0 / 400.0, 1e-9);
}

TEST(InternalSfp, PathWithoutComponentsHasZero)
{
    const PathInternalSfp p = pathInternalSfp({fanResult("EF", PathKind::Extract, 0.6, 300.0)});
    EXPECT_NEAR(toWattsPerCubicMetrePerSecond(p.sfpInt), 0.0, 1e-12);
}

namespace {

struct BadFan {
    double efficiency;
    bool hasFan;
};

class InvalidPath : public ::testing::TestWithParam<BadFan> {};

} // namespace

TEST_P(InvalidPath, Throws)
{
    std::vector<Chain::SectionResult> path = {
        filterResult("F", PathKind::Supply, FilterGroup::IsoEpm1, 0.6, 80.0, 130.0, 180.0)};
    if (GetParam().hasFan)
        path.push_back(fanResult("SF", PathKind::Supply, GetParam().efficiency, 500.0));
    EXPECT_THROW(pathInternalSfp(path), InputError);
}

INSTANTIATE_TEST_SUITE_P(InternalSfp, InvalidPath,
                         ::testing::Values(BadFan{0.0, true}, BadFan{-0.5, true}, BadFan{1.2, true},
                                           BadFan{std::numeric_limits<double>::quiet_NaN(), true}, BadFan{0.6, false}));

TEST(InternalSfp, EmptyPathThrows)
{
    EXPECT_THROW(pathInternalSfp({}), InputError);
}
