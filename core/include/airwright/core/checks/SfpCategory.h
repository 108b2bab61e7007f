#pragma once
// EN 16798-3:2017 specific fan power categories SFP 0 .. SFP 7. Limits and their
// sources: docs/regulation.md. A value exactly on a limit belongs to the lower
// category (the limits read "at most").

#include "airwright/core/Quantities.h"

#include <optional>
#include <string>

namespace Airwright::Core::Checks {

inline constexpr int kLowestSfpCategory = 0;
inline constexpr int kHighestSfpCategory = 7;

// Throws InputError for a negative or non-finite SFP.
int sfpCategory(SpecificFanPower sfp);

// "SFP 0" .. "SFP 7"; throws InputError outside 0 .. 7.
std::string sfpCategoryLabel(int category);

// Upper limit of a category; empty for SFP 7, which is open above. Throws
// InputError outside 0 .. 7.
std::optional<SpecificFanPower> sfpCategoryUpperLimit(int category);

} // namespace Airwright::Core::Checks
