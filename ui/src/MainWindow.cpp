#include "airwright/ui/MainWindow.h"

#include "airwright/core/InputError.h"
#include "airwright/core/project/ProjectFileError.h"
#include "airwright/ui/AddSectionCommand.h"
#include "airwright/ui/AppSettings.h"
#include "airwright/ui/Appearance.h"
#include "airwright/ui/CasesEditor.h"
#include "airwright/ui/CautionsDialog.h"
#include "airwright/ui/DuplicateSectionCommand.h"
#include "airwright/ui/MoveSectionCommand.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/ProjectEditor.h"
#include "airwright/ui/ProjectTemplate.h"
#include "airwright/ui/RecoveryFile.h"
#include "airwright/ui/RemoveSectionCommand.h"
#include "airwright/ui/ResourceLocator.h"
#include "airwright/ui/SectionCatalog.h"
#include "airwright/ui/SectionEditor.h"
#include "airwright/ui/SectionPalette.h"
#include "airwright/ui/SectionPaths.h"
#include "airwright/ui/UnitDrawing.h"
#include "airwright/ui/UnitPanel.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/FindingsView.h"
#include "airwright/ui/views/HeatRecoveryComparisonView.h"
#include "airwright/ui/views/MeasuringPointsView.h"
#include "airwright/ui/views/PressureProfileView.h"
#include "airwright/ui/views/PsychroChartView.h"
#include "airwright/ui/export/ScheduleExport.h"
#include "airwright/ui/views/ScheduleView.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QAction>
#include <QDir>
#include <QActionGroup>
#include <QApplication>
#include <QCloseEvent>
#include <QDockWidget>
#include <QFileDialog>
#include <QFileInfo>
#include <QLabel>
#include <QMenuBar>
#include <QMessageBox>
#include <QRegularExpression>
#include <QSplitter>
#include <QStatusBar>
#include <QTabWidget>
#include <QTextStream>
#include <QTimer>
#include <QToolBar>
#include <QUndoStack>

namespace Airwright::Ui {

using namespace Airwright::Core;

namespace {

constexpr int kAutosaveMilliseconds = 60 * 1000;
const QString kFileFilter = QStringLiteral("Airwright projects (*.awproj);;All files (*)");

QStringList problemLines(const Error& e)
{
    if (const auto* file = dynamic_cast<const Project::ProjectFileError*>(&e)) {
        QStringList lines;
        for (const auto& line : file->errors())
            lines << QString::fromStdString(line);
        return lines;
    }
    return {QString::fromStdString(e.what())};
}

} // namespace

MainWindow::MainWindow(QWidget* parent) : MainWindow(Options{}, parent) {}

MainWindow::MainWindow(Options options, QWidget* parent)
    : QMainWindow(parent),
      m_options(std::move(options)),
      m_settings(std::make_unique<AppSettings>(m_options.settingsFile)),
      m_recovery(std::make_unique<RecoveryFile>(m_options.recoveryDirectory)),
      m_document(new ProjectDocument(this)),
      m_units(new UnitSystem(this)),
      m_untitledName(tr("Untitled"))
{
    setObjectName(QStringLiteral("MainWindow"));
    m_units->setSystem(m_settings->unitSystem());
    m_units->setAirflowInLitresPerSecond(m_settings->airflowInLitresPerSecond());

    createPanels();
    createActions();
    createMenus();

    connect(m_document->undoStack(), &QUndoStack::cleanChanged, this, [this](bool clean) {
        updateTitle();
        // Back at the saved state: nothing left to recover.
        if (clean)
            m_recovery->remove();
    });
    connect(m_document->undoStack(), &QUndoStack::indexChanged, this, [this] { updateTitle(); });
    connect(m_document, &ProjectDocument::filePathChanged, this, [this] { updateTitle(); });
    connect(m_document, &ProjectDocument::selectionChanged, this, [this] { updateEditActions(); });
    connect(m_document, &ProjectDocument::changed, this, [this] { updateEditActions(); });
    connect(m_document, &ProjectDocument::resultsChanged, this, [this] { updateStatus(); });

    m_autosave = new QTimer(this);
    m_autosave->setInterval(kAutosaveMilliseconds);
    connect(m_autosave, &QTimer::timeout, this, [this] { autosaveNow(); });
    if (m_options.autosave)
        m_autosave->start();

    resize(1600, 1000);
    if (!m_settings->windowGeometry().isEmpty())
        restoreGeometry(m_settings->windowGeometry());
    if (!m_settings->windowState().isEmpty())
        restoreState(m_settings->windowState());
    updateTitle();
    updateEditActions();
    updateStatus();
}

MainWindow::~MainWindow()
{
    // The undo stack announces its clearing while the document is destroyed; by
    // then this window's members are gone, so stop listening first (and a window
    // torn down is not a clean exit: the recovery file, if any, stays). The panels
    // go before the document they point to.
    m_autosave->stop();
    disconnect(m_document->undoStack(), nullptr, this, nullptr);
    disconnect(m_document, nullptr, this, nullptr);
    qDeleteAll(findChildren<QDockWidget*>(Qt::FindDirectChildrenOnly));
    delete takeCentralWidget();
}

UnitDrawing* MainWindow::drawing() const
{
    return m_unitPanel->drawing();
}

void MainWindow::createPanels()
{
    m_unitPanel = new UnitPanel(m_document, m_units, this);
    m_views = new QTabWidget(this);
    m_views->setDocumentMode(true);
    auto* chart = new PsychroChartView(m_document, m_units, m_views);
    auto* profile = new PressureProfileView(m_document, m_units, m_views);
    auto* schedule = new ScheduleView(m_document, m_units, m_views);
    auto* findings = new FindingsView(m_document, m_units, m_views);
    auto* comparison = new HeatRecoveryComparisonView(m_document, m_units, m_views);
    comparison->setSettingsStore(m_settings->store());
    chart->setObjectName(QStringLiteral("psychrometric-chart"));
    profile->setObjectName(QStringLiteral("pressure-profile"));
    schedule->setObjectName(QStringLiteral("section-schedule"));
    findings->setObjectName(QStringLiteral("findings"));
    comparison->setObjectName(QStringLiteral("heat-recovery-comparison"));
    m_views->addTab(chart, tr("Psychrometric chart"));
    m_views->addTab(profile, tr("Pressure profile"));
    m_views->addTab(schedule, tr("Section schedule"));
    auto* points = new MeasuringPointsView(m_document, m_units, m_views);
    points->setObjectName(QStringLiteral("measuring-points"));
    m_views->addTab(points, tr("Measuring points"));
    m_views->addTab(findings, tr("Findings"));
    m_views->addTab(comparison, tr("Heat recovery comparison"));
    connect(m_unitPanel, &UnitPanel::caseIndexChanged, this, [profile, schedule, this](int index) {
        profile->setCaseIndex(index);
        schedule->setCaseIndex(index);
        m_sectionEditor->setCaseIndex(index);
    });

    auto* splitter = new QSplitter(Qt::Vertical, this);
    splitter->setObjectName(QStringLiteral("centralSplitter"));
    splitter->addWidget(m_unitPanel);
    splitter->addWidget(m_views);
    splitter->setStretchFactor(0, 4);
    splitter->setStretchFactor(1, 5);
    splitter->setChildrenCollapsible(false);
    setCentralWidget(splitter);

    auto dock = [this](const QString& title, const QString& name, QWidget* content, Qt::DockWidgetArea area) {
        auto* d = new QDockWidget(title, this);
        d->setObjectName(name);
        d->setWidget(content);
        d->setFeatures(QDockWidget::DockWidgetMovable | QDockWidget::DockWidgetFloatable
                       | QDockWidget::DockWidgetClosable);
        addDockWidget(area, d);
        return d;
    };
    m_palette = new SectionPalette(this);
    m_paletteDock = dock(tr("Section types"), QStringLiteral("paletteDock"), m_palette, Qt::LeftDockWidgetArea);
    m_sectionEditor = new SectionEditor(m_document, m_units, this);
    m_sectionDock = dock(tr("Section"), QStringLiteral("sectionDock"), m_sectionEditor, Qt::RightDockWidgetArea);
    m_projectEditor = new ProjectEditor(m_document, m_units, this);
    m_projectDock =
        dock(tr("Project, site and airflows"), QStringLiteral("projectDock"), m_projectEditor, Qt::RightDockWidgetArea);
    tabifyDockWidget(m_sectionDock, m_projectDock);
    m_sectionDock->raise();
    m_casesEditor = new CasesEditor(m_document, m_units, this);
    m_casesDock = dock(tr("Design cases"), QStringLiteral("casesDock"), m_casesEditor, Qt::BottomDockWidgetArea);
    setCorner(Qt::BottomLeftCorner, Qt::LeftDockWidgetArea);
    setCorner(Qt::BottomRightCorner, Qt::RightDockWidgetArea);
    resizeDocks({m_paletteDock}, {205}, Qt::Horizontal);
    resizeDocks({m_sectionDock}, {400}, Qt::Horizontal);
    resizeDocks({m_casesDock}, {175}, Qt::Vertical);

    connect(m_palette, &SectionPalette::addRequested, this,
            [this](SectionCatalog::Entry entry, Chain::PathKind path) {
                const auto& entries = SectionCatalog::entries();
                const auto it = std::find(entries.begin(), entries.end(), entry);
                addSection(static_cast<int>(it - entries.begin()), static_cast<int>(path));
            });
    connect(m_unitPanel->drawing(), &UnitDrawing::sectionActivated, this, [this] {
        m_sectionDock->show();
        m_sectionDock->raise();
    });

    m_statusLabel = new QLabel(this);
    statusBar()->addPermanentWidget(m_statusLabel);
}

void MainWindow::createActions()
{
    m_newAction = new QAction(tr("&New"), this);
    m_newAction->setShortcut(QKeySequence::New);
    m_newAction->setStatusTip(tr("Start a new project from a small supply and extract unit."));
    connect(m_newAction, &QAction::triggered, this, [this] {
        if (maybeSave())
            newProject();
    });
    m_openAction = new QAction(tr("&Open..."), this);
    m_openAction->setShortcut(QKeySequence::Open);
    connect(m_openAction, &QAction::triggered, this, [this] { open(); });
    m_openDemoAction = new QAction(tr("Open &Demo Project"), this);
    m_openDemoAction->setStatusTip(tr("Open a copy of the demo project (a library's supply and extract unit)."));
    connect(m_openDemoAction, &QAction::triggered, this, [this] {
        if (maybeSave())
            openDemo();
    });
    m_saveAction = new QAction(tr("&Save"), this);
    m_saveAction->setShortcut(QKeySequence::Save);
    connect(m_saveAction, &QAction::triggered, this, [this] { save(); });
    m_saveAsAction = new QAction(tr("Save &As..."), this);
    m_saveAsAction->setShortcut(QKeySequence::SaveAs);
    connect(m_saveAsAction, &QAction::triggered, this, [this] { saveAs(); });
    m_exportAction = new QAction(tr("&Export Section Schedule..."), this);
    m_exportAction->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_E));
    m_exportAction->setStatusTip(tr("Write the section schedule as PDF (A4 or Letter, in the display units) or CSV"));
    connect(m_exportAction, &QAction::triggered, this, [this] {
        const auto* view = findChild<HeatRecoveryComparisonView*>();
        const QString file =
            ScheduleExport::run(this, *m_document, m_units->system(), view ? view->currentResult() : nullptr);
        if (!file.isEmpty())
            statusBar()->showMessage(tr("Schedule written to %1").arg(QDir::toNativeSeparators(file)), 8000);
    });
    m_quitAction = new QAction(tr("&Quit"), this);
    m_quitAction->setShortcut(QKeySequence::Quit);
    m_quitAction->setMenuRole(QAction::QuitRole);
    connect(m_quitAction, &QAction::triggered, this, &QWidget::close);

    m_undoAction = m_document->undoStack()->createUndoAction(this, tr("&Undo"));
    m_undoAction->setShortcut(QKeySequence::Undo);
    m_redoAction = m_document->undoStack()->createRedoAction(this, tr("&Redo"));
    m_redoAction->setShortcut(QKeySequence::Redo);
    m_deleteAction = new QAction(tr("&Delete Section"), this);
    m_deleteAction->setShortcut(QKeySequence::Delete);
    m_deleteAction->setStatusTip(tr("Remove the selected section (a coupled section from both paths)."));
    connect(m_deleteAction, &QAction::triggered, this, [this] { deleteSelected(); });
    m_duplicateAction = new QAction(tr("D&uplicate Section"), this);
    m_duplicateAction->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_D));
    m_duplicateAction->setStatusTip(tr("Copy the selected section right after it, under a new id."));
    connect(m_duplicateAction, &QAction::triggered, this, [this] { duplicateSelected(); });
    m_moveUpAction = new QAction(tr("Move &Upstream"), this);
    m_moveUpAction->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_Up));
    m_moveUpAction->setStatusTip(tr("Move the selected section one place against the airflow."));
    connect(m_moveUpAction, &QAction::triggered, this, [this] { moveSelected(-1); });
    m_moveDownAction = new QAction(tr("Move Dow&nstream"), this);
    m_moveDownAction->setShortcut(QKeySequence(Qt::CTRL | Qt::Key_Down));
    m_moveDownAction->setStatusTip(tr("Move the selected section one place with the airflow."));
    connect(m_moveDownAction, &QAction::triggered, this, [this] { moveSelected(+1); });

    auto* unitGroup = new QActionGroup(this);
    m_siAction = new QAction(tr("&SI Units"), unitGroup);
    m_siAction->setCheckable(true);
    m_ipAction = new QAction(tr("&IP Units"), unitGroup);
    m_ipAction->setCheckable(true);
    (m_units->system() == UnitSystem::System::IP ? m_ipAction : m_siAction)->setChecked(true);
    connect(m_siAction, &QAction::triggered, this, [this] { setUnitSystemIp(false); });
    connect(m_ipAction, &QAction::triggered, this, [this] { setUnitSystemIp(true); });
    m_litresAction = new QAction(tr("Airflow in &l/s (SI)"), this);
    m_litresAction->setCheckable(true);
    m_litresAction->setChecked(m_units->airflowInLitresPerSecond());
    connect(m_litresAction, &QAction::toggled, this, [this](bool litres) {
        m_units->setAirflowInLitresPerSecond(litres);
        m_settings->setAirflowInLitresPerSecond(litres);
    });
    m_darkAction = new QAction(tr("&Dark Palette"), this);
    m_darkAction->setCheckable(true);
    m_darkAction->setChecked(m_settings->darkPalette());
    connect(m_darkAction, &QAction::toggled, this, [this](bool dark) { setDarkPalette(dark); });

    m_cautionsAction = new QAction(tr("&Cautions..."), this);
    connect(m_cautionsAction, &QAction::triggered, this, [this] { showCautions(); });
    m_aboutAction = new QAction(tr("&About Airwright"), this);
    m_aboutAction->setMenuRole(QAction::AboutRole);
    connect(m_aboutAction, &QAction::triggered, this, [this] { showAbout(); });

    // The drawing offers the section commands on its context menu.
    UnitDrawing* d = drawing();
    d->setContextMenuPolicy(Qt::ActionsContextMenu);
    d->addActions({m_duplicateAction, m_deleteAction, m_moveUpAction, m_moveDownAction});
}

void MainWindow::createMenus()
{
    QMenu* file = menuBar()->addMenu(tr("&File"));
    file->addAction(m_newAction);
    file->addAction(m_openAction);
    file->addAction(m_openDemoAction);
    m_recentMenu = file->addMenu(tr("Open &Recent"));
    file->addSeparator();
    file->addAction(m_saveAction);
    file->addAction(m_saveAsAction);
    file->addSeparator();
    file->addAction(m_exportAction);
    file->addSeparator();
    file->addAction(m_quitAction);
    updateRecentMenu();

    QMenu* edit = menuBar()->addMenu(tr("&Edit"));
    edit->addAction(m_undoAction);
    edit->addAction(m_redoAction);
    edit->addSeparator();
    edit->addAction(m_deleteAction);
    edit->addAction(m_duplicateAction);
    edit->addAction(m_moveUpAction);
    edit->addAction(m_moveDownAction);

    QMenu* view = menuBar()->addMenu(tr("&View"));
    view->addAction(m_siAction);
    view->addAction(m_ipAction);
    view->addAction(m_litresAction);
    view->addSeparator();
    view->addAction(m_darkAction);
    view->addSeparator();
    QMenu* panels = view->addMenu(tr("&Panels"));
    for (QDockWidget* d : {m_paletteDock, m_sectionDock, m_projectDock, m_casesDock})
        panels->addAction(d->toggleViewAction());

    QMenu* help = menuBar()->addMenu(tr("&Help"));
    help->addAction(m_cautionsAction);
    help->addAction(m_aboutAction);

    auto* tools = addToolBar(tr("File and edit"));
    tools->setObjectName(QStringLiteral("mainToolBar"));
    tools->setToolButtonStyle(Qt::ToolButtonTextOnly);
    tools->setMovable(false);
    for (QAction* a : {m_newAction, m_openAction, m_saveAction})
        tools->addAction(a);
    tools->addSeparator();
    for (QAction* a : {m_undoAction, m_redoAction})
        tools->addAction(a);
    tools->addSeparator();
    for (QAction* a : {m_duplicateAction, m_deleteAction, m_moveUpAction, m_moveDownAction})
        tools->addAction(a);
    tools->addSeparator();
    tools->addAction(m_siAction);
    tools->addAction(m_ipAction);
}

bool MainWindow::startUp(const QString& file)
{
    if (offerRecovery())
        return true;
    bool ok = true;
    if (!file.isEmpty()) {
        ok = openFile(file);
        if (!ok)
            newProject();
    } else if (!m_settings->firstStartDone()) {
        if (!openDemo())
            newProject();
    } else {
        newProject();
    }
    m_settings->setFirstStartDone();
    if (m_options.interactive && !m_settings->cautionsShown()) {
        m_settings->setCautionsShown();
        QTimer::singleShot(0, this, [this] { showCautions(); });
    }
    m_settings->sync();
    return ok;
}

bool MainWindow::offerRecovery()
{
    if (!m_recovery->exists())
        return false;
    RecoveryFile::Contents contents;
    try {
        contents = m_recovery->read();
    } catch (const Error& e) {
        QTextStream(stderr) << "recovery file " << m_recovery->path() << " cannot be read: " << e.what() << "\n";
        m_recovery->remove();
        return false;
    }
    const QString name = QString::fromStdString(contents.project.info.name);
    const QString description =
        tr("Airwright did not close normally last time. An unsaved copy of the project \"%1\"%2 was kept.\n\n"
           "Restore it?")
            .arg(name.isEmpty() ? tr("(no name)") : name,
                 contents.originalPath.isEmpty() ? QString() : tr(" (from %1)").arg(contents.originalPath));
    bool restore = false;
    if (m_options.confirmRestore)
        restore = m_options.confirmRestore(description);
    else if (m_options.interactive)
        restore = QMessageBox::question(this, tr("Restore unsaved work"), description,
                                        QMessageBox::Yes | QMessageBox::No, QMessageBox::Yes)
                  == QMessageBox::Yes;
    if (!restore) {
        m_recovery->remove();
        return false;
    }
    m_untitledName = tr("Recovered project");
    m_document->reset(contents.project, contents.originalPath);
    m_document->markModified();
    statusBar()->showMessage(tr("Restored the unsaved project; save it to keep it."), 10000);
    return true;
}

bool MainWindow::autosaveNow()
{
    if (!m_document->isModified())
        return false;
    QString error;
    if (!m_recovery->write(m_document->project(), m_document->filePath(), &error)) {
        QTextStream(stderr) << "autosave failed: " << error << "\n";
        return false;
    }
    return true;
}

QString MainWindow::recoveryFilePath() const
{
    return m_recovery->path();
}

void MainWindow::newProject()
{
    m_untitledName = tr("Untitled");
    m_document->reset(ProjectTemplate::newProject());
    m_document->selectSection({});
}

bool MainWindow::openDemo()
{
    const QString path = ResourceLocator::demoProject();
    if (path.isEmpty()) {
        reportError(tr("Demo project"), tr("The demo project (resources/demo/demo-library.awproj) was not found."));
        return false;
    }
    try {
        m_document->load(path);
    } catch (const Error& e) {
        reportError(tr("Demo project"), tr("The demo project could not be opened."), problemLines(e));
        return false;
    }
    // A copy: saving must never overwrite the demo in the program's folder.
    m_untitledName = tr("Demo project (copy)");
    m_document->reset(m_document->project(), {});
    return true;
}

bool MainWindow::openFile(const QString& path)
{
    try {
        m_document->load(path);
    } catch (const Error& e) {
        m_settings->removeRecentFile(path);
        updateRecentMenu();
        reportError(tr("Open project"), tr("%1 could not be opened:").arg(QFileInfo(path).fileName()),
                    problemLines(e));
        return false;
    }
    m_settings->addRecentFile(path);
    updateRecentMenu();
    const auto& report = m_document->loadReport();
    QStringList notes;
    if (report.migratedFromVersion)
        notes << tr("converted from format version %1").arg(*report.migratedFromVersion);
    if (!report.warnings.empty())
        notes << tr("unknown keys ignored: %1").arg(report.warnings.size());
    statusBar()->showMessage(notes.isEmpty() ? tr("Opened %1").arg(path)
                                             : tr("Opened %1 (%2)").arg(path, notes.join(QStringLiteral("; "))),
                             8000);
    return true;
}

void MainWindow::open()
{
    if (!maybeSave())
        return;
    const QString start = m_document->filePath().isEmpty() ? QString() : QFileInfo(m_document->filePath()).path();
    const QString path = QFileDialog::getOpenFileName(this, tr("Open project"), start, kFileFilter);
    if (!path.isEmpty())
        openFile(path);
}

bool MainWindow::saveTo(const QString& path)
{
    try {
        m_document->save(path);
    } catch (const Error& e) {
        reportError(tr("Save project"), tr("The project was not saved to %1:").arg(path), problemLines(e));
        return false;
    }
    m_recovery->remove();
    m_settings->addRecentFile(path);
    updateRecentMenu();
    statusBar()->showMessage(tr("Saved %1").arg(path), 5000);
    return true;
}

bool MainWindow::save()
{
    if (m_document->filePath().isEmpty())
        return saveAs();
    return saveTo(m_document->filePath());
}

bool MainWindow::saveAs()
{
    if (!m_options.interactive)
        return false;
    QString suggestion = m_document->filePath();
    if (suggestion.isEmpty()) {
        QString name = QString::fromStdString(m_document->project().info.name).trimmed();
        name.replace(QRegularExpression(QStringLiteral("[^A-Za-z0-9._-]+")), QStringLiteral("-"));
        suggestion = (name.isEmpty() ? QStringLiteral("unit") : name) + QStringLiteral(".awproj");
    }
    QString path = QFileDialog::getSaveFileName(this, tr("Save project as"), suggestion, kFileFilter);
    if (path.isEmpty())
        return false;
    if (QFileInfo(path).suffix().isEmpty())
        path += QStringLiteral(".awproj");
    return saveTo(path);
}

bool MainWindow::maybeSave()
{
    if (!m_document->isModified() || !m_options.interactive)
        return true;
    const QString name = m_document->filePath().isEmpty() ? m_untitledName
                                                           : QFileInfo(m_document->filePath()).fileName();
    const auto answer = QMessageBox::warning(this, tr("Unsaved changes"),
                                             tr("\"%1\" has changes that are not saved. Save them?").arg(name),
                                             QMessageBox::Save | QMessageBox::Discard | QMessageBox::Cancel,
                                             QMessageBox::Save);
    if (answer == QMessageBox::Save)
        return save();
    return answer == QMessageBox::Discard;
}

void MainWindow::closeEvent(QCloseEvent* event)
{
    if (!maybeSave()) {
        event->ignore();
        return;
    }
    m_settings->setWindow(saveGeometry(), saveState());
    m_settings->sync();
    m_recovery->remove();
    event->accept();
}

void MainWindow::reportError(const QString& title, const QString& message, const QStringList& details)
{
    m_lastError = details.isEmpty() ? message : message + QLatin1Char('\n') + details.join(QLatin1Char('\n'));
    if (!m_options.interactive) {
        QTextStream(stderr) << m_lastError << "\n";
        return;
    }
    QMessageBox box(QMessageBox::Critical, title, message, QMessageBox::Ok, this);
    // Every problem, so a file can be fixed in one pass; a long list also goes to
    // the details pane, which scrolls.
    constexpr int kShown = 15;
    QStringList shown = details.mid(0, kShown);
    if (details.size() > kShown)
        shown << tr("... and %1 more (see Show Details)").arg(details.size() - kShown);
    box.setInformativeText(shown.join(QLatin1Char('\n')));
    if (details.size() > kShown)
        box.setDetailedText(details.join(QLatin1Char('\n')));
    box.exec();
}

void MainWindow::updateTitle()
{
    const QString path = m_document->filePath();
    const QString name = path.isEmpty() ? m_untitledName : QFileInfo(path).fileName();
    setWindowTitle(tr("%1[*] - Airwright").arg(name));
    setWindowModified(m_document->isModified());
    m_saveAction->setEnabled(true);
}

void MainWindow::updateEditActions()
{
    if (!m_deleteAction)
        return;
    const auto place = drawing()->selectedPlace();
    const bool selected = place.has_value();
    m_deleteAction->setEnabled(selected);
    m_duplicateAction->setEnabled(selected);
    int count = 0;
    if (place)
        count = static_cast<int>(SectionPaths::path(m_document->project().unit, place->path).size());
    m_moveUpAction->setEnabled(selected && place->index > 0);
    m_moveDownAction->setEnabled(selected && place->index + 1 < count);
}

void MainWindow::updateStatus()
{
    if (!m_statusLabel)
        return;
    const auto& result = m_document->result();
    if (!result) {
        m_statusLabel->setText(tr("Not computed: %1").arg(MessageUnits::toDisplay(m_document->computeError(), *m_units)));
        m_statusLabel->setStyleSheet(QStringLiteral("color: #d03030;"));
        return;
    }
    int attention = 0;
    int total = 0;
    for (const auto& c : result->cases)
        for (const auto& f : c.findings) {
            ++total;
            if (f.severity != Severity::Info)
                ++attention;
        }
    m_statusLabel->setStyleSheet({});
    m_statusLabel->setText(tr("Design cases computed: %1.   Findings: %2, %3 needing attention.")
                               .arg(result->cases.size())
                               .arg(total)
                               .arg(attention));
}

void MainWindow::updateRecentMenu()
{
    if (!m_recentMenu)
        return;
    m_recentMenu->clear();
    const QStringList files = m_settings->recentFiles();
    int n = 0;
    for (const QString& path : files) {
        ++n;
        QAction* a = m_recentMenu->addAction(QStringLiteral("&%1 %2").arg(n).arg(QFileInfo(path).fileName()));
        a->setToolTip(path);
        a->setStatusTip(path);
        connect(a, &QAction::triggered, this, [this, path] {
            if (maybeSave())
                openFile(path);
        });
    }
    if (files.isEmpty()) {
        m_recentMenu->addAction(tr("(none yet)"))->setEnabled(false);
        return;
    }
    m_recentMenu->addSeparator();
    connect(m_recentMenu->addAction(tr("&Clear List")), &QAction::triggered, this, [this] {
        m_settings->clearRecentFiles();
        updateRecentMenu();
    });
}

void MainWindow::addSection(int catalogueEntry, int path)
{
    const auto& entries = SectionCatalog::entries();
    if (catalogueEntry < 0 || catalogueEntry >= static_cast<int>(entries.size()))
        return;
    const auto kind = static_cast<Chain::PathKind>(path);
    // After the selected section of that path, else at the path's end.
    int index = static_cast<int>(SectionPaths::path(m_document->project().unit, kind).size());
    const auto place = drawing()->selectedPlace();
    if (place && place->path == kind)
        index = place->index + 1;
    m_document->undoStack()->push(
        new AddSectionCommand(m_document, entries[static_cast<std::size_t>(catalogueEntry)], kind, index));
    drawing()->selectPlace({kind, SectionPaths::indexOf(SectionPaths::path(m_document->project().unit, kind),
                                                        m_document->selectedSection().toStdString())});
}

void MainWindow::deleteSelected()
{
    const QString id = m_document->selectedSection();
    if (id.isEmpty())
        return;
    m_document->undoStack()->push(new RemoveSectionCommand(m_document, id.toStdString()));
}

void MainWindow::duplicateSelected()
{
    const auto place = drawing()->selectedPlace();
    if (!place)
        return;
    m_document->undoStack()->push(new DuplicateSectionCommand(m_document, place->path, place->index));
}

void MainWindow::moveSelected(int step)
{
    const auto place = drawing()->selectedPlace();
    if (!place)
        return;
    m_document->undoStack()->push(new MoveSectionCommand(m_document, place->path, place->index, place->index + step));
    drawing()->selectPlace({place->path, place->index + step});
    updateEditActions();
}

void MainWindow::setUnitSystemIp(bool ip)
{
    m_units->setSystem(ip ? UnitSystem::System::IP : UnitSystem::System::SI);
    m_settings->setUnitSystem(m_units->system());
    (ip ? m_ipAction : m_siAction)->setChecked(true);
    m_litresAction->setEnabled(!ip);
}

void MainWindow::setDarkPalette(bool dark)
{
    Appearance::apply(dark);
    m_settings->setDarkPalette(dark);
    if (m_darkAction->isChecked() != dark)
        m_darkAction->setChecked(dark);
}

void MainWindow::showCautions()
{
    CautionsDialog dialog(this);
    dialog.exec();
}

void MainWindow::showAbout()
{
    QMessageBox::about(
        this, tr("About Airwright"),
        tr("<h3>Airwright %1</h3>"
           "<p>Design of air handling units: moist-air states, duties, pressure drops, heat recovery and frost, "
           "fan power and regulatory checks, section by section.</p>"
           "<p>Every number comes from a computation whose method and source are listed in the documentation "
           "(docs/). The program is vendor-neutral and a design aid: see Help &gt; Cautions.</p>"
           "<p>Built with Qt %2 and QCustomPlot.</p>")
            .arg(QApplication::applicationVersion(), QString::fromLatin1(qVersion())));
}

std::vector<MainWindow::Panel> MainWindow::panels() const
{
    std::vector<Panel> list{{QStringLiteral("unit-drawing"), m_unitPanel},
                            {QStringLiteral("section-types"), m_palette},
                            {QStringLiteral("section-editor"), m_sectionEditor},
                            {QStringLiteral("project-editor"), m_projectEditor},
                            {QStringLiteral("design-cases"), m_casesEditor}};
    for (int i = 0; i < m_views->count(); ++i)
        list.push_back({m_views->widget(i)->objectName(), m_views->widget(i)});
    return list;
}

void MainWindow::bringToFront(QWidget* panel)
{
    for (QDockWidget* d : {m_paletteDock, m_sectionDock, m_projectDock, m_casesDock})
        if (d->widget() == panel) {
            d->show();
            d->raise();
        }
    const int tab = m_views->indexOf(panel);
    if (tab >= 0)
        m_views->setCurrentIndex(tab);
}

} // namespace Airwright::Ui
