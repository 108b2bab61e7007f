#pragma once
// How an annual simulation runs: the operating schedule, and how the heat
// recovery is evaluated hour by hour.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/OperatingSchedule.h"

namespace Airwright::Core::Annual {

enum class ExchangerEvaluation {
    Tabulated, // on a grid of outdoor states, interpolated (UnitHourModel.h); the fast default
    EveryHour, // the HeatRecoveryEvaluator at every hour: the reference the table is checked against
};

struct AnnualSettings {
    OperatingSchedule schedule;
    ExchangerEvaluation evaluation = ExchangerEvaluation::Tabulated;
    TemperatureDifference tableStep = kelvinDifference(1.0); // 0.1 .. 5 K
    bool keepHours = false; // hourly method: AnnualResult::hours holds every hour of the year

    void validate() const; // throws InputError
    bool operator==(const AnnualSettings&) const = default;
};

} // namespace Airwright::Core::Annual
