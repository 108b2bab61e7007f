#include "airwright/ui/views/MessageUnits.h"

#include "airwright/ui/UnitSystem.h"

#include <QRegularExpression>

#include <optional>

namespace Airwright::Ui {

namespace {

using Kind = UnitSystem::Kind;

std::optional<Kind> kindOf(const QString& unit)
{
    if (unit == QLatin1String("C") || unit == QStringLiteral("°C"))
        return Kind::Temperature;
    if (unit == QLatin1String("K"))
        return Kind::TemperatureDifference;
    if (unit == QLatin1String("Pa"))
        return Kind::Pressure;
    if (unit == QLatin1String("kW"))
        return Kind::Power;
    if (unit == QLatin1String("m3/h") || unit == QStringLiteral("m³/h"))
        return Kind::AirVolumeFlow;
    if (unit == QLatin1String("l/s"))
        return Kind::LiquidVolumeFlow;
    if (unit == QLatin1String("kg/s"))
        return Kind::MassFlowPerSecond;
    if (unit == QLatin1String("kg/h"))
        return Kind::MassFlowPerHour;
    if (unit == QLatin1String("m/s"))
        return Kind::Velocity;
    if (unit == QLatin1String("g/kg"))
        return Kind::HumidityRatio;
    return std::nullopt;
}

// The number alone, with the decimals UnitSystem shows for the kind everywhere
// else in the program.
QString number(const UnitSystem& units, Kind kind, double si)
{
    const QString withUnit = units.format(kind, si);
    const QString unit = units.unit(kind);
    return unit.isEmpty() ? withUnit : withUnit.left(withUnit.size() - unit.size() - 1);
}

} // namespace

QString MessageUnits::toDisplay(const QString& siMessage, const UnitSystem& units)
{
    // An optional "a .. " range start, a number, an optional space and a unit that
    // is not the start of a longer word or a compound unit.
    static const QRegularExpression pattern(QStringLiteral(
        R"((?<![\w.])(?:(-?\d+(?:\.\d+)?) ?\.\. ?)?(-?\d+(?:\.\d+)?) ?(MWh/a|MWh|°C|C|K|Pa|kW|m3/h|m³/h|l/s|kg/s|kg/h|m/s|g/kg)(?![\w/(³²]))"));
    QString out;
    qsizetype last = 0;
    auto it = pattern.globalMatch(siMessage);
    while (it.hasNext()) {
        const QRegularExpressionMatch m = it.next();
        if (m.captured(3).startsWith(QLatin1String("MWh"))) {
            // Energy a year (the heat recovery comparison): MWh, or million Btu in
            // IP (1 MWh = 3.412142 MMBtu, NIST SP 811 via 1 Btu = 1055.056 J).
            if (units.system() == UnitSystem::System::IP) {
                out += siMessage.mid(last, m.capturedStart() - last);
                auto mmbtu = [](const QString& mwh) { return QString::number(mwh.toDouble() * 3.412142, 'f', 1); };
                if (m.capturedLength(1) > 0)
                    out += mmbtu(m.captured(1)) + QStringLiteral(" .. ");
                out += mmbtu(m.captured(2)) + QStringLiteral(" MMBtu")
                       + (m.captured(3).endsWith(QLatin1String("/a")) ? QStringLiteral("/a") : QString());
                last = m.capturedEnd();
            }
            continue;
        }
        const auto kind = kindOf(m.captured(3));
        if (!kind)
            continue;
        out += siMessage.mid(last, m.capturedStart() - last);
        if (m.capturedLength(1) > 0)
            out += number(units, *kind, m.captured(1).toDouble()) + QStringLiteral(" .. ");
        out += number(units, *kind, m.captured(2).toDouble());
        const QString shownUnit = units.unit(*kind);
        if (!shownUnit.isEmpty())
            out += QLatin1Char(' ') + shownUnit;
        last = m.capturedEnd();
    }
    out += siMessage.mid(last);
    return out;
}

} // namespace Airwright::Ui
