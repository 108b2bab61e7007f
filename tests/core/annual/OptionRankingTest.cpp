#include "airwright/core/annual/OptionRanking.h"
#include "airwright/core/InputError.h"

#include <gtest/gtest.h>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

OptionResult option(const char* key, bool recovery, double heatingMWh, double coolingMWh, double fanMWh, double pumpMWh,
                    double extraCost)
{
    OptionResult o;
    o.key = key;
    o.name = key;
    o.hasRecovery = recovery;
    o.energy.heating = megawattHours(heatingMWh);
    o.energy.cooling = megawattHours(coolingMWh);
    o.energy.fan = megawattHours(fanMWh);
    o.energy.pump = megawattHours(pumpMWh);
    o.energy.recoveredHeating = megawattHours(recovery ? 100.0 : 0.0);
    o.extraCost = extraCost;
    return o;
}

EnergyPrices prices()
{
    EnergyPrices p;
    p.heatPricePerKilowattHour = 0.1;
    p.electricityPricePerKilowattHour = 0.3;
    p.heatCo2KilogramsPerKilowattHour = 0.2;
    p.electricityCo2KilogramsPerKilowattHour = 0.5;
    p.coolingEer = 4.0;
    return p;
}

} // namespace

TEST(AnnualOptionRanking, SavingsCostCo2AndPaybackByHand)
{
    std::vector<OptionResult> options{option("none", false, 300.0, 20.0, 50.0, 0.0, 0.0),
                                      option("a", true, 100.0, 16.0, 60.0, 1.0, 30000.0)};
    OptionRanking::appraise(options, prices(), 10.0);
    const auto& a = options[1];
    // Hand calculation: heat saved 300 - 100 = 200 MWh; electricity saved
    // (50 + 0 + 20 / 4) - (60 + 1 + 16 / 4) = 55 - 65 = -10 MWh.
    EXPECT_NEAR(toMegawattHours(a.heatSaving), 200.0, 1e-9);
    EXPECT_NEAR(toMegawattHours(a.electricitySaving), -10.0, 1e-9);
    EXPECT_NEAR(toMegawattHours(a.addedFanEnergy), 10.0, 1e-9);
    EXPECT_NEAR(toMegawattHours(a.netSaving), 190.0, 1e-9);
    // Cost: 200 000 kWh x 0.1 - 10 000 kWh x 0.3 = 20 000 - 3 000 = 17 000 a year.
    EXPECT_NEAR(a.costSaving, 17000.0, 1e-6);
    // CO2: 200 000 x 0.2 - 10 000 x 0.5 = 35 000 kg = 35 t.
    EXPECT_NEAR(toKilograms(a.co2Saving), 35000.0, 1e-6);
    // Payback 30 000 / 17 000 = 1.7647 years; benefit over 10 years 170 000 - 30 000.
    ASSERT_TRUE(a.paybackYears);
    EXPECT_NEAR(*a.paybackYears, 30000.0 / 17000.0, 1e-12);
    EXPECT_NEAR(a.netBenefit, 140000.0, 1e-6);
    // The baseline saves nothing and has no payback.
    EXPECT_NEAR(options[0].costSaving, 0.0, 1e-12);
    EXPECT_FALSE(options[0].paybackYears);
}

TEST(AnnualOptionRanking, RanksByNetBenefitAndNamesTheMainReason)
{
    std::vector<OptionResult> options{option("none", false, 300.0, 20.0, 50.0, 0.0, 0.0),
                                      // Saves more heat but costs much more fan energy.
                                      option("fan_heavy", true, 90.0, 20.0, 90.0, 0.0, 10000.0),
                                      option("balanced", true, 100.0, 20.0, 55.0, 0.0, 10000.0),
                                      // Never pays back: heat saved is less than its fan energy costs.
                                      option("poor", true, 295.0, 20.0, 60.0, 0.0, 5000.0)};
    OptionRanking::appraise(options, prices(), 15.0);
    const auto ranking = OptionRanking::rank(options, prices(), 15.0);
    ASSERT_EQ(ranking.size(), 4u);
    // Hand calculation, benefit over 15 years: balanced (20 000 - 1 500) x 15 - 10 000
    // = 267 500; fan_heavy (21 000 - 12 000) x 15 - 10 000 = 125 000; none 0; poor
    // (500 - 3 000) x 15 - 5 000 = -42 500.
    EXPECT_EQ(ranking[0].key, "balanced");
    EXPECT_NEAR(ranking[0].netBenefit, 267500.0, 1e-6);
    EXPECT_EQ(ranking[1].key, "fan_heavy");
    EXPECT_NEAR(ranking[1].netBenefit, 125000.0, 1e-6);
    EXPECT_EQ(ranking[2].key, "none");
    EXPECT_EQ(ranking[3].key, "poor");
    EXPECT_EQ(ranking[0].rank, 1);
    EXPECT_NE(ranking[0].reason.find("largest net benefit"), std::string::npos) << ranking[0].reason;
    EXPECT_NE(ranking[1].reason.find("more fan energy"), std::string::npos) << ranking[1].reason;
    EXPECT_NE(ranking[3].reason.find("saves nothing"), std::string::npos) << ranking[3].reason;
    EXPECT_NE(ranking[2].reason.find("without heat recovery"), std::string::npos) << ranking[2].reason;
}

TEST(AnnualOptionRanking, NeedsTheBaseline)
{
    std::vector<OptionResult> options{option("a", true, 100.0, 16.0, 60.0, 1.0, 30000.0)};
    EXPECT_THROW(OptionRanking::appraise(options, prices(), 10.0), InputError);
    EXPECT_THROW(OptionRanking::rank(options, prices(), 10.0), InputError);
}
