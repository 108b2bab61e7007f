#include "airwright/core/annual/AnnualSimulation.h"

#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/PsychroRaw.h"

#include <algorithm>
#include <limits>

namespace Airwright::Core::Annual {

namespace {

// Progress and the stop request are looked at every this many hours: often
// enough for a prompt stop (well under a millisecond of work), rarely enough to
// cost nothing.
constexpr std::size_t kCheckEvery = 256;

UnitHourModel normalModelFor(const Chain::AirHandlingUnit& unit, const Chain::UnitSizing& sizing,
                             const SeasonalConditions& conditions, const AnnualSettings& settings)
{
    settings.validate();
    return UnitHourModel(unit, sizing, conditions, percent(100.0), OperatingMode::Normal);
}

Chain::UnitSizing sizingOf(const Chain::AirHandlingUnit& unit)
{
    Chain::ChainSolver::validate(unit);
    return Chain::ChainSolver::size(unit);
}

HumidityRatio atSitePressure(const WeatherHour& hour, double pressurePa)
{
    if (toPascals(hour.pressure) == pressurePa)
        return hour.humidityRatio; // valid at this pressure already (WeatherYear checks it)
    const double ws = Psychro::detail::satHumidityRatio(toCelsius(hour.dryBulb), pressurePa);
    return kilogramsPerKilogram(std::min(toKilogramsPerKilogram(hour.humidityRatio), ws));
}

} // namespace

AnnualSimulation::AnnualSimulation(const Chain::AirHandlingUnit& unit, const Chain::UnitSizing& sizing,
                                   const SeasonalConditions& conditions, const AnnualSettings& settings)
    : m_settings(settings), m_normal(normalModelFor(unit, sizing, conditions, settings))
{
    if (settings.schedule.offHours == OffHoursMode::Setback)
        m_setback.emplace(unit, sizing, conditions.lowered(settings.schedule.setbackTemperature),
                          settings.schedule.setbackAirflow, OperatingMode::Setback);
}

AnnualSimulation::AnnualSimulation(const Chain::AirHandlingUnit& unit, const AnnualSettings& settings)
    : AnnualSimulation(unit, sizingOf(unit), SeasonalConditions(unit.cases, unit.site.pressure()), settings)
{
}

std::optional<AnnualResult> AnnualSimulation::run(const WeatherYear& year, const RunControl& control) const
{
    const std::size_t n = year.size();
    const auto& schedule = m_settings.schedule;
    std::vector<OperatingMode> modes(n);
    double lowest[2] = {std::numeric_limits<double>::max(), std::numeric_limits<double>::max()};
    double highest[2] = {std::numeric_limits<double>::lowest(), std::numeric_limits<double>::lowest()};
    for (std::size_t i = 0; i < n; ++i) {
        modes[i] = schedule.modeAt(i, n);
        if (modes[i] == OperatingMode::Off)
            continue;
        const std::size_t m = modes[i] == OperatingMode::Normal ? 0 : 1;
        const double t = toCelsius(year.hours()[i].dryBulb);
        lowest[m] = std::min(lowest[m], t);
        highest[m] = std::max(highest[m], t);
    }

    AnnualResult result;
    UnitHourModel normal = m_normal;
    std::optional<UnitHourModel> setback = m_setback;
    const bool tabulate = m_settings.evaluation == ExchangerEvaluation::Tabulated;
    if (tabulate) {
        // The tables take a small part of the run; progress counts hours only.
        if (lowest[0] <= highest[0]
            && !normal.tabulate(celsius(lowest[0]), celsius(highest[0]), m_settings.tableStep, control))
            return std::nullopt;
        if (setback && lowest[1] <= highest[1]
            && !setback->tabulate(celsius(lowest[1]), celsius(highest[1]), m_settings.tableStep, control))
            return std::nullopt;
        result.tableNodes = normal.tableNodes() + (setback ? setback->tableNodes() : 0);
    }

    const double pressure = toPascals(normal.unit().site.pressure());
    const Duration hour = hours(1.0);
    if (m_settings.keepHours)
        result.hours.resize(n);
    for (std::size_t i = 0; i < n; ++i) {
        if (i % kCheckEvery == 0) {
            if (control.stopRequested())
                return std::nullopt;
            control.report(static_cast<double>(i) / static_cast<double>(n));
        }
        if (modes[i] == OperatingMode::Off)
            continue;
        const auto& model = modes[i] == OperatingMode::Normal ? normal : *setback;
        const WeatherHour& w = year.hours()[i];
        const HumidityRatio humidity = atSitePressure(w, pressure);
        const HourResult h = tabulate ? model.evaluate(w.dryBulb, humidity) : model.evaluateExactly(w.dryBulb, humidity);
        result.total.add(h, hour);
        (modes[i] == OperatingMode::Normal ? result.normal : result.setback).add(h, hour);
        if (m_settings.keepHours)
            result.hours[i] = h;
    }
    control.report(1.0);
    return result;
}

std::optional<AnnualResult> AnnualSimulation::run(const BinTable& bins, const RunControl& control) const
{
    const auto& schedule = m_settings.schedule;
    const std::size_t year = toHours(bins.totalDuration()) > 8760.0 + 1e-9 ? WeatherYear::kHoursInLeapYear
                                                                          : WeatherYear::kHoursInYear;
    const double normalShare = schedule.share(OperatingMode::Normal, year);
    const double setbackShare = m_setback ? schedule.share(OperatingMode::Setback, year) : 0.0;
    const double pressure = toPascals(m_normal.unit().site.pressure());

    AnnualResult result;
    const auto& list = bins.bins();
    for (std::size_t i = 0; i < list.size(); ++i) {
        if (control.stopRequested())
            return std::nullopt;
        control.report(static_cast<double>(i) / static_cast<double>(list.size()));
        const auto& bin = list[i];
        const WeatherHour state{bin.dryBulb, bin.humidityRatio, bins.pressure()};
        const HumidityRatio humidity = atSitePressure(state, pressure);
        if (normalShare > 0.0) {
            const HourResult h = m_normal.evaluateExactly(bin.dryBulb, humidity);
            result.total.add(h, bin.duration * normalShare);
            result.normal.add(h, bin.duration * normalShare);
        }
        if (setbackShare > 0.0) {
            const HourResult h = m_setback->evaluateExactly(bin.dryBulb, humidity);
            result.total.add(h, bin.duration * setbackShare);
            result.setback.add(h, bin.duration * setbackShare);
        }
    }
    control.report(1.0);
    return result;
}

} // namespace Airwright::Core::Annual
