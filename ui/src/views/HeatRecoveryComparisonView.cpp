#include "airwright/ui/views/HeatRecoveryComparisonView.h"
#include "airwright/ui/views/MessageUnits.h"

#include "airwright/core/InputError.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/ResourceLocator.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/ComparisonRunner.h"
#include "airwright/ui/views/HeatRecoveryComparisonModel.h"
#include "airwright/ui/views/HeatRecoveryOptionsModel.h"
#include "airwright/ui/views/HeatRecoveryOptionsPanel.h"
#include "airwright/ui/views/HeatRecoveryPricesPanel.h"
#include "airwright/ui/views/PlotStyle.h"

#include <QEvent>
#include <QEventLoop>
#include <QFileDialog>
#include <QFileInfo>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QProgressBar>
#include <QPushButton>
#include <QScrollArea>
#include <QSettings>
#include <QSplitter>
#include <QTabWidget>
#include <QTableView>
#include <QTimer>
#include <QVBoxLayout>

#include <qcustomplot.h>

#include <algorithm>

namespace Airwright::Ui {

namespace {

using Kind = UnitSystem::Kind;
using namespace Airwright::Core::Annual;

} // namespace

HeatRecoveryComparisonView::HeatRecoveryComparisonView(ProjectDocument* document, UnitSystem* units,
                                                       QWidget* parent)
    : QWidget(parent), m_document(document), m_units(units)
{
    m_model = new HeatRecoveryComparisonModel(units, this);
    m_runner = new ComparisonRunner(this);
    m_inputsModel = new HeatRecoveryOptionsModel(units, this);
    m_inputsModel->setSupplyFlow(m_document->project().unit.airflows.supply);

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto* bar = new QHBoxLayout;
    bar->setContentsMargins(4, 2, 4, 0);
    bar->addWidget(new QLabel(tr("Climate:"), this));
    m_climateLabel = new QLabel(this);
    bar->addWidget(m_climateLabel);
    auto* choose = new QPushButton(tr("Climate File..."), this);
    choose->setToolTip(tr("An EPW weather file (hourly) or a bin table (.csv) of the site"));
    bar->addWidget(choose);
    bar->addStretch(1);
    m_progress = new QProgressBar(this);
    m_progress->setRange(0, 1000);
    m_progress->setTextVisible(false);
    m_progress->setMaximumWidth(160);
    bar->addWidget(m_progress);
    m_cancel = new QPushButton(tr("Stop"), this);
    m_cancel->setToolTip(tr("Stop the comparison that is running"));
    bar->addWidget(m_cancel);
    m_again = new QPushButton(tr("Compare Again"), this);
    bar->addWidget(m_again);
    layout->addLayout(bar);

    m_status = new QLabel(this);
    m_status->setWordWrap(true);
    m_status->setContentsMargins(4, 0, 4, 0);
    m_status->setTextInteractionFlags(Qt::TextSelectableByMouse);
    layout->addWidget(m_status);

    m_tabs = new QTabWidget(this);
    m_tabs->setDocumentMode(true);
    m_split = new QSplitter(Qt::Horizontal, m_tabs);
    auto* split = m_split;
    m_table = new QTableView(split);
    m_table->setModel(m_model);
    m_table->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->setAlternatingRowColors(true);
    m_table->setWordWrap(false);
    m_table->verticalHeader()->setVisible(false);
    m_table->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_plot = new QCustomPlot(split);
    m_plot->setMinimumSize(280, 160);
    split->addWidget(m_table);
    split->addWidget(m_plot);
    split->setStretchFactor(0, 1);
    split->setStretchFactor(1, 1);
    split->setChildrenCollapsible(false);
    m_tabs->addTab(split, tr("Results"));
    // In scroll areas: the view may be shorter than the table of options.
    auto scrolled = [this](QWidget* page) {
        auto* scroll = new QScrollArea(m_tabs);
        scroll->setWidgetResizable(true);
        scroll->setFrameShape(QFrame::NoFrame);
        scroll->setWidget(page);
        return scroll;
    };
    m_optionsPanel = new HeatRecoveryOptionsPanel(m_inputsModel);
    m_pricesPanel = new HeatRecoveryPricesPanel(m_inputsModel);
    m_tabs->addTab(scrolled(m_optionsPanel), tr("Options"));
    m_tabs->setTabToolTip(OptionsTab, tr("The heat recovery options compared: efficiencies, pressure drops, frost "
                                         "protection and extra cost"));
    m_tabs->addTab(scrolled(m_pricesPanel), tr("Prices and Schedule"));
    m_tabs->setTabToolTip(PricesTab, tr("Energy prices, CO2 factors, cooling EER, evaluation period and operating "
                                        "hours of the comparison"));
    layout->addWidget(m_tabs, 1);

    connect(choose, &QPushButton::clicked, this, &HeatRecoveryComparisonView::chooseClimate);
    connect(m_cancel, &QPushButton::clicked, m_runner, &ComparisonRunner::cancel);
    connect(m_again, &QPushButton::clicked, this, &HeatRecoveryComparisonView::runNow);
    connect(m_runner, &ComparisonRunner::progressed, this,
            [this](double done) { m_progress->setValue(static_cast<int>(done * 1000.0)); });
    connect(m_runner, &ComparisonRunner::finished, this, &HeatRecoveryComparisonView::showResult);
    connect(m_runner, &ComparisonRunner::failed, this, [this](const QString& message) {
        setRunning(false);
        m_model->setResult(std::nullopt, m_evaluationYears);
        m_status->setText(tr("Not compared: %1").arg(message));
        redraw();
    });
    connect(m_runner, &ComparisonRunner::cancelled, this, [this] {
        setRunning(false);
        m_stale = true;
        m_status->setText(tr("Stopped before the end; the figures shown (if any) are of an earlier state of the "
                             "project. Compare Again to finish."));
    });
    connect(m_document, &ProjectDocument::resultsChanged, this, &HeatRecoveryComparisonView::projectChanged);
    connect(m_inputsModel, &HeatRecoveryOptionsModel::inputsChanged, this, &HeatRecoveryComparisonView::inputsChanged);
    connect(m_units, &UnitSystem::changed, this, [this] {
        redraw();
        if (m_model->result())
            showResult(*m_model->result()); // the status line's temperatures
    });

    setRunning(false);
    setClimateFile(ResourceLocator::demoClimate());
}

QString HeatRecoveryComparisonView::statusText() const
{
    return m_status->text();
}

void HeatRecoveryComparisonView::setClimateFile(const QString& path)
{
    m_climateFile = path;
    const bool demo = !path.isEmpty() && QFileInfo(path) == QFileInfo(ResourceLocator::demoClimate());
    m_climateLabel->setText(path.isEmpty() ? tr("(none)")
                                           : demo ? tr("demo climate (invented)") : QFileInfo(path).fileName());
    m_climateLabel->setToolTip(path);
    m_stale = true;
    if (isVisible())
        runNow();
}

void HeatRecoveryComparisonView::showTab(Tab tab)
{
    m_tabs->setCurrentIndex(tab);
}

void HeatRecoveryComparisonView::setSettingsStore(QSettings* store)
{
    m_store = nullptr; // loading is no change to write back
    if (store)
        m_inputsModel->setInputs(HeatRecoveryInputs::load(*store));
    m_store = store;
}

void HeatRecoveryComparisonView::inputsChanged()
{
    if (m_store) {
        m_inputsModel->inputs().save(*m_store);
        m_store->sync();
    }
    projectChanged();
}

void HeatRecoveryComparisonView::chooseClimate()
{
    const QString start = m_climateFile.isEmpty() ? QString() : QFileInfo(m_climateFile).path();
    const QString path = QFileDialog::getOpenFileName(
        this, tr("Climate for the comparison"), start,
        tr("Weather or bin table (*.epw *.csv);;EPW weather files (*.epw);;Bin tables (*.csv)"));
    if (!path.isEmpty())
        setClimateFile(path);
}

void HeatRecoveryComparisonView::projectChanged()
{
    m_inputsModel->setSupplyFlow(m_document->project().unit.airflows.supply);
    m_stale = true;
    if (isVisible())
        runNow(); // stops the stale run
    else
        m_runner->cancel();
}

void HeatRecoveryComparisonView::runNow()
{
    m_stale = false;
    if (!m_document->result()) {
        m_runner->cancel();
        m_model->setResult(std::nullopt, m_evaluationYears);
        const QString why = MessageUnits::toDisplay(m_document->computeError(), *m_units);
        m_status->setText(tr("Not compared: the project has no results%1").arg(why.isEmpty() ? QString()
                                                                                             : QStringLiteral(" (%1)").arg(why)));
        redraw();
        return;
    }
    if (m_climateFile.isEmpty()) {
        m_status->setText(tr("Not compared: the demo climate (resources/demo/demo-climate.epw) was not found; "
                             "choose a climate file."));
        return;
    }
    m_inputsModel->setSupplyFlow(m_document->project().unit.airflows.supply);
    ComparisonRunner::Job job{m_document->project().unit, m_climateFile, m_inputsModel->inputs().settings(),
                              m_inputsModel->options()};
    // The sensitivity table is not shown here; leaving it out makes a run three
    // times shorter.
    job.settings.sensitivity = false;
    // Never a run on inputs the core refuses (a settings file edited by hand):
    // say which and stop the stale run.
    try {
        job.settings.validate();
        for (const auto& option : job.options)
            if (option.spec)
                option.spec->validate();
    } catch (const Core::Error& error) {
        m_runner->cancel();
        m_model->setResult(std::nullopt, m_evaluationYears);
        m_status->setText(tr("Not compared: %1 (see Options, Prices and Schedule).").arg(QString::fromUtf8(error.what())));
        redraw();
        return;
    }
    m_evaluationYears = job.settings.evaluationYears;
    m_progress->setValue(0);
    setRunning(true);
    m_status->setText(tr("Simulating a year for each option..."));
    m_runner->start(std::move(job));
}

bool HeatRecoveryComparisonView::waitUntilIdle(int timeoutMs)
{
    if (!m_runner->isRunning())
        return true;
    QEventLoop loop;
    QTimer timer;
    timer.setSingleShot(true);
    connect(&timer, &QTimer::timeout, &loop, &QEventLoop::quit);
    connect(m_runner, &ComparisonRunner::cancelled, &loop, &QEventLoop::quit);
    connect(m_runner, &ComparisonRunner::finished, &loop, &QEventLoop::quit);
    connect(m_runner, &ComparisonRunner::failed, &loop, &QEventLoop::quit);
    timer.start(timeoutMs);
    loop.exec();
    return !m_runner->isRunning();
}

void HeatRecoveryComparisonView::showEvent(QShowEvent* event)
{
    QWidget::showEvent(event);
    if (!m_splitPlaced) {
        // Half each the first time, whatever the wide table would like.
        m_splitPlaced = true;
        const int half = std::max(1, m_split->width() / 2);
        m_split->setSizes({half, half});
    }
    if (m_stale && !m_runner->isRunning())
        runNow();
}

void HeatRecoveryComparisonView::changeEvent(QEvent* event)
{
    QWidget::changeEvent(event);
    if (event->type() == QEvent::PaletteChange || event->type() == QEvent::FontChange)
        redraw();
}

void HeatRecoveryComparisonView::setRunning(bool running)
{
    m_progress->setVisible(running);
    m_cancel->setEnabled(running);
}

void HeatRecoveryComparisonView::showResult(const ComparisonResult& result)
{
    setRunning(false);
    if (!m_model->result() || &*m_model->result() != &result)
        m_model->setResult(result, m_evaluationYears);
    const auto& c = result.climate;
    const QString site = c.site.empty() ? tr("bin table") : QString::fromStdString(c.site);
    const QString method = c.method == ClimateMethod::Hourly ? tr("hourly") : tr("bins");
    QString text = tr("%1 (%2, %3 h; mean %4, lowest %5). ")
                       .arg(site, method, QString::number(Core::toHours(c.duration), 'f', 0),
                            m_units->format(Kind::Temperature, Core::toCelsius(c.meanDryBulb)),
                            m_units->format(Kind::Temperature, Core::toCelsius(c.minDryBulb)));
    if (!result.ranking.empty()) {
        const auto& best = result.ranking.front();
        QString name = QString::fromStdString(best.key);
        for (const auto& o : result.options)
            if (o.key == best.key)
                name = QString::fromStdString(o.name);
        text += tr("Best: %1, %2. ").arg(name, MessageUnits::toDisplay(QString::fromStdString(best.reason), *m_units));
    }
    const auto& inputs = m_inputsModel->inputs();
    const auto& p = inputs.settings().prices;
    const QString prices = tr("heat %1 and electricity %2 per kWh, cooling EER %3")
                               .arg(QString::number(p.heatPricePerKilowattHour, 'g', 4),
                                    QString::number(p.electricityPricePerKilowattHour, 'g', 4),
                                    QString::number(p.coolingEer, 'g', 3));
    if (inputs.optionsAreDefault() && inputs.settingsAreDefault())
        text += tr("Prices and extra costs are illustrative defaults (%1): enter your own under \"Options\" "
                   "and \"Prices and Schedule\".").arg(prices);
    else
        text += tr("With your inputs (%1).").arg(prices);
    m_status->setText(text);
    redraw();
}

void HeatRecoveryComparisonView::redraw()
{
    m_plot->clearPlottables();
    m_plot->clearItems();
    const QPalette pal = palette();
    PlotStyle::apply(*m_plot, pal);
    QFont small = font();
    small.setPointSizeF(std::max(6.5, font().pointSizeF() * 0.85));
    for (QCPAxis* axis : m_plot->axisRect()->axes()) {
        axis->setLabelFont(font());
        axis->setTickLabelFont(small);
    }
    m_plot->yAxis->grid()->setVisible(false);
    m_plot->xAxis->setLabel(tr("net saving [%1 per year]").arg(m_model->energyUnit()));
    m_plot->xAxis->ticker()->setTickCount(4);

    const int n = m_model->rowCount();
    if (n == 0) {
        m_plot->yAxis->setTicker(QSharedPointer<QCPAxisTicker>::create());
        m_plot->yAxis->setTickLabels(false);
        m_plot->replot();
        return;
    }
    // Horizontal bars, the first option at the top, so the names read across.
    QVector<double> keys;
    QVector<double> values;
    QVector<QString> names;
    double lo = 0.0;
    double hi = 0.0;
    for (int row = 0; row < n; ++row) {
        keys.push_back(n - row);
        values.push_back(m_model->netSavingShown(row));
        names.push_back(m_model->data(m_model->index(row, HeatRecoveryComparisonModel::OptionColumn)).toString());
        lo = std::min(lo, values.back());
        hi = std::max(hi, values.back());
    }
    auto ticker = QSharedPointer<QCPAxisTickerText>::create();
    ticker->setTicks(keys, names);
    m_plot->yAxis->setTicker(ticker);
    m_plot->yAxis->setTickLabels(true);
    m_plot->yAxis->setRange(0.4, n + 0.6);
    const double span = std::max(hi - lo, 1e-6);
    // Room beyond the bars for their value labels.
    m_plot->xAxis->setRange(lo - (lo < 0.0 ? 0.45 : 0.02) * span, hi + 0.45 * span);

    // The option ranked first in its own, darker fill.
    const QColor colour = PlotStyle::supplyColour();
    QVector<double> bestKeys;
    QVector<double> bestValues;
    QVector<double> otherKeys;
    QVector<double> otherValues;
    for (int row = 0; row < n; ++row) {
        const bool best = m_model->rank(row) == 1;
        (best ? bestKeys : otherKeys).push_back(keys[row]);
        (best ? bestValues : otherValues).push_back(values[row]);
    }
    auto addBars = [&](const QVector<double>& k, const QVector<double>& v, double towardsBase) {
        auto* bars = new QCPBars(m_plot->yAxis, m_plot->xAxis);
        bars->setData(k, v);
        bars->setWidth(0.6);
        bars->setPen(QPen(colour, 1.2));
        bars->setBrush(PlotStyle::mix(colour, pal.color(QPalette::Base), towardsBase));
        bars->setSelectable(QCP::stNone);
    };
    addBars(otherKeys, otherValues, 0.6);
    addBars(bestKeys, bestValues, 0.0);
    for (int row = 0; row < n; ++row) {
        auto* label = new QCPItemText(m_plot);
        label->position->setType(QCPItemPosition::ptPlotCoords);
        label->position->setAxes(m_plot->xAxis, m_plot->yAxis);
        label->position->setCoords(values[row], keys[row]);
        label->setPositionAlignment((values[row] < 0.0 ? Qt::AlignRight : Qt::AlignLeft) | Qt::AlignVCenter);
        QString text = m_model->data(m_model->index(row, HeatRecoveryComparisonModel::NetSavingColumn)).toString();
        if (m_model->rank(row) == 1)
            text += tr(" (best)");
        label->setText(text);
        label->setFont(small);
        label->setColor(pal.color(QPalette::Text));
        label->setPadding(QMargins(4, 0, 4, 0));
        label->setClipToAxisRect(true);
    }
    m_plot->replot();
}

const Core::Annual::ComparisonResult* HeatRecoveryComparisonView::currentResult() const
{
    if (m_stale || !m_model->result())
        return nullptr;
    return &*m_model->result();
}

} // namespace Airwright::Ui
