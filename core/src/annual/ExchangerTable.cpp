#include "ExchangerTable.h"

#include "airwright/core/psychro/PsychroRaw.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Annual {

namespace {

using Values = ExchangerTable::Values;

// Below this the exchanger counts as not recovering (W).
constexpr double kOffW = 1.0;

Values lerp(const Values& a, const Values& b, double u)
{
    const auto mix = [u](double x, double y) { return x + u * (y - x); };
    return {mix(a.supplyC, b.supplyC),
            mix(a.supplyW, b.supplyW),
            mix(a.recoveredW, b.recoveredW),
            mix(a.frostProtectionW, b.frostProtectionW),
            mix(a.preheatW, b.preheatW),
            mix(a.frostRisk, b.frostRisk),
            mix(a.pumpW, b.pumpW),
            mix(a.extractC, b.extractC),
            mix(a.extractW, b.extractW)};
}

} // namespace

ExchangerTable::Column ExchangerTable::column(double tC, const NodeFunction& node)
{
    Column c;
    c.saturation = Psychro::detail::satHumidityRatio(tC, m_pressure);
    for (std::size_t k = 0; k < kFractions.size(); ++k)
        c.values[k] = node(tC, kFractions[k] * c.saturation);
    m_nodes += kFractions.size();
    return c;
}

bool ExchangerTable::needsRefinement(const Column& a, const Column& b) const
{
    // Only a threshold crossed along the dry bulb: one that runs along the
    // humidity direction (a wheel's frost limit near saturation) is not helped
    // by sub-steps in dry bulb.
    for (std::size_t k = 0; k < kFractions.size(); ++k) {
        const Values& x = a.values[k];
        const Values& y = b.values[k];
        if (x.frostRisk != y.frostRisk)
            return true;
        const bool off = std::abs(x.recoveredW) < kOffW || std::abs(y.recoveredW) < kOffW;
        if (off && std::max(std::abs(x.recoveredW), std::abs(y.recoveredW)) > m_jump)
            return true;
    }
    return false;
}

ExchangerTable::ExchangerTable(double lowestC, double highestC, double stepK, double pressurePa, double jumpW,
                               const NodeFunction& node, const RunControl& control)
    : m_lowest(lowestC), m_step(stepK), m_pressure(pressurePa), m_jump(jumpW)
{
    const auto temperatures = static_cast<std::size_t>(std::llround((highestC - lowestC) / stepK)) + 1;
    m_highest = m_lowest + static_cast<double>(temperatures - 1) * m_step;
    m_columns.reserve(temperatures);
    for (std::size_t i = 0; i < temperatures; ++i) {
        if (control.stopRequested())
            return;
        m_columns.push_back(column(m_lowest + static_cast<double>(i) * m_step, node));
    }
    m_fine.assign(temperatures > 1 ? temperatures - 1 : 0, -1);
    for (std::size_t i = 0; i + 1 < temperatures; ++i) {
        if (!needsRefinement(m_columns[i], m_columns[i + 1]))
            continue;
        if (control.stopRequested())
            return;
        m_fine[i] = static_cast<std::ptrdiff_t>(m_fineColumns.size());
        m_fineColumns.push_back(m_columns[i]);
        const double t0 = m_lowest + static_cast<double>(i) * m_step;
        for (std::size_t j = 1; j < kRefinement; ++j)
            m_fineColumns.push_back(column(t0 + static_cast<double>(j) * m_step / kRefinement, node));
        m_fineColumns.push_back(m_columns[i + 1]);
    }
    m_complete = true;
}

std::optional<Values> ExchangerTable::at(double tC, double w) const
{
    const Column* a = &m_columns.front();
    const Column* b = a;
    double u = 0.0;
    if (m_columns.size() > 1) {
        const double x = (tC - m_lowest) / m_step;
        const auto i = std::min(static_cast<std::size_t>(std::max(0.0, std::floor(x))), m_columns.size() - 2);
        u = x - static_cast<double>(i);
        if (m_fine[i] >= 0) {
            const double y = u * static_cast<double>(kRefinement);
            const auto j = std::min(static_cast<std::size_t>(std::max(0.0, std::floor(y))), kRefinement - 1);
            u = y - static_cast<double>(j);
            a = &m_fineColumns[static_cast<std::size_t>(m_fine[i]) + j];
            b = a + 1;
        } else {
            a = &m_columns[i];
            b = &m_columns[i + 1];
        }
    }
    // The two humidity nodes used at each column, and the thresholds among them.
    bool off = false;
    double largest = 0.0;
    const double frost = a->values.front().frostRisk;
    bool frostDiffers = false;
    const auto inHumidity = [&](const Column& c) {
        const double f = w / c.saturation;
        std::size_t k = 0;
        while (k + 2 < kFractions.size() && f > kFractions[k + 1])
            ++k;
        for (const Values* v : {&c.values[k], &c.values[k + 1]}) {
            frostDiffers = frostDiffers || v->frostRisk != frost;
            off = off || std::abs(v->recoveredW) < kOffW;
            largest = std::max(largest, std::abs(v->recoveredW));
        }
        return lerp(c.values[k], c.values[k + 1], (f - kFractions[k]) / (kFractions[k + 1] - kFractions[k]));
    };
    const Values va = inHumidity(*a);
    const Values vb = inHumidity(*b);
    if (frostDiffers || (off && largest > m_jump))
        return std::nullopt;
    return lerp(va, vb, u);
}

} // namespace Airwright::Core::Annual
