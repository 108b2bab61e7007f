#include "airwright/core/annual/HeatRecoveryOption.h"

#include "airwright/core/sections/Coolant.h"

namespace Airwright::Core::Annual {

namespace {

Recovery::HeatRecovery typical(Recovery::ExchangerKind kind, double efficiencyPct, double dropPa,
                               VolumeFlow flow)
{
    Recovery::HeatRecovery hr;
    hr.kind = kind;
    hr.ratedEfficiency = percent(efficiencyPct);
    hr.ratedFlow = flow;
    hr.ratedPressureDropSupply = pascals(dropPa);
    hr.ratedPressureDropExtract = pascals(dropPa);
    hr.bypassControl = true;
    hr.frostStrategy = Recovery::isRotary(kind) ? Recovery::FrostStrategy::RotorSpeed : Recovery::FrostStrategy::Bypass;
    hr.exhaustAirTransfer = percent(0.0);
    hr.outdoorAirCorrection = 1.0;
    return hr;
}

} // namespace

std::vector<HeatRecoveryOption> defaultHeatRecoveryOptions(VolumeFlow supplyDesignFlow)
{
    using Recovery::ExchangerKind;
    const double perM3h = toCubicMetresPerHour(supplyDesignFlow);

    auto crossFlow = typical(ExchangerKind::PlateCrossFlow, 65.0, 150.0, supplyDesignFlow);
    crossFlow.length = metres(1.6);
    auto counterFlow = typical(ExchangerKind::PlateCounterFlow, 85.0, 200.0, supplyDesignFlow);
    counterFlow.length = metres(2.4);
    auto wheel = typical(ExchangerKind::RotaryNonHygroscopic, 78.0, 130.0, supplyDesignFlow);
    wheel.length = metres(0.8);
    auto enthalpyWheel = typical(ExchangerKind::RotaryHygroscopic, 78.0, 130.0, supplyDesignFlow);
    enthalpyWheel.ratedHumidityEfficiency = percent(70.0);
    enthalpyWheel.length = metres(0.8);
    auto loop = typical(ExchangerKind::RunAroundCoil, 70.0, 180.0, supplyDesignFlow);
    loop.loopFluid = Sections::Coolant(Sections::CoolantKind::PropyleneGlycol, fraction(0.30));
    loop.pumpPower = watts(30.0 * perM3h / 1000.0);
    loop.length = metres(0.6);

    return {
        {"none", "no heat recovery", std::nullopt, 0.0},
        {"plate_cross_flow", "plate, cross-flow", crossFlow, 0.8 * perM3h},
        {"plate_counter_flow", "plate, counter-flow", counterFlow, 1.2 * perM3h},
        {"rotary_non_hygroscopic", "rotary wheel, non-hygroscopic", wheel, 1.0 * perM3h},
        {"rotary_hygroscopic", "rotary wheel, hygroscopic", enthalpyWheel, 1.3 * perM3h},
        {"run_around_loop", "run-around coil loop", loop, 2.0 * perM3h},
    };
}

} // namespace Airwright::Core::Annual
