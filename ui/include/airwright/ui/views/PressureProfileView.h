#pragma once
// The live static pressure profile of one design case (chosen at the top): both
// paths relative to ambient, sections named along the bottom (supply) and top
// (extract) axes, fans shaded as rises, and at each coupled section the supply
// minus extract pressure with its value.

#include "airwright/ui/views/PressureProfileModel.h"

#include <QWidget>

class QComboBox;
class QCustomPlot;

namespace Airwright::Ui {

class ProjectDocument;
class UnitSystem;

class PressureProfileView : public QWidget {
    Q_OBJECT
public:
    PressureProfileView(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    int caseIndex() const;
    void setCaseIndex(int index);
    const PressureProfileModel& model() const { return m_model; }
    QCustomPlot* plot() const { return m_plot; }

protected:
    void changeEvent(QEvent* event) override;

private:
    void rebuild();
    void redraw();
    void refreshCaseList();

    ProjectDocument* m_document;
    UnitSystem* m_units;
    PressureProfileModel m_model;
    QComboBox* m_cases;
    QCustomPlot* m_plot;
    int m_caseIndex = 0;
};

} // namespace Airwright::Ui
