#pragma once
// Flow arrangements of a two-stream recuperator, as tabulated in Incropera,
// Fundamentals of Heat and Mass Transfer, tables 11.3 and 11.4.

#include <string_view>

namespace Airwright::Core::Recovery {

enum class FlowArrangement {
    CounterFlow,
    CrossFlowBothUnmixed,   // plate cross-flow: both streams in separate channels
    CrossFlowCminMixed,     // stream with the smaller capacity rate mixed
    CrossFlowCmaxMixed,     // stream with the larger capacity rate mixed
    ParallelFlow,
    CrossCounterFlow,       // passes of unmixed cross-flow in overall counter-flow
};

std::string_view toString(FlowArrangement arrangement);

} // namespace Airwright::Core::Recovery
