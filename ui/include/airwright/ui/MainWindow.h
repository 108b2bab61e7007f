#pragma once
// The program's window: the unit drawing and the result views in the middle, the
// section types on the left, the section and project editors on the right, the
// design cases below; File, Edit, View and Help menus. It owns the document, the
// unit system and the settings, autosaves an unsaved project to a recovery file
// and offers it back after a crash.

#include <QMainWindow>
#include <QString>

#include <functional>
#include <memory>
#include <vector>

class QAction;
class QActionGroup;
class QDockWidget;
class QLabel;
class QMenu;
class QTabWidget;
class QTimer;

namespace Airwright::Ui {

class AppSettings;
class CasesEditor;
class ProjectDocument;
class ProjectEditor;
class RecoveryFile;
class SectionEditor;
class SectionPalette;
class UnitDrawing;
class UnitPanel;
class UnitSystem;

class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    struct Options {
        bool interactive = true;  // message boxes and file dialogs; off in tests and screenshots
        bool autosave = true;     // the one-minute recovery timer
        QString settingsFile;     // empty: the user's settings
        QString recoveryDirectory; // empty: the program's data folder
        // Asked when a recovery file is found at start; empty: a message box
        // (interactive) or no (not interactive).
        std::function<bool(const QString& description)> confirmRestore;
    };

    explicit MainWindow(QWidget* parent = nullptr);
    explicit MainWindow(Options options, QWidget* parent = nullptr);
    ~MainWindow() override;

    // After construction: restore a crashed session if there is one and the user
    // agrees, else open `file`, else the demo on the very first start, else a new
    // project. Returns false (see lastError) when `file` could not be opened.
    bool startUp(const QString& file = {});

    bool openFile(const QString& path);  // errors: message box or lastError
    bool openDemo();
    void newProject();
    bool saveTo(const QString& path);
    bool offerRecovery();                // true when a recovered project was restored
    bool autosaveNow();                  // writes the recovery file if modified
    QString recoveryFilePath() const;
    const QString& lastError() const { return m_lastError; }

    ProjectDocument* document() const { return m_document; }
    UnitSystem* units() const { return m_units; }
    AppSettings* settings() const { return m_settings.get(); }
    UnitDrawing* drawing() const;
    UnitPanel* unitPanel() const { return m_unitPanel; }
    SectionEditor* sectionEditor() const { return m_sectionEditor; }
    ProjectEditor* projectEditor() const { return m_projectEditor; }
    CasesEditor* casesEditor() const { return m_casesEditor; }
    SectionPalette* palette() const { return m_palette; }
    QTabWidget* views() const { return m_views; }

    // Named parts of the window for the screenshot mode: each is made visible and
    // current before it is grabbed.
    struct Panel {
        QString fileName; // "section-editor" -> section-editor.png
        QWidget* widget;
    };
    std::vector<Panel> panels() const;
    void bringToFront(QWidget* panel);

    // Edit commands, also reachable from the menus and keys.
    void addSection(int catalogueEntry, int path);
    void deleteSelected();
    void duplicateSelected();
    void moveSelected(int step); // -1 upstream, +1 downstream
    void setUnitSystemIp(bool ip);
    void setDarkPalette(bool dark);

protected:
    void closeEvent(QCloseEvent* event) override;

private:
    void createActions();
    void createMenus();
    void createPanels();
    void updateTitle();
    void updateEditActions();
    void updateStatus();
    void updateRecentMenu();
    bool maybeSave();
    bool save();
    bool saveAs();
    void open();
    void reportError(const QString& title, const QString& message, const QStringList& details = {});
    void showCautions();
    void showAbout();

    Options m_options;
    std::unique_ptr<AppSettings> m_settings;
    std::unique_ptr<RecoveryFile> m_recovery;
    ProjectDocument* m_document;
    UnitSystem* m_units;
    QString m_untitledName;
    QString m_lastError;

    UnitPanel* m_unitPanel = nullptr;
    QTabWidget* m_views = nullptr;
    SectionPalette* m_palette = nullptr;
    SectionEditor* m_sectionEditor = nullptr;
    ProjectEditor* m_projectEditor = nullptr;
    CasesEditor* m_casesEditor = nullptr;
    QDockWidget* m_paletteDock = nullptr;
    QDockWidget* m_sectionDock = nullptr;
    QDockWidget* m_projectDock = nullptr;
    QDockWidget* m_casesDock = nullptr;
    QLabel* m_statusLabel = nullptr;
    QTimer* m_autosave = nullptr;

    QAction* m_newAction = nullptr;
    QAction* m_openAction = nullptr;
    QAction* m_openDemoAction = nullptr;
    QAction* m_saveAction = nullptr;
    QAction* m_saveAsAction = nullptr;
    QAction* m_exportAction = nullptr;
    QAction* m_quitAction = nullptr;
    QAction* m_undoAction = nullptr;
    QAction* m_redoAction = nullptr;
    QAction* m_deleteAction = nullptr;
    QAction* m_duplicateAction = nullptr;
    QAction* m_moveUpAction = nullptr;
    QAction* m_moveDownAction = nullptr;
    QAction* m_siAction = nullptr;
    QAction* m_ipAction = nullptr;
    QAction* m_litresAction = nullptr;
    QAction* m_darkAction = nullptr;
    QAction* m_cautionsAction = nullptr;
    QAction* m_aboutAction = nullptr;
    QMenu* m_recentMenu = nullptr;
};

} // namespace Airwright::Ui
