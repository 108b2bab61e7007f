#pragma once
// Number text for the printed schedule: the SI/IP conversions of UnitSystem for
// every FigureKind, plus the few quantities a schedule prints that a figure never
// carries (lengths, areas, enthalpy, specific fan power, site pressure), and
// fixed decimals per quantity so that a column reads evenly. Locale-independent.

#include "airwright/ui/UnitSystem.h"

#include <QString>

namespace Airwright::Ui {

class ScheduleUnits {
public:
    using Kind = UnitSystem::Kind;

    explicit ScheduleUnits(const UnitSystem& units) : m_units(units) {}

    bool ip() const { return m_units.system() == UnitSystem::System::IP; }
    const UnitSystem& system() const { return m_units; }

    // A figure's value (in its SI unit, as SectionFigures gives it) without and with its unit.
    QString number(Kind kind, double si) const;
    QString withUnit(Kind kind, double si) const;
    QString unit(Kind kind) const { return m_units.unit(kind); }

    QString lengthMm(double mm) const;           // mm, or in (IP), with the unit
    QString areaM2(double m2) const;             // m², or ft²
    QString altitudeM(double m) const;           // m, or ft
    QString sitePressurePa(double pa) const;     // kPa, or psia
    QString enthalpyKJkg(double kJkg) const;     // kJ/kg, or Btu/lb (0 °F datum)
    QString sfp(double wPerM3s) const;           // W/(m³/s), or W/cfm
    QString sfpUnit() const;
    QString enthalpyUnit() const;

    // Plain numbers: fixed decimals, no "-0".
    static QString fixed(double value, int decimals);

private:
    int decimals(Kind kind, double shown) const;

    const UnitSystem& m_units;
};

} // namespace Airwright::Ui
