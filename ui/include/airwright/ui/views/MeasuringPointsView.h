#pragma once
// The live table of measuring and control points: a sortable table
// (MeasuringPointsModel behind a sort proxy), a line saying why it is empty when
// it is, and a Copy action (also Ctrl+C) that puts the selected rows, or all
// rows, on the clipboard as tab-separated text with a header row.

#include <QWidget>

class QAction;
class QLabel;
class QSortFilterProxyModel;
class QTableView;

namespace Airwright::Ui {

class MeasuringPointsModel;
class ProjectDocument;
class UnitSystem;

class MeasuringPointsView : public QWidget {
    Q_OBJECT
public:
    MeasuringPointsView(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    MeasuringPointsModel* model() const { return m_model; }
    QSortFilterProxyModel* proxy() const { return m_proxy; }
    QTableView* table() const { return m_table; }
    QLabel* status() const { return m_status; }
    QAction* copyAction() const { return m_copy; }

    // What Copy puts on the clipboard: the selected rows in the order shown, or
    // every row when nothing is selected.
    QString copyText() const;

public slots:
    void copyToClipboard();

private:
    void rebuild();
    void showStatus();
    // Each column as wide as its widest cell or header, the long text columns
    // capped so the table stays readable; their full text is in the tooltip.
    void fitColumns();

    ProjectDocument* m_document;
    MeasuringPointsModel* m_model;
    QSortFilterProxyModel* m_proxy;
    QTableView* m_table;
    QLabel* m_status;
    QAction* m_copy;
};

} // namespace Airwright::Ui
