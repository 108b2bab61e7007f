#pragma once

#include <filesystem>
#include <string_view>

namespace Airwright::Core::Project {

// Replaces a file's content so that a crash or a full disk never leaves a half
// written file: the text goes to a temporary file in the same folder (a rename
// within one file system is atomic), is flushed to disk, and is renamed over the
// target. The previous content is kept as TARGET.bak. Failures throw
// ProjectFileError naming the file and the system's message; no temporary file
// is left behind.
class AtomicFileWriter {
public:
    static void write(const std::filesystem::path& target, std::string_view content);
    static std::filesystem::path backupPath(const std::filesystem::path& target);
};

} // namespace Airwright::Core::Project
