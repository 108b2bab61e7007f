#include "airwright/ui/export/PdfPager.h"

#include "airwright/ui/export/PdfStyle.h"

#include <QPainter>
#include <QPen>

#include <algorithm>

namespace Airwright::Ui {

PdfPager::PdfPager(QPaintDevice& device, double dotsPerInch, const QRectF& pageRect)
    : m_device(device), m_dpi(dotsPerInch), m_page(pageRect)
{
    // Header and footer bands of 9 mm each.
    m_content = m_page.adjusted(0.0, mm(9.0), 0.0, -mm(9.0));
    m_cursor = m_content.top();
    m_pages.emplace_back();
}

QFontMetricsF PdfPager::metrics(const QFont& font) const
{
    return QFontMetricsF(font, &m_device);
}

QRectF PdfPager::take(double height)
{
    if (height > remaining() && !pageIsEmpty())
        newPage();
    const QRectF r(m_content.left(), m_cursor, m_content.width(), height);
    m_cursor += height;
    return r;
}

void PdfPager::space(double height)
{
    m_cursor = std::min(m_cursor + height, m_content.bottom());
}

void PdfPager::newPage()
{
    if (pageIsEmpty())
        return;
    m_pages.emplace_back();
    m_cursor = m_content.top();
}

void PdfPager::draw(Draw op)
{
    m_pages.back().push_back(std::move(op));
}

void PdfPager::paint(QPainter& painter, const QString& headerLeft, const QString& headerRight,
                     const QString& footerLeft, const std::function<void()>& newPageOnDevice) const
{
    const int total = pageCount();
    const QFont small = PdfStyle::font(PdfStyle::Small);
    for (int i = 0; i < total; ++i) {
        if (i > 0)
            newPageOnDevice();
        painter.save();
        painter.setFont(small);
        painter.setPen(PdfStyle::mutedText());
        const QRectF head(m_page.left(), m_page.top(), m_page.width(), mm(5.0));
        painter.drawText(head, Qt::AlignLeft | Qt::AlignVCenter, headerLeft);
        painter.drawText(head, Qt::AlignRight | Qt::AlignVCenter, headerRight);
        painter.setPen(QPen(PdfStyle::rule(), mm(0.2)));
        painter.drawLine(QPointF(m_page.left(), head.bottom() + mm(1.0)),
                         QPointF(m_page.right(), head.bottom() + mm(1.0)));
        const QRectF foot(m_page.left(), m_page.bottom() - mm(5.0), m_page.width(), mm(5.0));
        painter.drawLine(QPointF(m_page.left(), foot.top() - mm(1.0)), QPointF(m_page.right(), foot.top() - mm(1.0)));
        painter.setPen(PdfStyle::mutedText());
        painter.drawText(foot, Qt::AlignLeft | Qt::AlignVCenter, footerLeft);
        painter.drawText(foot, Qt::AlignRight | Qt::AlignVCenter,
                         QStringLiteral("page %1 of %2").arg(i + 1).arg(total));
        painter.restore();
        for (const auto& op : m_pages[static_cast<std::size_t>(i)]) {
            painter.save();
            op(painter);
            painter.restore();
        }
    }
}

} // namespace Airwright::Ui
