#include "airwright/ui/AddSectionCommand.h"

#include <algorithm>

namespace Airwright::Ui {

using namespace Airwright::Core;

AddSectionCommand::AddSectionCommand(ProjectDocument* document, SectionCatalog::Entry entry, Chain::PathKind path,
                                     int index)
    : PathsCommand(document, QStringLiteral("add %1").arg(SectionCatalog::label(entry).toLower()))
{
    auto& u = unit();
    m_id = SectionPaths::uniqueId(u, SectionCatalog::baseId(entry).toStdString());
    const int at = std::clamp(index, 0, static_cast<int>(SectionPaths::path(u, path).size()));
    if (SectionCatalog::isCoupled(entry)) {
        const int counterpart = SectionPaths::counterpartIndex(u, path, at);
        const int supplyAt = path == Chain::PathKind::Supply ? at : counterpart;
        const int extractAt = path == Chain::PathKind::Supply ? counterpart : at;
        u.supply.insert(u.supply.begin() + supplyAt,
                        Chain::Section{m_id, SectionCatalog::defaultSpec(entry, Chain::PathKind::Supply)});
        u.extract.insert(u.extract.begin() + extractAt, Chain::Section{m_id, Chain::CoupledSide{}});
    } else {
        auto& list = SectionPaths::path(u, path);
        list.insert(list.begin() + at, Chain::Section{m_id, SectionCatalog::defaultSpec(entry, path)});
    }
    setSelectionAfter(QString::fromStdString(m_id));
    finish();
}

} // namespace Airwright::Ui
