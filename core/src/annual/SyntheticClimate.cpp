#include "airwright/core/annual/SyntheticClimate.h"

#include "airwright/core/InputError.h"
#include "airwright/core/annual/RandomStream.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace Airwright::Core::Annual {

namespace {

void requireRange(const std::string& quantity, double value, const std::string& unit, double lo, double hi,
                  const std::string& range)
{
    if (!(value >= lo && value <= hi))
        throw InputError(quantity, value, unit, range);
}

void validate(const SyntheticClimateParameters& p)
{
    requireRange("annual mean temperature", toCelsius(p.annualMean), "C", -50.0, 50.0, "-50 .. 50 C");
    requireRange("annual amplitude", toKelvinDifference(p.annualAmplitude), "K", 0.0, 40.0, "0 .. 40 K");
    requireRange("daily amplitude", toKelvinDifference(p.dailyAmplitude), "K", 0.0, 20.0, "0 .. 20 K");
    requireRange("coldest day", p.coldestDay, "", 1.0, 365.0, "1 .. 365");
    requireRange("warmest hour of day", p.warmestHourOfDay, "h", 0.0, 24.0, "0 .. 24 h");
    requireRange("temperature noise standard deviation", toKelvinDifference(p.noiseStandardDeviation), "K", 0.0, 15.0,
                 "0 .. 15 K");
    requireRange("temperature noise correlation time", toHours(p.noiseCorrelationTime), "h", 0.1, 8760.0,
                 "0.1 .. 8760 h");
    requireRange("mean dew point depression", toKelvinDifference(p.meanDewPointDepression), "K", 0.0, 40.0,
                 "0 .. 40 K");
    requireRange("seasonal depression amplitude", toKelvinDifference(p.seasonalDepressionAmplitude), "K", -20.0, 20.0,
                 "-20 .. 20 K");
    requireRange("diurnal depression coupling", toFraction(p.diurnalDepressionCoupling), "", 0.0, 1.0, "0 .. 1");
    requireRange("depression noise standard deviation", toKelvinDifference(p.depressionNoiseStandardDeviation), "K",
                 0.0, 15.0, "0 .. 15 K");
    requireRange("depression correlation time", toHours(p.depressionCorrelationTime), "h", 0.1, 8760.0,
                 "0.1 .. 8760 h");
    requireRange("minimum dew point depression", toKelvinDifference(p.minDewPointDepression), "K", 0.0, 40.0,
                 "0 .. 40 K");
    requireRange("maximum dew point depression", toKelvinDifference(p.maxDewPointDepression), "K",
                 toKelvinDifference(p.minDewPointDepression), 60.0, "minimum depression .. 60 K");
    requireRange("site elevation", toMetres(p.site.elevation), "m", -500.0, 5000.0, "-500 .. 5000 m");
}

// AR(1) process with a given stationary standard deviation and e-folding time in hours.
class RedNoise {
public:
    RedNoise(double standardDeviation, double correlationHours)
        : m_sigma(standardDeviation), m_phi(std::exp(-1.0 / correlationHours)),
          m_innovation(standardDeviation * std::sqrt(1.0 - m_phi * m_phi))
    {
    }

    double next(double z)
    {
        m_value = m_started ? m_phi * m_value + m_innovation * z : m_sigma * z;
        m_started = true;
        return m_value;
    }

private:
    double m_sigma;
    double m_phi;
    double m_innovation;
    double m_value = 0.0;
    bool m_started = false;
};

} // namespace

WeatherYear SyntheticClimate::generate(const SyntheticClimateParameters& p)
{
    validate(p);

    const std::size_t count = p.leapYear ? WeatherYear::kHoursInLeapYear : WeatherYear::kHoursInYear;
    const double daysInYear = p.leapYear ? 366.0 : 365.0;
    const double twoPi = 2.0 * std::numbers::pi;
    const double mean = toCelsius(p.annualMean);
    const double annualAmplitude = toKelvinDifference(p.annualAmplitude);
    const double dailyAmplitude = toKelvinDifference(p.dailyAmplitude);
    const double coldestDay = static_cast<double>(p.coldestDay) - 0.5; // middle of that day, 0-based days
    const double depressionMean = toKelvinDifference(p.meanDewPointDepression);
    const double depressionSeasonal = toKelvinDifference(p.seasonalDepressionAmplitude);
    const double coupling = toFraction(p.diurnalDepressionCoupling);
    const double depressionMin = toKelvinDifference(p.minDewPointDepression);
    const double depressionMax = toKelvinDifference(p.maxDewPointDepression);
    const Pressure pressure = Psychro::standardPressureAtAltitude(p.site.elevation);

    RandomStream random(p.streamNumber);
    RedNoise temperatureNoise(toKelvinDifference(p.noiseStandardDeviation), toHours(p.noiseCorrelationTime));
    RedNoise depressionNoise(toKelvinDifference(p.depressionNoiseStandardDeviation),
                             toHours(p.depressionCorrelationTime));

    std::vector<WeatherHour> hoursOfYear;
    hoursOfYear.reserve(count);
    for (std::size_t i = 0; i < count; ++i) {
        const double t = static_cast<double>(i) + 0.5; // mid-hour, hours since 1 January 00:00
        const double day = t / 24.0;
        const double hourOfDay = std::fmod(t, 24.0);
        const double seasonal = -std::cos(twoPi * (day - coldestDay) / daysInYear);
        const double daily = std::cos(twoPi * (hourOfDay - p.warmestHourOfDay) / 24.0);

        const double zTemperature = random.nextNormal();
        const double zDepression = random.nextNormal();
        const double dryBulbC =
            mean + annualAmplitude * seasonal + dailyAmplitude * daily + temperatureNoise.next(zTemperature);
        const double depression = std::clamp(depressionMean + depressionSeasonal * seasonal +
                                                 coupling * dailyAmplitude * daily + depressionNoise.next(zDepression),
                                             depressionMin, depressionMax);

        if (!(dryBulbC > -70.0 && dryBulbC < 70.0))
            throw InputError("generated dry bulb temperature at hour " + std::to_string(i + 1), dryBulbC, "C",
                             "-70 .. 70 C (lower the amplitudes or the noise)");
        const AbsoluteTemperature dryBulb = celsius(dryBulbC);
        const AbsoluteTemperature dewPoint = celsius(std::max(dryBulbC - depression, -90.0));
        const HumidityRatio w =
            Psychro::humidityRatioFromVapourPressure(Psychro::saturationPressure(dewPoint), pressure);
        hoursOfYear.push_back({dryBulb, w, pressure});
    }
    return WeatherYear(p.site, std::move(hoursOfYear));
}

} // namespace Airwright::Core::Annual
