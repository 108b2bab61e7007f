#include "airwright/ui/EditInfoCommand.h"

#include "airwright/ui/ProjectDocument.h"

namespace Airwright::Ui {

EditInfoCommand::EditInfoCommand(ProjectDocument* document, Core::Project::ProjectInfo newValue)
    : ValueCommand(document, document->project().info, std::move(newValue), QStringLiteral("edit project information"))
{
}

void EditInfoCommand::apply(const Core::Project::ProjectInfo& value)
{
    document()->setInfo(value);
}

} // namespace Airwright::Ui
