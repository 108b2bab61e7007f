#pragma once
// Lays content out on pages first and paints it afterwards, so every page can say
// "page N of M". Content asks for a height at the cursor (take()); when it does
// not fit on the page a new one starts. What to draw is recorded per page as
// closures and painted by paint(), after the header and footer of each page.
//
// Coordinates are device units of the paint device (QPdfWriter: its resolution);
// mm() converts. Font metrics must come from the same device (metrics()).

#include <QFont>
#include <QFontMetricsF>
#include <QRectF>
#include <QString>

#include <functional>
#include <vector>

class QPainter;
class QPaintDevice;

namespace Airwright::Ui {

class PdfPager {
public:
    using Draw = std::function<void(QPainter&)>;

    // pageRect: the printable page in device units (origin top left); the header
    // and footer bands are taken from its top and bottom.
    PdfPager(QPaintDevice& device, double dotsPerInch, const QRectF& pageRect);

    double mm(double millimetres) const { return millimetres * m_dpi / 25.4; }
    double points(double pt) const { return pt * m_dpi / 72.0; }
    QFontMetricsF metrics(const QFont& font) const;
    QPaintDevice& device() const { return m_device; }

    double left() const { return m_content.left(); }
    double width() const { return m_content.width(); }
    double top() const { return m_content.top(); }
    double contentHeight() const { return m_content.height(); }
    double remaining() const { return m_content.bottom() - m_cursor; }
    bool pageIsEmpty() const { return m_cursor <= m_content.top(); }

    // The full-width rectangle of the given height at the cursor, on a new page
    // first when it does not fit (unless the page is empty: then it is clipped).
    QRectF take(double height);
    void space(double height);   // vertical gap; never starts a page
    void newPage();              // no-op on an empty page
    void draw(Draw op);          // on the current page

    int pageCount() const { return static_cast<int>(m_pages.size()); }

    // Header text left and right, footer text left; the footer's right side is
    // "page N of M". newPageOnDevice advances the device (QPdfWriter::newPage).
    void paint(QPainter& painter, const QString& headerLeft, const QString& headerRight, const QString& footerLeft,
               const std::function<void()>& newPageOnDevice) const;

private:
    QPaintDevice& m_device;
    double m_dpi;
    QRectF m_page;
    QRectF m_content;
    double m_cursor;
    std::vector<std::vector<Draw>> m_pages;
};

} // namespace Airwright::Ui
