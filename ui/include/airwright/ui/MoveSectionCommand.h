#pragma once

#include "airwright/ui/PathsCommand.h"

namespace Airwright::Ui {

// Moves a section within its path so that it ends at index `to` (clamped). Only
// the entry in the given path moves: a coupled section's other half stays.
class MoveSectionCommand : public PathsCommand {
public:
    MoveSectionCommand(ProjectDocument* document, Core::Chain::PathKind path, int from, int to);
};

} // namespace Airwright::Ui
