// Airwright's moist-air functions against PsychroLib 2.5.0 (npm psychrolib 1.1.1,
// MIT), an independent open implementation of ASHRAE Handbook - Fundamentals 2017,
// chapter 1, SI. The 990 rows of tests/data/psychro-reference-grid.csv (dry bulb
// -30 .. 50 C by 2.5 K, relative humidity 10 .. 100 % by 10 %, at 101325, 84000 and
// 70000 Pa) are written by tests/reference/generate-psychro-grid.js and kept
// current by tests/reference/check-reference.
//
// Each row runs the chain a user runs: W from (tdb, rh, p), then dew point, wet
// bulb, enthalpy and volume from Airwright's own W.

#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <charconv>
#include <cmath>
#include <fstream>
#include <functional>
#include <iterator>
#include <set>
#include <sstream>
#include <string>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Psychro;

namespace {

struct GridRow {
    int line;
    double pPa, tdbC, rhPct, w, tdpC, twbC, hJkg, vM3kg, pwsPa;
};

struct Grid {
    std::vector<std::string> comments;
    std::vector<GridRow> rows;
    std::string problem; // first problem found while reading; empty when the file is sound
};

const char* const kHeader = "p_Pa,tdb_C,rh_pct,w_kgkg,tdp_C,twb_C,h_Jkg,v_m3kg,pws_Pa";

bool parseRow(const std::string& text, GridRow& row)
{
    double* const fields[] = {&row.pPa,  &row.tdbC, &row.rhPct, &row.w,    &row.tdpC,
                              &row.twbC, &row.hJkg, &row.vM3kg, &row.pwsPa};
    const char* pos = text.data();
    const char* const end = text.data() + text.size();
    for (std::size_t i = 0; i < std::size(fields); ++i) {
        if (i > 0) {
            if (pos == end || *pos != ',')
                return false;
            ++pos;
        }
        const auto [next, ec] = std::from_chars(pos, end, *fields[i]);
        if (ec != std::errc() || !std::isfinite(*fields[i]))
            return false;
        pos = next;
    }
    return pos == end;
}

Grid loadGrid(const std::string& path)
{
    Grid grid;
    std::ifstream file(path);
    if (!file) {
        grid.problem = "cannot open " + path;
        return grid;
    }
    std::string text;
    bool headerSeen = false;
    for (int line = 1; std::getline(file, text); ++line) {
        if (!text.empty() && text.back() == '\r')
            text.pop_back();
        if (text.rfind('#', 0) == 0) {
            grid.comments.push_back(text);
            continue;
        }
        if (!headerSeen) {
            headerSeen = true;
            if (text != kHeader) {
                grid.problem = "line " + std::to_string(line) + ": unexpected header '" + text + "'";
                return grid;
            }
            continue;
        }
        GridRow row{};
        row.line = line;
        if (!parseRow(text, row)) {
            grid.problem = "line " + std::to_string(line) + ": malformed row '" + text + "'";
            return grid;
        }
        grid.rows.push_back(row);
    }
    return grid;
}

const Grid& grid()
{
    static const Grid g = loadGrid(AIRWRIGHT_TEST_DATA_DIR "/psychro-reference-grid.csv");
    return g;
}

std::string describe(const GridRow& row)
{
    std::ostringstream text;
    text << "grid line " << row.line << ": p " << row.pPa << " Pa, tdb " << row.tdbC << " C, rh " << row.rhPct << " %";
    return text.str();
}

// Runs check on every row; an exception fails the row. Stops after 10 failing rows
// so a broken function gives a readable report rather than a thousand lines.
void forEachRow(const std::function<void(const GridRow&)>& check)
{
    ASSERT_EQ(grid().problem, "");
    ASSERT_FALSE(grid().rows.empty());
    const testing::TestResult& result = *testing::UnitTest::GetInstance()->current_test_info()->result();
    int failingRows = 0;
    for (const GridRow& row : grid().rows) {
        SCOPED_TRACE(describe(row));
        const int before = result.total_part_count();
        try {
            check(row);
        } catch (const std::exception& e) {
            ADD_FAILURE() << "threw: " << e.what();
        }
        if (result.total_part_count() > before && ++failingRows == 10) {
            ADD_FAILURE() << "stopped after 10 failing rows";
            return;
        }
    }
}

AbsoluteTemperature dryBulb(const GridRow& row)
{
    return celsius(row.tdbC);
}
Pressure pressure(const GridRow& row)
{
    return pascals(row.pPa);
}
HumidityRatio humidityRatio(const GridRow& row)
{
    return humidityRatioFromRelativeHumidity(dryBulb(row), percent(row.rhPct), pressure(row));
}

// --- The wet-bulb band -------------------------------------------------------------
// ASHRAE ch. 1 eq. 33 (water on the wick) and eq. 35 (ice) give, at t* = 0 C,
// different humidity ratios: eq. 35 the higher one. W(t*) rises on each branch and
// drops at the switch, so for dry air a few kelvin above freezing both branches have
// a root, up to about 0.9 K apart. PsychroLib's bisection may return either root;
// Airwright takes eq. 33 whenever it has a root at or above the triple point
// (core/include/airwright/core/psychro/PsychroRaw.h, docs/psychrometrics.md). In
// that band the grid value is checked only to be a root of one branch, and
// Airwright's value to be the eq. 33 root.
constexpr double kTriplePointC = 0.01;

struct Branch {
    double a, alpha, beta; // W = ((a - alpha t*) Ws* - 1.006 (t - t*)) / (a + 1.86 t - beta t*)
};
constexpr Branch kEq33{2501.0, 2.326, 4.186}; // ASHRAE Fundamentals 2017 ch. 1 eq. 33
constexpr Branch kEq35{2830.0, 0.24, 2.1};    // ASHRAE Fundamentals 2017 ch. 1 eq. 35

// W that the branch's equation gives for wet bulb twbC, with Airwright's Ws (itself
// checked against the grid's pws in SaturationPressure below).
double branchHumidityRatio(const Branch& b, double tdbC, double twbC, double pPa)
{
    const double ws = toKilogramsPerKilogram(saturationHumidityRatio(celsius(twbC), pascals(pPa)));
    return ((b.a - b.alpha * twbC) * ws - 1.006 * (tdbC - twbC)) / (b.a + 1.86 * tdbC - b.beta * twbC);
}

// Root of the branch equation in [lo, hi] by bisection (W rises with t* on each branch).
double branchRoot(const Branch& b, double tdbC, double w, double pPa, double lo, double hi)
{
    for (int i = 0; i < 100; ++i) {
        const double mid = 0.5 * (lo + hi);
        (branchHumidityRatio(b, tdbC, mid, pPa) > w ? hi : lo) = mid;
    }
    return 0.5 * (lo + hi);
}

// Both branches have a root: eq. 33 at or above the triple point, eq. 35 below it.
bool inTwoRootBand(const GridRow& row, double w)
{
    if (row.tdbC <= kTriplePointC)
        return false;
    return branchHumidityRatio(kEq33, row.tdbC, kTriplePointC, row.pPa) <= w &&
           branchHumidityRatio(kEq35, row.tdbC, kTriplePointC, row.pPa) > w;
}

// Rows of the committed grid in the band (p Pa, tdb C, rh %): (84000, 5, 40), where
// PsychroLib returned the eq. 35 root, 0.32 K below Airwright's; (84000, 10, 10),
// (70000, 2.5, 70) and (70000, 7.5, 30), where it returned the eq. 33 root. A change
// means the grid or the branch rule changed: look at it, do not just update the number.
constexpr int kExpectedBandRows = 4;

} // namespace

TEST(ReferenceGrid, FileIsCompleteAndNamesItsSource)
{
    const Grid& g = grid();
    ASSERT_EQ(g.problem, "");
    ASSERT_FALSE(g.comments.empty());
    EXPECT_NE(g.comments.front().find("PsychroLib 2.5.0"), std::string::npos) << g.comments.front();
    EXPECT_EQ(g.rows.size(), 3u * 33u * 10u);
    std::set<double> pressures, dryBulbs, humidities;
    for (const GridRow& row : g.rows) {
        pressures.insert(row.pPa);
        dryBulbs.insert(row.tdbC);
        humidities.insert(row.rhPct);
    }
    EXPECT_EQ(pressures, (std::set<double>{70000.0, 84000.0, 101325.0}));
    EXPECT_EQ(dryBulbs.size(), 33u);
    EXPECT_EQ(*dryBulbs.begin(), -30.0);
    EXPECT_EQ(*dryBulbs.rbegin(), 50.0);
    EXPECT_EQ(humidities.size(), 10u);
    EXPECT_EQ(*humidities.begin(), 10.0);
    EXPECT_EQ(*humidities.rbegin(), 100.0);
}

TEST(ReferenceGrid, ReaderRejectsMalformedRows)
{
    // The reader must be able to fail, or a damaged file would pass as an empty grid.
    GridRow row{};
    EXPECT_TRUE(parseRow("101325,20,50,0.0072,9.27,13.78,38551.7,0.84,2338.8", row));
    EXPECT_FALSE(parseRow("101325,20,50,0.0072,9.27,13.78,38551.7,0.84", row));          // 8 fields
    EXPECT_FALSE(parseRow("101325,20,50,0.0072,9.27,13.78,38551.7,0.84,2338.8,1", row)); // 10 fields
    EXPECT_FALSE(parseRow("101325,20,50,0.0072,9.27,13.78,38551.7,0.84,nan", row));
    EXPECT_FALSE(parseRow("101325,20,50,0.0072,9.27,13.78,38551.7,0,84,2338.8x", row));
    EXPECT_FALSE(parseRow("", row));
    EXPECT_NE(loadGrid(AIRWRIGHT_TEST_DATA_DIR "/no-such-file.csv").problem, "");
}

TEST(ReferenceGrid, SaturationPressure)
{
    // PsychroLib 2.5.0 GetSatVapPres (ASHRAE ch. 1 eq. 5 / 6, ice at or below 0.01 C).
    // Same closed form: 1e-9 relative covers the file's 10 significant digits.
    forEachRow([](const GridRow& row) {
        EXPECT_NEAR(toPascals(saturationPressure(dryBulb(row))), row.pwsPa, 1e-9 * row.pwsPa);
    });
}

TEST(ReferenceGrid, HumidityRatioFromRelativeHumidity)
{
    // PsychroLib 2.5.0 GetHumRatioFromRelHum (ASHRAE ch. 1 eq. 20, pw = rh pws).
    forEachRow([](const GridRow& row) { EXPECT_NEAR(toKilogramsPerKilogram(humidityRatio(row)), row.w, 1e-7); });
}

TEST(ReferenceGrid, DewPoint)
{
    // PsychroLib 2.5.0 GetTDewPointFromHumRatio: Newton on eq. 5 / 6, stopped when a
    // step is below 1e-3 K (the error left is far smaller), so 1e-3 K.
    forEachRow([](const GridRow& row) {
        EXPECT_NEAR(toCelsius(dewPointFromHumidityRatio(humidityRatio(row), pressure(row))), row.tdpC, 1e-3);
    });
}

TEST(ReferenceGrid, Enthalpy)
{
    // PsychroLib 2.5.0 GetMoistAirEnthalpy (ASHRAE ch. 1 eq. 30), J/kg dry air.
    forEachRow([](const GridRow& row) {
        EXPECT_NEAR(toJoulesPerKilogram(enthalpy(dryBulb(row), humidityRatio(row))), row.hJkg, 5.0);
    });
}

TEST(ReferenceGrid, SpecificVolume)
{
    // PsychroLib 2.5.0 GetMoistAirVolume (ASHRAE ch. 1 eq. 26), m3/kg dry air. The
    // same closed form, fed with Airwright's W: dv/dW = 287.042 T 1.607858 / p is at
    // most 2.2 m3/kg on this grid (50 C, 70000 Pa), so the W tolerance of 1e-7 kg/kg
    // allows 2.2e-7 m3/kg; with the file's rounding (1e-9) 5e-7 m3/kg, still below a
    // millionth of v.
    forEachRow([](const GridRow& row) {
        EXPECT_NEAR(toCubicMetresPerKilogram(specificVolume(dryBulb(row), humidityRatio(row), pressure(row))),
                    row.vM3kg, 5e-7);
    });
}

TEST(ReferenceGrid, WetBulbOutsideTheTwoRootBand)
{
    // PsychroLib 2.5.0 GetTWetBulbFromHumRatio (ASHRAE ch. 1 eq. 33 / 35 solved for t*):
    // its bisection stops at a bracket of 1e-3 K, so 2e-3 K.
    forEachRow([](const GridRow& row) {
        const HumidityRatio w = humidityRatio(row);
        if (inTwoRootBand(row, toKilogramsPerKilogram(w)))
            return;
        EXPECT_NEAR(toCelsius(wetBulbFromHumidityRatio(dryBulb(row), w, pressure(row))), row.twbC, 2e-3);
    });
}

TEST(ReferenceGrid, WetBulbInTheTwoRootBand)
{
    // See "The wet-bulb band" above. Branch equations: ASHRAE ch. 1 eq. 33 and 35.
    int bandRows = 0;
    forEachRow([&](const GridRow& row) {
        const double w = toKilogramsPerKilogram(humidityRatio(row));
        if (!inTwoRootBand(row, w))
            return;
        ++bandRows;
        const double root33 = branchRoot(kEq33, row.tdbC, w, row.pPa, kTriplePointC, row.tdbC);
        const double root35 = branchRoot(kEq35, row.tdbC, w, row.pPa, row.tdpC - 1.0, kTriplePointC);
        ASSERT_GE(root33, kTriplePointC);
        ASSERT_LT(root35, kTriplePointC);
        // The two roots straddle 0 C and lie within 0.9 K of each other.
        EXPECT_LT(root33 - root35, 0.9);

        // PsychroLib returned one of them (2e-3 K as for the other rows).
        const double toGrid = std::min(std::abs(row.twbC - root33), std::abs(row.twbC - root35));
        EXPECT_LT(toGrid, 2e-3) << "grid twb " << row.twbC << " C, eq. 33 root " << root33 << " C, eq. 35 root "
                                << root35 << " C";

        // Airwright: on the eq. 33 side of the triple point, the eq. 33 root, and so
        // within the root spacing of the grid value.
        const double twb = toCelsius(wetBulbFromHumidityRatio(dryBulb(row), humidityRatio(row), pressure(row)));
        EXPECT_GE(twb, kTriplePointC);
        EXPECT_NEAR(twb, root33, 2e-3);
        EXPECT_NEAR(twb, row.twbC, 0.9);
    });
    EXPECT_EQ(bandRows, kExpectedBandRows);
}

TEST(ReferenceGrid, BandIsWhereTheBranchesDisagree)
{
    // The band test must be able to fail: 7.5 C, 14 % RH (0.00089 kg/kg), 101325 Pa
    // lies in it (worked out from eq. 33 and 35 at t* = 0 C with Ws = 0.00377 kg/kg:
    // eq. 35 gives 0.00110 kg/kg, eq. 33 0.00075 kg/kg); 20 C at 50 % and -10 C at
    // 80 % do not.
    GridRow row{};
    row.pPa = 101325.0;
    row.tdbC = 7.5;
    row.rhPct = 14.0;
    EXPECT_TRUE(inTwoRootBand(row, toKilogramsPerKilogram(humidityRatio(row))));
    row.tdbC = 20.0;
    row.rhPct = 50.0;
    EXPECT_FALSE(inTwoRootBand(row, toKilogramsPerKilogram(humidityRatio(row))));
    row.tdbC = -10.0;
    row.rhPct = 80.0;
    EXPECT_FALSE(inTwoRootBand(row, toKilogramsPerKilogram(humidityRatio(row))));
}
