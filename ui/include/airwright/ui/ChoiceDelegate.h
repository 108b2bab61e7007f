#pragma once
// Edits a table cell that offers a fixed list of choices (the model gives the list
// under CasesModel::ChoicesRole and the current index under Qt::EditRole) with a
// combo box; any other cell gets the default editor.

#include <QStyledItemDelegate>

namespace Airwright::Ui {

class ChoiceDelegate : public QStyledItemDelegate {
    Q_OBJECT
public:
    using QStyledItemDelegate::QStyledItemDelegate;

    QWidget* createEditor(QWidget* parent, const QStyleOptionViewItem& option, const QModelIndex& index) const override;
    void setEditorData(QWidget* editor, const QModelIndex& index) const override;
    void setModelData(QWidget* editor, QAbstractItemModel* model, const QModelIndex& index) const override;
};

} // namespace Airwright::Ui
