#include "DemoProject.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/ScheduleModel.h"

#include <QSortFilterProxyModel>

#include <gtest/gtest.h>

namespace Airwright::Ui {
namespace {

using Kind = UnitSystem::Kind;

class ScheduleModelTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        TestSupport::DemoProject::open(document);
        ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
        model.rebuild(document.project(), document.result(), 0);
    }
    int rowOf(const char* id, Core::Chain::PathKind path = Core::Chain::PathKind::Supply) const
    {
        for (int r = 0; r < model.rowCount(); ++r)
            if (model.sectionId(r) == QLatin1String(id) && model.path(r) == path)
                return r;
        return -1;
    }
    QString cell(int row, int column) const { return model.data(model.index(row, column)).toString(); }

    ProjectDocument document;
    UnitSystem units;
    ScheduleModel model{&units};
};

TEST_F(ScheduleModelTest, OneRowPerSectionPerPath)
{
    const auto& c = document.result()->cases[0];
    ASSERT_EQ(model.rowCount(), int(c.supply.size() + c.extract.size()));
    EXPECT_EQ(model.columnCount(), ScheduleModel::ColumnCount);
    EXPECT_EQ(cell(0, ScheduleModel::PathColumn), QStringLiteral("supply"));
    EXPECT_EQ(cell(model.rowCount() - 1, ScheduleModel::PathColumn), QStringLiteral("extract"));
    // The exchanger appears on both paths, with its type on both.
    EXPECT_EQ(model.rowsOf(QStringLiteral("hr")).size(), 2);
    const int extractHr = rowOf("hr", Core::Chain::PathKind::Extract);
    ASSERT_GE(extractHr, 0);
    EXPECT_EQ(cell(extractHr, ScheduleModel::TypeColumn), QStringLiteral("heat recovery"));
    EXPECT_EQ(cell(rowOf("heating-coil"), ScheduleModel::TypeColumn), QStringLiteral("water heating coil"));
}

TEST_F(ScheduleModelTest, CellsShowTheResultInTheChosenUnits)
{
    const auto& first = document.result()->cases[0].supply.front();
    EXPECT_EQ(cell(0, ScheduleModel::InletTemperatureColumn),
              QString::number(Core::toCelsius(first.inlet.state.dryBulb()), 'f', 1));
    EXPECT_EQ(model.headerData(ScheduleModel::InletTemperatureColumn, Qt::Horizontal).toString(),
              QStringLiteral("Inlet t\n[°C]"));
    EXPECT_EQ(model.headerData(ScheduleModel::PressureDropColumn, Qt::Horizontal).toString(),
              QStringLiteral("Pressure drop\n[Pa]"));
    const QString figures = cell(rowOf("heating-coil"), ScheduleModel::FiguresColumn);
    EXPECT_TRUE(figures.contains(QStringLiteral("heating duty "))) << figures.toStdString();
    EXPECT_TRUE(figures.contains(QStringLiteral(" kW"))) << figures.toStdString();
    EXPECT_TRUE(figures.contains(QStringLiteral("flow temperature 60.0 °C"))) << figures.toStdString();
}

TEST_F(ScheduleModelTest, UnitSwitchRoundTrip)
{
    QStringList siCells;
    for (int r = 0; r < model.rowCount(); ++r)
        for (int c = 0; c < model.columnCount(); ++c)
            siCells.push_back(cell(r, c));
    int headerSignals = 0;
    QObject::connect(&model, &QAbstractItemModel::headerDataChanged, [&headerSignals] { ++headerSignals; });

    units.setSystem(UnitSystem::System::IP);
    EXPECT_EQ(headerSignals, 1);
    EXPECT_EQ(model.headerData(ScheduleModel::InletTemperatureColumn, Qt::Horizontal).toString(),
              QStringLiteral("Inlet t\n[°F]"));
    EXPECT_EQ(model.headerData(ScheduleModel::PressureDropColumn, Qt::Horizontal).toString(),
              QStringLiteral("Pressure drop\n[in. w.g.]"));
    // The IP number read back to SI agrees with the SI cell within the IP rounding.
    const auto& first = document.result()->cases[0].supply.front();
    const double shownF = cell(0, ScheduleModel::InletTemperatureColumn).toDouble();
    EXPECT_NEAR(units.fromDisplay(Kind::Temperature, shownF), Core::toCelsius(first.inlet.state.dryBulb()),
                0.05 / 1.8 + 1e-9); // half the last shown digit (0.1 °F)
    const int fan = rowOf("supply-fan");
    const double shownInWg = cell(fan, ScheduleModel::PressureDropColumn).toDouble();
    EXPECT_NEAR(units.fromDisplay(Kind::Pressure, shownInWg),
                Core::toPascals(document.result()->cases[0].supply[std::size_t(fan)].pressureDrop),
                0.005 * 249.0889 + 1e-9); // half of 0.01 in. w.g.
    EXPECT_NE(cell(0, ScheduleModel::InletTemperatureColumn), siCells[ScheduleModel::InletTemperatureColumn]);

    units.setSystem(UnitSystem::System::SI);
    QStringList back;
    for (int r = 0; r < model.rowCount(); ++r)
        for (int c = 0; c < model.columnCount(); ++c)
            back.push_back(cell(r, c));
    EXPECT_EQ(back, siCells);
}

TEST_F(ScheduleModelTest, TsvHasAHeaderWithUnitsAndARowPerSection)
{
    const QString tsv = model.toTsv();
    QStringList lines = tsv.split(QLatin1Char('\n'));
    ASSERT_EQ(lines.back(), QString()); // ends with a line break
    lines.pop_back();
    ASSERT_EQ(lines.size(), model.rowCount() + 1);
    EXPECT_TRUE(lines.front().startsWith(QStringLiteral("Path\tSection\tType\tInlet t [°C]")));
    EXPECT_TRUE(lines.front().contains(QStringLiteral("Duty [kW]")));
    for (const QString& line : lines)
        EXPECT_EQ(line.count(QLatin1Char('\t')), ScheduleModel::ColumnCount - 1) << line.toStdString();
    // Chosen rows in the chosen order.
    const QStringList two = model.toTsv({3, 1}).split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    ASSERT_EQ(two.size(), 3);
    EXPECT_TRUE(two[1].startsWith(QStringLiteral("supply\t") + model.sectionId(3) + QLatin1Char('\t')));
    EXPECT_TRUE(two[2].startsWith(QStringLiteral("supply\t") + model.sectionId(1) + QLatin1Char('\t')));
    // Rows out of range are left out.
    EXPECT_EQ(model.toTsv({-1, 999}).split(QLatin1Char('\n'), Qt::SkipEmptyParts).size(), 1);
}

TEST_F(ScheduleModelTest, EditingASectionChangesItsRow)
{
    const int hr = rowOf("hr");
    const QString dropBefore = cell(hr, ScheduleModel::PressureDropColumn);
    const QString outletBefore = cell(hr, ScheduleModel::OutletTemperatureColumn);
    TestSupport::DemoProject::editSupplySection(document, "hr", [](Core::Chain::Section& s) {
        auto& r = std::get<Core::Recovery::HeatRecovery>(s.spec);
        r.ratedPressureDropSupply = Core::pascals(300.0);
        r.ratedEfficiency = Core::percent(55.0);
    });
    model.rebuild(document.project(), document.result(), 0);
    EXPECT_NE(cell(hr, ScheduleModel::PressureDropColumn), dropBefore);
    EXPECT_LT(cell(hr, ScheduleModel::OutletTemperatureColumn).toDouble(), outletBefore.toDouble());
}

TEST_F(ScheduleModelTest, SortsNumbersAsNumbers)
{
    QSortFilterProxyModel proxy;
    proxy.setSourceModel(&model);
    proxy.setSortRole(ScheduleModel::SortRole);
    proxy.sort(ScheduleModel::PressureDropColumn, Qt::AscendingOrder);
    double previous = -1e300;
    for (int r = 0; r < proxy.rowCount(); ++r) {
        const double v = proxy.data(proxy.index(r, ScheduleModel::PressureDropColumn), ScheduleModel::SortRole).toDouble();
        EXPECT_GE(v, previous);
        previous = v;
    }
    // Fans (negative drop: a rise) sort first.
    EXPECT_EQ(proxy.data(proxy.index(0, ScheduleModel::TypeColumn)).toString(), QStringLiteral("fan"));
}

TEST_F(ScheduleModelTest, CaseIndexOutOfRangeGivesNoRows)
{
    for (int bad : {-1, 3, 100}) {
        model.rebuild(document.project(), document.result(), bad);
        EXPECT_EQ(model.rowCount(), 0) << bad;
        EXPECT_EQ(model.toTsv().count(QLatin1Char('\n')), 1);
    }
    model.rebuild(document.project(), std::nullopt, 0);
    EXPECT_EQ(model.rowCount(), 0);
    EXPECT_TRUE(model.caseNames().isEmpty());
}

} // namespace
} // namespace Airwright::Ui
