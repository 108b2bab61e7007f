#pragma once
// The type-specific figures of a section result as a flat, ordered list: one
// place that turns each Detail struct into named numbers, so the command line,
// the tables and the printed schedule show the same figures under the same keys.

#include "airwright/core/chain/SectionResult.h"

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Core::Chain {

// What a figure measures, so a view can convert it (SI/IP) without guessing.
enum class FigureKind {
    Temperature,           // C
    TemperatureDifference, // K
    Pressure,              // Pa
    Power,                 // kW
    AirVolumeFlow,         // m3/h
    LiquidVolumeFlow,      // l/s
    MassFlowPerSecond,     // kg/s
    MassFlowPerHour,       // kg/h
    Velocity,              // m/s
    Percent,               // %
    HumidityRatio,         // g/kg
    Current,               // A
    Conductance,           // kW/K
    Number,                // plain number (rows, steps, class)
    Text,                  // a word: see Figure::text
};

struct Figure {
    std::string key;    // stable, with the unit: "water_flow_kgs", "condensate_kgh"
    std::string label;  // plain words for people
    FigureKind kind = FigureKind::Number;
    double value = 0.0; // in the unit of the key
    std::string text;   // for FigureKind::Text
};

std::vector<Figure> sectionFigures(const SectionResult& result);

// The unit symbol of a kind in SI ("C", "Pa", "kW", ...).
const char* figureUnit(FigureKind kind);

} // namespace Airwright::Core::Chain
