#pragma once
// EN 13053 velocity classes V1 .. V9 by the face velocity over the inner
// cross-section of the unit. Limits and their sources: docs/regulation.md. A
// velocity exactly on a limit belongs to the lower class.

#include "airwright/core/Quantities.h"

#include <optional>
#include <string>

namespace Airwright::Core::Checks {

inline constexpr int kLowestVelocityClass = 1;
inline constexpr int kHighestVelocityClass = 9;

// Throws InputError for a negative or non-finite velocity.
int velocityClass(Velocity faceVelocity);

// "V1" .. "V9"; throws InputError outside 1 .. 9.
std::string velocityClassLabel(int velocityClass);

// Upper limit of a class; empty for V9, which is open above. Throws InputError
// outside 1 .. 9.
std::optional<Velocity> velocityClassUpperLimit(int velocityClass);

} // namespace Airwright::Core::Checks
