// The view widgets on the offscreen platform: they follow the document, keep the
// shared selection and draw something. With AIRWRIGHT_VIEW_SHOTS=DIR set, the
// rendering test also writes PNGs of every view (light and dark palette, SI and
// IP) to DIR for a person to look at.

#include "DemoProject.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/FindingsModel.h"
#include "airwright/ui/views/FindingsView.h"
#include "airwright/ui/views/PressureProfileView.h"
#include "airwright/ui/views/PsychroChartView.h"
#include "airwright/ui/views/ScheduleModel.h"
#include "airwright/ui/views/ScheduleView.h"

#include <QApplication>
#include <QClipboard>
#include <QDir>
#include <QImage>
#include <QItemSelectionModel>
#include <QSortFilterProxyModel>
#include <QTableView>

#include <qcustomplot.h>

#include <gtest/gtest.h>

#include <set>

namespace Airwright::Ui {
namespace {

QPalette darkPalette()
{
    QPalette p;
    const QColor window(0x2b, 0x2d, 0x30);
    const QColor base(0x1f, 0x21, 0x24);
    const QColor text(0xe3, 0xe5, 0xe8);
    p.setColor(QPalette::Window, window);
    p.setColor(QPalette::WindowText, text);
    p.setColor(QPalette::Base, base);
    p.setColor(QPalette::AlternateBase, window);
    p.setColor(QPalette::Text, text);
    p.setColor(QPalette::Button, window);
    p.setColor(QPalette::ButtonText, text);
    p.setColor(QPalette::Highlight, QColor(0x4d, 0x8f, 0xe0));
    p.setColor(QPalette::HighlightedText, Qt::white);
    p.setColor(QPalette::ToolTipBase, base);
    p.setColor(QPalette::ToolTipText, text);
    return p;
}

// How many distinct colours an image holds: an empty plot has two or three.
std::size_t distinctColours(const QImage& image)
{
    std::set<QRgb> colours;
    for (int y = 0; y < image.height(); y += 2)
        for (int x = 0; x < image.width(); x += 2)
            colours.insert(image.pixel(x, y));
    return colours.size();
}

class ViewsTest : public ::testing::Test {
protected:
    void SetUp() override
    {
        TestSupport::DemoProject::open(document);
        ASSERT_TRUE(document.result().has_value()) << document.computeError().toStdString();
    }
    QImage render(QWidget& w, const QSize& size, const QString& name)
    {
        w.resize(size);
        w.show();
        QApplication::processEvents();
        for (auto* plot : w.findChildren<QCustomPlot*>())
            plot->replot();
        const QImage image = w.grab().toImage();
        const QString dir = qEnvironmentVariable("AIRWRIGHT_VIEW_SHOTS");
        if (!dir.isEmpty()) {
            QDir().mkpath(dir);
            image.save(QDir(dir).filePath(name + QStringLiteral(".png")));
        }
        return image;
    }
    ProjectDocument document;
    UnitSystem units;
};

TEST_F(ViewsTest, RenderEveryViewInLightAndDarkSiAndIp)
{
    PsychroChartView chart(&document, &units);
    PressureProfileView profile(&document, &units);
    ScheduleView schedule(&document, &units);
    FindingsView findings(&document);
    document.selectSection(QStringLiteral("heating-coil"));
    for (bool dark : {false, true}) {
        for (auto system : {UnitSystem::System::SI, UnitSystem::System::IP}) {
            units.setSystem(system);
            const QString suffix = QStringLiteral("%1-%2").arg(dark ? QStringLiteral("dark") : QStringLiteral("light"),
                                                              system == UnitSystem::System::IP ? QStringLiteral("ip")
                                                                                                : QStringLiteral("si"));
            for (QWidget* w : std::initializer_list<QWidget*>{&chart, &profile, &schedule, &findings})
                w->setPalette(dark ? darkPalette() : QApplication::palette());
            chart.setDiagram(PsychroChartModel::Diagram::DryBulbHumidity);
            EXPECT_GT(distinctColours(render(chart, {1000, 700}, QStringLiteral("chart-tw-") + suffix)), 20u);
            chart.setDiagram(PsychroChartModel::Diagram::Mollier);
            EXPECT_GT(distinctColours(render(chart, {800, 800}, QStringLiteral("chart-hx-") + suffix)), 20u);
            EXPECT_GT(distinctColours(render(profile, {1000, 560}, QStringLiteral("profile-") + suffix)), 20u);
            EXPECT_GT(distinctColours(render(schedule, {1300, 420}, QStringLiteral("schedule-") + suffix)), 10u);
            EXPECT_GT(distinctColours(render(findings, {900, 300}, QStringLiteral("findings-") + suffix)), 10u);
        }
    }
}

TEST_F(ViewsTest, ChartTooltipAndClickNameTheSection)
{
    PsychroChartView chart(&document, &units);
    chart.resize(900, 650);
    chart.show();
    QApplication::processEvents();
    chart.plot()->replot();
    const auto& point = chart.model().processes().front().supply[2];
    const QPoint pixel(int(chart.plot()->xAxis->coordToPixel(point.position.x())),
                       int(chart.plot()->yAxis->coordToPixel(point.position.y())));
    const QString tip = chart.tipAt(pixel);
    EXPECT_TRUE(tip.contains(point.sectionId)) << tip.toStdString();
    EXPECT_TRUE(chart.tipAt(QPoint(2, 2)).isEmpty());
    // The view follows the unit system.
    units.setSystem(UnitSystem::System::IP);
    EXPECT_TRUE(chart.model().xLabel().contains(QStringLiteral("°F")));
}

TEST_F(ViewsTest, ChartFollowsTheDocument)
{
    PsychroChartView chart(&document, &units);
    // The mid-season case (the third of the demo): its exchanger outlet moves with
    // the exchanger's efficiency (see PsychroChartModelTest).
    const double before = chart.model().processes()[2].supply[3].position.x();
    TestSupport::DemoProject::editSupplySection(document, "hr", [](Core::Chain::Section& s) {
        std::get<Core::Recovery::HeatRecovery>(s.spec).ratedEfficiency = Core::percent(55.0);
    });
    EXPECT_EQ(chart.model().processes()[2].supply[3].sectionId, QStringLiteral("hr"));
    EXPECT_LT(chart.model().processes()[2].supply[3].position.x(), before - 1.0);
}

TEST_F(ViewsTest, ProfileCaseSelector)
{
    PressureProfileView profile(&document, &units);
    EXPECT_EQ(profile.caseIndex(), 0);
    EXPECT_EQ(profile.model().caseNames().size(), 3);
    profile.setCaseIndex(1);
    EXPECT_EQ(profile.model().caseIndex(), 1);
    // The summer case has the wet cooling coil: a larger drop there than in winter.
    auto coilDrop = [&] {
        for (const auto& s : profile.model().supply())
            if (s.id == QStringLiteral("cooling-coil"))
                return s.pressureInPa - s.pressureOutPa;
        return -1.0;
    };
    const double summer = coilDrop();
    profile.setCaseIndex(0);
    EXPECT_GT(summer, coilDrop());
}

TEST_F(ViewsTest, ScheduleClickSelectsAndSelectionShows)
{
    ScheduleView schedule(&document, &units);
    auto* table = schedule.table();
    const QModelIndex index = schedule.proxy()->index(3, 1);
    emit table->clicked(index);
    EXPECT_EQ(document.selectedSection(), schedule.proxy()->data(index, ScheduleModel::SectionIdRole).toString());

    document.selectSection(QStringLiteral("hr"));
    EXPECT_EQ(table->selectionModel()->selectedRows().size(), 2); // supply and extract side

    const QStringList lines = schedule.copyText().split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    ASSERT_EQ(lines.size(), 3);
    EXPECT_TRUE(lines[0].startsWith(QStringLiteral("Path\t")));
    EXPECT_TRUE(lines[1].contains(QStringLiteral("\thr\t")));

    table->clearSelection();
    const QStringList all = schedule.copyText().split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    EXPECT_EQ(all.size(), schedule.model()->rowCount() + 1);

    schedule.copyAction()->trigger();
    EXPECT_EQ(QApplication::clipboard()->text(), schedule.copyText());
    EXPECT_EQ(schedule.copyAction()->shortcut(), QKeySequence(QKeySequence::Copy));
}

TEST_F(ViewsTest, ScheduleFollowsUnitsAndCases)
{
    ScheduleView schedule(&document, &units);
    auto* model = schedule.model();
    units.setSystem(UnitSystem::System::IP);
    EXPECT_TRUE(model->headerData(ScheduleModel::DutyColumn, Qt::Horizontal).toString().contains(QStringLiteral("Btu/h")));
    schedule.setCaseIndex(2);
    EXPECT_EQ(model->caseIndex(), 2);
    EXPECT_GT(model->rowCount(), 0);
}

TEST_F(ViewsTest, FindingsClickSelectsTheSection)
{
    // The demo's findings may all concern the whole unit; take the supply fan out so
    // there is an error naming no section and keep looking for one naming a section.
    FindingsView findings(&document);
    EXPECT_EQ(std::size_t(findings.model()->rowCount()), [&] {
        std::size_t n = 0;
        for (const auto& c : document.result()->cases)
            n += c.findings.size();
        return n;
    }());
    for (int r = 0; r < findings.model()->rowCount(); ++r) {
        const QModelIndex index = findings.model()->index(r, FindingsModel::MessageColumn);
        const QString id = findings.model()->data(index, FindingsModel::SectionIdRole).toString();
        if (id.isEmpty())
            continue;
        document.selectSection(QString());
        emit findings.table()->clicked(index);
        EXPECT_EQ(document.selectedSection(), id);
        break;
    }
}

} // namespace
} // namespace Airwright::Ui
