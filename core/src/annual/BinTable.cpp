#include "airwright/core/annual/BinTable.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>
#include <string>

namespace Airwright::Core::Annual {

BinTable::BinTable(std::vector<TemperatureBin> bins, Pressure pressure) : m_bins(std::move(bins)), m_pressure(pressure)
{
    const double p = toPascals(m_pressure);
    if (!(p >= 31000.0 && p <= 120000.0))
        throw InputError("bin table pressure", p, "Pa", "31000 .. 120000 Pa");
    double total = 0.0;
    for (std::size_t i = 0; i < m_bins.size(); ++i) {
        const TemperatureBin& bin = m_bins[i];
        const std::string at = " in bin " + std::to_string(i + 1);
        const double t = toCelsius(bin.dryBulb);
        if (!(t >= -70.0 && t <= 70.0))
            throw InputError("dry bulb temperature" + at, t, "C", "-70 .. 70 C");
        if (i > 0 && !(t > toCelsius(m_bins[i - 1].dryBulb)))
            throw InputError("dry bulb temperature" + at, t, "C",
                             "above the previous bin's " + formatNumber(toCelsius(m_bins[i - 1].dryBulb)) + " C");
        const double h = toHours(bin.duration);
        if (!(h >= 0.0 && std::isfinite(h)))
            throw InputError("hours" + at, h, "h", ">= 0 h");
        total += h;
        const double w = toKilogramsPerKilogram(bin.humidityRatio);
        const double ws = toKilogramsPerKilogram(Psychro::saturationHumidityRatio(bin.dryBulb, m_pressure));
        if (!(w >= 0.0 && w <= ws * (1.0 + 1e-9)))
            throw InputError("humidity ratio" + at, w * 1000.0, "g/kg",
                             "0 .. " + formatNumber(ws * 1000.0) + " g/kg (saturation)");
    }
    if (total > 8784.0 * (1.0 + 1e-12))
        throw InputError("total hours of the bin table", total, "h", "0 .. 8784 h");
}

Duration BinTable::totalDuration() const
{
    double total = 0.0;
    for (const auto& bin : m_bins)
        total += toHours(bin.duration);
    return hours(total);
}

AbsoluteTemperature BinTable::meanDryBulb() const
{
    double weighted = 0.0;
    double total = 0.0;
    for (const auto& bin : m_bins) {
        weighted += toHours(bin.duration) * toKelvin(bin.dryBulb);
        total += toHours(bin.duration);
    }
    if (!(total > 0.0))
        throw InputError("total hours of the bin table", total, "h", "> 0 h for a mean temperature");
    return kelvin(weighted / total);
}

DegreeHours BinTable::heatingDegreeHours(AbsoluteTemperature base) const
{
    double sum = 0.0;
    for (const auto& bin : m_bins)
        sum += toHours(bin.duration) * std::max(0.0, toKelvin(base) - toKelvin(bin.dryBulb));
    return kelvinHours(sum);
}

DegreeHours BinTable::coolingDegreeHours(AbsoluteTemperature base) const
{
    double sum = 0.0;
    for (const auto& bin : m_bins)
        sum += toHours(bin.duration) * std::max(0.0, toKelvin(bin.dryBulb) - toKelvin(base));
    return kelvinHours(sum);
}

} // namespace Airwright::Core::Annual
