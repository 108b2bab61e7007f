#include "airwright/ui/views/PlotStyle.h"

#include <qcustomplot.h>

#include <algorithm>
#include <array>

namespace Airwright::Ui {

QColor PlotStyle::caseColour(int index)
{
    // Mid-luminance tones: enough contrast on white and on dark grey.
    static const std::array<QColor, 6> colours{QColor(0x3b, 0x7d, 0xd8), QColor(0xe0, 0x72, 0x2c),
                                               QColor(0x2e, 0xa0, 0x5a), QColor(0xc2, 0x4f, 0xb6),
                                               QColor(0xc9, 0x9a, 0x10), QColor(0x1f, 0xa5, 0xa8)};
    const auto n = int(colours.size());
    return colours[std::size_t(((index % n) + n) % n)];
}

QColor PlotStyle::supplyColour()
{
    return QColor(0x3b, 0x7d, 0xd8);
}

QColor PlotStyle::extractColour()
{
    return QColor(0xd0, 0x5f, 0x2a);
}

QColor PlotStyle::mix(const QColor& a, const QColor& b, double towardsB)
{
    const double u = std::clamp(towardsB, 0.0, 1.0);
    auto lerp = [u](double x, double y) { return x + (y - x) * u; };
    return QColor::fromRgbF(float(lerp(a.redF(), b.redF())), float(lerp(a.greenF(), b.greenF())),
                            float(lerp(a.blueF(), b.blueF())), float(lerp(a.alphaF(), b.alphaF())));
}

QColor PlotStyle::lineColour(const QPalette& palette)
{
    return mix(palette.color(QPalette::Text), palette.color(QPalette::Base), 0.72);
}

QColor PlotStyle::labelColour(const QPalette& palette)
{
    return mix(palette.color(QPalette::Text), palette.color(QPalette::Base), 0.4);
}

void PlotStyle::styleAxis(QCPAxis& axis, const QPalette& palette)
{
    const QColor text = palette.color(QPalette::Text);
    const QColor faint = mix(text, palette.color(QPalette::Base), 0.5);
    axis.setBasePen(QPen(faint));
    axis.setTickPen(QPen(faint));
    axis.setSubTickPen(QPen(faint));
    axis.setTickLabelColor(text);
    axis.setLabelColor(text);
    axis.grid()->setPen(QPen(mix(text, palette.color(QPalette::Base), 0.85), 0, Qt::DotLine));
    axis.grid()->setZeroLinePen(Qt::NoPen);
    axis.grid()->setSubGridVisible(false);
}

void PlotStyle::apply(QCustomPlot& plot, const QPalette& palette)
{
    plot.setBackground(palette.brush(QPalette::Base));
    plot.axisRect()->setBackground(palette.brush(QPalette::Base));
    for (QCPAxis* axis : plot.axisRect()->axes())
        styleAxis(*axis, palette);
    plot.legend->setBrush(QBrush(mix(palette.color(QPalette::Base), palette.color(QPalette::Text), 0.04)));
    plot.legend->setBorderPen(QPen(mix(palette.color(QPalette::Text), palette.color(QPalette::Base), 0.6)));
    plot.legend->setTextColor(palette.color(QPalette::Text));
}

} // namespace Airwright::Ui
