#include "airwright/cli/ComputeReport.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/checks/SfpCategory.h"
#include "airwright/core/checks/UnitAssessment.h"
#include "airwright/core/checks/VelocityClass.h"
#include "airwright/core/chain/SectionFigures.h"

#include <algorithm>
#include <cmath>
#include <sstream>
#include <stdexcept>

namespace Airwright::Cli {

using namespace Airwright::Core;
using nlohmann::json;

namespace {

// Output never carries NaN or infinity: a non-finite number is a fault of ours.
double finite(double value, const char* what)
{
    if (!std::isfinite(value))
        throw std::runtime_error(std::string("computed a non-finite value for ") + what);
    return value;
}

json sectionJson(const Chain::SectionResult& s)
{
    json j;
    j["id"] = s.id;
    j["type"] = s.typeKey;
    j["inlet"] = stateJson(s.inlet, s.staticPressureIn);
    j["outlet"] = stateJson(s.outlet, s.staticPressureOut);
    j["mdot_da_in_kgs"] = finite(toKilogramsPerSecond(s.inlet.dryAir), "dry-air flow");
    j["mdot_da_out_kgs"] = finite(toKilogramsPerSecond(s.outlet.dryAir), "dry-air flow");
    j["q_m3s"] = finite(toCubicMetresPerSecond(s.inletFlow), "volume flow");
    j["face_velocity_ms"] = finite(toMetresPerSecond(s.faceVelocity), "face velocity");
    j["dp_Pa"] = finite(toPascals(s.pressureDrop), "pressure drop");
    j["duty_kW"] = finite(toKilowatts(s.duty), "duty");
    j["length_mm"] = finite(toMillimetres(s.length), "length");
    if (s.waterAdded.value() > 0.0)
        j["water_added_kgh"] = finite(toKilogramsPerSecond(s.waterAdded) * 3600.0, "water added");
    if (s.waterRemoved.value() > 0.0)
        j["water_removed_kgh"] = finite(toKilogramsPerSecond(s.waterRemoved) * 3600.0, "water removed");

    if (const auto* hr = std::get_if<Recovery::HeatRecoveryDetail>(&s.detail)) {
        // The heat recovery block of the contract, nested as documented.
        j["exchanger"] = Recovery::exchangerKindKey(hr->kind);
        j["effectiveness_t"] = finite(hr->temperatureEffectiveness.value(), "effectiveness");
        if (hr->humidityEffectiveness)
            j["effectiveness_x"] = finite(hr->humidityEffectiveness->value(), "humidity effectiveness");
        j["eta_t_1253"] = finite(hr->regulationThermalEfficiency.value(), "thermal efficiency");
        j["recovered_kW"] = finite(toKilowatts(hr->recovered), "recovered heat");
        j["bypass_fraction"] = finite(hr->bypassFraction.value(), "bypass fraction");
        j["condensate_kgh"] = finite(toKilogramsPerSecond(hr->condensate) * 3600.0, "condensate");
        json frost;
        frost["risk"] = hr->frost.risk;
        frost["onset_outdoor_C"] = hr->frost.onsetOutdoorTemperature
                                       ? json(finite(toCelsius(*hr->frost.onsetOutdoorTemperature), "frost onset"))
                                       : json(nullptr);
        frost["strategy"] = Recovery::frostStrategyKey(hr->frost.strategy);
        frost["protection_kW"] = finite(toKilowatts(hr->frost.protectionPower), "frost protection");
        frost["recovered_fraction"] = finite(hr->frost.recoveredFraction.value(), "recovered fraction");
        j["frost"] = frost;
        j["leakage"] = {{"eatr_pct", finite(toPercent(hr->leakage.exhaustAirTransfer), "EATR")},
                        {"oacf", finite(hr->leakage.outdoorAirCorrection, "OACF")}};
        j["dp_clean_Pa"] = finite(hr->cleanExtractPressureDrop.value(), "clean pressure drop");
        j["frost_alarm_dp_Pa"] = finite(hr->frostAlarmPressureDrop.value(), "frost alarm");
        if (hr->supplyMinusExtract)
            j["supply_minus_extract_Pa"] = finite(hr->supplyMinusExtract->value(), "pressure difference");
        if (hr->loopSupplyTemperature)
            j["loop_supply_C"] = finite(toCelsius(*hr->loopSupplyTemperature), "loop temperature");
        if (hr->loopReturnTemperature)
            j["loop_return_C"] = finite(toCelsius(*hr->loopReturnTemperature), "loop temperature");
        if (hr->pumpPower.value() > 0.0)
            j["pump_power_kW"] = finite(toKilowatts(hr->pumpPower), "pump power");
        return j;
    }
    for (const auto& figure : Chain::sectionFigures(s)) {
        if (figure.kind == Chain::FigureKind::Text)
            j[figure.key] = figure.text;
        else
            j[figure.key] = finite(figure.value, figure.key.c_str());
    }
    return j;
}

json findingJson(const Finding& f)
{
    return {{"severity", severityName(f.severity)},
            {"code", f.code},
            {"section", f.sectionId.empty() ? json(nullptr) : json(f.sectionId)},
            {"message", f.message}};
}

std::string pad(std::string text, std::size_t width)
{
    if (text.size() < width)
        text.append(width - text.size(), ' ');
    return text;
}

} // namespace

json stateJson(const Sections::AirStream& air, Pressure staticPressure)
{
    const auto& s = air.state;
    return {{"tdb_C", finite(toCelsius(s.dryBulb()), "dry bulb")},
            {"w_gkg", finite(toGramsPerKilogram(s.humidityRatio()), "humidity ratio")},
            {"rh_pct", finite(toPercent(s.relativeHumidity()), "relative humidity")},
            {"h_kJkg", finite(toKilojoulesPerKilogram(s.enthalpy()), "enthalpy")},
            {"p_Pa", finite(toPascals(staticPressure), "static pressure")}};
}

std::optional<Checks::UnitAssessment> assessOrExplain(const Project::Project& project,
                                                      const Chain::UnitResult& result, std::string& why)
{
    try {
        return Checks::assessUnit(project.unit, result);
    } catch (const InputError& e) {
        why = e.what(); // e.g. a path without a fan: the classes cannot be assessed
        return std::nullopt;
    }
}

json computeReportJson(const Project::Project& project, const Chain::UnitResult& result)
{
    json root;
    std::string notAssessed;
    const auto assessment = assessOrExplain(project, result, notAssessed);
    root["project"] = {{"name", project.info.name}, {"reference", project.info.reference}};
    const auto& sizing = result.sizing;
    root["unit"] = {{"width_mm", finite(toMillimetres(sizing.width), "width")},
                    {"height_mm", finite(toMillimetres(sizing.height), "height")},
                    {"cross_section_m2", finite(toSquareMetres(sizing.crossSection), "cross-section")},
                    {"sized_automatically", sizing.sizedAutomatically},
                    {"supply_length_mm", finite(toMillimetres(sizing.supplyLength), "length")},
                    {"extract_length_mm", finite(toMillimetres(sizing.extractLength), "length")},
                    {"length_mm", finite(toMillimetres(sizing.unitLength), "length")},
                    {"site_pressure_Pa", finite(toPascals(project.unit.site.pressure()), "site pressure")}};
    json assessed;
    if (assessment) {
        assessed["nominal_flow_m3s"] = finite(toCubicMetresPerSecond(assessment->nominalFlow), "nominal flow");
        assessed["face_velocity_ms"] = finite(toMetresPerSecond(assessment->faceVelocity), "face velocity");
        assessed["velocity_class"] = Checks::velocityClassLabel(assessment->velocityClass);
        assessed["regulation_1253_2014"] = Checks::complianceKey(assessment->compliance);
        json findings = json::array();
        for (const auto& f : assessment->findings)
            findings.push_back(findingJson(f));
        assessed["findings"] = findings;
    } else {
        assessed["not_assessed"] = notAssessed;
    }
    root["assessment"] = assessed;
    json cases = json::array();
    for (std::size_t index = 0; index < result.cases.size(); ++index) {
        const auto& c = result.cases[index];
        const Checks::CaseAssessment* ca = assessment ? &assessment->cases.at(index) : nullptr;
        json jc;
        jc["name"] = c.caseName;
        jc["converged"] = c.converged;
        jc["iterations"] = c.iterations;
        json supply = json::array();
        for (const auto& s : c.supply)
            supply.push_back(sectionJson(s));
        json extract = json::array();
        for (const auto& s : c.extract)
            extract.push_back(sectionJson(s));
        jc["paths"] = {{"supply", supply}, {"extract", extract}};
        const auto& t = c.totals;
        jc["totals"] = {{"heating_kW", finite(toKilowatts(t.heating), "heating")},
                        {"cooling_kW", finite(toKilowatts(t.cooling), "cooling")},
                        {"heat_recovered_kW", finite(toKilowatts(t.heatRecovered), "heat recovered")},
                        {"humidification_kgh", finite(toKilogramsPerSecond(t.humidification) * 3600.0, "humidification")},
                        {"fan_power_kW", finite(toKilowatts(t.fanElectricPower), "fan power")},
                        {"pump_power_kW", finite(toKilowatts(t.pumpPower), "pump power")},
                        {"supply_m3s", finite(toCubicMetresPerSecond(t.supplyFlow), "supply flow")},
                        {"extract_m3s", finite(toCubicMetresPerSecond(t.extractFlow), "extract flow")},
                        {"sfp_W_per_m3s", finite(toWattsPerCubicMetrePerSecond(t.specificFanPower), "SFP")}};
        auto& totals = jc["totals"];
        totals["sfp_category"] = ca ? json(Checks::sfpCategoryLabel(ca->sfpCategory)) : json(nullptr);
        totals["velocity_class"] = ca ? json(Checks::velocityClassLabel(ca->velocityClass)) : json(nullptr);
        totals["sfpint_W_per_m3s"] =
            ca && ca->sfpInt ? json(finite(toWattsPerCubicMetrePerSecond(ca->sfpInt->total), "SFPint")) : json(nullptr);
        totals["sfpint_limit_W_per_m3s"] =
            ca && ca->sfpIntLimit ? json(finite(toWattsPerCubicMetrePerSecond(ca->sfpIntLimit->limit), "SFPint limit"))
                                  : json(nullptr);
        totals["regulation_1253_2014"] = ca ? json(Checks::complianceKey(ca->compliance)) : json(nullptr);
        json findings = json::array();
        for (const auto& f : c.findings)
            findings.push_back(findingJson(f));
        if (ca)
            for (const auto& f : ca->findings)
                findings.push_back(findingJson(f));
        jc["findings"] = findings;
        cases.push_back(jc);
    }
    root["cases"] = cases;
    return root;
}

std::string computeReportText(const Project::Project& project, const Chain::UnitResult& result)
{
    std::ostringstream out;
    std::string notAssessed;
    const auto assessment = assessOrExplain(project, result, notAssessed);
    const auto& sizing = result.sizing;
    out << (project.info.name.empty() ? "(unnamed project)" : project.info.name) << "\n";
    out << "unit " << formatFixed(toMillimetres(sizing.width), 0) << " x " << formatFixed(toMillimetres(sizing.height), 0)
        << " mm per deck, length " << formatFixed(toMillimetres(sizing.unitLength), 0) << " mm, site pressure "
        << formatFixed(toPascals(project.unit.site.pressure()), 0) << " Pa\n";
    for (std::size_t index = 0; index < result.cases.size(); ++index) {
        const auto& c = result.cases[index];
        out << "\ncase " << c.caseName << (c.converged ? "" : "  (NOT CONVERGED)") << "\n";
        for (const auto* path : {&c.supply, &c.extract}) {
            if (path->empty())
                continue;
            std::size_t idWidth = 4;
            std::size_t typeWidth = 6;
            for (const auto& s : *path) {
                idWidth = std::max(idWidth, s.id.size() + 2);
                typeWidth = std::max(typeWidth, s.typeKey.size() + 2);
            }
            out << "  " << Chain::pathKey(path->front().path) << "\n";
            out << "    " << pad("id", idWidth) << pad("type", typeWidth) << pad("t in C", 9) << pad("t out C", 9)
                << pad("W g/kg", 9) << pad("RH %", 7) << pad("dp Pa", 9) << pad("p out Pa", 10) << "duty kW\n";
            for (const auto& s : *path) {
                out << "    " << pad(s.id, idWidth) << pad(s.typeKey, typeWidth) << pad(formatFixed(toCelsius(s.inlet.state.dryBulb()), 1), 9)
                    << pad(formatFixed(toCelsius(s.outlet.state.dryBulb()), 1), 9)
                    << pad(formatFixed(toGramsPerKilogram(s.outlet.state.humidityRatio()), 2), 9)
                    << pad(formatFixed(toPercent(s.outlet.state.relativeHumidity()), 0), 7)
                    << pad(formatFixed(toPascals(s.pressureDrop), 0), 9)
                    << pad(formatFixed(toPascals(s.staticPressureOut), 0), 10) << formatFixed(toKilowatts(s.duty), 1)
                    << "\n";
            }
        }
        const auto& t = c.totals;
        out << "  totals: heating " << formatFixed(toKilowatts(t.heating), 1) << " kW, cooling "
            << formatFixed(toKilowatts(t.cooling), 1) << " kW, recovered " << formatFixed(toKilowatts(t.heatRecovered), 1)
            << " kW, humidification " << formatFixed(toKilogramsPerSecond(t.humidification) * 3600.0, 1)
            << " kg/h, fans " << formatFixed(toKilowatts(t.fanElectricPower), 2) << " kW, SFP "
            << formatFixed(toWattsPerCubicMetrePerSecond(t.specificFanPower), 0) << " W/(m3/s)\n";
        if (assessment) {
            const auto& ca = assessment->cases.at(index);
            out << "  classes: " << Checks::sfpCategoryLabel(ca.sfpCategory) << " (EN 16798-3), "
                << Checks::velocityClassLabel(ca.velocityClass) << " (EN 13053)";
            if (ca.sfpInt && ca.sfpIntLimit)
                out << "; SFPint " << formatFixed(toWattsPerCubicMetrePerSecond(ca.sfpInt->total), 0) << " of "
                    << formatFixed(toWattsPerCubicMetrePerSecond(ca.sfpIntLimit->limit), 0)
                    << " W/(m3/s) allowed by Regulation (EU) No 1253/2014: " << Checks::complianceKey(ca.compliance);
            out << "\n";
            for (const auto& f : ca.findings)
                out << "  " << severityName(f.severity) << " [" << f.code << "]: " << f.message << "\n";
        } else {
            out << "  classes not assessed: " << notAssessed << "\n";
        }
        for (const auto& f : c.findings)
            out << "  " << severityName(f.severity) << " [" << f.code << "]" << (f.sectionId.empty() ? "" : " " + f.sectionId)
                << ": " << f.message << "\n";
    }
    return out.str();
}

} // namespace Airwright::Cli
