#include "airwright/core/recovery/ExchangerKind.h"

namespace Airwright::Core::Recovery {

std::string_view toString(ExchangerKind kind)
{
    switch (kind) {
    case ExchangerKind::PlateCrossFlow:
        return "cross-flow plate exchanger";
    case ExchangerKind::PlateCounterFlow:
        return "counter-flow plate exchanger";
    case ExchangerKind::PlateCrossCounterFlow:
        return "cross-counter-flow plate exchanger";
    case ExchangerKind::RotaryNonHygroscopic:
        return "non-hygroscopic rotary exchanger";
    case ExchangerKind::RotaryHygroscopic:
        return "hygroscopic rotary exchanger";
    case ExchangerKind::RotarySorption:
        return "sorption rotary exchanger";
    case ExchangerKind::RunAroundCoil:
        return "run-around coil loop";
    }
    return "unknown exchanger";
}

bool isPlate(ExchangerKind kind)
{
    return kind == ExchangerKind::PlateCrossFlow || kind == ExchangerKind::PlateCounterFlow
           || kind == ExchangerKind::PlateCrossCounterFlow;
}

bool isRotary(ExchangerKind kind)
{
    return kind == ExchangerKind::RotaryNonHygroscopic || kind == ExchangerKind::RotaryHygroscopic
           || kind == ExchangerKind::RotarySorption;
}

bool transfersMoisture(ExchangerKind kind)
{
    return kind == ExchangerKind::RotaryHygroscopic || kind == ExchangerKind::RotarySorption;
}

FlowArrangement arrangementOf(ExchangerKind kind)
{
    switch (kind) {
    case ExchangerKind::PlateCrossFlow:
        return FlowArrangement::CrossFlowBothUnmixed;
    case ExchangerKind::PlateCrossCounterFlow:
        return FlowArrangement::CrossCounterFlow;
    default:
        return FlowArrangement::CounterFlow;
    }
}

Ratio defaultPressureDropExponent(ExchangerKind kind)
{
    if (isPlate(kind))
        return fraction(1.5);
    if (isRotary(kind))
        return fraction(1.2);
    return fraction(1.8);
}

Ratio defaultHeatTransferExponent(ExchangerKind kind)
{
    return kind == ExchangerKind::RunAroundCoil ? fraction(0.7) : fraction(0.6);
}

} // namespace Airwright::Core::Recovery
