#include "airwright/core/checks/VelocityClass.h"

#include "airwright/core/InputError.h"

#include <array>
#include <cmath>

namespace Airwright::Core::Checks {

namespace {

// EN 13053, velocity classes by face velocity over the inner cross-section,
// upper limits in m/s of V1 .. V8; V9 is everything above 3.6 (docs/regulation.md).
constexpr std::array<double, 8> kUpperLimits = {1.6, 1.8, 2.0, 2.2, 2.5, 2.8, 3.2, 3.6};

void checkClass(int velocityClass)
{
    if (velocityClass < kLowestVelocityClass || velocityClass > kHighestVelocityClass)
        throw InputError("velocity class", velocityClass, "", "1 .. 9");
}

} // namespace

int velocityClass(Velocity faceVelocity)
{
    const double v = toMetresPerSecond(faceVelocity);
    if (!std::isfinite(v) || v < 0.0)
        throw InputError("face velocity", v, "m/s", "0 .. finite");
    for (std::size_t i = 0; i < kUpperLimits.size(); ++i)
        if (v <= kUpperLimits[i])
            return static_cast<int>(i) + kLowestVelocityClass;
    return kHighestVelocityClass;
}

std::string velocityClassLabel(int velocityClass)
{
    checkClass(velocityClass);
    std::string label = "V"; // appended, not "V" + ...: GCC 12 warns falsely (-Wrestrict) on the latter
    label += std::to_string(velocityClass);
    return label;
}

std::optional<Velocity> velocityClassUpperLimit(int velocityClass)
{
    checkClass(velocityClass);
    if (velocityClass == kHighestVelocityClass)
        return std::nullopt;
    return metresPerSecond(kUpperLimits[static_cast<std::size_t>(velocityClass - kLowestVelocityClass)]);
}

} // namespace Airwright::Core::Checks
