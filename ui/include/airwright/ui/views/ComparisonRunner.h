#pragma once
// Runs the heat recovery comparison (Core::Annual::HeatRecoveryComparison) on a
// worker thread of the global pool (QtConcurrent), so the window stays live.
// One run at a time: starting another stops the one in progress, whose result is
// then never delivered (an edit makes it stale). The comparison polls its stop
// token, so a stopped run ends within milliseconds. Signals arrive on the thread
// that owns the runner.

#include "airwright/core/annual/ComparisonResult.h"
#include "airwright/core/annual/ComparisonSettings.h"
#include "airwright/core/annual/HeatRecoveryOption.h"
#include "airwright/core/chain/AirHandlingUnit.h"

#include <QObject>
#include <QString>

#include <optional>
#include <stop_token>
#include <vector>

template <typename T>
class QFutureWatcher;

namespace Airwright::Ui {

class ComparisonRunner : public QObject {
    Q_OBJECT
public:
    struct Job {
        Core::Chain::AirHandlingUnit unit;
        QString climateFile; // an EPW weather file (.epw) or a bin table (.csv)
        Core::Annual::ComparisonSettings settings;
        // Empty: the default options sized to the unit (defaultHeatRecoveryOptions).
        std::vector<Core::Annual::HeatRecoveryOption> options = {};
    };

    explicit ComparisonRunner(QObject* parent = nullptr);
    ~ComparisonRunner() override; // stops any run and waits for its thread to let go

    void start(Job job); // the options (or the defaults) against none
    // The job of the latest start(), options filled in; empty before the first.
    const std::optional<Job>& lastJob() const { return m_lastJob; }
    void cancel();       // stops the run in progress; cancelled() follows
    bool isRunning() const { return m_current != nullptr; }

signals:
    void progressed(double fractionDone);
    void finished(const Airwright::Core::Annual::ComparisonResult& result);
    void failed(const QString& message);
    void cancelled();

public:
    // What a run hands back: a result, or an error message, or neither (stopped).
    struct Outcome {
        std::optional<Core::Annual::ComparisonResult> result;
        QString error;
    };

private:
    void onFinished(QFutureWatcher<Outcome>* watcher);

    std::stop_source m_stop;
    QFutureWatcher<Outcome>* m_current = nullptr;
    std::optional<Job> m_lastJob;
};

} // namespace Airwright::Ui
