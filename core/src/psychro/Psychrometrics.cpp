#include "airwright/core/psychro/Psychrometrics.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/psychro/PsychroRaw.h"

#include <algorithm>
#include <array>
#include <bit>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
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

// Fitted 1/T of the dew point, 1/K (Estrin evaluation to keep the dependency chain
// short).
inline double fittedInverseDewPoint(double lnPw, int branch)
{
    const InverseFit& f = kInverse[branch];
    const double s = (lnPw - f.mid) / f.half;
    const double s2 = s * s;
    const double s4 = s2 * s2;
    const double p01 = f.c[0] + f.c[1] * s, p23 = f.c[2] + f.c[3] * s;
    const double p45 = f.c[4] + f.c[5] * s, p67 = f.c[6] + f.c[7] * s;
    return (p01 + p23 * s2) + (p45 + p67 * s2) * s4;
}

// 2^(j/64), j = 0 .. 63, to long-double accuracy at compile time (Taylor series of
// e^(j ln 2 / 64)), then rounded to double.
constexpr std::array<double, 64> exp2Table()
{
    std::array<double, 64> table{};
    for (int j = 0; j < 64; ++j) {
        const long double y = static_cast<long double>(j) * 0.693147180559945309417232121458176568L / 64.0L;
        long double term = 1.0L;
        long double sum = 1.0L;
        for (int n = 1; n < 30; ++n) {
            term *= y / static_cast<long double>(n);
            sum += term;
        }
        table[static_cast<std::size_t>(j)] = static_cast<double>(sum);
    }
    return table;
}
constexpr std::array<double, 64> kExp2Table = exp2Table();

// e^x to within 1.3 ulp for -700 < x < 700 (checked against long double over -12 .. 16),
// inline so that the hot loops pay no call: x = (64 k + j) ln 2 / 64 + r,
// |r| <= ln 2 / 128, e^r by its Taylor polynomial of degree 5 (error 3e-17).
inline double preciseExp(double x)
{
    constexpr double kShift = 6755399441055744.0;         // 1.5 * 2^52: adding it rounds to an integer
    constexpr double kInvStep = 92.332482616893656;       // 64 / ln 2
    constexpr double kStepHi = 0.010830424689629581;      // ln 2 / 64, 31 significant bits: k kStepHi is exact
    constexpr double kStepLo = 6.6195646342560432e-12;    // the rest of ln 2 / 64
    const double kd = x * kInvStep + kShift;
    const std::uint64_t ki = std::bit_cast<std::uint64_t>(kd);
    const double k = kd - kShift;
    const double r = (x - k * kStepHi) - k * kStepLo;
    const double r2 = r * r;
    const double p = r + r2 * ((0.5 + r * (1.0 / 6.0)) + r2 * ((1.0 / 24.0) + r * (1.0 / 120.0)));
    const double scale = std::bit_cast<double>(std::bit_cast<std::uint64_t>(kExp2Table[ki & 63U]) + ((ki >> 6) << 52));
    return scale + scale * p;
}

// ln x for positive normal x to within 2e-15 absolute (checked against long double
// over 1e-3 .. 3e6), inline: x = 2^k m, m in [1, 2); with c the centre of m's
// 1/128 interval, ln x = k ln 2 + ln c + ln(1 + r), r = m / c - 1, |r| < 1/256,
// ln(1 + r) by its Taylor polynomial of degree 6 (error 2e-18). The table holds
// 1/c rounded and -ln of that, to long-double accuracy at compile time.
struct LogTableEntry {
    double inv, lnc;
};
constexpr std::array<LogTableEntry, 128> logTable()
{
    std::array<LogTableEntry, 128> table{};
    for (int j = 0; j < 128; ++j) {
        const double inv = 1.0 / (1.0 + (j + 0.5) / 128.0);
        const long double y = 1.0L / static_cast<long double>(inv);
        const long double z = (y - 1.0L) / (y + 1.0L); // ln y = 2 atanh z, z < 1/3
        const long double z2 = z * z;
        long double term = z;
        long double sum = 0.0L;
        for (int n = 0; n < 40; ++n) {
            sum += term / static_cast<long double>(2 * n + 1);
            term *= z2;
        }
        table[static_cast<std::size_t>(j)] = {inv, static_cast<double>(2.0L * sum)};
    }
    return table;
}
constexpr std::array<LogTableEntry, 128> kLogTable = logTable();

inline double preciseLog(double x)
{
    constexpr double kLn2Hi = 0.69314718055989033;    // 42 significant bits: k kLn2Hi is exact
    constexpr double kLn2Lo = 5.4979241645436439e-14; // the rest of ln 2
    const std::uint64_t ix = std::bit_cast<std::uint64_t>(x);
    const auto k = static_cast<double>(static_cast<std::int64_t>(ix >> 52) - 1023);
    const LogTableEntry& e = kLogTable[(ix >> 45) & 127U];
    const double m = std::bit_cast<double>((ix & 0x000fffffffffffffULL) | 0x3ff0000000000000ULL);
    const double r = m * e.inv - 1.0;
    const double r2 = r * r;
    const double p = r2 * ((-0.5 + r * (1.0 / 3.0)) + r2 * ((-0.25 + r * 0.2) + r2 * (-1.0 / 6.0)));
    return (k * kLn2Hi + e.lnc) + (r + (p + k * kLn2Lo));
}

// Derivatives of ln pws (eq. 5 / 6) with respect to temperature, from T and r = 1/T,
// with the coefficients multiplied out once per branch.
struct LnPwsDerivatives {
    double d1, d2, d3, d4;
};
struct DerivativeCoefficients {
    double a1, b0, b1, b2, b3; // d1 = a1 r^2 + b0 + T (b1 + T (b2 + T b3)) + kln r
    double a2, e0, e1, e2, m2; // d2 = a2 r^3 + e0 + T (e1 + T e2) + m2 r^2
    double a3, g0, g1, m3;     // d3 = a3 r^4 + g0 + T g1 + m3 r^3
    double a4, h0, m4;         // d4 = a4 r^5 + h0 + m4 r^4
    double kln;
};
constexpr DerivativeCoefficients derivativeCoefficients(const SatCoefficients& c)
{
    return {-c.k1,       c.c1,        2.0 * c.c2,   3.0 * c.c3,  4.0 * c.c4, 2.0 * c.k1,  2.0 * c.c2,
            6.0 * c.c3,  12.0 * c.c4, -c.kln,       -6.0 * c.k1, 6.0 * c.c3, 24.0 * c.c4, 2.0 * c.kln,
            24.0 * c.k1, 24.0 * c.c4, -6.0 * c.kln, c.kln};
}
constexpr DerivativeCoefficients kDerivative[2] = {derivativeCoefficients(kSat[0]), derivativeCoefficients(kSat[1])};

inline LnPwsDerivatives lnPwsDerivatives(const DerivativeCoefficients& c, double T, double r)
{
    const double r2 = r * r;
    const double r3 = r2 * r;
    const double r4 = r2 * r2;
    return {c.a1 * r2 + c.b0 + T * (c.b1 + T * (c.b2 + T * c.b3)) + c.kln * r,
            c.a2 * r3 + c.e0 + T * (c.e1 + T * c.e2) + c.m2 * r2, c.a3 * r4 + c.g0 + T * c.g1 + c.m3 * r3,
            c.a4 * r4 * r + c.h0 + c.m4 * r4};
}

// The psychrometer relation of eq. 33 / eq. 35 multiplied out by (p - pws(u)) / 0.621945:
//   f(u) = pws(u) c(u) - p Q(u),
//   Q(u) = (W (A + 1.86 t - beta u) + 1.006 (t - u)) / 0.621945,  c(u) = A - alpha u + Q(u),
// increasing in u, zero at the wet bulb; c and Q are linear in u, so every derivative
// of f comes from those of ln pws. Index 0: eq. 35 (A 2830, alpha 0.24, beta 2.1);
// index 1: eq. 33 (A 2501, alpha 2.326, beta 4.186).
struct WetBulbBranch {
    double A, alpha, beta;
};
constexpr WetBulbBranch kWetBulbBranch[2] = {{2830.0, 0.24, 2.1}, {2501.0, 2.326, 4.186}};

// The moisture as the caller has it, as a pair (m, s) with f scaled by s > 0: the
// humidity ratio (W, 1), or the vapour pressure as x = pw / p, (0.621945 x, 1 - x),
// since W (1 - x) = 0.621945 x. The second form needs no division.
struct Moisture {
    double m, s;
};
inline Moisture moistureFromHumidityRatio(double w) { return {w, 1.0}; }
inline Moisture moistureFromVapourFraction(double x) { return {kMolarMassRatio * x, 1.0 - x}; }

// f (scaled by s) on one branch: Q(u) = q0 - k u, c(u) = c0 - kc u.
struct WetBulbRelation {
    const SatCoefficients* sat;
    const DerivativeCoefficients* derivative;
    double p, q0, k, c0, kc;
};
inline WetBulbRelation wetBulbRelation(int branch, double t, Moisture m, double p)
{
    const WetBulbBranch& b = kWetBulbBranch[branch];
    constexpr double kInvMolarMassRatio = 1.0 / kMolarMassRatio;
    const double q0 = (m.m * (b.A + 1.86 * t) + 1.006 * m.s * t) * kInvMolarMassRatio;
    const double k = (m.m * b.beta + 1.006 * m.s) * kInvMolarMassRatio;
    return {&kSat[branch], &kDerivative[branch], p, q0, k, b.A * m.s + q0, b.alpha * m.s + k};
}

inline double psychrometerResidual(const WetBulbRelation& r, double u)
{
    return std::exp(lnPws(*r.sat, u + kKelvinOffset)) * (r.c0 - r.kc * u) - r.p * (r.q0 - r.k * u);
}

// f at the triple point on eq. 33, for the branch rule.
inline double liquidResidualAtTriplePoint(const WetBulbRelation& liquid)
{
    return kSatPressureTriplePoint * (liquid.c0 - liquid.kc * kTriplePointC)
        - liquid.p * (liquid.q0 - liquid.k * kTriplePointC);
}

// One Householder step of order 4 on f at u (std::log and std::exp), with f itself for
// bracketing: u + 4 (1/f)''' / (1/f)'''', multiplied out. The error after a step s is
// about C s^5 with C below 1e-7 / K^4 over -100 .. 200 C.
struct SolverStep {
    double f, step, errorScale; // errorScale: see kHalleyAcceptance (logHalleyStep only)
};
SolverStep householderStep(const WetBulbRelation& r, double u)
{
    const SatCoefficients& c = *r.sat;
    const double T = u + kKelvinOffset;
    const double invT = 1.0 / T;
    const double P = std::exp(c.k1 * invT + c.k0 + T * (c.c1 + T * (c.c2 + T * (c.c3 + T * c.c4)))
                              + c.kln * std::log(T));
    const LnPwsDerivatives d = lnPwsDerivatives(*r.derivative, T, invT);
    // pws^(n) / pws from the derivatives of ln pws.
    const double e1 = d.d1;
    const double e2 = d.d1 * d.d1 + d.d2;
    const double e3 = d.d1 * (e2 + 2.0 * d.d2) + d.d3;
    const double e4 = d.d1 * (e3 + 3.0 * d.d1 * d.d2 + 3.0 * d.d3) + 3.0 * d.d2 * d.d2 + d.d4;
    const double cu = r.c0 - r.kc * u;
    const double f = P * cu - r.p * (r.q0 - r.k * u);
    const double f1 = P * (cu * e1 - r.kc) + r.p * r.k;
    const double f2 = P * (cu * e2 - 2.0 * r.kc * e1);
    const double f3 = P * (cu * e3 - 3.0 * r.kc * e2);
    const double f4 = P * (cu * e4 - 4.0 * r.kc * e3);
    const double ff = f * f;
    const double f11 = f1 * f1;
    const double n3 = f1 * (6.0 * f * f2 - 6.0 * f11) - ff * f3;
    const double n4 = f11 * (24.0 * f11 - 36.0 * f * f2) + ff * (6.0 * f2 * f2 + 8.0 * f1 * f3 - f * f4);
    return {f, 4.0 * f * n3 / n4, 0.0};
}
constexpr double kOrder4StepTolerance = 0.5; // leaves below 4e-9 K

// Safeguarded solve of f = 0 in [lo, hi] (f(lo) <= 0 <= f(hi)) from u: at most 12
// order-4 steps, each kept inside the shrinking bracket (bisection otherwise), then
// bisection to 1e-10 K: bounded, always an answer.
double solveWetBulbBracketed(const WetBulbRelation& r, double lo, double hi, double u)
{
    u = (u >= lo && u <= hi) ? u : 0.5 * (lo + hi); // also catches a NaN guess
    for (int i = 0; i < 12; ++i) {
        const SolverStep s = householderStep(r, u);
        if (!(s.f == s.f && s.step == s.step)) {
            u = 0.5 * (lo + hi);
            continue;
        }
        if (s.f < 0.0)
            lo = u;
        else if (s.f > 0.0)
            hi = u;
        else
            return u;
        const double next = u + s.step;
        if (std::abs(s.step) <= kOrder4StepTolerance && next >= lo && next <= hi)
            return next;
        u = (next > lo && next < hi) ? next : 0.5 * (lo + hi);
    }
    for (int i = 0; i < 64 && hi - lo > 1e-10; ++i) {
        const double mid = 0.5 * (lo + hi);
        if (psychrometerResidual(r, mid) < 0.0)
            lo = mid;
        else
            hi = mid;
    }
    return 0.5 * (lo + hi);
}

// Wet-bulb depression x = hi - u (first guess) from a model of f around hi: ln pws by
// its Taylor polynomial of degree 4 in x, the exact linear c and Q. From the tangent
// of f at hi, x0 = N / D (below the root), one step of order 4 (the inverse series to
// the cube of the Newton step) on the logarithm of both sides,
// F(x) = ln(pws c / (p Q)), nearly linear for hot, dry air. Written so that the
// logarithms and divisions run side by side. Within 0.021 K of the root over
// -30 .. 50 C, 5 .. 100 % RH, 80 .. 105 kPa, 0.17 K over -40 .. 60 C, 1 .. 100 % RH,
// 60 .. 110 kPa.
inline double modelDepression(const WetBulbRelation& r, double hi, double lnPHi, double pHi,
                              const LnPwsDerivatives& d, double invP)
{
    const double qHi = r.q0 - r.k * hi;
    const double cHi = r.c0 - r.kc * hi;
    const double N = pHi * cHi - r.p * qHi;
    const double D = pHi * (d.d1 * cHi - r.kc) + r.p * r.k;
    const double qD = qHi * D + r.k * N; // Q(hi - x0) D
    const double x = N / D;
    const double iq = r.k * D / qD;      // k / Q
    const double kcOverC = r.kc / cHi;
    const double v = kcOverC * x;
    const double ic = kcOverC * (1.0 - v + v * v); // kc / c
    const double x2 = x * x;
    const double a4 = d.d4 * (1.0 / 24.0);
    const double E = x * (-d.d1 + x * 0.5 * d.d2) + x2 * x * (d.d3 * (-1.0 / 6.0) + x * a4);
    const double E1 = (-d.d1 + x * d.d2) + x2 * (-0.5 * d.d3 + x * (4.0 * a4));
    const double E2 = (d.d2 - x * d.d3) + x2 * 0.5 * d.d4;
    const double E3 = -d.d3 + x * d.d4;
    const double F = lnPHi + (preciseLog(cHi * D * invP) - preciseLog(qD)) + E
        + v * (1.0 + v * (-0.5 + v * (1.0 / 3.0)));
    const double F1 = E1 + ic - iq;
    const double F2 = E2 - ic * ic + iq * iq;
    const double F3 = E3 + 2.0 * (ic * ic * ic - iq * iq * iq);
    const double invF1 = 1.0 / F1; // ready before F
    const double c2 = -0.5 * F2 * invF1;
    const double c3 = 2.0 * c2 * c2 - F3 * invF1 * (1.0 / 6.0);
    const double n = -F * invF1;
    return x + n * (1.0 + n * (c2 + n * c3));
}

// ln(T - x) from ln T: ln T - 2 atanh(z), z = x / (2 T - x), by the series to z^13
// (error below 5e-15 for z <= 0.125, about 50 K below room temperature).
inline double lnTemperatureBelow(double T, double lnT, double x)
{
    const double z = x / (2.0 * T - x);
    if (!(z <= 0.125)) [[unlikely]]
        return std::log(T - x);
    const double z2 = z * z;
    const double z4 = z2 * z2;
    const double z8 = z4 * z4;
    const double s = (1.0 + z2 * (1.0 / 3.0)) + z4 * ((1.0 / 5.0) + z2 * (1.0 / 7.0))
        + z8 * (((1.0 / 9.0) + z2 * (1.0 / 11.0)) + z4 * (1.0 / 13.0));
    return lnT - 2.0 * z * s;
}

// One Halley step on F(u) = ln(pws(u) c(u) / (p Q(u))), which has f's root and needs
// no exponential: F and F' exact (eq. 5 / 6 from T = u + 273.15, 1/T and ln T; ln c and
// ln Q by preciseLog; ln p given), F'' from d2, the second derivative of ln pws at u,
// which only corrects the step and may be approximate. With F for bracketing.
inline SolverStep logHalleyStep(const WetBulbRelation& r, double u, double T, double invT, double lnT, double lnP,
                                double d2)
{
    const SatCoefficients& c = *r.sat;
    const DerivativeCoefficients& dc = *r.derivative;
    const double T2 = T * T;
    const double L = (c.k1 * invT + c.k0) + T * (c.c1 + T * c.c2) + T2 * T * (c.c3 + T * c.c4) + c.kln * lnT;
    const double d1 = dc.a1 * invT * invT + dc.b0 + T * dc.b1 + T2 * (dc.b2 + T * dc.b3) + dc.kln * invT;
    const double cu = r.c0 - r.kc * u;
    const double qu = r.q0 - r.k * u;
    const double a = r.kc / cu;
    const double b = r.k / qu;
    const double F = L + (preciseLog(cu) - lnP) - preciseLog(qu);
    const double F1 = d1 - a + b;
    const double F2 = d2 - a * a + b * b;
    const double step = -2.0 * F * F1 / (2.0 * F1 * F1 - F * F2);
    return {F, step, step * step * step * (2e-4 + b * b)};
}

// After a Halley step s on F the error is below 0.14 |s|^3 (2e-4 / K^2 + (k/Q)^2)
// for |s| up to 10 mK (checked over -100 .. 200 C, 0 .. 100 % RH, 20 .. 110 kPa from
// guesses 3 and 10 mK off); the second term is ln Q's curvature, large for cold, dry
// air (small Q), where the model's guess is closest. The approximate F'' adds about
// 0.04 e s^2 for a relative error e in it, so the step must also stay small. Accepted:
// |s| <= 10 mK and the bound below 1.4e-9 K.
constexpr double kHalleyStepTolerance = 0.01;
constexpr double kHalleyAcceptance = 1e-8; // bound on |s|^3 (2e-4 + (k/Q)^2)

constexpr double kTriplePointK = kTriplePointC + kKelvinOffset;
const double kLnTriplePointK = std::log(kTriplePointK);

// eq. 5 / 6 at the bracket's upper end hi.
struct UpperEnd {
    double hi, T, invT, lnT, lnP, P;
};

// The solve on one branch below hi, bracketed below by lowest (the triple point on
// eq. 33, -100 C on eq. 35): the model's guess, one exact Halley step, and the
// safeguarded solve if that step was not small.
inline double wetBulbBelow(const WetBulbRelation& r, const UpperEnd& e, double lowest, double invP, double lnP,
                           Moisture m)
{
    const double hi = e.hi;
    if (e.P * (r.c0 - r.kc * hi) <= r.p * (r.q0 - r.k * hi)) [[unlikely]]
        return hi; // saturated: f(hi) <= 0

    const LnPwsDerivatives d = lnPwsDerivatives(*r.derivative, e.T, e.invT);
    const double xModel = modelDepression(r, hi, e.lnP, e.P, d, invP);
    const double xTop = hi - lowest;
    const double xPositive = xModel > 0.0 ? xModel : 0.0; // maxsd and minsd, no jumps
    const double x = xPositive < xTop ? xPositive : xTop;
    const double u0 = hi - x;
    const double T0 = e.T - x;
    // ln pws'' at u0 from its Taylor polynomial at hi: close enough for F''.
    const double d2 = d.d2 + x * (-d.d3 + x * 0.5 * d.d4);
    const SolverStep s = logHalleyStep(r, u0, T0, 1.0 / T0, lnTemperatureBelow(e.T, e.lnT, x), lnP, d2);
    const double u1 = u0 + s.step;
    if (std::abs(s.step) <= kHalleyStepTolerance && std::abs(s.errorScale) <= kHalleyAcceptance && u1 >= lowest
        && u1 <= hi) [[likely]]
        return u1;

    // Rare (far outside the usual range): the safeguarded solve, bracketed below by
    // the dew point on eq. 35 (f <= 0 there).
    double lo = lowest;
    const double pw = r.p * m.m / (kMolarMassRatio * m.s + m.m);
    if (lowest < kTriplePointC && pw > kMinSatPressure) {
        const double y = std::log(pw);
        lo = std::max(1.0 / fittedInverseDewPoint(y, inverseBranch(y)) - kKelvinOffset - 1e-3, kMinTemperatureC);
    }
    return solveWetBulbBracketed(r, std::min(lo, hi), hi, u1);
}

// Eq. 35 for a dry bulb above the triple point (dry air a few kelvin above
// freezing): the upper end is the triple point.
[[gnu::noinline]] double wetBulbIceBelowTriplePoint(double t, Moisture m, double p, double invP)
{
    static const UpperEnd kTriple = {kTriplePointC,   kTriplePointK,     1.0 / kTriplePointK,
                                     kLnTriplePointK, kLnPwsTriplePoint, kSatPressureTriplePoint};
    return wetBulbBelow(wetBulbRelation(0, t, m, p), kTriple, kMinTemperatureC, invP, preciseLog(p), m);
}

// The solve where the water boils at p (pws(t) >= p): Ws is unbounded there, so the
// bracket ends just below the boiling point. Rare; bracketed throughout.
[[gnu::noinline]] double wetBulbNearBoiling(double t, Moisture m, double p)
{
    const double top = std::min(t, dewPointFromVapourPressure(std::min(p, kMaxSatPressure)) - 1e-6);
    const bool liquid = top >= kTriplePointC && liquidResidualAtTriplePoint(wetBulbRelation(1, t, m, p)) <= 0.0;
    const WetBulbRelation r = wetBulbRelation(liquid ? 1 : 0, t, m, p);
    const double hi = liquid ? top : std::min(top, kTriplePointC);
    if (psychrometerResidual(r, hi) <= 0.0)
        return hi;
    double lo = liquid ? kTriplePointC : kMinTemperatureC;
    const double pw = p * m.m / (kMolarMassRatio * m.s + m.m);
    if (!liquid && pw > kMinSatPressure) {
        const double y = std::log(pw);
        lo = std::max(1.0 / fittedInverseDewPoint(y, inverseBranch(y)) - kKelvinOffset - 1e-3, kMinTemperatureC);
    }
    return solveWetBulbBracketed(r, std::min(lo, hi), hi, hi);
}

// Eq. 5 / 6 at the dry bulb with the pieces the wet-bulb solve reuses.
struct DryBulbSaturation {
    double T, invT, lnT, lnPws, pws;
};
inline DryBulbSaturation dryBulbSaturation(double tC)
{
    const SatCoefficients& c = satBranch(tC);
    const double T = tC + kKelvinOffset;
    const double invT = 1.0 / T;
    const double lnT = preciseLog(T);
    const double L = c.k1 * invT + c.k0 + T * (c.c1 + T * (c.c2 + T * (c.c3 + T * c.c4))) + c.kln * lnT;
    return {T, invT, lnT, L, preciseExp(L)};
}

// The wet bulb by the branch rule (see wetBulb in PsychroRaw.h), given eq. 5 / 6 at t
// and 1 / p. Branch rule: eq. 33 when its root is at or above the triple point (its
// f at 0.01 C not above 0), else eq. 35. The bracket's upper end is the dry bulb, or
// the triple point on eq. 35 when the dry bulb is above it; its lower end is the
// triple point on eq. 33 and the dew point on eq. 35. The one jump that follows the
// data, on the sign of t, depends on an input only and settles at once.
double wetBulbFromSaturation(double t, Moisture m, double p, double invP, const DryBulbSaturation& sat)
{
    if (!(sat.pws < p)) [[unlikely]]
        return wetBulbNearBoiling(t, m, p);
    const UpperEnd atT = {t, sat.T, sat.invT, sat.lnT, sat.lnPws, sat.pws};
    const double lnP = preciseLog(p);
    if (t >= kTriplePointC) {
        const WetBulbRelation liquid = wetBulbRelation(1, t, m, p);
        if (liquidResidualAtTriplePoint(liquid) <= 0.0) [[likely]]
            return wetBulbBelow(liquid, atT, kTriplePointC, invP, lnP, m);
        return wetBulbIceBelowTriplePoint(t, m, p, invP);
    }
    return wetBulbBelow(wetBulbRelation(0, t, m, p), atT, kMinTemperatureC, invP, lnP, m);
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
    // The fit gives 1/T; one Newton step on ln pws(T) = ln pw then needs a single
    // division (T itself), and ln T = -ln(1/T) starts at once.
    const int branch = inverseBranch(lnPw);
    const SatCoefficients& c = kSat[branch];
    const DerivativeCoefficients& dc = kDerivative[branch];
    const double r = fittedInverseDewPoint(lnPw, branch);
    const double T = 1.0 / r;
    const double lnT = -preciseLog(r);
    const double T2 = T * T;
    const double L = (c.k1 * r + c.k0) + T * (c.c1 + T * c.c2) + T2 * T * (c.c3 + T * c.c4) + c.kln * lnT;
    const double d1 = dc.a1 * r * r + dc.b0 + T * dc.b1 + T2 * (dc.b2 + T * dc.b3) + dc.kln * r;
    return std::clamp(T - (L - lnPw) / d1 - kKelvinOffset, -100.0, 200.0);
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

double wetBulb(double t, double w, double p)
{
    return wetBulbFromSaturation(t, moistureFromHumidityRatio(w), p, 1.0 / p, dryBulbSaturation(t));
}

double wetBulbWithSatPressure(double t, double w, double p, double /*pwsT*/) { return wetBulb(t, w, p); }

} // namespace detail

namespace {

using namespace detail;

// The checks are inline and cheap; building a message is out of line and cold, so
// the hot paths stay small.
[[noreturn, gnu::cold, gnu::noinline]] void throwOutOfRange(const char* quantity, double value, const char* unit,
                                                            const std::string& range)
{
    throw InputError(quantity, value, unit, range);
}

inline double checkedCelsius(AbsoluteTemperature t, const char* quantity)
{
    const double c = toCelsius(t);
    if (!(c >= kMinTemperatureC && c <= kMaxTemperatureC)) [[unlikely]]
        throwOutOfRange(quantity, c, "°C", "-100 .. 200 °C");
    return c;
}

inline double checkedPressure(Pressure p)
{
    const double v = toPascals(p);
    if (!(v > 0.0 && v <= std::numeric_limits<double>::max())) [[unlikely]]
        throwOutOfRange("pressure", v, "Pa", "a finite value above 0 Pa");
    return v;
}

inline double checkedRelativeHumidity(Ratio rh)
{
    const double v = toFraction(rh);
    if (!(v >= 0.0 && v <= 1.0)) [[unlikely]]
        throwOutOfRange("relative humidity", v * 100.0, "%", "0 .. 100 %");
    return v;
}

inline double checkedHumidityRatio(HumidityRatio w)
{
    const double v = toKilogramsPerKilogram(w);
    if (!(v >= 0.0 && v <= std::numeric_limits<double>::max())) [[unlikely]]
        throwOutOfRange("humidity ratio", v * 1000.0, "g/kg", "0 g/kg and above (finite)");
    return v;
}

// The vapour pressure phi pws(t) reaches p: no such state (the water boils at p).
[[noreturn, gnu::cold, gnu::noinline]] void throwRelativeHumidityAboveBoiling(double phi, double p, double pws)
{
    throwOutOfRange("relative humidity", phi * 100.0, "%",
                    "0 .. " + formatFixed(100.0 * p / pws, 2) + " % (vapour pressure below " + formatNumber(p)
                        + " Pa)");
}

[[noreturn, gnu::cold, gnu::noinline]] void throwBoilingPressure(double tC, double pws, double p)
{
    throwOutOfRange("pressure", p, "Pa",
                    "above the saturation pressure " + formatFixed(pws, 0) + " Pa at " + formatFixed(tC, 2) + " °C");
}

[[noreturn, gnu::cold, gnu::noinline]] void throwAboveSaturation(double tC, double w, double ws, double p)
{
    throwOutOfRange("humidity ratio", w * 1000.0, "g/kg",
                    "0 .. " + formatFixed(ws * 1000.0, 4) + " g/kg (saturation at " + formatFixed(tC, 2) + " °C, "
                        + formatFixed(p, 0) + " Pa)");
}

[[noreturn, gnu::cold, gnu::noinline]] void throwDewPointVapourPressure(double pw)
{
    throwOutOfRange("vapour pressure", pw, "Pa",
                    formatNumber(kMinSatPressure) + " .. " + formatNumber(kMaxSatPressure)
                        + " Pa (dew point -100 .. 200 °C)");
}

// Ws(t) at p, or a message when the saturation pressure reaches p (no saturated
// state exists: the water boils at p).
inline double checkedSatHumidityRatio(double tC, double pws, double p)
{
    if (!(pws < p)) [[unlikely]]
        throwBoilingPressure(tC, pws, p);
    return humidityRatioFromVapourPressure(pws, p);
}

// W within 0 .. Ws(t) (a relative 1e-9 above saturation is taken as saturated and
// clamped); any W >= 0 where pws(t) >= p. Returns the clamped W.
inline double checkedUnsaturated(double tC, double w, double pws, double p)
{
    if (!(pws < p)) [[unlikely]]
        return w;
    const double ws = humidityRatioFromVapourPressure(pws, p);
    if (w > ws * (1.0 + kSaturationTolerance)) [[unlikely]]
        throwAboveSaturation(tC, w, ws, p);
    return std::min(w, ws);
}

inline double checkedDewPointVapourPressure(double pw)
{
    if (!(pw >= kMinSatPressure && pw <= kMaxSatPressure)) [[unlikely]]
        throwDewPointVapourPressure(pw);
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
    const double pws = satPressure(tC);
    const double pw = phi * pws;
    if (!(pw < p)) [[unlikely]]
        throwRelativeHumidityAboveBoiling(phi, p, pws);
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

HumidityRatio checkedHumidityRatioAt(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double p = checkedPressure(pressure);
    return kilogramsPerKilogram(checkedUnsaturated(tC, checkedHumidityRatio(w), satPressure(tC), p));
}

Ratio detail::relativeHumidityOf(const MoistAirState& state)
{
    // As relativeHumidityFromHumidityRatio: W is at most Ws (the factories clamp
    // it), and above the boiling point pw / pws < 1 anyway.
    const double pws = satPressure(toCelsius(state.dryBulb()));
    const double pw = detail::vapourPressureFromHumidityRatio(state.humidityRatio().value(), state.pressure().value());
    return fraction(std::min(1.0, pw / pws));
}

MoistAirState detail::stateBelowSaturation(AbsoluteTemperature tdb, HumidityRatio w, Pressure p)
{
    checkedCelsius(tdb, "dry-bulb temperature");
    checkedPressure(p);
    checkedHumidityRatio(w);
    return MoistAirState(tdb, w, p);
}

AbsoluteTemperature dewPointFromVapourPressure(Pressure vapourPressure)
{
    return celsius(detail::dewPointFromVapourPressure(checkedDewPointVapourPressure(toPascals(vapourPressure))));
}

AbsoluteTemperature dewPointFromHumidityRatio(HumidityRatio w, Pressure pressure)
{
    const double p = checkedPressure(pressure);
    const double pw = detail::vapourPressureFromHumidityRatio(checkedHumidityRatio(w), p);
    return celsius(detail::dewPointFromLnVapourPressure(preciseLog(checkedDewPointVapourPressure(pw))));
}

AbsoluteTemperature wetBulbFromHumidityRatio(AbsoluteTemperature t, HumidityRatio w, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double p = checkedPressure(pressure);
    const DryBulbSaturation sat = dryBulbSaturation(tC);
    const double wv = checkedUnsaturated(tC, checkedHumidityRatio(w), sat.pws, p);
    return celsius(wetBulbFromSaturation(tC, moistureFromHumidityRatio(wv), p, 1.0 / p, sat));
}

AbsoluteTemperature wetBulbFromRelativeHumidity(AbsoluteTemperature t, Ratio rh, Pressure pressure)
{
    const double tC = checkedCelsius(t, "dry-bulb temperature");
    const double phi = checkedRelativeHumidity(rh);
    const double p = checkedPressure(pressure);
    const DryBulbSaturation sat = dryBulbSaturation(tC);
    // The vapour pressure as a fraction of p: no humidity ratio (and no division) needed.
    const double invP = 1.0 / p;
    const double x = phi * sat.pws * invP;
    if (!(x < 1.0)) [[unlikely]]
        throwRelativeHumidityAboveBoiling(phi, p, sat.pws);
    return celsius(wetBulbFromSaturation(tC, moistureFromVapourFraction(x), p, invP, sat));
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
    if (!(w >= 0.0)) [[unlikely]] {
        // Below the wet bulb of perfectly dry air the relation gives W < 0. Within
        // 1e-9 K of it (the tolerance of the other temperature comparisons, so that
        // the solver's own wet bulb of dry air reads back) it is dry air.
        const double lowest = detail::wetBulb(tC, 0.0, p);
        if (twbC >= lowest - kTemperatureTolerance)
            return kilogramsPerKilogram(0.0);
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
