// The section editor: values shown in the chosen units, a round trip SI -> IP ->
// SI that changes neither the text nor the project, the error shown beside a
// field as it is typed, and a valid typed value committed as one undo step.

#include "UiTestSupport.h"

#include "airwright/ui/FieldForm.h"
#include "airwright/ui/FieldQuantity.h"
#include "airwright/ui/SectionEditor.h"
#include "airwright/ui/UnitSystem.h"

#include <QLabel>
#include <QLineEdit>

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;

class SectionEditorTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        ShellTest::openDemo(document);
        document.selectSection(QStringLiteral("heating-coil"));
        editor = std::make_unique<SectionEditor>(&document, &units);
    }

    QLineEdit* line(const QString& label)
    {
        FieldRow* row = editor->form()->row(label);
        EXPECT_NE(row, nullptr) << label.toStdString();
        return row ? qobject_cast<QLineEdit*>(row->editorWidget()) : nullptr;
    }

    ProjectDocument document;
    UnitSystem units;
    std::unique_ptr<SectionEditor> editor;
};

TEST_F(SectionEditorTest, UnitSwitchRoundTrip)
{
    ASSERT_NE(editor->form(), nullptr);
    QLineEdit* flow = line(QStringLiteral("Flow temperature"));
    QLineEdit* length = line(QStringLiteral("Length"));
    ASSERT_TRUE(flow && length);
    const Project::Project before = document.project();
    EXPECT_EQ(flow->text(), QStringLiteral("60"));   // demo: flow_temperature_C 60
    EXPECT_EQ(length->text(), QStringLiteral("400")); // demo: length_mm 400

    units.setSystem(UnitSystem::System::IP);
    // F = 1.8 C + 32 (definition of the Fahrenheit scale): 60 C is 140 F;
    // 1 in = 25.4 mm exactly (international inch): 400 mm is 15.748 in.
    EXPECT_EQ(flow->text(), QStringLiteral("140"));
    EXPECT_EQ(length->text(), QStringLiteral("15.748"));

    units.setSystem(UnitSystem::System::SI);
    EXPECT_EQ(flow->text(), QStringLiteral("60"));
    EXPECT_EQ(length->text(), QStringLiteral("400"));
    EXPECT_EQ(document.undoStack()->count(), 0);
    EXPECT_EQ(document.project(), before);
}

TEST_F(SectionEditorTest, FinishingAnUntouchedFieldPushesNothing)
{
    FieldRow* row = editor->form()->row(QStringLiteral("Flow temperature"));
    ASSERT_NE(row, nullptr);
    units.setSystem(UnitSystem::System::IP); // shown rounded: must not write the rounding back
    emit row->commitRequested();
    units.setSystem(UnitSystem::System::SI);
    emit row->commitRequested();
    EXPECT_EQ(document.undoStack()->count(), 0);
}

TEST_F(SectionEditorTest, ErrorBesideTheFieldAsYouType)
{
    FieldRow* row = editor->form()->row(QStringLiteral("Return temperature"));
    QLineEdit* edit = line(QStringLiteral("Return temperature"));
    ASSERT_TRUE(row && edit);
    // Return above the flow temperature (60 C) is refused by the coil's check.
    edit->setText(QStringLiteral("75"));
    emit row->edited();
    EXPECT_FALSE(row->error().isEmpty());
    EXPECT_TRUE(row->error().contains(QStringLiteral("return temperature"))) << row->error().toStdString();
    emit row->commitRequested();
    EXPECT_EQ(document.undoStack()->count(), 0);

    edit->setText(QStringLiteral("abc"));
    emit row->edited();
    EXPECT_FALSE(row->error().isEmpty());

    // A valid value, with a decimal comma, is accepted and committed once.
    edit->setText(QStringLiteral("35,5"));
    emit row->edited();
    EXPECT_TRUE(row->error().isEmpty()) << row->error().toStdString();
    emit row->commitRequested();
    ASSERT_EQ(document.undoStack()->count(), 1);
    const auto& coil = std::get<Sections::WaterHeatingCoil>(document.project().unit.supply[3].spec);
    EXPECT_NEAR(toCelsius(coil.returnTemperature), 35.5, 1e-9);
}

TEST_F(SectionEditorTest, TypedIpValueIsStoredInSi)
{
    units.setSystem(UnitSystem::System::IP);
    FieldRow* row = editor->form()->row(QStringLiteral("Flow temperature"));
    QLineEdit* edit = line(QStringLiteral("Flow temperature"));
    ASSERT_TRUE(row && edit);
    edit->setText(QStringLiteral("158"));
    emit row->edited();
    emit row->commitRequested();
    const auto& coil = std::get<Sections::WaterHeatingCoil>(document.project().unit.supply[3].spec);
    // (158 - 32) / 1.8 = 70 C (definition of the Fahrenheit scale).
    EXPECT_NEAR(toCelsius(coil.flowTemperature), 70.0, 1e-9);
}

TEST_F(SectionEditorTest, DuplicateIdIsRefused)
{
    FieldRow* row = editor->form()->row(QStringLiteral("Id"));
    QLineEdit* edit = line(QStringLiteral("Id"));
    ASSERT_TRUE(row && edit);
    edit->setText(QStringLiteral("cooling-coil"));
    emit row->edited();
    EXPECT_FALSE(row->error().isEmpty());
    emit row->commitRequested();
    EXPECT_EQ(document.undoStack()->count(), 0);
}

TEST_F(SectionEditorTest, FollowsTheSelection)
{
    document.selectSection(QStringLiteral("supply-fan"));
    EXPECT_NE(editor->form()->row(QStringLiteral("Fan efficiency")), nullptr);
    document.selectSection({});
    document.selectSection(QStringLiteral("hr"));
    FieldRow* efficiency = editor->form()->row(QStringLiteral("Rated temperature efficiency"));
    ASSERT_NE(efficiency, nullptr);
    EXPECT_EQ(qobject_cast<QLineEdit*>(efficiency->editorWidget())->text(), QStringLiteral("82"));
}

TEST(FieldQuantityTest, EditTextAndParse)
{
    EXPECT_EQ(FieldQuantity::editText(60.0), QStringLiteral("60"));
    EXPECT_EQ(FieldQuantity::editText(0.4), QStringLiteral("0.4"));
    EXPECT_EQ(FieldQuantity::editText(101325.0), QStringLiteral("101325"));
    EXPECT_EQ(FieldQuantity::editText(-12.0), QStringLiteral("-12"));
    EXPECT_EQ(FieldQuantity::editText(-0.000001), QStringLiteral("-0.000001"));
    EXPECT_EQ(FieldQuantity::editText(-0.0000001), QStringLiteral("0")); // no "-0"
    EXPECT_EQ(FieldQuantity::parse(QStringLiteral(" 1 250,5 ")).value_or(-1.0), 1250.5);
    EXPECT_FALSE(FieldQuantity::parse(QStringLiteral("")).has_value());
    EXPECT_FALSE(FieldQuantity::parse(QStringLiteral("12a")).has_value());
    EXPECT_FALSE(FieldQuantity::parse(QStringLiteral("nan")).has_value());
}

TEST(FieldQuantityTest, LengthsAndPressureRoundTrip)
{
    UnitSystem units;
    units.setSystem(UnitSystem::System::IP);
    const FieldQuantity length = FieldQuantity::length();
    const FieldQuantity altitude = FieldQuantity::altitude();
    // 1 in = 25.4 mm and 1 ft = 0.3048 m exactly (international yard and pound, 1959).
    EXPECT_NEAR(length.toDisplay(units, 254.0), 10.0, 1e-12);
    EXPECT_NEAR(altitude.toDisplay(units, 304.8), 1000.0, 1e-9);
    for (double v : {0.0, 1.0, 250.0, 12345.678})
        EXPECT_NEAR(length.fromDisplay(units, length.toDisplay(units, v)), v, 1e-9 * (1.0 + v));
    const FieldQuantity barometric = FieldQuantity::barometric();
    EXPECT_EQ(barometric.unit(units), QStringLiteral("in. Hg"));
    EXPECT_NEAR(barometric.fromDisplay(units, barometric.toDisplay(units, 98000.0)), 98000.0, 1e-7);
    units.setSystem(UnitSystem::System::SI);
    EXPECT_NEAR(barometric.toDisplay(units, 98000.0), 98.0, 1e-12); // shown in kPa
}

} // namespace
} // namespace Airwright::Ui
