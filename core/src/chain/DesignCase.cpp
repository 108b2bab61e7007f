#include "airwright/core/chain/DesignCase.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

namespace Airwright::Core::Chain {

namespace {
void requireTemperature(const std::string& what, AbsoluteTemperature t, double lo, double hi)
{
    const double c = toCelsius(t);
    if (!(c >= lo && c <= hi))
        throw InputError(what, c, "C", formatNumber(lo) + " .. " + formatNumber(hi) + " C");
}

void requireHumidity(const std::string& what, Ratio rh)
{
    if (!(rh.value() >= 0.0 && rh.value() <= 1.0))
        throw InputError(what, toPercent(rh), "%", "0 .. 100 %");
}
} // namespace

void DesignCase::validate() const
{
    const std::string prefix = "case '" + name + "': ";
    if (name.empty())
        throw InputError("a design case needs a name");
    requireTemperature(prefix + "outdoor temperature", outdoorTemperature, -60.0, 60.0);
    requireHumidity(prefix + "outdoor relative humidity", outdoorHumidity);
    requireTemperature(prefix + "room temperature", roomTemperature, 0.0, 50.0);
    requireHumidity(prefix + "room relative humidity", roomHumidity);
    requireTemperature(prefix + "supply setpoint", supplySetpoint, 0.0, 60.0);
    if (minimumSupplyHumidity)
        requireHumidity(prefix + "minimum supply humidity", *minimumSupplyHumidity);
    if (maximumSupplyHumidity)
        requireHumidity(prefix + "maximum supply humidity", *maximumSupplyHumidity);
    if (minimumSupplyHumidity && maximumSupplyHumidity && *minimumSupplyHumidity > *maximumSupplyHumidity)
        throw InputError(prefix + "minimum supply humidity", toPercent(*minimumSupplyHumidity), "%",
                         "at most the maximum supply humidity (" + formatNumber(toPercent(*maximumSupplyHumidity))
                             + " %)");
    if (!(airflowFraction.value() >= 0.05 && airflowFraction.value() <= 1.5))
        throw InputError(prefix + "airflow fraction", toPercent(airflowFraction), "%", "5 .. 150 %");
}

} // namespace Airwright::Core::Chain
