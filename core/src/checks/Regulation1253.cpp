#include "airwright/core/checks/Regulation1253.h"

#include "airwright/core/InputError.h"

#include <cmath>

namespace Airwright::Core::Checks {

namespace {

// Regulation (EU) No 1253/2014, Annex III point 2 (from 1 January 2018) and
// Annex IX; see docs/regulation.md for which of these were read.
constexpr double kMinimumEfficiency = 0.73;
constexpr double kMinimumEfficiencyRunAround = 0.68;
constexpr double kBonusFactor = 3000.0; // W/(m3/s) per unit of efficiency
constexpr double kFlowBreak = 2.0;      // m3/s
constexpr double kBaseBelow = 1100.0;   // W/(m3/s), other heat recovery
constexpr double kBaseAbove = 800.0;
constexpr double kBaseBelowRunAround = 1600.0;
constexpr double kBaseAboveRunAround = 1300.0;
constexpr double kFlowSlope = 300.0 / 2.0; // "300 x qnom / 2"
constexpr double kMissingMedium = 160.0;   // F, W/(m3/s) (Pa)
constexpr double kMissingFine = 200.0;

// ISO 16890 groups to the regulation's grades (common practice, docs/regulation.md).
constexpr double kGroupMinimum = 0.50; // ISO 16890-1: a group needs at least 50 %
constexpr double kFineEpm2_5 = 0.65;   // ePM2.5 at or above this compares with F7

void checkEfficiency(const char* what, Ratio efficiency)
{
    const double e = toFraction(efficiency);
    if (!std::isfinite(e) || e < 0.0 || e > 1.0)
        throw InputError(what, toPercent(efficiency), "%", "0 .. 100 %");
}

} // namespace

const char* regulationFilterGradeKey(RegulationFilterGrade grade)
{
    switch (grade) {
    case RegulationFilterGrade::None:
        return "none";
    case RegulationFilterGrade::Medium:
        return "medium";
    case RegulationFilterGrade::Fine:
        return "fine";
    }
    return "none";
}

RegulationFilterGrade regulationFilterGrade(Sections::FilterGroup group, Ratio efficiency)
{
    checkEfficiency("filter efficiency", efficiency);
    const double e = toFraction(efficiency);
    if (group == Sections::FilterGroup::IsoCoarse || e < kGroupMinimum)
        return RegulationFilterGrade::None;
    switch (group) {
    case Sections::FilterGroup::IsoEpm1:
        return RegulationFilterGrade::Fine;
    case Sections::FilterGroup::IsoEpm2_5:
        return e >= kFineEpm2_5 ? RegulationFilterGrade::Fine : RegulationFilterGrade::Medium;
    case Sections::FilterGroup::IsoEpm10:
        return RegulationFilterGrade::Medium;
    case Sections::FilterGroup::IsoCoarse:
        break;
    }
    return RegulationFilterGrade::None;
}

bool meetsGrade(RegulationFilterGrade present, RegulationFilterGrade required)
{
    return static_cast<int>(present) >= static_cast<int>(required);
}

bool isRunAround(Recovery::ExchangerKind kind)
{
    return kind == Recovery::ExchangerKind::RunAroundCoil;
}

Ratio minimumThermalEfficiency(bool runAround)
{
    return fraction(runAround ? kMinimumEfficiencyRunAround : kMinimumEfficiency);
}

SpecificFanPower efficiencyBonus(bool runAround, Ratio thermalEfficiency)
{
    checkEfficiency("heat recovery thermal efficiency", thermalEfficiency);
    const double excess = toFraction(thermalEfficiency) - toFraction(minimumThermalEfficiency(runAround));
    return wattsPerCubicMetrePerSecond(excess > 0.0 ? excess * kBonusFactor : 0.0);
}

SpecificFanPower filterCorrection(bool mediumFilterPresent, bool fineFilterPresent)
{
    double f = 0.0;
    if (!mediumFilterPresent)
        f += kMissingMedium;
    if (!fineFilterPresent)
        f += kMissingFine;
    return wattsPerCubicMetrePerSecond(f);
}

SpecificFanPower sfpIntLimitBase(bool runAround, VolumeFlow nominalFlow)
{
    const double q = toCubicMetresPerSecond(nominalFlow);
    if (!std::isfinite(q) || q <= 0.0)
        throw InputError("nominal flow", q, "m3/s", "above 0");
    if (q < kFlowBreak)
        return wattsPerCubicMetrePerSecond((runAround ? kBaseBelowRunAround : kBaseBelow) - kFlowSlope * q);
    return wattsPerCubicMetrePerSecond(runAround ? kBaseAboveRunAround : kBaseAbove);
}

SfpIntLimit sfpIntLimit(VolumeFlow nominalFlow, bool runAround, Ratio thermalEfficiency, bool mediumFilterPresent,
                        bool fineFilterPresent)
{
    SfpIntLimit l;
    l.nominalFlow = nominalFlow;
    l.runAround = runAround;
    l.thermalEfficiency = thermalEfficiency;
    l.mediumFilter = mediumFilterPresent;
    l.fineFilter = fineFilterPresent;
    l.base = sfpIntLimitBase(runAround, nominalFlow);
    l.efficiencyBonus = efficiencyBonus(runAround, thermalEfficiency);
    l.filterCorrection = filterCorrection(mediumFilterPresent, fineFilterPresent);
    l.limit = l.base + l.efficiencyBonus - l.filterCorrection;
    return l;
}

} // namespace Airwright::Core::Checks
