#include "airwright/ui/Appearance.h"

#include "airwright/ui/AppStyle.h"

#include <QApplication>
#include <QPalette>
#include <QStyle>

namespace Airwright::Ui {

QPalette Appearance::darkPalette()
{
    QPalette p;
    const QColor window(0x2b, 0x2d, 0x30);
    const QColor base(0x1f, 0x21, 0x24);
    const QColor text(0xe6, 0xe6, 0xe6);
    p.setColor(QPalette::Window, window);
    p.setColor(QPalette::WindowText, text);
    p.setColor(QPalette::Base, base);
    p.setColor(QPalette::AlternateBase, QColor(0x29, 0x2c, 0x30));
    p.setColor(QPalette::ToolTipBase, QColor(0x3a, 0x3d, 0x41));
    p.setColor(QPalette::ToolTipText, text);
    p.setColor(QPalette::PlaceholderText, QColor(0x90, 0x90, 0x90));
    p.setColor(QPalette::Text, text);
    p.setColor(QPalette::Button, window);
    p.setColor(QPalette::ButtonText, text);
    p.setColor(QPalette::BrightText, QColor(0xff, 0x6b, 0x6b));
    p.setColor(QPalette::Light, QColor(0x45, 0x48, 0x4c));
    p.setColor(QPalette::Midlight, QColor(0x38, 0x3b, 0x3f));
    p.setColor(QPalette::Mid, QColor(0x5a, 0x5e, 0x63));
    p.setColor(QPalette::Dark, QColor(0x18, 0x19, 0x1b));
    p.setColor(QPalette::Shadow, QColor(0x0c, 0x0c, 0x0c));
    p.setColor(QPalette::Highlight, QColor(0x3d, 0x8e, 0xd8));
    p.setColor(QPalette::HighlightedText, QColor(0xff, 0xff, 0xff));
    p.setColor(QPalette::Link, QColor(0x6f, 0xb0, 0xf0));
    const QColor disabled(0x80, 0x80, 0x80);
    for (auto role : {QPalette::WindowText, QPalette::Text, QPalette::ButtonText})
        p.setColor(QPalette::Disabled, role, disabled);
    return p;
}

void Appearance::apply(bool dark)
{
    QApplication::setStyle(new AppStyle); // the application takes ownership
    QApplication::setPalette(dark ? darkPalette() : QApplication::style()->standardPalette());
}

} // namespace Airwright::Ui
