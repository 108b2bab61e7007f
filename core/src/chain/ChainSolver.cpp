#include "airwright/core/chain/ChainSolver.h"

#include "CaseSolver.h"
#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

#include <algorithm>
#include <cmath>
#include <string>
#include <string_view>
#include <vector>

namespace Airwright::Core::Chain {

namespace {

void validateSpec(const Section& section)
{
    try {
        std::visit(
            [](const auto& spec) {
                using T = std::decay_t<decltype(spec)>;
                if constexpr (!std::is_same_v<T, CoupledSide>)
                    spec.validate();
            },
            section.spec);
    } catch (const InputError& e) {
        throw InputError("section " + section.id + ": " + e.what());
    }
}

// Ids seen so far; a linear search, as paths are short (at most a few dozen) and
// every solve validates, so no allocation per id.
using IdList = std::vector<std::string_view>;

bool contains(const IdList& ids, std::string_view id) { return std::find(ids.begin(), ids.end(), id) != ids.end(); }

void validatePath(const std::vector<Section>& path, const char* name, IdList& ids)
{
    ids.reserve(ids.size() + path.size());
    for (std::size_t i = 0; i < path.size(); ++i) {
        const auto& section = path[i];
        const auto where = [&] { return std::string(name) + "[" + std::to_string(i) + "]"; };
        if (section.id.empty())
            throw InputError(where() + ": a section needs an id");
        if (contains(ids, section.id))
            throw InputError(where() + ": id '" + section.id + "' is used twice");
        ids.push_back(section.id);
        validateSpec(section);
    }
}

} // namespace

void ChainSolver::validate(const AirHandlingUnit& unit)
{
    const Pressure p = unit.site.pressure();
    if (!(p.value() >= 50000.0 && p.value() <= 110000.0))
        throw InputError("site pressure", p.value(), "Pa", "50000 .. 110000 Pa (about -500 .. 5500 m)");
    const auto& flows = unit.airflows;
    if (!(flows.supply.value() > 0.0 && flows.supply.value() <= 200.0))
        throw InputError("supply airflow", toCubicMetresPerHour(flows.supply), "m3/h", "above 0 .. 720000 m3/h");
    // Zero extract is a supply-only unit: no extract path, so nothing to compute there.
    if (unit.extract.empty() ? !(flows.extract.value() >= 0.0 && flows.extract.value() <= 200.0)
                             : !(flows.extract.value() > 0.0 && flows.extract.value() <= 200.0))
        throw InputError("extract airflow", toCubicMetresPerHour(flows.extract), "m3/h",
                         unit.extract.empty() ? "0 .. 720000 m3/h"
                                              : "above 0 .. 720000 m3/h (0 only for a unit without an extract path)");
    for (auto [what, value] : {std::pair{"supply external pressure before the unit", flows.supplyExternalBefore},
                               std::pair{"supply external pressure after the unit", flows.supplyExternalAfter},
                               std::pair{"extract external pressure before the unit", flows.extractExternalBefore},
                               std::pair{"extract external pressure after the unit", flows.extractExternalAfter}})
        if (!(value.value() >= 0.0 && value.value() <= 5000.0))
            throw InputError(what, value.value(), "Pa", "0 .. 5000 Pa");
    const auto& casing = unit.casing;
    if (!(casing.targetFaceVelocity.value() >= 0.5 && casing.targetFaceVelocity.value() <= 6.0))
        throw InputError("target face velocity", casing.targetFaceVelocity.value(), "m/s", "0.5 .. 6 m/s");
    for (auto [what, value] : {std::pair{"casing width", casing.width}, std::pair{"deck height", casing.height}})
        if (value && !(value->value() >= 0.2 && value->value() <= 10.0))
            throw InputError(what, toMillimetres(*value), "mm", "200 .. 10000 mm");
    if (!(casing.sizingGrid.value() >= 0.01 && casing.sizingGrid.value() <= 0.5))
        throw InputError("sizing grid", toMillimetres(casing.sizingGrid), "mm", "10 .. 500 mm");

    IdList ids;
    validatePath(unit.supply, "supply", ids);
    IdList extractIds;
    validatePath(unit.extract, "extract", extractIds);

    for (const auto& section : unit.supply) {
        if (std::holds_alternative<CoupledSide>(section.spec))
            throw InputError("supply section " + section.id
                             + ": a coupled-side marker belongs in the extract path; describe the section in supply");
        if (isCoupled(section.spec)) {
            const auto n = std::count_if(unit.extract.begin(), unit.extract.end(), [&](const Section& s) {
                return s.id == section.id && std::holds_alternative<CoupledSide>(s.spec);
            });
            if (n != 1)
                throw InputError("section " + section.id + " couples both paths: the extract path needs one entry "
                                 "of type 'coupled' with the same id");
        }
    }
    for (const auto& section : unit.extract) {
        if (isCoupled(section.spec))
            throw InputError("extract section " + section.id
                             + ": describe coupled sections in the supply path and mark them 'coupled' here");
        if (std::holds_alternative<CoupledSide>(section.spec)) {
            const auto it = std::find_if(unit.supply.begin(), unit.supply.end(),
                                         [&](const Section& s) { return s.id == section.id; });
            if (it == unit.supply.end() || !isCoupled(it->spec))
                throw InputError("extract section " + section.id
                                 + " is marked coupled but the supply path has no heat recovery or mixing section "
                                   "with that id");
        } else if (contains(ids, section.id)) {
            throw InputError("extract section " + section.id + ": id is also used in the supply path");
        }
    }
    if (unit.cases.empty())
        throw InputError("the unit needs at least one design case");
    IdList caseNames;
    for (const auto& c : unit.cases) {
        c.validate();
        if (contains(caseNames, c.name))
            throw InputError("case name '" + c.name + "' is used twice");
        caseNames.push_back(c.name);
    }
}

std::vector<ChainSolver::Problem> ChainSolver::check(const AirHandlingUnit& unit)
{
    try {
        validate(unit);
    } catch (const InputError& e) {
        return {{"", e.what()}};
    }
    // Each case as solve() computes it: the flows of a case and the air a section
    // makes are known only then. Cases are independent, so every one is tried.
    std::vector<Problem> problems;
    const UnitSizing sizing = size(unit);
    for (std::size_t i = 0; i < unit.cases.size(); ++i) {
        try {
            solveCase(unit, unit.cases[i], sizing);
        } catch (const CaseSolver::SectionError& e) {
            problems.push_back({e.place(), e.message()});
        } catch (const InputError& e) {
            problems.push_back({"cases[" + std::to_string(i) + "]", "case '" + unit.cases[i].name + "': " + e.what()});
        }
    }
    return problems;
}

UnitSizing ChainSolver::size(const AirHandlingUnit& unit)
{
    UnitSizing sizing;
    double ratio = 0.0;
    for (const auto& c : unit.cases)
        ratio = std::max(ratio, c.airflowFraction.value());
    ratio = std::max(ratio, 1.0);
    const double q = std::max(unit.airflows.supply.value(), unit.airflows.extract.value()) * ratio;
    const double grid = unit.casing.sizingGrid.value();
    const double needed = q / unit.casing.targetFaceVelocity.value();
    const auto onGrid = [grid](double v) { return std::max(grid, std::ceil(v / grid - 1e-9) * grid); };

    double w = 0.0;
    double h = 0.0;
    if (unit.casing.width && unit.casing.height) {
        w = unit.casing.width->value();
        h = unit.casing.height->value();
        sizing.sizedAutomatically = false;
    } else if (unit.casing.width) {
        w = unit.casing.width->value();
        h = onGrid(needed / w);
        sizing.sizedAutomatically = false;
    } else if (unit.casing.height) {
        h = unit.casing.height->value();
        w = onGrid(needed / h);
        sizing.sizedAutomatically = false;
    } else {
        // Smallest grid rectangle at or under the target velocity, wider than high
        // by 1 .. 2.5 (stacked decks fit a plant room better wide than tall), the
        // aspect nearest 1.6 among equal areas. Common practice, our own rule.
        double bestArea = 1e300;
        double bestAspectError = 1e300;
        const double minSide = std::max(grid, 0.3);
        for (double hh = onGrid(minSide); hh <= 5.0 + 1e-9; hh += grid) {
            // Wider than high: no taller deck can beat the best area found.
            if (hh * hh > bestArea + 1e-9)
                break;
            const double ww = onGrid(std::max(needed / hh, hh));
            const double aspect = ww / hh;
            if (aspect > 2.5 + 1e-9)
                continue;
            const double area = ww * hh;
            const double aspectError = std::abs(aspect - 1.6);
            if (area < bestArea - 1e-9 || (std::abs(area - bestArea) <= 1e-9 && aspectError < bestAspectError)) {
                bestArea = area;
                bestAspectError = aspectError;
                w = ww;
                h = hh;
            }
        }
        if (w <= 0.0) { // larger than the search range: square on the grid
            w = onGrid(std::sqrt(needed));
            h = w;
        }
    }
    sizing.width = metres(w);
    sizing.height = metres(h);
    sizing.crossSection = squareMetres(w * h);
    for (const auto& s : unit.supply)
        sizing.supplyLength += sectionLength(s.spec);
    for (const auto& s : unit.extract) {
        if (std::holds_alternative<CoupledSide>(s.spec)) {
            const auto it = std::find_if(unit.supply.begin(), unit.supply.end(),
                                         [&](const Section& x) { return x.id == s.id; });
            if (it != unit.supply.end())
                sizing.extractLength += sectionLength(it->spec);
        } else {
            sizing.extractLength += sectionLength(s.spec);
        }
    }
    sizing.unitLength = std::max(sizing.supplyLength, sizing.extractLength);
    return sizing;
}

CaseResult ChainSolver::solveCase(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing)
{
    CaseSolver solver(unit, designCase, sizing);
    return solver.run();
}

UnitResult ChainSolver::solve(const AirHandlingUnit& unit)
{
    validate(unit);
    UnitResult result;
    result.sizing = size(unit);
    result.cases.reserve(unit.cases.size());
    const CaseSolver::Evaluators evaluators = CaseSolver::makeEvaluators(unit);
    for (const auto& c : unit.cases) {
        CaseSolver solver(unit, c, result.sizing, evaluators);
        result.cases.push_back(solver.run());
    }
    return result;
}

} // namespace Airwright::Core::Chain
