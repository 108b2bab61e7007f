#include "airwright/ui/export/ScheduleUnits.h"

#include "airwright/ui/views/PsychroChartModel.h"

#include <cmath>

namespace Airwright::Ui {

namespace {

// Exact definitions (NIST SP 811, appendix B), as UnitSystem uses them.
constexpr double kInchMm = 25.4;
constexpr double kFootM = 0.3048;
constexpr double kPsiPa = 6894.757293168361; // lbf/in² = 0.45359237 x 9.80665 / 0.0254² Pa
constexpr double kCfmM3s = kFootM * kFootM * kFootM / 60.0;

} // namespace

QString ScheduleUnits::fixed(double value, int decimals)
{
    const double rounded = std::abs(value) < 0.5 * std::pow(10.0, -decimals) ? 0.0 : value;
    return QString::number(rounded, 'f', decimals);
}

int ScheduleUnits::decimals(Kind kind, double shown) const
{
    const bool imperial = ip();
    switch (kind) {
    case Kind::Temperature:
    case Kind::TemperatureDifference:
        return 1;
    case Kind::Pressure:
        return imperial ? 2 : 0;
    case Kind::Power:
        return imperial ? 0 : 1;
    case Kind::AirVolumeFlow:
        return 0;
    case Kind::LiquidVolumeFlow:
        return imperial ? 1 : 2;
    case Kind::MassFlowPerSecond:
        return 3;
    case Kind::MassFlowPerHour:
        return 1;
    case Kind::Velocity:
        return imperial ? 0 : 2;
    case Kind::Percent:
        return 1;
    case Kind::HumidityRatio:
        return imperial ? 1 : 2;
    case Kind::Current:
        return 1;
    case Kind::Conductance:
        return imperial ? 0 : 2;
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

QString ScheduleUnits::number(Kind kind, double si) const
{
    const double shown = m_units.toDisplay(kind, si);
    return fixed(shown, decimals(kind, shown));
}

QString ScheduleUnits::withUnit(Kind kind, double si) const
{
    const QString u = unit(kind);
    return u.isEmpty() ? number(kind, si) : number(kind, si) + QLatin1Char(' ') + u;
}

QString ScheduleUnits::lengthMm(double mm) const
{
    return ip() ? fixed(mm / kInchMm, 1) + QStringLiteral(" in") : fixed(mm, 0) + QStringLiteral(" mm");
}

QString ScheduleUnits::areaM2(double m2) const
{
    return ip() ? fixed(m2 / (kFootM * kFootM), 2) + QStringLiteral(" ft²") : fixed(m2, 3) + QStringLiteral(" m²");
}

QString ScheduleUnits::altitudeM(double m) const
{
    return ip() ? fixed(m / kFootM, 0) + QStringLiteral(" ft") : fixed(m, 0) + QStringLiteral(" m");
}

QString ScheduleUnits::sitePressurePa(double pa) const
{
    return ip() ? fixed(pa / kPsiPa, 2) + QStringLiteral(" psia") : fixed(pa / 1000.0, 2) + QStringLiteral(" kPa");
}

QString ScheduleUnits::enthalpyUnit() const
{
    return ip() ? QStringLiteral("Btu/lb") : QStringLiteral("kJ/kg");
}

QString ScheduleUnits::enthalpyKJkg(double kJkg) const
{
    return fixed(PsychroChartModel::enthalpyToDisplay(kJkg, ip()), 1) + QLatin1Char(' ') + enthalpyUnit();
}

QString ScheduleUnits::sfpUnit() const
{
    return ip() ? QStringLiteral("W/cfm") : QStringLiteral("W/(m³/s)");
}

QString ScheduleUnits::sfp(double wPerM3s) const
{
    return ip() ? fixed(wPerM3s * kCfmM3s, 3) + QLatin1Char(' ') + sfpUnit()
                : fixed(wPerM3s, 0) + QLatin1Char(' ') + sfpUnit();
}

} // namespace Airwright::Ui
