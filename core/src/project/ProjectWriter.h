#pragma once

#include "airwright/core/project/Project.h"

#include <nlohmann/json.hpp>

namespace Airwright::Core::Project {

// Project -> JSON document in the current format, keys in a fixed order.
class ProjectWriter {
public:
    static nlohmann::ordered_json write(const Project& project);
};

} // namespace Airwright::Core::Project
