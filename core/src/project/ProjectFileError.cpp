#include "airwright/core/project/ProjectFileError.h"

namespace Airwright::Core::Project {

namespace {

std::vector<std::string> linesOf(const std::vector<ProjectIssue>& problems, const std::filesystem::path& file)
{
    std::vector<std::string> lines;
    lines.reserve(problems.size());
    for (const auto& problem : problems)
        lines.push_back(file.empty() ? problem.text() : file.string() + ": " + problem.text());
    return lines;
}

std::string joined(const std::vector<std::string>& lines)
{
    std::string text;
    for (const auto& line : lines)
        text += (text.empty() ? "" : "\n") + line;
    return text;
}

} // namespace

ProjectFileError::ProjectFileError(std::vector<ProjectIssue> problems, std::filesystem::path file)
    : InputError(joined(linesOf(problems, file))), m_problems(std::move(problems)), m_file(std::move(file)),
      m_lines(linesOf(m_problems, m_file))
{
}

} // namespace Airwright::Core::Project
