#include "airwright/ui/EditCasesCommand.h"

#include "airwright/ui/ProjectDocument.h"

namespace Airwright::Ui {

EditCasesCommand::EditCasesCommand(ProjectDocument* document, std::vector<Core::Chain::DesignCase> newValue)
    : ValueCommand(document, document->project().unit.cases, std::move(newValue), QStringLiteral("edit design cases"))
{
}

void EditCasesCommand::apply(const std::vector<Core::Chain::DesignCase>& value)
{
    document()->setCases(value);
}

} // namespace Airwright::Ui
