#include "airwright/ui/export/PdfTable.h"

#include "airwright/ui/export/PdfPager.h"
#include "airwright/ui/export/PdfStyle.h"

#include <QPainter>
#include <QPen>

#include <algorithm>
#include <numeric>

namespace Airwright::Ui {

namespace {

constexpr double kPadXmm = 1.0;
constexpr double kPadYmm = 0.55;
constexpr int kWrap = Qt::TextWordWrap | Qt::TextWrapAnywhere;

QFont fontFor(PdfTable::RowStyle style, bool header)
{
    if (header || style == PdfTable::RowStyle::Group || style == PdfTable::RowStyle::Bold)
        return PdfStyle::font(PdfStyle::TableHeader);
    return PdfStyle::font(PdfStyle::Table);
}

// Word wrap first; a single word wider than its column breaks anywhere.
int wrapFlags(const QFontMetricsF& fm, double width, const QString& text)
{
    const auto words = text.split(QLatin1Char(' '), Qt::SkipEmptyParts);
    for (const auto& w : words)
        if (fm.horizontalAdvance(w) > width)
            return kWrap;
    return Qt::TextWordWrap;
}

} // namespace

PdfTable::PdfTable(std::vector<Column> columns) : m_columns(std::move(columns)) {}

void PdfTable::addRow(const QStringList& cells, RowStyle style)
{
    m_rows.push_back({cells, style});
}

std::vector<double> PdfTable::columnWidths(const PdfPager& pager) const
{
    double total = 0.0;
    for (const auto& c : m_columns)
        total += c.weight;
    std::vector<double> widths;
    for (const auto& c : m_columns)
        widths.push_back(pager.width() * c.weight / (total > 0.0 ? total : 1.0));
    return widths;
}

double PdfTable::rowHeight(const PdfPager& pager, const std::vector<double>& widths, const Row& row,
                           bool header) const
{
    const QFontMetricsF fm = pager.metrics(fontFor(row.style, header));
    const double pad = pager.mm(kPadXmm);
    double height = fm.height();
    if (row.style == RowStyle::Group) {
        const double w = std::accumulate(widths.begin(), widths.end(), 0.0) - 2.0 * pad;
        const QString text = row.cells.value(0);
        height = fm.boundingRect(QRectF(0, 0, w, 1e9), wrapFlags(fm, w, text), text).height();
    } else {
        for (std::size_t i = 0; i < widths.size(); ++i) {
            const QString text = row.cells.value(static_cast<int>(i));
            if (text.isEmpty())
                continue;
            const double w = widths[i] - 2.0 * pad;
            height = std::max(height, fm.boundingRect(QRectF(0, 0, w, 1e9), wrapFlags(fm, w, text), text).height());
        }
    }
    return height + 2.0 * pager.mm(kPadYmm);
}

void PdfTable::placeHeader(PdfPager& pager, const std::vector<double>& widths, double height) const
{
    const QRectF r = pager.take(height);
    QStringList headers;
    for (const auto& c : m_columns)
        headers << c.header;
    const auto columns = m_columns;
    const double pad = pager.mm(kPadXmm);
    const double line = pager.mm(0.25);
    const QFontMetricsF fm = pager.metrics(fontFor(RowStyle::Normal, true));
    pager.draw([=](QPainter& p) {
        p.fillRect(r, PdfStyle::headerShade());
        p.setFont(fontFor(RowStyle::Normal, true));
        p.setPen(PdfStyle::text());
        double x = r.left();
        for (std::size_t i = 0; i < widths.size(); ++i) {
            const QRectF cell(x + pad, r.top(), widths[i] - 2.0 * pad, r.height());
            p.drawText(cell, static_cast<int>(columns[i].align | Qt::AlignVCenter) | wrapFlags(fm, cell.width(), headers[static_cast<int>(i)]),
                       headers[static_cast<int>(i)]);
            x += widths[i];
        }
        p.setPen(QPen(PdfStyle::rule(), line));
        p.drawLine(r.bottomLeft(), r.bottomRight());
        p.drawLine(r.topLeft(), r.topRight());
    });
}

double PdfTable::height(const PdfPager& pager) const
{
    const auto widths = columnWidths(pager);
    Row headerRow;
    for (const auto& c : m_columns)
        headerRow.cells << c.header;
    double total = m_showHeader ? rowHeight(pager, widths, headerRow, true) : 0.0;
    for (const auto& row : m_rows)
        total += rowHeight(pager, widths, row, false);
    return total;
}

void PdfTable::place(PdfPager& pager) const
{
    const auto widths = columnWidths(pager);
    Row headerRow;
    for (const auto& c : m_columns)
        headerRow.cells << c.header;
    const double headerHeight = m_showHeader ? rowHeight(pager, widths, headerRow, true) : 0.0;
    std::vector<double> heights;
    for (const auto& row : m_rows)
        heights.push_back(rowHeight(pager, widths, row, false));

    const double total = headerHeight + std::accumulate(heights.begin(), heights.end(), 0.0);
    if (m_keepTogether && total > pager.remaining() && total <= pager.contentHeight())
        pager.newPage();
    // The header never stands alone at the foot of a page.
    const double first = heights.empty() ? 0.0 : heights.front();
    if (headerHeight + first > pager.remaining())
        pager.newPage();
    if (m_showHeader)
        placeHeader(pager, widths, headerHeight);

    const double pad = pager.mm(kPadXmm);
    const double padY = pager.mm(kPadYmm);
    const double thin = pager.mm(0.1);
    const auto columns = m_columns;
    int shaded = 0;
    for (std::size_t i = 0; i < m_rows.size(); ++i) {
        const Row& row = m_rows[i];
        double need = heights[i];
        if (row.style == RowStyle::Group && i + 1 < m_rows.size())
            need += heights[i + 1];
        if (need > pager.remaining() && !pager.pageIsEmpty()) {
            pager.newPage();
            if (m_showHeader)
                placeHeader(pager, widths, headerHeight);
        }
        const QRectF r = pager.take(heights[i]);
        const bool shade = row.style == RowStyle::Normal && (shaded++ % 2 == 1);
        if (row.style == RowStyle::Group)
            shaded = 0;
        const QFont font = fontFor(row.style, false);
        const QFontMetricsF fm = pager.metrics(font);
        pager.draw([=](QPainter& p) {
            if (row.style == RowStyle::Group)
                p.fillRect(r, PdfStyle::headerShade().lighter(106));
            else if (shade)
                p.fillRect(r, PdfStyle::shade());
            p.setFont(font);
            p.setPen(row.style == RowStyle::Warning ? PdfStyle::warning() : PdfStyle::text());
            if (row.style == RowStyle::Group) {
                const QRectF cell = r.adjusted(pad, padY, -pad, -padY);
                const QString text = row.cells.value(0);
                p.drawText(cell, Qt::AlignLeft | Qt::AlignVCenter | wrapFlags(fm, cell.width(), text), text);
            } else {
                double x = r.left();
                for (std::size_t c = 0; c < widths.size(); ++c) {
                    const QRectF cell(x + pad, r.top() + padY, widths[c] - 2.0 * pad, r.height() - 2.0 * padY);
                    const QString text = row.cells.value(static_cast<int>(c));
                    if (!text.isEmpty())
                        p.drawText(cell, static_cast<int>(columns[c].align | Qt::AlignTop) | wrapFlags(fm, cell.width(), text),
                                   text);
                    x += widths[c];
                }
            }
            p.setPen(QPen(PdfStyle::rule().lighter(125), thin));
            p.drawLine(r.bottomLeft(), r.bottomRight());
        });
    }
}

} // namespace Airwright::Ui
