#pragma once
// The annual energy of one unit: every hour of a weather year (hourly method) or
// every bin of a bin table (bin method) through the per-hour model of
// UnitHourModel, with the operating schedule deciding which hours run normally,
// run in setback or are off.
//
// Hourly method: hour i of the year in the schedule's mode at that hour.
// Bin method: each bin counts its hours times the share of the year's hours in
// normal operation and in setback (OperatingSchedule::share), assuming the
// schedule is independent of the outdoor temperature (it is not: working hours
// are the warmer part of the day; docs/annual.md). Bins are evaluated exactly
// (no table).
//
// Outdoor states are taken at the unit's site pressure, not the weather file's
// station pressure (the chain works at one pressure); a humidity ratio above
// saturation at the site pressure is capped at saturation.

#include "airwright/core/annual/AnnualResult.h"
#include "airwright/core/annual/AnnualSettings.h"
#include "airwright/core/annual/BinTable.h"
#include "airwright/core/annual/RunControl.h"
#include "airwright/core/annual/SeasonalConditions.h"
#include "airwright/core/annual/UnitHourModel.h"
#include "airwright/core/annual/WeatherYear.h"
#include "airwright/core/chain/AirHandlingUnit.h"

#include <optional>

namespace Airwright::Core::Annual {

class AnnualSimulation {
public:
    // Solves the chain for the anchor cases (UnitHourModel); throws InputError for
    // invalid settings or a unit the model cannot represent.
    AnnualSimulation(const Chain::AirHandlingUnit& unit, const Chain::UnitSizing& sizing,
                     const SeasonalConditions& conditions, const AnnualSettings& settings);
    // Sizing by ChainSolver::size, conditions from the unit's design cases.
    explicit AnnualSimulation(const Chain::AirHandlingUnit& unit, const AnnualSettings& settings = {});

    // Empty when control.stop was requested before the end.
    std::optional<AnnualResult> run(const WeatherYear& year, const RunControl& control = {}) const;
    std::optional<AnnualResult> run(const BinTable& bins, const RunControl& control = {}) const;

    const UnitHourModel& normalModel() const { return m_normal; }
    const std::optional<UnitHourModel>& setbackModel() const { return m_setback; }
    const AnnualSettings& settings() const { return m_settings; }

private:
    AnnualSettings m_settings;
    UnitHourModel m_normal;
    std::optional<UnitHourModel> m_setback;
};

} // namespace Airwright::Core::Annual
