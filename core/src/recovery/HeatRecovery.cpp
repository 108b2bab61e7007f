#include "airwright/core/recovery/HeatRecovery.h"

#include "airwright/core/InputError.h"

namespace Airwright::Core::Recovery {

namespace {
constexpr ExchangerKind kAllKinds[] = {ExchangerKind::PlateCrossFlow,     ExchangerKind::PlateCounterFlow,
                                       ExchangerKind::PlateCrossCounterFlow, ExchangerKind::RotaryNonHygroscopic,
                                       ExchangerKind::RotaryHygroscopic,     ExchangerKind::RotarySorption,
                                       ExchangerKind::RunAroundCoil};
constexpr FrostStrategy kAllStrategies[] = {FrostStrategy::None,         FrostStrategy::Bypass,
                                            FrostStrategy::Preheat,      FrostStrategy::SectionalDefrost,
                                            FrostStrategy::ReducedSupply, FrostStrategy::RotorSpeed};
} // namespace

const char* exchangerKindKey(ExchangerKind kind)
{
    switch (kind) {
    case ExchangerKind::PlateCrossFlow:
        return "plate_cross_flow";
    case ExchangerKind::PlateCounterFlow:
        return "plate_counter_flow";
    case ExchangerKind::PlateCrossCounterFlow:
        return "plate_cross_counter_flow";
    case ExchangerKind::RotaryNonHygroscopic:
        return "rotary_condensation";
    case ExchangerKind::RotaryHygroscopic:
        return "rotary_enthalpy";
    case ExchangerKind::RotarySorption:
        return "rotary_sorption";
    case ExchangerKind::RunAroundCoil:
        return "run_around_loop";
    }
    return "plate_counter_flow";
}

const char* exchangerKindLabel(ExchangerKind kind)
{
    switch (kind) {
    case ExchangerKind::PlateCrossFlow:
        return "plate, cross-flow";
    case ExchangerKind::PlateCounterFlow:
        return "plate, counter-flow";
    case ExchangerKind::PlateCrossCounterFlow:
        return "plate, cross-counter-flow";
    case ExchangerKind::RotaryNonHygroscopic:
        return "rotary wheel, non-hygroscopic";
    case ExchangerKind::RotaryHygroscopic:
        return "rotary wheel, hygroscopic";
    case ExchangerKind::RotarySorption:
        return "rotary wheel, sorption";
    case ExchangerKind::RunAroundCoil:
        return "run-around coil loop";
    }
    return "";
}

std::optional<ExchangerKind> exchangerKindFromKey(std::string_view key)
{
    for (auto kind : kAllKinds)
        if (key == exchangerKindKey(kind))
            return kind;
    return std::nullopt;
}

const char* frostStrategyKey(FrostStrategy strategy)
{
    switch (strategy) {
    case FrostStrategy::None:
        return "none";
    case FrostStrategy::Bypass:
        return "bypass";
    case FrostStrategy::Preheat:
        return "preheat";
    case FrostStrategy::SectionalDefrost:
        return "sectional_defrost";
    case FrostStrategy::ReducedSupply:
        return "reduced_supply";
    case FrostStrategy::RotorSpeed:
        return "rotor_speed";
    }
    return "none";
}

std::optional<FrostStrategy> frostStrategyFromKey(std::string_view key)
{
    for (auto strategy : kAllStrategies)
        if (key == frostStrategyKey(strategy))
            return strategy;
    return std::nullopt;
}

void HeatRecovery::validate() const
{
    if (!(ratedEfficiency.value() > 0.0 && ratedEfficiency.value() < 0.95))
        throw InputError("rated temperature efficiency", toPercent(ratedEfficiency), "%", "above 0 .. below 95 %");
    if (ratedFlow && !(ratedFlow->value() > 0.0))
        throw InputError("rated flow of the exchanger", toCubicMetresPerHour(*ratedFlow), "m3/h", "above 0");
    if (!(ratedHumidityEfficiency.value() >= 0.0 && ratedHumidityEfficiency.value() < 0.95))
        throw InputError("rated humidity efficiency", toPercent(ratedHumidityEfficiency), "%", "0 .. below 95 %");
    if (ratedHumidityEfficiency.value() > 0.0 && kind != ExchangerKind::RotaryHygroscopic
        && kind != ExchangerKind::RotarySorption)
        throw InputError("rated humidity efficiency", toPercent(ratedHumidityEfficiency), "%",
                         "0 % for this exchanger (only hygroscopic and sorption wheels transfer moisture)");
    if (!(ratedPressureDropSupply.value() >= 0.0 && ratedPressureDropSupply.value() <= 1000.0))
        throw InputError("exchanger pressure drop, supply side", ratedPressureDropSupply.value(), "Pa", "0 .. 1000 Pa");
    if (!(ratedPressureDropExtract.value() >= 0.0 && ratedPressureDropExtract.value() <= 1000.0))
        throw InputError("exchanger pressure drop, extract side", ratedPressureDropExtract.value(), "Pa",
                         "0 .. 1000 Pa");
    if (isRotary(kind) && !(rotorSpeed > 0.5 && rotorSpeed <= 30.0))
        throw InputError("rotor speed", rotorSpeed, "rpm", "above 0.5 .. 30 rpm");
    if (!(exhaustAirTransfer.value() >= 0.0 && exhaustAirTransfer.value() <= 0.2))
        throw InputError("exhaust air transfer ratio (EATR)", toPercent(exhaustAirTransfer), "%", "0 .. 20 %");
    if (!(outdoorAirCorrection >= 0.8 && outdoorAirCorrection <= 1.5))
        throw InputError("outdoor air correction factor (OACF)", outdoorAirCorrection, "", "0.8 .. 1.5");
    if (!(pumpPower.value() >= 0.0 && pumpPower.value() <= 1.0e5))
        throw InputError("loop pump power", toKilowatts(pumpPower), "kW", "0 .. 100 kW");
    if (defrostSections < 2 || defrostSections > 16)
        throw InputError("defrost sections", defrostSections, "", "2 .. 16");
    if (frostStrategy == FrostStrategy::RotorSpeed && !isRotary(kind))
        throw InputError("frost protection by rotor speed is for rotary wheels only");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("heat recovery length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

} // namespace Airwright::Core::Recovery
