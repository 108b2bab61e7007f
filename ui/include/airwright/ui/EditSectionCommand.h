#pragma once

#include "airwright/ui/PathsCommand.h"

namespace Airwright::Ui {

// Replaces the described section with id `id` by `edited` (new inputs, maybe a
// new id). A renamed coupled section renames its marker too, and the selection
// follows the new id. An edit equal to the section as it is pushes nothing.
class EditSectionCommand : public PathsCommand {
public:
    EditSectionCommand(ProjectDocument* document, const std::string& id, const Core::Chain::Section& edited);
};

} // namespace Airwright::Ui
