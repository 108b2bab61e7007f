#include "airwright/ui/CasesEditor.h"

#include "airwright/ui/CasesModel.h"
#include "airwright/ui/ChoiceDelegate.h"
#include "airwright/ui/ProjectDocument.h"

#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QPushButton>
#include <QTableView>
#include <QVBoxLayout>

namespace Airwright::Ui {

CasesEditor::CasesEditor(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document)
{
    m_model = new CasesModel(document, units, this);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(4, 4, 4, 4);
    layout->setSpacing(4);

    m_table = new QTableView(this);
    m_table->setModel(m_model);
    m_table->setItemDelegate(new ChoiceDelegate(m_table));
    m_table->setSelectionBehavior(QAbstractItemView::SelectItems);
    m_table->setSelectionMode(QAbstractItemView::SingleSelection);
    m_table->setEditTriggers(QAbstractItemView::DoubleClicked | QAbstractItemView::EditKeyPressed
                             | QAbstractItemView::AnyKeyPressed);
    m_table->horizontalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_table->horizontalHeader()->setSectionResizeMode(CasesModel::Name, QHeaderView::Stretch);
    m_table->horizontalHeader()->setDefaultAlignment(Qt::AlignCenter);
    m_table->verticalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    layout->addWidget(m_table, 1);

    m_problem = new QLabel(this);
    m_problem->setWordWrap(true);
    m_problem->setStyleSheet(QStringLiteral("color: #d03030;"));
    m_problem->setVisible(false);
    layout->addWidget(m_problem);

    auto* buttons = new QHBoxLayout;
    m_add = new QPushButton(tr("Add case"), this);
    m_add->setToolTip(tr("Add a new design case with default conditions."));
    m_copy = new QPushButton(tr("Copy case"), this);
    m_copy->setToolTip(tr("Add a copy of the selected case to vary one condition."));
    m_rename = new QPushButton(tr("Rename"), this);
    m_rename->setToolTip(tr("Edit the name of the selected case."));
    m_remove = new QPushButton(tr("Remove case"), this);
    m_remove->setToolTip(tr("Remove the selected case (a unit keeps at least one)."));
    for (auto* b : {m_add, m_copy, m_rename, m_remove})
        buttons->addWidget(b);
    buttons->addStretch(1);
    layout->addLayout(buttons);

    connect(m_model, &CasesModel::problemFound, this, [this](const QString& message) {
        m_problem->setText(message);
        m_problem->setVisible(!message.isEmpty());
    });
    connect(m_add, &QPushButton::clicked, this, [this] { m_model->addCase(); });
    connect(m_copy, &QPushButton::clicked, this, [this] { m_model->addCase(currentRow()); });
    connect(m_remove, &QPushButton::clicked, this, [this] { m_model->removeCase(currentRow()); });
    connect(m_rename, &QPushButton::clicked, this, [this] {
        const int row = currentRow();
        if (row < 0)
            return;
        const QModelIndex index = m_model->index(row, CasesModel::Name);
        m_table->setCurrentIndex(index);
        m_table->edit(index);
    });
    connect(m_table->selectionModel(), &QItemSelectionModel::currentChanged, this, [this] { updateButtons(); });
    connect(m_model, &QAbstractItemModel::modelReset, this, [this] { updateButtons(); });
    updateButtons();
}

int CasesEditor::currentRow() const
{
    const QModelIndex current = m_table->currentIndex();
    return current.isValid() ? current.row() : -1;
}

void CasesEditor::updateButtons()
{
    const bool selected = currentRow() >= 0;
    m_copy->setEnabled(selected);
    m_rename->setEnabled(selected);
    m_remove->setEnabled(selected && m_model->rowCount() > 1);
}

} // namespace Airwright::Ui
