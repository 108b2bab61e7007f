#pragma once
// What the psychrometric view draws, as plain data: the chart's reference lines
// and, per design case, the air states at the section boundaries of both paths.
// Kept apart from the widget so tests can check the numbers without rendering.
//
// Two diagrams at the project's site pressure:
// - DryBulbHumidity, the t-W chart: dry bulb horizontal, humidity ratio vertical
//   (ASHRAE Fundamentals ch. 1 chart form). Reference lines: saturation, relative
//   humidity 10..90 %, enthalpy and wet bulb.
// - Mollier, the h-x diagram: humidity ratio horizontal. The vertical coordinate
//   is the oblique one of the h-x diagram, y = (h - r0 x) / cpa with r0 = 2501
//   kJ/kg and cpa = 1.006 kJ/(kg K) (the constants of ASHRAE eq. 30), written in
//   temperature units: at x = 0 it equals the dry bulb, isotherms rise slightly
//   with x (by 1.86 x t / 1.006) and lines of constant enthalpy fall to the
//   right. Reference lines: saturation, relative humidity, enthalpy, isotherms.
//
// All positions are in display units (°C or °F, g/kg or gr/lb); the properties of
// each state are kept in SI for the tooltip, which formats them per UnitSystem.
// In IP, enthalpy is written in Btu/lb referred to dry air at 0 °F (the datum of
// IP charts) by shifting the SI value (dry air at 0 °C) by cpa x 17.78 K.

#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/project/Project.h"

#include <QPointF>
#include <QString>
#include <QVector>

#include <optional>
#include <utility>

namespace Airwright::Ui {

class UnitSystem;

class PsychroChartModel {
public:
    enum class Diagram { DryBulbHumidity, Mollier };
    enum class LineRole { Saturation, RelativeHumidity, Enthalpy, WetBulb, Isotherm };

    struct Line {
        LineRole role = LineRole::Saturation;
        QString label;            // "40 %", "50 kJ/kg", "15 °C"
        QVector<QPointF> points;  // clipped to the plot frame
        QPointF labelAt;          // where the label sits, inside the frame
    };

    struct StatePoint {
        QPointF position;                                  // plot coordinates
        Core::Chain::PathKind path = Core::Chain::PathKind::Supply;
        QString sectionId;  // the section this point leaves (or, when atInlet, enters)
        bool atInlet = false; // the first point of a path: the air before its first section
        double temperatureC = 0.0;
        double relativeHumidityPct = 0.0;
        double humidityRatioGkg = 0.0;
        double enthalpyKJkg = 0.0; // SI datum, dry air and liquid water at 0 °C
    };

    // The visible part of the diagram in plot coordinates.
    struct Frame {
        double xMin = 0.0;
        double xMax = 1.0;
        double yMin = 0.0;
        double yMax = 1.0;
        bool contains(const QPointF& p) const
        {
            return p.x() >= xMin && p.x() <= xMax && p.y() >= yMin && p.y() <= yMax;
        }
    };

    struct Process {
        QString caseName;
        QVector<StatePoint> supply;  // in flow order: inlet, then each section's outlet
        QVector<StatePoint> extract;
    };

    // Rebuilds everything from the project (site pressure) and its result; an empty
    // result keeps the reference lines and gives no processes.
    void rebuild(const Core::Project::Project& project, const std::optional<Core::Chain::UnitResult>& result,
                 const UnitSystem& units, Diagram diagram);

    Diagram diagram() const { return m_diagram; }
    double pressurePa() const { return m_pressure; }
    const Frame& frame() const { return m_frame; }
    QString xLabel() const { return m_xLabel; }
    QString yLabel() const { return m_yLabel; }
    const QVector<Line>& lines() const { return m_lines; }
    const QVector<Process>& processes() const { return m_processes; }

    // Plot position of a state given in SI (dry bulb °C, humidity ratio kg/kg).
    QPointF position(double temperatureC, double humidityRatio) const;

    // The line pieces of a section in every case and path (inlet point to outlet
    // point), for highlighting the selected section.
    QVector<std::pair<QPointF, QPointF>> segmentsOf(const QString& sectionId) const;

    // Tooltip text: case, path, boundary, then t, RH, W and h in the chosen units.
    QString describe(const Process& process, const StatePoint& point, const UnitSystem& units) const;
    // The same for several boundaries of one path drawn on the same spot (sections
    // that change only the pressure): all of them are named, the state of the first
    // is shown.
    QString describe(const Process& process, const QVector<StatePoint>& samePlace, const UnitSystem& units) const;

    // Enthalpy for display: kJ/kg (SI) or Btu/lb referred to dry air at 0 °F (IP).
    static double enthalpyToDisplay(double kJkg, bool ip);
    static double enthalpyFromDisplay(double shown, bool ip);

private:
    void buildFrame(const std::optional<Core::Chain::UnitResult>& result);
    void buildLines();
    void addLine(LineRole role, const QString& label, const QVector<QPointF>& raw, double labelFraction);
    StatePoint makePoint(const Core::Sections::AirStream& air, Core::Chain::PathKind path, const std::string& id,
                         bool atInlet) const;

    Diagram m_diagram = Diagram::DryBulbHumidity;
    bool m_ip = false;
    double m_pressure = 101325.0;
    Frame m_frame;
    QString m_xLabel;
    QString m_yLabel;
    QString m_temperatureUnit;
    QString m_humidityUnit;
    QVector<Line> m_lines;
    QVector<Process> m_processes;
};

} // namespace Airwright::Ui
