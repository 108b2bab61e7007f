#include "airwright/cli/ArgumentList.h"
#include "airwright/core/InputError.h"

#include <gtest/gtest.h>

#include <cmath>
#include <string>
#include <vector>

using Airwright::Cli::ArgumentList;
using Airwright::Core::InputError;

namespace {

// The message of the InputError that parse() throws, or "" when it succeeds.
std::string parseError(ArgumentList& list, const std::vector<std::string>& args)
{
    try {
        list.parse(args);
    } catch (const InputError& e) {
        return e.what();
    }
    return {};
}

ArgumentList tdbList()
{
    ArgumentList list;
    list.addOption("tdb").addOption("rh").addFlag("verbose");
    return list;
}

} // namespace

TEST(ArgumentList, OptionValueAsNextArgumentOrAfterEquals)
{
    ArgumentList list = tdbList();
    list.parse({"--tdb", "20", "--rh=50"});
    EXPECT_EQ(list.value("tdb"), "20");
    EXPECT_EQ(list.value("rh"), "50");
    EXPECT_FALSE(list.has("verbose"));
    EXPECT_EQ(list.value("verbose"), std::nullopt);
}

TEST(ArgumentList, NegativeNumberIsAValueNotAnOption)
{
    ArgumentList list = tdbList();
    list.parse({"--tdb", "-5.5"});
    ASSERT_TRUE(list.number("tdb").has_value());
    EXPECT_DOUBLE_EQ(*list.number("tdb"), -5.5);
}

TEST(ArgumentList, EmptyValueAfterEqualsIsKeptAndRejectedAsNumber)
{
    ArgumentList list = tdbList();
    list.parse({"--tdb="});
    EXPECT_EQ(list.value("tdb"), "");
    EXPECT_THROW((void)list.number("tdb"), InputError);
}

TEST(ArgumentList, FlagsAndPositionals)
{
    ArgumentList list = tdbList();
    list.allowPositionals(2);
    list.parse({"a.json", "--verbose", "--", "--not-an-option"});
    EXPECT_TRUE(list.has("verbose"));
    EXPECT_EQ(list.positionals(), (std::vector<std::string>{"a.json", "--not-an-option"}));
}

TEST(ArgumentList, ParsingAgainForgetsTheFirstCommandLine)
{
    ArgumentList list = tdbList();
    list.parse({"--tdb", "20", "--verbose"});
    list.parse({"--rh", "40"});
    EXPECT_FALSE(list.has("tdb"));
    EXPECT_FALSE(list.has("verbose"));
    EXPECT_EQ(list.value("rh"), "40");
}

TEST(ArgumentList, AbsentNumberIsNullopt)
{
    ArgumentList list = tdbList();
    list.parse({});
    EXPECT_EQ(list.number("tdb"), std::nullopt);
}

// Invalid command lines: each must throw InputError whose message contains the
// given text (naming the offending argument).
struct BadCommandLine {
    std::vector<std::string> args;
    std::string messagePart;
};

class ArgumentListRejects : public testing::TestWithParam<BadCommandLine> {};

TEST_P(ArgumentListRejects, WithAMessageNamingTheArgument)
{
    ArgumentList list = tdbList();
    const std::string message = parseError(list, GetParam().args);
    ASSERT_FALSE(message.empty()) << "accepted an invalid command line";
    EXPECT_NE(message.find(GetParam().messagePart), std::string::npos) << message;
}

INSTANTIATE_TEST_SUITE_P(
    Cases, ArgumentListRejects,
    testing::Values(BadCommandLine{{"--tdp", "20"}, "unknown option '--tdp'"},
                    BadCommandLine{{"--tdp=20"}, "unknown option '--tdp'"},
                    BadCommandLine{{"--tdb"}, "--tdb needs a value"},
                    BadCommandLine{{"--tdb", "--rh", "50"}, "--tdb needs a value"},
                    BadCommandLine{{"--tdb", "20", "--tdb", "21"}, "--tdb is given more than once"},
                    BadCommandLine{{"--verbose=yes"}, "--verbose takes no value"},
                    BadCommandLine{{"stray"}, "unexpected argument 'stray'"},
                    BadCommandLine{{"-x"}, "unexpected argument '-x'"},
                    BadCommandLine{{"--=5"}, "unknown option '--'"}),
    [](const testing::TestParamInfo<BadCommandLine>& param) { return "Case" + std::to_string(param.index); });

// "--" alone is valid: it only ends the options.
TEST(ArgumentList, DoubleDashAloneIsValid)
{
    ArgumentList list = tdbList();
    EXPECT_EQ(parseError(list, {"--"}), "");
}

struct NumberText {
    std::string text;
    bool valid;
    double value; // when valid
};

class ArgumentListNumber : public testing::TestWithParam<NumberText> {};

TEST_P(ArgumentListNumber, IsStrictAndLocaleIndependent)
{
    const NumberText& c = GetParam();
    if (c.valid) {
        // Exact decimal conversion of short literals: 1e-12 relative is ample.
        EXPECT_NEAR(ArgumentList::parseNumber(c.text, "--tdb"), c.value, 1e-12 * (1.0 + std::abs(c.value)));
        return;
    }
    try {
        (void)ArgumentList::parseNumber(c.text, "--tdb");
        ADD_FAILURE() << "accepted '" << c.text << "'";
    } catch (const InputError& e) {
        const std::string message = e.what();
        EXPECT_NE(message.find("--tdb"), std::string::npos) << message;
        EXPECT_NE(message.find("'" + c.text + "'"), std::string::npos) << message;
    }
}

INSTANTIATE_TEST_SUITE_P(
    Cases, ArgumentListNumber,
    testing::Values(NumberText{"20", true, 20.0}, NumberText{"-5.5", true, -5.5}, NumberText{"+3", true, 3.0},
                    NumberText{"1e3", true, 1000.0}, NumberText{"0.25", true, 0.25}, NumberText{".5", true, 0.5},
                    NumberText{"101325", true, 101325.0}, NumberText{"", false, 0.0}, NumberText{"20abc", false, 0.0},
                    NumberText{"20,5", false, 0.0}, NumberText{" 20", false, 0.0}, NumberText{"20 ", false, 0.0},
                    NumberText{"nan", false, 0.0}, NumberText{"NaN", false, 0.0}, NumberText{"inf", false, 0.0},
                    NumberText{"-inf", false, 0.0}, NumberText{"infinity", false, 0.0}, NumberText{"1e999", false, 0.0},
                    NumberText{"0x10", false, 0.0}, NumberText{"+", false, 0.0}, NumberText{"+-3", false, 0.0},
                    NumberText{"--3", false, 0.0}, NumberText{"1e", false, 0.0}, NumberText{"abc", false, 0.0}),
    [](const testing::TestParamInfo<NumberText>& param) { return "Case" + std::to_string(param.index); });
