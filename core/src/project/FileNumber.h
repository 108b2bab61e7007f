#pragma once
// Numbers in a project file are written in the unit named by their key. A value
// goes through a unit conversion on the way out and back, which is not exact in
// floating point (toCelsius(celsius(-12.3)) is -12.300000000000011). So the writer
// looks for the shortest decimal whose conversion back gives the stored value
// bit for bit: the file shows "-12.3" and reads back exactly.

#include "airwright/core/Quantities.h"

#include <nlohmann/json.hpp>

#include <functional>

namespace Airwright::Core::Project {

template <class Q> struct FileUnit {
    Q (*fromFile)(double);
    double (*toFile)(Q);
};

namespace FileUnits {
inline const FileUnit<AbsoluteTemperature> kCelsius{&celsius, &toCelsius};
inline const FileUnit<Pressure> kPascal{&pascals, &toPascals};
inline const FileUnit<VolumeFlow> kCubicMetresPerHour{&cubicMetresPerHour, &toCubicMetresPerHour};
inline const FileUnit<Length> kMillimetre{&millimetres, &toMillimetres};
inline const FileUnit<Length> kMetre{&metres, &toMetres};
inline const FileUnit<Ratio> kPercent{&percent, &toPercent};
inline const FileUnit<Ratio> kFraction{&fraction, &toFraction};
inline const FileUnit<Power> kKilowatt{&kilowatts, &toKilowatts};
inline const FileUnit<Power> kWatt{&watts, &toWatts};
inline const FileUnit<Velocity> kMetresPerSecond{&metresPerSecond, &toMetresPerSecond};
// Humidifier output is rated in kg/h; there is no named conversion for it in core.
inline const FileUnit<MassFlow> kKilogramsPerHour{[](double v) { return kilogramsPerSecond(v / 3600.0); },
                                                  [](MassFlow m) { return toKilogramsPerSecond(m) * 3600.0; }};
} // namespace FileUnits

// The shortest decimal near `approximate` for which readsBack holds; `approximate`
// itself when none is found (only possible for a value that was never entered in
// this unit, and then the round trip is as close as a double allows).
double shortestExactNumber(double approximate, const std::function<bool(double)>& readsBack);

template <class Q> double exactFileNumber(Q stored, const FileUnit<Q>& unit)
{
    return shortestExactNumber(unit.toFile(stored),
                               [&](double candidate) { return unit.fromFile(candidate).value() == stored.value(); });
}

inline double exactFileNumber(double stored)
{
    return shortestExactNumber(stored, [&](double candidate) { return candidate == stored; });
}

// A number as JSON: whole numbers as integers ("250", not "250.0").
nlohmann::ordered_json numberJson(double value);

} // namespace Airwright::Core::Project
