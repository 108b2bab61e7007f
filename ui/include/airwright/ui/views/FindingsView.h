#pragma once
// The live list of findings of every design case, errors first. Clicking a
// finding that names a section selects that section in the document.

#include <QWidget>

class QLabel;
class QModelIndex;
class QTableView;

namespace Airwright::Ui {

class FindingsModel;
class ProjectDocument;
class UnitSystem;

class FindingsView : public QWidget {
    Q_OBJECT
public:
    explicit FindingsView(ProjectDocument* document, QWidget* parent = nullptr);
    // Messages in the units of `units` (SI or IP), following its changes.
    FindingsView(ProjectDocument* document, const UnitSystem* units, QWidget* parent = nullptr);

    FindingsModel* model() const { return m_model; }
    QTableView* table() const { return m_table; }

private:
    void rebuild();
    void rowClicked(const QModelIndex& index);

    ProjectDocument* m_document;
    FindingsModel* m_model;
    QTableView* m_table;
    QLabel* m_summary;
};

} // namespace Airwright::Ui
