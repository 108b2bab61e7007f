#include "airwright/ui/export/PdfStyle.h"

namespace Airwright::Ui {

QFont PdfStyle::font(Role role)
{
    const bool condensed = role == Table || role == TableHeader || role == Small;
    QFont f(condensed ? QStringLiteral("DejaVu Sans Condensed") : QStringLiteral("DejaVu Sans"));
    f.setStyleHint(QFont::SansSerif);
    // Glyph advances from the outlines, not snapped to device pixels, so text
    // measured for the layout is the text painted.
    f.setHintingPreference(QFont::PreferNoHinting);
    // No ligatures: "fi" stays two letters, so the text copied or extracted
    // from the PDF is the text we wrote (section ids like "supply-filter").
    f.setStyleStrategy(QFont::PreferNoShaping);
    switch (role) {
    case Title:
        f.setPointSizeF(16.0);
        f.setBold(true);
        break;
    case Heading:
        f.setPointSizeF(11.0);
        f.setBold(true);
        break;
    case Subheading:
        f.setPointSizeF(8.5);
        f.setBold(true);
        break;
    case Body:
        f.setPointSizeF(8.0);
        break;
    case Table:
        f.setPointSizeF(7.0);
        break;
    case TableHeader:
        f.setPointSizeF(7.0);
        f.setBold(true);
        break;
    case Small:
        f.setPointSizeF(6.5);
        break;
    }
    return f;
}

QColor PdfStyle::text() { return QColor(20, 20, 20); }
QColor PdfStyle::mutedText() { return QColor(90, 90, 90); }
QColor PdfStyle::rule() { return QColor(150, 150, 150); }
QColor PdfStyle::shade() { return QColor(244, 245, 247); }
QColor PdfStyle::headerShade() { return QColor(222, 228, 236); }
QColor PdfStyle::accent() { return QColor(24, 64, 112); }
QColor PdfStyle::warning() { return QColor(150, 40, 20); }

} // namespace Airwright::Ui
