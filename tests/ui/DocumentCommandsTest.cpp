// Undo commands on the document: add, move, remove and duplicate sections with
// undo and redo, and edits that change nothing are not recorded.

#include "UiTestSupport.h"

#include "airwright/core/chain/ChainSolver.h"
#include "airwright/ui/AddSectionCommand.h"
#include "airwright/ui/DuplicateSectionCommand.h"
#include "airwright/ui/EditAirflowsCommand.h"
#include "airwright/ui/EditCasesCommand.h"
#include "airwright/ui/EditCasingCommand.h"
#include "airwright/ui/EditInfoCommand.h"
#include "airwright/ui/EditSectionCommand.h"
#include "airwright/ui/EditSiteCommand.h"
#include "airwright/ui/MoveSectionCommand.h"
#include "airwright/ui/RemoveSectionCommand.h"
#include "airwright/ui/SectionPaths.h"


namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;
using Chain::PathKind;
using ShellTest::ids;

class DocumentCommandsTest : public ::testing::Test {
protected:
    void SetUp() override { ShellTest::openDemo(document); }

    QUndoStack& stack() { return *document.undoStack(); }

    ProjectDocument document;
};

TEST_F(DocumentCommandsTest, AddUndoRedo)
{
    const Project::Project before = document.project();
    stack().push(new AddSectionCommand(&document, SectionCatalog::Entry::Silencer, PathKind::Extract, 1));
    ASSERT_EQ(stack().count(), 1);
    const auto& extract = document.project().unit.extract;
    ASSERT_EQ(extract.size(), before.unit.extract.size() + 1);
    // The demo's supply already has a "silencer": ids are unique across both paths.
    EXPECT_EQ(extract[1].id, "silencer-2");
    EXPECT_TRUE(std::holds_alternative<Sections::PassiveSection>(extract[1].spec));
    EXPECT_EQ(document.selectedSection(), QStringLiteral("silencer-2"));
    EXPECT_TRUE(document.isModified());
    const Project::Project after = document.project();

    stack().undo();
    EXPECT_EQ(document.project(), before);
    EXPECT_FALSE(document.isModified());
    stack().redo();
    EXPECT_EQ(document.project(), after);
}

TEST_F(DocumentCommandsTest, AddedIdsAreUnique)
{
    stack().push(new AddSectionCommand(&document, SectionCatalog::Entry::Fan, PathKind::Supply, 0));
    stack().push(new AddSectionCommand(&document, SectionCatalog::Entry::Fan, PathKind::Supply, 0));
    const auto supply = ids(document.project().unit.supply);
    EXPECT_EQ(supply[0], "fan-2");
    EXPECT_EQ(supply[1], "fan");
    EXPECT_NO_THROW(Chain::ChainSolver::validate(document.project().unit));
}

TEST_F(DocumentCommandsTest, AddingACoupledSectionAddsItsMarker)
{
    // The demo has its heat recovery "hr" at supply[2] and extract[1]. A mixing
    // section added upstream of it in the supply meets the extract after it.
    stack().push(new AddSectionCommand(&document, SectionCatalog::Entry::Mixing, PathKind::Supply, 2));
    const auto& unit = document.project().unit;
    EXPECT_EQ(ids(unit.supply)[2], "mixing");
    EXPECT_TRUE(std::holds_alternative<Sections::MixingBox>(unit.supply[2].spec));
    const int marker = SectionPaths::indexOf(unit.extract, "mixing");
    ASSERT_GE(marker, 0);
    EXPECT_TRUE(std::holds_alternative<Chain::CoupledSide>(unit.extract[static_cast<std::size_t>(marker)].spec));
    EXPECT_GT(marker, SectionPaths::indexOf(unit.extract, "hr"));
    EXPECT_NO_THROW(Chain::ChainSolver::validate(unit));
    EXPECT_TRUE(document.computeError().isEmpty()) << document.computeError().toStdString();

    stack().undo();
    EXPECT_EQ(SectionPaths::indexOf(document.project().unit.extract, "mixing"), -1);
    EXPECT_EQ(SectionPaths::indexOf(document.project().unit.supply, "mixing"), -1);
}

TEST_F(DocumentCommandsTest, MoveUndoRedo)
{
    const auto before = ids(document.project().unit.supply);
    // oda-filter (1) to after the heating coil (3).
    stack().push(new MoveSectionCommand(&document, PathKind::Supply, 1, 3));
    const auto moved = ids(document.project().unit.supply);
    ASSERT_EQ(moved.size(), before.size());
    EXPECT_EQ(moved[1], before[2]);
    EXPECT_EQ(moved[2], before[3]);
    EXPECT_EQ(moved[3], before[1]);
    EXPECT_EQ(document.selectedSection(), QString::fromStdString(before[1]));
    stack().undo();
    EXPECT_EQ(ids(document.project().unit.supply), before);
    stack().redo();
    EXPECT_EQ(ids(document.project().unit.supply), moved);
}

TEST_F(DocumentCommandsTest, RemoveCoupledUndo)
{
    const Project::Project before = document.project();
    document.selectSection(QStringLiteral("hr"));
    stack().push(new RemoveSectionCommand(&document, "hr"));
    const auto& unit = document.project().unit;
    EXPECT_EQ(SectionPaths::indexOf(unit.supply, "hr"), -1);
    EXPECT_EQ(SectionPaths::indexOf(unit.extract, "hr"), -1);
    EXPECT_EQ(unit.supply.size(), before.unit.supply.size() - 1);
    EXPECT_EQ(unit.extract.size(), before.unit.extract.size() - 1);
    EXPECT_TRUE(document.selectedSection().isEmpty());
    stack().undo();
    EXPECT_EQ(document.project(), before);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("hr"));
}

TEST_F(DocumentCommandsTest, DuplicatePlacesCopyDownstream)
{
    stack().push(new DuplicateSectionCommand(&document, PathKind::Supply, 1));
    const auto& supply = document.project().unit.supply;
    EXPECT_EQ(supply[1].id, "oda-filter");
    EXPECT_EQ(supply[2].id, "oda-filter-2");
    EXPECT_EQ(supply[2].spec, supply[1].spec);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("oda-filter-2"));

    // A coupled copy brings its marker; the chain still validates.
    stack().push(new DuplicateSectionCommand(&document, PathKind::Extract, 1));
    EXPECT_GE(SectionPaths::indexOf(document.project().unit.extract, "hr-2"), 0);
    EXPECT_NO_THROW(Chain::ChainSolver::validate(document.project().unit));
}

TEST_F(DocumentCommandsTest, RenamingCoupledSectionRenamesMarker)
{
    Chain::Section edited = document.project().unit.supply[2];
    ASSERT_EQ(edited.id, "hr");
    document.selectSection(QStringLiteral("hr"));
    edited.id = "plate-hx";
    stack().push(new EditSectionCommand(&document, "hr", edited));
    EXPECT_EQ(SectionPaths::indexOf(document.project().unit.extract, "plate-hx"), 1);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("plate-hx"));
    stack().undo();
    EXPECT_EQ(SectionPaths::indexOf(document.project().unit.extract, "hr"), 1);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("hr"));
}

TEST_F(DocumentCommandsTest, NoOpEditsPushNothing)
{
    int changes = 0;
    QObject::connect(&document, &ProjectDocument::changed, [&changes] { ++changes; });
    const auto& unit = document.project().unit;
    stack().push(new EditSectionCommand(&document, "heating-coil", unit.supply[3]));
    stack().push(new MoveSectionCommand(&document, PathKind::Supply, 2, 2));
    stack().push(new MoveSectionCommand(&document, PathKind::Supply, 0, -1)); // clamped to where it is
    stack().push(new EditSiteCommand(&document, unit.site));
    stack().push(new EditAirflowsCommand(&document, unit.airflows));
    stack().push(new EditCasingCommand(&document, unit.casing));
    stack().push(new EditInfoCommand(&document, document.project().info));
    stack().push(new EditCasesCommand(&document, unit.cases));
    stack().push(new RemoveSectionCommand(&document, "no-such-section"));
    EXPECT_EQ(stack().count(), 0);
    EXPECT_EQ(changes, 0);
    EXPECT_FALSE(document.isModified());

    // A real edit is recorded once.
    auto flows = unit.airflows;
    flows.supply = cubicMetresPerHour(8000.0);
    stack().push(new EditAirflowsCommand(&document, flows));
    EXPECT_EQ(stack().count(), 1);
    EXPECT_EQ(changes, 1);
}

TEST_F(DocumentCommandsTest, ResetClearsHistory)
{
    stack().push(new AddSectionCommand(&document, SectionCatalog::Entry::Damper, PathKind::Supply, 0));
    ASSERT_TRUE(document.isModified());
    document.reset(document.project());
    EXPECT_EQ(stack().count(), 0);
    EXPECT_FALSE(document.isModified());
    document.markModified();
    EXPECT_TRUE(document.isModified());
}

} // namespace
} // namespace Airwright::Ui
