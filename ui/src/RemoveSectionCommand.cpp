#include "airwright/ui/RemoveSectionCommand.h"

#include <algorithm>

namespace Airwright::Ui {

RemoveSectionCommand::RemoveSectionCommand(ProjectDocument* document, const std::string& id)
    : PathsCommand(document, QStringLiteral("remove %1").arg(QString::fromStdString(id)))
{
    auto same = [&](const Core::Chain::Section& s) { return s.id == id; };
    auto& u = unit();
    u.supply.erase(std::remove_if(u.supply.begin(), u.supply.end(), same), u.supply.end());
    u.extract.erase(std::remove_if(u.extract.begin(), u.extract.end(), same), u.extract.end());
    setSelectionAfter({});
    finish();
}

} // namespace Airwright::Ui
