#include "airwright/core/annual/UnitHourModel.h"

#include "ExchangerTable.h"
#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/AirProcesses.h"
#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <array>
#include <cmath>

namespace Airwright::Core::Annual {

namespace {

namespace raw = Psychro::detail;

constexpr double kStandardAirDensity = 1.2; // kg/m3 moist air, as the chain's standard-air basis
// The ADP cannot come closer than this to the entering chilled water (as CoolingCoil).
constexpr double kCoilApproachK = 1.0;
// As the chain: a cooling coil leaving this far below its target is dehumidifying.
constexpr double kDehumidifyingMarginK = 0.05;
constexpr int kMaxDriftPasses = 3;
// With mixing the return air may come from the exchanger's extract outlet, which
// depends on the exchanger's control (a loop the passes settle geometrically).
constexpr int kMaxMixingPasses = 40;
constexpr double kDriftSettledK = 1e-4;
constexpr std::size_t kStackSections = 64;

template <class T> const T* specAs(const Chain::Section& s)
{
    return std::get_if<T>(&s.spec);
}

double dewPointC(double w, double p)
{
    if (w <= 1e-9)
        return Psychro::kMinTemperatureC;
    return raw::dewPointFromVapourPressure(raw::vapourPressureFromHumidityRatio(w, p));
}

} // namespace

UnitHourModel::UnitHourModel(const Chain::AirHandlingUnit& unit, const Chain::UnitSizing& sizing,
                             const SeasonalConditions& conditions, Ratio airflowFraction, OperatingMode mode)
    : m_unit(unit), m_conditions(conditions), m_airflowFraction(airflowFraction), m_mode(mode)
{
    Chain::ChainSolver::validate(unit);
    if (!(airflowFraction.value() >= 0.05 && airflowFraction.value() <= 1.5))
        throw InputError("airflow fraction of the annual model", toPercent(airflowFraction), "%", "5 .. 150 %");
    m_pressure = toPascals(unit.site.pressure());
    if (std::abs(toPascals(conditions.pressure()) - m_pressure) > 1e-6)
        throw InputError("pressure of the seasonal conditions", toPascals(conditions.pressure()), "Pa",
                         "the unit's site pressure, " + std::to_string(m_pressure) + " Pa");
    m_supplyFlow = toCubicMetresPerSecond(unit.airflows.supply) * airflowFraction.value();
    m_extractFlow = toCubicMetresPerSecond(unit.airflows.extract) * airflowFraction.value();
    m_standardAir = unit.airflows.basis == Chain::FlowBasis::StandardAir;

    int recoveries = 0;
    for (const auto& s : unit.supply)
        if (specAs<Recovery::HeatRecovery>(s))
            ++recoveries;
    if (recoveries > 1)
        throw InputError("the annual simulation models at most one heat recovery section; the unit has "
                         + std::to_string(recoveries));

    for (std::size_t i = 0; i < conditions.anchorCount(); ++i)
        m_anchorResults.push_back(
            Chain::ChainSolver::solveCase(unit, conditions.anchorCase(i, airflowFraction), sizing));
    for (const auto& r : m_anchorResults)
        m_fanPowerByAnchor.push_back(toWatts(r.totals.fanElectricPower));

    const auto fanRises = [&](const Chain::PathKind path, std::size_t index) {
        std::vector<double> rises;
        for (const auto& r : m_anchorResults) {
            const auto& results = path == Chain::PathKind::Supply ? r.supply : r.extract;
            const auto* d = index < results.size() ? std::get_if<Sections::Fan::Detail>(&results[index].detail) : nullptr;
            rises.push_back(d ? toKelvinDifference(d->temperatureRise) : 0.0);
        }
        return rises;
    };

    std::optional<std::string> recoveryId;
    for (std::size_t k = 0; k < unit.supply.size(); ++k) {
        const auto& s = unit.supply[k];
        Step step;
        step.section = k;
        if (specAs<Sections::Fan>(s)) {
            step.kind = StepKind::Fan;
            step.riseByAnchor = fanRises(Chain::PathKind::Supply, k);
        } else if (const auto* c = specAs<Sections::WaterHeatingCoil>(s)) {
            step.kind = c->fixedOutletTemperature ? StepKind::FixedHeater : StepKind::Heater;
            if (c->fixedOutletTemperature)
                step.fixedC = toCelsius(*c->fixedOutletTemperature);
            if (c->capacity)
                step.capacityW = toWatts(*c->capacity);
        } else if (const auto* e = specAs<Sections::ElectricHeater>(s)) {
            step.kind = e->fixedOutletTemperature ? StepKind::FixedHeater : StepKind::Heater;
            if (e->fixedOutletTemperature)
                step.fixedC = toCelsius(*e->fixedOutletTemperature);
            if (e->ratedPower)
                step.capacityW = toWatts(*e->ratedPower);
        } else if (specAs<Sections::CoolingCoil>(s)) {
            step.kind = StepKind::CoolingCoil;
        } else if (specAs<Sections::Humidifier>(s)) {
            step.kind = StepKind::Humidifier;
        } else if (const auto* hr = specAs<Recovery::HeatRecovery>(s)) {
            step.kind = hr->bypassControl ? StepKind::Recovery : StepKind::UncontrolledRecovery;
            // Rated at the unit's design flow, as the chain rates it: at part
            // airflow the same device works at part flow.
            m_recovery.emplace(*hr, unit.airflows.supply);
            m_recoveryControlled = hr->bypassControl;
            recoveryId = s.id;
        } else if (const auto* mix = specAs<Sections::MixingBox>(s)) {
            // The chain's share: at the supply volume flow of the mode.
            step.kind = StepKind::Mixing;
            step.outdoorShare = mix->outdoorShare(unit.airflows.supply * airflowFraction.value()).value();
            m_mixing = true;
        }
        if (step.kind == StepKind::FixedHeater || step.kind == StepKind::Humidifier
            || step.kind == StepKind::UncontrolledRecovery || step.kind == StepKind::Mixing)
            m_driftPasses = true;
        m_supply.push_back(std::move(step));
    }

    // The extract path as far as it matters: up to the exchanger (its inlet air)
    // and up to the last take-off of a mixing section (the return air).
    std::size_t needed = 0;
    for (std::size_t k = 0; k < unit.extract.size(); ++k) {
        const auto& s = unit.extract[k];
        if (!std::holds_alternative<Chain::CoupledSide>(s.spec))
            continue;
        if (recoveryId && s.id == *recoveryId)
            needed = k + 1;
        for (const auto& x : unit.supply)
            if (x.id == s.id && specAs<Sections::MixingBox>(x))
                needed = k + 1;
    }
    for (std::size_t k = 0; k < needed; ++k) {
        const auto& s = unit.extract[k];
        Step step;
        step.section = k;
        if (specAs<Sections::Fan>(s)) {
            step.kind = StepKind::Fan;
            step.riseByAnchor = fanRises(Chain::PathKind::Extract, k);
        } else if (const auto* c = specAs<Sections::WaterHeatingCoil>(s); c && c->fixedOutletTemperature) {
            step.kind = StepKind::FixedHeater;
            step.fixedC = toCelsius(*c->fixedOutletTemperature);
        } else if (const auto* e = specAs<Sections::ElectricHeater>(s); e && e->fixedOutletTemperature) {
            step.kind = StepKind::FixedHeater;
            step.fixedC = toCelsius(*e->fixedOutletTemperature);
        } else if (std::holds_alternative<Chain::CoupledSide>(s.spec)) {
            if (recoveryId && s.id == *recoveryId) {
                step.kind = StepKind::Recovery;
            } else {
                for (std::size_t j = 0; j < unit.supply.size(); ++j) {
                    if (unit.supply[j].id == s.id) {
                        step.kind = StepKind::TakeOff;
                        step.partner = j;
                    }
                }
            }
        }
        m_extract.push_back(std::move(step));
    }
}

const Recovery::HeatRecoveryEvaluator* UnitHourModel::recoveryEvaluator() const
{
    return m_recovery ? &*m_recovery : nullptr;
}

std::size_t UnitHourModel::tableNodes() const
{
    return m_table ? m_table->nodeCount() : 0;
}

bool UnitHourModel::tabulate(AbsoluteTemperature lowest, AbsoluteTemperature highest, TemperatureDifference step,
                             const RunControl& control)
{
    const double dt = toKelvinDifference(step);
    if (!(dt >= 0.1 && dt <= 5.0))
        throw InputError("exchanger table step", dt, "K", "0.1 .. 5 K");
    const double lo = toCelsius(lowest);
    const double hi = toCelsius(highest);
    if (!(lo >= -70.0 && hi <= 70.0 && lo <= hi))
        throw InputError("exchanger table range", lo, "C", "-70 .. 70 C, lowest not above highest");
    m_table.reset();
    if (!m_recovery)
        return !control.stopRequested();
    const double first = std::floor(lo / dt) * dt;
    const double last = std::ceil(hi / dt) * dt;
    // A jump of recovered heat larger than the sensible heat of 1.5 grid steps at
    // the design flow is a switching threshold, not a slope (ExchangerTable::at).
    // With mixing, the outdoor air is that share of the flow: the exchanger's
    // slope scales with it, and so does the jump that marks a threshold (our own).
    double outdoorShare = 1.0;
    for (const Step& s : m_supply)
        if (s.kind == StepKind::Mixing)
            outdoorShare *= s.outdoorShare;
    const double designDryAir = m_supplyFlow * kStandardAirDensity;
    const double jump = 1.5 * designDryAir * outdoorShare * 1006.0 * dt;
    auto table = std::make_shared<ExchangerTable>(
        first, last, dt, m_pressure, jump, [this](double t, double w) { return walk(t, w, nullptr).recovery; },
        control);
    if (!table->complete())
        return false;
    m_table = std::move(table);
    return true;
}

HourResult UnitHourModel::evaluate(AbsoluteTemperature outdoor, HumidityRatio humidity) const
{
    const double t = toCelsius(outdoor);
    const double w = toKilogramsPerKilogram(humidity);
    if (m_table && m_table->covers(t)) {
        if (const auto v = m_table->at(t, w))
            return walk(t, w, &*v).result;
    }
    return walk(t, w, nullptr).result;
}

HourResult UnitHourModel::evaluateExactly(AbsoluteTemperature outdoor, HumidityRatio humidity) const
{
    return walk(toCelsius(outdoor), toKilogramsPerKilogram(humidity), nullptr).result;
}

UnitHourModel::RecoveryValues UnitHourModel::evaluateRecovery(double inletC, double inletW, double inletFlow,
                                                               double extractC, double extractW, double extractFlow,
                                                               std::optional<double> targetC) const
{
    const Pressure p = pascals(m_pressure);
    Recovery::HeatRecoveryInputs in;
    in.supplyIn = {Psychro::MoistAirState::fromDryBulbHumidityRatio(celsius(inletC), kilogramsPerKilogram(inletW), p),
                   kilogramsPerSecond(inletFlow)};
    in.extractIn = {
        Psychro::MoistAirState::fromDryBulbHumidityRatio(celsius(extractC), kilogramsPerKilogram(extractW), p),
        kilogramsPerSecond(extractFlow)};
    if (targetC)
        in.supplyTarget = celsius(*targetC);
    const auto out = m_recovery->evaluate(in);
    RecoveryValues v;
    v.supplyC = toCelsius(out.supplyOut.state.dryBulb());
    v.supplyW = toKilogramsPerKilogram(out.supplyOut.state.humidityRatio());
    v.recoveredW = toWatts(out.detail.recovered);
    v.frostProtectionW = toWatts(out.detail.frost.protectionPower);
    v.preheatW = toWatts(out.preheat);
    v.frostRisk = out.detail.frost.risk ? 1.0 : 0.0;
    v.pumpW = toWatts(out.detail.pumpPower);
    v.extractC = toCelsius(out.extractOut.state.dryBulb());
    v.extractW = toKilogramsPerKilogram(out.extractOut.state.humidityRatio());
    return v;
}

UnitHourModel::Walk UnitHourModel::walk(double outdoorC, double outdoorW, const RecoveryValues* tabulated) const
{
    const double p = m_pressure;
    const auto weights = m_conditions.weightsAt(outdoorC);
    const auto byAnchor = [&](const std::vector<double>& v) {
        if (v.size() == 1)
            return v.front();
        return v[weights.lower] + weights.upperWeight * (v[weights.lower + 1] - v[weights.lower]);
    };
    const IndoorTargets targets = m_conditions.at(celsius(outdoorC));
    const double roomC = toCelsius(targets.roomTemperature);
    const double roomW = toKilogramsPerKilogram(targets.roomHumidity);
    const double setpointC = toCelsius(targets.supplySetpoint);
    // Plain values with flags: GCC 12 misreads optional<double> here (maybe-uninitialized).
    const bool hasMinW = targets.minimumSupplyHumidity.has_value();
    const bool hasMaxW = targets.maximumSupplyHumidity.has_value();
    const double minW = hasMinW ? toKilogramsPerKilogram(*targets.minimumSupplyHumidity) : 0.0;
    const double maxW = hasMaxW ? toKilogramsPerKilogram(*targets.maximumSupplyHumidity) : 0.0;

    // Dry-air flows as the chain computes them from the design volume flows.
    const double supplyFlow = m_standardAir ? m_supplyFlow * kStandardAirDensity / (1.0 + outdoorW)
                                            : m_supplyFlow / raw::specificVolume(outdoorC, outdoorW, p);
    const double extractFlow = m_standardAir ? m_extractFlow * kStandardAirDensity / (1.0 + roomW)
                                             : m_extractFlow / raw::specificVolume(roomC, roomW, p);

    Walk out;
    HourResult& r = out.result;
    r.mode = m_mode;
    r.fanPower = watts(byAnchor(m_fanPowerByAnchor));

    // Per supply section: the temperature change of the sections the controls do
    // not set, the drift (setpoint less the aim of a controlled section), the
    // dry-air inlet flow; per mixing section: the recirculated dry air, the return
    // air and the humidity ratio reaching it; per extract section: the inlet flow.
    // Left uninitialised on purpose: every entry is written before it is read.
    const std::size_t n = m_supply.size();
    const std::size_t ne = m_extract.size();
    constexpr std::size_t kRows = 7;
    std::array<double, (kRows + 1) * kStackSections> stack;
    std::vector<double> heap;
    double* buffer = stack.data();
    if (kRows * n + ne > stack.size()) {
        heap.assign(kRows * n + ne, 0.0);
        buffer = heap.data();
    }
    double* change = buffer;
    double* drift = buffer + n;
    double* inFlow = buffer + 2 * n;
    double* recirculated = buffer + 3 * n;
    double* returnC = buffer + 4 * n;
    double* returnW = buffer + 5 * n;
    double* mixerW = buffer + 6 * n;
    double* extractInFlow = buffer + 7 * n;

    // Supply flows from the outlet back to the intake (the chain's computeFlows).
    double flow = supplyFlow;
    std::size_t recoveryStep = n;
    for (std::size_t k = n; k-- > 0;) {
        const Step& step = m_supply[k];
        if (step.kind == StepKind::Mixing) {
            const double outdoor = flow * step.outdoorShare;
            recirculated[k] = flow - outdoor;
            // Until the take-off is reached in a pass: the room (the chain's first pass).
            returnC[k] = roomC;
            returnW[k] = roomW;
            mixerW[k] = outdoorW;
            flow = outdoor;
        } else if (step.kind == StepKind::Recovery || step.kind == StepKind::UncontrolledRecovery) {
            flow = toKilogramsPerSecond(m_recovery->supplyInletFlow(kilogramsPerSecond(flow)));
            recoveryStep = k;
        }
        inFlow[k] = flow;
    }
    // Extract flows from the room forward: less the recirculated air at a
    // take-off, plus the air a wheel carries across (OACF above 1).
    flow = extractFlow;
    for (std::size_t j = 0; j < ne; ++j) {
        extractInFlow[j] = flow;
        const Step& step = m_extract[j];
        if (step.kind == StepKind::TakeOff)
            flow -= recirculated[step.partner];
        else if (step.kind == StepKind::Recovery)
            flow += inFlow[recoveryStep] - (recoveryStep + 1 < n ? inFlow[recoveryStep + 1] : supplyFlow);
        if ((step.kind == StepKind::TakeOff || step.kind == StepKind::Recovery) && !(flow > 1e-9))
            throw InputError("at outdoor " + formatFixed(outdoorC, 1) + " C, section '"
                             + m_unit.extract[step.section].id
                             + "': more air leaves the extract path here (recirculated or crossing) than reaches it; "
                               "lower the recirculated share or raise the extract airflow");
    }

    // Extract air from index `from` on, up to the exchanger (returns its index) or
    // the end: fans add their rise, fixed heaters heat, take-offs give the return air.
    const auto walkExtract = [&](std::size_t from, double& c, double& x, double& heating) {
        for (std::size_t j = from; j < ne; ++j) {
            const Step& step = m_extract[j];
            switch (step.kind) {
            case StepKind::Fan:
                c += byAnchor(step.riseByAnchor);
                break;
            case StepKind::FixedHeater:
                if (c < step.fixedC) {
                    heating += extractInFlow[j] * (raw::enthalpy(step.fixedC, x) - raw::enthalpy(c, x));
                    c = step.fixedC;
                }
                break;
            case StepKind::TakeOff:
                returnC[step.partner] = c;
                returnW[step.partner] = x;
                break;
            case StepKind::Recovery:
                return j;
            default:
                break;
            }
        }
        return ne;
    };
    double extractC = roomC;
    double extractW = roomW;
    double extractHeating = 0.0;
    const std::size_t extractRecovery = walkExtract(0, extractC, extractW, extractHeating);
    const double recoveryExtractFlow = extractRecovery < ne ? extractInFlow[extractRecovery] : extractFlow;

    // Controlled sections aim at the setpoint less the change of the uncontrolled
    // sections after them (the chain's rule).
    for (std::size_t k = 0; k < n; ++k)
        change[k] = m_supply[k].kind == StepKind::Fan ? byAnchor(m_supply[k].riseByAnchor) : 0.0;

    const int passes = m_mixing ? kMaxMixingPasses : m_driftPasses ? kMaxDriftPasses : 1;
    for (int pass = 0; pass < passes; ++pass) {
        // The outlet each section should reach, from the setpoint back. Across a
        // mixing section the inlet that mixes to it: the chain gets there by
        // repeating its passes with the mixer's temperature change.
        double aimed = setpointC;
        for (std::size_t k = n; k-- > 0;) {
            drift[k] = setpointC - std::clamp(aimed, Psychro::kMinTemperatureC + 1.0, Psychro::kMaxTemperatureC - 1.0);
            const StepKind kind = m_supply[k].kind;
            if (kind == StepKind::Heater || kind == StepKind::CoolingCoil || kind == StepKind::Recovery)
                continue;
            if (kind == StepKind::Mixing && recirculated[k] > 0.0 && inFlow[k] > 1e-9) {
                const double f = inFlow[k] / (inFlow[k] + recirculated[k]);
                const double wMixed = f * mixerW[k] + (1.0 - f) * returnW[k];
                const double hIn = (raw::enthalpy(aimed, wMixed) - (1.0 - f) * raw::enthalpy(returnC[k], returnW[k])) / f;
                aimed = raw::dryBulbFromEnthalpy(hIn, mixerW[k]);
            } else {
                aimed -= change[k];
            }
        }

        double t = outdoorC;
        double w = outdoorW;
        double heating = extractHeating;
        double cooling = 0.0;
        double water = 0.0;
        double steamPower = 0.0;
        bool dehumidifying = false;
        double largestChange = 0.0;

        for (std::size_t k = 0; k < n; ++k) {
            const Step& step = m_supply[k];
            const auto& section = m_unit.supply[step.section];
            const double m = inFlow[k];
            const double before = t;
            const auto heatTo = [&](double target, std::optional<double> capacity) {
                if (t >= target)
                    return;
                double q = m * (raw::enthalpy(target, w) - raw::enthalpy(t, w));
                if (capacity && q > *capacity) {
                    q = *capacity;
                    t = raw::dryBulbFromEnthalpy(raw::enthalpy(t, w) + q / m, w);
                } else {
                    t = target;
                }
                heating += q;
            };
            switch (step.kind) {
            case StepKind::Passive:
                break;
            case StepKind::Fan:
                t += change[k];
                break;
            case StepKind::Heater:
                if (!dehumidifying || targets.dehumidifyWithReheat)
                    heatTo(setpointC - drift[k], step.capacityW);
                break;
            case StepKind::FixedHeater:
                heatTo(step.fixedC, step.capacityW);
                break;
            case StepKind::CoolingCoil: {
                const auto& coil = std::get<Sections::CoolingCoil>(section.spec);
                const double bf = coil.effectiveBypassFactor().value();
                const double target = setpointC - drift[k];
                std::optional<double> adp;
                if (target < t)
                    adp = (target - bf * t) / (1.0 - bf);
                if (hasMaxW && w > maxW) {
                    const double wAdp = (maxW - bf * w) / (1.0 - bf);
                    const double forHumidity = wAdp > 1e-6 ? dewPointC(wAdp, p) : Psychro::kMinTemperatureC + 1.0;
                    if (!adp || forHumidity < *adp)
                        adp = forHumidity;
                }
                if (!adp)
                    break;
                adp = std::max(*adp, toCelsius(coil.waterInletTemperature) + kCoilApproachK);
                const double tOut = *adp + bf * (t - *adp);
                double wOut = w;
                if (*adp < dewPointC(w, p)) {
                    const double wAdp = raw::satHumidityRatio(*adp, p);
                    wOut = std::min(wAdp + bf * (w - wAdp), raw::satHumidityRatio(tOut, p));
                }
                double load = m * ((raw::enthalpy(t, w) - raw::enthalpy(tOut, wOut)) - (w - wOut) * raw::liquidWaterEnthalpy(*adp));
                if (coil.capacity && load > toWatts(*coil.capacity)) {
                    // Rare: let the section itself find the surface temperature its capacity allows.
                    Sections::SectionContext ctx;
                    ctx.target.outletTemperature = celsius(target);
                    if (hasMaxW)
                        ctx.target.maxHumidity = kilogramsPerKilogram(maxW);
                    ctx.target.dehumidify = hasMaxW;
                    ctx.faceVelocity = metresPerSecond(2.0);
                    Sections::CoolingCoil::Detail detail;
                    const auto state = Psychro::MoistAirState::fromDryBulbHumidityRatio(
                        celsius(t), kilogramsPerKilogram(w), pascals(p));
                    const auto outcome = coil.compute({state, kilogramsPerSecond(m)}, ctx, detail);
                    load = toWatts(detail.totalLoad);
                    cooling += load;
                    t = toCelsius(outcome.outlet.state.dryBulb());
                    w = toKilogramsPerKilogram(outcome.outlet.state.humidityRatio());
                } else {
                    cooling += load;
                    t = tOut;
                    w = wOut;
                }
                if (t < target - kDehumidifyingMarginK)
                    dehumidifying = true;
                break;
            }
            case StepKind::Humidifier: {
                if (!hasMinW || w >= minW)
                    break;
                const auto& humidifier = std::get<Sections::Humidifier>(section.spec);
                double wanted = minW;
                if (humidifier.capacity)
                    wanted = std::min(wanted, w + toKilogramsPerSecond(*humidifier.capacity) / m);
                if (humidifier.kind == Sections::HumidifierKind::Steam) {
                    const double steamC = toCelsius(humidifier.steamTemperature);
                    const double h = raw::enthalpy(t, w) + (wanted - w) * raw::waterVapourEnthalpy(steamC);
                    double tOut = raw::dryBulbFromEnthalpy(h, wanted);
                    double wOut = wanted;
                    double condensate = 0.0;
                    if (wOut > raw::satHumidityRatio(tOut, p)) {
                        const auto clamped = Psychro::clampToSaturation(celsius(tOut), kilogramsPerKilogram(wOut), pascals(p));
                        tOut = toCelsius(clamped.outlet.dryBulb());
                        wOut = toKilogramsPerKilogram(clamped.outlet.humidityRatio());
                        condensate = toKilogramsPerKilogram(clamped.condensate);
                    }
                    const double added = m * (wOut - w + condensate);
                    water += added;
                    steamPower += added * (raw::waterVapourEnthalpy(steamC)
                                           - raw::liquidWaterEnthalpy(toCelsius(humidifier.feedWaterTemperature)));
                    t = tOut;
                    w = wOut;
                } else {
                    // Adiabatic: the section's own modulation along the wet-bulb line.
                    Sections::SectionContext ctx;
                    ctx.target.minHumidity = kilogramsPerKilogram(minW);
                    ctx.faceVelocity = metresPerSecond(2.0);
                    Sections::Humidifier::Detail detail;
                    const auto state = Psychro::MoistAirState::fromDryBulbHumidityRatio(
                        celsius(t), kilogramsPerKilogram(w), pascals(p));
                    const auto outcome = humidifier.compute({state, kilogramsPerSecond(m)}, ctx, detail);
                    water += toKilogramsPerSecond(detail.waterAdded);
                    t = toCelsius(outcome.outlet.state.dryBulb());
                    w = toKilogramsPerKilogram(outcome.outlet.state.humidityRatio());
                }
                break;
            }
            case StepKind::Recovery:
            case StepKind::UncontrolledRecovery: {
                const std::optional<double> target =
                    step.kind == StepKind::Recovery ? std::optional(setpointC - drift[k]) : std::nullopt;
                const RecoveryValues v = tabulated ? *tabulated
                                                   : evaluateRecovery(t, w, m, extractC, extractW,
                                                                      recoveryExtractFlow, target);
                out.recovery = v;
                t = v.supplyC;
                w = v.supplyW;
                heating += v.preheatW;
                r.recovered = watts(v.recoveredW);
                r.frostProtection = watts(v.frostProtectionW);
                r.frost = v.frostRisk >= 0.5;
                r.pumpPower = watts(v.pumpW);
                r.supplyAfterRecovery = celsius(t);
                // The extract air after the exchanger, for take-offs after it.
                if (extractRecovery < ne) {
                    double c = v.extractC;
                    double x = v.extractW;
                    walkExtract(extractRecovery + 1, c, x, heating);
                }
                break;
            }
            case StepKind::Mixing: {
                // By dry-air mass (Psychro::mix); nothing recirculated: the outdoor air passes.
                mixerW[k] = w;
                const double back = recirculated[k];
                if (back <= 0.0)
                    break;
                const double f = m / (m + back);
                const double wMixed = f * w + (1.0 - f) * returnW[k];
                const double h = f * raw::enthalpy(t, w) + (1.0 - f) * raw::enthalpy(returnC[k], returnW[k]);
                t = std::clamp(raw::dryBulbFromEnthalpy(h, wMixed), Psychro::kMinTemperatureC,
                               Psychro::kMaxTemperatureC);
                w = wMixed;
                if (w > raw::satHumidityRatio(t, p) * (1.0 + raw::kSaturationTolerance)) {
                    const auto clamped = Psychro::clampToSaturation(celsius(t), kilogramsPerKilogram(w), pascals(p));
                    t = toCelsius(clamped.outlet.dryBulb());
                    w = toKilogramsPerKilogram(clamped.outlet.humidityRatio());
                }
                break;
            }
            case StepKind::TakeOff:
                break;
            }
            if (step.kind == StepKind::FixedHeater || step.kind == StepKind::Humidifier
                || step.kind == StepKind::UncontrolledRecovery || step.kind == StepKind::Mixing) {
                largestChange = std::max(largestChange, std::abs((t - before) - change[k]));
                change[k] = t - before;
            }
        }

        r.heating = watts(heating);
        r.cooling = watts(cooling);
        r.humidification = kilogramsPerSecond(water);
        r.humidifierPower = watts(steamPower);
        r.supplyTemperature = celsius(t);
        if (!m_recovery)
            r.supplyAfterRecovery = celsius(outdoorC);
        if (largestChange < kDriftSettledK)
            break;
    }
    return out;
}

} // namespace Airwright::Core::Annual
