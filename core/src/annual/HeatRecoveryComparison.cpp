#include "airwright/core/annual/HeatRecoveryComparison.h"

#include "airwright/core/InputError.h"
#include "airwright/core/annual/AnnualSimulation.h"
#include "airwright/core/annual/OptionRanking.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>
#include <set>

namespace Airwright::Core::Annual {

namespace {

constexpr const char* kInsertedId = "heat-recovery";
constexpr double kDegreeHourBaseC = 15.0;

bool isLeading(const Chain::Section& s)
{
    return std::holds_alternative<Sections::Damper>(s.spec) || std::holds_alternative<Sections::Filter>(s.spec);
}

std::vector<Chain::Section>::iterator afterLeading(std::vector<Chain::Section>& path)
{
    return std::find_if_not(path.begin(), path.end(), isLeading);
}

// Where an added exchanger goes in the extract path: after the leading dampers and
// filters, and after the take-off of any mixing section, so that the exchanger
// sees the air that leaves the building and the recirculated air is room air
// (the usual arrangement, common practice).
std::vector<Chain::Section>::iterator extractPlace(const Chain::AirHandlingUnit& unit,
                                                   std::vector<Chain::Section>& extract)
{
    auto place = afterLeading(extract);
    for (auto it = extract.begin(); it != extract.end(); ++it) {
        if (!std::holds_alternative<Chain::CoupledSide>(it->spec))
            continue;
        const bool mixing = std::any_of(unit.supply.begin(), unit.supply.end(), [&](const Chain::Section& s) {
            return s.id == it->id && std::holds_alternative<Sections::MixingBox>(s.spec);
        });
        if (mixing && it >= place)
            place = it + 1;
    }
    return place;
}

bool isRecoveryFinding(const Finding& f)
{
    return f.code.rfind("recovery.", 0) == 0 || f.code.rfind("frost.", 0) == 0;
}

// The design-point figures of an option from the chain results of its model.
void describeDesign(const UnitHourModel& model, OptionResult& out)
{
    for (const auto& r : model.anchorResults())
        for (const auto& f : r.findings)
            if (isRecoveryFinding(f)
                && std::find(out.designFindings.begin(), out.designFindings.end(), f) == out.designFindings.end())
                out.designFindings.push_back(f);
    if (!model.hasRecovery() || model.anchorResults().empty())
        return;
    const auto& coldest = model.anchorResults().front();
    const auto isRecovery = [](const Chain::SectionResult& s) {
        return std::holds_alternative<Recovery::HeatRecoveryDetail>(s.detail);
    };
    const auto supply = std::find_if(coldest.supply.begin(), coldest.supply.end(), isRecovery);
    const auto extract = std::find_if(coldest.extract.begin(), coldest.extract.end(), isRecovery);
    if (supply == coldest.supply.end() || extract == coldest.extract.end())
        return;
    out.supplyPressureDrop = supply->pressureDrop;
    out.extractPressureDrop = extract->pressureDrop;
    out.regulationEfficiency = std::get<Recovery::HeatRecoveryDetail>(supply->detail).regulationThermalEfficiency;

    // The device alone: full recovery, no frost protection, at the case's inlets.
    const auto& unit = model.unit();
    const auto it = std::find_if(unit.supply.begin(), unit.supply.end(), [](const Chain::Section& s) {
        return std::holds_alternative<Recovery::HeatRecovery>(s.spec);
    });
    auto spec = std::get<Recovery::HeatRecovery>(it->spec);
    spec.bypassControl = false;
    spec.frostStrategy = Recovery::FrostStrategy::None;
    const Recovery::HeatRecoveryEvaluator device(spec, unit.airflows.supply); // rated as the chain rates it
    Recovery::HeatRecoveryInputs in;
    in.supplyIn = supply->inlet;
    in.extractIn = extract->inlet;
    out.designEffectiveness = device.evaluate(in).detail.temperatureEffectiveness;
}

ClimateSummary summaryOf(const WeatherYear& year)
{
    ClimateSummary s;
    s.site = year.site().name;
    s.method = ClimateMethod::Hourly;
    s.duration = hours(static_cast<double>(year.size()));
    s.meanDryBulb = year.meanDryBulb();
    s.minDryBulb = year.minDryBulb();
    s.maxDryBulb = year.maxDryBulb();
    s.degreeHourBase = celsius(kDegreeHourBaseC);
    s.heatingDegreeHours = year.heatingDegreeHours(s.degreeHourBase);
    return s;
}

ClimateSummary summaryOf(const BinTable& bins)
{
    if (bins.bins().empty() || bins.totalDuration().value() <= 0.0)
        throw InputError("the bin table has no hours");
    ClimateSummary s;
    s.method = ClimateMethod::Bins;
    s.duration = bins.totalDuration();
    s.meanDryBulb = bins.meanDryBulb();
    s.minDryBulb = bins.bins().front().dryBulb;
    s.maxDryBulb = bins.bins().back().dryBulb;
    s.degreeHourBase = celsius(kDegreeHourBaseC);
    s.heatingDegreeHours = bins.heatingDegreeHours(s.degreeHourBase);
    return s;
}

} // namespace

HeatRecoveryComparison::HeatRecoveryComparison(Chain::AirHandlingUnit unit, std::vector<HeatRecoveryOption> options,
                                               ComparisonSettings settings)
    : m_unit(std::move(unit)), m_options(std::move(options)), m_settings(std::move(settings))
{
    m_settings.validate();
    Chain::ChainSolver::validate(m_unit);
    if (m_options.empty())
        throw InputError("the comparison needs at least the option without heat recovery");
    std::set<std::string> keys;
    bool baseline = false;
    for (const auto& o : m_options) {
        if (o.key.empty())
            throw InputError("every heat recovery option needs a key");
        if (!keys.insert(o.key).second)
            throw InputError("heat recovery option key '" + o.key + "' is used twice");
        if (!(o.extraCost >= 0.0 && std::isfinite(o.extraCost)))
            throw InputError("extra cost of option " + o.key, o.extraCost, "", "0 or more");
        if (o.spec) {
            try {
                o.spec->validate();
            } catch (const InputError& e) {
                throw InputError("option " + o.key + ": " + e.what());
            }
        }
        baseline = baseline || !o.spec;
    }
    if (!baseline)
        throw InputError("the comparison needs the option without heat recovery as the baseline for its savings");
}

Chain::AirHandlingUnit HeatRecoveryComparison::unitWith(const Chain::AirHandlingUnit& unit,
                                                        const HeatRecoveryOption& option)
{
    Chain::AirHandlingUnit out = unit;
    const auto supplyIt = std::find_if(out.supply.begin(), out.supply.end(), [](const Chain::Section& s) {
        return std::holds_alternative<Recovery::HeatRecovery>(s.spec);
    });
    const std::string id = supplyIt != out.supply.end() ? supplyIt->id : kInsertedId;
    const auto marker = [&](const Chain::Section& s) {
        return s.id == id && std::holds_alternative<Chain::CoupledSide>(s.spec);
    };
    if (!option.spec) {
        if (supplyIt != out.supply.end())
            out.supply.erase(supplyIt);
        out.extract.erase(std::remove_if(out.extract.begin(), out.extract.end(), marker), out.extract.end());
        return out;
    }
    Recovery::HeatRecovery spec = *option.spec;
    if (!spec.ratedFlow)
        spec.ratedFlow = unit.airflows.supply;
    if (supplyIt != out.supply.end()) {
        supplyIt->spec = spec;
        if (std::none_of(out.extract.begin(), out.extract.end(), marker))
            out.extract.insert(extractPlace(out, out.extract), Chain::Section{id, Chain::CoupledSide{}});
    } else {
        if (std::any_of(out.supply.begin(), out.supply.end(), [&](const Chain::Section& s) { return s.id == id; })
            || std::any_of(out.extract.begin(), out.extract.end(), [&](const Chain::Section& s) { return s.id == id; }))
            throw InputError("the unit already has a section called '" + id
                             + "'; rename it so that the compared heat recovery can be added");
        // In the supply path before any mixing section (it is not a leading one).
        out.supply.insert(afterLeading(out.supply), Chain::Section{id, spec});
        out.extract.insert(extractPlace(out, out.extract), Chain::Section{id, Chain::CoupledSide{}});
    }
    return out;
}

std::optional<ComparisonResult> HeatRecoveryComparison::run(const WeatherYear& year, const RunControl& control) const
{
    // Every simulation takes the outdoor states at the site pressure: convert once
    // rather than once per option (AnnualSimulation passes such hours through).
    const Pressure site = m_unit.site.pressure();
    std::vector<WeatherHour> hours = year.hours();
    for (auto& h : hours) {
        h.humidityRatio = std::min(h.humidityRatio, Psychro::saturationHumidityRatio(h.dryBulb, site));
        h.pressure = site;
    }
    return compare(WeatherYear(year.site(), std::move(hours)), summaryOf(year), control);
}

std::optional<ComparisonResult> HeatRecoveryComparison::run(const BinTable& bins, const RunControl& control) const
{
    return compare(bins, summaryOf(bins), control);
}

template <class Climate>
std::optional<ComparisonResult> HeatRecoveryComparison::compare(const Climate& climate, ClimateSummary summary,
                                                                const RunControl& control) const
{
    const Chain::UnitSizing sizing = Chain::ChainSolver::size(m_unit);
    const SeasonalConditions conditions(m_unit.cases, m_unit.site.pressure());
    std::vector<Ratio> offsets;
    if (m_settings.sensitivity)
        for (const Ratio& o : m_settings.roomHumidityOffsets)
            if (std::abs(o.value()) > 1e-12)
                offsets.push_back(o);
    const double simulations = static_cast<double>((1 + offsets.size()) * m_options.size());
    double done = 0.0;

    // One annual simulation per option at the given conditions; empty when stopped.
    const auto simulateAll = [&](const SeasonalConditions& at,
                                 std::vector<OptionResult>& results) -> bool {
        results.clear();
        for (const auto& option : m_options) {
            if (control.stopRequested())
                return false;
            RunControl part;
            part.stop = control.stop;
            if (control.progress)
                part.progress = [&, start = done](double f) { control.progress((start + f) / simulations); };
            const AnnualSimulation simulation(unitWith(m_unit, option), sizing, at, m_settings.annual);
            const auto annual = simulation.run(climate, part);
            if (!annual)
                return false;
            done += 1.0;
            OptionResult r;
            r.key = option.key;
            r.name = option.name;
            r.hasRecovery = option.spec.has_value();
            r.kindKey = option.spec ? Recovery::exchangerKindKey(option.spec->kind) : "none";
            r.extraCost = option.extraCost;
            r.energy = annual->total;
            describeDesign(simulation.normalModel(), r);
            results.push_back(std::move(r));
        }
        return true;
    };

    ComparisonResult result;
    if (!simulateAll(conditions, result.options))
        return std::nullopt;
    OptionRanking::appraise(result.options, m_settings.prices, m_settings.evaluationYears);
    result.ranking = OptionRanking::rank(result.options, m_settings.prices, m_settings.evaluationYears);
    const auto baseline = std::find_if(result.options.begin(), result.options.end(),
                                       [](const OptionResult& o) { return !o.hasRecovery; });
    summary.operatingTime = baseline->energy.operatingTime;
    result.climate = summary;

    if (m_settings.sensitivity) {
        for (const Ratio& offset : m_settings.roomHumidityOffsets) {
            std::vector<OptionResult> varied;
            if (std::abs(offset.value()) <= 1e-12)
                varied = result.options;
            else if (!simulateAll(conditions.withRoomHumidityOffset(offset), varied))
                return std::nullopt;
            for (const double factor : m_settings.heatPriceFactors) {
                EnergyPrices prices = m_settings.prices;
                prices.heatPricePerKilowattHour *= factor;
                OptionRanking::appraise(varied, prices, m_settings.evaluationYears);
                SensitivityCell cell;
                cell.roomHumidityOffset = offset;
                cell.heatPriceFactor = factor;
                for (const auto& entry : OptionRanking::rank(varied, prices, m_settings.evaluationYears))
                    cell.ranking.push_back(entry.key);
                result.sensitivity.push_back(std::move(cell));
            }
        }
    }
    control.report(1.0);
    return result;
}

} // namespace Airwright::Core::Annual
