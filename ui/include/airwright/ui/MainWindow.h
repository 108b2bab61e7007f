#pragma once

#include <QMainWindow>

namespace Airwright::Ui {

class MainWindow : public QMainWindow {
    Q_OBJECT
public:
    explicit MainWindow(QWidget* parent = nullptr);
};

} // namespace Airwright::Ui
