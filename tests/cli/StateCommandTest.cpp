#include "airwright/cli/StateCommand.h"
#include "airwright/cli/CliApplication.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>
#include <nlohmann/json.hpp>

#include <algorithm>
#include <sstream>
#include <string>
#include <vector>

using namespace Airwright::Core;
using Airwright::Cli::CliApplication;
namespace Cli = Airwright::Cli;
namespace Psychro = Airwright::Core::Psychro;

namespace {

struct Result {
    int code;
    std::string out;
    std::string err;
};

Result runState(const std::vector<std::string>& args)
{
    std::vector<std::string> commandLine;
    commandLine.reserve(args.size() + 1);
    commandLine.emplace_back("state");
    for (const std::string& arg : args)
        commandLine.push_back(arg);
    CliApplication app;
    std::ostringstream out, err;
    const int code = app.run(commandLine, out, err);
    return {code, out.str(), err.str()};
}

nlohmann::json runJson(std::vector<std::string> args)
{
    args.push_back("--format");
    args.push_back("json");
    const Result result = runState(args);
    EXPECT_EQ(result.code, Cli::Done) << result.err;
    EXPECT_EQ(result.err, "");
    return nlohmann::json::parse(result.out);
}

std::size_t lineCount(const std::string& text)
{
    return static_cast<std::size_t>(std::count(text.begin(), text.end(), '\n'));
}

} // namespace

TEST(StateCommand, HelpIsAFullUsageText)
{
    CliApplication app;
    std::ostringstream out, err;
    EXPECT_EQ(app.run({"state", "--help"}, out, err), Cli::Done);
    for (const char* part : {"usage: airwright-cli state", "--tdb", "--rh", "--twb", "--tdp", "--w", "--altitude",
                             "--pressure", "--format", "exit codes"})
        EXPECT_NE(out.str().find(part), std::string::npos) << part;
    EXPECT_EQ(Cli::StateCommand().name(), "state");
}

TEST(StateCommand, TextIsOneLinePerPropertyWithUnits)
{
    const Result result = runState({"--tdb", "20", "--rh", "50"});
    ASSERT_EQ(result.code, Cli::Done) << result.err;
    EXPECT_EQ(result.err, "");
    EXPECT_EQ(lineCount(result.out), 10u);
    for (const char* part :
         {"dry-bulb temperature", "20.00 °C", "relative humidity", "50.0 %", "g/kg dry air", "dew-point temperature",
          "wet-bulb temperature", "kJ/kg dry air", "m3/kg dry air", "kg/m3", "101325 Pa"})
        EXPECT_NE(result.out.find(part), std::string::npos) << part << "\n" << result.out;
}

TEST(StateCommand, JsonHasExactlyTheDocumentedKeysInOrder)
{
    const Result result = runState({"--tdb=20", "--rh=50", "--format=json"});
    ASSERT_EQ(result.code, Cli::Done) << result.err;
    const auto json = nlohmann::ordered_json::parse(result.out);
    std::vector<std::string> keys;
    for (const auto& item : json.items()) {
        keys.push_back(item.key());
        EXPECT_TRUE(item.value().is_number()) << item.key();
    }
    EXPECT_EQ(keys, (std::vector<std::string>{"tdb_C", "rh_pct", "w_gkg", "tdp_C", "twb_C", "h_kJkg", "v_m3kg",
                                              "rho_kgm3", "pws_Pa", "p_Pa"}));
}

TEST(StateCommand, MatchesPsychroLibAtRoomConditions)
{
    // PsychroLib 2.5.0 (npm psychrolib 1.1.1), SI, at 20 C, 50 %, 101325 Pa: the row
    // "101325,20,50,..." of tests/data/psychro-reference-grid.csv. Tolerances as in
    // tests/core/psychro/ReferenceGridTest.cpp, in the CLI's units.
    const auto json = runJson({"--tdb", "20", "--rh", "50"});
    EXPECT_NEAR(json["w_gkg"].get<double>(), 7.261737207, 1e-4); // 1e-7 kg/kg
    EXPECT_NEAR(json["tdp_C"].get<double>(), 9.272392288, 1e-3);
    EXPECT_NEAR(json["twb_C"].get<double>(), 13.78336966, 2e-3);  // PsychroLib's bisection stops at 1e-3 K
    EXPECT_NEAR(json["h_kJkg"].get<double>(), 38.55174138, 5e-3); // 5 J/kg
    EXPECT_NEAR(json["v_m3kg"].get<double>(), 0.8401563479, 5e-7);
    EXPECT_NEAR(json["pws_Pa"].get<double>(), 2338.8037, 1e-5);
    EXPECT_EQ(json["p_Pa"].get<double>(), 101325.0);
}

// Every second property, pressure and altitude: the output must be what the core
// functions give for the same state (this checks the command's wiring and unit
// conversions; the physics itself is checked in tests/core/psychro).
struct StateCase {
    std::vector<std::string> args;
    double tdbC;
    double pressurePa; // expected pressure, or 0 for the standard atmosphere at altitudeM
    double altitudeM;
    const char* property;
    double value;
};

class StateCommandValues : public testing::TestWithParam<StateCase> {};

TEST_P(StateCommandValues, EqualThePsychrometricsFunctions)
{
    const StateCase& c = GetParam();
    const auto json = runJson(c.args);
    ASSERT_TRUE(json.is_object());

    const Pressure p =
        c.pressurePa > 0.0 ? pascals(c.pressurePa) : Psychro::standardPressureAtAltitude(metres(c.altitudeM));
    const AbsoluteTemperature tdb = celsius(c.tdbC);
    const std::string property = c.property;
    HumidityRatio w = kilogramsPerKilogram(0.0);
    if (property == "rh")
        w = Psychro::humidityRatioFromRelativeHumidity(tdb, percent(c.value), p);
    else if (property == "twb")
        w = Psychro::humidityRatioFromWetBulb(tdb, celsius(c.value), p);
    else if (property == "tdp")
        w = Psychro::humidityRatioFromVapourPressure(Psychro::saturationPressure(celsius(c.value)), p);
    else
        w = gramsPerKilogram(c.value);

    // Same functions on the same inputs: only iteration tolerances differ, so the
    // tolerances are far below the printed text precision.
    EXPECT_NEAR(json["p_Pa"].get<double>(), toPascals(p), 1e-6);
    EXPECT_NEAR(json["tdb_C"].get<double>(), c.tdbC, 1e-9);
    EXPECT_NEAR(json["w_gkg"].get<double>(), toGramsPerKilogram(w), 1e-6);
    EXPECT_NEAR(json["rh_pct"].get<double>(), toPercent(Psychro::relativeHumidityFromHumidityRatio(tdb, w, p)), 1e-6);
    EXPECT_NEAR(json["tdp_C"].get<double>(), toCelsius(Psychro::dewPointFromHumidityRatio(w, p)), 1e-4);
    EXPECT_NEAR(json["twb_C"].get<double>(), toCelsius(Psychro::wetBulbFromHumidityRatio(tdb, w, p)), 1e-4);
    EXPECT_NEAR(json["h_kJkg"].get<double>(), toKilojoulesPerKilogram(Psychro::enthalpy(tdb, w)), 1e-6);
    EXPECT_NEAR(json["v_m3kg"].get<double>(), toCubicMetresPerKilogram(Psychro::specificVolume(tdb, w, p)), 1e-9);
    EXPECT_NEAR(json["rho_kgm3"].get<double>(), toKilogramsPerCubicMetre(Psychro::density(tdb, w, p)), 1e-9);
    EXPECT_NEAR(json["pws_Pa"].get<double>(), toPascals(Psychro::saturationPressure(tdb)), 1e-6);

    // The given property comes back out.
    if (property == "rh")
        EXPECT_NEAR(json["rh_pct"].get<double>(), c.value, 1e-6);
    else if (property == "twb")
        EXPECT_NEAR(json["twb_C"].get<double>(), c.value, 2e-3);
    else if (property == "tdp")
        EXPECT_NEAR(json["tdp_C"].get<double>(), c.value, 1e-4);
    else
        EXPECT_NEAR(json["w_gkg"].get<double>(), c.value, 1e-9);
}

INSTANTIATE_TEST_SUITE_P(
    Cases, StateCommandValues,
    testing::Values(StateCase{{"--tdb", "20", "--rh", "50"}, 20.0, 101325.0, 0.0, "rh", 50.0},
                    StateCase{{"--tdb", "32", "--twb", "22"}, 32.0, 101325.0, 0.0, "twb", 22.0},
                    StateCase{{"--tdb", "25", "--tdp", "12.5"}, 25.0, 101325.0, 0.0, "tdp", 12.5},
                    StateCase{{"--tdb", "26", "--w", "10.5"}, 26.0, 101325.0, 0.0, "w", 10.5},
                    StateCase{{"--tdb", "-10", "--rh", "80", "--pressure", "84000"}, -10.0, 84000.0, 0.0, "rh", 80.0},
                    StateCase{{"--tdb", "-5", "--tdp", "-12"}, -5.0, 101325.0, 0.0, "tdp", -12.0},
                    StateCase{{"--tdb", "30", "--rh", "40", "--altitude", "1600"}, 30.0, 0.0, 1600.0, "rh", 40.0},
                    StateCase{{"--tdb", "15", "--rh", "100"}, 15.0, 101325.0, 0.0, "rh", 100.0}),
    [](const testing::TestParamInfo<StateCase>& param) { return "Case" + std::to_string(param.index); });

TEST(StateCommand, DryAirHasNoDewPoint)
{
    // Dry air (W = 0) has no dew point; ASHRAE eq. 5 ends at -100 C. Every other
    // property exists: the wet bulb of dry air at 20 C lies near 6 C.
    for (const auto& args :
         std::vector<std::vector<std::string>>{{"--tdb", "20", "--rh", "0"}, {"--tdb", "20", "--w", "0"}}) {
        const auto json = runJson(args);
        EXPECT_TRUE(json["tdp_C"].is_null());
        EXPECT_EQ(json["w_gkg"].get<double>(), 0.0);
        EXPECT_NEAR(
            json["twb_C"].get<double>(),
            toCelsius(Psychro::wetBulbFromHumidityRatio(celsius(20.0), kilogramsPerKilogram(0.0), pascals(101325.0))),
            1e-9);
    }
    const Result text = runState({"--tdb", "20", "--rh", "0"});
    EXPECT_EQ(text.code, Cli::Done);
    EXPECT_NE(text.out.find("dew-point temperature   none"), std::string::npos) << text.out;
}

TEST(StateCommand, AltitudeZeroIsTheStandardSeaLevelPressure)
{
    // ASHRAE Handbook - Fundamentals 2017, ch. 1, eq. 3: 101325 Pa at Z = 0.
    const auto json = runJson({"--tdb", "20", "--rh", "50", "--altitude", "0"});
    EXPECT_NEAR(json["p_Pa"].get<double>(), 101325.0, 1e-6);
}

// Invalid input: exit code 2, nothing on stdout, exactly one line on stderr that
// starts with "error: " and contains the given text.
struct BadState {
    std::vector<std::string> args;
    std::string messagePart;
};

class StateCommandRejects : public testing::TestWithParam<BadState> {};

TEST_P(StateCommandRejects, WithExitCode2AndOneLine)
{
    const Result result = runState(GetParam().args);
    EXPECT_EQ(result.code, Cli::InvalidInput);
    EXPECT_EQ(result.out, "");
    EXPECT_EQ(lineCount(result.err), 1u) << result.err;
    EXPECT_EQ(result.err.rfind("error: ", 0), 0u) << result.err;
    EXPECT_NE(result.err.find(GetParam().messagePart), std::string::npos) << result.err;
}

INSTANTIATE_TEST_SUITE_P(
    Cases, StateCommandRejects,
    testing::Values(
        BadState{{"--rh", "50"}, "missing --tdb"}, BadState{{"--tdb", "20"}, "give one of --rh, --twb, --tdp or --w"},
        BadState{{"--tdb", "20", "--rh", "50", "--twb", "15"}, "give only one of"},
        BadState{{"--tdb", "20", "--tdp", "5", "--w", "5"}, "give only one of"},
        BadState{{"--tdb", "20", "--rh", "120"}, "relative humidity 120 % is outside the allowed range 0 .. 100 %"},
        BadState{{"--tdb", "20", "--rh", "-1"}, "relative humidity -1 %"},
        BadState{{"--tdb", "20", "--twb", "25"}, "wet-bulb temperature 25 °C is outside the allowed range"},
        BadState{{"--tdb", "20", "--twb", "1"}, "wet-bulb temperature 1 °C is outside the allowed range"},
        BadState{{"--tdb", "20", "--tdp", "20.5"}, "dew-point temperature 20.5 °C"},
        BadState{{"--tdb", "20", "--w", "30"}, "humidity ratio 30 g/kg is outside the allowed range 0 .. 14."},
        BadState{{"--tdb", "20", "--w", "-1"}, "humidity ratio -1 g/kg"},
        BadState{{"--tdb", "250", "--rh", "50"},
                 "dry-bulb temperature 250 °C is outside the allowed range -100 .. 200 °C"},
        BadState{{"--tdb", "20abc", "--rh", "50"}, "--tdb expects a number"},
        BadState{{"--tdb", "20", "--rh", "nan"}, "--rh expects a number"},
        BadState{{"--tdb", "", "--rh", "50"}, "--tdb expects a number"},
        BadState{{"--tdb", "20,5", "--rh", "50"}, "'20,5'"},
        BadState{{"--tdb", "20", "--rh", "50", "--rhh", "3"}, "unknown option '--rhh'"},
        BadState{{"--tdb", "20", "--rh"}, "--rh needs a value"},
        BadState{{"--tdb", "20", "--rh", "50", "--altitude", "500", "--pressure", "95000"},
                 "either --altitude or --pressure"},
        BadState{{"--tdb", "20", "--rh", "50", "--altitude", "20000"}, "altitude 20000 m is outside"},
        BadState{{"--tdb", "20", "--rh", "50", "--pressure", "101.325"}, "pressure 101.325 Pa is outside"},
        BadState{{"--tdb", "20", "--rh", "50", "--format", "xml"}, "--format must be text or json, got 'xml'"},
        BadState{{"--tdb", "20", "--rh", "50", "extra"}, "unexpected argument 'extra'"}),
    [](const testing::TestParamInfo<BadState>& param) { return "Case" + std::to_string(param.index); });

// Valid rows at the edges of the ranges above, so the table of rejections is not
// passing merely because everything is rejected.
TEST(StateCommand, AcceptsTheEdgesOfTheRanges)
{
    for (const auto& args : std::vector<std::vector<std::string>>{{"--tdb", "20", "--rh", "100"},
                                                                  {"--tdb", "20", "--twb", "20"},
                                                                  {"--tdb", "20", "--tdp", "20"},
                                                                  {"--tdb", "-5", "--rh", "10", "--altitude", "-500"},
                                                                  {"--tdb", "20", "--rh", "50", "--altitude", "11000"},
                                                                  {"--tdb", "20", "--rh", "50", "--pressure", "120000"},
                                                                  {"--tdb", "+20", "--rh", "50", "--format", "text"}}) {
        const Result result = runState(args);
        EXPECT_EQ(result.code, Cli::Done) << result.err;
    }
}
