#include "airwright/core/psychro/Psychrometrics.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/PsychroRaw.h"

#include <algorithm>
#include <bit>
#include <cmath>
#include <cstdint>
#include <string>

namespace Airwright::Core::Psychro {

namespace detail {

namespace {

constexpr double kKelvinOffset = 273.15;

// ASHRAE Fundamentals 2017 ch. 1 eq. 5 (over ice, index 0) and eq. 6 (over water,
// index 1), T in K, written as one form so the branch is a table index, not a jump:
//   ln pws = k1/T + k0 + c1 T + c2 T^2 + c3 T^3 + c4 T^4 + kln ln T.
struct SatCoefficients {
    double k1, k0, c1, c2, c3, c4, kln;
};
constexpr SatCoefficients kSat[2] = {
    {-5.6745359e3, 6.3925247, -9.677843e-3, 6.2215701e-7, 2.0747825e-9, -9.484024e-13, 4.1635019},
    {-5.8002206e3, 1.3914993, -4.8640239e-2, 4.1764768e-5, -1.4452093e-8, 0.0, 6.5459673},
};

inline const SatCoefficients& satBranch(double tC) { return kSat[tC > kTriplePointC ? 1 : 0]; }

inline double lnPws(const SatCoefficients& c, double T)
{
    return c.k1 / T + c.k0 + T * (c.c1 + T * (c.c2 + T * (c.c3 + T * c.c4))) + c.kln * std::log(T);
}
inline double dLnPws(const SatCoefficients& c, double T)
{
    const double r = 1.0 / T;
    return -c.k1 * r * r + c.c1 + T * (2.0 * c.c2 + T * (3.0 * c.c3 + T * 4.0 * c.c4)) + c.kln * r;
}

// Fitted inverse of eq. 5 and eq. 6: 1/T as a polynomial in s = (ln pw - mid) / half,
// Chebyshev interpolation of the exact inverse (degree 6 over ice, 7 over water);
// worst error 7e-6 K over ice and 8e-5 K over water before any Newton step.
struct InverseFit {
    double mid, half;
    double c[8];
};
constexpr InverseFit kInverse[2] = {
    {-0.075736792524400798,
     6.4919085002820953,
     {0.0047166316497002803, -0.0010564459286025898, 1.7410434501003323e-06, -7.2019666576619835e-07,
      -2.5596198204322749e-07, -7.4401638177782174e-08, -1.8011024883825474e-08, 0.0}},
    {10.336602620434403,
     3.9204309068829861,
     {0.002916435521306581, -0.00076959849348937895, -2.9648860365717429e-05, -4.7405391556639472e-06,
      -1.7402546574792066e-08, 5.0207016840742372e-07, 4.0679838521351375e-07, 1.5520759413974183e-07}},
};

const double kLnPwsTriplePoint = lnPws(kSat[0], kTriplePointC + kKelvinOffset);
const double kSatPressureTriplePoint = std::exp(kLnPwsTriplePoint);
const double kMinSatPressure = std::exp(lnPws(kSat[0], -100.0 + kKelvinOffset));
const double kMaxSatPressure = std::exp(lnPws(kSat[1], 200.0 + kKelvinOffset));

inline int inverseBranch(double lnPw) { return lnPw > kLnPwsTriplePoint ? 1 : 0; }

// Fitted dew point, K (Estrin evaluation to keep the dependency chain short).
inline double fittedDewPointKelvin(double lnPw, int branch)
{
    const InverseFit& f = kInverse[branch];
    const double s = (lnPw - f.mid) / f.half;
    const double s2 = s * s;
    const double s4 = s2 * s2;
    const double p01 = f.c[0] + f.c[1] * s, p23 = f.c[2] + f.c[3] * s;
    const double p45 = f.c[4] + f.c[5] * s, p67 = f.c[6] + f.c[7] * s;
    return 1.0 / ((p01 + p23 * s2) + (p45 + p67 * s2) * s4);
}

// ln x to about 4e-8 absolute, for first guesses only (half the latency of
// std::log): x = 2^k z with z in [sqrt(1/2), sqrt(2)), ln z by a degree-8
// Chebyshev fit. Precondition: x positive and normal.
inline double approxLog(double x)
{
    constexpr std::uint64_t kOffset = 0x3fe6a09e667f3bcdULL; // bits of sqrt(1/2)
    const std::uint64_t ix = std::bit_cast<std::uint64_t>(x);
    const std::uint64_t tmp = ix - kOffset;
    const auto k = static_cast<double>(static_cast<std::int64_t>(tmp) >> 52);
    const double z = std::bit_cast<double>(ix - (tmp & (0xfffULL << 52)));
    const double s = (z - 1.0606601717798214) * 2.8284271247461898;
    const double s2 = s * s;
    const double s4 = s2 * s2;
    const double p01 = 0.058891517828191749 + 0.33333308777168585 * s;
    const double p23 = -0.05555548159697412 + 0.012348930681128979 * s;
    const double p45 = -0.0030873989768730086 + 0.000811556003221556 * s;
    const double p67 = -0.00022516488892164606 + 7.9985779313279044e-05 * s;
    const double poly = (p01 + p23 * s2) + (p45 + p67 * s2) * s4 - 2.3463300990221745e-05 * s4 * s4;
    return k * 0.69314718055994531 + poly;
}

// The psychrometer relation of eq. 33 / eq. 35 multiplied out:
//   g(u) = (A - alpha u) Ws(u) - 1.006 (t - u) - W (A + 1.86 t - beta u),
// increasing in u, zero at the wet bulb. Index 0: eq. 35 (A 2830, alpha 0.24,
// beta 2.1); index 1: eq. 33 (A 2501, alpha 2.326, beta 4.186).
struct WetBulbBranch {
    double A, alpha, beta;
};
constexpr WetBulbBranch kWetBulbBranch[2] = {{2830.0, 0.24, 2.1}, {2501.0, 2.326, 4.186}};

inline double psychrometerResidual(const WetBulbBranch& b, double t, double w, double p, double u)
{
    const double ws = satHumidityRatio(u, p);
    return (b.A - b.alpha * u) * ws - 1.006 * (t - u) - w * (b.A + 1.86 * t - b.beta * u);
}

// One Halley step on g at u, with g itself returned for bracketing.
struct HalleyStep {
    double g, step;
};
inline HalleyStep halleyStep(const WetBulbBranch& b, double t, double w, double p, double u)
{
    const SatCoefficients& c = satBranch(u);
    const double T = u + kKelvinOffset;
    const double r = 1.0 / T;
    const double L = c.k1 * r + c.k0 + T * (c.c1 + T * (c.c2 + T * (c.c3 + T * c.c4))) + c.kln * std::log(T);
    const double L1 = -c.k1 * r * r + c.c1 + T * (2.0 * c.c2 + T * (3.0 * c.c3 + T * 4.0 * c.c4)) + c.kln * r;
    const double L2 = 2.0 * c.k1 * r * r * r + 2.0 * c.c2 + T * (6.0 * c.c3 + T * 12.0 * c.c4) - c.kln * r * r;
    const double pws = std::exp(L);
    const double inv = 1.0 / (p - pws);
    const double ws = kMolarMassRatio * pws * inv;
    // dWs/du = Ws L' p / (p - pws); the second derivative by the same quotient rule.
    const double q = p * inv;
    const double ws1 = ws * L1 * q;
    const double ws2 = ws * q * (L2 + L1 * L1 * (1.0 + 2.0 * pws * inv));
    const double a = b.A - b.alpha * u;
    const double g = a * ws - 1.006 * (t - u) - w * (b.A + 1.86 * t - b.beta * u);
    const double g1 = -b.alpha * ws + a * ws1 + 1.006 + b.beta * w;
    const double g2 = -2.0 * b.alpha * ws1 + a * ws2;
    const double den = 2.0 * g1 * g1 - g * g2;
    return {g, den > 0.0 ? -2.0 * g * g1 / den : -g / g1};
}

// Halley converges cubically: after a step s the error left is about K s^3, with
// K below 2e-4 / K^2 over -100 .. 200 C, 60 .. 110 kPa; a step under 0.1 K leaves
// at most 2e-7 K (checked against a bisection to 1e-12 K in the unit tests), and
// lets nine wet bulbs in ten stop after a single step.
constexpr double kHalleyStepTolerance = 0.1;

// Safeguarded solve of g = 0 in [lo, hi] (g(lo) <= 0 <= g(hi)) from u0: at most
// 8 Halley steps, each kept inside the shrinking bracket (bisection otherwise),
// then bisection: bounded, always an answer. From the first guess below one or
// two steps are the rule.
double solveWetBulbBranch(const WetBulbBranch& b, double t, double w, double p, double lo, double hi, double u0)
{
    double u = (u0 >= lo && u0 <= hi) ? u0 : 0.5 * (lo + hi); // also catches a NaN guess
    for (int i = 0; i < 8; ++i) {
        const HalleyStep s = halleyStep(b, t, w, p, u);
        if (!(s.g == s.g && s.step == s.step)) {
            u = 0.5 * (lo + hi);
            continue;
        }
        if (s.g < 0.0)
            lo = u;
        else if (s.g > 0.0)
            hi = u;
        else
            return u;
        const double next = u + s.step;
        if (std::abs(s.step) < kHalleyStepTolerance && next >= lo && next <= hi)
            return next;
        u = (next > lo && next < hi) ? next : 0.5 * (lo + hi);
    }
    for (int i = 0; i < 64 && hi - lo > 1e-10; ++i) {
        const double mid = 0.5 * (lo + hi);
        if (psychrometerResidual(b, t, w, p, mid) < 0.0)
            lo = mid;
        else
            hi = mid;
    }
    return 0.5 * (lo + hi);
}

} // namespace

double lnSatPressure(double tC) { return lnPws(satBranch(tC), tC + kKelvinOffset); }

double satPressure(double tC) { return std::exp(lnSatPressure(tC)); }

double dLnSatPressure(double tC) { return dLnPws(satBranch(tC), tC + kKelvinOffset); }

double minSatPressure() { return kMinSatPressure; }
double maxSatPressure() { return kMaxSatPressure; }
double satPressureAtTriplePoint() { return kSatPressureTriplePoint; }

double satHumidityRatio(double tC, double p) { return humidityRatioFromVapourPressure(satPressure(tC), p); }

double dewPointFromLnVapourPressure(double lnPw)
{
    const int branch = inverseBranch(lnPw);
    const SatCoefficients& c = kSat[branch];
    double T = fittedDewPointKelvin(lnPw, branch);
    T -= (lnPws(c, T) - lnPw) / dLnPws(c, T);
    return std::clamp(T - kKelvinOffset, -100.0, 200.0);
}

double dewPointFromVapourPressure(double pw) { return dewPointFromLnVapourPressure(std::log(pw)); }

double humidityRatioFromWetBulb(double tC, double twbC, double p)
{
    const WetBulbBranch& b = kWetBulbBranch[twbC >= kTriplePointC ? 1 : 0];
    const double ws = satHumidityRatio(twbC, p);
    return ((b.A - b.alpha * twbC) * ws - 1.006 * (tC - twbC)) / (b.A + 1.86 * tC - b.beta * twbC);
}

double wetBulbWaterEnthalpy(double tC)
{
    return tC >= kTriplePointC ? 4186.0 * tC : (-329.0 + 2.1 * tC) * 1000.0;
}

double wetBulb(double t, double w, double p) { return wetBulbWithSatPressure(t, w, p, satPressure(t)); }

double wetBulbWithSatPressure(double t, double w, double p, double pwsT)
{
    // Bracket [lo, hi] on one branch: g <= 0 at and below the dew point on either
    // branch, g >= 0 at the dry bulb (or just under the boiling point where
    // pws(t) >= p, since Ws grows without bound there).
    double hi = t;
    double pwsHi = pwsT;
    if (pwsT >= p) [[unlikely]] {
        hi = dewPointFromVapourPressure(std::min(p, kMaxSatPressure)) - 1e-6;
        pwsHi = satPressure(hi);
    }
    // The fitted dew point (no Newton step) is within 1e-4 K; 1e-3 K below it g
    // is certainly negative.
    const double pw = vapourPressureFromHumidityRatio(w, p);
    double tdp = -100.0;
    if (pw > kMinSatPressure) [[likely]] {
        const double y = approxLog(pw);
        tdp = std::max(fittedDewPointKelvin(y, inverseBranch(y)) - kKelvinOffset - 1e-3, -100.0);
    }
    if (tdp >= hi) [[unlikely]]
        return hi;

    // Branch rule: eq. 33 when its root is at or above the triple point, else eq. 35.
    const WetBulbBranch& liquidBranch = kWetBulbBranch[1];
    const double wsTriple = humidityRatioFromVapourPressure(kSatPressureTriplePoint, p);
    const double gLiquidAtTriple = (liquidBranch.A - liquidBranch.alpha * kTriplePointC) * wsTriple
        - 1.006 * (t - kTriplePointC) - w * (liquidBranch.A + 1.86 * t - liquidBranch.beta * kTriplePointC);
    const bool liquid = hi >= kTriplePointC && (tdp >= kTriplePointC || gLiquidAtTriple <= 0.0);
    const WetBulbBranch& b = kWetBulbBranch[liquid ? 1 : 0];
    // Selections written as conditional expressions so they compile to moves.
    const bool raiseLo = liquid && tdp < kTriplePointC;
    const double lo = raiseLo ? kTriplePointC : tdp;
    const double wsLo = raiseLo ? wsTriple : w; // Ws at the dew point is W
    const double gLo = raiseLo ? gLiquidAtTriple : -(t - tdp) * (1.006 + 1.86 * w);
    const bool lowerHi = !liquid && hi > kTriplePointC;
    hi = lowerHi ? kTriplePointC : hi;
    pwsHi = lowerHi ? kSatPressureTriplePoint : pwsHi;

    // Three cheap estimates from the ends of the bracket: for the convex,
    // increasing g, a Newton step from hi lands above the root and the chord
    // through both ends below it; a Newton step from lo on
    // ln((A - alpha u) Ws) = ln(W b(u) + 1.006 (t - u)), nearly linear for hot,
    // dry air, is clamped between the two.
    const double wsHi = humidityRatioFromVapourPressure(pwsHi, p);
    const double aHi = b.A - b.alpha * hi;
    const double gHi = aHi * wsHi - 1.006 * (t - hi) - w * (b.A + 1.86 * t - b.beta * hi);
    if (gHi <= 0.0) [[unlikely]]
        return hi;
    const double dConst = 1.006 + b.beta * w;
    const double g1Hi = -b.alpha * wsHi + aHi * wsHi * dLnSatPressure(hi) * p / (p - pwsHi) + dConst;
    const double newtonHi = hi - gHi / g1Hi;
    const double upper = newtonHi >= lo && newtonHi <= hi ? newtonHi : hi;
    const double chord = lo - gLo * (hi - lo) / (gHi - gLo);
    const double lower = chord >= lo && chord <= upper ? chord : lo;
    const double aLo = b.A - b.alpha * lo;
    const double rhs = w * (b.A + 1.86 * t - b.beta * lo) + 1.006 * (t - lo);
    const double pwsLo = vapourPressureFromHumidityRatio(wsLo, p);
    const double f = approxLog(aLo * wsLo / rhs);
    const double df = -b.alpha / aLo + dLnSatPressure(lo) * p / (p - pwsLo) + dConst / rhs;
    const double logStep = lo - f / df;
    const double u0 = (logStep == logStep) ? std::clamp(logStep, lower, upper) : 0.5 * (lower + upper);

    const double twb = solveWetBulbBranch(b, t, w, p, lo, hi, u0);
    return std::clamp(twb, -100.0, t);
}

} // namespace detail

namespace {

using namespace detail;

const std::string kTemperatureRange = "-100 .. 200 °C";

double checkedCelsius(AbsoluteTemperature t, const char* quantity)
{
    const double c = toCelsius(t);
    if (!(c >= kMinTemperatureC && c <= kMaxTemperatureC))
        throw InputError(quantity, c, "°C", kTemperatureRange);
    return c;
}

double checkedPressure(Pressure p)
{
    const double v = toPascals(p);
    if (!(v > 0.0 && std::isfinite(v)))
        throw InputError("pressure", v, "Pa", "a finite value above 0 Pa");
    return v;
}

double checkedRelativeHumidity(Ratio rh)
{
    const double v = toFraction(rh);
    if (!(v >= 0.0 && v <= 1.0))
        throw InputError("relative humidity", v * 100.0, "%", "0 .. 100 %");
    return v;
}

double checkedHumidityRatio(HumidityRatio w)
{
    const double v = toKilogramsPerKilogram(w);
    if (!(v >= 0.0 && std::isfinite(v)))
        throw InputError("humidity ratio", v * 1000.0, "g/kg", "0 g/kg and above (finite)");
    return v;
}

// Ws(t) at p, or a message when the saturation pressure reaches p (no saturated
// state exists: the water boils at p).
double checkedSatHumidityRatio(double tC, double pws, double p)
{
    if (!(pws < p))
        throw InputError("pressure", p, "Pa",
                         "above the saturation pressure " + formatFixed(pws, 0) + " Pa at " + formatFixed(tC, 2)
                             + " °C");
    return humidityRatioFromVapourPressure(pws, p);
}

// W within 0 .. Ws(t) (a relative 1e-9 above saturation is taken as saturated and
// clamped); any W >= 0 where pws(t) >= p. Returns the clamped W.
double checkedUnsaturated(double tC, double w, double pws, double p)
{
    if (!(pws < p))
        return w;
    const double ws = humidityRatioFromVapourPressure(pws, p);
    if (w > ws * (1.0 + kSaturationTolerance))
        throw InputError("humidity ratio", w * 1000.0, "g/kg",
                         "0 .. " + formatFixed(ws * 1000.0, 4) + " g/kg (saturation at " + formatFixed(tC, 2)
                             + " °C, " + formatFixed(p, 0) + " Pa)");
    return std::min(w, ws);
}

double checkedDewPointVapourPressure(double pw)
{
    if (!(pw >= kMinSatPressure && pw <= kMaxSatPressure))
        throw InputError("vapour pressure", pw, "Pa",
                         formatNumber(kMinSatPressure) + " .. " + formatNumber(kMaxSatPressure)
                             + " Pa (dew point -100 .. 200 °C)");
    return pw;
}

} // namespace

Pressure saturationPressure(AbsoluteTemperature t)
{
    return pascals(satPressure(checkedCelsius(t, "temperature")));
}

Pressure standardPressureAtAltitude(Length altitude)
{
    const double z = toMetres(altitude);
    if (!(z >= -500.0 && z <= 11000.0))
        throw InputError("altitude", z, "m", "-500 .. 11000 m");
    return pascals(101325.0 * std::pow(1.0 - 2.25577e-5 * z, 5.2559));
}

AbsoluteTemperature standardTemperatureAtAltitude(Length altitude)
{
    const double z = toMetres(altitude);
    if (!(z >= -500.0 && z <= 11000.0))
        throw InputError("altitude", z, "m", "-500 .. 11000 m");
    return celsius(15.0 - 0.0065 * z);
}

HumidityRatio humidityRatioFromVapourPressure(Pressure vapourPressure, Pressure pressure)
{
    const double p = checkedPressure(pressure);
    const double pw = toPascals(vapourPressure);
    if (!(pw >= 0.0 && pw < p))
        throw InputError("vapour pressure", pw, "Pa", "0 .. " + formatNumber(p) + " Pa (below the total pressure)");
    return kilogramsPerKilogram(detail::humidityRatioFromVapourPressure(pw, p));
}

Pressure vapourPressureFromHumidityRatio(HumidityRatio w, Pressure pressure)
{
    const double p = checkedPressure(pressure);
    return pascals(detail::vapourPressureFromHumidityRatio(checkedHumidityRatio(w), p));
}

HumidityRatio saturationHumidityRatio(AbsoluteTemperature t, Pressure pressure)
{
    const double tC = checkedCelsius(t, "temperature");
    const double p = checkedPressure(pressure);
    return kilogramsPerKilogram(checkedSatHumidityRatio(tC, satPressure(tC), p));
}

HumidityRatio humidityRatioFromRelativeHumidity(AbsoluteTemperature t, Ratio rh, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double phi = checkedRelativeHumidity(rh);
    const double p = checkedPressure(pressure);
    const double pw = phi * satPressure(tC);
    if (!(pw < p))
        throw InputError("relative humidity", phi * 100.0, "%",
                         "0 .. " + formatFixed(100.0 * p / satPressure(tC), 2) + " % (vapour pressure below "
                             + formatNumber(p) + " Pa)");
    return kilogramsPerKilogram(detail::humidityRatioFromVapourPressure(pw, p));
}

Ratio relativeHumidityFromHumidityRatio(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double p = checkedPressure(pressure);
    const double pws = satPressure(tC);
    const double wv = checkedUnsaturated(tC, checkedHumidityRatio(w), pws, p);
    return fraction(std::min(1.0, detail::vapourPressureFromHumidityRatio(wv, p) / pws));
}

AbsoluteTemperature dewPointFromVapourPressure(Pressure vapourPressure)
{
    return celsius(detail::dewPointFromVapourPressure(checkedDewPointVapourPressure(toPascals(vapourPressure))));
}

AbsoluteTemperature dewPointFromHumidityRatio(HumidityRatio w, Pressure pressure)
{
    const double p = checkedPressure(pressure);
    const double pw = detail::vapourPressureFromHumidityRatio(checkedHumidityRatio(w), p);
    return celsius(detail::dewPointFromVapourPressure(checkedDewPointVapourPressure(pw)));
}

AbsoluteTemperature wetBulbFromHumidityRatio(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double p = checkedPressure(pressure);
    const double pws = satPressure(tC);
    const double wv = checkedUnsaturated(tC, checkedHumidityRatio(w), pws, p);
    return celsius(wetBulbWithSatPressure(tC, wv, p, pws));
}

AbsoluteTemperature wetBulbFromRelativeHumidity(AbsoluteTemperature t, Ratio rh, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double phi = checkedRelativeHumidity(rh);
    const double p = checkedPressure(pressure);
    const double pws = satPressure(tC);
    const double pw = phi * pws;
    if (!(pw < p))
        throw InputError("relative humidity", phi * 100.0, "%",
                         "0 .. " + formatFixed(100.0 * p / pws, 2) + " % (vapour pressure below " + formatNumber(p)
                             + " Pa)");
    return celsius(wetBulbWithSatPressure(tC, detail::humidityRatioFromVapourPressure(pw, p), p, pws));
}

HumidityRatio humidityRatioFromWetBulb(AbsoluteTemperature t, AbsoluteTemperature wetBulb, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double twb = checkedCelsius(wetBulb, "wet-bulb temperature");
    const double p = checkedPressure(pressure);
    if (twb > tC + kTemperatureTolerance)
        throw InputError("wet-bulb temperature", twb, "°C", "-100 .. " + formatFixed(tC, 2) + " °C (the dry bulb)");
    const double twbC = std::min(twb, tC);
    checkedSatHumidityRatio(twbC, satPressure(twbC), p);
    const double w = detail::humidityRatioFromWetBulb(tC, twbC, p);
    if (!(w >= 0.0)) {
        // Below the wet bulb of perfectly dry air the relation gives W < 0.
        const double lowest = detail::wetBulb(tC, 0.0, p);
        throw InputError("wet-bulb temperature", twb, "°C",
                         formatFixed(lowest, 2) + " .. " + formatFixed(tC, 2) + " °C (dry air .. saturated)");
    }
    return kilogramsPerKilogram(w);
}

SpecificEnthalpy enthalpy(AbsoluteTemperature t, HumidityRatio w)
{
    return joulesPerKilogram(detail::enthalpy(checkedCelsius(t, "dry-bulb temperature"), checkedHumidityRatio(w)));
}

AbsoluteTemperature dryBulbFromEnthalpy(SpecificEnthalpy h, HumidityRatio w)
{
    const double wv = checkedHumidityRatio(w);
    const double hv = toJoulesPerKilogram(h);
    const double t = detail::dryBulbFromEnthalpy(hv, wv);
    if (!(t >= kMinTemperatureC && t <= kMaxTemperatureC))
        throw InputError("enthalpy", hv / 1000.0, "kJ/kg",
                         formatFixed(detail::enthalpy(kMinTemperatureC, wv) / 1000.0, 2) + " .. "
                             + formatFixed(detail::enthalpy(kMaxTemperatureC, wv) / 1000.0, 2)
                             + " kJ/kg (dry bulb -100 .. 200 °C at this humidity ratio)");
    return celsius(t);
}

HumidityRatio humidityRatioFromEnthalpy(AbsoluteTemperature t, SpecificEnthalpy h)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double hv = toJoulesPerKilogram(h);
    const double w = detail::humidityRatioFromEnthalpy(tC, hv);
    if (!(w >= 0.0 && std::isfinite(w)))
        throw InputError("enthalpy", hv / 1000.0, "kJ/kg",
                         formatFixed(detail::enthalpy(tC, 0.0) / 1000.0, 2)
                             + " kJ/kg and above (dry air at this dry bulb)");
    return kilogramsPerKilogram(w);
}

SpecificVolume specificVolume(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double wv = checkedHumidityRatio(w);
    return cubicMetresPerKilogram(detail::specificVolume(tC, wv, checkedPressure(pressure)));
}

Density density(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double wv = checkedHumidityRatio(w);
    return kilogramsPerCubicMetre((1.0 + wv) / detail::specificVolume(tC, wv, checkedPressure(pressure)));
}

Ratio degreeOfSaturation(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double p = checkedPressure(pressure);
    const double pws = satPressure(tC);
    const double ws = checkedSatHumidityRatio(tC, pws, p);
    const double wv = checkedUnsaturated(tC, checkedHumidityRatio(w), pws, p);
    return fraction(wv / ws);
}

SpecificEnthalpy liquidWaterEnthalpy(AbsoluteTemperature t)
{
    return joulesPerKilogram(detail::liquidWaterEnthalpy(checkedCelsius(t, "water temperature")));
}

SpecificEnthalpy waterVapourEnthalpy(AbsoluteTemperature t)
{
    return joulesPerKilogram(detail::waterVapourEnthalpy(checkedCelsius(t, "vapour temperature")));
}

} // namespace Airwright::Core::Psychro
