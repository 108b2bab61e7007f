#pragma once
// Common ground of the commands that change the section lists: each holds both
// paths before and after the edit (small values) and the selection to restore,
// and applies them through ProjectDocument::setPaths. A command whose paths come
// out unchanged marks itself obsolete, so QUndoStack::push drops it.

#include "airwright/ui/SectionPaths.h"

#include <QString>
#include <QUndoCommand>

namespace Airwright::Ui {

class ProjectDocument;

class PathsCommand : public QUndoCommand {
public:
    void redo() override;
    void undo() override;

    const SectionPaths::Path& newSupply() const { return m_newSupply; }
    const SectionPaths::Path& newExtract() const { return m_newExtract; }

protected:
    // Takes the current paths as both old and new; the derived class edits the new
    // ones through unit() and then calls finish().
    PathsCommand(ProjectDocument* document, const QString& text);

    Core::Chain::AirHandlingUnit& unit() { return m_unit; }
    void setSelectionAfter(const QString& id) { m_selectionAfter = id; }
    void finish();

private:
    ProjectDocument* m_document;
    Core::Chain::AirHandlingUnit m_unit; // the unit after the edit (paths only are applied)
    SectionPaths::Path m_oldSupply;
    SectionPaths::Path m_oldExtract;
    SectionPaths::Path m_newSupply;
    SectionPaths::Path m_newExtract;
    QString m_selectionBefore;
    QString m_selectionAfter;
};

} // namespace Airwright::Ui
