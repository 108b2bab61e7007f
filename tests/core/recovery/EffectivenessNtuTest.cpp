#include "airwright/core/InputError.h"
#include "airwright/core/recovery/EffectivenessNtu.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <string>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Recovery;

namespace {

double eps(FlowArrangement a, double ntu, double cr) { return toFraction(effectiveness(a, fraction(ntu), fraction(cr))); }
double ntuOf(FlowArrangement a, double e, double cr)
{
    return toFraction(ntuFromEffectiveness(a, fraction(e), fraction(cr)));
}

constexpr FlowArrangement kAll[] = {FlowArrangement::CounterFlow,        FlowArrangement::CrossFlowBothUnmixed,
                                    FlowArrangement::CrossFlowCminMixed, FlowArrangement::CrossFlowCmaxMixed,
                                    FlowArrangement::ParallelFlow,       FlowArrangement::CrossCounterFlow};

// Independent check of unmixed cross-flow: march the two streams over an n x n
// grid of small cells (each cell a tiny parallel-flow element) and remove the
// O(1/n) discretisation error by Richardson extrapolation from n and 2n.
double crossFlowByGrid(double ntu, double cr, int n)
{
    // Stream A (capacity 1, Cmin) runs along x, stream B (capacity 1/cr) along y.
    // Inlets: A hot at 1, B cold at 0; eps = mean outlet drop of A.
    const double cellUa = ntu / (static_cast<double>(n) * n);
    const double cA = 1.0 / n, cB = 1.0 / (cr * n);
    std::vector<double> tB(static_cast<std::size_t>(n), 0.0); // B temperature entering each row of cells
    double sumOutA = 0.0;
    for (int row = 0; row < n; ++row) {
        double tA = 1.0;
        for (int col = 0; col < n; ++col) {
            double& b = tB[static_cast<std::size_t>(col)];
            const double cmin = std::min(cA, cB), cmax = std::max(cA, cB);
            const double e = -std::expm1(-cellUa / cmin * (1.0 + cmin / cmax)) / (1.0 + cmin / cmax);
            const double q = e * cmin * (tA - b);
            tA -= q / cA;
            b += q / cB;
        }
        sumOutA += tA;
    }
    return 1.0 - sumOutA / n;
}

} // namespace

TEST(EffectivenessNtu, CounterFlowBalancedIsNtuOverOnePlusNtu)
{
    // Incropera, Fundamentals of Heat and Mass Transfer, table 11.3, counter-flow Cr = 1: eps = NTU / (1 + NTU).
    EXPECT_NEAR(eps(FlowArrangement::CounterFlow, 1.0, 1.0), 0.5, 1e-14);
    EXPECT_NEAR(eps(FlowArrangement::CounterFlow, 4.0, 1.0), 0.8, 1e-14);
    // Just off Cr = 1 the general form must join the limit smoothly (no cancellation).
    EXPECT_NEAR(eps(FlowArrangement::CounterFlow, 4.0, 1.0 - 1e-9), 0.8, 1e-8);
}

TEST(EffectivenessNtu, TableRelationsAtGeneralCr)
{
    // Incropera table 11.3, written out naively here (tolerance 1e-12).
    const double n = 2.0, cr = 0.5;
    const double e = std::exp(-n * (1.0 - cr));
    EXPECT_NEAR(eps(FlowArrangement::CounterFlow, n, cr), (1.0 - e) / (1.0 - cr * e), 1e-12);
    EXPECT_NEAR(eps(FlowArrangement::ParallelFlow, n, cr), (1.0 - std::exp(-n * (1.0 + cr))) / (1.0 + cr), 1e-12);
    EXPECT_NEAR(eps(FlowArrangement::CrossFlowCmaxMixed, n, cr),
                (1.0 / cr) * (1.0 - std::exp(-cr * (1.0 - std::exp(-n)))), 1e-12);
    EXPECT_NEAR(eps(FlowArrangement::CrossFlowCminMixed, n, cr),
                1.0 - std::exp(-(1.0 / cr) * (1.0 - std::exp(-cr * n))), 1e-12);
}

TEST(EffectivenessNtu, AllArrangementsAgreeAtZeroCapacityRatio)
{
    // Incropera table 11.3, last row: for Cr = 0 every arrangement gives eps = 1 - exp(-NTU).
    for (FlowArrangement a : kAll)
        for (double n : {0.3, 1.0, 3.0})
            EXPECT_NEAR(eps(a, n, 0.0), 1.0 - std::exp(-n), 1e-12) << toString(a) << " NTU " << n;
}

TEST(EffectivenessNtu, CrossFlowUnmixedKnownValue)
{
    // Kays and London, Compact Heat Exchangers, cross-flow both fluids unmixed,
    // Cr = 1, NTU = 1: 0.476 (from memory; the same as read off Incropera fig. 11.18).
    EXPECT_NEAR(eps(FlowArrangement::CrossFlowBothUnmixed, 1.0, 1.0), 0.476, 0.001);
}

TEST(EffectivenessNtu, CrossFlowSeriesMatchesGridMarch)
{
    // Independent numerical solution of the unmixed cross-flow energy equations;
    // Richardson-extrapolated grid result within 2e-4 of the series.
    for (double cr : {0.25, 0.5, 1.0})
        for (double n : {0.5, 1.0, 2.0, 5.0}) {
            const double coarse = crossFlowByGrid(n, cr, 200), fine = crossFlowByGrid(n, cr, 400);
            const double extrapolated = 2.0 * fine - coarse;
            EXPECT_NEAR(eps(FlowArrangement::CrossFlowBothUnmixed, n, cr), extrapolated, 2e-4)
                << "Cr " << cr << " NTU " << n;
        }
}

TEST(EffectivenessNtu, CrossFlowApproximationWithinTwoPercentOfSeries)
{
    // Incropera table 11.3 approximation; its stated use range is moderate NTU.
    // Within 2 % relative of the exact series for 1 <= NTU <= 5 (our check).
    for (double cr : {0.25, 0.5, 0.75, 1.0})
        for (double n : {1.0, 2.0, 3.0, 4.0, 5.0}) {
            const double exact = eps(FlowArrangement::CrossFlowBothUnmixed, n, cr);
            const double approx = toFraction(crossFlowUnmixedApproximation(fraction(n), fraction(cr)));
            EXPECT_NEAR(approx / exact, 1.0, 0.02) << "Cr " << cr << " NTU " << n;
        }
}

TEST(EffectivenessNtu, MonotoneInNtuAndBelowLimits)
{
    for (FlowArrangement a : kAll)
        for (double cr : {0.0, 0.3, 0.7, 1.0}) {
            double last = 0.0;
            for (double n = 0.1; n <= 20.0; n *= 1.5) {
                const double e = eps(a, n, cr);
                EXPECT_GT(e, last) << toString(a);
                last = e;
            }
            // Parallel flow never exceeds 1 / (1 + Cr) (Incropera eq. 11.28a limit).
            if (a == FlowArrangement::ParallelFlow) {
                EXPECT_LT(last, 1.0 / (1.0 + cr) + 1e-12);
            }
        }
}

TEST(EffectivenessNtu, CrossCounterFlowLiesBetweenCrossAndCounterFlow)
{
    // Passes of cross-flow in overall counter-flow (Incropera eq. 11.31): better than
    // one cross-flow pass, never better than pure counter-flow.
    for (double cr : {0.5, 1.0})
        for (double n : {0.5, 2.0, 4.0, 8.0}) {
            const double cc = eps(FlowArrangement::CrossCounterFlow, n, cr);
            EXPECT_GT(cc, eps(FlowArrangement::CrossFlowBothUnmixed, n, cr));
            EXPECT_LT(cc, eps(FlowArrangement::CounterFlow, n, cr));
        }
    // Cr = 1, 4 passes at NTU 4: per pass eps1 = eps_cross(1, 1), total 4 eps1 / (1 + 3 eps1).
    const double e1 = eps(FlowArrangement::CrossFlowBothUnmixed, 1.0, 1.0);
    EXPECT_NEAR(eps(FlowArrangement::CrossCounterFlow, 4.0, 1.0), 4.0 * e1 / (1.0 + 3.0 * e1), 1e-12);
}

TEST(EffectivenessNtu, CrossCounterFlowMatchesTheMultiPassFormulaAtUnequalCapacities)
{
    // Incropera eq. 11.31b written out naively with std::pow: eps = (r - 1) / (r - Cr),
    // r = ((1 - eps1 Cr) / (1 - eps1))^n, eps1 the unmixed cross-flow pass at NTU / n
    // (tolerance 1e-12; Cr kept below 0.96, where the naive form loses no digits).
    const int passes = kCrossCounterFlowPasses;
    for (double cr : {0.0, 0.3, 0.7, 0.95})
        for (double n : {0.05, 1.0, 4.0, 12.0, 40.0}) {
            const double e1 = eps(FlowArrangement::CrossFlowBothUnmixed, n / passes, cr);
            const double r = std::pow((1.0 - e1 * cr) / (1.0 - e1), passes);
            EXPECT_NEAR(eps(FlowArrangement::CrossCounterFlow, n, cr), (r - 1.0) / (r - cr), 1e-12)
                << "Cr " << cr << " NTU " << n;
        }
}

TEST(EffectivenessNtu, InverseClosedFormsMatchTable114)
{
    // Incropera table 11.4, written out naively (tolerance 1e-10).
    const double e = 0.6, cr = 0.5;
    EXPECT_NEAR(ntuOf(FlowArrangement::CounterFlow, e, cr), std::log((e - 1.0) / (e * cr - 1.0)) / (cr - 1.0), 1e-10);
    EXPECT_NEAR(ntuOf(FlowArrangement::ParallelFlow, e, cr), -std::log(1.0 - e * (1.0 + cr)) / (1.0 + cr), 1e-10);
    EXPECT_NEAR(ntuOf(FlowArrangement::CrossFlowCmaxMixed, e, cr), -std::log(1.0 + std::log(1.0 - e * cr) / cr), 1e-10);
    EXPECT_NEAR(ntuOf(FlowArrangement::CrossFlowCminMixed, e, cr), -std::log(cr * std::log(1.0 - e) + 1.0) / cr, 1e-10);
    EXPECT_NEAR(ntuOf(FlowArrangement::CounterFlow, 0.8, 1.0), 4.0, 1e-12); // eps / (1 - eps)
}

struct InverseRow {
    FlowArrangement arrangement;
    double eps;
    double cr;
    bool valid;
};

class InverseRoundTrip : public ::testing::TestWithParam<InverseRow> {};

TEST_P(InverseRoundTrip, RecoversEffectivenessOrThrows)
{
    const InverseRow& r = GetParam();
    if (!r.valid) {
        EXPECT_THROW(ntuFromEffectiveness(r.arrangement, fraction(r.eps), fraction(r.cr)), InputError);
        return;
    }
    const double n = ntuOf(r.arrangement, r.eps, r.cr);
    EXPECT_GE(n, 0.0);
    EXPECT_NEAR(eps(r.arrangement, n, r.cr), r.eps, 1e-9);
}

INSTANTIATE_TEST_SUITE_P(
    EffectivenessNtu, InverseRoundTrip,
    ::testing::Values(InverseRow{FlowArrangement::CounterFlow, 0.85, 1.0, true},
                      InverseRow{FlowArrangement::CounterFlow, 0.95, 0.3, true},
                      InverseRow{FlowArrangement::CrossFlowBothUnmixed, 0.6, 1.0, true},
                      InverseRow{FlowArrangement::CrossFlowBothUnmixed, 0.9, 0.4, true},
                      InverseRow{FlowArrangement::CrossFlowBothUnmixed, 0.3, 0.0, true},
                      InverseRow{FlowArrangement::CrossFlowCminMixed, 0.7, 0.6, true},
                      InverseRow{FlowArrangement::CrossFlowCmaxMixed, 0.5, 0.8, true},
                      InverseRow{FlowArrangement::ParallelFlow, 0.45, 1.0, true},
                      InverseRow{FlowArrangement::CrossCounterFlow, 0.78, 1.0, true},
                      InverseRow{FlowArrangement::CrossCounterFlow, 0.0, 0.5, true},
                      // invalid rows
                      InverseRow{FlowArrangement::CounterFlow, 1.0, 1.0, false},      // eps >= 1
                      InverseRow{FlowArrangement::CounterFlow, 1.2, 0.5, false},
                      InverseRow{FlowArrangement::ParallelFlow, 0.55, 1.0, false},    // above 1 / (1 + Cr)
                      InverseRow{FlowArrangement::CrossFlowCmaxMixed, 0.7, 1.0, false}, // above 1 - exp(-1)
                      InverseRow{FlowArrangement::CrossFlowBothUnmixed, 0.96, 1.0, false}, // beyond NTU 100
                      InverseRow{FlowArrangement::CounterFlow, 0.5, 1.2, false},      // Cr > 1
                      InverseRow{FlowArrangement::CounterFlow, -0.1, 0.5, false}));

TEST(EffectivenessNtu, RejectsOutOfRangeInputs)
{
    EXPECT_THROW(effectiveness(FlowArrangement::CounterFlow, fraction(-1.0), fraction(0.5)), InputError);
    EXPECT_THROW(effectiveness(FlowArrangement::CounterFlow, fraction(1.0), fraction(1.5)), InputError);
    EXPECT_THROW(effectiveness(FlowArrangement::CounterFlow, fraction(kMaxNtu * 2.0), fraction(0.5)), InputError);
    EXPECT_THROW(effectiveness(FlowArrangement::CounterFlow, fraction(std::nan("")), fraction(0.5)), InputError);
    try {
        ntuFromEffectiveness(FlowArrangement::ParallelFlow, fraction(0.6), fraction(1.0));
        FAIL() << "no error";
    } catch (const InputError& e) {
        EXPECT_NE(std::string(e.what()).find("0.6"), std::string::npos) << e.what();
    }
}

TEST(EffectivenessNtu, RegeneratorCorrection)
{
    // Shah and Sekulic, Fundamentals of Heat Exchanger Design, eq. 5.62 (after Kays
    // and London): eps = eps_cf (1 - 1 / (9 Cr_r^1.93)).
    const double n = 5.0, cr = 1.0;
    for (double crr : {1.5, 2.0, 5.0}) {
        const double expected = (n / (1.0 + n)) * (1.0 - 1.0 / (9.0 * std::pow(crr, 1.93)));
        EXPECT_NEAR(toFraction(regeneratorEffectiveness(fraction(n), fraction(cr), fraction(crr))), expected, 1e-12);
    }
    // Fast rotor: approaches counter-flow (Shah and Sekulic, observation 2 after eq. 5.61).
    EXPECT_NEAR(toFraction(regeneratorEffectiveness(fraction(n), fraction(cr), fraction(100.0))), n / (1.0 + n), 1e-4);
    // Our continuation below Cr_r = 1 is continuous and keeps eps <= Cr_r (the matrix
    // cannot carry more than Cr_r Cmin dT).
    EXPECT_NEAR(toFraction(rotorCapacityFactor(fraction(1.0 - 1e-12))), 8.0 / 9.0, 1e-9);
    for (double crr : {0.05, 0.2, 0.5, 0.9})
        EXPECT_LE(toFraction(regeneratorEffectiveness(fraction(20.0), fraction(1.0), fraction(crr))), crr);
    EXPECT_EQ(toFraction(rotorCapacityFactor(fraction(0.0))), 0.0);
    EXPECT_THROW(rotorCapacityFactor(fraction(-0.1)), InputError);
}
