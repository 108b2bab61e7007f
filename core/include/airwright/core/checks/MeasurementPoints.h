#pragma once
// The measuring and control points a unit's design implies, for the controls
// engineer and the commissioning sheet: where each sensor sits, what it measures,
// the range it will see over the design cases, its setpoints and a transmitter
// range to order.
//
// Which points (our selection; sources and practice named per point):
// - air temperature at the outdoor intake, the supply outlet and the extract inlet;
// - differential pressure over each filter: clean value and alarm (its final drop),
//   both at the path's design flow (EN 13053 uses the final drop as the change point);
// - differential pressure over the heat exchanger on the extract side: clean value
//   and frost alarm (clean + 5 .. 10 Pa, common practice; HeatRecoveryDetail carries it);
// - differential pressure at each fan's inlet ring for the airflow, q = k sqrt(dp)
//   with the fan's k-factor (q in m3/h, dp in Pa), so dp = (q / k)^2; without a
//   k-factor the point lists the airflow range and asks for the maker's factor;
// - a frost thermostat after each water heating coil, about +5 C (common practice;
//   ASHRAE Guideline 36-2021 describes staged freeze protection);
// - humidity where the control needs it: after a humidifier (supply humidity and a
//   high-limit humidistat) and for dehumidification (supply and extract humidity).
//
// Transmitter ranges come from a series of standard spans (common practice, see
// standardTransmitterRanges): the smallest span whose full scale is above the
// highest value the point must show (expected maximum and every setpoint).

#include "airwright/core/Quantities.h"
#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"

#include <optional>
#include <string>
#include <variant>
#include <vector>

namespace Airwright::Core::Checks {

enum class PointQuantity {
    Temperature,          // air dry bulb
    RelativeHumidity,
    DifferentialPressure,
    AirVolumeFlow,        // airflow known only as a flow (fan without k-factor)
};
const char* pointQuantityKey(PointQuantity quantity); // "temperature", "relative_humidity", ...

enum class PointPurpose {
    OutdoorTemperature,
    SupplyTemperature,
    ExtractTemperature,
    FilterPressureDrop,
    RecoveryPressureDrop, // extract side of the heat exchanger: frost detection
    FanAirflow,
    FrostThermostat,
    SupplyHumidity,
    HumidifierHighLimit,
    ExtractHumidity,
};
const char* pointPurposeKey(PointPurpose purpose);   // "outdoor_temperature", ...
const char* pointPurposeLabel(PointPurpose purpose); // plain words

// Where the sensor or its taps are.
enum class PointPlacement {
    Between, // in the air stream between two sections (or at the path's inlet / outlet)
    Across,  // two taps, before and after the section
    AtFan,   // on the fan's inlet ring
};
const char* pointPlacementKey(PointPlacement placement); // "between", "across", "at_fan"

// A value in the point's quantity: AbsoluteTemperature (Temperature), Ratio
// (RelativeHumidity), Pressure (DifferentialPressure), VolumeFlow (AirVolumeFlow).
using PointValue = std::variant<AbsoluteTemperature, Ratio, Pressure, VolumeFlow>;

// For output only: the value in the point unit of its quantity (C, %, Pa, m3/h).
double toPointUnit(const PointValue& value);
const char* pointUnit(PointQuantity quantity); // "C", "%", "Pa", "m3/h"

struct PointSetpoint {
    std::string key;   // stable: "clean", "alarm", "frost", "setpoint", "minimum", "maximum", "high_limit", "design_flow"
    std::string label; // plain words, with the case it belongs to where it varies
    PointValue value;
    std::string basis; // where the figure comes from ("final pressure drop at design flow", "common practice")
};

struct TransmitterRange {
    PointValue low;
    PointValue high;
};

struct MeasurementPoint {
    std::string tag;                    // unique in the unit: "T-ODA", "DP-oda-filter", ...
    PointPurpose purpose = PointPurpose::OutdoorTemperature;
    PointQuantity quantity = PointQuantity::Temperature;
    Chain::PathKind path = Chain::PathKind::Supply;
    PointPlacement placement = PointPlacement::Between;
    std::string sectionId;              // Across / AtFan: the section; Between: the section it serves, if any
    std::string upstreamId;             // Between: section before the point, empty at the path's inlet
    std::string downstreamId;           // Between: section after the point, empty at the path's outlet
    PointValue expectedLow;             // over the computed cases (see the header comment per purpose)
    PointValue expectedHigh;
    std::vector<PointSetpoint> setpoints;
    std::optional<TransmitterRange> transmitter; // empty: none of the standard spans fits, or a flow point
    std::optional<double> kFactor;      // FanAirflow: m3/h per sqrt(Pa)
    std::string note;                   // method, source, what to ask the maker
};

// Every point, supply path first, in flow order. Throws InputError when the
// result has no cases or does not belong to the unit (a section of the unit
// missing from a case's results).
std::vector<MeasurementPoint> measurementPoints(const Chain::AirHandlingUnit& unit, const Chain::UnitResult& result);

// "supply path, between 'oda-filter' and 'hr'", "extract path, across 'hr'", ...
std::string pointPosition(const MeasurementPoint& point);

// The standard spans of each quantity, smallest first (common practice for
// building-services transmitters): differential pressure 0..100, 250, 500, 1000,
// 2500 Pa; temperature -50..50 C, then 0..100 C and 0..150 C; relative humidity
// 0..100 %. An airflow point has none.
std::vector<TransmitterRange> standardTransmitterRanges(PointQuantity quantity);

// The smallest standard span that holds [lowest, highest] with highest below full
// scale (a value on full scale leaves no headroom). Empty when none does.
// Throws InputError when the values are not of the quantity or not finite.
std::optional<TransmitterRange> suggestTransmitterRange(PointQuantity quantity, const PointValue& lowest,
                                                        const PointValue& highest);

} // namespace Airwright::Core::Checks
