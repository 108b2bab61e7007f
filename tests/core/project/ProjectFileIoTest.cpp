#include "ProjectTestSupport.h"

#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/project/ProjectFileError.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>
#include <string>
#include <vector>

namespace Airwright::Core::Project {
using namespace TestSupport;

namespace fs = std::filesystem;

namespace {

Project demo()
{
    LoadReport report;
    return ProjectFile::load(demoPath(), report);
}

std::vector<std::string> namesIn(const fs::path& folder)
{
    std::vector<std::string> names;
    for (const auto& entry : fs::directory_iterator(folder))
        names.push_back(entry.path().filename().string());
    std::sort(names.begin(), names.end());
    return names;
}

std::vector<std::string> loadErrors(const fs::path& file)
{
    LoadReport report;
    try {
        ProjectFile::load(file, report);
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.file(), file);
        return e.errors();
    }
    return {};
}

} // namespace

TEST(ProjectFileIo, MissingFileNamesTheFileAndTheReason)
{
    ScratchFolder folder;
    const auto file = folder / "absent.awproj";
    EXPECT_EQ(loadErrors(file), std::vector<std::string>{file.string() + ": cannot open: No such file or directory"});
}

TEST(ProjectFileIo, AFolderIsNotAProjectFile)
{
    ScratchFolder folder;
    EXPECT_EQ(loadErrors(folder.path()),
              std::vector<std::string>{folder.path().string() + ": cannot open: is a folder, not a project file"});
}

TEST(ProjectFileIo, FileOverTheLimitIsRefusedWithoutReadingIt)
{
    ScratchFolder folder;
    const auto file = folder / "huge.awproj";
    writeText(file, "{");
    fs::resize_file(file, ProjectFile::kMaxFileBytes + 1); // sparse: cheap to make
    EXPECT_EQ(loadErrors(file),
              std::vector<std::string>{file.string() + ": file is 16777217 bytes; project files are limited to "
                                                       "16 MiB (16777216 bytes)"});
}

TEST(ProjectFileIo, TextOverTheLimitIsRefusedByParseToo)
{
    const std::string text(ProjectFile::kMaxFileBytes + 1, ' ');
    LoadReport report;
    try {
        ProjectFile::parse(text, report);
        FAIL() << "oversized text accepted";
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(), std::vector<std::string>{"file is 16777217 bytes; project files are limited to 16 MiB "
                                                       "(16777216 bytes)"});
    }
}

TEST(ProjectFileIo, FileExactlyAtTheLimitIsRead)
{
    ScratchFolder folder;
    const auto file = folder / "padded.awproj";
    std::string text = readText(demoPath());
    text.resize(ProjectFile::kMaxFileBytes, ' '); // trailing whitespace is valid JSON
    writeText(file, text);
    ASSERT_EQ(fs::file_size(file), ProjectFile::kMaxFileBytes);
    LoadReport report;
    EXPECT_TRUE(ProjectFile::load(file, report) == demo());
}

TEST(ProjectFileIo, SaveKeepsThePreviousVersionAndLeavesNoTemporaryFiles)
{
    ScratchFolder folder;
    const auto file = folder / "library.awproj";
    Project first = demo();
    ProjectFile::save(first, file);
    EXPECT_EQ(namesIn(folder.path()), std::vector<std::string>{"library.awproj"});

    Project second = first;
    second.info.revision = "B";
    ProjectFile::save(second, file);
    EXPECT_EQ(namesIn(folder.path()), (std::vector<std::string>{"library.awproj", "library.awproj.bak"}));
    LoadReport report;
    EXPECT_TRUE(ProjectFile::load(file, report) == second);
    EXPECT_TRUE(ProjectFile::load(folder / "library.awproj.bak", report) == first);

    // A third save replaces the backup with the second version.
    Project third = second;
    third.info.revision = "C";
    ProjectFile::save(third, file);
    EXPECT_EQ(namesIn(folder.path()), (std::vector<std::string>{"library.awproj", "library.awproj.bak"}));
    EXPECT_TRUE(ProjectFile::load(folder / "library.awproj.bak", report) == second);
    EXPECT_EQ(readText(file), ProjectFile::serialize(third));
}

TEST(ProjectFileIo, SaveIntoAMissingFolderNamesThePathAndTheSystemMessage)
{
    ScratchFolder folder;
    const auto file = folder / "no-such-folder" / "x.awproj";
    try {
        ProjectFile::save(demo(), file);
        FAIL() << "save into a missing folder succeeded";
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(), std::vector<std::string>{file.string() + ": cannot create a temporary file in its "
                                                                       "folder: No such file or directory"});
        EXPECT_EQ(e.file(), file);
    }
    EXPECT_EQ(namesIn(folder.path()), std::vector<std::string>{});
}

TEST(ProjectFileIo, SaveOverAFolderIsRefused)
{
    ScratchFolder folder;
    fs::create_directory(folder / "taken");
    EXPECT_THROW(ProjectFile::save(demo(), folder / "taken"), ProjectFileError);
    EXPECT_TRUE(fs::is_directory(folder / "taken"));
}

TEST(ProjectFileIo, InvalidProjectIsNotSavedAndTheGoodFileStays)
{
    ScratchFolder folder;
    const auto file = folder / "library.awproj";
    const Project good = demo();
    ProjectFile::save(good, file);
    Project bad = good;
    bad.unit.cases[0].outdoorHumidity = percent(130.0);
    try {
        ProjectFile::save(bad, file);
        FAIL() << "an invalid project was saved";
    } catch (const ProjectFileError& e) {
        EXPECT_EQ(e.errors(), (std::vector<std::string>{
                                  file.string() + ": not saved: the project has problems that would stop it loading",
                                  file.string() + ": cases[0].outdoor.rh_pct: 130 is outside 0 .. 100"}));
    }
    EXPECT_EQ(namesIn(folder.path()), std::vector<std::string>{"library.awproj"});
    LoadReport report;
    EXPECT_TRUE(ProjectFile::load(file, report) == good);
}

TEST(ProjectFileIo, SmallDataFilesLoadOrFailAsDocumented)
{
    LoadReport report;
    const Project minimal = ProjectFile::load(dataPath("minimal-valid.awproj"), report);
    EXPECT_TRUE(report.warnings.empty());
    EXPECT_EQ(minimal.unit.supply.size(), 2u);
    EXPECT_TRUE(minimal.unit.extract.empty());
    // Left-out keys take the model's defaults.
    EXPECT_TRUE(minimal.unit.casing == Chain::Casing{});
    EXPECT_TRUE(minimal.unit.supply[1].spec == Chain::SectionSpec{Sections::Fan{}});

    ProjectFile::load(dataPath("unknown-keys.awproj"), report);
    ASSERT_EQ(report.warnings.size(), 2u);
    EXPECT_EQ(report.warnings[0].text(), "site.climate_zone: unknown key, ignored");
    EXPECT_EQ(report.warnings[1].text(), "supply[0].colour: unknown key, ignored");

    const auto file = dataPath("broken-values.awproj");
    const std::string f = file.string() + ": ";
    EXPECT_EQ(
        loadErrors(file),
        (std::vector<std::string>{
            f + "airflows.supply_m3h: must be positive", f + "supply[0].final_dp_Pa: must exceed initial_dp_Pa (150)",
            f + "supply[2].type: unknown section type 'heatr' (allowed: damper, filter, heating_coil_water, "
                "heating_coil_electric, cooling_coil, humidifier, fan, passive, mixing, heat_recovery, coupled)",
            f + "supply[3].id: duplicate id 'filter' (first used at supply[0])",
            f + "supply[1]: heat_recovery 'hr' couples both paths: the extract path needs {\"id\": \"hr\", "
                "\"type\": \"coupled\"} where its extract side sits",
            f + "cases[0].outdoor.rh_pct: 120 is outside 0 .. 100",
            f + "cases[0].supply_tdb_C: must be a number, got a string"}));

    const auto syntax = loadErrors(dataPath("broken-syntax.awproj"));
    ASSERT_EQ(syntax.size(), 1u);
    EXPECT_EQ(syntax[0].rfind(dataPath("broken-syntax.awproj").string() + ": line 5, column ", 0), 0u) << syntax[0];
    EXPECT_NE(syntax[0].find("syntax error while parsing object"), std::string::npos) << syntax[0];

    const auto newer = loadErrors(dataPath("newer-version.awproj"));
    ASSERT_EQ(newer.size(), 1u);
    EXPECT_NE(newer[0].find("format version 3"), std::string::npos);
    EXPECT_NE(newer[0].find("up to 1"), std::string::npos);
}

} // namespace Airwright::Core::Project
