#pragma once
// Fonts and colours of the printed schedule, in one place. Sizes are in points,
// resolved against the PDF device, so text keeps its printed size at any device
// resolution. Tables use the condensed cut of the face so that a row of figures
// fits a portrait page.

#include <QColor>
#include <QFont>

namespace Airwright::Ui {

class PdfStyle {
public:
    enum Role {
        Title,       // document title
        Heading,     // numbered chapter
        Subheading,  // a section block, a table caption
        Body,        // running text
        Table,       // table cells
        TableHeader, // table column headers and row groups
        Small,       // header, footer, notes under tables, chart labels
    };

    static QFont font(Role role);

    static QColor text();
    static QColor mutedText();
    static QColor rule();        // table and page rules
    static QColor shade();       // alternate rows
    static QColor headerShade(); // table header background
    static QColor accent();      // headings
    static QColor warning();     // findings of warning or error severity
};

} // namespace Airwright::Ui
