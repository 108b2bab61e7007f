#pragma once
// The project as a whole: its facts (name, reference, designer, ...), the site,
// the design airflows with their basis and external pressures, and the casing
// sizing. Each group commits through its own undo command.

#include <QWidget>

namespace Airwright::Ui {

class FieldForm;
class ProjectDocument;
class UnitSystem;

class ProjectEditor : public QWidget {
    Q_OBJECT
public:
    ProjectEditor(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    FieldForm* infoForm() const { return m_info; }
    FieldForm* siteForm() const { return m_site; }
    FieldForm* airflowsForm() const { return m_airflows; }
    FieldForm* casingForm() const { return m_casing; }

private:
    void refresh();

    ProjectDocument* m_document;
    UnitSystem* m_units;
    FieldForm* m_info;
    FieldForm* m_site;
    FieldForm* m_airflows;
    FieldForm* m_casing;
};

} // namespace Airwright::Ui
