#include "airwright/core/checks/MeasurementPoints.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include "../chain/ExampleUnits.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <filesystem>
#include <limits>
#include <optional>
#include <ostream>
#include <string>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Checks;

namespace {

Project::Project demoProject()
{
    Project::LoadReport report;
    return Project::ProjectFile::load(
        std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj", report);
}

const MeasurementPoint* findPoint(const std::vector<MeasurementPoint>& points, const std::string& tag)
{
    const auto it = std::find_if(points.begin(), points.end(), [&](const MeasurementPoint& p) { return p.tag == tag; });
    return it == points.end() ? nullptr : &*it;
}

const PointSetpoint* findSetpoint(const MeasurementPoint& p, const std::string& key)
{
    const auto it =
        std::find_if(p.setpoints.begin(), p.setpoints.end(), [&](const PointSetpoint& s) { return s.key == key; });
    return it == p.setpoints.end() ? nullptr : &*it;
}

class DemoPoints : public ::testing::Test {
protected:
    static void SetUpTestSuite()
    {
        project = demoProject();
        result = Chain::ChainSolver::solve(project.unit);
        points = measurementPoints(project.unit, result);
    }
    static Project::Project project;
    static Chain::UnitResult result;
    static std::vector<MeasurementPoint> points;
};

Project::Project DemoPoints::project;
Chain::UnitResult DemoPoints::result;
std::vector<MeasurementPoint> DemoPoints::points;

} // namespace

TEST_F(DemoPoints, ListsEveryPointTheDesignImplies)
{
    // The demo has three filters, a plate exchanger, a water heating coil, two fans
    // (the supply fan with a k-factor) and neither humidifier nor humidity limits.
    for (const char* tag : {"T-ODA", "T-SUP", "T-ETA", "DP-oda-filter", "DP-supply-filter", "DP-eta-filter", "DP-hr",
                            "Q-supply-fan", "Q-extract-fan", "TF-heating-coil"})
        EXPECT_NE(findPoint(points, tag), nullptr) << tag;
    EXPECT_EQ(points.size(), 10u);
    for (const auto& p : points) {
        EXPECT_TRUE(p.purpose != PointPurpose::SupplyHumidity && p.purpose != PointPurpose::ExtractHumidity
                    && p.purpose != PointPurpose::HumidifierHighLimit)
            << p.tag;
        EXPECT_TRUE(std::isfinite(toPointUnit(p.expectedLow)) && std::isfinite(toPointUnit(p.expectedHigh))) << p.tag;
        EXPECT_LE(toPointUnit(p.expectedLow), toPointUnit(p.expectedHigh)) << p.tag;
    }
    // Tags are unique: they name the points on the controls drawing.
    for (std::size_t i = 0; i < points.size(); ++i)
        for (std::size_t j = i + 1; j < points.size(); ++j)
            EXPECT_NE(points[i].tag, points[j].tag);
}

TEST_F(DemoPoints, TemperaturesSpanTheDesignCases)
{
    const auto* oda = findPoint(points, "T-ODA");
    ASSERT_NE(oda, nullptr);
    EXPECT_EQ(oda->quantity, PointQuantity::Temperature);
    EXPECT_EQ(pointPosition(*oda), "supply path, inlet, before 'oda-damper'");
    // The demo's cases: outdoor -12, 30 and 10 C (resources/demo/demo-library.awproj).
    EXPECT_NEAR(toPointUnit(oda->expectedLow), -12.0, 1e-9);
    EXPECT_NEAR(toPointUnit(oda->expectedHigh), 30.0, 1e-9);

    const auto* sup = findPoint(points, "T-SUP");
    ASSERT_NE(sup, nullptr);
    EXPECT_EQ(pointPosition(*sup), "supply path, outlet, after 'silencer'");
    // One setpoint per distinct case setpoint: 20, 18 and 19 C in the demo file.
    ASSERT_EQ(sup->setpoints.size(), 3u);
    std::vector<double> setpoints;
    for (const auto& s : sup->setpoints)
        setpoints.push_back(toPointUnit(s.value));
    std::sort(setpoints.begin(), setpoints.end());
    EXPECT_NEAR(setpoints[0], 18.0, 1e-9);
    EXPECT_NEAR(setpoints[1], 19.0, 1e-9);
    EXPECT_NEAR(setpoints[2], 20.0, 1e-9);

    const auto* eta = findPoint(points, "T-ETA");
    ASSERT_NE(eta, nullptr);
    EXPECT_EQ(eta->path, Chain::PathKind::Extract);
    // Extract air is the room air of the cases: 21, 25 and 22 C.
    EXPECT_NEAR(toPointUnit(eta->expectedLow), 21.0, 1e-9);
    EXPECT_NEAR(toPointUnit(eta->expectedHigh), 25.0, 1e-9);
    // Transmitter span: -50 .. 50 C holds all three (our standard series, common practice).
    ASSERT_TRUE(eta->transmitter.has_value());
    EXPECT_NEAR(toPointUnit(eta->transmitter->low), -50.0, 1e-12);
    EXPECT_NEAR(toPointUnit(eta->transmitter->high), 50.0, 1e-12);
}

TEST_F(DemoPoints, FilterSetpointsAreCleanAndFinalAtDesignFlow)
{
    // oda-filter: ISO ePM10, initial 70 Pa, no final given (the group's default),
    // no nominal flow (rated at the path's design flow), so the factor is 1.
    const auto* f = findPoint(points, "DP-oda-filter");
    ASSERT_NE(f, nullptr);
    EXPECT_EQ(f->placement, PointPlacement::Across);
    EXPECT_EQ(pointPosition(*f), "supply path, across 'oda-filter'");
    const auto* clean = findSetpoint(*f, "clean");
    const auto* alarm = findSetpoint(*f, "alarm");
    ASSERT_NE(clean, nullptr);
    ASSERT_NE(alarm, nullptr);
    EXPECT_NEAR(toPointUnit(clean->value), 70.0, 1e-9);
    EXPECT_NEAR(toPointUnit(alarm->value),
                toPascals(Sections::Filter::defaultFinalPressureDrop(Sections::FilterGroup::IsoEpm10)), 1e-9);

    // supply-filter: final 250 Pa given in the file.
    const auto* s = findPoint(points, "DP-supply-filter");
    ASSERT_NE(s, nullptr);
    EXPECT_NEAR(toPointUnit(findSetpoint(*s, "clean")->value), 90.0, 1e-9);
    EXPECT_NEAR(toPointUnit(findSetpoint(*s, "alarm")->value), 250.0, 1e-9);

    // The range runs from the cleanest to the most loaded drop the cases compute.
    double lowest = std::numeric_limits<double>::max();
    double highest = 0.0;
    for (const auto& c : result.cases) {
        const auto* r = c.find(Chain::PathKind::Supply, "supply-filter");
        ASSERT_NE(r, nullptr);
        const auto& d = std::get<Sections::Filter::Detail>(r->detail);
        lowest = std::min(lowest, toPascals(d.initialDrop));
        highest = std::max(highest, toPascals(d.finalDrop));
    }
    EXPECT_NEAR(toPointUnit(s->expectedLow), lowest, 1e-9);
    EXPECT_NEAR(toPointUnit(s->expectedHigh), highest, 1e-9);
    // The transmitter must show the alarm and the highest drop with headroom.
    ASSERT_TRUE(s->transmitter.has_value());
    EXPECT_GT(toPointUnit(s->transmitter->high), std::max(highest, 250.0));
}

TEST_F(DemoPoints, FanInletRingFollowsTheKFactor)
{
    const auto* q = findPoint(points, "Q-supply-fan");
    ASSERT_NE(q, nullptr);
    EXPECT_EQ(q->quantity, PointQuantity::DifferentialPressure);
    ASSERT_TRUE(q->kFactor.has_value());
    EXPECT_NEAR(*q->kFactor, 400.0, 1e-12);
    // q = k sqrt(dp) (inlet ring relation, common practice): 9000 m3/h with
    // k = 400 gives dp = (9000 / 400)^2 = 506.25 Pa.
    const auto* design = findSetpoint(*q, "design_flow");
    ASSERT_NE(design, nullptr);
    EXPECT_NEAR(toPointUnit(design->value), 506.25, 1e-9);
    // Next standard span above 506 Pa (and the cases' values): 0 .. 1000 Pa.
    ASSERT_TRUE(q->transmitter.has_value());
    EXPECT_NEAR(toPointUnit(q->transmitter->high), 1000.0, 1e-12);

    // The extract fan has no k-factor: the point shows the airflow and no transmitter.
    const auto* e = findPoint(points, "Q-extract-fan");
    ASSERT_NE(e, nullptr);
    EXPECT_EQ(e->quantity, PointQuantity::AirVolumeFlow);
    EXPECT_FALSE(e->kFactor.has_value());
    EXPECT_FALSE(e->transmitter.has_value());
    EXPECT_NEAR(toPointUnit(findSetpoint(*e, "design_flow")->value), 9000.0, 1e-9);
}

TEST_F(DemoPoints, ExchangerFrostAlarmSitsAboveTheCleanDrop)
{
    const auto* hr = findPoint(points, "DP-hr");
    ASSERT_NE(hr, nullptr);
    EXPECT_EQ(hr->path, Chain::PathKind::Extract);
    EXPECT_EQ(hr->purpose, PointPurpose::RecoveryPressureDrop);
    const auto* clean = findSetpoint(*hr, "clean");
    const auto* frost = findSetpoint(*hr, "frost");
    ASSERT_NE(clean, nullptr);
    ASSERT_NE(frost, nullptr);
    // Taken from the coldest case, where ice forms.
    EXPECT_NE(clean->label.find("winter design"), std::string::npos);
    const double rise = toPointUnit(frost->value) - toPointUnit(clean->value);
    // A rise of 5 to 10 Pa marks frost (common practice).
    EXPECT_GE(rise, 5.0 - 1e-9);
    EXPECT_LE(rise, 10.0 + 1e-9);
    EXPECT_NEAR(rise, Recovery::HeatRecoveryEvaluator::kFrostAlarmRisePa, 1e-9);
}

TEST_F(DemoPoints, FrostThermostatFollowsTheHeatingCoil)
{
    const auto* t = findPoint(points, "TF-heating-coil");
    ASSERT_NE(t, nullptr);
    EXPECT_EQ(pointPosition(*t), "supply path, between 'heating-coil' and 'cooling-coil'");
    ASSERT_EQ(t->setpoints.size(), 1u);
    // About +5 C (common practice; ASHRAE Guideline 36-2021 stages freeze protection).
    EXPECT_NEAR(toPointUnit(t->setpoints.front().value), 5.0, 1e-12);
}

namespace {

Chain::AirHandlingUnit humidifiedUnit()
{
    auto unit = Chain::Testing::exampleUnit();
    Sections::Humidifier steam;
    steam.kind = Sections::HumidifierKind::Steam;
    // After the fan, before the final filter.
    unit.supply.insert(unit.supply.begin() + 6, Chain::Section{"HU", steam});
    for (auto& c : unit.cases) {
        c.minimumSupplyHumidity = percent(40.0);
        c.maximumSupplyHumidity = percent(60.0);
    }
    return unit;
}

} // namespace

TEST(MeasurementPoints, HumidityPointsWhereTheControlNeedsThem)
{
    const auto unit = humidifiedUnit();
    const auto result = Chain::ChainSolver::solve(unit);
    const auto points = measurementPoints(unit, result);

    const auto* supply = findPoint(points, "RH-SUP");
    ASSERT_NE(supply, nullptr);
    EXPECT_EQ(supply->quantity, PointQuantity::RelativeHumidity);
    // Both cases ask for the same band, so one minimum and one maximum setpoint.
    ASSERT_NE(findSetpoint(*supply, "minimum"), nullptr);
    ASSERT_NE(findSetpoint(*supply, "maximum"), nullptr);
    EXPECT_NEAR(toPointUnit(findSetpoint(*supply, "minimum")->value), 40.0, 1e-9);
    EXPECT_NEAR(toPointUnit(findSetpoint(*supply, "maximum")->value), 60.0, 1e-9);
    ASSERT_TRUE(supply->transmitter.has_value());
    EXPECT_NEAR(toPointUnit(supply->transmitter->high), 100.0, 1e-12);

    const auto* limit = findPoint(points, "RH-HL-HU");
    ASSERT_NE(limit, nullptr);
    EXPECT_EQ(pointPosition(*limit), "supply path, between 'HU' and 'F2'");
    // High-limit humidistat after a humidifier, about 90 % (common practice).
    EXPECT_NEAR(toPointUnit(findSetpoint(*limit, "high_limit")->value), 90.0, 1e-9);

    const auto* extract = findPoint(points, "RH-ETA");
    ASSERT_NE(extract, nullptr);
    // The extract air carries the room humidity of the cases: 35 % and 50 %
    // (tests/core/chain/ExampleUnits.h).
    EXPECT_NEAR(toPointUnit(extract->expectedLow), 35.0, 1e-6);
    EXPECT_NEAR(toPointUnit(extract->expectedHigh), 50.0, 1e-6);
}

TEST(MeasurementPoints, RejectsResultsThatDoNotFit)
{
    const auto unit = Chain::Testing::exampleUnit();
    Chain::UnitResult empty;
    EXPECT_THROW(measurementPoints(unit, empty), InputError);

    // A result of another unit: a section of this one has no result.
    auto other = unit;
    other.supply.erase(other.supply.begin() + 1); // drop F1
    const auto otherResult = Chain::ChainSolver::solve(other);
    EXPECT_THROW(measurementPoints(unit, otherResult), InputError);
}

// Standard transmitter spans (our series, common practice): the smallest span
// whose full scale is above the highest value. Invalid rows must throw.
struct SpanRow {
    PointQuantity quantity;
    PointValue low;
    PointValue high;
    bool throws;
    std::optional<double> expectedLow; // in the point unit; empty: no span fits
    std::optional<double> expectedHigh;
};

std::ostream& operator<<(std::ostream& os, const SpanRow& row)
{
    return os << pointQuantityKey(row.quantity) << " " << toPointUnit(row.low) << " .. " << toPointUnit(row.high);
}

class TransmitterSpanTable : public ::testing::TestWithParam<SpanRow> {};

TEST_P(TransmitterSpanTable, PicksTheNextSpanAbove)
{
    const SpanRow& row = GetParam();
    if (row.throws) {
        EXPECT_THROW(suggestTransmitterRange(row.quantity, row.low, row.high), InputError);
        return;
    }
    const auto span = suggestTransmitterRange(row.quantity, row.low, row.high);
    ASSERT_EQ(span.has_value(), row.expectedHigh.has_value());
    if (span) {
        EXPECT_NEAR(toPointUnit(span->low), *row.expectedLow, 1e-9);
        EXPECT_NEAR(toPointUnit(span->high), *row.expectedHigh, 1e-9);
    }
}

INSTANTIATE_TEST_SUITE_P(
    Spans, TransmitterSpanTable,
    ::testing::Values(
        SpanRow{PointQuantity::DifferentialPressure, pascals(10.0), pascals(99.0), false, 0.0, 100.0},
        SpanRow{PointQuantity::DifferentialPressure, pascals(10.0), pascals(100.0), false, 0.0, 250.0}, // on full scale: next
        SpanRow{PointQuantity::DifferentialPressure, pascals(0.0), pascals(506.25), false, 0.0, 1000.0},
        SpanRow{PointQuantity::DifferentialPressure, pascals(0.0), pascals(2400.0), false, 0.0, 2500.0},
        SpanRow{PointQuantity::DifferentialPressure, pascals(0.0), pascals(3000.0), false, std::nullopt, std::nullopt},
        SpanRow{PointQuantity::DifferentialPressure, pascals(-5.0), pascals(50.0), false, std::nullopt, std::nullopt},
        SpanRow{PointQuantity::Temperature, celsius(-12.0), celsius(30.0), false, -50.0, 50.0},
        SpanRow{PointQuantity::Temperature, celsius(10.0), celsius(70.0), false, 0.0, 100.0},
        SpanRow{PointQuantity::Temperature, celsius(-20.0), celsius(70.0), false, -50.0, 150.0},
        SpanRow{PointQuantity::RelativeHumidity, percent(20.0), percent(100.0), false, 0.0, 100.0},
        // Invalid: value of another quantity, low above high, not finite.
        SpanRow{PointQuantity::Temperature, pascals(10.0), pascals(20.0), true, std::nullopt, std::nullopt},
        SpanRow{PointQuantity::DifferentialPressure, pascals(200.0), pascals(100.0), true, std::nullopt, std::nullopt},
        SpanRow{PointQuantity::DifferentialPressure, pascals(0.0),
                pascals(std::numeric_limits<double>::quiet_NaN()), true, std::nullopt, std::nullopt},
        SpanRow{PointQuantity::AirVolumeFlow, cubicMetresPerHour(100.0), cubicMetresPerHour(200.0), false,
                std::nullopt, std::nullopt}));
