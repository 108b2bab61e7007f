#pragma once
// The prices, emission factors, evaluation period and operating schedule of the
// heat recovery comparison, editable. Spin boxes hold their values inside the
// ranges the core accepts (EnergyPrices, ComparisonSettings, OperatingSchedule).
// Values that differ from the defaults are shown bold with the default in the
// tooltip. Every change goes into the HeatRecoveryOptionsModel, which holds all
// the comparison's inputs and announces it with inputsChanged().

#include <QString>
#include <QWidget>

class QComboBox;
class QDoubleSpinBox;
class QSpinBox;

namespace Airwright::Ui {

class HeatRecoveryOptionsModel;

class HeatRecoveryPricesPanel : public QWidget {
    Q_OBJECT
public:
    // model must outlive the panel.
    explicit HeatRecoveryPricesPanel(HeatRecoveryOptionsModel* model, QWidget* parent = nullptr);

    QDoubleSpinBox* heatPrice() const { return m_heatPrice; }
    QDoubleSpinBox* evaluationYears() const { return m_years; }
    QSpinBox* hoursPerDay() const { return m_hours; }

    void restoreDefaults(); // prices and schedule

private:
    void settingsEdited();
    void showSettings(); // from the model, without echoing back

    HeatRecoveryOptionsModel* m_model;
    QDoubleSpinBox* m_heatPrice;
    QDoubleSpinBox* m_electricityPrice;
    QDoubleSpinBox* m_heatCo2;
    QDoubleSpinBox* m_electricityCo2;
    QDoubleSpinBox* m_eer;
    QDoubleSpinBox* m_years;
    QSpinBox* m_hours;
    QSpinBox* m_firstHour;
    QSpinBox* m_days;
    QSpinBox* m_holidays;
    QComboBox* m_offHours;
};

} // namespace Airwright::Ui
