#include "airwright/ui/DuplicateSectionCommand.h"

#include <regex>
#include <variant>

namespace Airwright::Ui {

using namespace Airwright::Core;

namespace {

// "filter-3" copies as "filter-4" (or the next free), not "filter-3-2".
std::string baseOf(const std::string& id)
{
    static const std::regex numbered("(.*)-[0-9]+");
    std::smatch match;
    if (std::regex_match(id, match, numbered))
        return match[1].str();
    return id;
}

} // namespace

DuplicateSectionCommand::DuplicateSectionCommand(ProjectDocument* document, Chain::PathKind path, int index)
    : PathsCommand(document, QStringLiteral("duplicate section"))
{
    auto& u = unit();
    const auto& list = SectionPaths::path(u, path);
    if (index < 0 || index >= static_cast<int>(list.size())) {
        finish();
        return;
    }
    const std::string id = list[static_cast<std::size_t>(index)].id;
    const Chain::Section* original = SectionPaths::described(u, id);
    if (!original) {
        finish();
        return;
    }
    m_id = SectionPaths::uniqueId(u, baseOf(id));
    setText(QStringLiteral("duplicate %1").arg(QString::fromStdString(id)));
    Chain::Section copy{m_id, original->spec};
    if (Chain::isCoupled(copy.spec)) {
        const int supplyIndex = SectionPaths::indexOf(u.supply, id);
        const int markerAt = SectionPaths::counterpartIndex(u, Chain::PathKind::Supply, supplyIndex + 1);
        u.supply.insert(u.supply.begin() + supplyIndex + 1, copy);
        u.extract.insert(u.extract.begin() + markerAt, Chain::Section{m_id, Chain::CoupledSide{}});
    } else {
        auto& target = SectionPaths::path(u, path);
        target.insert(target.begin() + index + 1, copy);
    }
    setSelectionAfter(QString::fromStdString(m_id));
    finish();
}

} // namespace Airwright::Ui
