#include "airwright/ui/views/ComparisonRunner.h"

#include "airwright/core/annual/BinTableReader.h"
#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/core/annual/HeatRecoveryOption.h"

#include <QFile>
#include <QFileInfo>
#include <QFutureWatcher>
#include <QPromise>
#include <QtConcurrent/QtConcurrentRun>

#include <exception>
#include <filesystem>

namespace Airwright::Ui {

namespace {

using namespace Airwright::Core::Annual;
using Outcome = ComparisonRunner::Outcome;

constexpr int kProgressSteps = 1000;

void runJob(QPromise<Outcome>& promise, const ComparisonRunner::Job& job, std::stop_token stop)
{
    promise.setProgressRange(0, kProgressSteps);
    Outcome outcome;
    try {
        RunControl control;
        control.stop = stop;
        control.progress = [&promise](double done) {
            promise.setProgressValue(static_cast<int>(done * kProgressSteps));
        };
        const std::filesystem::path path(QFile::encodeName(job.climateFile).toStdString());
        const QString extension = QFileInfo(job.climateFile).suffix().toLower();
        const HeatRecoveryComparison comparison(job.unit, job.options, job.settings);
        if (extension == QLatin1String("epw"))
            outcome.result = comparison.run(EpwReader().readFile(path).weather, control);
        else if (extension == QLatin1String("csv"))
            outcome.result = comparison.run(BinTableReader(job.unit.site.pressure()).readFile(path), control);
        else
            outcome.error = QStringLiteral("%1 is neither an EPW weather file (.epw) nor a bin table (.csv)")
                                .arg(QFileInfo(job.climateFile).fileName());
    } catch (const std::exception& e) {
        outcome.result.reset();
        outcome.error = QString::fromUtf8(e.what());
    }
    promise.addResult(std::move(outcome));
}

} // namespace

ComparisonRunner::ComparisonRunner(QObject* parent) : QObject(parent) {}

ComparisonRunner::~ComparisonRunner()
{
    m_stop.request_stop();
    // Every run still going (the current one and stale ones) holds copies only;
    // wait so that no worker outlives the program's objects.
    for (auto* watcher : findChildren<QFutureWatcher<Outcome>*>(Qt::FindDirectChildrenOnly)) {
        watcher->disconnect(this);
        watcher->waitForFinished();
    }
}

void ComparisonRunner::start(Job job)
{
    // The run in progress becomes stale: stop it and forget it.
    m_stop.request_stop();
    if (m_current) {
        m_current->disconnect(this);
        connect(m_current, &QFutureWatcherBase::finished, m_current, &QObject::deleteLater);
        if (m_current->isFinished())
            m_current->deleteLater();
    }
    m_stop = std::stop_source();
    if (job.options.empty())
        job.options = defaultHeatRecoveryOptions(job.unit.airflows.supply);
    m_lastJob = job;
    auto* watcher = new QFutureWatcher<Outcome>(this);
    m_current = watcher;
    connect(watcher, &QFutureWatcherBase::progressValueChanged, this,
            [this](int value) { emit progressed(static_cast<double>(value) / kProgressSteps); });
    connect(watcher, &QFutureWatcherBase::finished, this, [this, watcher] { onFinished(watcher); });
    watcher->setFuture(QtConcurrent::run(&runJob, std::move(job), m_stop.get_token()));
}

void ComparisonRunner::cancel()
{
    if (m_current)
        m_stop.request_stop();
}

void ComparisonRunner::onFinished(QFutureWatcher<Outcome>* watcher)
{
    watcher->deleteLater();
    if (watcher != m_current)
        return; // stale
    m_current = nullptr;
    const Outcome outcome = watcher->future().resultCount() > 0 ? watcher->result() : Outcome{};
    if (!outcome.error.isEmpty())
        emit failed(outcome.error);
    else if (outcome.result)
        emit finished(*outcome.result);
    else
        emit cancelled();
}

} // namespace Airwright::Ui
