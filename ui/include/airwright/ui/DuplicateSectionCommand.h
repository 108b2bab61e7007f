#pragma once

#include "airwright/ui/PathsCommand.h"

namespace Airwright::Ui {

// Copies a section under a fresh id right after (downstream of) the original and
// selects the copy. A coupled section is copied with its marker.
class DuplicateSectionCommand : public PathsCommand {
public:
    DuplicateSectionCommand(ProjectDocument* document, Core::Chain::PathKind path, int index);

    const std::string& copyId() const { return m_id; }

private:
    std::string m_id;
};

} // namespace Airwright::Ui
