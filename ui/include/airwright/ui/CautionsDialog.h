#pragma once
// What a designer must keep in mind when using the results: safety of electric
// heaters, frost, humidifier hygiene, and that the program is a design aid.

#include <QDialog>

namespace Airwright::Ui {

class CautionsDialog : public QDialog {
    Q_OBJECT
public:
    explicit CautionsDialog(QWidget* parent = nullptr);

    static QString text(); // the cautions as rich text
};

} // namespace Airwright::Ui
