#include "airwright/ui/RecoveryFile.h"

#include "airwright/core/project/ProjectFile.h"

#include <QDir>
#include <QFile>
#include <QSaveFile>
#include <QStandardPaths>

namespace Airwright::Ui {

namespace {

bool writeAtomically(const QString& path, const QByteArray& bytes, QString* error)
{
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly) || file.write(bytes) != bytes.size() || !file.commit()) {
        if (error)
            *error = QStringLiteral("%1: %2").arg(path, file.errorString());
        return false;
    }
    return true;
}

} // namespace

RecoveryFile::RecoveryFile(const QString& directory)
    : m_directory(directory.isEmpty() ? QStandardPaths::writableLocation(QStandardPaths::AppDataLocation) : directory)
{
}

QString RecoveryFile::path() const
{
    return QDir(m_directory).filePath(QStringLiteral("recovery.awproj"));
}

QString RecoveryFile::sourcePath() const
{
    return QDir(m_directory).filePath(QStringLiteral("recovery.source"));
}

bool RecoveryFile::exists() const
{
    return QFile::exists(path());
}

bool RecoveryFile::write(const Core::Project::Project& project, const QString& originalPath, QString* error) const
{
    if (!QDir().mkpath(m_directory)) {
        if (error)
            *error = QStringLiteral("cannot create the folder %1").arg(m_directory);
        return false;
    }
    // The text is written even if the project has a problem: a recovery copy is
    // for getting work back, not for handing over.
    const std::string text = Core::Project::ProjectFile::serialize(project);
    return writeAtomically(sourcePath(), originalPath.toUtf8(), error)
           && writeAtomically(path(), QByteArray::fromStdString(text), error);
}

RecoveryFile::Contents RecoveryFile::read() const
{
    Core::Project::LoadReport report;
    Contents contents;
    contents.project = Core::Project::ProjectFile::load(QFile::encodeName(path()).toStdString(), report);
    QFile source(sourcePath());
    if (source.open(QIODevice::ReadOnly))
        contents.originalPath = QString::fromUtf8(source.readAll());
    return contents;
}

void RecoveryFile::remove() const
{
    QFile::remove(path());
    QFile::remove(sourcePath());
}

} // namespace Airwright::Ui
