#pragma once
// The open project and its computed results. Every edit goes through an undo
// command that calls one of the setters below; the document recomputes the unit
// and tells the views what changed (the small notifier of the UI). Views never
// edit the project directly.

#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/project/LoadReport.h"
#include "airwright/core/project/Project.h"

#include <QObject>
#include <QString>
#include <QUndoStack>

#include <optional>

namespace Airwright::Ui {

class ProjectDocument : public QObject {
    Q_OBJECT
public:
    enum class Change { Info, Site, Airflows, Casing, Sections, Cases, Everything };
    Q_ENUM(Change)

    explicit ProjectDocument(QObject* parent = nullptr);

    const Core::Project::Project& project() const { return m_project; }
    // The last successful computation; empty while the project cannot be computed
    // (then computeError() says why in plain words).
    const std::optional<Core::Chain::UnitResult>& result() const { return m_result; }
    const QString& computeError() const { return m_computeError; }

    QUndoStack* undoStack() { return &m_undo; }

    // File state.
    const QString& filePath() const { return m_filePath; }
    bool isModified() const { return !m_undo.isClean(); }
    void load(const QString& path);               // throws Core::Error with a message
    void save(const QString& path);               // atomic; throws Core::Error
    void reset(const Core::Project::Project& project, const QString& path = {});
    // What the last load() had to say besides the project (ignored keys, migration).
    const Core::Project::LoadReport& loadReport() const { return m_loadReport; }
    // Marks the document as differing from its file without an undo command (a
    // project restored from the crash-recovery file has never been saved).
    void markModified();

    // Applied by undo commands only. Each replaces one part, recomputes and notifies.
    void setInfo(const Core::Project::ProjectInfo& info);
    void setSite(const Core::Chain::Site& site);
    void setAirflows(const Core::Chain::Airflows& airflows);
    void setCasing(const Core::Chain::Casing& casing);
    void setPaths(const std::vector<Core::Chain::Section>& supply, const std::vector<Core::Chain::Section>& extract);
    void setCases(const std::vector<Core::Chain::DesignCase>& cases);

    // Selection shared by the views (section id, empty for none).
    const QString& selectedSection() const { return m_selected; }
    void selectSection(const QString& id);

signals:
    void changed(Airwright::Ui::ProjectDocument::Change what);
    void resultsChanged();
    void selectionChanged(const QString& id);
    void filePathChanged(const QString& path);

private:
    void recompute();

    Core::Project::Project m_project;
    std::optional<Core::Chain::UnitResult> m_result;
    QString m_computeError;
    QString m_filePath;
    QString m_selected;
    Core::Project::LoadReport m_loadReport;
    QUndoStack m_undo;
};

} // namespace Airwright::Ui
