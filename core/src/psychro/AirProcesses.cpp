#include "airwright/core/psychro/AirProcesses.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Psychro {

namespace {

ProcessOutcome unchanged(double tC, double w, Pressure p)
{
    return {MoistAirState::fromDryBulbHumidityRatio(celsius(tC), kilogramsPerKilogram(w), p),
            kilogramsPerKilogram(0.0), false};
}

ProcessOutcome saturatedAt(double tC, double w, double p, Pressure pressure)
{
    const double ws = detail::satHumidityRatio(tC, p);
    return {MoistAirState::fromDryBulbHumidityRatio(celsius(tC), kilogramsPerKilogram(ws), pressure),
            kilogramsPerKilogram(std::max(0.0, w - ws)), true};
}

double checkedFraction(Ratio r, const char* quantity)
{
    const double v = toFraction(r);
    if (!(v >= 0.0 && v <= 1.0))
        throw InputError(quantity, v, "", "0 .. 1");
    return v;
}

double checkedFlow(MassFlow m, const char* quantity)
{
    const double v = toKilogramsPerSecond(m);
    if (!(v >= 0.0 && std::isfinite(v)))
        throw InputError(quantity, v, "kg/s", "0 kg/s and above (finite)");
    return v;
}

} // namespace

ProcessOutcome clampToSaturation(AbsoluteTemperature tdb, HumidityRatio w, Pressure p)
{
    saturationPressure(tdb); // validates the dry bulb's range
    const double t1 = toCelsius(tdb);
    const double pv = toPascals(vapourPressureFromHumidityRatio(w, p));              // validates W and p
    const double wv = toKilogramsPerKilogram(w);
    const double pTotal = toPascals(p);
    const double pws1 = detail::satPressure(t1);
    if (!(pws1 < pTotal) || wv <= detail::humidityRatioFromVapourPressure(pws1, pTotal) * (1.0 + detail::kSaturationTolerance))
        return unchanged(t1, wv, p);

    // Fog: find t2 with h_s(t2) + (W - Ws(t2)) h_liquid(t2) = h(t1, W). The
    // residual rises with t2; it is negative at t1 and positive at the dew point of
    // W (where Ws = W and no liquid is left), so t2 lies in between.
    const double h1 = detail::enthalpy(t1, wv);
    const auto residual = [&](double t2, double& slope) {
        const double pws = detail::satPressure(t2);
        const double ws = detail::humidityRatioFromVapourPressure(pws, pTotal);
        const double ws1 = ws * detail::dLnSatPressure(t2) * pTotal / (pTotal - pws);
        slope = 1006.0 + 1860.0 * ws + ws1 * (detail::waterVapourEnthalpy(t2) - detail::liquidWaterEnthalpy(t2))
                + 4186.0 * (wv - ws);
        return detail::enthalpy(t2, ws) + (wv - ws) * detail::liquidWaterEnthalpy(t2) - h1;
    };
    double lo = t1;
    double hi = pv <= detail::maxSatPressure() ? std::min(detail::dewPointFromVapourPressure(pv), kMaxTemperatureC)
                                               : kMaxTemperatureC;
    double slope = 0.0;
    if (detail::satPressure(hi) >= pTotal || residual(hi, slope) < 0.0)
        throw InputError("humidity ratio", wv * 1000.0, "g/kg",
                         "0 .. " + formatFixed(detail::humidityRatioFromVapourPressure(pws1, pTotal) * 1000.0, 4)
                             + " g/kg, or a fog whose saturated state lies below 200 °C and the boiling point");
    double t2 = 0.5 * (lo + hi);
    for (int i = 0; i < 60; ++i) {
        const double f = residual(t2, slope);
        (f < 0.0 ? lo : hi) = t2;
        const double next = t2 - f / slope;
        const bool inside = next > lo && next < hi;
        const double step = inside ? next - t2 : 0.5 * (lo + hi) - t2;
        t2 += step;
        if (std::abs(step) < 1e-10 || hi - lo < 1e-10)
            break;
    }
    return saturatedAt(t2, wv, pTotal, p);
}

ProcessOutcome heatToTemperature(const MoistAirState& inlet, AbsoluteTemperature outletTdb)
{
    const double t2 = toCelsius(outletTdb);
    if (!(t2 >= kMinTemperatureC && t2 <= kMaxTemperatureC))
        throw InputError("outlet temperature", t2, "°C", "-100 .. 200 °C");
    const double w = toKilogramsPerKilogram(inlet.humidityRatio());
    const double p = toPascals(inlet.pressure());
    const double pws = detail::satPressure(t2);
    if (!(pws < p))
        return unchanged(t2, w, inlet.pressure());
    const double ws = detail::humidityRatioFromVapourPressure(pws, p);
    if (w > ws * (1.0 + detail::kSaturationTolerance))
        return saturatedAt(t2, w, p, inlet.pressure());
    if (w <= ws) // known to be below saturation: no second saturation check
        return {detail::stateBelowSaturation(outletTdb, inlet.humidityRatio(), inlet.pressure()),
                kilogramsPerKilogram(0.0), false};
    return unchanged(t2, w, inlet.pressure());
}

ProcessOutcome heatByDuty(const MoistAirState& inlet, Power duty, MassFlow dryAirFlow)
{
    const double m = checkedFlow(dryAirFlow, "dry-air mass flow");
    if (!(m > 0.0))
        throw InputError("dry-air mass flow", m, "kg/s", "above 0 kg/s");
    const double q = toWatts(duty);
    const double t1 = toCelsius(inlet.dryBulb());
    const double w = toKilogramsPerKilogram(inlet.humidityRatio());
    const double cp = 1006.0 + 1860.0 * w; // d h / d t of eq. 30 at constant W
    if (!std::isfinite(q))
        throw InputError("heat duty", q, "W", "a finite value");
    const double t2 = t1 + q / (m * cp);
    if (!(t2 >= kMinTemperatureC && t2 <= kMaxTemperatureC))
        throw InputError("heat duty", q, "W",
                         formatNumber(m * cp * (kMinTemperatureC - t1)) + " .. "
                             + formatNumber(m * cp * (kMaxTemperatureC - t1)) + " W (outlet -100 .. 200 °C)");
    if (q >= 0.0) // heating at constant W moves away from saturation: no fog, no check
        return {detail::stateBelowSaturation(celsius(t2), inlet.humidityRatio(), inlet.pressure()),
                kilogramsPerKilogram(0.0), false};
    return clampToSaturation(celsius(t2), inlet.humidityRatio(), inlet.pressure());
}

ProcessOutcome mix(const MoistAirState& a, MassFlow dryAirA, const MoistAirState& b, MassFlow dryAirB)
{
    const double ma = checkedFlow(dryAirA, "dry-air mass flow of the first stream");
    const double mb = checkedFlow(dryAirB, "dry-air mass flow of the second stream");
    if (!(ma + mb > 0.0))
        throw InputError("total dry-air mass flow", ma + mb, "kg/s", "above 0 kg/s");
    const double fa = ma / (ma + mb);
    const double w = fa * toKilogramsPerKilogram(a.humidityRatio()) + (1.0 - fa) * toKilogramsPerKilogram(b.humidityRatio());
    const double h = fa * toJoulesPerKilogram(a.enthalpy()) + (1.0 - fa) * toJoulesPerKilogram(b.enthalpy());
    const double t = std::clamp(detail::dryBulbFromEnthalpy(h, w), kMinTemperatureC, kMaxTemperatureC);
    return clampToSaturation(celsius(t), kilogramsPerKilogram(w), a.pressure());
}

ProcessOutcome steamHumidify(const MoistAirState& inlet, HumidityRatio targetW, AbsoluteTemperature steamTemperature)
{
    const double w1 = toKilogramsPerKilogram(inlet.humidityRatio());
    const double w2 = toKilogramsPerKilogram(targetW);
    if (!(w2 >= w1 && std::isfinite(w2)))
        throw InputError("target humidity ratio", w2 * 1000.0, "g/kg",
                         formatFixed(w1 * 1000.0, 4) + " g/kg (the inlet) and above");
    const double hg = toJoulesPerKilogram(waterVapourEnthalpy(steamTemperature)); // validates the steam temperature
    const double h2 = toJoulesPerKilogram(inlet.enthalpy()) + (w2 - w1) * hg;
    const double t2 = detail::dryBulbFromEnthalpy(h2, w2);
    if (!(t2 >= kMinTemperatureC && t2 <= kMaxTemperatureC))
        throw InputError("target humidity ratio", w2 * 1000.0, "g/kg", "a value that leaves the outlet within -100 .. 200 °C");
    return clampToSaturation(celsius(t2), targetW, inlet.pressure());
}

ProcessOutcome adiabaticHumidify(const MoistAirState& inlet, Ratio saturationEfficiency)
{
    const double eff = checkedFraction(saturationEfficiency, "saturation efficiency");
    const double t1 = toCelsius(inlet.dryBulb());
    const double w1 = toKilogramsPerKilogram(inlet.humidityRatio());
    const double twb = toCelsius(inlet.wetBulb());
    const double t2 = t1 - eff * (t1 - twb);
    // Water enters at the wet bulb: h2 = h1 + (W2 - W1) h_w(twb), with the water
    // enthalpy that eq. 33 / eq. 35 assume, so that eff = 1 lands on Ws(twb).
    const double hw = detail::wetBulbWaterEnthalpy(twb);
    const double h1 = toJoulesPerKilogram(inlet.enthalpy());
    const double w2 = std::max(w1, (h1 - w1 * hw - 1006.0 * t2) / (2501000.0 + 1860.0 * t2 - hw));
    return clampToSaturation(celsius(t2), kilogramsPerKilogram(w2), inlet.pressure());
}

ProcessOutcome coolDehumidify(const MoistAirState& inlet, AbsoluteTemperature apparatusDewPoint, Ratio bypassFactor)
{
    const double bf = checkedFraction(bypassFactor, "bypass factor");
    const double t1 = toCelsius(inlet.dryBulb());
    const double adp = toCelsius(apparatusDewPoint);
    if (!(adp >= kMinTemperatureC && adp <= t1 + detail::kTemperatureTolerance))
        throw InputError("apparatus dew point", adp, "°C", "-100 .. " + formatFixed(t1, 2) + " °C (the inlet dry bulb)");
    const double w1 = toKilogramsPerKilogram(inlet.humidityRatio());
    const double wAdp = toKilogramsPerKilogram(saturationHumidityRatio(celsius(std::min(adp, t1)), inlet.pressure()));
    const double t2 = adp + bf * (t1 - adp);
    if (wAdp >= w1)
        return unchanged(std::min(t2, t1), w1, inlet.pressure()); // dry coil: the ADP is above the dew point
    const double w2 = wAdp + bf * (w1 - wAdp);
    ProcessOutcome out = clampToSaturation(celsius(t2), kilogramsPerKilogram(w2), inlet.pressure());
    out.condensate = kilogramsPerKilogram(w1 - toKilogramsPerKilogram(out.outlet.humidityRatio()));
    return out;
}

} // namespace Airwright::Core::Psychro
