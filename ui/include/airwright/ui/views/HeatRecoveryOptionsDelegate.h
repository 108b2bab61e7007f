#pragma once
// Editors for the heat recovery options table: a combo box for the frost
// protection, a line edit for the numbers that checks the text as it is typed
// (HeatRecoveryOptionsModel::check) and marks it while it would be refused;
// checked() tells the view what is wrong, or an empty text when nothing is.

#include <QStyledItemDelegate>

namespace Airwright::Ui {

class HeatRecoveryOptionsDelegate : public QStyledItemDelegate {
    Q_OBJECT
public:
    using QStyledItemDelegate::QStyledItemDelegate;

    QWidget* createEditor(QWidget* parent, const QStyleOptionViewItem& option, const QModelIndex& index) const override;
    void setEditorData(QWidget* editor, const QModelIndex& index) const override;
    void setModelData(QWidget* editor, QAbstractItemModel* model, const QModelIndex& index) const override;

signals:
    void checked(const QString& problem) const;
};

} // namespace Airwright::Ui
