#include "ProjectWriter.h"

#include "FileNumber.h"
#include "airwright/core/project/ProjectFile.h"

#include <string>
#include <type_traits>

namespace Airwright::Core::Project {

namespace {

using Json = nlohmann::ordered_json;
namespace U = FileUnits;

template <class Q> void put(Json& json, const char* key, Q value, const FileUnit<Q>& unit)
{
    json[key] = numberJson(exactFileNumber(value, unit));
}

template <class Q> void putOptional(Json& json, const char* key, const std::optional<Q>& value, const FileUnit<Q>& unit)
{
    if (value)
        put(json, key, *value, unit);
}

void putPlain(Json& json, const char* key, double value)
{
    json[key] = numberJson(exactFileNumber(value));
}

void putText(Json& json, const char* key, const std::string& value)
{
    if (!value.empty())
        json[key] = value;
}

Json coolantJson(const Sections::Coolant& coolant)
{
    Json json = Json::object();
    json["kind"] = Sections::coolantKindKey(coolant.kind());
    if (coolant.kind() != Sections::CoolantKind::Water)
        put(json, "mass_concentration_pct", coolant.massConcentration(), U::kPercent);
    return json;
}

void writeSpec(Json& json, const Sections::Damper& d)
{
    json["role"] = Sections::damperRoleKey(d.role);
    putPlain(json, "loss_coefficient", d.lossCoefficient);
    json["leakage_class"] = d.leakageClass;
    put(json, "length_mm", d.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::Filter& f)
{
    json["group"] = Sections::filterGroupKey(f.group);
    put(json, "efficiency_pct", f.efficiency, U::kPercent);
    json["construction"] = Sections::filterConstructionKey(f.construction);
    put(json, "initial_dp_Pa", f.initialPressureDrop, U::kPascal);
    putOptional(json, "final_dp_Pa", f.finalPressureDrop, U::kPascal);
    putOptional(json, "nominal_flow_m3h", f.nominalFlow, U::kCubicMetresPerHour);
    putPlain(json, "flow_exponent", f.flowExponent);
    put(json, "length_mm", f.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::WaterHeatingCoil& c)
{
    put(json, "flow_temperature_C", c.flowTemperature, U::kCelsius);
    put(json, "return_temperature_C", c.returnTemperature, U::kCelsius);
    json["fluid"] = coolantJson(c.fluid);
    json["rows"] = c.rows;
    put(json, "dp_per_row_Pa", c.pressureDropPerRow, U::kPascal);
    putOptional(json, "capacity_kW", c.capacity, U::kKilowatt);
    putOptional(json, "fixed_outlet_tdb_C", c.fixedOutletTemperature, U::kCelsius);
    put(json, "length_mm", c.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::ElectricHeater& h)
{
    putOptional(json, "rated_power_kW", h.ratedPower, U::kKilowatt);
    json["steps"] = h.steps;
    put(json, "dp_Pa", h.pressureDrop, U::kPascal);
    putOptional(json, "fixed_outlet_tdb_C", h.fixedOutletTemperature, U::kCelsius);
    put(json, "length_mm", h.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::CoolingCoil& c)
{
    put(json, "flow_temperature_C", c.waterInletTemperature, U::kCelsius);
    put(json, "return_temperature_C", c.waterOutletTemperature, U::kCelsius);
    json["fluid"] = coolantJson(c.fluid);
    json["rows"] = c.rows;
    putOptional(json, "bypass_factor", c.bypassFactor, U::kFraction);
    put(json, "dp_per_row_Pa", c.pressureDropPerRow, U::kPascal);
    putPlain(json, "wet_dp_factor", c.wetPressureDropFactor);
    putOptional(json, "capacity_kW", c.capacity, U::kKilowatt);
    put(json, "length_mm", c.length, U::kMillimetre);
}

// Fields that only one kind of humidifier or exchanger uses are left out for the
// other kinds while they hold the default, so a plate exchanger's file does not
// show a rotor speed; a non-default value is always written (exact round trip).
template <class V> bool worthWriting(bool relevant, const V& value, const V& defaultValue)
{
    return relevant || !(value == defaultValue);
}

void writeSpec(Json& json, const Sections::Humidifier& h)
{
    const Sections::Humidifier defaults;
    const bool steam = h.kind == Sections::HumidifierKind::Steam;
    json["kind"] = Sections::humidifierKindKey(h.kind);
    if (worthWriting(!steam, h.saturationEfficiency, defaults.saturationEfficiency))
        put(json, "saturation_efficiency_pct", h.saturationEfficiency, U::kPercent);
    if (worthWriting(steam, h.steamTemperature, defaults.steamTemperature))
        put(json, "steam_temperature_C", h.steamTemperature, U::kCelsius);
    put(json, "feed_water_temperature_C", h.feedWaterTemperature, U::kCelsius);
    putOptional(json, "capacity_kgh", h.capacity, U::kKilogramsPerHour);
    put(json, "dp_Pa", h.pressureDrop, U::kPascal);
    put(json, "length_mm", h.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::Fan& f)
{
    put(json, "fan_efficiency_pct", f.fanEfficiency, U::kPercent);
    put(json, "motor_efficiency_pct", f.motorEfficiency, U::kPercent);
    json["motor_ie_class"] = f.motorIeClass;
    put(json, "drive_efficiency_pct", f.driveEfficiency, U::kPercent);
    put(json, "controller_efficiency_pct", f.controllerEfficiency, U::kPercent);
    json["motor_in_airstream"] = f.motorInAirstream;
    if (f.kFactor)
        putPlain(json, "k_factor", *f.kFactor);
    put(json, "length_mm", f.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::PassiveSection& p)
{
    json["kind"] = Sections::passiveKindKey(p.kind);
    put(json, "rated_dp_Pa", p.ratedPressureDrop, U::kPascal);
    put(json, "rated_velocity_mps", p.ratedVelocity, U::kMetresPerSecond);
    put(json, "length_mm", p.length, U::kMillimetre);
}

void writeSpec(Json& json, const Sections::MixingBox& m)
{
    put(json, "outdoor_air_pct", m.outdoorAirFraction, U::kPercent);
    putOptional(json, "min_outdoor_air_m3h", m.minimumOutdoorFlow, U::kCubicMetresPerHour);
    putPlain(json, "loss_coefficient", m.lossCoefficient);
    put(json, "length_mm", m.length, U::kMillimetre);
}

void writeSpec(Json& json, const Recovery::HeatRecovery& r)
{
    using Recovery::ExchangerKind;
    const Recovery::HeatRecovery defaults;
    const bool rotary = Recovery::isRotary(r.kind);
    const bool loop = r.kind == ExchangerKind::RunAroundCoil;
    const bool hygroscopic = Recovery::transfersMoisture(r.kind);
    json["kind"] = Recovery::exchangerKindKey(r.kind);
    put(json, "efficiency_pct", r.ratedEfficiency, U::kPercent);
    putOptional(json, "rated_flow_m3h", r.ratedFlow, U::kCubicMetresPerHour);
    if (worthWriting(hygroscopic, r.ratedHumidityEfficiency, defaults.ratedHumidityEfficiency))
        put(json, "humidity_efficiency_pct", r.ratedHumidityEfficiency, U::kPercent);
    put(json, "supply_dp_Pa", r.ratedPressureDropSupply, U::kPascal);
    put(json, "extract_dp_Pa", r.ratedPressureDropExtract, U::kPascal);
    if (worthWriting(rotary, r.rotorSpeed, defaults.rotorSpeed))
        putPlain(json, "rotor_speed_rpm", r.rotorSpeed);
    if (worthWriting(rotary, r.exhaustAirTransfer, defaults.exhaustAirTransfer))
        put(json, "eatr_pct", r.exhaustAirTransfer, U::kPercent);
    if (worthWriting(rotary, r.outdoorAirCorrection, defaults.outdoorAirCorrection))
        putPlain(json, "oacf", r.outdoorAirCorrection);
    if (worthWriting(rotary, r.purgeSector, defaults.purgeSector))
        json["purge_sector"] = r.purgeSector;
    if (worthWriting(loop, r.loopFluid, defaults.loopFluid))
        json["loop_fluid"] = coolantJson(r.loopFluid);
    if (worthWriting(loop, r.pumpPower, defaults.pumpPower))
        put(json, "pump_power_W", r.pumpPower, U::kWatt);
    json["bypass_control"] = r.bypassControl;
    json["frost_strategy"] = Recovery::frostStrategyKey(r.frostStrategy);
    if (worthWriting(r.frostStrategy == Recovery::FrostStrategy::SectionalDefrost, r.defrostSections,
                     defaults.defrostSections))
        json["defrost_sections"] = r.defrostSections;
    put(json, "length_mm", r.length, U::kMillimetre);
}

void writeSpec(Json& /*json*/, const Chain::CoupledSide& /*marker*/) {}

Json sectionJson(const Chain::Section& section)
{
    Json json = Json::object();
    json["id"] = section.id;
    json["type"] = Chain::sectionTypeKey(section.spec);
    std::visit([&](const auto& spec) { writeSpec(json, spec); }, section.spec);
    return json;
}

Json pathJson(const std::vector<Chain::Section>& sections)
{
    Json json = Json::array();
    for (const auto& section : sections)
        json.push_back(sectionJson(section));
    return json;
}

Json caseJson(const Chain::DesignCase& c)
{
    Json json = Json::object();
    json["name"] = c.name;
    Json outdoor = Json::object();
    put(outdoor, "tdb_C", c.outdoorTemperature, U::kCelsius);
    put(outdoor, "rh_pct", c.outdoorHumidity, U::kPercent);
    json["outdoor"] = outdoor;
    Json room = Json::object();
    put(room, "tdb_C", c.roomTemperature, U::kCelsius);
    put(room, "rh_pct", c.roomHumidity, U::kPercent);
    json["room"] = room;
    put(json, "supply_tdb_C", c.supplySetpoint, U::kCelsius);
    putOptional(json, "supply_rh_min_pct", c.minimumSupplyHumidity, U::kPercent);
    putOptional(json, "supply_rh_max_pct", c.maximumSupplyHumidity, U::kPercent);
    json["dehumidify_with_reheat"] = c.dehumidifyWithReheat;
    json["filter_condition"] = Sections::filterConditionKey(c.filterCondition);
    put(json, "airflow_pct", c.airflowFraction, U::kPercent);
    return json;
}

const char* flowBasisKey(Chain::FlowBasis basis)
{
    return basis == Chain::FlowBasis::Actual ? "actual" : "standard_air";
}

} // namespace

nlohmann::ordered_json ProjectWriter::write(const Project& project)
{
    Json json = Json::object();
    json["format"] = std::string(ProjectFile::kFormatName);
    json["format_version"] = ProjectFile::kFormatVersion;

    Json info = Json::object();
    putText(info, "name", project.info.name);
    putText(info, "reference", project.info.reference);
    putText(info, "designer", project.info.designer);
    putText(info, "date", project.info.date);
    putText(info, "revision", project.info.revision);
    putText(info, "notes", project.info.notes);
    json["info"] = info;

    const Chain::AirHandlingUnit& unit = project.unit;
    Json site = Json::object();
    putOptional(site, "altitude_m", unit.site.altitude, U::kMetre);
    putOptional(site, "pressure_Pa", unit.site.barometricPressure, U::kPascal);
    json["site"] = site;

    Json airflows = Json::object();
    airflows["basis"] = flowBasisKey(unit.airflows.basis);
    put(airflows, "supply_m3h", unit.airflows.supply, U::kCubicMetresPerHour);
    put(airflows, "extract_m3h", unit.airflows.extract, U::kCubicMetresPerHour);
    put(airflows, "supply_external_before_Pa", unit.airflows.supplyExternalBefore, U::kPascal);
    put(airflows, "supply_external_after_Pa", unit.airflows.supplyExternalAfter, U::kPascal);
    put(airflows, "extract_external_before_Pa", unit.airflows.extractExternalBefore, U::kPascal);
    put(airflows, "extract_external_after_Pa", unit.airflows.extractExternalAfter, U::kPascal);
    json["airflows"] = airflows;

    Json casing = Json::object();
    put(casing, "max_face_velocity_mps", unit.casing.targetFaceVelocity, U::kMetresPerSecond);
    putOptional(casing, "width_mm", unit.casing.width, U::kMillimetre);
    putOptional(casing, "height_mm", unit.casing.height, U::kMillimetre);
    put(casing, "sizing_grid_mm", unit.casing.sizingGrid, U::kMillimetre);
    json["casing"] = casing;

    json["supply"] = pathJson(unit.supply);
    json["extract"] = pathJson(unit.extract);
    Json cases = Json::array();
    for (const auto& c : unit.cases)
        cases.push_back(caseJson(c));
    json["cases"] = cases;
    return json;
}

} // namespace Airwright::Core::Project
