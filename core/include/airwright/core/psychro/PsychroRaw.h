#pragma once
// Raw-double kernels behind Psychrometrics.h, for hot loops (annual runs, grids,
// the wet-bulb and clamp solvers). Units are fixed: temperature in degC, pressure
// in Pa, humidity ratio in kg/kg, enthalpy in J/kg dry air. Nothing here
// validates: callers pass values inside the ranges Psychrometrics.h checks, and
// the public functions there are the way in from anywhere else.

namespace Airwright::Core::Psychro::detail {

inline constexpr double kTriplePointC = 0.01;  // branch of eq. 5 / eq. 6 and of eq. 33 / eq. 35
inline constexpr double kMolarMassRatio = 0.621945; // eq. 20
inline constexpr double kDryAirGasConstant = 287.042; // J/(kg K), eq. 26
inline constexpr double kVolumeFactor = 1.607858;     // eq. 26
// A humidity ratio up to this relative amount above saturation counts as saturated
// (rounding in a caller's own arithmetic); more is rejected or clamped as fog.
inline constexpr double kSaturationTolerance = 1e-9;
// A wet bulb or dew point this far above the dry bulb still counts as equal.
inline constexpr double kTemperatureTolerance = 1e-9;

// ln pws and its first two temperature derivatives, eq. 5 at or below the triple
// point, eq. 6 above it (the same split as PsychroLib 2.5.0).
double lnSatPressure(double tC);
double satPressure(double tC);
double dLnSatPressure(double tC);

// Bounds of eq. 5 / eq. 6: pws(-100 C) and pws(200 C).
double minSatPressure();
double maxSatPressure();
double satPressureAtTriplePoint();

inline double humidityRatioFromVapourPressure(double pw, double p) { return kMolarMassRatio * pw / (p - pw); }
inline double vapourPressureFromHumidityRatio(double w, double p) { return p * w / (kMolarMassRatio + w); }
double satHumidityRatio(double tC, double p);

// Inverse of satPressure: a fitted 1/T then one Newton step on ln pws; within 1e-10 K
// of the exact root. Precondition: minSatPressure() <= pw <= maxSatPressure().
double dewPointFromVapourPressure(double pw);
double dewPointFromLnVapourPressure(double lnPw);

// Wet bulb by the branch rule of Psychrometrics.h: eq. 33 when it has a root at or
// above the triple point, otherwise eq. 35. Within 1e-8 K of the exact root (a model's
// guess, one Halley step, a safeguarded solve when that step is not small; see
// docs/psychrometrics.md). Precondition: t in range, 0 <= w <= Ws(t) (any w >= 0 when
// pws(t) >= p).
double wetBulb(double tC, double w, double p);
// Kept for existing callers: the same as wetBulb (pws(tC) is recomputed together with
// the pieces the solve reuses, so passing it saves nothing any more).
double wetBulbWithSatPressure(double tC, double w, double p, double pwsT);
// Eq. 33 (twb >= triple point) or eq. 35; may be negative for a too low twb.
double humidityRatioFromWetBulb(double tC, double twbC, double p);

// Enthalpy of the liquid (or, below the triple point, solid) water that sets the
// wet-bulb equations: 4186 t above, the ice enthalpy implied by eq. 35
// ((-329 + 2.1 t) kJ/kg) below. J/kg.
double wetBulbWaterEnthalpy(double tC);

inline double enthalpy(double tC, double w) { return 1006.0 * tC + w * (2501000.0 + 1860.0 * tC); }
inline double dryBulbFromEnthalpy(double h, double w) { return (h - 2501000.0 * w) / (1006.0 + 1860.0 * w); }
inline double humidityRatioFromEnthalpy(double tC, double h) { return (h - 1006.0 * tC) / (2501000.0 + 1860.0 * tC); }
inline double specificVolume(double tC, double w, double p)
{
    return kDryAirGasConstant * (tC + 273.15) * (1.0 + kVolumeFactor * w) / p;
}
inline double liquidWaterEnthalpy(double tC) { return 4186.0 * tC; }
inline double waterVapourEnthalpy(double tC) { return 2501000.0 + 1860.0 * tC; }

} // namespace Airwright::Core::Psychro::detail
