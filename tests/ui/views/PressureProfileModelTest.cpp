#include "DemoProject.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/views/PressureProfileModel.h"

#include <gtest/gtest.h>

namespace Airwright::Ui {
namespace {

using Core::Chain::PathKind;

class PressureProfileModelTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        TestSupport::DemoProject::open(document);
        ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    }
    const PressureProfileModel::Span* span(const PressureProfileModel& m, PathKind path, const char* id) const
    {
        for (const auto& s : path == PathKind::Supply ? m.supply() : m.extract())
            if (s.id == QLatin1String(id))
                return &s;
        return nullptr;
    }
    ProjectDocument document;
};

TEST_F(PressureProfileModelTest, StartsAndEndsAtTheExternalPressures)
{
    PressureProfileModel model;
    model.rebuild(document.result(), 0);
    const auto& airflows = document.project().unit.airflows;
    const auto supply = model.polyline(PathKind::Supply);
    const auto extract = model.polyline(PathKind::Extract);
    ASSERT_GE(supply.size(), 2);
    ASSERT_GE(extract.size(), 2);
    // DEVELOPERS.md, the chain: the profile starts at minus the external pressure
    // before the unit and the fan makes up the rest, so the path ends at plus the
    // external pressure after it (demo: supply 60 / 250 Pa, extract 200 / 60 Pa).
    EXPECT_NEAR(supply.front().y(), -Core::toPascals(airflows.supplyExternalBefore), 1e-6);
    EXPECT_NEAR(supply.back().y(), Core::toPascals(airflows.supplyExternalAfter), 1.0);
    EXPECT_NEAR(extract.front().y(), -Core::toPascals(airflows.extractExternalBefore), 1e-6);
    EXPECT_NEAR(extract.back().y(), Core::toPascals(airflows.extractExternalAfter), 1.0);
    EXPECT_NEAR(supply.front().x(), 0.0, 1e-12);
    // x runs forward.
    for (qsizetype i = 1; i < supply.size(); ++i)
        EXPECT_GE(supply[i].x(), supply[i - 1].x());
}

TEST_F(PressureProfileModelTest, FansAreRisesAndOtherSectionsDrops)
{
    PressureProfileModel model;
    model.rebuild(document.result(), 0);
    int fans = 0;
    for (const auto* spans : {&model.supply(), &model.extract()})
        for (const auto& s : *spans) {
            if (s.fan) {
                ++fans;
                EXPECT_GT(s.pressureOutPa, s.pressureInPa + 100.0) << s.id.toStdString();
            } else {
                EXPECT_LE(s.pressureOutPa, s.pressureInPa + 1e-9) << s.id.toStdString();
            }
        }
    EXPECT_EQ(fans, 2);
}

TEST_F(PressureProfileModelTest, CoupledSectionAlignsAndShowsTheDifference)
{
    PressureProfileModel model;
    model.rebuild(document.result(), 0);
    const auto* s = span(model, PathKind::Supply, "hr");
    const auto* e = span(model, PathKind::Extract, "hr");
    ASSERT_NE(s, nullptr);
    ASSERT_NE(e, nullptr);
    EXPECT_NEAR(s->xStart, e->xStart, 1e-12);
    EXPECT_NEAR(s->xEnd, e->xEnd, 1e-12); // the extract side takes the supply side's length
    ASSERT_EQ(model.couplings().size(), 1);
    const auto& k = model.couplings().front();
    EXPECT_EQ(k.id, QStringLiteral("hr"));
    EXPECT_NEAR(k.x, s->middle(), 1e-12);
    EXPECT_NEAR(k.supplyPa, 0.5 * (s->pressureInPa + s->pressureOutPa), 1e-9);
    EXPECT_NEAR(k.extractPa, 0.5 * (e->pressureInPa + e->pressureOutPa), 1e-9);
    EXPECT_NEAR(k.differencePa, k.supplyPa - k.extractPa, 1e-6);
    // The core's own figure says the same.
    const auto& detail = std::get<Core::Recovery::HeatRecoveryDetail>(document.result()->cases[0].supply[2].detail);
    ASSERT_TRUE(detail.supplyMinusExtract.has_value());
    EXPECT_NEAR(k.differencePa, Core::toPascals(*detail.supplyMinusExtract), 1e-9);
}

TEST_F(PressureProfileModelTest, EditingASectionChangesTheProfile)
{
    PressureProfileModel before;
    before.rebuild(document.result(), 0);
    TestSupport::DemoProject::editSupplySection(document, "hr", [](Core::Chain::Section& sec) {
        std::get<Core::Recovery::HeatRecovery>(sec.spec).ratedPressureDropSupply = Core::pascals(300.0);
    });
    ASSERT_TRUE(document.result().has_value());
    PressureProfileModel after;
    after.rebuild(document.result(), 0);
    const auto* s0 = span(before, PathKind::Supply, "hr");
    const auto* s1 = span(after, PathKind::Supply, "hr");
    ASSERT_NE(s0, nullptr);
    ASSERT_NE(s1, nullptr);
    const double drop0 = s0->pressureInPa - s0->pressureOutPa;
    const double drop1 = s1->pressureInPa - s1->pressureOutPa;
    EXPECT_GT(drop1, drop0 + 50.0);
    EXPECT_NE(after.couplings().front().differencePa, before.couplings().front().differencePa);
}

TEST_F(PressureProfileModelTest, EveryCaseAndInvalidIndices)
{
    const int cases = int(document.result()->cases.size());
    for (int i = 0; i < cases; ++i) {
        PressureProfileModel model;
        model.rebuild(document.result(), i);
        EXPECT_FALSE(model.isEmpty()) << i;
        EXPECT_EQ(model.caseNames().size(), cases);
    }
    for (int bad : {-1, cases, cases + 5}) {
        PressureProfileModel model;
        model.rebuild(document.result(), bad);
        EXPECT_TRUE(model.isEmpty()) << bad;
        EXPECT_TRUE(model.couplings().isEmpty());
    }
    PressureProfileModel none;
    none.rebuild(std::nullopt, 0);
    EXPECT_TRUE(none.isEmpty());
    EXPECT_TRUE(none.caseNames().isEmpty());
}

} // namespace
} // namespace Airwright::Ui
