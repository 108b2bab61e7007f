// The design cases table: edits become undo steps in the chosen units, invalid
// values and removing the last case are refused with a reason.

#include "UiTestSupport.h"

#include "airwright/ui/CasesModel.h"
#include "airwright/ui/UnitSystem.h"

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;

class CasesModelTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        ShellTest::openDemo(document);
        model = std::make_unique<CasesModel>(&document, &units);
        QObject::connect(model.get(), &CasesModel::problemFound, [this](const QString& p) { problem = p; });
    }

    ProjectDocument document;
    UnitSystem units;
    std::unique_ptr<CasesModel> model;
    QString problem;
};

TEST_F(CasesModelTest, ShowsEveryCase)
{
    ASSERT_EQ(model->rowCount(), 3);
    EXPECT_EQ(model->data(model->index(1, CasesModel::Name)).toString(), QStringLiteral("summer design"));
    EXPECT_EQ(model->data(model->index(0, CasesModel::OutdoorTemperature), Qt::EditRole).toString(),
              QStringLiteral("-12"));
    EXPECT_EQ(model->data(model->index(0, CasesModel::MinimumHumidity)).toString(), QStringLiteral("none"));
}

TEST_F(CasesModelTest, RenameAndEditAreUndoSteps)
{
    EXPECT_TRUE(model->setData(model->index(2, CasesModel::Name), QStringLiteral("spring")));
    EXPECT_EQ(document.project().unit.cases[2].name, "spring");
    EXPECT_TRUE(model->setData(model->index(0, CasesModel::OutdoorTemperature), QStringLiteral("-16")));
    EXPECT_NEAR(toCelsius(document.project().unit.cases[0].outdoorTemperature), -16.0, 1e-9);
    EXPECT_EQ(document.undoStack()->count(), 2);
    EXPECT_TRUE(problem.isEmpty());

    // The text as shown commits nothing.
    EXPECT_TRUE(model->setData(model->index(0, CasesModel::RoomTemperature),
                               model->data(model->index(0, CasesModel::RoomTemperature), Qt::EditRole)));
    EXPECT_EQ(document.undoStack()->count(), 2);

    document.undoStack()->undo();
    document.undoStack()->undo();
    EXPECT_EQ(document.project().unit.cases[2].name, "mid-season");
}

TEST_F(CasesModelTest, InIpUnitsTheTypedValueIsFahrenheit)
{
    units.setSystem(UnitSystem::System::IP);
    EXPECT_TRUE(model->setData(model->index(1, CasesModel::OutdoorTemperature), QStringLiteral("95")));
    // (95 - 32) / 1.8 = 35 C (definition of the Fahrenheit scale).
    EXPECT_NEAR(toCelsius(document.project().unit.cases[1].outdoorTemperature), 35.0, 1e-9);
}

TEST_F(CasesModelTest, InvalidEditsAreRefusedWithAReason)
{
    EXPECT_FALSE(model->setData(model->index(0, CasesModel::OutdoorHumidity), QStringLiteral("120")));
    EXPECT_TRUE(problem.contains(QStringLiteral("relative humidity"))) << problem.toStdString();
    EXPECT_FALSE(model->setData(model->index(1, CasesModel::Name), QStringLiteral("winter design")));
    EXPECT_FALSE(problem.isEmpty());
    EXPECT_FALSE(model->setData(model->index(1, CasesModel::Airflow), QStringLiteral("lots")));
    EXPECT_EQ(document.undoStack()->count(), 0);
}

TEST_F(CasesModelTest, AddCopyRemove)
{
    EXPECT_TRUE(model->addCase(1));
    ASSERT_EQ(document.project().unit.cases.size(), 4u);
    EXPECT_EQ(document.project().unit.cases[3].name, "summer design copy");
    EXPECT_TRUE(model->addCase());
    EXPECT_EQ(document.project().unit.cases.size(), 5u);
    EXPECT_TRUE(model->removeCase(0));
    EXPECT_EQ(document.project().unit.cases.size(), 4u);
    while (document.project().unit.cases.size() > 1)
        ASSERT_TRUE(model->removeCase(0));
    EXPECT_FALSE(model->removeCase(0)); // a unit keeps at least one case
    EXPECT_TRUE(problem.contains(QStringLiteral("at least one"))) << problem.toStdString();
}

TEST_F(CasesModelTest, OptionalHumidityCanBeClearedAgain)
{
    EXPECT_TRUE(model->setData(model->index(0, CasesModel::MinimumHumidity), QStringLiteral("30")));
    ASSERT_TRUE(document.project().unit.cases[0].minimumSupplyHumidity.has_value());
    EXPECT_TRUE(model->setData(model->index(0, CasesModel::MinimumHumidity), QString()));
    EXPECT_FALSE(document.project().unit.cases[0].minimumSupplyHumidity.has_value());
}

} // namespace
} // namespace Airwright::Ui
