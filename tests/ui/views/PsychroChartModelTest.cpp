#include "DemoProject.h"

#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/PsychroChartModel.h"

#include <gtest/gtest.h>

#include <cmath>

namespace Airwright::Ui {
namespace {

using Diagram = PsychroChartModel::Diagram;
using LineRole = PsychroChartModel::LineRole;
namespace Psy = Core::Psychro;

class PsychroChartModelTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        TestSupport::DemoProject::open(document);
        ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    }
    PsychroChartModel build(Diagram diagram)
    {
        PsychroChartModel model;
        model.rebuild(document.project(), document.result(), units, diagram);
        return model;
    }
    double pressure() const { return Core::toPascals(document.project().unit.site.pressure()); }

    ProjectDocument document;
    UnitSystem units;
};

const PsychroChartModel::Line* findLine(const PsychroChartModel& model, LineRole role, const QString& label)
{
    for (const auto& l : model.lines())
        if (l.role == role && l.label == label)
            return &l;
    return nullptr;
}

TEST_F(PsychroChartModelTest, UsesTheSitePressure)
{
    const auto model = build(Diagram::DryBulbHumidity);
    // The demo site is at 250 m: standard atmosphere, ASHRAE Fundamentals ch. 1 eq. 3.
    const double expected = 101325.0 * std::pow(1.0 - 2.25577e-5 * 250.0, 5.2559);
    EXPECT_NEAR(model.pressurePa(), expected, 0.5);
}

TEST_F(PsychroChartModelTest, ReferenceLinesLieOnTheirProperty)
{
    const auto model = build(Diagram::DryBulbHumidity);
    const auto p = Core::pascals(pressure());
    const auto* saturation = findLine(model, LineRole::Saturation, QStringLiteral("saturation"));
    ASSERT_NE(saturation, nullptr);
    ASSERT_GT(saturation->points.size(), 20);
    for (const QPointF& pt : saturation->points) // x: t °C, y: W g/kg
        EXPECT_NEAR(pt.y(), Core::toGramsPerKilogram(Psy::saturationHumidityRatio(Core::celsius(pt.x()), p)), 1e-3)
            << "at " << pt.x() << " C";

    const auto* rh50 = findLine(model, LineRole::RelativeHumidity, QStringLiteral("50 %"));
    ASSERT_NE(rh50, nullptr);
    for (const QPointF& pt : rh50->points)
        EXPECT_NEAR(Core::toPercent(Psy::relativeHumidityFromHumidityRatio(Core::celsius(pt.x()),
                                                                          Core::gramsPerKilogram(pt.y()), p)),
                    50.0, 0.05);

    const auto* h40 = findLine(model, LineRole::Enthalpy, QStringLiteral("40 kJ/kg"));
    ASSERT_NE(h40, nullptr);
    for (const QPointF& pt : h40->points)
        EXPECT_NEAR(Core::toKilojoulesPerKilogram(Psy::enthalpy(Core::celsius(pt.x()), Core::gramsPerKilogram(pt.y()))),
                    40.0, 1e-6);

    const auto* wb15 = findLine(model, LineRole::WetBulb, QStringLiteral("15 °C wb"));
    ASSERT_NE(wb15, nullptr);
    for (const QPointF& pt : wb15->points)
        EXPECT_NEAR(Core::toCelsius(Psy::wetBulbFromHumidityRatio(Core::celsius(pt.x()),
                                                                   Core::gramsPerKilogram(std::max(0.0, pt.y())), p)),
                    15.0, 1e-3);

    // Every line stays inside the frame.
    const auto& f = model.frame();
    for (const auto& line : model.lines())
        for (const QPointF& pt : line.points)
            EXPECT_TRUE(pt.x() >= f.xMin - 1e-9 && pt.x() <= f.xMax + 1e-9 && pt.y() >= f.yMin - 1e-9
                        && pt.y() <= f.yMax + 1e-9)
                << line.label.toStdString();
}

TEST_F(PsychroChartModelTest, MollierCoordinatesAreObliqueEnthalpy)
{
    const auto model = build(Diagram::Mollier);
    EXPECT_EQ(model.xLabel(), QStringLiteral("humidity ratio [g/kg dry air]"));
    EXPECT_EQ(model.yLabel(), QStringLiteral("dry bulb temperature [°C]"));
    // Dry air: the vertical coordinate is the dry bulb.
    EXPECT_NEAR(model.position(25.0, 0.0).y(), 25.0, 1e-12);
    EXPECT_NEAR(model.position(25.0, 0.0).x(), 0.0, 1e-12);
    // Along a line of constant enthalpy, cpa y + r0 x stays h (ASHRAE ch. 1 eq. 30:
    // h = 1.006 t + W (2501 + 1.86 t), so (h - 2501 W) / 1.006 = t (1 + 1.86 W / 1.006)).
    const auto* h50 = findLine(model, LineRole::Enthalpy, QStringLiteral("50 kJ/kg"));
    ASSERT_NE(h50, nullptr);
    for (const QPointF& pt : h50->points)
        EXPECT_NEAR(1.006 * pt.y() + 2.501 * pt.x(), 50.0, 1e-6);
    // Isotherms exist and rise gently: the 20 °C isotherm ends above 20.
    const auto* t20 = findLine(model, LineRole::Isotherm, QStringLiteral("20 °C"));
    ASSERT_NE(t20, nullptr);
    EXPECT_NEAR(t20->points.front().y(), 20.0, 1e-9);
    EXPECT_GT(t20->points.back().y(), 20.0);
    EXPECT_LT(t20->points.back().y(), 21.0);
}

TEST_F(PsychroChartModelTest, ProcessesFollowTheResult)
{
    const auto model = build(Diagram::DryBulbHumidity);
    const auto& result = *document.result();
    ASSERT_EQ(model.processes().size(), qsizetype(result.cases.size()));
    for (std::size_t i = 0; i < result.cases.size(); ++i) {
        const auto& c = result.cases[i];
        const auto& process = model.processes()[qsizetype(i)];
        EXPECT_EQ(process.caseName.toStdString(), c.caseName);
        ASSERT_EQ(process.supply.size(), qsizetype(c.supply.size() + 1));
        ASSERT_EQ(process.extract.size(), qsizetype(c.extract.size() + 1));
        EXPECT_TRUE(process.supply.front().atInlet);
        for (std::size_t k = 0; k < c.supply.size(); ++k) {
            const auto& point = process.supply[qsizetype(k + 1)];
            const auto& state = c.supply[k].outlet.state;
            EXPECT_EQ(point.sectionId.toStdString(), c.supply[k].id);
            EXPECT_NEAR(point.position.x(), Core::toCelsius(state.dryBulb()), 1e-9);
            EXPECT_NEAR(point.position.y(), Core::toGramsPerKilogram(state.humidityRatio()), 1e-9);
        }
    }
    // The first design case of the demo is winter, outdoor -12 °C (resources/demo).
    EXPECT_NEAR(model.processes().front().supply.front().temperatureC, -12.0, 1e-9);
}

TEST_F(PsychroChartModelTest, EditingASectionMovesThePoints)
{
    // Mid-season (outdoor 10 °C, room 22 °C, supply 19 °C in the demo): the
    // exchanger alone could overshoot the setpoint at 82 %, so its outlet sits at
    // the controlled value; at 55 % it falls short (10 + 0.55 x 12 = 16.6 °C).
    const auto& cases = document.result()->cases;
    int mid = -1;
    for (int i = 0; i < int(cases.size()); ++i)
        if (cases[std::size_t(i)].caseName == "mid-season")
            mid = i;
    ASSERT_GE(mid, 0);
    auto afterRecovery = [mid](const PsychroChartModel& m) {
        for (const auto& p : m.processes()[mid].supply)
            if (p.sectionId == QStringLiteral("hr") && !p.atInlet)
                return p;
        return PsychroChartModel::StatePoint{};
    };
    const auto before = afterRecovery(build(Diagram::DryBulbHumidity));
    ASSERT_EQ(before.sectionId, QStringLiteral("hr"));
    int notified = 0;
    QObject::connect(&document, &ProjectDocument::resultsChanged, [&notified] { ++notified; });
    TestSupport::DemoProject::editSupplySection(document, "hr", [](Core::Chain::Section& s) {
        std::get<Core::Recovery::HeatRecovery>(s.spec).ratedEfficiency = Core::percent(55.0);
    });
    EXPECT_EQ(notified, 1);
    ASSERT_TRUE(document.result().has_value());
    const auto after = afterRecovery(build(Diagram::DryBulbHumidity));
    EXPECT_LT(after.temperatureC, before.temperatureC - 1.0);
    EXPECT_LT(after.position.x(), before.position.x() - 1.0);
    // Sensible recovery: the humidity ratio stays.
    EXPECT_NEAR(after.position.y(), before.position.y(), 1e-9);
}

TEST_F(PsychroChartModelTest, IpShowsFahrenheitAndGrainsPerPound)
{
    units.setSystem(UnitSystem::System::IP);
    const auto model = build(Diagram::DryBulbHumidity);
    EXPECT_EQ(model.xLabel(), QStringLiteral("dry bulb temperature [°F]"));
    EXPECT_EQ(model.yLabel(), QStringLiteral("humidity ratio [gr/lb dry air]"));
    const auto& first = model.processes().front().supply.front();
    // NIST SP 811 B.9: -12 °C = 10.4 °F; 7000 gr per lb gives 7 gr/lb per g/kg.
    EXPECT_NEAR(first.position.x(), 10.4, 1e-9);
    EXPECT_NEAR(first.position.y(), 7.0 * first.humidityRatioGkg, 1e-9);
    // Enthalpy lines in Btu/lb referred to dry air at 0 °F.
    EXPECT_NE(findLine(model, LineRole::Enthalpy, QStringLiteral("20 Btu/lb")), nullptr);
}

TEST(PsychroChartModelEnthalpy, IpDatumShift)
{
    // Dry air at 0 °F has zero enthalpy on IP charts: 0 °F = -17.78 °C gives
    // 1.006 x (-17.78) kJ/kg on the SI datum (ASHRAE ch. 1 eq. 30).
    EXPECT_NEAR(PsychroChartModel::enthalpyToDisplay(1.006 * (-160.0 / 9.0), true), 0.0, 1e-12);
    // 1 Btu_IT/lb = 2.326 kJ/kg (NIST SP 811 B.8, exact): a difference keeps that ratio.
    EXPECT_NEAR(PsychroChartModel::enthalpyToDisplay(50.0, true) - PsychroChartModel::enthalpyToDisplay(26.74, true),
                (50.0 - 26.74) / 2.326, 1e-12);
    // 70 °F, W = 0.01: ASHRAE's IP form h = 0.240 t + W (1061 + 0.444 t) gives 27.72
    // Btu/lb (IP constants from memory); the shifted SI value agrees within 0.05.
    const double tC = (70.0 - 32.0) / 1.8;
    const double hSI = 1.006 * tC + 0.01 * (2501.0 + 1.86 * tC);
    EXPECT_NEAR(PsychroChartModel::enthalpyToDisplay(hSI, true), 0.240 * 70.0 + 0.01 * (1061.0 + 0.444 * 70.0), 0.05);
    EXPECT_NEAR(PsychroChartModel::enthalpyFromDisplay(PsychroChartModel::enthalpyToDisplay(hSI, true), true), hSI,
                1e-12);
    EXPECT_EQ(PsychroChartModel::enthalpyToDisplay(hSI, false), hSI);
}

TEST_F(PsychroChartModelTest, SegmentsOfASectionAndTooltip)
{
    const auto model = build(Diagram::DryBulbHumidity);
    const auto& result = *document.result();
    // The heating coil is on the supply path only: one segment per case.
    EXPECT_EQ(model.segmentsOf(QStringLiteral("heating-coil")).size(), qsizetype(result.cases.size()));
    // The exchanger is on both paths.
    EXPECT_EQ(model.segmentsOf(QStringLiteral("hr")).size(), qsizetype(2 * result.cases.size()));
    EXPECT_TRUE(model.segmentsOf(QString()).isEmpty());
    EXPECT_TRUE(model.segmentsOf(QStringLiteral("no-such-section")).isEmpty());

    const auto& process = model.processes().front();
    const QString tip = model.describe(process, process.supply[3], units);
    EXPECT_TRUE(tip.contains(process.caseName));
    EXPECT_TRUE(tip.contains(QStringLiteral("leaving ") + process.supply[3].sectionId));
    EXPECT_TRUE(tip.contains(QStringLiteral("°C")));
    EXPECT_TRUE(tip.contains(QStringLiteral("g/kg")));
    EXPECT_TRUE(tip.contains(QStringLiteral("kJ/kg")));
    EXPECT_TRUE(tip.contains(QStringLiteral("RH ")));
}

TEST(PsychroChartModelEmpty, NoResultKeepsTheChart)
{
    ProjectDocument document;
    UnitSystem units;
    PsychroChartModel model;
    model.rebuild(TestSupport::DemoProject::load(), std::nullopt, units, Diagram::DryBulbHumidity);
    EXPECT_TRUE(model.processes().isEmpty());
    EXPECT_FALSE(model.lines().isEmpty());
}

} // namespace
} // namespace Airwright::Ui
