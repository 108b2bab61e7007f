#include "airwright/ui/MainWindow.h"

#include <QLabel>

namespace Airwright::Ui {

MainWindow::MainWindow(QWidget* parent) : QMainWindow(parent)
{
    setWindowTitle(tr("Airwright"));
    auto* label = new QLabel(tr("Air handling unit design"), this);
    label->setAlignment(Qt::AlignCenter);
    setCentralWidget(label);
    resize(1280, 800);
}

} // namespace Airwright::Ui
