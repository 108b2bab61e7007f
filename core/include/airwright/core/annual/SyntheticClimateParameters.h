#pragma once
// Parameters of the invented demo climate (see SyntheticClimate.h). The defaults
// give a mid-European-like inland climate with cold winters: daily means from
// about -1 C in January to about 19 C in July, winter design lows near -12 C,
// summer peaks near 30 C.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/SiteInfo.h"

#include <cstdint>

namespace Airwright::Core::Annual {

struct SyntheticClimateParameters {
    // Site written into the year; its elevation sets the station pressure through
    // the standard atmosphere.
    SiteInfo site;

    AbsoluteTemperature annualMean = celsius(8.5);
    TemperatureDifference annualAmplitude = kelvinDifference(10.0); // half the range of the seasonal cycle
    TemperatureDifference dailyAmplitude = kelvinDifference(4.5);   // half the daily swing
    int coldestDay = 20;            // day of year 1 .. 365 where the seasonal cycle is lowest
    double warmestHourOfDay = 15.0; // local solar hour 0 .. 24 of the daily maximum

    // Weather noise on the dry bulb: AR(1) with this standard deviation and
    // correlation time (e-folding), added to the cycles.
    TemperatureDifference noiseStandardDeviation = kelvinDifference(4.5);
    Duration noiseCorrelationTime = hours(60.0);

    // Humidity: the dew point is the dry bulb minus a depression that is bounded
    // to [minDewPointDepression, maxDewPointDepression]. The depression is its mean,
    // plus a seasonal part (largest at midsummer), plus diurnalDepressionCoupling
    // times the daily temperature swing (dry afternoons), plus AR(1) noise.
    TemperatureDifference meanDewPointDepression = kelvinDifference(4.5);
    TemperatureDifference seasonalDepressionAmplitude = kelvinDifference(2.0);
    Ratio diurnalDepressionCoupling = fraction(0.8);
    TemperatureDifference depressionNoiseStandardDeviation = kelvinDifference(1.5);
    Duration depressionCorrelationTime = hours(24.0);
    TemperatureDifference minDewPointDepression = kelvinDifference(0.2);
    TemperatureDifference maxDewPointDepression = kelvinDifference(20.0);

    bool leapYear = false;
    // Selects the random stream: the same number gives the same year.
    std::uint64_t streamNumber = 1;
};

} // namespace Airwright::Core::Annual
