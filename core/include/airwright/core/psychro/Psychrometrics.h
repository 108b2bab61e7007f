#pragma once
// Moist-air properties after ASHRAE Handbook - Fundamentals 2017, chapter 1 (SI).
// Every function validates its inputs and throws InputError naming the quantity,
// the value and the allowed range; none returns NaN.
//
// Allowed ranges: temperature -100 .. 200 C, pressure > 0 (and above the vapour
// pressure involved), relative humidity 0 .. 1, humidity ratio 0 .. saturation.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Psychro {

inline constexpr double kMinTemperatureC = -100.0;
inline constexpr double kMaxTemperatureC = 200.0;

// Saturation vapour pressure: over ice below the triple point (eq. 5), over
// liquid water from it (eq. 6).
Pressure saturationPressure(AbsoluteTemperature t);

// Standard atmosphere (eq. 3 and 4); altitude -500 .. 11000 m.
Pressure standardPressureAtAltitude(Length altitude);
AbsoluteTemperature standardTemperatureAtAltitude(Length altitude);

HumidityRatio humidityRatioFromVapourPressure(Pressure vapourPressure, Pressure pressure); // eq. 20
Pressure vapourPressureFromHumidityRatio(HumidityRatio w, Pressure pressure);
HumidityRatio saturationHumidityRatio(AbsoluteTemperature t, Pressure pressure); // eq. 23

// Relative humidity as a fraction 0..1 (Ratio).
HumidityRatio humidityRatioFromRelativeHumidity(AbsoluteTemperature t, Ratio rh, Pressure pressure);
Ratio relativeHumidityFromHumidityRatio(AbsoluteTemperature t, HumidityRatio w, Pressure pressure);
// Validates a state as relativeHumidityFromHumidityRatio does and returns W, a W
// within the rounding tolerance above saturation clamped to saturation.
HumidityRatio checkedHumidityRatioAt(AbsoluteTemperature t, HumidityRatio w, Pressure pressure);

// Dew point (frost point below the triple point): inverse of saturationPressure.
// The vapour pressure must lie within pws(-100 C) .. pws(200 C): perfectly dry air
// (W = 0) has no dew point in range and gets an InputError.
AbsoluteTemperature dewPointFromVapourPressure(Pressure vapourPressure);
AbsoluteTemperature dewPointFromHumidityRatio(HumidityRatio w, Pressure pressure);

// Wet bulb (eq. 33 for t* at or above the triple point, eq. 35 below it).
// The two equations do not meet at the triple point: eq. 35 gives the higher W
// there, so for dry air a few kelvin above freezing both have a root, 0.1 .. 0.9 K
// apart (e.g. 7.5 C, 14 % RH, 101325 Pa). Rule: eq. 33 whenever it has a root at or
// above the triple point (its W at 0.01 C is not above the given W), else eq. 35.
// PsychroLib's bisection may return either root in that band; see
// docs/psychrometrics.md. Within 1e-6 K of the root (Halley steps, bounded).
AbsoluteTemperature wetBulbFromHumidityRatio(AbsoluteTemperature t, HumidityRatio w, Pressure pressure);
AbsoluteTemperature wetBulbFromRelativeHumidity(AbsoluteTemperature t, Ratio rh, Pressure pressure);
HumidityRatio humidityRatioFromWetBulb(AbsoluteTemperature t, AbsoluteTemperature wetBulb, Pressure pressure);

// Enthalpy per kg dry air (eq. 30) and its inverses.
SpecificEnthalpy enthalpy(AbsoluteTemperature t, HumidityRatio w);
AbsoluteTemperature dryBulbFromEnthalpy(SpecificEnthalpy h, HumidityRatio w);
HumidityRatio humidityRatioFromEnthalpy(AbsoluteTemperature t, SpecificEnthalpy h);

// Specific volume per kg dry air (eq. 26), moist-air density (1 + W) / v, and the
// degree of saturation W / Ws.
SpecificVolume specificVolume(AbsoluteTemperature t, HumidityRatio w, Pressure pressure);
Density density(AbsoluteTemperature t, HumidityRatio w, Pressure pressure);
Ratio degreeOfSaturation(AbsoluteTemperature t, HumidityRatio w, Pressure pressure);

// Specific enthalpy of liquid water (4.186 t kJ/kg) and of water vapour
// (2501 + 1.86 t kJ/kg), both referred to 0 C as in eq. 30.
SpecificEnthalpy liquidWaterEnthalpy(AbsoluteTemperature t);
SpecificEnthalpy waterVapourEnthalpy(AbsoluteTemperature t);

} // namespace Airwright::Core::Psychro
