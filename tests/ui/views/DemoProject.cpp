#include "DemoProject.h"

#include "airwright/core/project/ProjectFile.h"
#include "airwright/ui/ProjectDocument.h"

#include <gtest/gtest.h>

#include <filesystem>

namespace Airwright::Ui::TestSupport {

Core::Project::Project DemoProject::load()
{
    Core::Project::LoadReport report;
    return Core::Project::ProjectFile::load(
        std::filesystem::path(AIRWRIGHT_SOURCE_DIR) / "resources" / "demo" / "demo-library.awproj", report);
}

void DemoProject::open(ProjectDocument& document)
{
    document.reset(load());
}

void DemoProject::editSupplySection(ProjectDocument& document, const std::string& id,
                                    const std::function<void(Core::Chain::Section&)>& edit)
{
    auto supply = document.project().unit.supply;
    bool found = false;
    for (auto& s : supply)
        if (s.id == id) {
            edit(s);
            found = true;
        }
    ASSERT_TRUE(found) << "no supply section " << id;
    document.setPaths(supply, document.project().unit.extract);
}

} // namespace Airwright::Ui::TestSupport
