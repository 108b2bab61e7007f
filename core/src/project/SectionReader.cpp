#include "SectionReader.h"

#include "ReadHelpers.h"
#include "airwright/core/InputError.h"

#include <type_traits>
#include <variant>

namespace Airwright::Core::Project {

namespace {

namespace U = FileUnits;
using namespace Sections;

// Ranges follow the sections' own validate() so that a file that reads cleanly
// also passes the model's checks; see docs/project-format.md for the table.
const Limits kLength{0.0, 20000.0};

constexpr std::size_t kMaxIdLength = 64;

template <std::size_t I = 0> std::optional<Chain::SectionSpec> specForKey(std::string_view key)
{
    if constexpr (I < std::variant_size_v<Chain::SectionSpec>) {
        Chain::SectionSpec spec{std::in_place_index<I>};
        if (key == Chain::sectionTypeKey(spec))
            return spec;
        return specForKey<I + 1>(key);
    } else {
        return std::nullopt;
    }
}

template <std::size_t I = 0> void appendTypeKeys(std::string& text)
{
    if constexpr (I < std::variant_size_v<Chain::SectionSpec>) {
        text +=
            (text.empty() ? "" : ", ") + std::string(Chain::sectionTypeKey(Chain::SectionSpec{std::in_place_index<I>}));
        appendTypeKeys<I + 1>(text);
    }
}

bool readCoolant(JsonObjectReader& parent, std::string_view key, Coolant& target)
{
    const Json* value = parent.object(key, Presence::Optional);
    if (!value)
        return !parent.has(key);
    JsonObjectReader r(*value, parent.pathOf(key), parent.log());
    const std::size_t errorsBefore = r.log().errorCount();
    CoolantKind kind = CoolantKind::Water;
    const bool kindOk = readEnum(r, "kind", kind, "coolant",
                                 {CoolantKind::Water, CoolantKind::EthyleneGlycol, CoolantKind::PropyleneGlycol},
                                 &coolantKindKey, &coolantKindFromKey, Presence::Required);
    double concentrationPct = 0.0;
    if (kindOk && kind == CoolantKind::Water) {
        const auto given = r.number("mass_concentration_pct", Presence::Optional, Limits{0.0, 100.0});
        if (given && *given != 0.0) {
            r.error("mass_concentration_pct", "must be 0 or left out for water");
        }
    } else if (kindOk) {
        // Coolant's own limits for a glycol solution, mass fraction 0.10 .. 0.60.
        const auto given = r.number("mass_concentration_pct", Presence::Required, Limits{10.0, 60.0});
        if (given)
            concentrationPct = *given;
    } else {
        r.takeAll();
    }
    r.reportUnknownKeys();
    if (r.log().errorCount() != errorsBefore)
        return false;
    try {
        target = Coolant(kind, percent(concentrationPct));
    } catch (const InputError& e) {
        r.log().error(r.path(), e.what());
        return false;
    }
    return true;
}

void readSpec(JsonObjectReader& r, Damper& d)
{
    readEnum(r, "role", d.role, "damper role",
             {DamperRole::OutdoorAir, DamperRole::Exhaust, DamperRole::Recirculation, DamperRole::ShutOff},
             &damperRoleKey, &damperRoleFromKey, Presence::Required);
    readPlain(r, "loss_coefficient", d.lossCoefficient, Limits{0.0, 50.0});
    readInteger(r, "leakage_class", d.leakageClass, 0, 4);
    readQuantity(r, "length_mm", d.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, Filter& f)
{
    const bool groupOk =
        readEnum(r, "group", f.group, "filter group",
                 {FilterGroup::IsoCoarse, FilterGroup::IsoEpm10, FilterGroup::IsoEpm2_5, FilterGroup::IsoEpm1},
                 &filterGroupKey, &filterGroupFromKey, Presence::Required);
    const bool efficiencyOk =
        readQuantity(r, "efficiency_pct", f.efficiency, U::kPercent, Limits{0.0, 100.0}, Presence::Required);
    // ISO 16890-1 names a group after the particle size whose efficiency reaches
    // at least 50 %; below that the filter is ISO Coarse.
    if (groupOk && efficiencyOk && f.group != FilterGroup::IsoCoarse && f.efficiency < percent(50.0))
        r.error("efficiency_pct", fileText(f.efficiency, U::kPercent) + " is outside 50 .. 100 for group " +
                                      filterGroupKey(f.group) + " (ISO 16890-1: below 50 % the filter is iso_coarse)");
    readEnum(r, "construction", f.construction, "filter construction",
             {FilterConstruction::Panel, FilterConstruction::Bag, FilterConstruction::Compact}, &filterConstructionKey,
             &filterConstructionFromKey);
    const bool initialOk =
        readQuantity(r, "initial_dp_Pa", f.initialPressureDrop, U::kPascal, Limits{0.0, 1000.0, true});
    const bool finalOk =
        readOptionalQuantity(r, "final_dp_Pa", f.finalPressureDrop, U::kPascal, Limits{0.0, 2000.0, true});
    if (initialOk && finalOk && f.finalPressureDrop && !(*f.finalPressureDrop > f.initialPressureDrop))
        r.error("final_dp_Pa", "must exceed initial_dp_Pa (" + fileText(f.initialPressureDrop, U::kPascal) + ")");
    if (initialOk && groupOk && finalOk && !f.finalPressureDrop &&
        !(Filter::defaultFinalPressureDrop(f.group) > f.initialPressureDrop))
        r.error("initial_dp_Pa",
                fileText(f.initialPressureDrop, U::kPascal) +
                    " must be below the default final pressure drop of group " + filterGroupKey(f.group) + " (" +
                    fileText(Filter::defaultFinalPressureDrop(f.group), U::kPascal) + "); give final_dp_Pa");
    readOptionalQuantity(r, "nominal_flow_m3h", f.nominalFlow, U::kCubicMetresPerHour, Limits{0.0, 1.0e6, true});
    readPlain(r, "flow_exponent", f.flowExponent, Limits{1.0, 2.0});
    readQuantity(r, "length_mm", f.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, WaterHeatingCoil& c)
{
    // Up to 100 C: the fluid property tables end there (WaterHeatingCoil::validate).
    const bool flowOk = readQuantity(r, "flow_temperature_C", c.flowTemperature, U::kCelsius, Limits{0.0, 100.0, true},
                                     Presence::Required);
    const bool returnOk = readQuantity(r, "return_temperature_C", c.returnTemperature, U::kCelsius,
                                       Limits{0.0, 100.0, true}, Presence::Required);
    if (flowOk && returnOk && !(c.returnTemperature < c.flowTemperature))
        r.error("return_temperature_C",
                "must be below flow_temperature_C (" + fileText(c.flowTemperature, U::kCelsius) + ")");
    readCoolant(r, "fluid", c.fluid);
    readInteger(r, "rows", c.rows, 1, 12);
    readQuantity(r, "dp_per_row_Pa", c.pressureDropPerRow, U::kPascal, Limits{0.0, 200.0});
    readOptionalQuantity(r, "capacity_kW", c.capacity, U::kKilowatt, Limits{0.0, 100000.0, true});
    const bool outletOk = readOptionalQuantity(r, "fixed_outlet_tdb_C", c.fixedOutletTemperature, U::kCelsius,
                                               Limits{-40.0, 100.0, true, true});
    if (outletOk && flowOk && c.fixedOutletTemperature && !(*c.fixedOutletTemperature < c.flowTemperature))
        r.error("fixed_outlet_tdb_C",
                "must be below flow_temperature_C (" + fileText(c.flowTemperature, U::kCelsius) + ")");
    readQuantity(r, "length_mm", c.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, ElectricHeater& h)
{
    readOptionalQuantity(r, "rated_power_kW", h.ratedPower, U::kKilowatt, Limits{0.0, 2000.0, true});
    readInteger(r, "steps", h.steps, 0, 32);
    readQuantity(r, "dp_Pa", h.pressureDrop, U::kPascal, Limits{0.0, 500.0});
    readOptionalQuantity(r, "fixed_outlet_tdb_C", h.fixedOutletTemperature, U::kCelsius,
                         Limits{-40.0, 60.0, true, true});
    readQuantity(r, "length_mm", h.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, CoolingCoil& c)
{
    const bool flowOk = readQuantity(r, "flow_temperature_C", c.waterInletTemperature, U::kCelsius, Limits{-10.0, 25.0},
                                     Presence::Required);
    const bool returnOk = readQuantity(r, "return_temperature_C", c.waterOutletTemperature, U::kCelsius,
                                       Limits{-10.0, 30.0}, Presence::Required);
    if (flowOk && returnOk && !(c.waterOutletTemperature > c.waterInletTemperature))
        r.error("return_temperature_C",
                "must exceed flow_temperature_C (" + fileText(c.waterInletTemperature, U::kCelsius) + ")");
    readCoolant(r, "fluid", c.fluid);
    readInteger(r, "rows", c.rows, 1, 12);
    readOptionalQuantity(r, "bypass_factor", c.bypassFactor, U::kFraction, Limits{0.0, 1.0, true, true});
    readQuantity(r, "dp_per_row_Pa", c.pressureDropPerRow, U::kPascal, Limits{0.0, 200.0});
    readPlain(r, "wet_dp_factor", c.wetPressureDropFactor, Limits{1.0, 3.0});
    readOptionalQuantity(r, "capacity_kW", c.capacity, U::kKilowatt, Limits{0.0, 100000.0, true});
    readQuantity(r, "length_mm", c.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, Humidifier& h)
{
    readEnum(r, "kind", h.kind, "humidifier kind", {HumidifierKind::Steam, HumidifierKind::Adiabatic},
             &humidifierKindKey, &humidifierKindFromKey, Presence::Required);
    readQuantity(r, "saturation_efficiency_pct", h.saturationEfficiency, U::kPercent, Limits{0.0, 100.0, true});
    readQuantity(r, "steam_temperature_C", h.steamTemperature, U::kCelsius, Limits{100.0, 180.0});
    readQuantity(r, "feed_water_temperature_C", h.feedWaterTemperature, U::kCelsius, Limits{0.0, 60.0, true});
    readOptionalQuantity(r, "capacity_kgh", h.capacity, U::kKilogramsPerHour, Limits{0.0, 100000.0, true});
    readQuantity(r, "dp_Pa", h.pressureDrop, U::kPascal, Limits{0.0, 500.0});
    readQuantity(r, "length_mm", h.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, Fan& f)
{
    readQuantity(r, "fan_efficiency_pct", f.fanEfficiency, U::kPercent, Limits{5.0, 100.0});
    readQuantity(r, "motor_efficiency_pct", f.motorEfficiency, U::kPercent, Limits{30.0, 100.0});
    readInteger(r, "motor_ie_class", f.motorIeClass, 1, 5);
    readQuantity(r, "drive_efficiency_pct", f.driveEfficiency, U::kPercent, Limits{50.0, 100.0});
    readQuantity(r, "controller_efficiency_pct", f.controllerEfficiency, U::kPercent, Limits{50.0, 100.0});
    readBoolean(r, "motor_in_airstream", f.motorInAirstream);
    if (const auto k = r.number("k_factor", Presence::Optional, Limits{0.0, 1.0e5, true, true}))
        f.kFactor = *k;
    readQuantity(r, "length_mm", f.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, PassiveSection& p)
{
    readEnum(r, "kind", p.kind, "passive section kind",
             {PassiveKind::Silencer, PassiveKind::Access, PassiveKind::Empty, PassiveKind::Plenum}, &passiveKindKey,
             &passiveKindFromKey, Presence::Required);
    readQuantity(r, "rated_dp_Pa", p.ratedPressureDrop, U::kPascal, Limits{0.0, 2000.0});
    readQuantity(r, "rated_velocity_mps", p.ratedVelocity, U::kMetresPerSecond, Limits{0.0, 20.0, true});
    readQuantity(r, "length_mm", p.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, MixingBox& m)
{
    readQuantity(r, "outdoor_air_pct", m.outdoorAirFraction, U::kPercent, Limits{0.0, 100.0});
    readOptionalQuantity(r, "min_outdoor_air_m3h", m.minimumOutdoorFlow, U::kCubicMetresPerHour, Limits{0.0, 1.0e6});
    readPlain(r, "loss_coefficient", m.lossCoefficient, Limits{0.0, 50.0});
    readQuantity(r, "length_mm", m.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& r, Recovery::HeatRecovery& h)
{
    using Recovery::ExchangerKind;
    using Recovery::FrostStrategy;
    const bool kindOk =
        readEnum(r, "kind", h.kind, "exchanger kind",
                 {ExchangerKind::PlateCrossFlow, ExchangerKind::PlateCounterFlow, ExchangerKind::PlateCrossCounterFlow,
                  ExchangerKind::RotaryNonHygroscopic, ExchangerKind::RotaryHygroscopic, ExchangerKind::RotarySorption,
                  ExchangerKind::RunAroundCoil},
                 &Recovery::exchangerKindKey, &Recovery::exchangerKindFromKey, Presence::Required);
    readQuantity(r, "efficiency_pct", h.ratedEfficiency, U::kPercent, Limits{0.0, 95.0, true, true},
                 Presence::Required);
    readOptionalQuantity(r, "rated_flow_m3h", h.ratedFlow, U::kCubicMetresPerHour, Limits{0.0, 1.0e6, true});
    const bool humidityOk = readQuantity(r, "humidity_efficiency_pct", h.ratedHumidityEfficiency, U::kPercent,
                                         Limits{0.0, 95.0, false, true});
    const bool hygroscopic = Recovery::transfersMoisture(h.kind);
    if (kindOk && humidityOk && h.ratedHumidityEfficiency > percent(0.0) && !hygroscopic)
        r.error("humidity_efficiency_pct", std::string("must be 0 for a ") + Recovery::exchangerKindKey(h.kind) +
                                               " exchanger (only hygroscopic and sorption wheels transfer moisture)");
    readQuantity(r, "supply_dp_Pa", h.ratedPressureDropSupply, U::kPascal, Limits{0.0, 1000.0});
    readQuantity(r, "extract_dp_Pa", h.ratedPressureDropExtract, U::kPascal, Limits{0.0, 1000.0});
    // The rotor speed matters (and is checked by the model) for wheels only.
    const Limits rotorLimits = kindOk && Recovery::isRotary(h.kind) ? Limits{0.5, 30.0, true} : Limits{0.0, 30.0};
    readPlain(r, "rotor_speed_rpm", h.rotorSpeed, rotorLimits);
    readQuantity(r, "eatr_pct", h.exhaustAirTransfer, U::kPercent, Limits{0.0, 20.0});
    readPlain(r, "oacf", h.outdoorAirCorrection, Limits{0.8, 1.5});
    readBoolean(r, "purge_sector", h.purgeSector);
    readCoolant(r, "loop_fluid", h.loopFluid);
    readQuantity(r, "pump_power_W", h.pumpPower, U::kWatt, Limits{0.0, 100000.0});
    readBoolean(r, "bypass_control", h.bypassControl);
    const bool frostOk =
        readEnum(r, "frost_strategy", h.frostStrategy, "frost strategy",
                 {FrostStrategy::None, FrostStrategy::Bypass, FrostStrategy::Preheat, FrostStrategy::SectionalDefrost,
                  FrostStrategy::ReducedSupply, FrostStrategy::RotorSpeed},
                 &Recovery::frostStrategyKey, &Recovery::frostStrategyFromKey);
    if (kindOk && frostOk && h.frostStrategy == FrostStrategy::RotorSpeed && !Recovery::isRotary(h.kind))
        r.error("frost_strategy", std::string("'") + Recovery::frostStrategyKey(h.frostStrategy) +
                                      "' is for rotary wheels only, not for a " + Recovery::exchangerKindKey(h.kind) +
                                      " exchanger");
    readInteger(r, "defrost_sections", h.defrostSections, 2, 16);
    readQuantity(r, "length_mm", h.length, U::kMillimetre, kLength);
}

void readSpec(JsonObjectReader& /*r*/, Chain::CoupledSide& /*marker*/) {}

template <class T> void validateModel(const T& spec, const std::string& path, IssueLog& log)
{
    if constexpr (!std::is_same_v<T, Chain::CoupledSide>) {
        try {
            spec.validate();
        } catch (const InputError& e) {
            log.error(path, e.what());
        }
    }
}

} // namespace

std::string SectionReader::knownTypes()
{
    std::string text;
    appendTypeKeys(text);
    return text;
}

std::optional<Chain::Section> SectionReader::read(const Json& value, const std::string& path, PathSide side,
                                                  IssueLog& log)
{
    if (!value.is_object()) {
        log.error(path, std::string("must be an object, got ") + jsonTypeName(value));
        return std::nullopt;
    }
    JsonObjectReader r(value, path, log);
    const std::size_t errorsBefore = log.errorCount();

    Chain::Section section;
    if (const auto id = r.string("id", Presence::Required)) {
        if (id->empty())
            r.error("id", "must not be empty");
        else if (id->size() > kMaxIdLength)
            r.error("id", "must be at most " + std::to_string(kMaxIdLength) + " characters, got " +
                              std::to_string(id->size()));
        section.id = *id;
    }
    const auto type = r.string("type", Presence::Required);
    std::optional<Chain::SectionSpec> spec;
    if (type) {
        spec = specForKey(*type);
        if (!spec)
            r.error("type", "unknown section type '" + *type + "' (allowed: " + knownTypes() + ")");
    }
    if (!spec) {
        r.takeAll();
        return std::nullopt;
    }
    const bool marker = std::holds_alternative<Chain::CoupledSide>(*spec);
    if (side == PathSide::Supply && marker)
        r.error("type", "'coupled' marks a coupled section's place in the extract path; the supply path holds "
                        "the section itself");
    if (side == PathSide::Extract && Chain::isCoupled(*spec))
        r.error("type", "'" + *type + "' is described in the supply path; put {\"id\": \"" + section.id +
                            "\", \"type\": \"coupled\"} in the extract path");

    std::visit([&](auto& s) { readSpec(r, s); }, *spec);
    r.reportUnknownKeys();
    if (log.errorCount() == errorsBefore)
        std::visit([&](const auto& s) { validateModel(s, path, log); }, *spec);
    section.spec = std::move(*spec);
    return section;
}

} // namespace Airwright::Core::Project
