#include "airwright/core/recovery/HeatRecoveryEvaluation.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"
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

Sections::AirStream mixStreams(const Sections::AirStream& a, const Sections::AirStream& b)
{
    if (b.dryAir.value() <= 0.0)
        return a;
    if (a.dryAir.value() <= 0.0)
        return b;
    const auto mixed = Psychro::mix(a.state, a.dryAir, b.state, b.dryAir);
    return {mixed.outlet, a.dryAir + b.dryAir};
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
    HeatRecoveryOutcome out;
    const bool rotary = isRotary(m_spec.kind);
    const Sections::AirStream& supplyIn = inputs.supplyIn;
    const Sections::AirStream& extractIn = inputs.extractIn;

    // Crossing flows of a wheel (see the header).
    const MassFlow supplyOutFlow = rotary ? supplyIn.dryAir / m_spec.outdoorAirCorrection : supplyIn.dryAir;
    const MassFlow transfer = rotary ? supplyOutFlow * m_spec.exhaustAirTransfer.value() : MassFlow{};
    const MassFlow supplyCore = supplyOutFlow - transfer;
    const MassFlow purge = supplyIn.dryAir - supplyCore;
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
        performance = m_exchanger.controlSupplyTemperature(point, *inputs.supplyTarget).performance;
        point.bypassFraction = performance.bypassFraction;
        point.rotorSpeedRatio = performance.rotorSpeedRatio;
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
            // Least reduction of recovery that keeps the exchanger free of frost.
            const bool bySpeed = m_spec.frostStrategy == FrostStrategy::RotorSpeed;
            double lo = bySpeed ? 0.0 : point.bypassFraction.value();     // lo: frost-free side for speed
            double hi = bySpeed ? point.rotorSpeedRatio.value() : 1.0;
            for (int i = 0; i < 40 && hi - lo > 1e-4; ++i) {
                const double mid = 0.5 * (lo + hi);
                auto trial = point;
                (bySpeed ? trial.rotorSpeedRatio : trial.bypassFraction) = fraction(mid);
                const bool frosts = evaluateAt(trial).frostRisk;
                if (bySpeed)
                    (frosts ? hi : lo) = mid;
                else
                    (frosts ? lo : hi) = mid;
            }
            (bySpeed ? point.rotorSpeedRatio : point.bypassFraction) = fraction(bySpeed ? lo : hi);
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
            double lo = 0.05;
            double hi = 1.0;
            for (int i = 0; i < 40 && hi - lo > 1e-4; ++i) {
                const double mid = 0.5 * (lo + hi);
                auto trial = point;
                trial.supplyDryAirFlow = supplyCore * mid;
                (evaluateAt(trial).frostRisk ? hi : lo) = mid;
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
    out.supplyOut = mixStreams(coreSupplyOut, {extractIn.state, transfer});
    out.extractOut = mixStreams(coreExtractOut, {point.supplyInlet, purge});
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
    d.condensate = performance.extractCondensate + performance.supplyCondensate;
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
