#pragma once
// The program's remembered choices (units, palette, recent files, window
// geometry, first-start flags) over QSettings. Tests and the screenshot mode give
// their own settings file so they never touch the user's.

#include "airwright/ui/UnitSystem.h"

#include <QByteArray>
#include <QString>
#include <QStringList>

#include <memory>

class QSettings;

namespace Airwright::Ui {

class AppSettings {
public:
    static constexpr int kMaxRecentFiles = 8;

    // Empty file: the user's settings (organisation and application name).
    explicit AppSettings(const QString& file = {});
    ~AppSettings();
    AppSettings(const AppSettings&) = delete;
    AppSettings& operator=(const AppSettings&) = delete;

    UnitSystem::System unitSystem() const;
    void setUnitSystem(UnitSystem::System system);
    bool airflowInLitresPerSecond() const;
    void setAirflowInLitresPerSecond(bool litres);
    bool darkPalette() const;
    void setDarkPalette(bool dark);

    QStringList recentFiles() const;
    void addRecentFile(const QString& path); // most recent first, no duplicates
    void removeRecentFile(const QString& path);
    void clearRecentFiles();

    QByteArray windowGeometry() const;
    QByteArray windowState() const;
    void setWindow(const QByteArray& geometry, const QByteArray& state);

    bool firstStartDone() const;
    void setFirstStartDone();
    bool cautionsShown() const;
    void setCautionsShown();

    void sync();

    // The store itself, for views that keep their own group of values in it
    // (the heat recovery comparison's inputs).
    QSettings* store() const { return m_settings.get(); }

private:
    std::unique_ptr<QSettings> m_settings;
};

} // namespace Airwright::Ui
