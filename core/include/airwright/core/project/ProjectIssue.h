#pragma once

#include <string>

namespace Airwright::Core::Project {

// One problem or warning found in a project file: where (a JSON path such as
// "supply[3].final_dp_Pa", empty for the file as a whole) and what.
struct ProjectIssue {
    std::string path;
    std::string message;

    // "path: message", or the message alone when the path is empty.
    std::string text() const;

    bool operator==(const ProjectIssue&) const = default;
};

} // namespace Airwright::Core::Project
