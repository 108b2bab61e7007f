#pragma once
// What an input field measures and how it is shown: the figure kinds of the
// results (converted by UnitSystem) plus the lengths and the barometric pressure
// that only inputs have. Values are held in the base unit named by the kind
// (C, Pa, kW, m3/h, %, ...; lengths in mm, altitude in m, barometric in Pa).

#include "airwright/ui/UnitSystem.h"

#include <QString>

#include <optional>

namespace Airwright::Ui {

class FieldQuantity {
public:
    enum class Extra { None, LengthMillimetres, AltitudeMetres, BarometricPressure };

    FieldQuantity(UnitSystem::Kind kind = UnitSystem::Kind::Number) : m_kind(kind) {} // NOLINT: implicit on purpose
    static FieldQuantity length() { return FieldQuantity(Extra::LengthMillimetres); }
    static FieldQuantity altitude() { return FieldQuantity(Extra::AltitudeMetres); }
    static FieldQuantity barometric() { return FieldQuantity(Extra::BarometricPressure); }

    double toDisplay(const UnitSystem& units, double base) const;
    double fromDisplay(const UnitSystem& units, double shown) const;
    QString unit(const UnitSystem& units) const;

    // Text for an editor: five significant digits, trailing zeros dropped, '.' as
    // the decimal point whatever the locale ("60", "0.4", "1.3", "101325").
    static QString editText(double shown);
    // Reads what a user typed: '.' or ',' as the decimal point, spaces ignored.
    static std::optional<double> parse(const QString& text);

private:
    explicit FieldQuantity(Extra extra) : m_extra(extra) {}

    UnitSystem::Kind m_kind = UnitSystem::Kind::Number;
    Extra m_extra = Extra::None;
};

} // namespace Airwright::Ui
