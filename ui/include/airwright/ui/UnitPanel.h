#pragma once
// The unit drawing with the choice of the design case whose figures it shows.

#include <QWidget>

class QComboBox;

namespace Airwright::Ui {

class ProjectDocument;
class UnitDrawing;
class UnitSystem;

class UnitPanel : public QWidget {
    Q_OBJECT
public:
    UnitPanel(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    UnitDrawing* drawing() const { return m_drawing; }
    QComboBox* caseChoice() const { return m_cases; }
    int caseIndex() const;

signals:
    void caseIndexChanged(int index);

private:
    void updateCases();

    ProjectDocument* m_document;
    QComboBox* m_cases;
    UnitDrawing* m_drawing;
};

} // namespace Airwright::Ui
