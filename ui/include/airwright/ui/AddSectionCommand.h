#pragma once

#include "airwright/ui/PathsCommand.h"
#include "airwright/ui/SectionCatalog.h"

namespace Airwright::Ui {

// Adds a new section of a catalogue type at `index` of a path (clamped to the
// path) under a fresh id, and selects it. A coupled type (heat recovery, mixing)
// puts its description in the supply path and its marker in the extract path,
// whichever path it was dropped on.
class AddSectionCommand : public PathsCommand {
public:
    AddSectionCommand(ProjectDocument* document, SectionCatalog::Entry entry, Core::Chain::PathKind path, int index);

    const std::string& addedId() const { return m_id; }

private:
    std::string m_id;
};

} // namespace Airwright::Ui
