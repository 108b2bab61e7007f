#include "airwright/core/InputError.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/core/recovery/EffectivenessNtu.h"
#include "airwright/core/recovery/FrostOnset.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <optional>

using namespace Airwright::Core;
using namespace Airwright::Core::Recovery;
using Airwright::Core::Psychro::MoistAirState;

namespace {

const Pressure kP = pascals(101325.0);

MoistAirState air(double tC, double rhPercent)
{
    return MoistAirState::fromDryBulbRelativeHumidity(celsius(tC), percent(rhPercent), kP);
}

double onset(ExchangerKind kind, double tExtract, double rhExtract, double eps, double epsW = 0.0,
             double outdoorRh = 90.0)
{
    const std::optional<AbsoluteTemperature> t = frostOnsetOutdoorTemperature(
        kind, air(tExtract, rhExtract), fraction(eps), fraction(epsW), percent(outdoorRh));
    EXPECT_TRUE(t.has_value());
    return t ? toCelsius(*t) : 0.0;
}

} // namespace

TEST(FrostOnset, CounterFlowCornerIsTheMeanOfColdInletAndWarmOutlet)
{
    // Our derivation (docs/frost.md): equal side coefficients, wall temperature =
    // mean of the two local air temperatures at the cold end.
    ColdCorner c;
    c.arrangement = FlowArrangement::CounterFlow;
    c.coldInlet = celsius(-10.0);
    c.warmInlet = celsius(20.0);
    c.warmOutlet = celsius(-4.0);
    c.ntu = fraction(4.0);
    c.capacityRatio = fraction(1.0);
    EXPECT_NEAR(toCelsius(coldCornerSurfaceTemperature(c)), -7.0, 1e-12);
    c.coldSideWeight = fraction(0.25);
    EXPECT_NEAR(toCelsius(coldCornerSurfaceTemperature(c)), 0.25 * -10.0 + 0.75 * -4.0, 1e-12);
}

TEST(FrostOnset, CrossFlowCornerMatchesGridMarch)
{
    // Independent check of the cross-flow corner: march the warm stream's first
    // row (the strip along the cold stream's entry edge) over a fine grid; at the
    // corner its temperature is what the corner formula uses.
    const double ntu = 1.7, cr = 0.8; // warm stream is Cmin
    const int n = 800;
    const double cellUa = ntu / (static_cast<double>(n) * n);
    const double cWarmRow = 1.0 / n, cColdCol = 1.0 / (cr * n);
    // Row 0: the cold stream enters every column at 0; march the warm row at 1.
    double tWarm = 1.0;
    for (int col = 0; col < n; ++col) {
        const double cmin = std::min(cWarmRow, cColdCol), cmax = std::max(cWarmRow, cColdCol);
        const double e = -std::expm1(-cellUa / cmin * (1.0 + cmin / cmax)) / (1.0 + cmin / cmax);
        tWarm -= e * cmin * (tWarm - 0.0) / cWarmRow;
    }
    ColdCorner c;
    c.arrangement = FlowArrangement::CrossFlowBothUnmixed;
    c.coldInlet = celsius(0.0);
    c.warmInlet = celsius(1.0);
    c.warmOutlet = celsius(0.5); // not used by the cross-flow corner
    c.ntu = fraction(ntu);
    c.capacityRatio = fraction(cr);
    c.warmStreamIsCmin = true;
    c.coldSideWeight = fraction(0.0); // wall weight 0: the corner air temperature itself
    EXPECT_NEAR(toCelsius(coldCornerSurfaceTemperature(c)), tWarm, 2e-3);
}

TEST(FrostOnset, PlateThresholdsInsideLiteratureRange)
{
    // Commonly quoted onset for sensible plate exchangers: about -1 C, roughly
    // -5 .. 0 C depending on extract humidity (Rafati Nasr et al., Renewable and
    // Sustainable Energy Reviews 30 (2014) 538-554; US EPA figure quoted in the
    // EnergyPlus input-output reference, as collected in our reference notes).
    struct Case {
        ExchangerKind kind;
        double eps;
    };
    // Effectiveness typical of current plates (common practice): counter-flow 0.8 ..
    // 0.9, cross-counter-flow 0.8, cross-flow 0.6.
    for (Case c : {Case{ExchangerKind::PlateCounterFlow, 0.8}, Case{ExchangerKind::PlateCounterFlow, 0.9},
                   Case{ExchangerKind::PlateCrossCounterFlow, 0.8}, Case{ExchangerKind::PlateCrossFlow, 0.6}})
        for (double rh : {20.0, 30.0, 40.0}) {
            const double t = onset(c.kind, 22.0, rh, c.eps);
            EXPECT_GE(t, -5.0) << toString(c.kind) << " eps " << c.eps << " RH " << rh;
            EXPECT_LE(t, 0.0) << toString(c.kind) << " eps " << c.eps << " RH " << rh;
        }
}

TEST(FrostOnset, DrierExtractFrostsColder)
{
    for (ExchangerKind kind : {ExchangerKind::PlateCounterFlow, ExchangerKind::PlateCrossFlow,
                               ExchangerKind::RotaryNonHygroscopic, ExchangerKind::RotaryHygroscopic,
                               ExchangerKind::RunAroundCoil}) {
        double last = -100.0;
        for (double rh : {10.0, 15.0, 20.0, 30.0, 40.0, 50.0}) {
            const double t = onset(kind, 22.0, rh, 0.7, 0.6);
            EXPECT_GE(t, last - 1e-6) << toString(kind) << " RH " << rh;
            last = t;
        }
        // Strictly colder once the extract dew point is below 0 C (plates, loops) or
        // on the mixing line (rotors).
        EXPECT_LT(onset(kind, 22.0, 10.0, 0.7, 0.6), onset(kind, 22.0, 20.0, 0.7, 0.6) - 0.5) << toString(kind);
    }
}

TEST(FrostOnset, HigherPlateEffectivenessFrostsWarmer)
{
    for (ExchangerKind kind : {ExchangerKind::PlateCounterFlow, ExchangerKind::PlateCrossCounterFlow,
                               ExchangerKind::PlateCrossFlow, ExchangerKind::RunAroundCoil}) {
        double last = -100.0;
        for (double eps : {0.45, 0.55, 0.65, 0.75, 0.85}) {
            if (kind == ExchangerKind::PlateCrossFlow && eps > 0.8)
                continue;
            const double t = onset(kind, 22.0, 30.0, eps);
            EXPECT_GT(t, last) << toString(kind) << " eps " << eps;
            last = t;
        }
    }
}

TEST(FrostOnset, RotorsFrostColderThanPlatesAndSorptionColdest)
{
    // Commonly quoted (reference notes, US EPA figures): sensible plate about -1 C,
    // sensible wheel about -12 C, enthalpy wheel about -23 C; Kanas, Jedlikowski,
    // Anisimov, SN Applied Sciences (2019), doi 10.1007/s42452-019-0540-2, find about
    // -10 C for a non-hygroscopic wheel.
    const double plate = onset(ExchangerKind::PlateCounterFlow, 22.0, 30.0, 0.8);
    const double sensibleWheel = onset(ExchangerKind::RotaryNonHygroscopic, 22.0, 30.0, 0.8);
    const double enthalpyWheel = onset(ExchangerKind::RotaryHygroscopic, 22.0, 30.0, 0.8, 0.7);
    const double sorptionWheel = onset(ExchangerKind::RotarySorption, 22.0, 30.0, 0.8, 0.85);
    EXPECT_LT(sensibleWheel, plate - 5.0);
    EXPECT_LT(enthalpyWheel, sensibleWheel - 5.0);
    EXPECT_LT(sorptionWheel, enthalpyWheel);
    // Near the quoted figures for a usual winter room state (22 C, 45 % RH; the
    // figures do not state theirs): sensible wheel within 3 K of -12 C (and of
    // Kanas et al.'s -10 C). Our hygroscopic adaptation lands colder than -23 C:
    // within 6 K and below -20 C (docs/frost.md discusses the difference).
    EXPECT_NEAR(onset(ExchangerKind::RotaryNonHygroscopic, 22.0, 45.0, 0.8), -12.0, 3.0);
    const double enthalpyAt45 = onset(ExchangerKind::RotaryHygroscopic, 22.0, 45.0, 0.8, 0.7);
    EXPECT_NEAR(enthalpyAt45, -23.0, 6.0);
    EXPECT_LT(enthalpyAt45, -20.0);
}

TEST(FrostOnset, RiskAgreesWithOnset)
{
    for (ExchangerKind kind : {ExchangerKind::PlateCrossFlow, ExchangerKind::PlateCounterFlow,
                               ExchangerKind::PlateCrossCounterFlow, ExchangerKind::RotaryNonHygroscopic,
                               ExchangerKind::RotaryHygroscopic, ExchangerKind::RunAroundCoil}) {
        const MoistAirState extract = air(21.0, 35.0);
        const double t = onset(kind, 21.0, 35.0, 0.65, 0.65);
        EXPECT_TRUE(frostRisk(kind, air(t - 0.2, 90.0), extract, fraction(0.65), fraction(0.65))) << toString(kind);
        EXPECT_FALSE(frostRisk(kind, air(t + 0.2, 90.0), extract, fraction(0.65), fraction(0.65))) << toString(kind);
    }
    // Above 0 C outdoors nothing frosts.
    EXPECT_FALSE(frostRisk(ExchangerKind::PlateCrossFlow, air(1.0, 95.0), air(22.0, 70.0), fraction(0.9), fraction(0.0)));
}

TEST(FrostOnset, MixingLineCriterion)
{
    // The classic criterion for rotors: frost when the line from the outdoor state
    // to the extract state crosses the saturation curve below 0 C.
    EXPECT_TRUE(mixingLineFrosts(air(-20.0, 90.0), air(22.0, 30.0), fraction(0.0)));
    EXPECT_FALSE(mixingLineFrosts(air(-5.0, 90.0), air(22.0, 30.0), fraction(0.0)));
    // Vapour taken up by a hygroscopic matrix moves the line below the curve.
    EXPECT_FALSE(mixingLineFrosts(air(-20.0, 90.0), air(22.0, 30.0), fraction(0.7)));
}

TEST(FrostOnset, MixingLineCriterionFindsAnInteriorTouch)
{
    // The line can touch the saturation curve first between its ends (here near
    // -14 C, from -20 C outdoor air to 22 C / 30 % extract air). Where it starts to
    // cross is found here by a plain scan of W_line(t) - Ws(t) every 1e-3 K below
    // 0 C (the model against the psychrometric functions, our check): the
    // criterion must agree on both sides of that outdoor humidity.
    const Pressure p = kP;
    const MoistAirState warm = air(22.0, 30.0);
    const double tCold = -20.0;
    auto scanMax = [&](double coldRh, double* where) {
        const MoistAirState cold = air(tCold, coldRh);
        const double wc = toKilogramsPerKilogram(cold.humidityRatio());
        const double slope = (toKilogramsPerKilogram(warm.humidityRatio()) - wc) / (22.0 - tCold);
        double best = -1.0;
        for (double t = tCold; t <= 0.0; t += 1e-3) {
            const double d = wc + slope * (t - tCold)
                             - toKilogramsPerKilogram(Psychro::saturationHumidityRatio(celsius(t), p));
            if (d > best) {
                best = d;
                *where = t;
            }
        }
        return best;
    };
    double lo = 1.0, hi = 99.0, where = 0.0;
    ASSERT_LT(scanMax(lo, &where), 0.0);
    ASSERT_GT(scanMax(hi, &where), 0.0);
    for (int i = 0; i < 40; ++i) {
        const double mid = 0.5 * (lo + hi);
        (scanMax(mid, &where) > 0.0 ? hi : lo) = mid;
    }
    scanMax(hi, &where);
    ASSERT_GT(where, tCold + 1.0) << "the touch is inside the line, not at its cold end";
    ASSERT_LT(where, -1.0);
    EXPECT_FALSE(mixingLineFrosts(air(tCold, lo - 0.05), warm, fraction(0.0))) << "touch at " << where << " C";
    EXPECT_TRUE(mixingLineFrosts(air(tCold, hi + 0.05), warm, fraction(0.0))) << "touch at " << where << " C";
}

TEST(FrostOnset, SurfaceCriterionNeedsBothFreezingAndDewPoint)
{
    const MoistAirState humid = air(22.0, 40.0); // dew point about 8 C
    EXPECT_TRUE(surfaceFrosts(celsius(-0.5), humid));
    EXPECT_FALSE(surfaceFrosts(celsius(0.5), humid)); // wet, not frozen
    const MoistAirState dry = air(22.0, 10.0); // frost point about -10 C
    EXPECT_FALSE(surfaceFrosts(celsius(-5.0), dry));
    EXPECT_TRUE(surfaceFrosts(celsius(-15.0), dry));
}

struct BadOnset {
    double eps, epsW, outdoorRh, tExtract;
};

class InvalidOnset : public ::testing::TestWithParam<BadOnset> {};

TEST_P(InvalidOnset, Throws)
{
    const BadOnset& b = GetParam();
    EXPECT_THROW(frostOnsetOutdoorTemperature(ExchangerKind::RotaryHygroscopic, air(b.tExtract, 40.0), fraction(b.eps),
                                              fraction(b.epsW), fraction(b.outdoorRh)),
                 InputError);
}

INSTANTIATE_TEST_SUITE_P(FrostOnset, InvalidOnset,
                         ::testing::Values(BadOnset{1.0, 0.5, 0.9, 22.0}, BadOnset{-0.1, 0.5, 0.9, 22.0},
                                           BadOnset{0.8, 1.5, 0.9, 22.0}, BadOnset{0.8, 0.5, 1.0, 22.0},
                                           BadOnset{0.8, 0.5, -0.1, 22.0}, BadOnset{0.8, 0.5, 0.9, -2.0}));

TEST(FrostOnset, NoFrostForBoneDryExtract)
{
    // An extract with almost no vapour never frosts down to -80 C.
    const MoistAirState dry = MoistAirState::fromDryBulbHumidityRatio(celsius(22.0), gramsPerKilogram(0.0), kP);
    EXPECT_FALSE(frostOnsetOutdoorTemperature(ExchangerKind::PlateCounterFlow, dry, fraction(0.8), fraction(0.0),
                                              fraction(0.9))
                     .has_value());
}
