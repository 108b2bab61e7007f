#include "airwright/core/project/ProjectMigration.h"

#include "airwright/core/InputError.h"

#include <nlohmann/json.hpp>

namespace Airwright::Core::Project {

namespace {

using Json = nlohmann::ordered_json;

// Version 0, the pre-release draft: flows in m3/s ("supply_m3s", "extract_m3s"),
// no "basis" (flows were always meant at standard air) and the design cases under
// "design_cases". A value of the wrong JSON type is moved as it is, so the reader
// reports it under its new name.
void fromDraft(Json& document)
{
    if (!document.is_object())
        return;
    if (document.contains("airflows") && document["airflows"].is_object()) {
        Json& airflows = document["airflows"];
        for (const std::string side : {"supply", "extract"}) {
            const std::string oldKey = side + "_m3s";
            const std::string newKey = side + "_m3h";
            if (!airflows.contains(oldKey) || airflows.contains(newKey))
                continue;
            const Json value = airflows[oldKey];
            airflows.erase(oldKey);
            airflows[newKey] = value.is_number() ? Json(value.get<double>() * 3600.0) : value;
        }
        if (!airflows.contains("basis"))
            airflows["basis"] = "standard_air";
    }
    if (document.contains("design_cases") && !document.contains("cases")) {
        const Json value = document["design_cases"];
        document.erase("design_cases");
        document["cases"] = value;
    }
}

} // namespace

const std::vector<ProjectMigration::Step>& ProjectMigration::steps()
{
    static const std::vector<Step> table{
        {0, "pre-release draft: m3/s flows to m3/h, flow basis made explicit, design_cases renamed cases", &fromDraft},
    };
    return table;
}

int ProjectMigration::oldestVersion()
{
    return steps().front().fromVersion;
}

int ProjectMigration::currentVersion()
{
    return steps().back().fromVersion + 1;
}

void ProjectMigration::migrate(nlohmann::ordered_json& document, int fromVersion)
{
    if (fromVersion < oldestVersion() || fromVersion > currentVersion())
        throw InputError("project format version", fromVersion, "",
                         std::to_string(oldestVersion()) + " .. " + std::to_string(currentVersion()));
    for (const Step& step : steps()) {
        if (step.fromVersion >= fromVersion)
            step.apply(document);
    }
    if (document.is_object())
        document["format_version"] = currentVersion();
}

} // namespace Airwright::Core::Project
