#include "airwright/ui/EditSiteCommand.h"

#include "airwright/ui/ProjectDocument.h"

namespace Airwright::Ui {

EditSiteCommand::EditSiteCommand(ProjectDocument* document, Core::Chain::Site newValue)
    : ValueCommand(document, document->project().unit.site, std::move(newValue), QStringLiteral("edit site"))
{
}

void EditSiteCommand::apply(const Core::Chain::Site& value)
{
    document()->setSite(value);
}

} // namespace Airwright::Ui
