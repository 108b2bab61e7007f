// The unit drawing: blocks in flow order on both decks, a coupled section across
// both, clicks that select, a drag that moves a section within its path, and a
// section type dropped from the list inserted where it lands.

#include "UiTestSupport.h"

#include "airwright/ui/SectionCatalog.h"
#include "airwright/ui/UnitDrawing.h"
#include "airwright/ui/UnitSystem.h"

#include <QApplication>
#include <QMouseEvent>

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;
using Chain::PathKind;

class UnitDrawingTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        ShellTest::openDemo(document);
        drawing = std::make_unique<UnitDrawing>(&document, &units);
        drawing->resize(1200, 360);
    }

    void mouse(QEvent::Type type, const QPointF& at, Qt::MouseButtons buttons)
    {
        QMouseEvent event(type, at, drawing->mapToGlobal(at), Qt::LeftButton, buttons, Qt::NoModifier);
        QApplication::sendEvent(drawing.get(), &event);
    }

    ProjectDocument document;
    UnitSystem units;
    std::unique_ptr<UnitDrawing> drawing;
};

TEST_F(UnitDrawingTest, SupplyRunsLeftToRightAndExtractRightToLeft)
{
    const auto& unit = document.project().unit;
    for (std::size_t i = 1; i < unit.supply.size(); ++i)
        EXPECT_GT(drawing->blockRect(PathKind::Supply, static_cast<int>(i)).center().x(),
                  drawing->blockRect(PathKind::Supply, static_cast<int>(i - 1)).center().x());
    for (std::size_t i = 1; i < unit.extract.size(); ++i)
        EXPECT_LT(drawing->blockRect(PathKind::Extract, static_cast<int>(i)).center().x(),
                  drawing->blockRect(PathKind::Extract, static_cast<int>(i - 1)).center().x());
    const QRectF supplyDeckBlock = drawing->blockRect(PathKind::Supply, 0);
    const QRectF extractDeckBlock = drawing->blockRect(PathKind::Extract, 0);
    EXPECT_LT(supplyDeckBlock.bottom(), extractDeckBlock.top()); // supply deck above
}

TEST_F(UnitDrawingTest, CoupledSectionSpansBothDecksInOneColumn)
{
    const QRectF supplyPart = drawing->blockRect(PathKind::Supply, 2);  // hr
    const QRectF extractPart = drawing->blockRect(PathKind::Extract, 1); // hr marker
    ASSERT_FALSE(supplyPart.isEmpty());
    EXPECT_DOUBLE_EQ(supplyPart.left(), extractPart.left());
    EXPECT_DOUBLE_EQ(supplyPart.width(), extractPart.width());
}

TEST_F(UnitDrawingTest, ClickSelects)
{
    const QPointF fan = drawing->blockRect(PathKind::Extract, 2).center(); // extract-fan
    mouse(QEvent::MouseButtonPress, fan, Qt::LeftButton);
    mouse(QEvent::MouseButtonRelease, fan, Qt::NoButton);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("extract-fan"));
    ASSERT_TRUE(drawing->selectedPlace().has_value());
    EXPECT_EQ(drawing->selectedPlace()->path, PathKind::Extract);
    EXPECT_EQ(drawing->selectedPlace()->index, 2);
    EXPECT_EQ(document.undoStack()->count(), 0); // selecting is not an edit

    // The coupled block picked in the extract deck keeps that deck.
    mouse(QEvent::MouseButtonPress, drawing->blockRect(PathKind::Extract, 1).center(), Qt::LeftButton);
    mouse(QEvent::MouseButtonRelease, drawing->blockRect(PathKind::Extract, 1).center(), Qt::NoButton);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("hr"));
    EXPECT_EQ(drawing->selectedPlace()->path, PathKind::Extract);
}

TEST_F(UnitDrawingTest, DragMovesWithinThePath)
{
    const auto before = ShellTest::ids(document.project().unit.supply);
    const QPointF from = drawing->blockRect(PathKind::Supply, 0).center(); // oda-damper
    const QRectF target = drawing->blockRect(PathKind::Supply, 4);         // cooling-coil
    const QPointF to(target.right() - 2.0, from.y());
    mouse(QEvent::MouseButtonPress, from, Qt::LeftButton);
    mouse(QEvent::MouseMove, QPointF(from.x() + 20.0, from.y()), Qt::LeftButton);
    mouse(QEvent::MouseMove, to, Qt::LeftButton);
    mouse(QEvent::MouseButtonRelease, to, Qt::NoButton);
    ASSERT_EQ(document.undoStack()->count(), 1);
    const auto after = ShellTest::ids(document.project().unit.supply);
    EXPECT_EQ(after[4], "oda-damper");
    EXPECT_EQ(after[0], before[1]);
    document.undoStack()->undo();
    EXPECT_EQ(ShellTest::ids(document.project().unit.supply), before);
}

TEST_F(UnitDrawingTest, DropInsertsWhereItLands)
{
    // Between the extract filter (index 0, right end) and the heat recovery.
    const QRectF filter = drawing->blockRect(PathKind::Extract, 0);
    const QPointF at(filter.left() - 1.0, filter.center().y());
    EXPECT_EQ(drawing->insertionIndexAt(PathKind::Extract, at.x()), 1);

    // What the drop handler does with the entry it reads from the drag's data.
    const auto& entries = SectionCatalog::entries();
    const auto silencer = std::find(entries.begin(), entries.end(), SectionCatalog::Entry::Silencer) - entries.begin();
    const double aboveDecks = drawing->blockRect(PathKind::Supply, 0).top() - 30.0;
    EXPECT_FALSE(drawing->dropSection(static_cast<int>(silencer), QPointF(at.x(), aboveDecks)));
    EXPECT_TRUE(drawing->dropSection(static_cast<int>(silencer), at));
    ASSERT_EQ(document.undoStack()->count(), 1);
    EXPECT_EQ(document.project().unit.extract[1].id, "silencer-2");
    EXPECT_EQ(document.selectedSection(), QStringLiteral("silencer-2"));
}

TEST_F(UnitDrawingTest, KeysWalkTheDecks)
{
    drawing->selectPlace({PathKind::Supply, 0});
    QKeyEvent right(QEvent::KeyPress, Qt::Key_Right, Qt::NoModifier);
    QApplication::sendEvent(drawing.get(), &right);
    EXPECT_EQ(document.selectedSection(), QStringLiteral("oda-filter"));
    QKeyEvent down(QEvent::KeyPress, Qt::Key_Down, Qt::NoModifier);
    QApplication::sendEvent(drawing.get(), &down);
    ASSERT_TRUE(drawing->selectedPlace().has_value());
    EXPECT_EQ(drawing->selectedPlace()->path, PathKind::Extract);
}

TEST_F(UnitDrawingTest, RendersWithoutResults)
{
    auto flows = document.project().unit.airflows;
    flows.supply = cubicMetresPerHour(0.0);
    document.setAirflows(flows); // as an undo command would
    ASSERT_FALSE(document.result().has_value());
    const QImage image = drawing->grab().toImage();
    EXPECT_FALSE(image.isNull());
}

} // namespace
} // namespace Airwright::Ui
