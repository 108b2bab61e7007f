#include "airwright/ui/PathsCommand.h"

#include "airwright/ui/ProjectDocument.h"

namespace Airwright::Ui {

PathsCommand::PathsCommand(ProjectDocument* document, const QString& text)
    : QUndoCommand(text),
      m_document(document),
      m_unit(document->project().unit),
      m_oldSupply(m_unit.supply),
      m_oldExtract(m_unit.extract),
      m_selectionBefore(document->selectedSection()),
      m_selectionAfter(document->selectedSection())
{
}

void PathsCommand::finish()
{
    m_newSupply = m_unit.supply;
    m_newExtract = m_unit.extract;
    setObsolete(m_newSupply == m_oldSupply && m_newExtract == m_oldExtract);
}

void PathsCommand::redo()
{
    m_document->setPaths(m_newSupply, m_newExtract);
    m_document->selectSection(m_selectionAfter);
}

void PathsCommand::undo()
{
    m_document->setPaths(m_oldSupply, m_oldExtract);
    m_document->selectSection(m_selectionBefore);
}

} // namespace Airwright::Ui
