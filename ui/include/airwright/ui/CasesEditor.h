#pragma once
// The design cases table with buttons to add, copy and remove a case. Every cell
// is editable in place; a refused edit is explained under the table.

#include <QWidget>

class QLabel;
class QPushButton;
class QTableView;

namespace Airwright::Ui {

class CasesModel;
class ProjectDocument;
class UnitSystem;

class CasesEditor : public QWidget {
    Q_OBJECT
public:
    CasesEditor(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    CasesModel* model() const { return m_model; }
    QTableView* table() const { return m_table; }

private:
    int currentRow() const;
    void updateButtons();

    ProjectDocument* m_document;
    CasesModel* m_model;
    QTableView* m_table;
    QLabel* m_problem;
    QPushButton* m_add;
    QPushButton* m_copy;
    QPushButton* m_rename;
    QPushButton* m_remove;
};

} // namespace Airwright::Ui
