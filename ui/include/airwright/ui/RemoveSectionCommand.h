#pragma once

#include "airwright/ui/PathsCommand.h"

namespace Airwright::Ui {

// Removes a section by id; a coupled section goes from both paths at once.
class RemoveSectionCommand : public PathsCommand {
public:
    RemoveSectionCommand(ProjectDocument* document, const std::string& id);
};

} // namespace Airwright::Ui
