#pragma once
// The project File > New starts from: a small balanced supply and extract unit
// with plate heat recovery and a winter and a summer case, so there is something
// computed to edit from the first moment.

#include "airwright/core/project/Project.h"

namespace Airwright::Ui {

class ProjectTemplate {
public:
    static Core::Project::Project newProject();
};

} // namespace Airwright::Ui
