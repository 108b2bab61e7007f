#pragma once
// The demo project (resources/demo/demo-library.awproj) for the view tests, and
// small helpers to edit one of its sections the way an undo command would.

#include "airwright/core/project/Project.h"

#include <functional>
#include <string>

namespace Airwright::Ui {
class ProjectDocument;
}

namespace Airwright::Ui::TestSupport {

class DemoProject {
public:
    static Core::Project::Project load();
    // Loads the demo project into the document (ProjectDocument::reset).
    static void open(ProjectDocument& document);
    // Replaces the section `id` on the supply path through ProjectDocument::setPaths,
    // after `edit` changed its spec. Fails the test when there is no such section.
    static void editSupplySection(ProjectDocument& document, const std::string& id,
                                  const std::function<void(Core::Chain::Section&)>& edit);
};

} // namespace Airwright::Ui::TestSupport
