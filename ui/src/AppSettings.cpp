#include "airwright/ui/AppSettings.h"

#include <QDir>
#include <QFileInfo>
#include <QSettings>

namespace Airwright::Ui {

namespace {
const QString kUnits = QStringLiteral("display/units");
const QString kLitres = QStringLiteral("display/airflowLitresPerSecond");
const QString kDark = QStringLiteral("display/darkPalette");
const QString kRecent = QStringLiteral("files/recent");
const QString kGeometry = QStringLiteral("window/geometry");
const QString kState = QStringLiteral("window/state");
const QString kFirstStart = QStringLiteral("start/firstStartDone");
const QString kCautions = QStringLiteral("start/cautionsShown");
} // namespace

AppSettings::AppSettings(const QString& file)
    : m_settings(file.isEmpty() ? std::make_unique<QSettings>() : std::make_unique<QSettings>(file, QSettings::IniFormat))
{
}

AppSettings::~AppSettings() = default;

UnitSystem::System AppSettings::unitSystem() const
{
    return m_settings->value(kUnits).toString() == QLatin1String("IP") ? UnitSystem::System::IP
                                                                        : UnitSystem::System::SI;
}

void AppSettings::setUnitSystem(UnitSystem::System system)
{
    m_settings->setValue(kUnits, system == UnitSystem::System::IP ? QStringLiteral("IP") : QStringLiteral("SI"));
}

bool AppSettings::airflowInLitresPerSecond() const
{
    return m_settings->value(kLitres, false).toBool();
}

void AppSettings::setAirflowInLitresPerSecond(bool litres)
{
    m_settings->setValue(kLitres, litres);
}

bool AppSettings::darkPalette() const
{
    return m_settings->value(kDark, false).toBool();
}

void AppSettings::setDarkPalette(bool dark)
{
    m_settings->setValue(kDark, dark);
}

QStringList AppSettings::recentFiles() const
{
    return m_settings->value(kRecent).toStringList();
}

void AppSettings::addRecentFile(const QString& path)
{
    const QString absolute = QFileInfo(path).absoluteFilePath();
    QStringList list = recentFiles();
    list.removeAll(absolute);
    list.prepend(absolute);
    while (list.size() > kMaxRecentFiles)
        list.removeLast();
    m_settings->setValue(kRecent, list);
}

void AppSettings::removeRecentFile(const QString& path)
{
    QStringList list = recentFiles();
    list.removeAll(QFileInfo(path).absoluteFilePath());
    list.removeAll(path);
    m_settings->setValue(kRecent, list);
}

void AppSettings::clearRecentFiles()
{
    m_settings->remove(kRecent);
}

QByteArray AppSettings::windowGeometry() const
{
    return m_settings->value(kGeometry).toByteArray();
}

QByteArray AppSettings::windowState() const
{
    return m_settings->value(kState).toByteArray();
}

void AppSettings::setWindow(const QByteArray& geometry, const QByteArray& state)
{
    m_settings->setValue(kGeometry, geometry);
    m_settings->setValue(kState, state);
}

bool AppSettings::firstStartDone() const
{
    return m_settings->value(kFirstStart, false).toBool();
}

void AppSettings::setFirstStartDone()
{
    m_settings->setValue(kFirstStart, true);
}

bool AppSettings::cautionsShown() const
{
    return m_settings->value(kCautions, false).toBool();
}

void AppSettings::setCautionsShown()
{
    m_settings->setValue(kCautions, true);
}

void AppSettings::sync()
{
    m_settings->sync();
}

} // namespace Airwright::Ui
