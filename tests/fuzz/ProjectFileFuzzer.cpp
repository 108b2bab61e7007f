// libFuzzer harness: ProjectFile::parse on arbitrary bytes. A ProjectFileError
// (an InputError) is the documented answer to bad text; anything else escaping,
// a crash or a sanitizer report is a finding. A text that parses must save and
// load back to the same text.

#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/project/ProjectFileError.h"

#include <cstddef>
#include <cstdint>
#include <cstdlib>
#include <optional>
#include <string>
#include <string_view>

using Airwright::Core::Project::LoadReport;
using Airwright::Core::Project::ProjectFile;
using Airwright::Core::Project::ProjectFileError;

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    std::optional<Airwright::Core::Project::Project> project;
    try {
        LoadReport report;
        project = ProjectFile::parse(text, report);
    } catch (const ProjectFileError&) {
        return 0;
    }
    // A loaded project must survive its own save: the saved text loads (no
    // exception may escape here) and saves to the same text. A value read in
    // another unit may move by one unit in the last place once
    // (docs/project-format.md), so the texts are compared, not the projects.
    const std::string saved = ProjectFile::serialize(*project);
    LoadReport again;
    if (ProjectFile::serialize(ProjectFile::parse(saved, again)) != saved)
        std::abort();
    return 0;
}
