#include "airwright/ui/views/HeatRecoveryPricesPanel.h"

#include "airwright/ui/views/HeatRecoveryOptionsModel.h"

#include <QComboBox>
#include <QDoubleSpinBox>
#include <QGridLayout>
#include <QGroupBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QPushButton>
#include <QSpinBox>
#include <QVBoxLayout>

namespace Airwright::Ui {

namespace {

using namespace Airwright::Core::Annual;

QDoubleSpinBox* number(QWidget* parent, double lo, double hi, int decimals, double step, const QString& suffix)
{
    auto* box = new QDoubleSpinBox(parent);
    box->setRange(lo, hi);
    box->setDecimals(decimals);
    box->setSingleStep(step);
    box->setSuffix(suffix);
    box->setKeyboardTracking(false); // one change per finished entry, not per keystroke
    box->setAlignment(Qt::AlignRight);
    return box;
}

QSpinBox* whole(QWidget* parent, int lo, int hi, const QString& suffix)
{
    auto* box = new QSpinBox(parent);
    box->setRange(lo, hi);
    box->setSuffix(suffix);
    box->setKeyboardTracking(false);
    box->setAlignment(Qt::AlignRight);
    return box;
}

// Bold label and field when the value is not the default; the default in the tooltip.
void markDefault(QWidget* field, bool isDefault, const QString& defaultText)
{
    QFont f = field->font();
    f.setBold(!isDefault);
    field->setFont(f);
    for (auto* label : field->parentWidget()->findChildren<QLabel*>(Qt::FindDirectChildrenOnly))
        if (label->buddy() == field)
            label->setFont(f);
    field->setToolTip(isDefault ? QObject::tr("The default")
                                : QObject::tr("Changed; the default is %1").arg(defaultText));
}

QString plain(double v)
{
    return QString::number(v, 'g', 6);
}

} // namespace

HeatRecoveryPricesPanel::HeatRecoveryPricesPanel(HeatRecoveryOptionsModel* model, QWidget* parent)
    : QWidget(parent), m_model(model)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(6, 4, 6, 4);

    auto addPair = [](QGridLayout* grid, int row, const QString& label, QWidget* field) {
        auto* l = new QLabel(label, field->parentWidget());
        l->setBuddy(field);
        grid->addWidget(l, row, 0);
        grid->addWidget(field, row, 1);
    };
    auto* groups = new QHBoxLayout;
    auto* pricesBox = new QGroupBox(tr("Prices and emission factors"), this);
    auto* prices = new QGridLayout(pricesBox);
    // Money has no unit in the program: prices are in the user's currency.
    m_heatPrice = number(pricesBox, 0.0, 100.0, 3, 0.01, tr(" per kWh"));
    m_electricityPrice = number(pricesBox, 0.0, 100.0, 3, 0.01, tr(" per kWh"));
    m_heatCo2 = number(pricesBox, 0.0, 100.0, 3, 0.01, tr(" kg/kWh"));
    m_electricityCo2 = number(pricesBox, 0.0, 100.0, 3, 0.01, tr(" kg/kWh"));
    m_eer = number(pricesBox, 0.5, 20.0, 2, 0.1, QString());
    m_years = number(pricesBox, 1.0, 50.0, 0, 1.0, tr(" years"));
    addPair(prices, 0, tr("Heat price:"), m_heatPrice);
    addPair(prices, 1, tr("Electricity price:"), m_electricityPrice);
    addPair(prices, 2, tr("CO2 of heat:"), m_heatCo2);
    addPair(prices, 3, tr("CO2 of electricity:"), m_electricityCo2);
    addPair(prices, 4, tr("Cooling seasonal EER:"), m_eer);
    addPair(prices, 5, tr("Evaluation period:"), m_years);
    groups->addWidget(pricesBox, 0, Qt::AlignTop);

    auto* scheduleBox = new QGroupBox(tr("Operating schedule"), this);
    auto* schedule = new QGridLayout(scheduleBox);
    m_hours = whole(scheduleBox, 1, 24, tr(" h"));
    m_firstHour = whole(scheduleBox, 0, 23, tr(":00"));
    m_days = whole(scheduleBox, 1, 7, QString());
    m_holidays = whole(scheduleBox, 0, 52, QString());
    m_offHours = new QComboBox(scheduleBox);
    m_offHours->addItem(tr("off"));
    m_offHours->addItem(tr("setback (reduced airflow)"));
    addPair(schedule, 0, tr("Hours per day:"), m_hours);
    addPair(schedule, 1, tr("Starting at:"), m_firstHour);
    addPair(schedule, 2, tr("Days per week:"), m_days);
    addPair(schedule, 3, tr("Holiday weeks:"), m_holidays);
    addPair(schedule, 4, tr("Outside these hours:"), m_offHours);
    auto* restoreAll = new QPushButton(tr("Default Prices and Schedule"), this);
    groups->addWidget(scheduleBox, 0, Qt::AlignTop);
    groups->addStretch(1);
    layout->addLayout(groups);
    auto* bottom = new QHBoxLayout;
    bottom->addWidget(restoreAll);
    bottom->addStretch(1);
    layout->addLayout(bottom);
    layout->addStretch(1);

    for (auto* box : {m_heatPrice, m_electricityPrice, m_heatCo2, m_electricityCo2, m_eer, m_years})
        connect(box, &QDoubleSpinBox::valueChanged, this, &HeatRecoveryPricesPanel::settingsEdited);
    for (auto* box : {m_hours, m_firstHour, m_days, m_holidays})
        connect(box, &QSpinBox::valueChanged, this, &HeatRecoveryPricesPanel::settingsEdited);
    connect(m_offHours, &QComboBox::currentIndexChanged, this, &HeatRecoveryPricesPanel::settingsEdited);
    connect(m_model, &HeatRecoveryOptionsModel::inputsChanged, this, &HeatRecoveryPricesPanel::showSettings);
    connect(restoreAll, &QPushButton::clicked, this, [this] { m_model->setSettings(ComparisonSettings{}); });

    showSettings();
}

void HeatRecoveryPricesPanel::restoreDefaults()
{
    m_model->setSettings(ComparisonSettings{});
}

void HeatRecoveryPricesPanel::settingsEdited()
{
    ComparisonSettings s = m_model->inputs().settings();
    s.prices.heatPricePerKilowattHour = m_heatPrice->value();
    s.prices.electricityPricePerKilowattHour = m_electricityPrice->value();
    s.prices.heatCo2KilogramsPerKilowattHour = m_heatCo2->value();
    s.prices.electricityCo2KilogramsPerKilowattHour = m_electricityCo2->value();
    s.prices.coolingEer = m_eer->value();
    s.evaluationYears = m_years->value();
    s.annual.schedule.hoursPerDay = m_hours->value();
    s.annual.schedule.firstHour = m_firstHour->value();
    s.annual.schedule.daysPerWeek = m_days->value();
    s.annual.schedule.holidayWeeks = m_holidays->value();
    s.annual.schedule.offHours = m_offHours->currentIndex() == 1 ? OffHoursMode::Setback : OffHoursMode::Off;
    m_model->setSettings(s);
}

void HeatRecoveryPricesPanel::showSettings()
{
    const ComparisonSettings& s = m_model->inputs().settings();
    const ComparisonSettings d;
    const QList<QWidget*> fields{m_heatPrice, m_electricityPrice, m_heatCo2, m_electricityCo2, m_eer,     m_years,
                                 m_hours,     m_firstHour,        m_days,    m_holidays,       m_offHours};
    for (QWidget* w : fields)
        w->blockSignals(true);
    m_heatPrice->setValue(s.prices.heatPricePerKilowattHour);
    m_electricityPrice->setValue(s.prices.electricityPricePerKilowattHour);
    m_heatCo2->setValue(s.prices.heatCo2KilogramsPerKilowattHour);
    m_electricityCo2->setValue(s.prices.electricityCo2KilogramsPerKilowattHour);
    m_eer->setValue(s.prices.coolingEer);
    m_years->setValue(s.evaluationYears);
    m_hours->setValue(s.annual.schedule.hoursPerDay);
    m_firstHour->setValue(s.annual.schedule.firstHour);
    m_days->setValue(s.annual.schedule.daysPerWeek);
    m_holidays->setValue(s.annual.schedule.holidayWeeks);
    m_offHours->setCurrentIndex(s.annual.schedule.offHours == OffHoursMode::Setback ? 1 : 0);
    for (QWidget* w : fields)
        w->blockSignals(false);

    const auto& p = s.prices;
    const auto& dp = d.prices;
    const auto& sc = s.annual.schedule;
    const auto& ds = d.annual.schedule;
    markDefault(m_heatPrice, p.heatPricePerKilowattHour == dp.heatPricePerKilowattHour,
                plain(dp.heatPricePerKilowattHour));
    markDefault(m_electricityPrice, p.electricityPricePerKilowattHour == dp.electricityPricePerKilowattHour,
                plain(dp.electricityPricePerKilowattHour));
    markDefault(m_heatCo2, p.heatCo2KilogramsPerKilowattHour == dp.heatCo2KilogramsPerKilowattHour,
                plain(dp.heatCo2KilogramsPerKilowattHour));
    markDefault(m_electricityCo2, p.electricityCo2KilogramsPerKilowattHour == dp.electricityCo2KilogramsPerKilowattHour,
                plain(dp.electricityCo2KilogramsPerKilowattHour));
    markDefault(m_eer, p.coolingEer == dp.coolingEer, plain(dp.coolingEer));
    markDefault(m_years, s.evaluationYears == d.evaluationYears, plain(d.evaluationYears));
    markDefault(m_hours, sc.hoursPerDay == ds.hoursPerDay, QString::number(ds.hoursPerDay));
    markDefault(m_firstHour, sc.firstHour == ds.firstHour, QString::number(ds.firstHour));
    markDefault(m_days, sc.daysPerWeek == ds.daysPerWeek, QString::number(ds.daysPerWeek));
    markDefault(m_holidays, sc.holidayWeeks == ds.holidayWeeks, QString::number(ds.holidayWeeks));
    markDefault(m_offHours, sc.offHours == ds.offHours, m_offHours->itemText(0));
}

} // namespace Airwright::Ui
