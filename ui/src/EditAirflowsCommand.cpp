#include "airwright/ui/EditAirflowsCommand.h"

#include "airwright/ui/ProjectDocument.h"

namespace Airwright::Ui {

EditAirflowsCommand::EditAirflowsCommand(ProjectDocument* document, Core::Chain::Airflows newValue)
    : ValueCommand(document, document->project().unit.airflows, std::move(newValue), QStringLiteral("edit airflows"))
{
}

void EditAirflowsCommand::apply(const Core::Chain::Airflows& value)
{
    document()->setAirflows(value);
}

} // namespace Airwright::Ui
