#include "airwright/ui/EditCasingCommand.h"

#include "airwright/ui/ProjectDocument.h"

namespace Airwright::Ui {

EditCasingCommand::EditCasingCommand(ProjectDocument* document, Core::Chain::Casing newValue)
    : ValueCommand(document, document->project().unit.casing, std::move(newValue), QStringLiteral("edit casing"))
{
}

void EditCasingCommand::apply(const Core::Chain::Casing& value)
{
    document()->setCasing(value);
}

} // namespace Airwright::Ui
