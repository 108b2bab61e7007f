#include "airwright/ui/MoveSectionCommand.h"

#include <algorithm>

namespace Airwright::Ui {

MoveSectionCommand::MoveSectionCommand(ProjectDocument* document, Core::Chain::PathKind path, int from, int to)
    : PathsCommand(document, QStringLiteral("move section"))
{
    auto& list = SectionPaths::path(unit(), path);
    const int n = static_cast<int>(list.size());
    if (from >= 0 && from < n) {
        setText(QStringLiteral("move %1").arg(QString::fromStdString(list[static_cast<std::size_t>(from)].id)));
        setSelectionAfter(QString::fromStdString(list[static_cast<std::size_t>(from)].id));
        const int target = std::clamp(to, 0, n - 1);
        auto section = list[static_cast<std::size_t>(from)];
        list.erase(list.begin() + from);
        list.insert(list.begin() + target, std::move(section));
    }
    finish();
}

} // namespace Airwright::Ui
