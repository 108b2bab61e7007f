#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"
#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/core/recovery/BracketedRoot.h"
#include "airwright/core/recovery/FrostOnset.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Recovery {

namespace {

// Regulation (EU) No 1253/2014, Annex II (2018 tier; from memory, see
// docs/regulation.md): minimum thermal efficiency 73 %, run-around coils 68 %.
Ratio regulationMinimum(ExchangerKind kind)
{
    return kind == ExchangerKind::RunAroundCoil ? percent(68.0) : percent(73.0);
}

// Control resolution of frost protection (bypass share, rotor speed, supply share).
constexpr double kControlTolerance = 1e-4;
// An interpolation step this short ends those solves (BracketedRoot.h): the root
// is then found far more closely than the step that protection adds to it.
constexpr double kAcceptStep = 0.25 * kControlTolerance;
// Smallest rotor speed or bypass remainder the protection considers: at exactly
// zero flow through the core the exchanger has no surface temperature to speak of.
constexpr double kLeastControl = 1e-3;
constexpr double kLeastSupplyShare = 0.05;
// Below this (K) full recovery counts as no recovery at all, as in
// AirToAirExchanger::controlSupplyTemperature.
constexpr double kReachTolerance = 1e-6;

template <class Q> bool sameOptional(const std::optional<Q>& a, const std::optional<Q>& b)
{
    if (a.has_value() != b.has_value())
        return false;
    return !a.has_value() || a->value() == b->value();
}

bool sameStream(const Sections::AirStream& a, const Sections::AirStream& b)
{
    return a.state == b.state && a.dryAir.value() == b.dryAir.value();
}

// Mixing the crossing flows of a wheel back in. The core outlet a may carry
// liquid: a wheel's fog is droplets blown out of the matrix with the air
// (AirToAirExchanger::evaluate clamps its outlets), and `liquid` (kg/s, at a's
// temperature) goes into the mix with its enthalpy, 4186 t J/kg as in the psychro
// layer. The mix conserves dry air, water and enthalpy (ASHRAE Fundamentals
// ch. 1, adiabatic mixing; steady-flow energy balance); what is liquid after it
// drops out once, at the mixed temperature, and is added to fog. So each side's
// condensate leaves at that side's outlet temperature, whatever the leakage.
Sections::AirStream mixStreams(const Sections::AirStream& a, MassFlow liquid, const Sections::AirStream& b,
                               MassFlow& fog)
{
    const double ma = a.dryAir.value(), mb = std::max(b.dryAir.value(), 0.0), ml = liquid.value();
    if (ma <= 0.0 && mb <= 0.0)
        return a;
    if (mb <= 0.0 && ml <= 0.0)
        return a;
    if (ma <= 0.0)
        return b;
    const double wa = toKilogramsPerKilogram(a.state.humidityRatio());
    const double ha = toJoulesPerKilogram(a.state.enthalpy());
    const double wb = mb > 0.0 ? toKilogramsPerKilogram(b.state.humidityRatio()) : 0.0;
    const double hb = mb > 0.0 ? toJoulesPerKilogram(b.state.enthalpy()) : 0.0;
    const double m = ma + mb;
    const double w = (ma * wa + mb * wb + ml) / m;
    const double h = (ma * ha + mb * hb + ml * Psychro::detail::liquidWaterEnthalpy(toCelsius(a.state.dryBulb()))) / m;
    const double t = std::clamp(Psychro::detail::dryBulbFromEnthalpy(h, w), Psychro::kMinTemperatureC,
                                Psychro::kMaxTemperatureC);
    const auto mixed = Psychro::clampToSaturation(celsius(t), kilogramsPerKilogram(w), a.state.pressure());
    fog += kilogramsPerSecond(m) * mixed.condensate;
    return {mixed.outlet, kilogramsPerSecond(m)};
}

} // namespace

ExchangerRating HeatRecoveryEvaluator::ratingFor(const HeatRecovery& spec, VolumeFlow designSupplyFlow)
{
    ExchangerRating rating;
    rating.kind = spec.kind;
    rating.ratedTemperatureEfficiency = spec.ratedEfficiency;
    rating.ratedVolumeFlow = spec.ratedFlow.value_or(designSupplyFlow);
    rating.ratedSupplyPressureDrop = spec.ratedPressureDropSupply;
    rating.ratedExtractPressureDrop = spec.ratedPressureDropExtract;
    rating.ratedHumidityEfficiency = spec.ratedHumidityEfficiency;
    rating.loopFluidSpecificHeat = spec.loopFluid.specificHeat(celsius(10.0));
    rating.pumpPower = spec.pumpPower;
    return rating;
}

HeatRecoveryEvaluator::HeatRecoveryEvaluator(const HeatRecovery& spec, VolumeFlow designSupplyFlow)
    : m_spec(spec), m_exchanger(ratingFor(spec, designSupplyFlow)),
      m_regulationEfficiency(m_exchanger.thermalEfficiencyEu1253())
{
}

MassFlow HeatRecoveryEvaluator::supplyInletFlow(MassFlow supplyOutletFlow) const
{
    if (!isRotary(m_spec.kind))
        return supplyOutletFlow;
    return supplyOutletFlow * m_spec.outdoorAirCorrection;
}

HeatRecoveryOutcome HeatRecoveryEvaluator::evaluate(const HeatRecoveryInputs& inputs) const
{
    return compute(inputs, nullptr);
}

const HeatRecoveryOutcome& HeatRecoveryEvaluator::evaluate(const HeatRecoveryInputs& inputs, Memory& memory) const
{
    if (memory.m_owner != this)
        memory = Memory{};
    memory.m_owner = this;
    if (memory.m_inputs && memory.m_outcome) {
        const HeatRecoveryInputs& last = *memory.m_inputs;
        if (sameStream(last.supplyIn, inputs.supplyIn) && sameStream(last.extractIn, inputs.extractIn)
            && sameOptional(last.fixedBypass, inputs.fixedBypass)
            && sameOptional(last.fixedRotorSpeed, inputs.fixedRotorSpeed)) {
            // The target only reaches the outcome through the control.
            const bool controlled = !inputs.fixedBypass && !inputs.fixedRotorSpeed && m_spec.bypassControl;
            bool same = !controlled || sameOptional(last.supplyTarget, inputs.supplyTarget);
            if (!same && controlled && last.supplyTarget && inputs.supplyTarget && memory.m_fullReach) {
                // Full recovery fell short before; if it still does, the control
                // stays at full recovery (AirToAirExchanger::controlSupplyTemperature).
                const double reach = *memory.m_fullReach;
                const double want = toCelsius(*inputs.supplyTarget) - toCelsius(inputs.supplyIn.state.dryBulb());
                same = reach * want > 0.0 && std::abs(reach) >= kReachTolerance && std::abs(want) >= std::abs(reach);
            }
            if (same) {
                memory.m_inputs = inputs;
                return *memory.m_outcome;
            }
        }
    }
    memory.m_outcome = compute(inputs, &memory);
    memory.m_inputs = inputs;
    ++memory.evaluations;
    return *memory.m_outcome;
}

HeatRecoveryOutcome HeatRecoveryEvaluator::compute(const HeatRecoveryInputs& inputs, Memory* memory) const
{
    HeatRecoveryOutcome out;
    const bool rotary = isRotary(m_spec.kind);
    const Sections::AirStream& supplyIn = inputs.supplyIn;
    const Sections::AirStream& extractIn = inputs.extractIn;

    // Crossing flows of a wheel (see the header).
    const MassFlow supplyOutFlow = rotary ? supplyIn.dryAir / m_spec.outdoorAirCorrection : supplyIn.dryAir;
    MassFlow transfer = rotary ? supplyOutFlow * m_spec.exhaustAirTransfer.value() : MassFlow{};
    MassFlow supplyCore = supplyOutFlow - transfer;
    MassFlow purge = supplyIn.dryAir - supplyCore;
    if (purge.value() < 0.0) {
        // OACF below 1 - EATR: the supply leaves with more air than the outdoor
        // side took in plus EATR, so extract air crosses beyond EATR. All of the
        // outdoor air goes through the core and none of it to the exhaust.
        transfer = transfer - purge;
        supplyCore = supplyIn.dryAir;
        purge = MassFlow{};
    }
    MassFlow extractCore = extractIn.dryAir - transfer;
    if (extractCore.value() <= 1e-9 || supplyCore.value() <= 1e-9)
        throw InputError("heat recovery " + std::string(exchangerKindLabel(m_spec.kind))
                         + ": no air would pass through the exchanger core; check the flows and leakage ratios");

    ExchangerOperatingPoint point{supplyIn.state, supplyCore, extractIn.state, extractCore, fraction(0.0),
                                  fraction(1.0)};
    const auto evaluateAt = [&](const ExchangerOperatingPoint& p) { return m_exchanger.evaluate(p); };

    // Control towards the target, or the values fixed by the caller.
    ExchangerPerformance performance;
    if (inputs.fixedBypass || inputs.fixedRotorSpeed) {
        point.bypassFraction = inputs.fixedBypass.value_or(fraction(0.0));
        point.rotorSpeedRatio = inputs.fixedRotorSpeed.value_or(fraction(1.0));
        performance = evaluateAt(point);
    } else if (m_spec.bypassControl && inputs.supplyTarget) {
        std::optional<AirToAirExchanger::ControlStart> start;
        if (memory && memory->m_control) {
            start = AirToAirExchanger::ControlStart{*memory->m_control, {}, memory->m_outletChangePerControl};
            // Full recovery gives the same outlet as long as the streams are the same.
            if (memory->m_fullOutlet && memory->m_inputs && sameStream(memory->m_inputs->supplyIn, supplyIn)
                && sameStream(memory->m_inputs->extractIn, extractIn))
                start->fullRecoveryOutlet = memory->m_fullOutlet;
        }
        const auto control = m_exchanger.controlSupplyTemperature(point, *inputs.supplyTarget, start);
        performance = control.performance;
        point.bypassFraction = performance.bypassFraction;
        point.rotorSpeedRatio = performance.rotorSpeedRatio;
        if (memory) {
            memory->m_control = control.control;
            // Full recovery short of the target: the branch of the control that a
            // new target leaves unchanged as long as it stays out of reach.
            const double tIn = toCelsius(supplyIn.state.dryBulb());
            const double reach = toCelsius(performance.supplyOutlet.dryBulb()) - tIn;
            const double want = toCelsius(*inputs.supplyTarget) - tIn;
            const double full = rotary ? 1.0 : 0.0;
            memory->m_fullReach.reset();
            memory->m_fullOutlet = control.fullRecoveryOutlet;
            if (control.outletChangePerControl)
                memory->m_outletChangePerControl = control.outletChangePerControl;
            if (control.control.value() == full && reach * want > 0.0 && std::abs(reach) >= kReachTolerance
                && std::abs(want) >= std::abs(reach))
                memory->m_fullReach = reach;
        }
    } else {
        performance = evaluateAt(point);
    }
    const ExchangerPerformance unprotected = performance;

    // Frost.
    auto& frost = out.detail.frost;
    frost.strategy = m_spec.frostStrategy;
    if (toCelsius(extractIn.state.dryBulb()) > 0.0) {
        const Ratio humidityEff = transfersMoisture(m_spec.kind) ? performance.humidityEffectiveness : fraction(0.0);
        const Ratio outdoorRh = fraction(std::min(supplyIn.state.relativeHumidity().value(), 0.999));
        frost.onsetOutdoorTemperature = frostOnsetOutdoorTemperature(
            m_spec.kind, extractIn.state, fraction(std::max(performance.temperatureEffectiveness.value(), 1e-3)),
            humidityEff, outdoorRh);
    }
    frost.risk = performance.frostRisk;
    if (frost.risk) {
        const std::string where = "at " + formatFixed(toCelsius(supplyIn.state.dryBulb()), 1) + " C outdoor air";
        switch (m_spec.frostStrategy) {
        case FrostStrategy::None:
            out.findings.push_back({Severity::Error, "frost.unprotected", "",
                                    "the exchanger frosts " + where
                                        + " and has no frost protection; choose a protection strategy"});
            break;
        case FrostStrategy::Bypass:
        case FrostStrategy::RotorSpeed: {
            // Least reduction of recovery that keeps the exchanger free of frost: the
            // root of the frost margin in the bypass share (or rotor speed).
            const bool bySpeed = m_spec.frostStrategy == FrostStrategy::RotorSpeed;
            Ratio& control = bySpeed ? point.rotorSpeedRatio : point.bypassFraction;
            const double frosting = control.value();
            const double safe = bySpeed ? kLeastControl : 1.0 - kLeastControl;
            const AirToAirExchanger::Invariants invariant = m_exchanger.invariants(point);
            const auto margin = [&](double x) {
                auto trial = point;
                (bySpeed ? trial.rotorSpeedRatio : trial.bypassFraction) = fraction(x);
                return m_exchanger.controlFigures(trial, invariant).frostMargin;
            };
            // Warm start (the chain's next pass): from the last root, the first
            // step along the secant through it and the frosting control value.
            const auto fromLastRoot = [&](double last) -> std::optional<double> {
                const double lower = std::min(frosting, safe), upper = std::max(frosting, safe);
                const double xb = std::clamp(last, lower, upper);
                if (xb == frosting)
                    return std::nullopt;
                const double fb = margin(xb);
                const double slope = (fb - performance.frostMargin) / (xb - frosting); // frosting: margin < 0
                return findRootFromWarmStart(margin, xb, fb, slope, lower, upper, 2.0 * kAcceptStep,
                                             kControlTolerance, 40, kAcceptStep);
            };
            std::optional<double> root;
            if (memory && memory->m_frostRoot)
                root = fromLastRoot(*memory->m_frostRoot);
            if (!root) {
                const double safeMargin = margin(safe);
                if (safeMargin >= 0.0)
                    root = findBracketedRoot(margin, frosting, safe, performance.frostMargin, safeMargin,
                                             kControlTolerance, 40, kAcceptStep)
                               .x;
            }
            if (!root) {
                control = fraction(bySpeed ? 0.0 : 1.0); // nothing short of stopping recovery helps
            } else {
                if (memory)
                    memory->m_frostRoot = *root;
                // Step to the frost-free side of the root.
                const double x = bySpeed ? *root - kControlTolerance : *root + kControlTolerance;
                control = fraction(std::clamp(x, 0.0, 1.0));
            }
            performance = evaluateAt(point);
            out.findings.push_back({Severity::Info, "frost.protected", "",
                                    std::string("frost protection ") + (bySpeed ? "by slowing the rotor " : "by bypass ")
                                        + where + ": recovery reduced to keep the exchanger free of ice"});
            break;
        }
        case FrostStrategy::SectionalDefrost: {
            const double share = 1.0 / m_spec.defrostSections;
            point.bypassFraction = fraction(std::max(point.bypassFraction.value(), share));
            performance = evaluateAt(point);
            out.findings.push_back({Severity::Info, "frost.sectional_defrost", "",
                                    "sectional defrost " + where + ": one of " + std::to_string(m_spec.defrostSections)
                                        + " sections at a time is bypassed while the rest keeps recovering"});
            break;
        }
        case FrostStrategy::Preheat: {
            if (frost.onsetOutdoorTemperature && *frost.onsetOutdoorTemperature > supplyIn.state.dryBulb()) {
                const auto lifted = Psychro::heatToTemperature(supplyIn.state, *frost.onsetOutdoorTemperature).outlet;
                out.preheat = supplyIn.dryAir * (lifted.enthalpy() - supplyIn.state.enthalpy());
                point.supplyInlet = lifted;
                performance = evaluateAt(point);
                out.findings.push_back({Severity::Warning, "frost.preheat", "",
                                        "frost protection needs a preheater of "
                                            + formatFixed(toKilowatts(out.preheat), 1) + " kW lifting outdoor air to "
                                            + formatFixed(toCelsius(*frost.onsetOutdoorTemperature), 1)
                                            + " C before the exchanger"});
            }
            break;
        }
        case FrostStrategy::ReducedSupply: {
            // During defrost the supply is cut until the exhaust stays frost-free;
            // reported for the defrost periods, not applied to the design states.
            const auto margin = [&](double share) {
                auto trial = point;
                trial.supplyDryAirFlow = supplyCore * share;
                return m_exchanger.controlFigures(trial).frostMargin;
            };
            double lo = kLeastSupplyShare;
            const double loMargin = margin(lo);
            if (loMargin >= 0.0) {
                const auto root = findBracketedRoot(margin, lo, 1.0, loMargin, performance.frostMargin,
                                                    kControlTolerance, 40, kAcceptStep);
                lo = std::max(kLeastSupplyShare, root.x - kControlTolerance);
            }
            out.findings.push_back({Severity::Warning, "frost.reduced_supply", "",
                                    "defrost by reducing the supply " + where + " to " + formatFixed(lo * 100.0, 0)
                                        + " % unbalances the flows and depressurises the building during defrost"});
            frost.recoveredFraction = fraction(lo);
            break;
        }
        }
    }
    if (m_spec.frostStrategy != FrostStrategy::ReducedSupply) {
        const double full = unprotected.totalHeat.value();
        frost.recoveredFraction = std::abs(full) > 1e-9 ? fraction(performance.totalHeat.value() / full)
                                                        : fraction(1.0);
        frost.protectionPower = out.preheat.value() > 0.0 ? out.preheat : unprotected.totalHeat - performance.totalHeat;
    }

    // Streams out, with the crossing flows mixed back in.
    const Sections::AirStream coreSupplyOut{performance.supplyOutlet, supplyCore};
    const Sections::AirStream coreExtractOut{performance.extractOutlet, extractCore};
    out.extractIn = extractIn;
    MassFlow condensate;
    if (rotary) {
        // The core's fog rides into the leakage mix (see mixStreams).
        out.supplyOut = mixStreams(coreSupplyOut, performance.supplyCondensate, {extractIn.state, transfer}, condensate);
        out.extractOut = mixStreams(coreExtractOut, performance.extractCondensate, {point.supplyInlet, purge}, condensate);
    } else {
        // Plates and loops drain their condensate at the wet surface; no crossing flows.
        out.supplyOut = coreSupplyOut;
        out.extractOut = coreExtractOut;
        condensate = performance.extractCondensate + performance.supplyCondensate;
    }
    out.supplyPressureDrop = performance.supplyPressureDrop;
    out.extractPressureDrop = performance.extractPressureDrop;
    out.rotorSpeedRatio = point.rotorSpeedRatio;

    auto& d = out.detail;
    d.kind = m_spec.kind;
    d.temperatureEffectiveness = performance.temperatureEffectiveness;
    if (rotary)
        d.humidityEffectiveness = performance.humidityEffectiveness;
    d.regulationThermalEfficiency = m_regulationEfficiency;
    d.recovered = performance.totalHeat;
    d.bypassFraction = point.bypassFraction;
    d.condensate = condensate;
    d.leakage = {m_spec.exhaustAirTransfer, m_spec.outdoorAirCorrection};
    d.cleanExtractPressureDrop = performance.extractPressureDrop;
    d.frostAlarmPressureDrop = performance.extractPressureDrop + pascals(kFrostAlarmRisePa);
    d.pumpPower = performance.auxiliaryPower;
    if (performance.loop) {
        d.loopSupplyTemperature = performance.loop->fluidLeavingExtractCoil;
        d.loopReturnTemperature = performance.loop->fluidLeavingSupplyCoil;
    }

    if (m_regulationEfficiency < regulationMinimum(m_spec.kind))
        out.findings.push_back({Severity::Warning, "recovery.below_regulation", "",
                                "thermal efficiency " + formatFixed(toPercent(m_regulationEfficiency), 1)
                                    + " % is below the " + formatFixed(toPercent(regulationMinimum(m_spec.kind)), 0)
                                    + " % minimum of Regulation (EU) No 1253/2014 for two-direction units"});
    if (m_exchanger.exceedsTypicalEfficiency())
        out.findings.push_back({Severity::Info, "recovery.high_efficiency", "",
                                "rated efficiency above 90 %: the best plates and wheels reach 85 to 90 %; check the "
                                "datasheet conditions"});
    if (rotary && m_spec.outdoorAirCorrection < 1.0)
        out.findings.push_back({Severity::Warning, "recovery.oacf_below_one", "",
                                "OACF below 1 means extract air is carried into the supply: check the fan "
                                "arrangement and the purge sector"});
    return out;
}

} // namespace Airwright::Core::Recovery
