#include "airwright/ui/views/HeatRecoveryOptionsPanel.h"

#include "airwright/ui/views/HeatRecoveryOptionsDelegate.h"
#include "airwright/ui/views/HeatRecoveryOptionsModel.h"

#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPushButton>
#include <QTableView>
#include <QVBoxLayout>

namespace Airwright::Ui {

HeatRecoveryOptionsPanel::HeatRecoveryOptionsPanel(HeatRecoveryOptionsModel* model, QWidget* parent)
    : QWidget(parent), m_model(model)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(6, 4, 6, 4);

    auto* top = new QHBoxLayout;
    auto* hint = new QLabel(tr("Datasheet figures at the rated flow (the unit's supply design flow). Double-click a "
                               "cell to edit it; bold: changed from the default, which the tooltip gives."),
                            this);
    hint->setWordWrap(true);
    top->addWidget(hint, 1);
    auto* restore = new QPushButton(tr("Default Options"), this);
    restore->setToolTip(tr("Put every option back to its default figures"));
    top->addWidget(restore, 0, Qt::AlignBottom);
    layout->addLayout(top);

    m_table = new QTableView(this);
    m_table->setModel(m_model);
    auto* delegate = new HeatRecoveryOptionsDelegate(m_table);
    m_table->setItemDelegate(delegate);
    m_table->setEditTriggers(QAbstractItemView::DoubleClicked | QAbstractItemView::EditKeyPressed |
                             QAbstractItemView::AnyKeyPressed);
    m_table->setSelectionMode(QAbstractItemView::SingleSelection);
    m_table->setAlternatingRowColors(true);
    m_table->setWordWrap(false);
    m_table->verticalHeader()->setVisible(false);
    m_table->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_table->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    m_table->setSizePolicy(QSizePolicy::Expanding, QSizePolicy::Fixed);
    layout->addWidget(m_table);

    m_message = new QLabel(this);
    m_message->setWordWrap(true);
    m_message->setTextInteractionFlags(Qt::TextSelectableByMouse);
    m_message->setVisible(false);
    layout->addWidget(m_message);
    layout->addStretch(1);

    connect(delegate, &HeatRecoveryOptionsDelegate::checked, this, &HeatRecoveryOptionsPanel::showMessage);
    connect(m_model, &HeatRecoveryOptionsModel::problemFound, this, &HeatRecoveryOptionsPanel::showMessage);
    connect(m_model, &HeatRecoveryOptionsModel::inputsChanged, this, [this] { showMessage({}); });
    connect(m_model, &QAbstractItemModel::headerDataChanged, this, &HeatRecoveryOptionsPanel::fitTable);
    connect(m_model, &QAbstractItemModel::dataChanged, this, &HeatRecoveryOptionsPanel::fitTable);
    connect(restore, &QPushButton::clicked, m_model, &HeatRecoveryOptionsModel::restoreDefaultOptions);
    fitTable();
}

QString HeatRecoveryOptionsPanel::message() const
{
    return m_message->text();
}

void HeatRecoveryOptionsPanel::showMessage(const QString& problem)
{
    m_message->setText(problem.isEmpty() ? QString() : tr("Not valid: %1").arg(problem));
    m_message->setVisible(!problem.isEmpty());
    QPalette pal = palette();
    if (!problem.isEmpty())
        pal.setColor(QPalette::WindowText, QColor(0xd0, 0x30, 0x30));
    m_message->setPalette(pal);
}

void HeatRecoveryOptionsPanel::fitTable()
{
    // Tall enough for every option: the table never scrolls.
    m_table->resizeColumnsToContents();
    int height = m_table->horizontalHeader()->sizeHint().height() + 2 * m_table->frameWidth();
    for (int row = 0; row < m_model->rowCount(); ++row)
        height += m_table->rowHeight(row);
    m_table->setFixedHeight(height);
}

} // namespace Airwright::Ui
