#pragma once
// Reads a PDF back for the tests with the poppler command-line tools (pdftotext,
// pdfinfo, pdfimages from poppler-utils), so the schedule is checked the way a
// reader's program sees it, not through our own code.

#include <QString>
#include <QStringList>

#include <optional>

namespace Airwright::Ui::Test {

class PdfText {
public:
    static bool toolsAvailable();
    // The text of the whole document, or of one page (1-based).
    static QString text(const QString& pdf, std::optional<int> page = std::nullopt);
    // "Pages" and "Page size" of pdfinfo: page count and the first page's size in points.
    static int pageCount(const QString& pdf);
    static std::optional<std::pair<double, double>> pageSizePoints(const QString& pdf);
    // Raster images in the document (pdfimages -list); a vector schedule has none.
    static int imageCount(const QString& pdf);
};

} // namespace Airwright::Ui::Test
