// The heat recovery comparison view: its table model shows the core result in
// the chosen units, and the runner works off the GUI thread, delivers only the
// latest run, stops on request and reports bad input.

#include "DemoProject.h"

#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/ui/EditAirflowsCommand.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/ComparisonRunner.h"
#include "airwright/ui/views/HeatRecoveryComparisonModel.h"
#include "airwright/ui/views/HeatRecoveryComparisonView.h"

#include <QCoreApplication>
#include <QElapsedTimer>
#include <QEventLoop>

#include <gtest/gtest.h>

#include <cmath>

namespace Airwright::Ui {
namespace {

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using Model = HeatRecoveryComparisonModel;

QString demoFile(const char* name)
{
    return QStringLiteral(AIRWRIGHT_SOURCE_DIR "/resources/demo/") + QString::fromLatin1(name);
}

ComparisonSettings quickSettings()
{
    ComparisonSettings settings;
    settings.sensitivity = false;
    return settings;
}

// Computed once: the demo unit against the demo climate, as the view runs it.
const ComparisonResult& demoResult()
{
    static const ComparisonResult result = [] {
        const auto unit = TestSupport::DemoProject::load().unit;
        const HeatRecoveryComparison comparison(unit, defaultHeatRecoveryOptions(unit.airflows.supply),
                                                quickSettings());
        return *comparison.run(EpwReader().readFile(demoFile("demo-climate.epw").toStdString()).weather);
    }();
    return result;
}

// Runs the event loop until the runner goes idle or 60 s pass.
bool waitIdle(ComparisonRunner& runner)
{
    QElapsedTimer clock;
    clock.start();
    while (runner.isRunning() && clock.elapsed() < 60000)
        QCoreApplication::processEvents(QEventLoop::AllEvents, 20);
    // The last signal may still be queued.
    QCoreApplication::processEvents(QEventLoop::AllEvents, 20);
    return !runner.isRunning();
}

TEST(HeatRecoveryComparisonModel, RowsAreTheOptionsWithTheirFigures)
{
    UnitSystem units;
    Model model(&units);
    EXPECT_EQ(model.rowCount(), 0);
    model.setResult(demoResult(), 15.0);
    const auto& r = demoResult();
    ASSERT_EQ(model.rowCount(), int(r.options.size()));
    EXPECT_EQ(model.columnCount(), Model::ColumnCount);
    for (int row = 0; row < model.rowCount(); ++row) {
        const auto& o = r.options[std::size_t(row)];
        EXPECT_EQ(model.data(model.index(row, Model::OptionColumn)).toString().toStdString(), o.name);
        EXPECT_EQ(model.data(model.index(row, Model::NetSavingColumn)).toString(),
                  QString::number(std::abs(toMegawattHours(o.netSaving)) < 0.005 ? 0.0 : toMegawattHours(o.netSaving),
                                  'f', 2));
        EXPECT_NEAR(model.netSavingShown(row), toMegawattHours(o.netSaving), 1e-12); // same number, MWh
        EXPECT_EQ(model.data(model.index(row, 0), Model::KeyRole).toString().toStdString(), o.key);
        int rank = 0;
        for (const auto& entry : r.ranking)
            if (entry.key == o.key)
                rank = entry.rank;
        EXPECT_EQ(model.rank(row), rank);
        // The option without heat recovery has no design figures.
        EXPECT_EQ(model.data(model.index(row, Model::EffectivenessColumn)).toString() == QStringLiteral("-"),
                  !o.hasRecovery);
    }
    EXPECT_TRUE(model.headerData(Model::NetBenefitColumn, Qt::Horizontal).toString().contains(QStringLiteral("15 years")));
    // Out of range: nothing.
    EXPECT_FALSE(model.data(model.index(model.rowCount(), 0)).isValid());
    EXPECT_EQ(model.rank(-1), 0);
    EXPECT_EQ(model.netSavingShown(99), 0.0);
    model.setResult(std::nullopt, 15.0);
    EXPECT_EQ(model.rowCount(), 0);
}

TEST(HeatRecoveryComparisonModel, IpShowsMillionBtuAndInchesOfWater)
{
    UnitSystem units;
    Model model(&units);
    model.setResult(demoResult(), 15.0);
    int headerSignals = 0;
    QObject::connect(&model, &QAbstractItemModel::headerDataChanged, [&headerSignals] { ++headerSignals; });
    units.setSystem(UnitSystem::System::IP);
    EXPECT_EQ(headerSignals, 1);
    EXPECT_EQ(model.energyUnit(), QStringLiteral("MMBtu"));
    EXPECT_TRUE(model.headerData(Model::SupplyDropColumn, Qt::Horizontal).toString().contains(QStringLiteral("in. w.g.")));
    // NIST SP 811 (2008) B.8: Btu_IT = 1.055056 E+03 J, so 1 MWh = 3.6e9 J = 3.412141 MMBtu
    // (tolerance: the last printed digit of the factor).
    for (int row = 0; row < model.rowCount(); ++row) {
        const double mwh = toMegawattHours(demoResult().options[std::size_t(row)].netSaving);
        EXPECT_NEAR(model.netSavingShown(row), mwh * 3.6e9 / 1.055056e9, std::abs(mwh) * 1e-6 + 1e-12);
    }
}

TEST(ComparisonRunner, RunsOffTheGuiThreadAndDeliversTheResult)
{
    ComparisonRunner runner;
    int finished = 0;
    std::optional<ComparisonResult> got;
    QObject::connect(&runner, &ComparisonRunner::finished, [&](const ComparisonResult& r) {
        ++finished;
        got = r;
    });
    double lastProgress = -1.0;
    QObject::connect(&runner, &ComparisonRunner::progressed, [&](double p) { lastProgress = p; });
    runner.start({TestSupport::DemoProject::load().unit, demoFile("demo-climate.epw"), quickSettings()});
    // start() returns at once: the year is simulated elsewhere.
    EXPECT_TRUE(runner.isRunning());
    ASSERT_TRUE(waitIdle(runner));
    ASSERT_EQ(finished, 1);
    ASSERT_TRUE(got.has_value());
    EXPECT_EQ(got->options.size(), demoResult().options.size());
    EXPECT_NEAR(toMegawattHours(got->options[1].netSaving), toMegawattHours(demoResult().options[1].netSaving), 1e-9);
    EXPECT_GE(lastProgress, 0.0);
    EXPECT_LE(lastProgress, 1.0);
}

TEST(ComparisonRunner, ALaterStartDropsTheStaleRun)
{
    ComparisonRunner runner;
    std::vector<ClimateMethod> delivered;
    int cancelled = 0;
    QObject::connect(&runner, &ComparisonRunner::finished,
                     [&](const ComparisonResult& r) { delivered.push_back(r.climate.method); });
    QObject::connect(&runner, &ComparisonRunner::cancelled, [&] { ++cancelled; });
    const auto unit = TestSupport::DemoProject::load().unit;
    runner.start({unit, demoFile("demo-climate.epw"), quickSettings()}); // hourly: stale
    runner.start({unit, demoFile("demo-bins.csv"), quickSettings()});    // bins: current
    ASSERT_TRUE(waitIdle(runner));
    ASSERT_EQ(delivered.size(), 1u);
    EXPECT_EQ(delivered.front(), ClimateMethod::Bins);
    EXPECT_EQ(cancelled, 0);
}

TEST(ComparisonRunner, CancelStopsWithoutAResult)
{
    ComparisonRunner runner;
    int finished = 0;
    int cancelled = 0;
    QObject::connect(&runner, &ComparisonRunner::finished, [&](const ComparisonResult&) { ++finished; });
    QObject::connect(&runner, &ComparisonRunner::cancelled, [&] { ++cancelled; });
    runner.start({TestSupport::DemoProject::load().unit, demoFile("demo-climate.epw"), quickSettings()});
    runner.cancel();
    ASSERT_TRUE(waitIdle(runner));
    EXPECT_EQ(finished, 0);
    EXPECT_EQ(cancelled, 1);
}

struct BadClimate {
    const char* name;
    const char* file;     // under resources/demo/, or a name that does not exist
    const char* expected; // part of the message
};

class ComparisonRunnerBadClimate : public ::testing::TestWithParam<BadClimate> {};

TEST_P(ComparisonRunnerBadClimate, FailsWithAMessage)
{
    ComparisonRunner runner;
    QString message;
    int finished = 0;
    QObject::connect(&runner, &ComparisonRunner::failed, [&](const QString& m) { message = m; });
    QObject::connect(&runner, &ComparisonRunner::finished, [&](const ComparisonResult&) { ++finished; });
    runner.start({TestSupport::DemoProject::load().unit, demoFile(GetParam().file), quickSettings()});
    ASSERT_TRUE(waitIdle(runner));
    EXPECT_EQ(finished, 0);
    EXPECT_TRUE(message.contains(QString::fromLatin1(GetParam().expected))) << message.toStdString();
}

INSTANTIATE_TEST_SUITE_P(Files, ComparisonRunnerBadClimate,
                         ::testing::Values(BadClimate{"wrong_kind", "demo-climate.md", "neither"},
                                           BadClimate{"missing_epw", "no-such-climate.epw", "no-such-climate.epw"},
                                           BadClimate{"project_as_bins", "demo-library.awproj", "neither"}),
                         [](const auto& row) { return std::string(row.param.name); });

TEST(HeatRecoveryComparisonView, AnEditWhileShownComparesAgain)
{
    ProjectDocument document;
    UnitSystem units;
    TestSupport::DemoProject::open(document);
    HeatRecoveryComparisonView view(&document, &units);
    // Hidden: nothing runs.
    EXPECT_FALSE(view.runner()->isRunning());
    view.resize(1000, 400);
    view.show();
    EXPECT_TRUE(view.runner()->isRunning());
    ASSERT_TRUE(view.waitUntilIdle(60000));
    ASSERT_EQ(view.model()->rowCount(), int(demoResult().options.size()));
    const double before = view.model()->netSavingShown(1);
    EXPECT_TRUE(view.statusText().contains(QStringLiteral("Best:"))) << view.statusText().toStdString();

    // More air: every option recovers more. The edit starts a new run at once.
    auto flows = document.project().unit.airflows;
    flows.supply = flows.supply * 1.5;
    flows.extract = flows.extract * 1.5;
    document.undoStack()->push(new EditAirflowsCommand(&document, flows));
    EXPECT_TRUE(view.runner()->isRunning());
    ASSERT_TRUE(view.waitUntilIdle(60000));
    EXPECT_GT(view.model()->netSavingShown(1), before);

    // A project that cannot be computed has nothing to compare.
    auto broken = flows;
    broken.supply = flows.supply * 0.0;
    document.undoStack()->push(new EditAirflowsCommand(&document, broken));
    ASSERT_FALSE(document.result().has_value());
    EXPECT_FALSE(view.runner()->isRunning());
    EXPECT_EQ(view.model()->rowCount(), 0);
    EXPECT_TRUE(view.statusText().startsWith(QStringLiteral("Not compared"))) << view.statusText().toStdString();
}

} // namespace
} // namespace Airwright::Ui
