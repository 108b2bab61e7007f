#pragma once
// A project: what the designer saves and opens, one air handling unit with the
// facts that identify the job.

#include "airwright/core/chain/AirHandlingUnit.h"

#include <string>

namespace Airwright::Core::Project {

struct ProjectInfo {
    std::string name;
    std::string reference; // the designer's job or tender number
    std::string designer;
    std::string date; // ISO 8601 calendar date, yyyy-mm-dd, or empty
    std::string revision;
    std::string notes;

    bool operator==(const ProjectInfo&) const = default;
};

struct Project {
    ProjectInfo info;
    Chain::AirHandlingUnit unit;

    bool operator==(const Project&) const = default;
};

} // namespace Airwright::Core::Project
