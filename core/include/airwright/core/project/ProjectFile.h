#pragma once
// Reading and writing Airwright project files (.awproj): JSON with keys of our own
// naming, units in the key names. The format is described in docs/project-format.md
// and resources/schema/airwright-project.schema.json.

#include "airwright/core/project/LoadReport.h"
#include "airwright/core/project/Project.h"
#include "airwright/core/project/ProjectIssue.h"

#include <cstdint>
#include <filesystem>
#include <string>
#include <string_view>
#include <vector>

namespace Airwright::Core::Project {

class ProjectFile {
public:
    static constexpr std::string_view kFormatName = "airwright-project";
    static constexpr int kFormatVersion = 1;
    static constexpr std::uintmax_t kMaxFileBytes = 16u * 1024u * 1024u;

    // Reads a project from JSON text. Checks everything and throws one
    // ProjectFileError listing every problem (JSON path and allowed range), so a
    // file is fixed in one pass. Unknown keys are not errors: they are listed in
    // report.warnings and ignored.
    static Project parse(std::string_view text, LoadReport& report);
    // As parse, from a file; refuses files over kMaxFileBytes. The error names the file.
    static Project load(const std::filesystem::path& file, LoadReport& report);

    // Canonical text: two-space indentation, fixed key order, optional values left
    // out when empty, numbers in the key's unit with the fewest digits that read
    // back to exactly the same value, whatever the C locale. (A value that was not
    // entered in the key's unit may have no exact decimal there; it then reads
    // back to the nearest double.)
    static std::string serialize(const Project& project);

    // Writes atomically: a temporary file in the same folder, flushed to disk, then
    // renamed over the target; an existing target is kept as FILE.bak. Refuses a
    // project that would not load back (ProjectFileError with the problems), so a
    // good file is never replaced by one that cannot be opened.
    static void save(const Project& project, const std::filesystem::path& file);

    // The problems load would report for this project; empty when it is valid.
    static std::vector<ProjectIssue> check(const Project& project);
};

} // namespace Airwright::Core::Project
