#pragma once
// The heat recovery comparison of the open project: the default options sized to
// its unit (none, two plates, two wheels, a run-around loop) simulated over a
// year of the chosen climate (the demo climate to start with), ranked by net
// benefit. A table of the figures and a bar chart of the net energy saving per
// option. The comparison runs off the GUI thread with progress and cancel; while
// the view is shown, every edit of the project starts it again and stops the
// stale run. Hidden, it waits until it is shown. Two more tabs hold the inputs:
// the options' datasheet figures (HeatRecoveryOptionsPanel), and the prices and
// operating schedule (HeatRecoveryPricesPanel); a change there compares again in
// the same way, and they are kept in the settings store when the window gives one.

#include "airwright/core/annual/ComparisonResult.h"

#include <QString>
#include <QWidget>

class QCustomPlot;
class QLabel;
class QProgressBar;
class QPushButton;
class QSettings;
class QSplitter;
class QTableView;
class QTabWidget;

namespace Airwright::Ui {

class ComparisonRunner;
class HeatRecoveryComparisonModel;
class HeatRecoveryOptionsPanel;
class HeatRecoveryPricesPanel;
class HeatRecoveryOptionsModel;
class ProjectDocument;
class UnitSystem;

class HeatRecoveryComparisonView : public QWidget {
    Q_OBJECT
public:
    HeatRecoveryComparisonView(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    HeatRecoveryComparisonModel* model() const { return m_model; }
    // The comparison shown, when it is of the project as it is now (for the
    // printed schedule); empty while none has run or after an edit.
    const Core::Annual::ComparisonResult* currentResult() const;
    ComparisonRunner* runner() const { return m_runner; }
    QCustomPlot* plot() const { return m_plot; }
    HeatRecoveryOptionsModel* inputsModel() const { return m_inputsModel; }
    HeatRecoveryOptionsPanel* optionsPanel() const { return m_optionsPanel; }
    HeatRecoveryPricesPanel* pricesPanel() const { return m_pricesPanel; }
    enum Tab { ResultsTab, OptionsTab, PricesTab };
    QTabWidget* tabs() const { return m_tabs; }
    void showTab(Tab tab);

    // Reads the inputs from `store` and writes every change back; store must
    // outlive the view. Without one the inputs last as long as the view.
    void setSettingsStore(QSettings* store);
    QString statusText() const;

    const QString& climateFile() const { return m_climateFile; }
    void setClimateFile(const QString& path); // runs again when shown

    // Starts the comparison for the project as it is now (stopping a run in
    // progress); nothing when the project has no results.
    void runNow();
    // Runs the event loop until no comparison is running or the time is up; true
    // when idle. For the screenshot mode and tests.
    bool waitUntilIdle(int timeoutMs);

protected:
    void showEvent(QShowEvent* event) override;
    void changeEvent(QEvent* event) override;

private:
    void projectChanged();
    void showResult(const Core::Annual::ComparisonResult& result);
    void setRunning(bool running);
    void redraw();
    void chooseClimate();
    void inputsChanged();

    ProjectDocument* m_document;
    UnitSystem* m_units;
    HeatRecoveryComparisonModel* m_model;
    ComparisonRunner* m_runner;
    HeatRecoveryOptionsModel* m_inputsModel;
    HeatRecoveryOptionsPanel* m_optionsPanel;
    HeatRecoveryPricesPanel* m_pricesPanel;
    QTabWidget* m_tabs;
    QSettings* m_store = nullptr;
    QSplitter* m_split;
    QTableView* m_table;
    QCustomPlot* m_plot;
    QLabel* m_climateLabel;
    QLabel* m_status;
    QProgressBar* m_progress;
    QPushButton* m_cancel;
    QPushButton* m_again;
    QString m_climateFile;
    double m_evaluationYears = 0.0;
    bool m_splitPlaced = false;
    bool m_stale = true; // the shown result (if any) is not of the project as it is
};

} // namespace Airwright::Ui
