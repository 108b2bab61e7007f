#pragma once
// Brings a project document written in an older format version up to the current
// one, step by step, before it is read. Each step is one entry of a table (see
// docs/project-format.md, "Versions and migration"); a step changes the JSON
// only, so the reader knows a single format.

#include <nlohmann/json_fwd.hpp>

#include <vector>

namespace Airwright::Core::Project {

class ProjectMigration {
public:
    struct Step {
        int fromVersion; // the step turns this version into fromVersion + 1
        const char* description;
        void (*apply)(nlohmann::ordered_json& document);
    };

    // The steps in order; step i migrates version i.
    static const std::vector<Step>& steps();
    static int oldestVersion();
    static int currentVersion();

    // Applies every step from fromVersion up to currentVersion() and sets
    // "format_version". Throws InputError for a version outside
    // oldestVersion() .. currentVersion().
    static void migrate(nlohmann::ordered_json& document, int fromVersion);
};

} // namespace Airwright::Core::Project
