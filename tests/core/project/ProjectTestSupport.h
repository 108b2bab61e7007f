#pragma once
// Shared helpers for the project-file tests: the demo file, a scratch folder.

#include "airwright/core/project/ProjectFile.h"

#include <nlohmann/json.hpp>

#include <filesystem>
#include <fstream>
#include <random>
#include <string>

namespace Airwright::Core::Project::TestSupport {

inline std::filesystem::path demoPath()
{
    return std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj";
}

inline std::filesystem::path schemaPath()
{
    return std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "schema" / "airwright-project.schema.json";
}

inline std::filesystem::path dataPath(const std::string& name)
{
    return std::filesystem::path(AIRWRIGHT_TEST_DATA_DIR) / "projects" / name;
}

inline std::string readText(const std::filesystem::path& path)
{
    std::ifstream in(path, std::ios::binary);
    std::string text(static_cast<std::size_t>(std::filesystem::file_size(path)), '\0');
    in.read(text.data(), static_cast<std::streamsize>(text.size()));
    return text;
}

inline void writeText(const std::filesystem::path& path, const std::string& text)
{
    std::ofstream out(path, std::ios::binary | std::ios::trunc);
    out << text;
}

inline nlohmann::ordered_json demoJson()
{
    return nlohmann::ordered_json::parse(readText(demoPath()));
}

// A fresh folder under the system temp folder, removed with everything in it.
class ScratchFolder {
public:
    ScratchFolder()
    {
        std::random_device seed;
        m_path = std::filesystem::temp_directory_path() /
                 ("airwright-project-test-" + std::to_string(seed()) + "-" + std::to_string(seed()));
        std::filesystem::create_directories(m_path);
    }
    ~ScratchFolder()
    {
        std::error_code ignored;
        std::filesystem::remove_all(m_path, ignored);
    }
    ScratchFolder(const ScratchFolder&) = delete;
    ScratchFolder& operator=(const ScratchFolder&) = delete;

    const std::filesystem::path& path() const { return m_path; }
    std::filesystem::path operator/(const std::string& name) const { return m_path / name; }

private:
    std::filesystem::path m_path;
};

} // namespace Airwright::Core::Project::TestSupport
