#pragma once
// The psychrometric chart of the printed schedule, drawn as vectors with QPainter
// from a PsychroChartModel (t-W form, ASHRAE Fundamentals ch. 1 chart layout:
// dry bulb across, humidity ratio up the right side): saturation curve, relative
// humidity and enthalpy lines, and per design case the process lines of both
// paths through the section boundary states.

#include "airwright/ui/views/PsychroChartModel.h"

#include <QRectF>

class QPainter;

namespace Airwright::Ui {

class PsychroChartPainter {
public:
    // rect: the whole chart including axis labels and legend; mmUnit: device units per mm.
    static void paint(QPainter& painter, const QRectF& rect, const PsychroChartModel& model, double mmUnit);
};

} // namespace Airwright::Ui
