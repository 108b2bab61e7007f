#include "airwright/core/project/ProjectIssue.h"

namespace Airwright::Core::Project {

std::string ProjectIssue::text() const
{
    return path.empty() ? message : path + ": " + message;
}

} // namespace Airwright::Core::Project
