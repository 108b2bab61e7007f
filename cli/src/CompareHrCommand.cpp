#include "airwright/cli/CompareHrCommand.h"

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/annual/BinTableReader.h"
#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/core/project/ProjectFile.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <cmath>
#include <map>
#include <ostream>
#include <sstream>
#include <stdexcept>
#include <system_error>

namespace Airwright::Cli {

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using nlohmann::json;

namespace {

// Output never carries NaN or infinity: a non-finite number is a fault of ours.
double finite(double value, const char* what)
{
    if (!std::isfinite(value))
        throw std::runtime_error(std::string("computed a non-finite value for ") + what);
    return value;
}

int wholeNumber(const ArgumentList& list, const char* name, int fallback)
{
    const auto v = list.number(name);
    if (!v)
        return fallback;
    if (*v != std::floor(*v) || std::abs(*v) > 1e6)
        throw InputError(std::string("--") + name, *v, "", "a whole number");
    return static_cast<int>(*v);
}

std::map<std::string, double> parseExtraCosts(const std::string& text, const std::vector<HeatRecoveryOption>& options)
{
    std::map<std::string, double> costs;
    std::stringstream in(text);
    std::string item;
    while (std::getline(in, item, ',')) {
        const auto equals = item.find('=');
        if (equals == std::string::npos || equals == 0)
            throw InputError("--extra-cost: '" + item + "' is not KEY=VALUE");
        const std::string key = item.substr(0, equals);
        const bool known = std::any_of(options.begin(), options.end(), [&](const auto& o) { return o.key == key; });
        if (!known) {
            std::string keys;
            for (const auto& o : options)
                keys += (keys.empty() ? "" : ", ") + o.key;
            throw InputError("--extra-cost: unknown option '" + key + "' (options: " + keys + ")");
        }
        const double value = ArgumentList::parseNumber(item.substr(equals + 1), "--extra-cost " + key);
        if (value < 0.0)
            throw InputError("--extra-cost " + key, value, "", "0 or more");
        costs[key] = value;
    }
    return costs;
}

// --set KEY.FIELD=VALUE,...: the datasheet inputs of an option, in the keys and
// units of the project file's heat recovery section (docs/project-format.md).
void applySettings(const std::string& text, std::vector<HeatRecoveryOption>& options)
{
    static const char* const kFields =
        "efficiency_pct, humidity_efficiency_pct, supply_dp_Pa, extract_dp_Pa, eatr_pct, oacf, pump_W, "
        "frost_strategy, extra_cost";
    std::stringstream in(text);
    std::string item;
    while (std::getline(in, item, ',')) {
        const auto dot = item.find('.');
        const auto equals = item.find('=');
        if (dot == std::string::npos || equals == std::string::npos || dot == 0 || equals < dot + 2)
            throw InputError("--set: '" + item + "' is not OPTION.FIELD=VALUE (fields: " + kFields + ")");
        const std::string key = item.substr(0, dot);
        const std::string field = item.substr(dot + 1, equals - dot - 1);
        const std::string value = item.substr(equals + 1);
        const auto option = std::find_if(options.begin(), options.end(), [&](const auto& o) { return o.key == key; });
        if (option == options.end()) {
            std::string keys;
            for (const auto& o : options)
                keys += (keys.empty() ? "" : ", ") + o.key;
            throw InputError("--set: unknown option '" + key + "' (options: " + keys + ")");
        }
        const std::string what = "--set " + key + "." + field;
        if (field == "extra_cost") {
            const double v = ArgumentList::parseNumber(value, what);
            if (!(v >= 0.0))
                throw InputError(what, v, "", "0 or more");
            option->extraCost = v;
            continue;
        }
        if (!option->spec)
            throw InputError(what + ": the option '" + key + "' has no exchanger; only extra_cost applies");
        Recovery::HeatRecovery& h = *option->spec;
        if (field == "frost_strategy") {
            const auto strategy = Recovery::frostStrategyFromKey(value);
            if (!strategy)
                throw InputError(what + ": unknown strategy '" + value + "'");
            h.frostStrategy = *strategy;
        } else {
            const double v = ArgumentList::parseNumber(value, what);
            if (field == "efficiency_pct")
                h.ratedEfficiency = percent(v);
            else if (field == "humidity_efficiency_pct")
                h.ratedHumidityEfficiency = percent(v);
            else if (field == "supply_dp_Pa")
                h.ratedPressureDropSupply = pascals(v);
            else if (field == "extract_dp_Pa")
                h.ratedPressureDropExtract = pascals(v);
            else if (field == "eatr_pct")
                h.exhaustAirTransfer = percent(v);
            else if (field == "oacf")
                h.outdoorAirCorrection = v;
            else if (field == "pump_W")
                h.pumpPower = watts(v);
            else
                throw InputError("--set: unknown field '" + field + "' (fields: " + kFields + ")");
        }
        try {
            h.validate();
        } catch (const InputError& e) {
            throw InputError(what + ": " + e.what());
        }
    }
}

std::string csvField(const std::string& text)
{
    if (text.find_first_of(",\"\n") == std::string::npos)
        return text;
    std::string quoted = "\"";
    for (char c : text)
        quoted += c == '"' ? std::string("\"\"") : std::string(1, c);
    return quoted + "\"";
}

const char* methodKey(ClimateMethod m)
{
    return m == ClimateMethod::Hourly ? "hourly" : "bins";
}

// The option figures of the JSON contract, in contract order; CSV uses the same.
std::vector<std::pair<std::string, json>> optionFields(const OptionResult& o)
{
    const auto& e = o.energy;
    return {
        {"key", o.key},
        {"name", o.name},
        {"kind", o.kindKey},
        {"effectiveness_t", finite(o.designEffectiveness.value(), "effectiveness")},
        {"eta_t_1253", finite(o.regulationEfficiency.value(), "thermal efficiency")},
        {"dp_supply_Pa", finite(toPascals(o.supplyPressureDrop), "pressure drop")},
        {"dp_extract_Pa", finite(toPascals(o.extractPressureDrop), "pressure drop")},
        {"recovered_heating_MWh", finite(toMegawattHours(e.recoveredHeating), "recovered heating")},
        {"recovered_cooling_MWh", finite(toMegawattHours(e.recoveredCooling), "recovered cooling")},
        {"frost_protection_MWh", finite(toMegawattHours(e.frostProtection), "frost protection")},
        {"frost_hours", finite(toHours(e.frostTime), "frost hours")},
        {"added_fan_MWh", finite(toMegawattHours(o.addedFanEnergy), "added fan energy")},
        {"net_saving_MWh", finite(toMegawattHours(o.netSaving), "net saving")},
        {"cost_saving", finite(o.costSaving, "cost saving")},
        {"co2_saving_t", finite(toKilograms(o.co2Saving) / 1000.0, "CO2 saving")},
        {"payback_years", o.paybackYears ? json(finite(*o.paybackYears, "payback")) : json(nullptr)},
        {"extra_cost", finite(o.extraCost, "extra cost")},
        {"net_benefit", finite(o.netBenefit, "net benefit")},
        {"heating_MWh", finite(toMegawattHours(e.heating), "heating")},
        {"cooling_MWh", finite(toMegawattHours(e.cooling), "cooling")},
        {"humidifier_MWh", finite(toMegawattHours(e.humidifier), "humidifier")},
        {"fan_MWh", finite(toMegawattHours(e.fan), "fan energy")},
        {"pump_MWh", finite(toMegawattHours(e.pump), "pump energy")},
        {"heat_saving_MWh", finite(toMegawattHours(o.heatSaving), "heat saving")},
        {"electricity_saving_MWh", finite(toMegawattHours(o.electricitySaving), "electricity saving")},
    };
}

const std::string& nameOf(const ComparisonResult& r, const std::string& key)
{
    for (const auto& o : r.options)
        if (o.key == key)
            return o.name;
    return key;
}

json reportJson(const Project::Project& project, const std::string& climateFile, const ComparisonResult& r,
                const ComparisonSettings& settings)
{
    json j;
    j["project"] = {{"name", project.info.name}, {"reference", project.info.reference}};
    const auto& c = r.climate;
    j["climate"] = {{"file", climateFile},
                    {"site", c.site},
                    {"method", methodKey(c.method)},
                    {"hours", finite(toHours(c.duration), "hours")},
                    {"mean_tdb_C", finite(toCelsius(c.meanDryBulb), "mean dry bulb")},
                    {"min_tdb_C", finite(toCelsius(c.minDryBulb), "lowest dry bulb")},
                    {"max_tdb_C", finite(toCelsius(c.maxDryBulb), "highest dry bulb")},
                    {"degree_hour_base_C", finite(toCelsius(c.degreeHourBase), "degree-hour base")},
                    {"heating_degree_hours_Kh", finite(toKelvinHours(c.heatingDegreeHours), "degree hours")},
                    {"operating_hours", finite(toHours(c.operatingTime), "operating hours")}};
    const auto& p = settings.prices;
    const auto& s = settings.annual.schedule;
    j["settings"] = {{"heat_price_per_kWh", p.heatPricePerKilowattHour},
                     {"electricity_price_per_kWh", p.electricityPricePerKilowattHour},
                     {"heat_co2_kg_per_kWh", p.heatCo2KilogramsPerKilowattHour},
                     {"electricity_co2_kg_per_kWh", p.electricityCo2KilogramsPerKilowattHour},
                     {"cooling_eer", p.coolingEer},
                     {"evaluation_years", settings.evaluationYears},
                     {"hours_per_day", s.hoursPerDay},
                     {"first_hour", s.firstHour},
                     {"days_per_week", s.daysPerWeek},
                     {"holiday_weeks", s.holidayWeeks},
                     {"off_hours", offHoursModeKey(s.offHours)},
                     {"setback_airflow_pct", toPercent(s.setbackAirflow)},
                     {"setback_K", toKelvinDifference(s.setbackTemperature)}};
    j["options"] = json::array();
    for (const auto& o : r.options) {
        json item = json::object();
        for (auto& [key, value] : optionFields(o))
            item[key] = value;
        item["design_findings"] = json::array();
        for (const auto& f : o.designFindings)
            item["design_findings"].push_back(
                {{"severity", severityName(f.severity)}, {"code", f.code}, {"message", f.message}});
        j["options"].push_back(item);
    }
    j["ranking"] = json::array();
    for (const auto& e : r.ranking)
        j["ranking"].push_back({{"rank", e.rank},
                                {"key", e.key},
                                {"name", nameOf(r, e.key)},
                                {"net_benefit", finite(e.netBenefit, "net benefit")},
                                {"reason", e.reason}});
    json cells = json::array();
    for (const auto& cell : r.sensitivity)
        cells.push_back({{"room_rh_offset_pct", toPercent(cell.roomHumidityOffset)},
                         {"heat_price_factor", cell.heatPriceFactor},
                         {"ranking", cell.ranking}});
    json offsets = json::array();
    for (const Ratio& o : settings.roomHumidityOffsets)
        offsets.push_back(toPercent(o));
    j["sensitivity"] = {{"room_rh_offsets_pct", settings.sensitivity ? offsets : json::array()},
                        {"heat_price_factors", settings.sensitivity ? json(settings.heatPriceFactors) : json::array()},
                        {"cells", cells}};
    return j;
}

std::string reportCsv(const ComparisonResult& r)
{
    std::string text;
    bool header = true;
    for (const auto& o : r.options) {
        const auto fields = optionFields(o);
        if (header) {
            for (std::size_t i = 0; i < fields.size(); ++i)
                text += (i ? "," : "") + fields[i].first;
            text += "\n";
            header = false;
        }
        for (std::size_t i = 0; i < fields.size(); ++i) {
            const json& v = fields[i].second;
            std::string cell;
            if (v.is_string())
                cell = csvField(v.get<std::string>());
            else if (v.is_number())
                cell = formatNumber(v.get<double>());
            text += (i ? "," : "") + cell; // null (no payback) stays an empty cell
        }
        text += "\n";
    }
    return text;
}

std::string padded(std::string text, std::size_t width)
{
    if (text.size() < width)
        text.append(width - text.size(), ' ');
    return text;
}

std::string reportText(const Project::Project& project, const std::string& climateFile, const ComparisonResult& r,
                       const ComparisonSettings& settings)
{
    std::ostringstream out;
    const auto& c = r.climate;
    out << "Heat recovery comparison: " << project.info.name << "\n";
    out << "Climate: " << (c.site.empty() ? std::string("bin table") : c.site) << " (" << climateFile << "), "
        << methodKey(c.method) << ", " << formatFixed(toHours(c.duration), 0) << " h, mean "
        << formatFixed(toCelsius(c.meanDryBulb), 1) << " C, " << formatFixed(toCelsius(c.minDryBulb), 1) << " .. "
        << formatFixed(toCelsius(c.maxDryBulb), 1) << " C; unit in operation "
        << formatFixed(toHours(c.operatingTime), 0) << " h\n";
    const auto& p = settings.prices;
    out << "Prices per kWh: heat " << formatNumber(p.heatPricePerKilowattHour) << ", electricity "
        << formatNumber(p.electricityPricePerKilowattHour) << "; CO2 kg/kWh: heat "
        << formatNumber(p.heatCo2KilogramsPerKilowattHour) << ", electricity "
        << formatNumber(p.electricityCo2KilogramsPerKilowattHour) << "; cooling EER " << formatNumber(p.coolingEer)
        << "; ranking over " << formatNumber(settings.evaluationYears) << " years\n\n";

    out << padded("option", 31) << padded("eff", 6) << padded("1253", 6) << padded("dp s/e Pa", 11)
        << padded("rec.heat", 9) << padded("rec.cool", 9) << padded("frost", 7) << padded("frost h", 8)
        << padded("+fan", 6) << padded("net MWh", 8) << padded("cost/a", 8) << padded("CO2 t/a", 8) << "payback a\n";
    for (const auto& o : r.options) {
        const auto& e = o.energy;
        out << padded(o.name, 31) << padded(formatFixed(toPercent(o.designEffectiveness), 0) + "%", 6)
            << padded(formatFixed(toPercent(o.regulationEfficiency), 0) + "%", 6)
            << padded(formatFixed(toPascals(o.supplyPressureDrop), 0) + "/" + formatFixed(toPascals(o.extractPressureDrop), 0), 11)
            << padded(formatFixed(toMegawattHours(e.recoveredHeating), 1), 9)
            << padded(formatFixed(toMegawattHours(e.recoveredCooling), 1), 9)
            << padded(formatFixed(toMegawattHours(e.frostProtection), 1), 7)
            << padded(formatFixed(toHours(e.frostTime), 0), 8)
            << padded(formatFixed(toMegawattHours(o.addedFanEnergy), 1), 6)
            << padded(formatFixed(toMegawattHours(o.netSaving), 1), 8) << padded(formatFixed(o.costSaving, 0), 8)
            << padded(formatFixed(toKilograms(o.co2Saving) / 1000.0, 1), 8)
            << (o.paybackYears ? formatFixed(*o.paybackYears, 1) : std::string("-")) << "\n";
    }
    out << "\n(MWh a year; eff: temperature effectiveness at the coldest design case, full recovery; 1253: "
           "thermal efficiency of Regulation (EU) 1253/2014)\n\nRanking:\n";
    for (const auto& e : r.ranking)
        out << "  " << e.rank << ". " << nameOf(r, e.key) << ": " << e.reason << "\n";
    if (!r.sensitivity.empty()) {
        out << "\nSensitivity (ranking, best first):\n";
        for (const auto& cell : r.sensitivity) {
            out << "  room RH " << (cell.roomHumidityOffset.value() > 0 ? "+" : "")
                << formatFixed(toPercent(cell.roomHumidityOffset), 0) << " points, heat price x"
                << formatNumber(cell.heatPriceFactor) << ": ";
            for (std::size_t i = 0; i < cell.ranking.size(); ++i)
                out << (i ? " > " : "") << cell.ranking[i];
            out << "\n";
        }
    }
    for (const auto& o : r.options)
        for (const auto& f : o.designFindings)
            out << (o.designFindings.front() == f ? "\n" : "") << o.name << ": " << severityName(f.severity) << " "
                << f.code << ": " << f.message << "\n";
    return out.str();
}

} // namespace

std::filesystem::path CompareHrCommand::climatePath(const std::optional<std::string>& given,
                                                   const std::vector<std::filesystem::path>& candidates)
{
    if (given)
        return *given;
    for (const auto& candidate : candidates) {
        std::error_code ec;
        if (std::filesystem::is_regular_file(candidate, ec))
            return candidate;
    }
    throw InputError("no --climate given and the demo climate (resources/demo/demo-climate.epw) was not "
                     "found; pass --climate FILE.epw or a bin table CSV");
}

std::optional<ComparisonResult> CompareHrCommand::runOn(const HeatRecoveryComparison& comparison,
                                                        const Project::Project& project,
                                                        const std::filesystem::path& climateFile, std::ostream& err)
{
    std::string extension = climateFile.extension().string();
    std::transform(extension.begin(), extension.end(), extension.begin(),
                   [](unsigned char ch) { return static_cast<char>(std::tolower(ch)); });
    if (extension == ".epw") {
        const auto weather = EpwReader().readFile(climateFile);
        for (const auto& gap : weather.filledGaps)
            err << "warning: " << climateFile.string() << ": " << gap.hours << " missing hours of " << gap.quantity
                << " from line " << gap.firstLine << " filled by interpolation\n";
        return comparison.run(weather.weather);
    }
    if (extension == ".csv")
        return comparison.run(BinTableReader(project.unit.site.pressure()).readFile(climateFile));
    throw InputError("--climate: '" + climateFile.string()
                     + "' is neither an EPW weather file (.epw) nor a bin table (.csv)");
}

ComparisonResult CompareHrCommand::compareWithDefaults(const Project::Project& project,
                                                       const std::filesystem::path& climateFile, std::ostream& err)
{
    const HeatRecoveryComparison comparison(project.unit, defaultHeatRecoveryOptions(project.unit.airflows.supply),
                                            ComparisonSettings{});
    auto result = runOn(comparison, project, climateFile, err);
    if (!result)
        throw std::runtime_error("the comparison stopped before its end");
    return *result;
}

std::vector<std::filesystem::path> CompareHrCommand::defaultClimateCandidates()
{
    std::vector<std::filesystem::path> candidates;
#ifdef AIRWRIGHT_SOURCE_DIR
    candidates.push_back(std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-climate.epw");
#endif
    std::error_code ec;
    const auto exe = std::filesystem::read_symlink("/proc/self/exe", ec);
    if (!ec) {
        const auto dir = exe.parent_path();
        candidates.push_back(dir / "demo-climate.epw");
        candidates.push_back(dir / "resources" / "demo" / "demo-climate.epw");
        candidates.push_back(dir / ".." / "share" / "airwright" / "demo" / "demo-climate.epw");
    }
    return candidates;
}

std::string CompareHrCommand::summary() const
{
    return "compare heat recovery options over a year: energy, cost, CO2, payback";
}

std::string CompareHrCommand::help() const
{
    return "usage: airwright-cli compare-hr FILE [--climate FILE.epw|BINS.csv] [--format json|csv|text]\n"
           "                               [options]\n"
           "\n"
           "Compares no heat recovery, plate cross-flow, plate counter-flow, non-hygroscopic and\n"
           "hygroscopic wheels and a run-around loop (datasheet-style values of our own, sized to the unit)\n"
           "over a year, for the unit of the project FILE: energy recovered, frost, fan energy,\n"
           "net saving, cost, CO2 and payback, a ranking with reasons and a sensitivity table.\n"
           "The project file has no annual section yet: prices, schedule and extra costs come\n"
           "from these options. Method and defaults: docs/annual.md.\n"
           "\n"
           "  --climate FILE        EPW weather file (hourly) or bin table CSV (bins); default:\n"
           "                        the invented demo climate resources/demo/demo-climate.epw\n"
           "  --format FORMAT       json (contract in docs/annual.md), csv (options only) or\n"
           "                        text (default)\n"
           "  --heat-price X        per kWh of heat at the coils (default 0.10)\n"
           "  --electricity-price X per kWh (default 0.25)\n"
           "  --heat-co2 X          kg CO2 per kWh of heat (default 0.20)\n"
           "  --electricity-co2 X   kg CO2 per kWh of electricity (default 0.40)\n"
           "  --cooling-eer X       seasonal EER of the cold source (default 3.0)\n"
           "  --years N             evaluation period of the ranking (default 15)\n"
           "  --extra-cost K=V,...  extra cost per option key, e.g. plate_counter_flow=9000\n"
           "                        (default: 0.8 .. 2.0 per m3/h of supply air, illustrative)\n"
           "  --set K.F=V,...       an option's datasheet inputs, e.g.\n"
           "                        plate_counter_flow.efficiency_pct=88,plate_counter_flow.supply_dp_Pa=190;\n"
           "                        fields: efficiency_pct, humidity_efficiency_pct, supply_dp_Pa,\n"
           "                        extract_dp_Pa, eatr_pct, oacf, pump_W, frost_strategy, extra_cost\n"
           "  --hours-per-day N     1 .. 24 (default 24)\n"
           "  --first-hour N        first operating hour of the day, 0 .. 23 (default 0)\n"
           "  --days-per-week N     1 .. 7, from Monday (default 7)\n"
           "  --holiday-weeks N     0 .. 52 (default 0)\n"
           "  --off-hours MODE      off (default) or setback\n"
           "  --setback-airflow P   airflow in setback, % (default 50)\n"
           "  --setback-k K         room and supply setpoint lowered in setback, K (default 3)\n"
           "  --no-sensitivity      leave out the sensitivity table (three times faster)\n"
           "\n"
           "Exit codes: 0 compared, 2 invalid input, 3 internal error.\n";
}

int CompareHrCommand::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    ArgumentList list;
    for (const char* option : {"climate", "format", "heat-price", "electricity-price", "heat-co2", "electricity-co2",
                               "cooling-eer", "years", "extra-cost", "set", "hours-per-day", "first-hour", "days-per-week",
                               "holiday-weeks", "off-hours", "setback-airflow", "setback-k"})
        list.addOption(option);
    list.addFlag("no-sensitivity").allowPositionals(1);
    list.parse(args);
    if (list.positionals().size() != 1)
        throw InputError("compare-hr needs one project FILE (see 'airwright-cli compare-hr --help')");
    const std::string format = list.value("format").value_or("text");
    if (format != "json" && format != "csv" && format != "text")
        throw InputError("--format must be json, csv or text, not '" + format + "'");

    ComparisonSettings settings;
    auto& prices = settings.prices;
    prices.heatPricePerKilowattHour = list.number("heat-price").value_or(prices.heatPricePerKilowattHour);
    prices.electricityPricePerKilowattHour =
        list.number("electricity-price").value_or(prices.electricityPricePerKilowattHour);
    prices.heatCo2KilogramsPerKilowattHour = list.number("heat-co2").value_or(prices.heatCo2KilogramsPerKilowattHour);
    prices.electricityCo2KilogramsPerKilowattHour =
        list.number("electricity-co2").value_or(prices.electricityCo2KilogramsPerKilowattHour);
    prices.coolingEer = list.number("cooling-eer").value_or(prices.coolingEer);
    settings.evaluationYears = list.number("years").value_or(settings.evaluationYears);
    auto& schedule = settings.annual.schedule;
    schedule.hoursPerDay = wholeNumber(list, "hours-per-day", schedule.hoursPerDay);
    schedule.firstHour = wholeNumber(list, "first-hour", schedule.firstHour);
    schedule.daysPerWeek = wholeNumber(list, "days-per-week", schedule.daysPerWeek);
    schedule.holidayWeeks = wholeNumber(list, "holiday-weeks", schedule.holidayWeeks);
    if (const auto mode = list.value("off-hours")) {
        const auto parsed = offHoursModeFromKey(*mode);
        if (!parsed)
            throw InputError("--off-hours must be off or setback, not '" + *mode + "'");
        schedule.offHours = *parsed;
    }
    if (const auto airflow = list.number("setback-airflow"))
        schedule.setbackAirflow = percent(*airflow);
    if (const auto k = list.number("setback-k"))
        schedule.setbackTemperature = kelvinDifference(*k);
    settings.sensitivity = !list.has("no-sensitivity");
    settings.validate();

    Project::LoadReport report;
    const auto project = Project::ProjectFile::load(list.positionals().front(), report);
    for (const auto& warning : report.warnings)
        err << "warning: " << warning.path << ": " << warning.message << "\n";

    auto options = defaultHeatRecoveryOptions(project.unit.airflows.supply);
    if (const auto costs = list.value("extra-cost"))
        for (const auto& [key, value] : parseExtraCosts(*costs, options))
            for (auto& o : options)
                if (o.key == key)
                    o.extraCost = value;
    if (const auto datasheet = list.value("set"))
        applySettings(*datasheet, options);

    const std::filesystem::path climateFile = climatePath(list.value("climate"), m_climateCandidates);
    const HeatRecoveryComparison comparison(project.unit, options, settings);
    const std::optional<ComparisonResult> result = runOn(comparison, project, climateFile, err);
    if (!result)
        throw std::runtime_error("the comparison stopped before its end");

    if (format == "json")
        out << reportJson(project, climateFile.string(), *result, settings).dump(2) << "\n";
    else if (format == "csv")
        out << reportCsv(*result);
    else
        out << reportText(project, climateFile.string(), *result, settings);
    return Done;
}

} // namespace Airwright::Cli
