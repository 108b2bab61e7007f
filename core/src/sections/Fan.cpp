#include "airwright/core/sections/Fan.h"
#include "airwright/core/PowerLaw.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"

#include <cmath>
#include <optional>

namespace Airwright::Core::Sections {

namespace {
void requireEfficiency(const char* what, Ratio value, double lowest)
{
    if (!(value.value() >= lowest && value.value() <= 1.0))
        throw InputError(what, toPercent(value), "%", formatNumber(lowest * 100.0) + " .. 100 %");
}
} // namespace

Ratio Fan::overallEfficiency() const
{
    return fanEfficiency * motorEfficiency * driveEfficiency * controllerEfficiency;
}

void Fan::validate() const
{
    requireEfficiency("fan efficiency", fanEfficiency, 0.05);
    requireEfficiency("motor efficiency", motorEfficiency, 0.3);
    requireEfficiency("drive efficiency", driveEfficiency, 0.5);
    requireEfficiency("speed controller efficiency", controllerEfficiency, 0.5);
    if (motorIeClass < 1 || motorIeClass > 5)
        throw InputError("motor efficiency class (IEC 60034-30-1)", motorIeClass, "", "IE1 .. IE5");
    if (kFactor && !(*kFactor > 0.0 && *kFactor < 1.0e5))
        throw InputError("inlet ring k-factor", *kFactor, "m3/h per sqrt(Pa)", "above 0");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("fan length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome Fan::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    detail = Detail{};
    const VolumeFlow q = inlet.volumeFlow();
    const Pressure pt = context.fanTotalPressure;
    detail.flow = q;
    detail.totalPressure = pt;
    detail.overallEfficiency = overallEfficiency();
    const Power airPower = q * pt;
    detail.shaftPower = airPower / fanEfficiency;
    detail.electricPower = airPower / detail.overallEfficiency;
    detail.specificFanPower = detail.electricPower / q;
    if (kFactor) // q = k sqrt(dp): dp = (q / k)^2 with q in m3/h
        detail.inletRingPressure = pascals(powerLaw(toCubicMetresPerHour(q) / *kFactor, 2.0));

    // Heat to the air: all the electric input with the motor in the airstream, else
    // the shaft power (the impeller's losses end up in the air either way).
    const Power heat = motorInAirstream ? detail.electricPower : detail.shaftPower;
    std::optional<Psychro::ProcessOutcome> process;
    try {
        process = Psychro::heatByDuty(inlet.state, heat, inlet.dryAir);
    } catch (const InputError&) {
        if (!(inlet.dryAir.value() > 0.0) || !std::isfinite(heat.value()))
            throw;
        // The psychrometric range ends at 200 C; say why the fan gets there.
        throw InputError("the fan's heat " + formatFixed(toKilowatts(heat), 1) + " kW (total pressure "
                         + formatFixed(pt.value(), 0) + " Pa at " + formatFixed(toPercent(detail.overallEfficiency), 1)
                         + " % overall efficiency" + (motorInAirstream ? ", motor in the airstream" : "")
                         + ") would warm the air beyond 200 C, the most the air may reach: lower the pressure drops "
                           "of the path or raise the fan's efficiencies");
    }
    detail.temperatureRise = process->outlet.dryBulb() - inlet.state.dryBulb();
    return SectionOutcome{{process->outlet, inlet.dryAir}, -pt, MassFlow{}, MassFlow{}, {}};
}

} // namespace Airwright::Core::Sections
