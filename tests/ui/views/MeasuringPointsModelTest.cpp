#include "DemoProject.h"

#include "airwright/core/checks/MeasurementPoints.h"
#include "airwright/core/sections/Filter.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MeasuringPointsModel.h"
#include "airwright/ui/views/MeasuringPointsView.h"

#include <QLabel>
#include <QSortFilterProxyModel>

#include <gtest/gtest.h>

#include <cstring>
#include <variant>

namespace Airwright::Ui {
namespace {

using Model = MeasuringPointsModel;

class MeasuringPointsModelTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        TestSupport::DemoProject::open(document);
        ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    }
    const Model& model() const { return *view.model(); }
    int rowOf(const QString& tag) const
    {
        for (int r = 0; r < model().rowCount(); ++r)
            if (model().data(model().index(r, Model::TagColumn), Model::TagRole).toString() == tag)
                return r;
        return -1;
    }
    QString cell(int row, int column) const { return model().data(model().index(row, column)).toString(); }
    const Core::Checks::PointSetpoint* setpoint(int row, const char* key) const
    {
        for (const auto& s : model().point(row).setpoints)
            if (s.key == key)
                return &s;
        return nullptr;
    }

    ProjectDocument document;
    UnitSystem units;
    MeasuringPointsView view{&document, &units};
};

TEST_F(MeasuringPointsModelTest, ARowPerPointWithCoreTags)
{
    const auto points = Core::Checks::measurementPoints(document.project().unit, *document.result());
    ASSERT_FALSE(points.empty());
    ASSERT_EQ(model().rowCount(), int(points.size()));
    EXPECT_EQ(model().columnCount(), Model::ColumnCount);
    for (std::size_t i = 0; i < points.size(); ++i) {
        EXPECT_EQ(cell(int(i), Model::TagColumn), QString::fromStdString(points[i].tag));
        EXPECT_EQ(cell(int(i), Model::PurposeColumn).left(int(std::strlen(Core::Checks::pointPurposeLabel(points[i].purpose)))),
                  QString::fromUtf8(Core::Checks::pointPurposeLabel(points[i].purpose)));
        EXPECT_EQ(cell(int(i), Model::PositionColumn), QString::fromStdString(Core::Checks::pointPosition(points[i])));
    }
    EXPECT_TRUE(model().message().isEmpty());
    EXPECT_TRUE(view.status()->text().contains(QString::number(points.size()))) << view.status()->text().toStdString();

    // The filter point reads as an engineer would write it, in SI.
    const int filter = rowOf(QStringLiteral("DP-oda-filter"));
    ASSERT_GE(filter, 0);
    EXPECT_EQ(cell(filter, Model::QuantityColumn), QStringLiteral("differential pressure [Pa]"));
    EXPECT_TRUE(cell(filter, Model::ExpectedColumn).endsWith(QStringLiteral(" Pa")));
    EXPECT_TRUE(cell(filter, Model::SetpointsColumn).contains(QStringLiteral("(final pressure drop at the design flow")))
        << cell(filter, Model::SetpointsColumn).toStdString();
    EXPECT_TRUE(cell(filter, Model::TransmitterColumn).startsWith(QStringLiteral("0 .. ")))
        << cell(filter, Model::TransmitterColumn).toStdString();
}

TEST_F(MeasuringPointsModelTest, FinalPressureDropMovesTheAlarmLive)
{
    const QString tag = QStringLiteral("DP-supply-filter");
    int row = rowOf(tag);
    ASSERT_GE(row, 0);
    const auto* before = setpoint(row, "alarm");
    ASSERT_NE(before, nullptr);
    const double alarmBefore = Core::toPascals(std::get<Core::Pressure>(before->value));
    const QString shownBefore = cell(row, Model::SetpointsColumn);
    ASSERT_TRUE(shownBefore.contains(units.format(UnitSystem::Kind::Pressure, alarmBefore)));

    // The demo's supply filter has a final drop of 250 Pa; raise it to 400 Pa.
    TestSupport::DemoProject::editSupplySection(document, "supply-filter", [](Core::Chain::Section& s) {
        std::get<Core::Sections::Filter>(s.spec).finalPressureDrop = Core::pascals(400.0);
    });
    ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    row = rowOf(tag);
    ASSERT_GE(row, 0);
    const auto* after = setpoint(row, "alarm");
    ASSERT_NE(after, nullptr);
    const double alarmAfter = Core::toPascals(std::get<Core::Pressure>(after->value));
    // Both alarms are the final drop scaled by the same (design / nominal flow)^n,
    // so they stand as 400 : 250 (MeasurementPoints.h: alarm at the final drop).
    EXPECT_NEAR(alarmAfter / alarmBefore, 400.0 / 250.0, 1e-9); // rounding only
    const QString shownAfter = cell(row, Model::SetpointsColumn);
    EXPECT_NE(shownAfter, shownBefore);
    EXPECT_TRUE(shownAfter.contains(QStringLiteral("change alarm at design flow: ")
                                    + units.format(UnitSystem::Kind::Pressure, alarmAfter)))
        << shownAfter.toStdString();
}

TEST_F(MeasuringPointsModelTest, IpShowsInchesOfWaterAndFahrenheit)
{
    const int filter = rowOf(QStringLiteral("DP-supply-filter"));
    ASSERT_GE(filter, 0);
    units.setSystem(UnitSystem::System::IP);
    EXPECT_EQ(cell(filter, Model::QuantityColumn), QStringLiteral("differential pressure [in. w.g.]"));
    const QString expected = cell(filter, Model::ExpectedColumn);
    ASSERT_TRUE(expected.endsWith(QStringLiteral(" in. w.g."))) << expected.toStdString();
    // The high end read back to Pa agrees with core within half the last IP digit.
    const double shownHigh = expected.section(QStringLiteral(" .. "), 1).section(QLatin1Char(' '), 0, 0).toDouble();
    const auto& point = model().point(filter);
    EXPECT_NEAR(units.fromDisplay(UnitSystem::Kind::Pressure, shownHigh), Core::Checks::toPointUnit(point.expectedHigh),
                units.fromDisplay(UnitSystem::Kind::Pressure, 0.005) + 1e-9); // half of 0.01 in. w.g.
    EXPECT_TRUE(cell(filter, Model::SetpointsColumn).contains(QStringLiteral(" in. w.g.")));
    EXPECT_FALSE(cell(filter, Model::SetpointsColumn).contains(QStringLiteral(" Pa ")));
    // The span ordered is metric: it stays beside the IP figures.
    ASSERT_TRUE(point.transmitter.has_value());
    EXPECT_TRUE(cell(filter, Model::TransmitterColumn)
                    .endsWith(QStringLiteral("(0 .. %1 Pa)").arg(Core::Checks::toPointUnit(point.transmitter->high), 0, 'f', 0)))
        << cell(filter, Model::TransmitterColumn).toStdString();

    const int outdoor = rowOf(QStringLiteral("T-ODA"));
    ASSERT_GE(outdoor, 0);
    EXPECT_EQ(cell(outdoor, Model::QuantityColumn), QStringLiteral("temperature [°F]"));
    EXPECT_TRUE(cell(outdoor, Model::ExpectedColumn).endsWith(QStringLiteral(" °F")));

    units.setSystem(UnitSystem::System::SI);
    EXPECT_EQ(cell(filter, Model::QuantityColumn), QStringLiteral("differential pressure [Pa]"));
}

TEST_F(MeasuringPointsModelTest, SortsTheExpectedRangeAsNumbers)
{
    auto* proxy = view.proxy();
    proxy->sort(Model::ExpectedColumn, Qt::AscendingOrder);
    ASSERT_EQ(proxy->rowCount(), model().rowCount());
    for (int r = 1; r < proxy->rowCount(); ++r)
        EXPECT_LE(proxy->data(proxy->index(r - 1, Model::ExpectedColumn), Model::SortRole).toDouble(),
                  proxy->data(proxy->index(r, Model::ExpectedColumn), Model::SortRole).toDouble());
}

TEST_F(MeasuringPointsModelTest, CopyIsTabSeparatedWithAHeader)
{
    const QString tsv = view.copyText();
    QStringList lines = tsv.split(QLatin1Char('\n'));
    ASSERT_EQ(lines.back(), QString());
    lines.pop_back();
    ASSERT_EQ(lines.size(), model().rowCount() + 1);
    EXPECT_TRUE(lines.front().startsWith(QStringLiteral("Tag\tMeasures\tExpected range\tSetpoints (basis)\t")));
    for (const QString& line : lines)
        EXPECT_EQ(line.count(QLatin1Char('\t')), Model::ColumnCount - 1) << line.toStdString();
    // Several setpoints share one cell, joined on one line.
    const int filter = rowOf(QStringLiteral("DP-oda-filter"));
    ASSERT_GE(filter, 0);
    EXPECT_TRUE(lines[filter + 1].contains(QStringLiteral("; change alarm at design flow: ")))
        << lines[filter + 1].toStdString();
}

TEST_F(MeasuringPointsModelTest, NoResultsGiveTheReason)
{
    auto flows = document.project().unit.airflows;
    flows.supply = Core::cubicMetresPerHour(0.0);
    document.setAirflows(flows);
    ASSERT_FALSE(document.result().has_value());
    EXPECT_EQ(model().rowCount(), 0);
    const QString message = model().message();
    EXPECT_TRUE(message.startsWith(QStringLiteral("No results: "))) << message.toStdString();
    EXPECT_TRUE(message.contains(QStringLiteral("supply airflow"))) << message.toStdString();
    EXPECT_EQ(view.status()->text(), message);

    // No result and no reason yet (a model never rebuilt from a document).
    Model empty(&units);
    empty.rebuild(document.project(), std::nullopt, QString());
    EXPECT_EQ(empty.message(), QStringLiteral("No results yet"));
}

} // namespace
} // namespace Airwright::Ui
