#include "airwright/core/sections/WaterHeatingCoil.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Sections {

namespace {
// Finned-tube air-side pressure drop grows with about v^1.75 (common practice).
constexpr double kCoilVelocityExponent = 1.75;
const Velocity kCoilRatedVelocity = metresPerSecond(2.0);
// Smallest approach between the flow temperature and the air leaving.
constexpr double kMinimumApproachK = 1.0;
} // namespace

std::optional<TemperatureDifference> logMeanTemperatureDifference(TemperatureDifference hotEnd,
                                                                  TemperatureDifference coldEnd)
{
    const double a = hotEnd.value();
    const double b = coldEnd.value();
    if (!(a > 0.0 && b > 0.0))
        return std::nullopt;
    if (std::abs(a - b) < 1e-9 * std::max(a, b))
        return kelvinDifference(0.5 * (a + b));
    return kelvinDifference((a - b) / std::log(a / b));
}

void WaterHeatingCoil::validate() const
{
    const double tf = toCelsius(flowTemperature);
    const double tr = toCelsius(returnTemperature);
    // The fluid property tables end at 100 C (docs/coolant-properties.md).
    if (!(tf > 0.0 && tf <= 100.0))
        throw InputError("heating coil flow temperature", tf, "C", "above 0 .. 100 C");
    if (!(tr > 0.0 && tr < tf))
        throw InputError("heating coil return temperature", tr, "C",
                         "above 0 C and below the flow temperature (" + formatNumber(tf) + " C)");
    if (returnTemperature < fluid.lowestTemperature())
        throw InputError("heating coil return temperature", tr, "C",
                         "at least " + formatNumber(toCelsius(fluid.lowestTemperature())) + " C for "
                             + fluid.description());
    if (rows < 1 || rows > 12)
        throw InputError("heating coil rows", rows, "", "1 .. 12");
    if (!(pressureDropPerRow.value() >= 0.0 && pressureDropPerRow.value() <= 200.0))
        throw InputError("heating coil pressure drop per row", pressureDropPerRow.value(), "Pa", "0 .. 200 Pa");
    if (capacity && !(capacity->value() > 0.0))
        throw InputError("heating coil capacity", toKilowatts(*capacity), "kW", "above 0");
    if (fixedOutletTemperature && !(toCelsius(*fixedOutletTemperature) > -40.0 && *fixedOutletTemperature < flowTemperature))
        throw InputError("preheat outlet temperature", toCelsius(*fixedOutletTemperature), "C",
                         "-40 C .. the flow temperature (" + formatNumber(tf) + " C)");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("heating coil length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome WaterHeatingCoil::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    const Pressure dp = scaledPressureDrop(pressureDropPerRow * static_cast<double>(rows), kCoilRatedVelocity,
                                           context.faceVelocity, kCoilVelocityExponent);
    detail = Detail{};
    detail.flowTemperature = flowTemperature;
    detail.returnTemperature = returnTemperature;

    SectionOutcome outcome{inlet, dp, MassFlow{}, MassFlow{}, {}};
    const auto target = fixedOutletTemperature ? fixedOutletTemperature : context.target.outletTemperature;

    if (toCelsius(inlet.state.dryBulb()) < 3.0 && fluid.freezingPoint() > celsius(-5.0))
        outcome.findings.push_back(
            {Severity::Warning, "coil.freeze_risk", "",
             "air reaches this water coil at " + formatFixed(toCelsius(inlet.state.dryBulb()), 1)
                 + " C: protect it against freezing (frost thermostat after the coil, pump kept running, "
                   "preheat or glycol); local codes and licensed practice govern"});

    if (!target || *target <= inlet.state.dryBulb())
        return outcome;

    AbsoluteTemperature wanted = *target;
    const AbsoluteTemperature reachable = flowTemperature - kelvinDifference(kMinimumApproachK);
    if (wanted > reachable) {
        wanted = reachable;
        detail.capacityLimited = true;
        outcome.findings.push_back({Severity::Error, "coil.flow_temperature",
                                    "",
                                    "the air would have to leave at " + formatFixed(toCelsius(*target), 1)
                                        + " C, above what water at " + formatFixed(toCelsius(flowTemperature), 1)
                                        + " C can give"});
    }
    if (wanted <= inlet.state.dryBulb())
        return outcome;

    auto process = Psychro::heatToTemperature(inlet.state, wanted);
    Power duty = inlet.dryAir * (process.outlet.enthalpy() - inlet.state.enthalpy());
    if (capacity && duty > *capacity) {
        process = Psychro::heatByDuty(inlet.state, *capacity, inlet.dryAir);
        duty = *capacity;
        detail.capacityLimited = true;
        outcome.findings.push_back({Severity::Error, "coil.capacity", "",
                                    "heating capacity " + formatFixed(toKilowatts(*capacity), 1)
                                        + " kW is not enough to reach " + formatFixed(toCelsius(*target), 1) + " C"});
    }
    outcome.outlet.state = process.outlet;
    detail.duty = duty;

    const AbsoluteTemperature mean = flowTemperature - 0.5 * (flowTemperature - returnTemperature);
    const auto cp = fluid.specificHeat(mean);
    detail.fluidFlow = duty / (cp * (flowTemperature - returnTemperature));
    detail.fluidVolumeFlow = detail.fluidFlow / fluid.density(mean);

    // Counter-flow connection: water in meets air out.
    detail.lmtd = logMeanTemperatureDifference(flowTemperature - process.outlet.dryBulb(),
                                               returnTemperature - inlet.state.dryBulb());
    if (detail.lmtd)
        detail.requiredUa = duty / *detail.lmtd;
    else
        outcome.findings.push_back({Severity::Warning, "coil.return_temperature", "",
                                    "return temperature " + formatFixed(toCelsius(returnTemperature), 1)
                                        + " C is not above the entering air; the water will return warmer"});
    return outcome;
}

} // namespace Airwright::Core::Sections
