#pragma once
// The heat recovery comparison of the open project: the default options sized to
// its unit (none, two plates, two wheels, a run-around loop) simulated over a
// year of the chosen climate (the demo climate to start with), ranked by net
// benefit. A table of the figures and a bar chart of the net energy saving per
// option. The comparison runs off the GUI thread with progress and cancel; while
// the view is shown, every edit of the project starts it again and stops the
// stale run. Hidden, it waits until it is shown.

#include "airwright/core/annual/ComparisonResult.h"

#include <QString>
#include <QWidget>

class QCustomPlot;
class QLabel;
class QProgressBar;
class QPushButton;
class QSplitter;
class QTableView;

namespace Airwright::Ui {

class ComparisonRunner;
class HeatRecoveryComparisonModel;
class ProjectDocument;
class UnitSystem;

class HeatRecoveryComparisonView : public QWidget {
    Q_OBJECT
public:
    HeatRecoveryComparisonView(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    HeatRecoveryComparisonModel* model() const { return m_model; }
    ComparisonRunner* runner() const { return m_runner; }
    QCustomPlot* plot() const { return m_plot; }
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

    ProjectDocument* m_document;
    UnitSystem* m_units;
    HeatRecoveryComparisonModel* m_model;
    ComparisonRunner* m_runner;
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
