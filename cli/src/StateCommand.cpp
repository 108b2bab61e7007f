#include "airwright/cli/StateCommand.h"

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <nlohmann/json.hpp>

#include <array>
#include <optional>
#include <ostream>
#include <string>

namespace Airwright::Cli {

using namespace Airwright::Core;
using Psychro::MoistAirState;

namespace {

constexpr double kStandardPressurePa = 101325.0;
// The standard atmosphere between -500 m and 11000 m spans about 22600 .. 107500 Pa;
// the limits also catch a pressure typed in kPa or bar.
constexpr double kMinPressurePa = 20000.0;
constexpr double kMaxPressurePa = 120000.0;

constexpr std::array kSecondProperties{"rh", "twb", "tdp", "w"};

std::string range(double low, double high, const std::string& unit)
{
    return formatNumber(low) + " .. " + formatNumber(high) + " " + unit;
}

void checkRange(const std::string& quantity, double value, double low, double high, const std::string& unit)
{
    if (!(value >= low && value <= high))
        throw InputError(quantity, value, unit, range(low, high, unit));
}

Pressure pressureFrom(const ArgumentList& args)
{
    const auto altitude = args.number("altitude");
    const auto pressure = args.number("pressure");
    if (altitude && pressure)
        throw InputError("give either --altitude or --pressure, not both");
    if (altitude) {
        return Psychro::standardPressureAtAltitude(metres(*altitude));
    }
    if (pressure) {
        checkRange("pressure", *pressure, kMinPressurePa, kMaxPressurePa, "Pa");
        return pascals(*pressure);
    }
    return pascals(kStandardPressurePa);
}

MoistAirState stateFrom(const ArgumentList& args, Pressure p)
{
    const auto tdbC = args.number("tdb");
    if (!tdbC)
        throw InputError("missing --tdb (dry-bulb temperature, °C)");
    checkRange("dry-bulb temperature", *tdbC, Psychro::kMinTemperatureC, Psychro::kMaxTemperatureC, "°C");

    std::string given;
    for (const char* name : kSecondProperties) {
        if (!args.has(name))
            continue;
        if (!given.empty())
            throw InputError("give only one of --rh, --twb, --tdp, --w (got --" + given + " and --" + name + ")");
        given = name;
    }
    if (given.empty())
        throw InputError("missing the second property: give one of --rh, --twb, --tdp or --w");

    // The core checks the second property against the state (rh 0 .. 100 %, wet bulb
    // and dew point not above the dry bulb, W up to saturation) and names the range.
    const AbsoluteTemperature tdb = celsius(*tdbC);
    const double value = *args.number(given);
    if (given == "rh")
        return MoistAirState::fromDryBulbRelativeHumidity(tdb, percent(value), p);
    if (given == "twb")
        return MoistAirState::fromDryBulbWetBulb(tdb, celsius(value), p);
    if (given == "tdp")
        return MoistAirState::fromDryBulbDewPoint(tdb, celsius(value), p);
    return MoistAirState::fromDryBulbHumidityRatio(tdb, gramsPerKilogram(value), p);
}

// The dew point, or nothing when the vapour pressure is below pws(-100 C), the end
// of ASHRAE eq. 5 (perfectly dry air, rh 0 or w 0, has no dew point at all).
std::optional<double> dewPointC(const MoistAirState& state)
{
    const Pressure lowest = Psychro::saturationPressure(celsius(Psychro::kMinTemperatureC));
    if (state.vapourPressure() < lowest)
        return std::nullopt;
    return toCelsius(state.dewPoint());
}

struct Row {
    const char* key;             // JSON key
    const char* label;           // text label
    std::optional<double> value; // nullopt: the property does not exist for this state
    int decimals;                // text output only; JSON keeps full precision
    const char* unit;
};

} // namespace

std::string StateCommand::name() const
{
    return "state";
}

std::string StateCommand::summary() const
{
    return "properties of one moist-air state (dry bulb and one humidity property)";
}

std::string StateCommand::help() const
{
    return "usage: airwright-cli state --tdb °C (--rh % | --twb °C | --tdp °C | --w g/kg)\n"
           "                          [--altitude m | --pressure Pa] [--format text|json]\n"
           "\n"
           "Computes the properties of moist air after ASHRAE Handbook - Fundamentals 2017,\n"
           "chapter 1 (SI), from the dry-bulb temperature and exactly one humidity property.\n"
           "\n"
           "options:\n"
           "  --tdb °C         dry-bulb temperature, -100 .. 200 °C (required)\n"
           "  --rh %           relative humidity, 0 .. 100 %\n"
           "  --twb °C         wet-bulb temperature (psychrometric), not above the dry bulb\n"
           "  --tdp °C         dew-point temperature (frost point below 0.01 °C), not above the dry bulb\n"
           "  --w g/kg         humidity ratio, grams of water per kilogram of dry air,\n"
           "                   0 .. saturation at the dry bulb\n"
           "  --altitude m     site altitude, -500 .. 11000 m; pressure from the standard atmosphere\n"
           "  --pressure Pa    barometric pressure, 20000 .. 120000 Pa (default 101325 Pa)\n"
           "  --format F       text (default): one property per line; json: one object with the\n"
           "                   keys tdb_C, rh_pct, w_gkg, tdp_C, twb_C, h_kJkg, v_m3kg, rho_kgm3,\n"
           "                   pws_Pa, p_Pa (enthalpy and specific volume per kg of dry air, density\n"
           "                   of the moist air, pws the saturation pressure at the dry bulb);\n"
           "                   tdp_C is null for air too dry to have a dew point above -100 °C\n"
           "  --help           this text\n"
           "\n"
           "Options take their value as the next argument or after '=' (--tdb=-5).\n"
           "Numbers use a point as the decimal separator.\n"
           "\n"
           "examples:\n"
           "  airwright-cli state --tdb 20 --rh 50\n"
           "  airwright-cli state --tdb 32 --twb 22 --altitude 1600 --format json\n"
           "\n"
           "exit codes: 0 done, 2 invalid input (one line on stderr), 3 internal error\n";
}

int StateCommand::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& /*err*/)
{
    ArgumentList list;
    for (const char* option : {"tdb", "rh", "twb", "tdp", "w", "altitude", "pressure", "format"})
        list.addOption(option);
    list.parse(args);

    const std::string format = list.value("format").value_or("text");
    if (format != "text" && format != "json")
        throw InputError("--format must be text or json, got '" + format + "'");

    const Pressure p = pressureFrom(list);
    const MoistAirState state = stateFrom(list, p);

    const std::array<Row, 10> rows{{
        {"tdb_C", "dry-bulb temperature", toCelsius(state.dryBulb()), 2, "°C"},
        {"rh_pct", "relative humidity", toPercent(state.relativeHumidity()), 1, "%"},
        {"w_gkg", "humidity ratio", toGramsPerKilogram(state.humidityRatio()), 3, "g/kg dry air"},
        {"tdp_C", "dew-point temperature", dewPointC(state), 2, "°C"},
        {"twb_C", "wet-bulb temperature", toCelsius(state.wetBulb()), 2, "°C"},
        {"h_kJkg", "specific enthalpy", toKilojoulesPerKilogram(state.enthalpy()), 2, "kJ/kg dry air"},
        {"v_m3kg", "specific volume", toCubicMetresPerKilogram(state.specificVolume()), 4, "m3/kg dry air"},
        {"rho_kgm3", "density", toKilogramsPerCubicMetre(state.density()), 4, "kg/m3 moist air"},
        {"pws_Pa", "saturation pressure", toPascals(state.saturationPressure()), 1, "Pa at the dry bulb"},
        {"p_Pa", "barometric pressure", toPascals(p), 0, "Pa"},
    }};

    if (format == "json") {
        nlohmann::ordered_json json = nlohmann::ordered_json::object();
        for (const Row& row : rows) {
            if (row.value)
                json[row.key] = *row.value;
            else
                json[row.key] = nullptr;
        }
        out << json.dump(2) << "\n";
        return Done;
    }
    for (const Row& row : rows) {
        std::string label = row.label;
        label.resize(24, ' ');
        out << label;
        if (row.value)
            out << formatFixed(*row.value, row.decimals) << " " << row.unit << "\n";
        else
            out << "none (below -100 °C, outside ASHRAE eq. 5)\n";
    }
    return Done;
}

} // namespace Airwright::Cli
