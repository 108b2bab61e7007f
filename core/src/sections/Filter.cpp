#include "airwright/core/sections/Filter.h"
#include "airwright/core/PowerLaw.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

#include <cmath>

namespace Airwright::Core::Sections {

const char* filterGroupKey(FilterGroup group)
{
    switch (group) {
    case FilterGroup::IsoCoarse:
        return "iso_coarse";
    case FilterGroup::IsoEpm10:
        return "epm10";
    case FilterGroup::IsoEpm2_5:
        return "epm2_5";
    case FilterGroup::IsoEpm1:
        return "epm1";
    }
    return "epm1";
}

const char* filterGroupLabel(FilterGroup group)
{
    switch (group) {
    case FilterGroup::IsoCoarse:
        return "ISO Coarse";
    case FilterGroup::IsoEpm10:
        return "ISO ePM10";
    case FilterGroup::IsoEpm2_5:
        return "ISO ePM2.5";
    case FilterGroup::IsoEpm1:
        return "ISO ePM1";
    }
    return "ISO ePM1";
}

std::optional<FilterGroup> filterGroupFromKey(std::string_view key)
{
    for (auto g : {FilterGroup::IsoCoarse, FilterGroup::IsoEpm10, FilterGroup::IsoEpm2_5, FilterGroup::IsoEpm1})
        if (key == filterGroupKey(g))
            return g;
    return std::nullopt;
}

const char* filterConstructionKey(FilterConstruction construction)
{
    switch (construction) {
    case FilterConstruction::Panel:
        return "panel";
    case FilterConstruction::Bag:
        return "bag";
    case FilterConstruction::Compact:
        return "compact";
    }
    return "bag";
}

std::optional<FilterConstruction> filterConstructionFromKey(std::string_view key)
{
    for (auto c : {FilterConstruction::Panel, FilterConstruction::Bag, FilterConstruction::Compact})
        if (key == filterConstructionKey(c))
            return c;
    return std::nullopt;
}

const char* filterConditionKey(FilterCondition condition)
{
    switch (condition) {
    case FilterCondition::Initial:
        return "initial";
    case FilterCondition::Design:
        return "design";
    case FilterCondition::Final:
        return "final";
    }
    return "design";
}

std::optional<FilterCondition> filterConditionFromKey(std::string_view key)
{
    for (auto c : {FilterCondition::Initial, FilterCondition::Design, FilterCondition::Final})
        if (key == filterConditionKey(c))
            return c;
    return std::nullopt;
}

Pressure Filter::defaultFinalPressureDrop(FilterGroup group)
{
    // After EN 13053 (table of maximum final pressure drops: coarse 150 Pa, medium
    // 200 Pa, fine 300 Pa; from memory), mapped to ISO 16890 groups: ePM10 and
    // ePM2.5 as medium, ePM1 as fine. User-editable per filter.
    switch (group) {
    case FilterGroup::IsoCoarse:
        return pascals(150.0);
    case FilterGroup::IsoEpm10:
    case FilterGroup::IsoEpm2_5:
        return pascals(200.0);
    case FilterGroup::IsoEpm1:
        return pascals(300.0);
    }
    return pascals(300.0);
}

Pressure Filter::finalDrop() const
{
    return finalPressureDrop.value_or(defaultFinalPressureDrop(group));
}

Pressure Filter::designDrop() const
{
    return 0.5 * (initialPressureDrop + finalDrop()); // EN 13053: mean of initial and final
}

void Filter::validate() const
{
    if (!(efficiency.value() >= 0.0 && efficiency.value() <= 1.0))
        throw InputError("filter efficiency", toPercent(efficiency), "%", "0 .. 100 %");
    if (group != FilterGroup::IsoCoarse && efficiency.value() < 0.5)
        throw InputError(std::string(filterGroupLabel(group)) + " efficiency", toPercent(efficiency), "%",
                         "50 .. 100 % (ISO 16890-1: below 50 % the filter is ISO Coarse)");
    if (!(initialPressureDrop.value() > 0.0 && initialPressureDrop.value() <= 1000.0))
        throw InputError("initial filter pressure drop", initialPressureDrop.value(), "Pa", "above 0 .. 1000 Pa");
    if (finalPressureDrop && !(finalPressureDrop->value() > initialPressureDrop.value()
                               && finalPressureDrop->value() <= 2000.0))
        throw InputError("final filter pressure drop", finalPressureDrop->value(), "Pa",
                         "above the initial pressure drop (" + formatNumber(initialPressureDrop.value())
                             + " Pa) .. 2000 Pa");
    if (!finalPressureDrop && defaultFinalPressureDrop(group) <= initialPressureDrop)
        throw InputError("initial filter pressure drop", initialPressureDrop.value(), "Pa",
                         "below the default final pressure drop of the group ("
                             + formatNumber(defaultFinalPressureDrop(group).value()) + " Pa); give a final pressure drop");
    if (nominalFlow && !(nominalFlow->value() > 0.0))
        throw InputError("filter nominal flow", toCubicMetresPerHour(*nominalFlow), "m3/h", "above 0");
    if (!(flowExponent >= 1.0 && flowExponent <= 2.0))
        throw InputError("filter flow exponent", flowExponent, "", "1 .. 2");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("filter length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome Filter::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    const VolumeFlow nominal = nominalFlow.value_or(context.pathDesignFlow);
    const double ratio = nominal.value() > 0.0 ? inlet.volumeFlow().value() / nominal.value() : 1.0;
    const double scale = powerLaw(ratio, flowExponent);

    detail.group = group;
    detail.efficiency = efficiency;
    detail.initialDrop = initialPressureDrop * scale;
    detail.finalDrop = finalDrop() * scale;
    detail.designDrop = designDrop() * scale;
    detail.alarmSetpoint = detail.finalDrop;
    detail.condition = context.filterCondition;
    // The state is valid already: its relative humidity without the input checks.
    detail.relativeHumidity = Psychro::detail::relativeHumidityOf(inlet.state);

    Pressure dp = detail.designDrop;
    if (context.filterCondition == FilterCondition::Initial)
        dp = detail.initialDrop;
    else if (context.filterCondition == FilterCondition::Final)
        dp = detail.finalDrop;

    SectionOutcome outcome{inlet, dp, MassFlow{}, MassFlow{}, {}};
    if (detail.relativeHumidity.value() > 0.9 + 1e-6)
        outcome.findings.push_back(
            {Severity::Warning, "filter.humidity", "",
             "relative humidity at the filter is " + formatFixed(toPercent(detail.relativeHumidity), 0)
                 + " %; EN 13053 limits it to 90 % to keep microbes from growing in the media"});
    return outcome;
}

} // namespace Airwright::Core::Sections
