#pragma once
// The heat recovery options of the comparison, editable: the options table
// (HeatRecoveryOptionsModel) with a line saying why a value was refused, and a
// button back to the defaults.

#include <QString>
#include <QWidget>

class QLabel;
class QTableView;

namespace Airwright::Ui {

class HeatRecoveryOptionsModel;

class HeatRecoveryOptionsPanel : public QWidget {
    Q_OBJECT
public:
    // model must outlive the panel.
    explicit HeatRecoveryOptionsPanel(HeatRecoveryOptionsModel* model, QWidget* parent = nullptr);

    QTableView* table() const { return m_table; }
    QString message() const; // why the last value was refused, or empty

private:
    void showMessage(const QString& problem);
    void fitTable();

    HeatRecoveryOptionsModel* m_model;
    QTableView* m_table;
    QLabel* m_message;
};

} // namespace Airwright::Ui
