#include "airwright/ui/EditSectionCommand.h"

#include "airwright/ui/ProjectDocument.h"

#include <variant>

namespace Airwright::Ui {

using namespace Airwright::Core;

EditSectionCommand::EditSectionCommand(ProjectDocument* document, const std::string& id, const Chain::Section& edited)
    : PathsCommand(document, QStringLiteral("edit %1").arg(QString::fromStdString(id)))
{
    auto& u = unit();
    bool found = false;
    for (auto* list : {&u.supply, &u.extract}) {
        for (auto& section : *list) {
            if (section.id != id)
                continue;
            if (std::holds_alternative<Chain::CoupledSide>(section.spec)) {
                section.id = edited.id; // the marker follows a rename
            } else if (!found) {
                section = edited;
                found = true;
            }
        }
    }
    if (found && document->selectedSection() == QString::fromStdString(id))
        setSelectionAfter(QString::fromStdString(edited.id));
    if (!found) {
        // Nothing to edit: leave the paths as they were.
        u.supply = document->project().unit.supply;
        u.extract = document->project().unit.extract;
    }
    finish();
}

} // namespace Airwright::Ui
