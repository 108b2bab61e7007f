#pragma once

#include "airwright/core/InputError.h"
#include "airwright/core/project/ProjectIssue.h"

#include <filesystem>
#include <string>
#include <vector>

namespace Airwright::Core::Project {

// A project file that cannot be read or written. Loading collects every problem
// in the file before throwing, so one error carries all of them; what() is the
// lines of errors() joined with newlines.
class ProjectFileError : public InputError {
public:
    // file may be empty (text parsed from memory); problems must not be empty.
    ProjectFileError(std::vector<ProjectIssue> problems, std::filesystem::path file = {});

    const std::vector<ProjectIssue>& problems() const noexcept { return m_problems; }
    const std::filesystem::path& file() const noexcept { return m_file; }
    // One line per problem: "FILE: path: message" (parts left out when empty).
    const std::vector<std::string>& errors() const noexcept { return m_lines; }

private:
    std::vector<ProjectIssue> m_problems;
    std::filesystem::path m_file;
    std::vector<std::string> m_lines;
};

} // namespace Airwright::Core::Project
