#pragma once

#include "airwright/core/project/Project.h"
#include "airwright/ui/ValueCommand.h"

namespace Airwright::Ui {

// Replaces the project information (name, reference, designer, ...).
class EditInfoCommand : public ValueCommand<Core::Project::ProjectInfo> {
public:
    EditInfoCommand(ProjectDocument* document, Core::Project::ProjectInfo newValue);

protected:
    void apply(const Core::Project::ProjectInfo& value) override;
};

} // namespace Airwright::Ui
