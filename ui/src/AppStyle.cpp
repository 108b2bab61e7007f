#include "airwright/ui/AppStyle.h"

#include <QPainter>
#include <QStyleFactory>
#include <QStyleOption>

namespace Airwright::Ui {

AppStyle::AppStyle() : QProxyStyle(QStyleFactory::create(QStringLiteral("Fusion"))) {}

bool AppStyle::isDark(const QPalette& palette)
{
    return palette.color(QPalette::Base).lightness() < 128;
}

void AppStyle::drawPrimitive(PrimitiveElement element, const QStyleOption* option, QPainter* painter,
                             const QWidget* widget) const
{
    QProxyStyle::drawPrimitive(element, option, painter, widget);
    if (element != PE_IndicatorCheckBox || !option || !isDark(option->palette))
        return;
    // Over the square Fusion just drew (the option rectangle less its last pixel
    // row and column; item view checks come here too), in a colour that stands
    // out from both the window and the field.
    painter->save();
    painter->setRenderHint(QPainter::Antialiasing, false);
    QColor outline = option->palette.color(QPalette::Text);
    outline.setAlphaF((option->state & State_Enabled) ? 0.55f : 0.3f);
    painter->setPen(QPen(outline, 0.0));
    painter->setBrush(Qt::NoBrush);
    painter->drawRect(option->rect.adjusted(0, 0, -1, -1));
    painter->restore();
}

} // namespace Airwright::Ui
