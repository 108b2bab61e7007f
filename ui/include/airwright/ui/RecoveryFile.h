#pragma once
// The crash-recovery copy of an unsaved project. While the document is modified
// the window writes it every minute; a clean save, undoing back to the saved
// state and a normal exit remove it. Finding one at start therefore means the
// previous run ended without saving, and the window offers to restore it.

#include "airwright/core/project/Project.h"

#include <QString>

namespace Airwright::Ui {

class RecoveryFile {
public:
    struct Contents {
        Core::Project::Project project;
        QString originalPath; // the file the project came from; empty if never saved
    };

    // Empty directory: the program's data folder (QStandardPaths::AppDataLocation).
    explicit RecoveryFile(const QString& directory = {});

    QString path() const;       // .../recovery.awproj
    QString sourcePath() const; // .../recovery.source: the original file name
    bool exists() const;

    // Writes atomically (QSaveFile). Returns false and says why in error.
    bool write(const Core::Project::Project& project, const QString& originalPath, QString* error = nullptr) const;
    // Throws Core::Error (ProjectFileError) when the copy cannot be read.
    Contents read() const;
    void remove() const;

private:
    QString m_directory;
};

} // namespace Airwright::Ui
