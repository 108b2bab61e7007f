#include "airwright/core/sections/CoolingCoil.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Sections {

namespace {
constexpr double kCoilVelocityExponent = 1.75; // common practice for finned-tube coils
// The apparatus dew point cannot come closer than this to the entering water.
constexpr double kMinimumApproachK = 1.0;
// Above this face velocity a wet coil throws droplets: an eliminator is needed
// (common practice).
constexpr double kCarryOverVelocity = 2.5;

struct CoilState {
    Psychro::MoistAirState outlet;
    std::optional<AbsoluteTemperature> adp;
    bool wet = false;
};

// Outlet of a coil with bypass factor bf whose surface sits at adp.
CoilState outletForAdp(const Psychro::MoistAirState& in, AbsoluteTemperature adp, double bf)
{
    const auto p = in.pressure();
    const double tIn = toCelsius(in.dryBulb());
    const double tOut = toCelsius(adp) + bf * (tIn - toCelsius(adp));
    if (adp >= in.dewPoint())
        return {Psychro::heatToTemperature(in, celsius(tOut)).outlet, adp, false};
    const double wAdp = Psychro::saturationHumidityRatio(adp, p).value();
    // The straight process line can pass above the (convex) saturation curve close
    // to the ADP; the air leaving can at most be saturated, the rest condenses.
    const double wOut = std::min(wAdp + bf * (in.humidityRatio().value() - wAdp),
                                 Psychro::saturationHumidityRatio(celsius(tOut), p).value());
    return {Psychro::MoistAirState::fromDryBulbHumidityRatio(celsius(tOut), kilogramsPerKilogram(wOut), p), adp, true};
}

// ADP that brings the outlet to temperature t (dry or wet).
AbsoluteTemperature adpForTemperature(const Psychro::MoistAirState& in, AbsoluteTemperature t, double bf)
{
    const double tIn = toCelsius(in.dryBulb());
    return celsius((toCelsius(t) - bf * tIn) / (1.0 - bf));
}

Power coilLoad(const Psychro::MoistAirState& in, const Psychro::MoistAirState& out, MassFlow dryAir,
               AbsoluteTemperature condensateTemperature)
{
    // ASHRAE Fundamentals 2017 ch. 1: q = m_da [(h1 - h2) - (W1 - W2) h_w].
    const double dw = in.humidityRatio().value() - out.humidityRatio().value();
    return dryAir * ((in.enthalpy() - out.enthalpy()) - dw * Psychro::liquidWaterEnthalpy(condensateTemperature));
}
} // namespace

Ratio CoolingCoil::effectiveBypassFactor() const
{
    // Without a datasheet value: about 0.65 per row (4 rows 0.18, 6 rows 0.075,
    // 8 rows 0.03) at usual face velocities; common practice.
    return bypassFactor.value_or(fraction(std::pow(0.65, rows)));
}

void CoolingCoil::validate() const
{
    const double ti = toCelsius(waterInletTemperature);
    const double to = toCelsius(waterOutletTemperature);
    if (!(ti >= -10.0 && ti <= 25.0))
        throw InputError("chilled water inlet temperature", ti, "C", "-10 .. 25 C");
    if (!(to > ti && to <= 30.0))
        throw InputError("chilled water outlet temperature", to, "C",
                         "above the inlet temperature (" + formatNumber(ti) + " C) .. 30 C");
    if (waterInletTemperature < fluid.lowestTemperature())
        throw InputError("chilled water inlet temperature", ti, "C",
                         "at least " + formatNumber(toCelsius(fluid.lowestTemperature())) + " C for "
                             + fluid.description() + " (freezing)");
    if (rows < 1 || rows > 12)
        throw InputError("cooling coil rows", rows, "", "1 .. 12");
    if (bypassFactor && !(bypassFactor->value() > 0.0 && bypassFactor->value() < 1.0))
        throw InputError("cooling coil bypass factor", bypassFactor->value(), "", "above 0 and below 1");
    if (!(pressureDropPerRow.value() >= 0.0 && pressureDropPerRow.value() <= 200.0))
        throw InputError("cooling coil pressure drop per row", pressureDropPerRow.value(), "Pa", "0 .. 200 Pa");
    if (!(wetPressureDropFactor >= 1.0 && wetPressureDropFactor <= 3.0))
        throw InputError("wet pressure drop factor", wetPressureDropFactor, "", "1 .. 3");
    if (capacity && !(capacity->value() > 0.0))
        throw InputError("cooling coil capacity", toKilowatts(*capacity), "kW", "above 0");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("cooling coil length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome CoolingCoil::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    const double bf = effectiveBypassFactor().value();
    detail = Detail{};
    detail.bypassFactor = fraction(bf);
    const Pressure dryDp = scaledPressureDrop(pressureDropPerRow * static_cast<double>(rows), metresPerSecond(2.0),
                                              context.faceVelocity, kCoilVelocityExponent);
    SectionOutcome outcome{inlet, dryDp, MassFlow{}, MassFlow{}, {}};
    const auto& in = inlet.state;

    // The coldest surface the coil asks for: for the temperature target, and below it
    // for the humidity limit when dehumidification is on.
    std::optional<AbsoluteTemperature> adp;
    const auto& target = context.target;
    if (target.outletTemperature && *target.outletTemperature < in.dryBulb())
        adp = adpForTemperature(in, *target.outletTemperature, bf);
    if (target.dehumidify && target.maxHumidity && in.humidityRatio() > *target.maxHumidity) {
        const double wAdp = (target.maxHumidity->value() - bf * in.humidityRatio().value()) / (1.0 - bf);
        const AbsoluteTemperature forHumidity =
            wAdp > 1e-6 ? Psychro::dewPointFromHumidityRatio(kilogramsPerKilogram(wAdp), in.pressure())
                        : celsius(Psychro::kMinTemperatureC + 1.0);
        if (!adp || forHumidity < *adp)
            adp = forHumidity;
    }
    if (!adp)
        return outcome;

    const AbsoluteTemperature coldest = waterInletTemperature + kelvinDifference(kMinimumApproachK);
    if (*adp < coldest) {
        outcome.findings.push_back({Severity::Error, "coil.water_temperature", "",
                                    "the coil surface would need " + formatFixed(toCelsius(*adp), 1)
                                        + " C, colder than chilled water at "
                                        + formatFixed(toCelsius(waterInletTemperature), 1) + " C allows"});
        adp = coldest;
        detail.capacityLimited = true;
    }

    CoilState state = outletForAdp(in, *adp, bf);
    Power load = coilLoad(in, state.outlet, inlet.dryAir, *adp);
    if (capacity && load > *capacity) {
        // Warmest surface temperature whose load fits the capacity (bisection).
        double lo = toCelsius(*adp);
        double hi = toCelsius(in.dryBulb());
        for (int i = 0; i < 60 && hi - lo > 1e-6; ++i) {
            const double mid = 0.5 * (lo + hi);
            const auto trial = outletForAdp(in, celsius(mid), bf);
            if (coilLoad(in, trial.outlet, inlet.dryAir, celsius(mid)) > *capacity)
                lo = mid;
            else
                hi = mid;
        }
        state = outletForAdp(in, celsius(hi), bf);
        load = coilLoad(in, state.outlet, inlet.dryAir, celsius(hi));
        detail.capacityLimited = true;
        outcome.findings.push_back({Severity::Error, "coil.capacity", "",
                                    "cooling capacity " + formatFixed(toKilowatts(*capacity), 1)
                                        + " kW is not enough for the setpoint"});
    }

    outcome.outlet.state = state.outlet;
    outcome.waterRemoved = inlet.dryAir * (in.humidityRatio() - state.outlet.humidityRatio());
    if (outcome.waterRemoved.value() < 0.0)
        outcome.waterRemoved = MassFlow{};
    detail.totalLoad = load;
    const double cpMoist = 1006.0 + 1860.0 * in.humidityRatio().value();
    detail.sensibleLoad = watts(inlet.dryAir.value() * cpMoist
                                * (toCelsius(in.dryBulb()) - toCelsius(state.outlet.dryBulb())));
    detail.latentLoad = load - detail.sensibleLoad;
    detail.sensibleHeatRatio = load.value() > 0.0 ? fraction(detail.sensibleLoad / load) : fraction(1.0);
    detail.condensate = outcome.waterRemoved;
    detail.apparatusDewPoint = state.adp;
    detail.wet = state.wet;
    const AbsoluteTemperature mean = waterInletTemperature + 0.5 * (waterOutletTemperature - waterInletTemperature);
    detail.fluidFlow = load / (fluid.specificHeat(mean) * (waterOutletTemperature - waterInletTemperature));
    detail.fluidVolumeFlow = detail.fluidFlow / fluid.density(mean);

    if (state.wet) {
        outcome.pressureDrop = dryDp * wetPressureDropFactor;
        if (context.faceVelocity.value() > kCarryOverVelocity)
            outcome.findings.push_back({Severity::Warning, "coil.carry_over", "",
                                        "wet coil at " + formatFixed(context.faceVelocity.value(), 2)
                                            + " m/s face velocity: above about 2.5 m/s condensate is carried off "
                                              "the fins; fit a droplet eliminator"});
    }
    return outcome;
}

} // namespace Airwright::Core::Sections
