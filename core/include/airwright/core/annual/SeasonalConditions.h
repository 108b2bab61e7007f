#pragma once
// Room state and supply targets over the year, taken from the unit's design cases.
//
// The project file has no annual section, so the design cases are the only
// statement of what the room and the supply should be. Each case is an anchor at
// its outdoor temperature; in between, room temperature, room humidity ratio and
// supply setpoint are linear in the outdoor dry bulb, and constant beyond the
// coldest and the warmest case (our own rule: it follows the usual outdoor reset
// of supply temperature and lets one file carry winter, mid-season and summer).
// Cases at an outdoor temperature already taken by an earlier case are skipped.
//
// Humidity limits hold all year: the minimum supply humidity ratio is linear
// between the cases that set one (each at its own setpoint), constant beyond them;
// likewise the maximum. Reheat after dehumidification applies if any case asks
// for it. Filter condition and the other case fields come from the nearer anchor.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/IndoorTargets.h"
#include "airwright/core/chain/DesignCase.h"

#include <cstddef>
#include <string>
#include <vector>

namespace Airwright::Core::Annual {

class SeasonalConditions {
public:
    // Throws InputError when there is no case; validates every case.
    SeasonalConditions(const std::vector<Chain::DesignCase>& cases, Pressure pressure);

    IndoorTargets at(AbsoluteTemperature outdoor) const;

    // Anchor i and the weight of anchor i + 1 at an outdoor temperature (C): a
    // value v is (1 - upperWeight) v[i] + upperWeight v[i + 1]. Hot loops use it
    // to interpolate figures they keep per anchor.
    struct Weights {
        std::size_t lower = 0;
        double upperWeight = 0.0;
    };
    Weights weightsAt(double outdoorC) const;

    std::size_t anchorCount() const { return m_anchors.size(); }
    AbsoluteTemperature anchorOutdoorTemperature(std::size_t i) const;
    // The design case the chain solves for anchor i at the given airflow fraction.
    Chain::DesignCase anchorCase(std::size_t i, Ratio airflowFraction) const;
    // The design case for any outdoor state: the targets of at(), as a case the
    // chain can solve (used to check the hourly model against the full chain).
    Chain::DesignCase caseAt(AbsoluteTemperature outdoor, Ratio outdoorHumidity, Ratio airflowFraction,
                             std::string name) const;

    // Setback: room temperature and supply setpoint of every anchor lowered by
    // delta, room humidity ratio kept (capped at saturation). delta 0 .. 10 K.
    SeasonalConditions lowered(TemperatureDifference delta) const;
    // Room relative humidity of every anchor moved by offset (percentage points as
    // a fraction, e.g. -0.15), kept within 5 .. 95 %. For the sensitivity study.
    SeasonalConditions withRoomHumidityOffset(Ratio offset) const;

    Pressure pressure() const { return m_pressure; }

private:
    struct Anchor {
        Chain::DesignCase designCase;
        double outdoorC = 0.0;
        double roomC = 0.0;
        double roomW = 0.0;
        double setpointC = 0.0;
    };
    struct Limit {
        double outdoorC = 0.0;
        double w = 0.0;
    };
    SeasonalConditions() = default;
    void derive();
    static double interpolate(const std::vector<Limit>& limits, double outdoorC);

    std::vector<Anchor> m_anchors; // ascending outdoor temperature
    std::vector<Limit> m_minimum;  // ascending outdoor temperature
    std::vector<Limit> m_maximum;
    bool m_reheat = false;
    Pressure m_pressure;
};

} // namespace Airwright::Core::Annual
