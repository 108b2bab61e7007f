// Edit-to-views latency of the desktop program: one property edit pushed on the
// document's undo stack (the path every editor takes) until the psychrometric
// chart, the pressure profile and the section schedule hold the new result.
// The views are the real widgets, listening to the document as in the window,
// so their model rebuilds and plot updates are included; painting to the screen
// is not (it happens later, from the event loop, only for the visible view).
// Built only with the GUI library (see bench/CMakeLists.txt).

#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/sections/Filter.h"
#include "airwright/core/sections/PassiveSection.h"
#include "airwright/ui/EditSectionCommand.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/PressureProfileView.h"
#include "airwright/ui/views/PsychroChartView.h"
#include "airwright/ui/views/ScheduleModel.h"
#include "airwright/ui/views/ScheduleView.h"

#include <QApplication>
#include <QByteArray>

#include <benchmark/benchmark.h>

#include <stdexcept>
#include <string>
#include <variant>

using namespace Airwright::Core;
using namespace Airwright::Ui;

namespace {

// Widgets need a QApplication; benchmark_main owns main(), so it is made on first
// use on the offscreen platform. It is never destroyed: tearing Qt down after
// main() returns, among other static destructors, is not safe.
void ensureApplication()
{
    if (QApplication::instance())
        return;
    if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
        qputenv("QT_QPA_PLATFORM", "offscreen");
    static int argc = 1;
    static char name[] = "airwright-bench";
    static char* argv[] = {name, nullptr};
    new QApplication(argc, argv);
}

Project::Project demoProject()
{
    Project::LoadReport report;
    return Project::ProjectFile::load(std::string(AIRWRIGHT_SOURCE_DIR) + "/resources/demo/demo-library.awproj",
                                      report);
}

// The demo with passive sections (silencers and access sections) added until both
// paths hold 60 sections together, as BM_Chain60 does.
Project::Project sixtySections()
{
    auto project = demoProject();
    auto& unit = project.unit;
    int n = 0;
    while (unit.supply.size() + unit.extract.size() < 60) {
        Sections::PassiveSection s;
        s.kind = n % 2 ? Sections::PassiveKind::Access : Sections::PassiveKind::Silencer;
        s.ratedPressureDrop = pascals(n % 2 ? 2.0 : 20.0);
        auto& path = n % 3 ? unit.supply : unit.extract;
        path.insert(path.begin() + 1, Chain::Section{"P" + std::to_string(n), s});
        ++n;
    }
    return project;
}

const Chain::Section& sectionById(const Project::Project& project, const std::string& id)
{
    for (const auto& s : project.unit.supply)
        if (s.id == id)
            return s;
    throw std::logic_error("no section " + id);
}

void editToViews(benchmark::State& state, const Project::Project& project)
{
    ensureApplication();
    ProjectDocument document;
    UnitSystem units;
    document.reset(project);
    PsychroChartView chart(&document, &units);
    PressureProfileView profile(&document, &units);
    ScheduleView schedule(&document, &units);
    chart.resize(900, 600);
    profile.resize(900, 600);
    schedule.resize(900, 600);

    // The outdoor-air filter's initial pressure drop, alternately 60 and 75 Pa:
    // every push is a real change (an equal value would be dropped as a no-op), and
    // it moves the fan duty, the states after the fan and every pressure.
    const Chain::Section original = sectionById(project, "oda-filter");
    Chain::Section low = original;
    Chain::Section high = original;
    std::get<Sections::Filter>(low.spec).initialPressureDrop = pascals(60.0);
    std::get<Sections::Filter>(high.spec).initialPressureDrop = pascals(75.0);
    bool toHigh = true;
    for (auto _ : state) {
        document.undoStack()->push(new EditSectionCommand(&document, original.id, toHigh ? high : low));
        toHigh = !toHigh;
        if (!document.result())
            state.SkipWithError("the edited project did not compute");
        benchmark::DoNotOptimize(chart.model().processes().size());
        benchmark::DoNotOptimize(profile.model().supply().size());
        benchmark::DoNotOptimize(schedule.model()->rowCount());
    }
    state.counters["sections"] =
        static_cast<double>(project.unit.supply.size() + project.unit.extract.size());
}

void BM_EditToViews(benchmark::State& state)
{
    editToViews(state, demoProject());
}
BENCHMARK(BM_EditToViews)->Unit(benchmark::kMillisecond)->UseRealTime();

void BM_EditToViews60(benchmark::State& state)
{
    editToViews(state, sixtySections());
}
BENCHMARK(BM_EditToViews60)->Unit(benchmark::kMillisecond)->UseRealTime();

} // namespace
