#include "airwright/ui/FieldQuantity.h"

#include <QLocale>

#include <algorithm>
#include <cmath>

namespace Airwright::Ui {

namespace {

// Exact by definition: 1 in = 25.4 mm, 1 ft = 0.3048 m (international yard and
// pound agreement, 1959).
constexpr double kMillimetresPerInch = 25.4;
constexpr double kMetresPerFoot = 0.3048;
// Inch of mercury at 32 F, 3386.38 Pa (NIST SP 811 (2008), appendix B.8, from memory).
constexpr double kPascalsPerInchOfMercury = 3386.38;

} // namespace

double FieldQuantity::toDisplay(const UnitSystem& units, double base) const
{
    const bool ip = units.system() == UnitSystem::System::IP;
    switch (m_extra) {
    case Extra::None:
        return units.toDisplay(m_kind, base);
    case Extra::LengthMillimetres:
        return ip ? base / kMillimetresPerInch : base;
    case Extra::AltitudeMetres:
        return ip ? base / kMetresPerFoot : base;
    case Extra::BarometricPressure:
        return ip ? base / kPascalsPerInchOfMercury : base / 1000.0;
    }
    return base;
}

double FieldQuantity::fromDisplay(const UnitSystem& units, double shown) const
{
    const bool ip = units.system() == UnitSystem::System::IP;
    switch (m_extra) {
    case Extra::None:
        return units.fromDisplay(m_kind, shown);
    case Extra::LengthMillimetres:
        return ip ? shown * kMillimetresPerInch : shown;
    case Extra::AltitudeMetres:
        return ip ? shown * kMetresPerFoot : shown;
    case Extra::BarometricPressure:
        return ip ? shown * kPascalsPerInchOfMercury : shown * 1000.0;
    }
    return shown;
}

QString FieldQuantity::unit(const UnitSystem& units) const
{
    const bool ip = units.system() == UnitSystem::System::IP;
    switch (m_extra) {
    case Extra::None:
        return units.unit(m_kind);
    case Extra::LengthMillimetres:
        return ip ? QStringLiteral("in") : QStringLiteral("mm");
    case Extra::AltitudeMetres:
        return ip ? QStringLiteral("ft") : QStringLiteral("m");
    case Extra::BarometricPressure:
        return ip ? QStringLiteral("in. Hg") : QStringLiteral("kPa");
    }
    return {};
}

QString FieldQuantity::editText(double shown)
{
    if (!std::isfinite(shown))
        return QString::number(shown);
    const double magnitude = std::abs(shown);
    int decimals = 0;
    if (magnitude > 0.0)
        decimals = 4 - static_cast<int>(std::floor(std::log10(magnitude)));
    decimals = std::clamp(decimals, 0, 6);
    QString text = QString::number(shown, 'f', decimals);
    if (text.contains(QLatin1Char('.'))) {
        while (text.endsWith(QLatin1Char('0')))
            text.chop(1);
        if (text.endsWith(QLatin1Char('.')))
            text.chop(1);
    }
    if (text == QLatin1String("-0"))
        text = QStringLiteral("0");
    return text;
}

std::optional<double> FieldQuantity::parse(const QString& text)
{
    QString cleaned = text.trimmed();
    cleaned.remove(QLatin1Char(' '));
    cleaned.replace(QLatin1Char(','), QLatin1Char('.'));
    if (cleaned.isEmpty())
        return std::nullopt;
    bool ok = false;
    const double value = QLocale::c().toDouble(cleaned, &ok);
    if (!ok || !std::isfinite(value))
        return std::nullopt;
    return value;
}

} // namespace Airwright::Ui
