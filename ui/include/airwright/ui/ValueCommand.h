#pragma once
// Common ground of the commands that replace one part of the project (info, site,
// airflows, casing, cases): the old and new values, applied through the
// document's setter. An edit that changes nothing marks itself obsolete, so
// QUndoStack::push drops it instead of recording a step that does nothing.

#include <QString>
#include <QUndoCommand>

#include <utility>

namespace Airwright::Ui {

class ProjectDocument;

template <class T>
class ValueCommand : public QUndoCommand {
public:
    void redo() override { apply(m_new); }
    void undo() override { apply(m_old); }

    const T& oldValue() const { return m_old; }
    const T& newValue() const { return m_new; }

protected:
    ValueCommand(ProjectDocument* document, T oldValue, T newValue, const QString& text)
        : QUndoCommand(text), m_document(document), m_old(std::move(oldValue)), m_new(std::move(newValue))
    {
        setObsolete(m_old == m_new);
    }

    ProjectDocument* document() const { return m_document; }
    virtual void apply(const T& value) = 0;

private:
    ProjectDocument* m_document;
    T m_old;
    T m_new;
};

} // namespace Airwright::Ui
