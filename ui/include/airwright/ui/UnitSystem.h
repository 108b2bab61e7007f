#pragma once
// SI or IP for display: converts core values (always SI) to the chosen system and
// back for editors. The choice lives here, never in core.

#include "airwright/core/chain/SectionFigures.h"

#include <QObject>
#include <QString>

namespace Airwright::Ui {

class UnitSystem : public QObject {
    Q_OBJECT
public:
    enum class System { SI, IP };
    Q_ENUM(System)

    // What a value measures; SI base units as in core (C, K, Pa, kW, m3/h, ...).
    using Kind = Core::Chain::FigureKind;

    explicit UnitSystem(QObject* parent = nullptr);

    System system() const { return m_system; }
    void setSystem(System system); // emits changed()

    // SI airflow unit: m3/h or l/s (a preference of SI users).
    bool airflowInLitresPerSecond() const { return m_litres; }
    void setAirflowInLitresPerSecond(bool litres);

    double toDisplay(Kind kind, double si) const;
    double fromDisplay(Kind kind, double shown) const;
    QString unit(Kind kind) const;                  // "°C", "°F", "Pa", "in. w.g.", ...
    QString format(Kind kind, double si, int decimals = -1) const; // value and unit, locale-independent digits

    // Convenience for humidity ratio shown as g/kg or gr/lb.
    static constexpr Kind kHumidity = Kind::HumidityRatio;

signals:
    void changed();

private:
    System m_system = System::SI;
    bool m_litres = false;
};

} // namespace Airwright::Ui
