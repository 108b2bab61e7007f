#pragma once
// A reproducible generator of an invented hourly climate, for demos and tests. Nothing
// it produces is measured data.
//
// Model, hour i (0-based, hour ending i+1; mid-hour time t = i + 0.5 h):
//   seasonal s(t) = -cos(2 pi (t/24 - (coldestDay - 0.5)) / daysInYear), -1 at the coldest day
//   daily    d(t) =  cos(2 pi (t mod 24 - warmestHourOfDay) / 24), +1 at the warmest hour
//   tdb = annualMean + annualAmplitude s + dailyAmplitude d + n(t)
//   n: AR(1), n_i = phi n_{i-1} + sigma sqrt(1 - phi^2) z_i, phi = exp(-1 h / tau),
//      started from its stationary distribution (n_0 = sigma z_0)
//   depression = clamp(mean + seasonalAmp s + coupling dailyAmplitude d + m(t), min, max),
//      m an AR(1) noise of its own; dew point = tdb - depression
//   pressure = standard atmosphere at the site elevation (ASHRAE Fundamentals 2017
//      ch. 1 eq. 3), constant over the year
// z are standard normal deviates from RandomStream(streamNumber): per hour first the
// dry-bulb deviate, then the depression deviate. The same parameters (stream number included) give
// the same year.

#include "airwright/core/annual/SyntheticClimateParameters.h"
#include "airwright/core/annual/WeatherYear.h"

namespace Airwright::Core::Annual {

class SyntheticClimate {
public:
    // Throws InputError for parameters outside their ranges (amplitudes and
    // standard deviations >= 0, correlation times > 0, coldestDay 1 .. 365,
    // warmestHourOfDay 0 .. 24, coupling 0 .. 1, 0 <= min <= max depression,
    // annual mean -50 .. 50 C, elevation -500 .. 5000 m), or if a generated
    // hour falls outside -70 .. 70 C.
    static WeatherYear generate(const SyntheticClimateParameters& parameters);
};

} // namespace Airwright::Core::Annual
