#include "DemoProject.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/views/FindingsModel.h"

#include <gtest/gtest.h>

#include <map>

namespace Airwright::Ui {
namespace {

std::size_t totalFindings(const Core::Chain::UnitResult& result)
{
    std::size_t n = 0;
    for (const auto& c : result.cases)
        n += c.findings.size();
    return n;
}

void expectSortedBySeverity(const FindingsModel& model)
{
    auto rank = [](Core::Severity s) { return s == Core::Severity::Error ? 0 : s == Core::Severity::Warning ? 1 : 2; };
    for (std::size_t i = 1; i < model.rows().size(); ++i)
        EXPECT_LE(rank(model.rows()[i - 1].finding.severity), rank(model.rows()[i].finding.severity)) << i;
}

TEST(FindingsModel, RowsAreEveryFindingOfEveryCase)
{
    ProjectDocument document;
    TestSupport::DemoProject::open(document);
    ASSERT_TRUE(document.result().has_value());
    FindingsModel model;
    model.rebuild(document.result());
    EXPECT_EQ(std::size_t(model.rowCount()), totalFindings(*document.result()));
    expectSortedBySeverity(model);
    // The same findings, case by case (a multiset by case and code).
    std::map<std::pair<std::string, std::string>, int> expected;
    for (const auto& c : document.result()->cases)
        for (const auto& f : c.findings)
            ++expected[{c.caseName, f.code}];
    std::map<std::pair<std::string, std::string>, int> shown;
    for (int r = 0; r < model.rowCount(); ++r)
        ++shown[{model.data(model.index(r, FindingsModel::CaseColumn)).toString().toStdString(),
                 model.data(model.index(r, 0), FindingsModel::CodeRole).toString().toStdString()}];
    EXPECT_EQ(shown, expected);
}

TEST(FindingsModel, AnErrorComesFirstAndNamesItsSection)
{
    ProjectDocument document;
    TestSupport::DemoProject::open(document);
    // Take the supply fan out: every case gets the chain's "fan.missing" error.
    auto supply = document.project().unit.supply;
    std::erase_if(supply, [](const Core::Chain::Section& s) { return s.id == "supply-fan"; });
    document.setPaths(supply, document.project().unit.extract);
    ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    FindingsModel model;
    model.rebuild(document.result());
    ASSERT_GT(model.rowCount(), 0);
    EXPECT_EQ(std::size_t(model.rowCount()), totalFindings(*document.result()));
    EXPECT_EQ(model.rows().front().finding.severity, Core::Severity::Error);
    EXPECT_EQ(model.data(model.index(0, FindingsModel::SeverityColumn)).toString(), QStringLiteral("error"));
    expectSortedBySeverity(model);
    int missing = 0;
    for (const auto& row : model.rows())
        missing += row.finding.code == "fan.missing";
    EXPECT_EQ(missing, int(document.result()->cases.size()));
    // A finding about the whole unit says so in the section column.
    for (int r = 0; r < model.rowCount(); ++r) {
        if (model.data(model.index(r, 0), FindingsModel::SectionIdRole).toString().isEmpty()) {
            EXPECT_EQ(model.data(model.index(r, FindingsModel::SectionColumn)).toString(),
                      QStringLiteral("(whole unit)"));
        }
    }
}

TEST(FindingsModel, IconsAndTextMarkers)
{
    for (auto s : {Core::Severity::Error, Core::Severity::Warning, Core::Severity::Info}) {
        const QIcon icon = FindingsModel::severityIcon(s);
        EXPECT_FALSE(icon.isNull());
        EXPECT_FALSE(icon.pixmap(16, 16).toImage().isNull());
        EXPECT_FALSE(FindingsModel::severityText(s).isEmpty());
    }
    EXPECT_NE(FindingsModel::severityIcon(Core::Severity::Error).pixmap(16, 16).toImage(),
              FindingsModel::severityIcon(Core::Severity::Warning).pixmap(16, 16).toImage());
}

TEST(FindingsModel, NoResultNoRows)
{
    FindingsModel model;
    model.rebuild(std::nullopt);
    EXPECT_EQ(model.rowCount(), 0);
}

} // namespace
} // namespace Airwright::Ui
