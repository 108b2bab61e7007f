#include "ProjectTestSupport.h"

#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/project/ProjectFileError.h"
#include "airwright/core/project/ProjectMigration.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

namespace Airwright::Core::Project {
using namespace TestSupport;

using Json = nlohmann::ordered_json;

TEST(ProjectMigration, StepTableReachesTheCurrentFormatVersion)
{
    EXPECT_EQ(ProjectMigration::currentVersion(), ProjectFile::kFormatVersion);
    EXPECT_EQ(ProjectMigration::oldestVersion(), 0);
    int expected = ProjectMigration::oldestVersion();
    for (const auto& step : ProjectMigration::steps()) {
        EXPECT_EQ(step.fromVersion, expected++); // no gaps, in order
        EXPECT_NE(step.apply, nullptr);
    }
}

TEST(ProjectMigration, DraftFileLoadsAsVersionOne)
{
    LoadReport report;
    const Project p = ProjectFile::load(dataPath("draft-version-0.awproj"), report);
    ASSERT_TRUE(report.migratedFromVersion.has_value());
    EXPECT_EQ(*report.migratedFromVersion, 0);
    ASSERT_EQ(report.warnings.size(), 1u);
    EXPECT_EQ(report.warnings[0].text(), "format_version: the file is format version 0; read as version 1, and "
                                         "saving writes version 1");
    // 2.5 m3/s and 2.25 m3/s in the draft are 9000 and 8100 m3/h.
    EXPECT_EQ(p.unit.airflows.supply, cubicMetresPerHour(9000.0));
    EXPECT_EQ(p.unit.airflows.extract, cubicMetresPerHour(8100.0));
    EXPECT_EQ(p.unit.airflows.basis, Chain::FlowBasis::StandardAir);
    ASSERT_EQ(p.unit.cases.size(), 1u);
    EXPECT_EQ(p.unit.cases[0].name, "winter");

    // Saved, it is a version-1 file with the new keys only.
    const auto saved = Json::parse(ProjectFile::serialize(p));
    EXPECT_EQ(saved["format_version"], 1);
    EXPECT_EQ(saved["airflows"]["supply_m3h"], 9000);
    EXPECT_FALSE(saved["airflows"].contains("supply_m3s"));
    EXPECT_FALSE(saved.contains("design_cases"));
    LoadReport again;
    EXPECT_TRUE(ProjectFile::parse(saved.dump(), again) == p);
    EXPECT_FALSE(again.migratedFromVersion.has_value());
}

TEST(ProjectMigration, DraftStepMovesKeysAndLeavesWrongTypesForTheReader)
{
    Json doc = Json::parse(R"({"format": "airwright-project", "format_version": 0,
                               "airflows": {"supply_m3s": "lots", "extract_m3s": 1.5, "basis": "actual"},
                               "design_cases": []})");
    ProjectMigration::migrate(doc, 0);
    EXPECT_EQ(doc["format_version"], 1);
    EXPECT_EQ(doc["airflows"]["supply_m3h"], "lots");
    EXPECT_EQ(doc["airflows"]["extract_m3h"], 5400.0);
    EXPECT_EQ(doc["airflows"]["basis"], "actual"); // an explicit basis is kept
    EXPECT_TRUE(doc.contains("cases"));
    EXPECT_FALSE(doc.contains("design_cases"));

    // Through the loader, the wrong type is reported under the key's new name.
    Json draft = Json::parse(readText(dataPath("draft-version-0.awproj")));
    draft["airflows"]["supply_m3s"] = "lots";
    LoadReport report;
    try {
        ProjectFile::parse(draft.dump(), report);
        FAIL() << "a bad draft flow was accepted";
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(), std::vector<std::string>{"airflows.supply_m3h: must be a number, got a string"});
    }
}

TEST(ProjectMigration, CurrentVersionIsLeftAlone)
{
    Json doc = demoJson();
    const Json before = doc;
    ProjectMigration::migrate(doc, ProjectFile::kFormatVersion);
    EXPECT_EQ(doc, before);
}

TEST(ProjectMigration, UnknownVersionsAreRefused)
{
    Json doc = demoJson();
    EXPECT_THROW(ProjectMigration::migrate(doc, -1), InputError);
    EXPECT_THROW(ProjectMigration::migrate(doc, ProjectFile::kFormatVersion + 1), InputError);
}

} // namespace Airwright::Core::Project
