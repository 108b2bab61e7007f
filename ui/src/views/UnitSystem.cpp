#include "airwright/ui/UnitSystem.h"

#include <cmath>

namespace Airwright::Ui {

namespace {

// IP units from their exact definitions where one exists, so that a round trip
// SI -> IP -> SI is exact to rounding. The tabulated factors of NIST SP 811
// (2008), appendix B.8, agree with these to the digits printed there
// (tests/ui/views/UnitSystemTest.cpp checks each one).
constexpr double kFoot = 0.3048;                       // m, international foot (exact)
constexpr double kInch = 0.0254;                       // m (exact)
constexpr double kPound = 0.45359237;                  // kg, avoirdupois (exact)
constexpr double kGrainsPerPound = 7000.0;             // definition of the grain
constexpr double kStandardGravity = 9.80665;           // m/s2 (exact, CGPM 1901)
// Conventional inch of water: 1 inch of water at 1000 kg/m3 under standard gravity
// (NIST SP 811 B.8 "inch of water, conventional", 249.0889 Pa). Gauges and fan
// curves in in. w.g. use this value; the "39.2 F" inch (249.082 Pa) differs by 3e-5.
constexpr double kInchOfWater = 1000.0 * kStandardGravity * kInch; // Pa
// International Table Btu: 1 Btu_IT/(lb F) = 4186.8 J/(kg K) exactly.
constexpr double kBtu = 4186.8 * kPound / 1.8;         // J = 1055.05585262
constexpr double kBtuPerHour = kBtu / 3600.0;          // W
constexpr double kCubicFootPerMinute = kFoot * kFoot * kFoot / 60.0; // m3/s
constexpr double kUsGallon = 231.0 * kInch * kInch * kInch;          // m3 (231 in3, exact)
constexpr double kGallonPerMinute = kUsGallon / 60.0;                // m3/s
constexpr double kFootPerMinute = kFoot / 60.0;                      // m/s

using Kind = UnitSystem::Kind;

// Linear part: display = si * factor (+ offset for absolute temperatures).
struct Scale {
    double factor = 1.0;
    double offset = 0.0;
};

Scale scaleFor(Kind kind, UnitSystem::System system, bool litres)
{
    const bool ip = system == UnitSystem::System::IP;
    switch (kind) {
    case Kind::Temperature:
        return ip ? Scale{1.8, 32.0} : Scale{};
    case Kind::TemperatureDifference:
        return ip ? Scale{1.8, 0.0} : Scale{};
    case Kind::Pressure:
        return ip ? Scale{1.0 / kInchOfWater, 0.0} : Scale{};
    case Kind::Power: // kW
        return ip ? Scale{1000.0 / kBtuPerHour, 0.0} : Scale{};
    case Kind::AirVolumeFlow: // m3/h
        if (ip)
            return {1.0 / 3600.0 / kCubicFootPerMinute, 0.0};
        return litres ? Scale{1000.0 / 3600.0, 0.0} : Scale{};
    case Kind::LiquidVolumeFlow: // l/s
        return ip ? Scale{1.0e-3 / kGallonPerMinute, 0.0} : Scale{};
    case Kind::MassFlowPerSecond: // kg/s
    case Kind::MassFlowPerHour:   // kg/h
        return ip ? Scale{1.0 / kPound, 0.0} : Scale{};
    case Kind::Velocity: // m/s
        return ip ? Scale{1.0 / kFootPerMinute, 0.0} : Scale{};
    case Kind::HumidityRatio: // g/kg -> grains per pound: (g/kg / 1000) * 7000
        return ip ? Scale{kGrainsPerPound / 1000.0, 0.0} : Scale{};
    case Kind::Conductance: // kW/K -> Btu/(h F)
        return ip ? Scale{1000.0 / (kBtuPerHour * 1.8), 0.0} : Scale{};
    case Kind::Percent:
    case Kind::Current:
    case Kind::Number:
    case Kind::Text:
        return {};
    }
    return {};
}

int defaultDecimals(Kind kind, UnitSystem::System system, bool litres, double shown)
{
    const bool ip = system == UnitSystem::System::IP;
    switch (kind) {
    case Kind::Temperature:
    case Kind::TemperatureDifference:
        return 1;
    case Kind::Pressure:
        return ip ? 2 : 0;
    case Kind::Power:
        return ip ? 0 : 1;
    case Kind::AirVolumeFlow:
        return (!ip && litres && std::abs(shown) < 100.0) ? 1 : 0;
    case Kind::LiquidVolumeFlow:
        return ip ? 1 : 2;
    case Kind::MassFlowPerSecond:
        return 3;
    case Kind::MassFlowPerHour:
        return 1;
    case Kind::Velocity:
        return ip ? 0 : 2;
    case Kind::Percent:
        return 1;
    case Kind::HumidityRatio:
        return ip ? 1 : 2;
    case Kind::Current:
        return 1;
    case Kind::Conductance:
        return ip ? 0 : 2;
    case Kind::Number:
    case Kind::Text: {
        const double a = std::abs(shown);
        if (a == std::floor(a) && a < 1e9)
            return 0;
        return a >= 100.0 ? 0 : a >= 10.0 ? 1 : a >= 1.0 ? 2 : 3;
    }
    }
    return 2;
}

} // namespace

UnitSystem::UnitSystem(QObject* parent) : QObject(parent) {}

void UnitSystem::setSystem(System system)
{
    if (system == m_system)
        return;
    m_system = system;
    emit changed();
}

void UnitSystem::setAirflowInLitresPerSecond(bool litres)
{
    if (litres == m_litres)
        return;
    m_litres = litres;
    emit changed();
}

double UnitSystem::toDisplay(Kind kind, double si) const
{
    const Scale s = scaleFor(kind, m_system, m_litres);
    return si * s.factor + s.offset;
}

double UnitSystem::fromDisplay(Kind kind, double shown) const
{
    const Scale s = scaleFor(kind, m_system, m_litres);
    return (shown - s.offset) / s.factor;
}

QString UnitSystem::unit(Kind kind) const
{
    const bool ip = m_system == System::IP;
    switch (kind) {
    case Kind::Temperature:
        return ip ? QStringLiteral("°F") : QStringLiteral("°C");
    case Kind::TemperatureDifference:
        return ip ? QStringLiteral("°F") : QStringLiteral("K");
    case Kind::Pressure:
        return ip ? QStringLiteral("in. w.g.") : QStringLiteral("Pa");
    case Kind::Power:
        return ip ? QStringLiteral("Btu/h") : QStringLiteral("kW");
    case Kind::AirVolumeFlow:
        return ip ? QStringLiteral("cfm") : (m_litres ? QStringLiteral("l/s") : QStringLiteral("m³/h"));
    case Kind::LiquidVolumeFlow:
        return ip ? QStringLiteral("gpm") : QStringLiteral("l/s");
    case Kind::MassFlowPerSecond:
        return ip ? QStringLiteral("lb/s") : QStringLiteral("kg/s");
    case Kind::MassFlowPerHour:
        return ip ? QStringLiteral("lb/h") : QStringLiteral("kg/h");
    case Kind::Velocity:
        return ip ? QStringLiteral("fpm") : QStringLiteral("m/s");
    case Kind::Percent:
        return QStringLiteral("%");
    case Kind::HumidityRatio:
        return ip ? QStringLiteral("gr/lb") : QStringLiteral("g/kg");
    case Kind::Current:
        return QStringLiteral("A");
    case Kind::Conductance:
        return ip ? QStringLiteral("Btu/(h·°F)") : QStringLiteral("kW/K");
    case Kind::Number:
    case Kind::Text:
        return {};
    }
    return {};
}

QString UnitSystem::format(Kind kind, double si, int decimals) const
{
    const double shown = toDisplay(kind, si);
    const int d = decimals >= 0 ? decimals : defaultDecimals(kind, m_system, m_litres, shown);
    // QString::number ignores the locale: "12.5" everywhere, as files and copies need.
    // A value that rounds to zero is written without a sign ("-0.0" suggests one).
    const double rounded = std::abs(shown) < 0.5 * std::pow(10.0, -d) ? 0.0 : shown;
    const QString text = QString::number(rounded, 'f', d);
    const QString u = unit(kind);
    return u.isEmpty() ? text : text + QLatin1Char(' ') + u;
}

} // namespace Airwright::Ui
