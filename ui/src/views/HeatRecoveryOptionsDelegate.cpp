#include "airwright/ui/views/HeatRecoveryOptionsDelegate.h"

#include "airwright/ui/views/HeatRecoveryOptionsModel.h"

#include <QComboBox>
#include <QLineEdit>
#include <QPersistentModelIndex>

namespace Airwright::Ui {

QWidget* HeatRecoveryOptionsDelegate::createEditor(QWidget* parent, const QStyleOptionViewItem& option,
                                                   const QModelIndex& index) const
{
    const QStringList choices = index.data(HeatRecoveryOptionsModel::ChoicesRole).toStringList();
    auto* self = const_cast<HeatRecoveryOptionsDelegate*>(this); // signals are non-const; the delegate is not changed
    if (!choices.isEmpty()) {
        auto* combo = new QComboBox(parent);
        combo->addItems(choices);
        // Commit as soon as a choice is picked, not only when the cell loses focus.
        connect(combo, &QComboBox::activated, self, [self, combo] { emit self->commitData(combo); });
        return combo;
    }
    const auto* model = qobject_cast<const HeatRecoveryOptionsModel*>(index.model());
    if (!model)
        return QStyledItemDelegate::createEditor(parent, option, index);
    auto* edit = new QLineEdit(parent);
    edit->setAlignment(Qt::AlignRight | Qt::AlignVCenter);
    const QPersistentModelIndex cell(index);
    connect(edit, &QLineEdit::textEdited, self, [self, edit, model, cell](const QString& text) {
        const QString problem = cell.isValid() ? model->check(cell, text) : QString();
        // A red frame while the text would be refused; the reason goes below the table.
        edit->setStyleSheet(problem.isEmpty() ? QString() : QStringLiteral("QLineEdit { border: 2px solid #d03030; }"));
        edit->setToolTip(problem);
        emit self->checked(problem);
    });
    return edit;
}

void HeatRecoveryOptionsDelegate::setEditorData(QWidget* editor, const QModelIndex& index) const
{
    if (auto* combo = qobject_cast<QComboBox*>(editor)) {
        combo->setCurrentIndex(index.data(Qt::EditRole).toInt());
        return;
    }
    if (auto* edit = qobject_cast<QLineEdit*>(editor)) {
        edit->setText(index.data(Qt::EditRole).toString());
        return;
    }
    QStyledItemDelegate::setEditorData(editor, index);
}

void HeatRecoveryOptionsDelegate::setModelData(QWidget* editor, QAbstractItemModel* model,
                                               const QModelIndex& index) const
{
    if (auto* combo = qobject_cast<QComboBox*>(editor)) {
        if (combo->currentIndex() != index.data(Qt::EditRole).toInt())
            model->setData(index, combo->currentIndex(), Qt::EditRole);
        return;
    }
    if (auto* edit = qobject_cast<QLineEdit*>(editor)) {
        model->setData(index, edit->text(), Qt::EditRole);
        return;
    }
    QStyledItemDelegate::setModelData(editor, model, index);
}

} // namespace Airwright::Ui
