#pragma once

#include "airwright/core/project/ProjectIssue.h"

#include <optional>
#include <vector>

namespace Airwright::Core::Project {

// What a successful load has to tell besides the project: keys it ignored and
// whether the file was written in an older format and migrated in memory.
struct LoadReport {
    std::vector<ProjectIssue> warnings;
    std::optional<int> migratedFromVersion;
};

} // namespace Airwright::Core::Project
