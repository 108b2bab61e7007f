#include "airwright/core/annual/DemoClimate.h"

namespace Airwright::Core::Annual {

SyntheticClimateParameters DemoClimate::parameters()
{
    SyntheticClimateParameters p;
    p.site.name = "Airwright Demo Town (invented)";
    p.site.region = "Demo Region";
    p.site.country = "ZZ"; // user-assigned code: no real country
    p.site.source = "generated";
    p.site.stationId = "000000";
    p.site.latitudeDegrees = 49.5;
    p.site.longitudeDegrees = 11.0;
    p.site.timeZone = hours(1.0);
    p.site.elevation = metres(250.0);

    p.annualMean = celsius(8.5);
    p.annualAmplitude = kelvinDifference(10.0);
    p.dailyAmplitude = kelvinDifference(4.5);
    p.coldestDay = 20;
    p.warmestHourOfDay = 15.0;
    p.noiseStandardDeviation = kelvinDifference(4.5);
    p.noiseCorrelationTime = hours(60.0);

    p.meanDewPointDepression = kelvinDifference(4.5);
    p.seasonalDepressionAmplitude = kelvinDifference(2.0);
    p.diurnalDepressionCoupling = fraction(0.8);
    p.depressionNoiseStandardDeviation = kelvinDifference(1.5);
    p.depressionCorrelationTime = hours(24.0);
    p.minDewPointDepression = kelvinDifference(0.2);
    p.maxDewPointDepression = kelvinDifference(20.0);

    p.leapYear = false;
    p.streamNumber = 20240611;
    return p;
}

} // namespace Airwright::Core::Annual
