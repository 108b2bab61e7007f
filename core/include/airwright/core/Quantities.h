#pragma once
// The one header of named quantity types for core's public API.
//
// Everything crossing a public core function is a Boost.Units quantity in SI.
// Absolute temperature and temperature difference are distinct types: adding two
// absolute temperatures does not compile, subtracting them gives a difference.
// Raw doubles appear only in hot loops and at I/O, through the named conversions
// at the end of this file, so a unit (degC vs K, Pa vs kPa, g/kg vs kg/kg) is
// always spelled out where a number enters or leaves.

#include <boost/units/absolute.hpp>
#include <boost/units/cmath.hpp>
#include <boost/units/quantity.hpp>
#include <boost/units/systems/si/area.hpp>
#include <boost/units/systems/si/current.hpp>
#include <boost/units/systems/si/dimensionless.hpp>
#include <boost/units/systems/si/energy.hpp>
#include <boost/units/systems/si/length.hpp>
#include <boost/units/systems/si/mass.hpp>
#include <boost/units/systems/si/mass_density.hpp>
#include <boost/units/systems/si/power.hpp>
#include <boost/units/systems/si/pressure.hpp>
#include <boost/units/systems/si/temperature.hpp>
#include <boost/units/systems/si/time.hpp>
#include <boost/units/systems/si/velocity.hpp>
#include <boost/units/systems/si/volume.hpp>

namespace Airwright::Core {

namespace bu = boost::units;
namespace si = boost::units::si;

namespace Units {
using Pascal = si::pressure;
using Kelvin = si::temperature;
using AbsoluteKelvin = bu::absolute<si::temperature>;
using KilogramPerSecond = decltype(si::kilogram / si::second);
using CubicMetrePerSecond = decltype(si::cubic_meter / si::second);
using Watt = si::power;
using WattPerKelvin = decltype(si::watt / si::kelvin);
using JoulePerKilogram = decltype(si::joule / si::kilogram);
using JoulePerKilogramKelvin = decltype(si::joule / si::kilogram / si::kelvin);
using CubicMetrePerKilogram = decltype(si::cubic_meter / si::kilogram);
using KilogramPerCubicMetre = si::mass_density;
using MetrePerSecond = si::velocity;
using Metre = si::length;
using SquareMetre = si::area;
using Kilogram = si::mass;
using Second = si::time;
using Dimensionless = si::dimensionless;
using Ampere = si::current;
} // namespace Units

using Pressure = bu::quantity<Units::Pascal>;
using AbsoluteTemperature = bu::quantity<Units::AbsoluteKelvin>;
using TemperatureDifference = bu::quantity<Units::Kelvin>;
using MassFlow = bu::quantity<Units::KilogramPerSecond>;
using VolumeFlow = bu::quantity<Units::CubicMetrePerSecond>;
using Power = bu::quantity<Units::Watt>;
using ThermalConductance = bu::quantity<Units::WattPerKelvin>; // UA, heat capacity rate
using SpecificEnthalpy = bu::quantity<Units::JoulePerKilogram>;
using SpecificHeatCapacity = bu::quantity<Units::JoulePerKilogramKelvin>;
using SpecificVolume = bu::quantity<Units::CubicMetrePerKilogram>;
using Density = bu::quantity<Units::KilogramPerCubicMetre>;
using Velocity = bu::quantity<Units::MetrePerSecond>;
using Length = bu::quantity<Units::Metre>;
using Area = bu::quantity<Units::SquareMetre>;
using Mass = bu::quantity<Units::Kilogram>;
using Duration = bu::quantity<Units::Second>;
// Mass of water vapour per mass of dry air, kg/kg. Kept dimensionless on purpose:
// the conversions below name the g/kg form wherever it is meant.
using HumidityRatio = bu::quantity<Units::Dimensionless>;
using Ratio = bu::quantity<Units::Dimensionless>;
using ElectricCurrent = bu::quantity<Units::Ampere>;
// Specific fan power, W/(m3/s). Dimensionally a pressure (J/m3); the alias keeps
// the intent readable where an SFP is meant.
using SpecificFanPower = bu::quantity<decltype(si::watt / (si::cubic_meter / si::second))>;

inline constexpr double kZeroCelsiusInKelvin = 273.15;

// Named conversions: the only sanctioned way between raw numbers and quantities.
inline Pressure pascals(double v) { return Pressure::from_value(v); }
inline double toPascals(Pressure p) { return p.value(); }
inline AbsoluteTemperature kelvin(double k) { return AbsoluteTemperature::from_value(k); }
inline AbsoluteTemperature celsius(double c) { return AbsoluteTemperature::from_value(c + kZeroCelsiusInKelvin); }
inline double toKelvin(AbsoluteTemperature t) { return t.value(); }
inline double toCelsius(AbsoluteTemperature t) { return t.value() - kZeroCelsiusInKelvin; }
inline TemperatureDifference kelvinDifference(double k) { return TemperatureDifference::from_value(k); }
inline double toKelvinDifference(TemperatureDifference d) { return d.value(); }
inline MassFlow kilogramsPerSecond(double v) { return MassFlow::from_value(v); }
inline double toKilogramsPerSecond(MassFlow m) { return m.value(); }
inline VolumeFlow cubicMetresPerSecond(double v) { return VolumeFlow::from_value(v); }
inline VolumeFlow cubicMetresPerHour(double v) { return VolumeFlow::from_value(v / 3600.0); }
inline double toCubicMetresPerSecond(VolumeFlow q) { return q.value(); }
inline double toCubicMetresPerHour(VolumeFlow q) { return q.value() * 3600.0; }
inline Power watts(double v) { return Power::from_value(v); }
inline Power kilowatts(double v) { return Power::from_value(v * 1000.0); }
inline double toWatts(Power p) { return p.value(); }
inline double toKilowatts(Power p) { return p.value() / 1000.0; }
inline ThermalConductance wattsPerKelvin(double v) { return ThermalConductance::from_value(v); }
inline double toWattsPerKelvin(ThermalConductance c) { return c.value(); }
inline SpecificEnthalpy joulesPerKilogram(double v) { return SpecificEnthalpy::from_value(v); }
inline SpecificEnthalpy kilojoulesPerKilogram(double v) { return SpecificEnthalpy::from_value(v * 1000.0); }
inline double toJoulesPerKilogram(SpecificEnthalpy h) { return h.value(); }
inline double toKilojoulesPerKilogram(SpecificEnthalpy h) { return h.value() / 1000.0; }
inline SpecificHeatCapacity joulesPerKilogramKelvin(double v) { return SpecificHeatCapacity::from_value(v); }
inline double toJoulesPerKilogramKelvin(SpecificHeatCapacity c) { return c.value(); }
inline SpecificVolume cubicMetresPerKilogram(double v) { return SpecificVolume::from_value(v); }
inline double toCubicMetresPerKilogram(SpecificVolume v) { return v.value(); }
inline Density kilogramsPerCubicMetre(double v) { return Density::from_value(v); }
inline double toKilogramsPerCubicMetre(Density d) { return d.value(); }
inline Velocity metresPerSecond(double v) { return Velocity::from_value(v); }
inline double toMetresPerSecond(Velocity v) { return v.value(); }
inline Length metres(double v) { return Length::from_value(v); }
inline Length millimetres(double v) { return Length::from_value(v / 1000.0); }
inline double toMetres(Length l) { return l.value(); }
inline double toMillimetres(Length l) { return l.value() * 1000.0; }
inline Area squareMetres(double v) { return Area::from_value(v); }
inline double toSquareMetres(Area a) { return a.value(); }
inline Mass kilograms(double v) { return Mass::from_value(v); }
inline double toKilograms(Mass m) { return m.value(); }
inline Duration seconds(double v) { return Duration::from_value(v); }
inline Duration hours(double v) { return Duration::from_value(v * 3600.0); }
inline double toSeconds(Duration d) { return d.value(); }
inline double toHours(Duration d) { return d.value() / 3600.0; }
inline HumidityRatio kilogramsPerKilogram(double v) { return HumidityRatio::from_value(v); }
inline HumidityRatio gramsPerKilogram(double v) { return HumidityRatio::from_value(v / 1000.0); }
inline double toKilogramsPerKilogram(HumidityRatio w) { return w.value(); }
inline double toGramsPerKilogram(HumidityRatio w) { return w.value() * 1000.0; }
inline ElectricCurrent amperes(double v) { return ElectricCurrent::from_value(v); }
inline double toAmperes(ElectricCurrent i) { return i.value(); }
inline SpecificFanPower wattsPerCubicMetrePerSecond(double v) { return SpecificFanPower::from_value(v); }
inline double toWattsPerCubicMetrePerSecond(SpecificFanPower s) { return s.value(); }
inline Ratio fraction(double v) { return Ratio::from_value(v); }
inline Ratio percent(double v) { return Ratio::from_value(v / 100.0); }
inline double toFraction(Ratio r) { return r.value(); }
inline double toPercent(Ratio r) { return r.value() * 100.0; }

} // namespace Airwright::Core
