#include "airwright/cli/ScheduleCsv.h"

#include "airwright/cli/CsvWriter.h"
#include "airwright/core/chain/SectionFigures.h"

#include <algorithm>
#include <map>
#include <variant>

namespace Airwright::Cli {

using namespace Airwright::Core;

namespace {

// A cell: a number, a word, or nothing.
using Cell = std::variant<std::monostate, double, std::string>;

const std::vector<std::string>& commonColumns()
{
    static const std::vector<std::string> columns = {
        "case",          "path",           "number",        "id",           "type",          "length_mm",
        "q_m3s",         "face_velocity_ms", "dp_Pa",       "mdot_da_in_kgs", "mdot_da_out_kgs",
        "inlet_tdb_C",   "inlet_w_gkg",    "inlet_rh_pct",  "inlet_h_kJkg", "inlet_p_Pa",
        "outlet_tdb_C",  "outlet_w_gkg",   "outlet_rh_pct", "outlet_h_kJkg", "outlet_p_Pa",
        "duty_kW",       "water_added_kgh", "water_removed_kgh"};
    return columns;
}

void putState(std::map<std::string, Cell>& row, const std::string& prefix, const Sections::AirStream& air,
              Pressure staticPressure)
{
    const auto& s = air.state;
    row[prefix + "tdb_C"] = toCelsius(s.dryBulb());
    row[prefix + "w_gkg"] = toGramsPerKilogram(s.humidityRatio());
    row[prefix + "rh_pct"] = toPercent(s.relativeHumidity());
    row[prefix + "h_kJkg"] = toKilojoulesPerKilogram(s.enthalpy());
    row[prefix + "p_Pa"] = toPascals(staticPressure);
}

std::map<std::string, Cell> rowOf(const std::string& caseName, const Chain::SectionResult& s, int number)
{
    std::map<std::string, Cell> row;
    row["case"] = caseName;
    row["path"] = std::string(Chain::pathKey(s.path));
    row["number"] = static_cast<double>(number);
    row["id"] = s.id;
    row["type"] = s.typeKey;
    row["length_mm"] = toMillimetres(s.length);
    row["q_m3s"] = toCubicMetresPerSecond(s.inletFlow);
    row["face_velocity_ms"] = toMetresPerSecond(s.faceVelocity);
    row["dp_Pa"] = toPascals(s.pressureDrop);
    row["mdot_da_in_kgs"] = toKilogramsPerSecond(s.inlet.dryAir);
    row["mdot_da_out_kgs"] = toKilogramsPerSecond(s.outlet.dryAir);
    putState(row, "inlet_", s.inlet, s.staticPressureIn);
    putState(row, "outlet_", s.outlet, s.staticPressureOut);
    row["duty_kW"] = toKilowatts(s.duty);
    row["water_added_kgh"] = toKilogramsPerSecond(s.waterAdded) * 3600.0;
    row["water_removed_kgh"] = toKilogramsPerSecond(s.waterRemoved) * 3600.0;
    // A figure with the key of a common column (a humidifier's water_added_kgh)
    // takes its place, as in the compute JSON.
    for (const auto& f : Chain::sectionFigures(s)) {
        if (f.kind == Chain::FigureKind::Text)
            row[f.key] = f.text;
        else
            row[f.key] = f.value;
    }
    return row;
}

template <class Visit>
void forEachSection(const Chain::UnitResult& result, Visit visit)
{
    for (const auto& c : result.cases)
        for (const auto* path : {&c.supply, &c.extract}) {
            int number = 0;
            for (const auto& s : *path)
                visit(c, s, ++number);
        }
}

} // namespace

std::vector<std::string> ScheduleCsv::columns(const Chain::UnitResult& result)
{
    std::vector<std::string> names = commonColumns();
    forEachSection(result, [&](const Chain::CaseResult&, const Chain::SectionResult& s, int) {
        for (const auto& f : Chain::sectionFigures(s))
            if (std::find(names.begin(), names.end(), f.key) == names.end())
                names.push_back(f.key);
    });
    return names;
}

std::string ScheduleCsv::write(const Chain::UnitResult& result)
{
    const auto names = columns(result);
    CsvWriter csv;
    for (const auto& name : names)
        csv.text(name);
    csv.endRow();
    forEachSection(result, [&](const Chain::CaseResult& c, const Chain::SectionResult& s, int number) {
        const auto row = rowOf(c.caseName, s, number);
        for (const auto& name : names) {
            const auto it = row.find(name);
            if (it == row.end() || std::holds_alternative<std::monostate>(it->second))
                csv.empty();
            else if (const auto* v = std::get_if<double>(&it->second))
                csv.number(*v);
            else
                csv.text(std::get<std::string>(it->second));
        }
        csv.endRow();
    });
    return csv.str();
}

} // namespace Airwright::Cli
