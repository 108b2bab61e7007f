#include "airwright/core/chain/DesignCase.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

namespace Airwright::Core::Chain {

namespace {
// The message is built only when the check fails: every solve validates its cases.
std::string prefixed(const std::string& caseName, const char* what) { return "case '" + caseName + "': " + what; }

void requireTemperature(const std::string& caseName, const char* what, AbsoluteTemperature t, double lo, double hi)
{
    const double c = toCelsius(t);
    if (!(c >= lo && c <= hi))
        throw InputError(prefixed(caseName, what), c, "C", formatNumber(lo) + " .. " + formatNumber(hi) + " C");
}

void requireHumidity(const std::string& caseName, const char* what, Ratio rh)
{
    if (!(rh.value() >= 0.0 && rh.value() <= 1.0))
        throw InputError(prefixed(caseName, what), toPercent(rh), "%", "0 .. 100 %");
}
} // namespace

void DesignCase::validate() const
{
    if (name.empty())
        throw InputError("a design case needs a name");
    requireTemperature(name, "outdoor temperature", outdoorTemperature, -60.0, 60.0);
    requireHumidity(name, "outdoor relative humidity", outdoorHumidity);
    requireTemperature(name, "room temperature", roomTemperature, 0.0, 50.0);
    requireHumidity(name, "room relative humidity", roomHumidity);
    requireTemperature(name, "supply setpoint", supplySetpoint, 0.0, 60.0);
    if (minimumSupplyHumidity)
        requireHumidity(name, "minimum supply humidity", *minimumSupplyHumidity);
    if (maximumSupplyHumidity)
        requireHumidity(name, "maximum supply humidity", *maximumSupplyHumidity);
    if (minimumSupplyHumidity && maximumSupplyHumidity && *minimumSupplyHumidity > *maximumSupplyHumidity)
        throw InputError(prefixed(name, "minimum supply humidity"), toPercent(*minimumSupplyHumidity), "%",
                         "at most the maximum supply humidity (" + formatNumber(toPercent(*maximumSupplyHumidity))
                             + " %)");
    if (!(airflowFraction.value() >= 0.05 && airflowFraction.value() <= 1.5))
        throw InputError(prefixed(name, "airflow fraction"), toPercent(airflowFraction), "%", "5 .. 150 %");
}

} // namespace Airwright::Core::Chain
