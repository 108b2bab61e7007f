#pragma once
// The live psychrometric view: the t-W chart or the h-x diagram (a toggle at the
// top) with every design case's supply process drawn solid and its extract process
// dashed, one colour per case. Hovering a state point shows its properties;
// clicking one selects its section; the selected section is underlaid in the
// palette's highlight colour. Follows the document's results and selection and
// the unit system.

#include "airwright/ui/views/PsychroChartModel.h"

#include <QPointF>
#include <QVector>
#include <QWidget>

class QCPItemText;
class QCustomPlot;
class QLabel;
class QMouseEvent;
class QToolButton;

namespace Airwright::Ui {

class ProjectDocument;
class UnitSystem;

class PsychroChartView : public QWidget {
    Q_OBJECT
public:
    PsychroChartView(ProjectDocument* document, UnitSystem* units, QWidget* parent = nullptr);

    PsychroChartModel::Diagram diagram() const { return m_model.diagram(); }
    void setDiagram(PsychroChartModel::Diagram diagram);
    const PsychroChartModel& model() const { return m_model; }
    QCustomPlot* plot() const { return m_plot; }

    // The tooltip text for a widget position on the plot, empty when no state point
    // is within reach (exposed for tests; the view shows it on hover).
    QString tipAt(const QPoint& plotPixel) const;

protected:
    void changeEvent(QEvent* event) override;

private:
    struct Hit {
        int process = -1;
        bool extract = false;
        int point = -1;
    };

    void rebuild();
    void redraw();
    // After each layout of the plot (so in pixels of its current size): places the
    // reference-line labels in the order saturation, relative humidity, enthalpy.
    // A label that would be cut by the frame or cover the legend or a label placed
    // before it slides down its line (relative humidity) or, where it cannot,
    // is hidden.
    void placeReferenceLabels();

    struct ReferenceLabel {
        QCPItemText* item = nullptr; // owned by the plot
        QVector<QPointF> line;       // plot coordinates
        bool slides = false;         // may move along the line
        QPointF preferred;           // plot coordinates
    };
    Hit hitAt(const QPointF& pixel) const;
    void onMouseMove(QMouseEvent* event);
    void onMousePress(QMouseEvent* event);

    ProjectDocument* m_document;
    UnitSystem* m_units;
    PsychroChartModel m_model;
    QCustomPlot* m_plot;
    QToolButton* m_chartButton;
    QToolButton* m_mollierButton;
    QLabel* m_pressureLabel;
    QVector<ReferenceLabel> m_referenceLabels; // in priority order
    PsychroChartModel::Diagram m_diagram = PsychroChartModel::Diagram::DryBulbHumidity;
};

} // namespace Airwright::Ui
