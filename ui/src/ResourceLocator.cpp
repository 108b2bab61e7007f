#include "airwright/ui/ResourceLocator.h"

#include <QCoreApplication>
#include <QDir>
#include <QFileInfo>

namespace Airwright::Ui {

namespace {
const QString kDemo = QStringLiteral("demo/demo-library.awproj");
} // namespace

QString ResourceLocator::resourcesDirectory()
{
    QStringList candidates;
#ifdef AIRWRIGHT_RESOURCES_DIR
    candidates << QString::fromUtf8(AIRWRIGHT_RESOURCES_DIR);
#endif
    const QString exe = QCoreApplication::applicationDirPath();
    // build/app/airwright -> resources/, or an installed share folder.
    candidates << QDir(exe).filePath(QStringLiteral("../resources"))
               << QDir(exe).filePath(QStringLiteral("../../resources"))
               << QDir(exe).filePath(QStringLiteral("../share/airwright"))
               << QDir(exe).filePath(QStringLiteral("resources"));
    for (const QString& dir : candidates)
        if (QFileInfo::exists(QDir(dir).filePath(kDemo)))
            return QDir::cleanPath(dir);
    return {};
}

QString ResourceLocator::demoProject()
{
    const QString dir = resourcesDirectory();
    return dir.isEmpty() ? QString() : QDir(dir).filePath(kDemo);
}

QString ResourceLocator::demoClimate()
{
    const QString dir = resourcesDirectory();
    if (dir.isEmpty())
        return {};
    const QString path = QDir(dir).filePath(QStringLiteral("demo/demo-climate.epw"));
    return QFileInfo::exists(path) ? path : QString();
}

} // namespace Airwright::Ui
