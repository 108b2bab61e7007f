#pragma once

namespace Airwright::Core::Checks {

// The outcome of a regulation check. NotAssessed where the requirement does not
// apply or the case is not the one it is stated for (part flow, one direction).
enum class Compliance { Pass, Fail, NotAssessed };

const char* complianceKey(Compliance compliance); // "pass", "fail", "not_assessed"

} // namespace Airwright::Core::Checks
