#pragma once
// The static pressure along both paths of one design case, drawn as vectors with
// QPainter from a PressureProfileModel: distance along the unit across, static
// pressure relative to ambient up. Sections are marked by their schedule numbers
// (S1.. above the plot for supply, E1.. below it for extract).

#include "airwright/ui/views/PressureProfileModel.h"

#include <QRectF>
#include <QString>

class QPainter;

namespace Airwright::Ui {

class UnitSystem;

class PressureProfilePainter {
public:
    static void paint(QPainter& painter, const QRectF& rect, const PressureProfileModel& model, const UnitSystem& units,
                      double mmUnit);
};

} // namespace Airwright::Ui
