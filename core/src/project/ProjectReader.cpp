#include "ProjectReader.h"

#include "ReadHelpers.h"
#include "SectionReader.h"
#include "airwright/core/InputError.h"

#include <chrono>
#include <map>

namespace Airwright::Core::Project {

namespace {

namespace U = FileUnits;

void readInfo(JsonObjectReader& root, ProjectInfo& info)
{
    const Json* value = root.object("info", Presence::Optional);
    if (!value)
        return;
    JsonObjectReader r(*value, "info", root.log());
    const auto text = [&](const char* key, std::string& target) {
        if (const auto s = r.string(key, Presence::Optional))
            target = *s;
    };
    text("name", info.name);
    text("reference", info.reference);
    text("designer", info.designer);
    text("date", info.date);
    text("revision", info.revision);
    text("notes", info.notes);
    if (!info.date.empty()) {
        const std::string& d = info.date;
        bool shape = d.size() == 10 && d[4] == '-' && d[7] == '-';
        for (std::size_t i = 0; shape && i < d.size(); ++i)
            shape = i == 4 || i == 7 || (d[i] >= '0' && d[i] <= '9');
        const auto digits = [&](std::size_t from, std::size_t count) { return std::stoi(d.substr(from, count)); };
        const bool real = shape && std::chrono::year_month_day(std::chrono::year(digits(0, 4)),
                                                               std::chrono::month(static_cast<unsigned>(digits(5, 2))),
                                                               std::chrono::day(static_cast<unsigned>(digits(8, 2))))
                                       .ok();
        if (!real)
            r.error("date", "'" + d + "' is not a calendar date in the form yyyy-mm-dd");
    }
    r.reportUnknownKeys();
}

void readSite(JsonObjectReader& root, Chain::Site& site)
{
    const Json* value = root.object("site", Presence::Required);
    if (!value)
        return;
    JsonObjectReader r(*value, "site", root.log());
    site.altitude.reset();
    site.barometricPressure.reset();
    // Sites from below sea level to high mountain towns. The solver works from
    // 50000 to 110000 Pa (ChainSolver::validate); 5500 m is the highest altitude
    // whose standard-atmosphere pressure (50506 Pa) stays inside that.
    readOptionalQuantity(r, "altitude_m", site.altitude, U::kMetre, Limits{-500.0, 5500.0});
    readOptionalQuantity(r, "pressure_Pa", site.barometricPressure, U::kPascal, Limits{50000.0, 110000.0});
    if (!r.has("altitude_m") && !r.has("pressure_Pa"))
        r.log().error("site", "give altitude_m or pressure_Pa");
    r.reportUnknownKeys();
}

void readAirflows(JsonObjectReader& root, Chain::Airflows& airflows)
{
    const Json* value = root.object("airflows", Presence::Required);
    if (!value)
        return;
    JsonObjectReader r(*value, "airflows", root.log());
    if (const auto basis = r.string("basis", Presence::Optional)) {
        if (*basis == "standard_air")
            airflows.basis = Chain::FlowBasis::StandardAir;
        else if (*basis == "actual")
            airflows.basis = Chain::FlowBasis::Actual;
        else
            r.error("basis", "unknown flow basis '" + *basis + "' (allowed: standard_air, actual)");
    }
    // Up to 200 m3/s, the solver's limit (ChainSolver::validate).
    const Limits flow{0.0, 720000.0, true};
    readQuantity(r, "supply_m3h", airflows.supply, U::kCubicMetresPerHour, flow, Presence::Required);
    // Zero extract is a supply-only unit; checked against the extract path later.
    readQuantity(r, "extract_m3h", airflows.extract, U::kCubicMetresPerHour, Limits{0.0, 720000.0},
                 Presence::Required);
    const Limits external{0.0, 3000.0};
    readQuantity(r, "supply_external_before_Pa", airflows.supplyExternalBefore, U::kPascal, external);
    readQuantity(r, "supply_external_after_Pa", airflows.supplyExternalAfter, U::kPascal, external);
    readQuantity(r, "extract_external_before_Pa", airflows.extractExternalBefore, U::kPascal, external);
    readQuantity(r, "extract_external_after_Pa", airflows.extractExternalAfter, U::kPascal, external);
    r.reportUnknownKeys();
}

void readCasing(JsonObjectReader& root, Chain::Casing& casing)
{
    const Json* value = root.object("casing", Presence::Optional);
    if (!value)
        return;
    JsonObjectReader r(*value, "casing", root.log());
    // The solver's ranges (ChainSolver::validate), so that a file that reads
    // cleanly is also one the solver takes.
    readQuantity(r, "max_face_velocity_mps", casing.targetFaceVelocity, U::kMetresPerSecond, Limits{0.5, 6.0});
    readOptionalQuantity(r, "width_mm", casing.width, U::kMillimetre, Limits{200.0, 10000.0});
    readOptionalQuantity(r, "height_mm", casing.height, U::kMillimetre, Limits{200.0, 10000.0});
    readQuantity(r, "sizing_grid_mm", casing.sizingGrid, U::kMillimetre, Limits{10.0, 500.0});
    r.reportUnknownKeys();
}

struct PlacedSection {
    std::string path;
    Chain::Section section;
};

std::vector<PlacedSection> readPath(JsonObjectReader& root, const char* key, PathSide side)
{
    std::vector<PlacedSection> placed;
    const Json* value = root.array(key, Presence::Required);
    if (!value)
        return placed;
    for (std::size_t i = 0; i < value->size(); ++i) {
        const std::string path = indexPath(key, i);
        if (auto section = SectionReader::read((*value)[i], path, side, root.log()))
            placed.push_back({path, std::move(*section)});
    }
    return placed;
}

// Ids name sections in results and findings: unique over both paths, except that
// a coupled section's marker in the extract path repeats its supply-path id.
void checkIds(const std::vector<PlacedSection>& supply, const std::vector<PlacedSection>& extract, IssueLog& log)
{
    std::map<std::string, const PlacedSection*> byId;
    const auto claim = [&](const PlacedSection& p) {
        if (p.section.id.empty())
            return;
        const auto [it, inserted] = byId.emplace(p.section.id, &p);
        if (!inserted)
            log.error(childPath(p.path, "id"),
                      "duplicate id '" + p.section.id + "' (first used at " + it->second->path + ")");
    };
    for (const auto& p : supply)
        claim(p);

    std::map<std::string, const PlacedSection*> markers;
    for (const auto& p : extract) {
        if (!std::holds_alternative<Chain::CoupledSide>(p.section.spec)) {
            claim(p);
            continue;
        }
        if (p.section.id.empty())
            continue;
        const auto [first, inserted] = markers.emplace(p.section.id, &p);
        if (!inserted) {
            log.error(childPath(p.path, "id"),
                      "duplicate coupled marker '" + p.section.id + "' (first at " + first->second->path + ")");
            continue;
        }
        const auto found = byId.find(p.section.id);
        if (found == byId.end() || found->second->path.rfind("supply", 0) != 0)
            log.error(childPath(p.path, "id"),
                      "coupled marker '" + p.section.id + "' has no section with this id in the supply path");
        else if (!Chain::isCoupled(found->second->section.spec))
            log.error(childPath(p.path, "id"), "'" + p.section.id + "' at " + found->second->path + " is a " +
                                                   Chain::sectionTypeKey(found->second->section.spec) +
                                                   ", not a coupled section (heat_recovery or mixing)");
    }
    for (const auto& p : supply) {
        if (Chain::isCoupled(p.section.spec) && !p.section.id.empty() && !markers.contains(p.section.id))
            log.error(p.path, std::string(Chain::sectionTypeKey(p.section.spec)) + " '" + p.section.id +
                                  "' couples both paths: the extract path needs {\"id\": \"" + p.section.id +
                                  "\", \"type\": \"coupled\"} where its extract side sits");
    }
}

Chain::DesignCase readCase(const Json& value, const std::string& path, IssueLog& log)
{
    Chain::DesignCase c;
    if (!value.is_object()) {
        log.error(path, std::string("must be an object, got ") + jsonTypeName(value));
        return c;
    }
    const std::size_t errorsBefore = log.errorCount();
    JsonObjectReader r(value, path, log);
    if (const auto name = r.string("name", Presence::Required)) {
        if (name->empty())
            r.error("name", "must not be empty");
        c.name = *name;
    }
    const Limits humidity{0.0, 100.0};
    const auto air = [&](const char* key, AbsoluteTemperature& t, Ratio& rh, const Limits& temperature) {
        const Json* object = r.object(key, Presence::Required);
        if (!object)
            return;
        JsonObjectReader a(*object, r.pathOf(key), log);
        readQuantity(a, "tdb_C", t, U::kCelsius, temperature, Presence::Required);
        readQuantity(a, "rh_pct", rh, U::kPercent, humidity, Presence::Required);
        a.reportUnknownKeys();
    };
    air("outdoor", c.outdoorTemperature, c.outdoorHumidity, Limits{-60.0, 60.0});
    air("room", c.roomTemperature, c.roomHumidity, Limits{0.0, 50.0});
    readQuantity(r, "supply_tdb_C", c.supplySetpoint, U::kCelsius, Limits{0.0, 60.0}, Presence::Required);
    const bool minOk = readOptionalQuantity(r, "supply_rh_min_pct", c.minimumSupplyHumidity, U::kPercent, humidity);
    const bool maxOk = readOptionalQuantity(r, "supply_rh_max_pct", c.maximumSupplyHumidity, U::kPercent, humidity);
    if (minOk && maxOk && c.minimumSupplyHumidity && c.maximumSupplyHumidity &&
        *c.maximumSupplyHumidity < *c.minimumSupplyHumidity)
        r.error("supply_rh_max_pct",
                "must be at least supply_rh_min_pct (" + fileText(*c.minimumSupplyHumidity, U::kPercent) + ")");
    readBoolean(r, "dehumidify_with_reheat", c.dehumidifyWithReheat);
    readEnum(r, "filter_condition", c.filterCondition, "filter condition",
             {Sections::FilterCondition::Initial, Sections::FilterCondition::Design, Sections::FilterCondition::Final},
             &Sections::filterConditionKey, &Sections::filterConditionFromKey);
    readQuantity(r, "airflow_pct", c.airflowFraction, U::kPercent, Limits{5.0, 150.0});
    r.reportUnknownKeys();
    if (log.errorCount() == errorsBefore) {
        try {
            c.validate();
        } catch (const InputError& e) {
            log.error(path, e.what());
        }
    }
    return c;
}

} // namespace

Project ProjectReader::read(const Json& document, IssueLog& log)
{
    Project project;
    JsonObjectReader root(document, "", log);
    root.take("format", Presence::Required);         // checked by the caller
    root.take("format_version", Presence::Required); // idem
    readInfo(root, project.info);
    Chain::AirHandlingUnit& unit = project.unit;
    readSite(root, unit.site);
    readAirflows(root, unit.airflows);
    readCasing(root, unit.casing);

    const auto supply = readPath(root, "supply", PathSide::Supply);
    const auto extract = readPath(root, "extract", PathSide::Extract);
    const auto arrayOf = [&](const char* key) -> const Json* {
        const auto found = document.find(key);
        return found != document.end() && found->is_array() ? &*found : nullptr;
    };
    if (const Json* s = arrayOf("supply"); s && s->empty())
        log.error("supply", "must hold at least one section");
    if (const Json* e = arrayOf("extract"); e && !e->empty() && unit.airflows.extract.value() <= 0.0)
        log.error("airflows.extract_m3h", "must be positive when the extract path has sections");
    checkIds(supply, extract, log);
    for (const auto& p : supply)
        unit.supply.push_back(p.section);
    for (const auto& p : extract)
        unit.extract.push_back(p.section);

    if (const Json* cases = root.array("cases", Presence::Required)) {
        if (cases->empty())
            log.error("cases", "must hold at least one design case");
        std::map<std::string, std::string> firstByName;
        for (std::size_t i = 0; i < cases->size(); ++i) {
            const std::string path = indexPath("cases", i);
            unit.cases.push_back(readCase((*cases)[i], path, log));
            const std::string& name = unit.cases.back().name;
            if (name.empty())
                continue;
            const auto [it, inserted] = firstByName.emplace(name, path);
            if (!inserted)
                log.error(childPath(path, "name"), "duplicate name '" + name + "' (first used at " + it->second + ")");
        }
    }
    root.reportUnknownKeys();
    return project;
}

} // namespace Airwright::Core::Project
