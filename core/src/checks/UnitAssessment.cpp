#include "airwright/core/checks/UnitAssessment.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/checks/RecoveryReferenceDrop.h"
#include "airwright/core/checks/Regulation1253.h"
#include "airwright/core/checks/SfpCategory.h"
#include "airwright/core/checks/VelocityClass.h"

#include <algorithm>
#include <cmath>
#include <string>
#include <variant>

namespace Airwright::Core::Checks {

namespace {

// Regulation (EU) No 1253/2014, Article 2: a unit whose maximum flow is at most
// 250 m3/h is residential; between 250 and 1000 m3/h it is residential only if
// its maker declares it so (from memory, docs/regulation.md).
constexpr double kResidentialOnlyM3h = 250.0;
constexpr double kDeclaredResidentialM3h = 1000.0;
// A case counts as full flow within this of 100 %.
constexpr double kFullFlowTolerance = 1e-6;
constexpr int kHighestQuietVelocityClass = 5; // above V5: worth a note

struct RecoverySection {
    std::string id;
    Recovery::HeatRecovery spec;
};

bool hasFan(const std::vector<Chain::Section>& path)
{
    return std::any_of(path.begin(), path.end(),
                       [](const Chain::Section& s) { return std::holds_alternative<Sections::Fan>(s.spec); });
}

std::vector<RecoverySection> recoverySections(const Chain::AirHandlingUnit& unit)
{
    std::vector<RecoverySection> found;
    for (const auto& s : unit.supply)
        if (const auto* hr = std::get_if<Recovery::HeatRecovery>(&s.spec))
            found.push_back({s.id, *hr});
    return found;
}

RegulationFilterGrade bestFilterGrade(const std::vector<Chain::SectionResult>& path)
{
    RegulationFilterGrade best = RegulationFilterGrade::None;
    for (const auto& r : path)
        if (const auto* f = std::get_if<Sections::Filter::Detail>(&r.detail)) {
            const RegulationFilterGrade g = regulationFilterGrade(f->group, f->efficiency);
            if (meetsGrade(g, best))
                best = g;
        }
    return best;
}

const Chain::DesignCase& designCaseFor(const Chain::AirHandlingUnit& unit, const std::string& name)
{
    const auto it =
        std::find_if(unit.cases.begin(), unit.cases.end(), [&](const Chain::DesignCase& c) { return c.name == name; });
    if (it == unit.cases.end())
        throw InputError("result case '" + name + "' is not one of the unit's design cases");
    return *it;
}

Velocity largestFaceVelocity(const Chain::CaseResult& result, Velocity fallback)
{
    bool any = false;
    Velocity largest = metresPerSecond(0.0);
    for (const auto* path : {&result.supply, &result.extract})
        for (const auto& r : *path) {
            largest = any ? std::max(largest, r.faceVelocity) : r.faceVelocity;
            any = true;
        }
    return any ? largest : fallback;
}

// The case's results with each heat recovery side charged with its drop at full
// core flow (RecoveryReferenceDrop.h): an open bypass must not lower SFPint.
Chain::CaseResult withReferenceRecoveryDrops(const Chain::CaseResult& result,
                                             const std::vector<RecoverySection>& recoveries,
                                             VolumeFlow caseSupplyDesignFlow)
{
    Chain::CaseResult copy = result;
    for (auto* path : {&copy.supply, &copy.extract})
        for (auto& r : *path) {
            if (!std::holds_alternative<Recovery::HeatRecoveryDetail>(r.detail))
                continue;
            const auto it = std::find_if(recoveries.begin(), recoveries.end(),
                                         [&](const RecoverySection& x) { return x.id == r.id; });
            if (it == recoveries.end())
                continue;
            r.pressureDrop = recoveryReferenceDrop(it->spec, it->spec.ratedFlow.value_or(caseSupplyDesignFlow), r);
        }
    return copy;
}

std::string wpms(SpecificFanPower v)
{
    return formatFixed(toWattsPerCubicMetrePerSecond(v), 0) + " W/(m3/s)";
}

std::string pct(Ratio r)
{
    return formatFixed(toPercent(r), 1) + " %";
}

// The requirements of Annex III for a full-flow case of a two-direction unit.
void checkRegulation(CaseAssessment& c, bool hasRecovery, const SfpIntLimit& limit, const InternalSfp& sfpInt)
{
    bool fail = false;
    const std::string source = " (Regulation (EU) No 1253/2014, from 2018)";
    if (!hasRecovery) {
        fail = true;
        c.findings.push_back({Severity::Error, "regulation.no_heat_recovery", "",
                              "a two-direction unit must have heat recovery" + source});
    } else {
        const Ratio minimum = minimumThermalEfficiency(limit.runAround);
        if (limit.thermalEfficiency < minimum) {
            fail = true;
            c.findings.push_back({Severity::Error, "regulation.efficiency_below_minimum", "",
                                  "heat recovery thermal efficiency " + pct(limit.thermalEfficiency) +
                                      " is below the minimum " + pct(minimum) + source});
        }
    }
    if (!limit.fineFilter)
        c.findings.push_back({Severity::Info, "regulation.filter_missing", "",
                              "no fine filter on the supply side: the SFPint limit is lowered by " +
                                  wpms(filterCorrection(true, false))});
    if (!limit.mediumFilter)
        c.findings.push_back({Severity::Info, "regulation.filter_missing", "",
                              "no medium or fine filter on the extract side: the SFPint limit is lowered by " +
                                  wpms(filterCorrection(false, true))});
    if (sfpInt.total > limit.limit) {
        fail = true;
        c.findings.push_back({Severity::Error, "regulation.sfpint_exceeded", "",
                              "SFPint " + wpms(sfpInt.total) + " exceeds the limit " + wpms(limit.limit) + source});
    }
    c.compliance = fail ? Compliance::Fail : Compliance::Pass;
}

} // namespace

UnitAssessment assessUnit(const Chain::AirHandlingUnit& unit, const Chain::UnitResult& result)
{
    UnitAssessment ua;
    const double qs = toCubicMetresPerSecond(unit.airflows.supply);
    const double qe = toCubicMetresPerSecond(unit.airflows.extract);
    if (!std::isfinite(qs) || !std::isfinite(qe) || std::max(qs, qe) <= 0.0)
        throw InputError("design flow", std::max(qs, qe), "m3/s", "above 0");
    ua.nominalFlow = cubicMetresPerSecond(std::max(qs, qe));
    const double area = toSquareMetres(result.sizing.crossSection);
    if (!std::isfinite(area) || area <= 0.0)
        throw InputError("unit cross-section", area, "m2", "above 0");
    ua.faceVelocity = ua.nominalFlow / result.sizing.crossSection;
    ua.velocityClass = velocityClass(ua.faceVelocity);
    ua.twoDirection = hasFan(unit.supply) && hasFan(unit.extract);

    const std::vector<RecoverySection> recoveries = recoverySections(unit);
    if (!recoveries.empty())
        ua.recoveryKind = recoveries.front().spec.kind;

    const double qnomM3h = toCubicMetresPerHour(ua.nominalFlow);
    if (qnomM3h <= kResidentialOnlyM3h)
        ua.findings.push_back({Severity::Info, "regulation.scope", "",
                               "nominal flow " + formatFixed(qnomM3h, 0) +
                                   " m3/h: a residential unit under Regulation (EU) No 1253/2014; the "
                                   "non-residential requirements are shown for information"});
    else if (qnomM3h <= kDeclaredResidentialM3h)
        ua.findings.push_back({Severity::Info, "regulation.scope", "",
                               "nominal flow " + formatFixed(qnomM3h, 0) +
                                   " m3/h: non-residential under Regulation (EU) No 1253/2014 unless "
                                   "declared for residential use only"});
    if (!ua.twoDirection)
        ua.findings.push_back({Severity::Info, "regulation.one_direction", "",
                               "not a two-direction unit (a fan in each path): the two-direction requirements "
                               "of Regulation (EU) No 1253/2014 are not assessed"});
    if (recoveries.size() > 1)
        ua.findings.push_back({Severity::Info, "regulation.several_recoveries", recoveries.front().id,
                               "more than one heat recovery section: the efficiency bonus is taken from the "
                               "first, '" +
                                   recoveries.front().id + "'"});

    bool anyPass = false;
    bool anyFail = false;
    for (const auto& cr : result.cases) {
        const Chain::DesignCase& dc = designCaseFor(unit, cr.caseName);
        const double flowFraction = toFraction(dc.airflowFraction);
        if (!std::isfinite(flowFraction) || flowFraction <= 0.0)
            throw InputError("case '" + cr.caseName + "' airflow fraction", toPercent(dc.airflowFraction), "%",
                             "above 0 %");
        CaseAssessment c;
        c.caseName = cr.caseName;
        c.specificFanPower = cr.totals.specificFanPower;
        c.sfpCategory = sfpCategory(c.specificFanPower);
        c.faceVelocity = largestFaceVelocity(cr, ua.faceVelocity * flowFraction) / flowFraction;
        c.velocityClass = velocityClass(c.faceVelocity);
        if (c.velocityClass > kHighestQuietVelocityClass)
            c.findings.push_back({Severity::Info, "class.velocity", "",
                                  "face velocity " + formatFixed(toMetresPerSecond(c.faceVelocity), 2) +
                                      " m/s at full flow: class " + velocityClassLabel(c.velocityClass) +
                                      " of EN 13053, above V5; a larger cross-section lowers the pressure "
                                      "drops and the fan power"});

        if (ua.twoDirection) {
            // The chain rates an exchanger without a rated flow at the case's supply
            // design flow; the same here, so an unbypassed case keeps its own drop.
            c.sfpInt = internalSfp(withReferenceRecoveryDrops(cr, recoveries, unit.airflows.supply * flowFraction));
            bool runAround = false;
            Ratio efficiency = fraction(0.0);
            if (!recoveries.empty()) {
                const Chain::SectionResult* r = cr.find(Chain::PathKind::Supply, recoveries.front().id);
                const auto* detail = r ? std::get_if<Recovery::HeatRecoveryDetail>(&r->detail) : nullptr;
                if (!detail)
                    throw InputError("case '" + cr.caseName + "' has no heat recovery result for section '" +
                                     recoveries.front().id + "'");
                runAround = isRunAround(detail->kind);
                efficiency = detail->regulationThermalEfficiency;
            }
            const bool fine = meetsGrade(bestFilterGrade(cr.supply), RegulationFilterGrade::Fine);
            const bool medium = meetsGrade(bestFilterGrade(cr.extract), RegulationFilterGrade::Medium);
            c.sfpIntLimit = sfpIntLimit(ua.nominalFlow, runAround, efficiency, medium, fine);
            if (std::abs(flowFraction - 1.0) <= kFullFlowTolerance) {
                checkRegulation(c, !recoveries.empty(), *c.sfpIntLimit, *c.sfpInt);
                anyPass = anyPass || c.compliance == Compliance::Pass;
                anyFail = anyFail || c.compliance == Compliance::Fail;
            } else {
                c.findings.push_back({Severity::Info, "regulation.part_flow", "",
                                      "case at " + formatFixed(toPercent(dc.airflowFraction), 0) +
                                          " % airflow: Regulation (EU) No 1253/2014 states its limits at "
                                          "nominal flow, so this case is not held against them"});
            }
        }
        ua.cases.push_back(std::move(c));
    }
    ua.compliance = anyFail ? Compliance::Fail : (anyPass ? Compliance::Pass : Compliance::NotAssessed);
    return ua;
}

} // namespace Airwright::Core::Checks
