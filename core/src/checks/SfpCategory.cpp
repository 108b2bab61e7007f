#include "airwright/core/checks/SfpCategory.h"

#include "airwright/core/InputError.h"

#include <array>
#include <cmath>

namespace Airwright::Core::Checks {

namespace {

// EN 16798-3:2017, SFP categories, upper limits in W/(m3/s) of SFP 0 .. SFP 6;
// SFP 7 is everything above 4500 (docs/regulation.md).
constexpr std::array<double, 7> kUpperLimits = {300.0, 500.0, 750.0, 1250.0, 2000.0, 3000.0, 4500.0};

void checkCategory(int category)
{
    if (category < kLowestSfpCategory || category > kHighestSfpCategory)
        throw InputError("SFP category", category, "", "0 .. 7");
}

} // namespace

int sfpCategory(SpecificFanPower sfp)
{
    const double v = toWattsPerCubicMetrePerSecond(sfp);
    if (!std::isfinite(v) || v < 0.0)
        throw InputError("specific fan power", v, "W/(m3/s)", "0 .. finite");
    for (std::size_t i = 0; i < kUpperLimits.size(); ++i)
        if (v <= kUpperLimits[i])
            return static_cast<int>(i);
    return kHighestSfpCategory;
}

std::string sfpCategoryLabel(int category)
{
    checkCategory(category);
    std::string label = "SFP ";
    label += std::to_string(category);
    return label;
}

std::optional<SpecificFanPower> sfpCategoryUpperLimit(int category)
{
    checkCategory(category);
    if (category == kHighestSfpCategory)
        return std::nullopt;
    return wattsPerCubicMetrePerSecond(kUpperLimits[static_cast<std::size_t>(category)]);
}

} // namespace Airwright::Core::Checks
