#pragma once
// The program's widget style: Fusion, with one change. Fusion outlines a check
// box in a darker shade of the window colour, which on a dark palette is as dark
// as the field behind it, so an unticked box (in a form or a table cell) cannot
// be seen. On a dark palette this style adds a mid-grey outline.

#include <QProxyStyle>

namespace Airwright::Ui {

class AppStyle : public QProxyStyle {
    Q_OBJECT
public:
    AppStyle();

    void drawPrimitive(PrimitiveElement element, const QStyleOption* option, QPainter* painter,
                       const QWidget* widget = nullptr) const override;

    // True when the palette's fields are dark (base colour lightness below half).
    static bool isDark(const QPalette& palette);
};

} // namespace Airwright::Ui
