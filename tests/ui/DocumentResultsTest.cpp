// An edit through an undo command recomputes the unit: the document's results
// follow the new inputs and go back on undo; a project that cannot be computed
// says why.

#include "UiTestSupport.h"

#include "airwright/ui/EditAirflowsCommand.h"
#include "airwright/ui/EditSectionCommand.h"
#include "airwright/ui/ProjectTemplate.h"

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;
using Chain::PathKind;

TEST(DocumentResultsTest, FilterPressureDropFollowsItsInput)
{
    ProjectDocument document;
    ShellTest::openDemo(document);
    const auto* before = ShellTest::resultOf(document, 0, PathKind::Supply, "oda-filter");
    ASSERT_NE(before, nullptr);
    const double dropBefore = toPascals(before->pressureDrop);

    Chain::Section filter = document.project().unit.supply[1];
    ASSERT_EQ(filter.id, "oda-filter");
    std::get<Sections::Filter>(filter.spec).initialPressureDrop = pascals(120.0); // was 70 Pa
    int resultsChanged = 0;
    QObject::connect(&document, &ProjectDocument::resultsChanged, [&resultsChanged] { ++resultsChanged; });
    document.undoStack()->push(new EditSectionCommand(&document, "oda-filter", filter));
    EXPECT_EQ(resultsChanged, 1);

    const auto* after = ShellTest::resultOf(document, 0, PathKind::Supply, "oda-filter");
    ASSERT_NE(after, nullptr);
    // A larger initial drop raises the design drop (mean of initial and final,
    // EN 13053) at the same flow, so the section's pressure drop must rise.
    EXPECT_GT(toPascals(after->pressureDrop), dropBefore + 1.0);

    document.undoStack()->undo();
    const auto* undone = ShellTest::resultOf(document, 0, PathKind::Supply, "oda-filter");
    ASSERT_NE(undone, nullptr);
    EXPECT_NEAR(toPascals(undone->pressureDrop), dropBefore, 1e-9); // the same computation again
}

TEST(DocumentResultsTest, LessEfficientRecoveryRecoversLessInWinter)
{
    ProjectDocument document;
    ShellTest::openDemo(document);
    const auto& result = document.result();
    ASSERT_TRUE(result);
    ASSERT_EQ(result->cases[0].caseName, "winter design");
    const double recoveredBefore = toKilowatts(result->cases[0].totals.heatRecovered);
    ASSERT_GT(recoveredBefore, 0.0);

    Chain::Section hr = document.project().unit.supply[2];
    ASSERT_EQ(hr.id, "hr");
    std::get<Recovery::HeatRecovery>(hr.spec).ratedEfficiency = percent(50.0); // was 82 %
    document.undoStack()->push(new EditSectionCommand(&document, "hr", hr));
    ASSERT_TRUE(document.result());
    // At -12 C outdoors the exchanger runs flat out (no bypass), so a lower
    // efficiency recovers less heat and the heating coil makes up the rest.
    EXPECT_LT(toKilowatts(document.result()->cases[0].totals.heatRecovered), recoveredBefore - 1.0);
}

TEST(DocumentResultsTest, UncomputableProjectReportsWhy)
{
    ProjectDocument document;
    ShellTest::openDemo(document);
    auto flows = document.project().unit.airflows;
    flows.supply = cubicMetresPerHour(0.0);
    document.undoStack()->push(new EditAirflowsCommand(&document, flows));
    EXPECT_FALSE(document.result().has_value());
    EXPECT_TRUE(document.computeError().contains(QStringLiteral("supply airflow")))
        << document.computeError().toStdString();
    document.undoStack()->undo();
    EXPECT_TRUE(document.result().has_value());
    EXPECT_TRUE(document.computeError().isEmpty());
}

TEST(DocumentResultsTest, NewProjectComputes)
{
    ProjectDocument document;
    document.reset(ProjectTemplate::newProject());
    ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    EXPECT_EQ(document.result()->cases.size(), 2u);
    EXPECT_FALSE(document.isModified());
}

} // namespace
} // namespace Airwright::Ui
