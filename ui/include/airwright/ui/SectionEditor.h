#pragma once
// The inputs of the selected section as typed fields with units, each committed
// through an EditSectionCommand, and below them the section's results in the
// chosen design case.

#include <QWidget>

#include <cstddef>

class QLabel;
class QStackedWidget;
class QTableWidget;
class QVBoxLayout;

namespace Airwright::Ui {

class FieldForm;
class ProjectDocument;
class UnitSystem;

class SectionEditor : public QWidget {
    Q_OBJECT
public:
    SectionEditor(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    void setCaseIndex(int index); // which case's results to list
    FieldForm* form() const { return m_form; }

private:
    void rebuild();
    void refresh();
    void refreshResults();

    ProjectDocument* m_document;
    UnitSystem* m_units;
    int m_caseIndex = 0;
    std::size_t m_formType = static_cast<std::size_t>(-1);

    QStackedWidget* m_stack;
    QLabel* m_title;
    QLabel* m_subtitle;
    QVBoxLayout* m_formHolder;
    FieldForm* m_form = nullptr;
    QLabel* m_resultsTitle;
    QTableWidget* m_results;
};

} // namespace Airwright::Ui
