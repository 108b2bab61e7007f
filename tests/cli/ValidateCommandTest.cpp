#include "airwright/cli/ValidateCommand.h"
#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

namespace Cli = Airwright::Cli;
namespace fs = std::filesystem;

namespace {

struct Result {
    int code;
    std::string out;
    std::string err;
};

Result validate(const std::vector<std::string>& args)
{
    Cli::ValidateCommand command;
    std::ostringstream out, err;
    const int code = command.run(args, out, err);
    return {code, out.str(), err.str()};
}

std::string demo()
{
    return (fs::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj").string();
}

std::string data(const std::string& name)
{
    return (fs::path(AIRWRIGHT_TEST_DATA_DIR) / "projects" / name).string();
}

std::vector<std::string> lines(const std::string& text)
{
    std::vector<std::string> result;
    std::istringstream in(text);
    for (std::string line; std::getline(in, line);)
        result.push_back(line);
    return result;
}

} // namespace

TEST(ValidateCommand, ValidDemoPrintsOneLineAndExitsZero)
{
    const Result r = validate({demo()});
    EXPECT_EQ(r.code, Cli::Done);
    // 8 supply sections and 3 in the extract path; the heat recovery's marker is
    // the same section and is not counted twice.
    EXPECT_EQ(r.out, demo() + ": valid (11 sections, 3 cases)\n");
    EXPECT_EQ(r.err, "");
}

TEST(ValidateCommand, SingularCountsReadAsSingular)
{
    const Result r = validate({data("minimal-valid.awproj")});
    EXPECT_EQ(r.code, Cli::Done);
    EXPECT_EQ(r.out, data("minimal-valid.awproj") + ": valid (2 sections, 1 case)\n");
}

TEST(ValidateCommand, WarningsGoToStderrAndTheFileIsStillValid)
{
    const std::string file = data("unknown-keys.awproj");
    const Result r = validate({file});
    EXPECT_EQ(r.code, Cli::Done);
    EXPECT_EQ(r.out, file + ": valid (1 section, 1 case)\n");
    EXPECT_EQ(lines(r.err), (std::vector<std::string>{file + ": warning: site.climate_zone: unknown key, ignored",
                                                      file + ": warning: supply[0].colour: unknown key, ignored"}));
}

TEST(ValidateCommand, InvalidFileListsEveryProblemOnePerLineAndExitsTwo)
{
    const std::string file = data("broken-values.awproj");
    const Result r = validate({file});
    EXPECT_EQ(r.code, Cli::InvalidInput);
    EXPECT_EQ(r.out, "");
    const auto errors = lines(r.err);
    ASSERT_EQ(errors.size(), 7u) << r.err;
    for (const auto& line : errors)
        EXPECT_EQ(line.rfind(file + ": ", 0), 0u) << line;
    EXPECT_EQ(errors[0], file + ": airflows.supply_m3h: must be positive");
    EXPECT_EQ(errors[1], file + ": supply[0].final_dp_Pa: must exceed initial_dp_Pa (150)");
    EXPECT_EQ(errors[5], file + ": cases[0].outdoor.rh_pct: 120 is outside 0 .. 100");
}

TEST(ValidateCommand, SyntaxErrorNamesLineAndColumn)
{
    const std::string file = data("broken-syntax.awproj");
    const Result r = validate({file});
    EXPECT_EQ(r.code, Cli::InvalidInput);
    const auto errors = lines(r.err);
    ASSERT_EQ(errors.size(), 1u);
    EXPECT_EQ(errors[0].rfind(file + ": line 5, column ", 0), 0u) << errors[0];
}

TEST(ValidateCommand, OlderFormatIsValidWithAWarning)
{
    const std::string file = data("draft-version-0.awproj");
    const Result r = validate({file});
    EXPECT_EQ(r.code, Cli::Done);
    EXPECT_EQ(r.out, file + ": valid (4 sections, 1 case)\n");
    EXPECT_NE(r.err.find("format version 0"), std::string::npos) << r.err;
}

TEST(ValidateCommand, NewerFormatIsRefused)
{
    const Result r = validate({data("newer-version.awproj")});
    EXPECT_EQ(r.code, Cli::InvalidInput);
    EXPECT_NE(r.err.find("format version 3"), std::string::npos) << r.err;
}

TEST(ValidateCommand, UnreadableFileIsOneClearLine)
{
    const std::string file = (fs::temp_directory_path() / "airwright-no-such-file.awproj").string();
    const Result r = validate({file});
    EXPECT_EQ(r.code, Cli::InvalidInput);
    EXPECT_EQ(r.err, file + ": cannot open: No such file or directory\n");
    EXPECT_EQ(r.out, "");
}

TEST(ValidateCommand, ArgumentsAreChecked)
{
    EXPECT_THROW(validate({}), Airwright::Core::InputError);                   // no FILE
    EXPECT_THROW(validate({demo(), demo()}), Airwright::Core::InputError);     // two files
    EXPECT_THROW(validate({"--strict", demo()}), Airwright::Core::InputError); // no such option
}

TEST(ValidateCommand, HelpDescribesTheCommand)
{
    const std::string help = Cli::ValidateCommand().help();
    for (const char* part :
         {"usage: airwright-cli validate FILE", "valid (N sections, M cases)", "exit codes", "docs/project-format.md"})
        EXPECT_NE(help.find(part), std::string::npos) << part;
    EXPECT_EQ(Cli::ValidateCommand().name(), "validate");
}

TEST(ValidateCommand, IsRegisteredInTheApplication)
{
    Cli::CliApplication app;
    std::ostringstream out, err;
    const int code = app.run({"validate", demo()}, out, err);
    EXPECT_EQ(code, Cli::Done) << err.str();
    EXPECT_EQ(out.str(), demo() + ": valid (11 sections, 3 cases)\n");
    std::ostringstream noArgsOut, noArgsErr;
    EXPECT_EQ(app.run({"validate"}, noArgsOut, noArgsErr), Cli::InvalidInput);
    EXPECT_NE(noArgsErr.str().find("missing FILE"), std::string::npos);
}
