#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"

#include <gtest/gtest.h>

#include <sstream>

using Airwright::Cli::CliApplication;

TEST(CliApplication, NoArgumentsIsInvalidInputWithUsage)
{
    CliApplication app;
    std::ostringstream out, err;
    EXPECT_EQ(app.run({}, out, err), Airwright::Cli::InvalidInput);
    EXPECT_NE(err.str().find("usage: airwright-cli"), std::string::npos);
}

TEST(CliApplication, UnknownCommandIsNamed)
{
    CliApplication app;
    std::ostringstream out, err;
    EXPECT_EQ(app.run({"frobnicate"}, out, err), Airwright::Cli::InvalidInput);
    EXPECT_NE(err.str().find("unknown command 'frobnicate'"), std::string::npos);
}

TEST(CliApplication, HelpListsCommands)
{
    CliApplication app;
    std::ostringstream out, err;
    EXPECT_EQ(app.run({"--help"}, out, err), Airwright::Cli::Done);
    EXPECT_NE(out.str().find("state"), std::string::npos);
}
