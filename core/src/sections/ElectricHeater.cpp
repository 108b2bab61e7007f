#include "airwright/core/sections/ElectricHeater.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Sections {

void ElectricHeater::validate() const
{
    if (ratedPower && !(ratedPower->value() > 0.0 && ratedPower->value() <= 2.0e6))
        throw InputError("electric heater rating", toKilowatts(*ratedPower), "kW", "above 0 .. 2000 kW");
    if (steps < 0 || steps > 32)
        throw InputError("electric heater steps", steps, "", "0 (continuous) .. 32");
    if (!(pressureDrop.value() >= 0.0 && pressureDrop.value() <= 500.0))
        throw InputError("electric heater pressure drop", pressureDrop.value(), "Pa", "0 .. 500 Pa");
    if (fixedOutletTemperature && !(toCelsius(*fixedOutletTemperature) > -40.0 && toCelsius(*fixedOutletTemperature) < 60.0))
        throw InputError("preheat outlet temperature", toCelsius(*fixedOutletTemperature), "C", "-40 .. 60 C");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("electric heater length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome ElectricHeater::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    const Pressure dp = scaledPressureDrop(pressureDrop, metresPerSecond(2.0), context.faceVelocity, 2.0);
    detail = Detail{};
    detail.rated = ratedPower;
    SectionOutcome outcome{inlet, dp, MassFlow{}, MassFlow{}, {}};
    outcome.findings.push_back({Severity::Info, "heater.electric_caution", "",
                                "electric heater: needs an airflow interlock and an overheat cut-out with manual "
                                "reset; local codes and licensed practice govern"});

    const auto target = fixedOutletTemperature ? fixedOutletTemperature : context.target.outletTemperature;
    Power duty = watts(0.0);
    if (target && *target > inlet.state.dryBulb()) {
        const auto process = Psychro::heatToTemperature(inlet.state, *target);
        duty = inlet.dryAir * (process.outlet.enthalpy() - inlet.state.enthalpy());
    }
    if (ratedPower) {
        if (duty > *ratedPower) {
            duty = *ratedPower;
            detail.capacityLimited = true;
            outcome.findings.push_back({Severity::Error, "heater.capacity", "",
                                        "electric heater rating " + formatFixed(toKilowatts(*ratedPower), 1)
                                            + " kW is not enough to reach the target"});
        }
        if (steps > 0 && duty.value() > 0.0) {
            // Stepped control: the first step at or above the demand.
            const double stepPower = ratedPower->value() / steps;
            detail.stepsOn = std::min(steps, static_cast<int>(std::ceil(duty.value() / stepPower - 1e-9)));
            duty = watts(stepPower * detail.stepsOn);
        }
    }
    if (duty.value() > 0.0)
        outcome.outlet.state = Psychro::heatByDuty(inlet.state, duty, inlet.dryAir).outlet;
    detail.duty = duty;
    const Power forCurrent = ratedPower.value_or(duty);
    detail.lineCurrent = amperes(forCurrent.value() / (std::sqrt(3.0) * kLineVoltage));
    return outcome;
}

} // namespace Airwright::Core::Sections
