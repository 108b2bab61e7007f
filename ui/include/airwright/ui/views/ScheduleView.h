#pragma once
// The live section schedule of one design case: a sortable table (ScheduleModel
// behind a sort proxy), a case selector and a Copy action (also Ctrl+C) that puts
// the selected rows, or all rows, on the clipboard as tab-separated text with a
// header row, for spreadsheets. Clicking a row selects its section in the
// document; a selection made elsewhere is shown here.

#include <QWidget>

class QAction;
class QComboBox;
class QLabel;
class QModelIndex;
class QSortFilterProxyModel;
class QTableView;

namespace Airwright::Ui {

class ProjectDocument;
class ScheduleModel;
class UnitSystem;

class ScheduleView : public QWidget {
    Q_OBJECT
public:
    ScheduleView(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    int caseIndex() const;
    void setCaseIndex(int index);

    ScheduleModel* model() const { return m_model; }
    QSortFilterProxyModel* proxy() const { return m_proxy; }
    QTableView* table() const { return m_table; }
    QAction* copyAction() const { return m_copy; }

    // What Copy puts on the clipboard: the selected rows in the order shown, or
    // every row when nothing is selected.
    QString copyText() const;

public slots:
    void copyToClipboard();

private:
    void rebuild();
    // Each column as wide as its widest cell or header line (the unit sits on a
    // second header line); QHeaderView's own fit adds the header's height for the
    // sort arrow, which makes two-line headers far too wide.
    void fitColumns();
    void showSelection(const QString& id);
    void rowActivated(const QModelIndex& index);

    ProjectDocument* m_document;
    ScheduleModel* m_model;
    QSortFilterProxyModel* m_proxy;
    QTableView* m_table;
    QComboBox* m_cases;
    QLabel* m_status;
    QAction* m_copy;
    int m_caseIndex = 0;
    bool m_syncing = false;
};

} // namespace Airwright::Ui
