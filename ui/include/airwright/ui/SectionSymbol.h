#pragma once
// Plain line symbols for the unit drawing and the section list: each kind of
// equipment drawn with a few strokes so it reads at a glance (pleats for a
// filter, tubes and fins for a coil, blades for a fan or a damper). Coupled
// sections have a second form that spans both decks.

#include "airwright/ui/SectionCatalog.h"

#include <QColor>
#include <QIcon>
#include <QRectF>

class QPainter;

namespace Airwright::Ui {

class SectionSymbol {
public:
    struct Colours {
        QColor line;
        QColor heat;  // heating coils and heaters
        QColor cool;  // cooling coils
        QColor water; // humidifiers, liquid loops
        QColor fill;  // light fill of solid parts (baffles)
    };
    static Colours coloursFor(const QColor& line, const QColor& background);

    // Within one deck (coupled symbols get a compact single-deck form here).
    static void paint(QPainter& painter, const QRectF& area, SectionCatalog::Symbol symbol, const Colours& colours);

    // A coupled section across both decks: the supply part, the extract part and
    // the band between them (the partition). `supplyOnTop` tells which way the
    // recirculated air goes.
    static void paintCoupled(QPainter& painter, const QRectF& supplyArea, const QRectF& extractArea,
                             SectionCatalog::Symbol symbol, const Colours& colours, bool supplyOnTop);

    // An icon of the symbol for lists and menus.
    static QIcon icon(SectionCatalog::Symbol symbol, const QColor& line, const QColor& background);
};

} // namespace Airwright::Ui
