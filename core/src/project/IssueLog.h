#pragma once

#include "airwright/core/project/ProjectIssue.h"

#include <string>
#include <vector>

namespace Airwright::Core::Project {

// Collects every error and warning of one read, in the order they are found.
class IssueLog {
public:
    void error(std::string path, std::string message) { m_errors.push_back({std::move(path), std::move(message)}); }
    void warning(std::string path, std::string message) { m_warnings.push_back({std::move(path), std::move(message)}); }

    const std::vector<ProjectIssue>& errors() const { return m_errors; }
    const std::vector<ProjectIssue>& warnings() const { return m_warnings; }
    std::size_t errorCount() const { return m_errors.size(); }

private:
    std::vector<ProjectIssue> m_errors;
    std::vector<ProjectIssue> m_warnings;
};

} // namespace Airwright::Core::Project
