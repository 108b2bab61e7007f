#include "airwright/core/recovery/FrostOnset.h"

#include "FrostKernels.h"

#include "airwright/core/InputError.h"
#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/core/recovery/BracketedRoot.h"
#include "airwright/core/recovery/EffectivenessNtu.h"

#include <algorithm>
#include <cmath>
#include <optional>

namespace Airwright::Core::Recovery {

namespace raw = Psychro::detail;

namespace {

constexpr double kLowestOnsetC = -80.0;

void checkFraction(const char* quantity, double v, double hi, const char* range)
{
    if (!(v >= 0.0 && v <= hi))
        throw InputError(quantity, v, "", range);
}

// Frost margin at one outdoor temperature, positive when frost forms. Plates and
// loops: K below the critical surface temperature; rotors: kg/kg of
// supersaturation along the mixing line.
struct MarginModel {
    ExchangerKind kind;
    double tExtract, wExtract, p;
    double eps, epsW;
    double plateNtu = 0.0;       // plates, Cr = 1
    double criticalSurface = 0.0; // min(0 C, extract dew/frost point)
    // Cross-counter plates: the pass effectiveness at (plateNtu / passes, 1), the
    // same at every outdoor temperature the onset solve tries, so computed once.
    std::optional<double> passEps = std::nullopt;

    double surface(double tOut) const
    {
        if (kind == ExchangerKind::RunAroundCoil) {
            // Identical counter-flow coils, loop capacity rate equal to the air's:
            // eps_coil = 2 eps / (1 + eps); the fluid returning to the extract coil
            // is t_e - ((1 + eps) / 2)(t_e - t_o).
            return tExtract - 0.5 * (1.0 + eps) * (tExtract - tOut);
        }
        const double warmOut = tExtract - eps * (tExtract - tOut);
        return Kernels::coldCornerSurface(arrangementOf(kind), tOut, tExtract, warmOut, plateNtu, 1.0, true, 0.5,
                                          passEps);
    }

    double margin(double tOut, double outdoorW) const
    {
        if (isRotary(kind)) {
            const double wEff = wExtract - (transfersMoisture(kind) ? epsW * (wExtract - outdoorW) : 0.0);
            return Kernels::mixingLineSupersaturation(tOut, outdoorW, tExtract, wEff, p);
        }
        return criticalSurface - surface(tOut);
    }
};

MarginModel makeModel(ExchangerKind kind, const Psychro::MoistAirState& extract, Ratio temperatureEffectiveness,
                      Ratio humidityEffectiveness)
{
    MarginModel m{kind,
                  toCelsius(extract.dryBulb()),
                  toKilogramsPerKilogram(extract.humidityRatio()),
                  toPascals(extract.pressure()),
                  toFraction(temperatureEffectiveness),
                  toFraction(humidityEffectiveness)};
    checkFraction("temperature effectiveness", m.eps, 1.0, "0 .. below 1");
    if (m.eps >= 1.0)
        throw InputError("temperature effectiveness", m.eps, "", "0 .. below 1");
    checkFraction("humidity effectiveness", m.epsW, 1.0, "0 .. 1");
    if (isPlate(kind)) {
        // The onset model takes balanced flows; an unbalanced operating point can
        // be more effective than a balanced exchanger ever is (NTU 100), and is
        // then taken at that ceiling.
        const double ceiling = toFraction(maximumEffectiveness(arrangementOf(kind), fraction(1.0)));
        const double eps = std::min(m.eps, ceiling * (1.0 - 1e-12));
        m.plateNtu = toFraction(ntuFromEffectiveness(arrangementOf(kind), fraction(eps), fraction(1.0)));
        if (arrangementOf(kind) == FlowArrangement::CrossCounterFlow)
            m.passEps = Kernels::crossFlowBothUnmixed(m.plateNtu / kCrossCounterFlowPasses, 1.0);
    }
    if (!isRotary(kind)) {
        // Vapour too thin for a dew point in the psychro range: nothing to freeze
        // above -100 C.
        const double pv = raw::vapourPressureFromHumidityRatio(m.wExtract, m.p);
        m.criticalSurface = pv >= raw::minSatPressure() ? std::min(0.0, raw::dewPointFromVapourPressure(pv))
                                                        : Psychro::kMinTemperatureC;
    }
    return m;
}

} // namespace

AbsoluteTemperature coldCornerSurfaceTemperature(const ColdCorner& c)
{
    const double ntu = toFraction(c.ntu);
    const double cr = toFraction(c.capacityRatio);
    const double w = toFraction(c.coldSideWeight);
    if (!(ntu >= 0.0 && ntu <= kMaxNtu))
        throw InputError("NTU", ntu, "", "0 .. 100");
    checkFraction("capacity rate ratio Cmin/Cmax", cr, 1.0, "0 .. 1");
    checkFraction("cold-side weight of the wall temperature", w, 1.0, "0 .. 1");
    return celsius(Kernels::coldCornerSurface(c.arrangement, toCelsius(c.coldInlet), toCelsius(c.warmInlet),
                                              toCelsius(c.warmOutlet), ntu, cr, c.warmStreamIsCmin, w));
}

bool surfaceFrosts(AbsoluteTemperature surface, const Psychro::MoistAirState& warmInlet)
{
    const double t = toCelsius(surface);
    if (!(t >= Psychro::kMinTemperatureC && t <= Psychro::kMaxTemperatureC))
        throw InputError("surface temperature", t, "C", "-100 .. 200 C");
    return Kernels::surfaceFrosts(t, toPascals(warmInlet.vapourPressure()));
}

bool mixingLineFrosts(const Psychro::MoistAirState& coldInlet, const Psychro::MoistAirState& warmInlet,
                      Ratio humidityEffectiveness)
{
    const double epsW = toFraction(humidityEffectiveness);
    checkFraction("humidity effectiveness", epsW, 1.0, "0 .. 1");
    const double wc = toKilogramsPerKilogram(coldInlet.humidityRatio());
    const double ww = toKilogramsPerKilogram(warmInlet.humidityRatio());
    return Kernels::mixingLineSupersaturation(toCelsius(coldInlet.dryBulb()), wc, toCelsius(warmInlet.dryBulb()),
                                              ww - epsW * (ww - wc), toPascals(coldInlet.pressure()))
           > 0.0;
}

bool frostRisk(ExchangerKind kind, const Psychro::MoistAirState& outdoor, const Psychro::MoistAirState& extract,
               Ratio temperatureEffectiveness, Ratio humidityEffectiveness)
{
    const MarginModel m = makeModel(kind, extract, temperatureEffectiveness, humidityEffectiveness);
    const double tOut = toCelsius(outdoor.dryBulb());
    if (tOut >= 0.0 || tOut >= m.tExtract)
        return false;
    return m.margin(tOut, toKilogramsPerKilogram(outdoor.humidityRatio())) > 0.0;
}

std::optional<AbsoluteTemperature> frostOnsetOutdoorTemperature(ExchangerKind kind,
                                                                 const Psychro::MoistAirState& extract,
                                                                 Ratio temperatureEffectiveness,
                                                                 Ratio humidityEffectiveness,
                                                                 Ratio outdoorRelativeHumidity)
{
    const MarginModel m = makeModel(kind, extract, temperatureEffectiveness, humidityEffectiveness);
    const double rh = toFraction(outdoorRelativeHumidity);
    if (!(rh >= 0.0 && rh < 1.0))
        throw InputError("outdoor relative humidity", rh * 100.0, "%", "0 .. below 100 %");
    if (!(m.tExtract > 0.0))
        throw InputError("extract air temperature", m.tExtract, "C", "above 0 C for a frost onset");
    const bool rotary = isRotary(kind);
    auto margin = [&](double tOut) {
        if (!rotary) // a surface margin: the outdoor humidity does not enter it
            return m.margin(tOut, 0.0);
        const double w = Psychro::humidityRatioFromRelativeHumidity(celsius(tOut), outdoorRelativeHumidity,
                                                                    extract.pressure())
                             .value();
        return m.margin(tOut, w) * 1000.0; // g/kg keeps both margins of order one
    };
    const double hi = 0.0;
    const double fHi = margin(hi);
    const double fLo = margin(kLowestOnsetC);
    if (!(fLo > 0.0))
        return std::nullopt;
    if (fHi > 0.0)
        return celsius(hi);
    return celsius(findBracketedRoot(margin, kLowestOnsetC, hi, fLo, fHi, 1e-6).x);
}

} // namespace Airwright::Core::Recovery
