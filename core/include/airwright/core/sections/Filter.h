#pragma once

#include "airwright/core/sections/SectionContext.h"
#include "airwright/core/sections/SectionOutcome.h"

#include <optional>
#include <string_view>

namespace Airwright::Core::Sections {

// ISO 16890-1 groups; the efficiency is the one the group is named after
// (ePM1, ePM2.5, ePM10), or the gravimetric arrestance for ISO Coarse.
enum class FilterGroup { IsoCoarse, IsoEpm10, IsoEpm2_5, IsoEpm1 };
enum class FilterConstruction { Panel, Bag, Compact };
const char* filterGroupKey(FilterGroup group);           // "iso_coarse", "epm10", "epm2_5", "epm1"
const char* filterGroupLabel(FilterGroup group);         // "ISO Coarse", "ISO ePM10", ...
std::optional<FilterGroup> filterGroupFromKey(std::string_view key);
const char* filterConstructionKey(FilterConstruction construction);
std::optional<FilterConstruction> filterConstructionFromKey(std::string_view key);
const char* filterConditionKey(FilterCondition condition); // "initial", "design", "final"
std::optional<FilterCondition> filterConditionFromKey(std::string_view key);

// An air filter stage. Pressure drops are given at the nominal flow and scale
// with (q / q_nominal)^flowExponent. The design pressure drop is the mean of
// initial and final (EN 13053); the final pressure drop defaults per group.
class Filter {
public:
    FilterGroup group = FilterGroup::IsoEpm1;
    Ratio efficiency = percent(50.0);
    FilterConstruction construction = FilterConstruction::Bag;
    Pressure initialPressureDrop = pascals(60.0);
    std::optional<Pressure> finalPressureDrop;   // empty: default for the group
    std::optional<VolumeFlow> nominalFlow;       // empty: the path's design flow
    double flowExponent = 1.3;                   // common practice for pleated media
    Length length = metres(0.6);

    // Recommended final pressure drop by group (see docs/sections.md for the source).
    static Pressure defaultFinalPressureDrop(FilterGroup group);

    Pressure finalDrop() const;
    Pressure designDrop() const;

    struct Detail {
        FilterGroup group = FilterGroup::IsoEpm1;
        Ratio efficiency;
        Pressure initialDrop;    // at the actual flow
        Pressure designDrop;
        Pressure finalDrop;
        Pressure alarmSetpoint;  // differential pressure switch: final drop at this flow
        FilterCondition condition = FilterCondition::Design;
        Ratio relativeHumidity;  // at the filter; EN 13053 limits it
    };

    SectionOutcome compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const;
    void validate() const;

    bool operator==(const Filter&) const = default;
};

} // namespace Airwright::Core::Sections
