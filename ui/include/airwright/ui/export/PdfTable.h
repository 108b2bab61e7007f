#pragma once
// A table for the printed schedule: columns sized by weight over the page width,
// cells wrapped to their column, a header row repeated on every page the table
// runs onto, group rows spanning the width, alternate rows shaded. Rows never
// split; a group row stays with the row after it.

#include <QString>
#include <QStringList>

#include <vector>

namespace Airwright::Ui {

class PdfPager;

class PdfTable {
public:
    struct Column {
        QString header;
        double weight = 1.0;
        Qt::Alignment align = Qt::AlignLeft;
    };
    enum class RowStyle { Normal, Group, Bold, Warning };

    explicit PdfTable(std::vector<Column> columns);

    void addRow(const QStringList& cells, RowStyle style = RowStyle::Normal);
    void addGroup(const QString& title) { addRow({title}, RowStyle::Group); }
    bool isEmpty() const { return m_rows.empty(); }

    // Start on a new page rather than split, when the whole table fits on one.
    void setKeepTogether(bool keep) { m_keepTogether = keep; }
    void setShowHeader(bool show) { m_showHeader = show; }

    // Lays the table out at the pager's cursor.
    void place(PdfPager& pager) const;
    // Height the table takes when placed whole (header and every row).
    double height(const PdfPager& pager) const;

private:
    struct Row {
        QStringList cells;
        RowStyle style = RowStyle::Normal;
    };

    std::vector<double> columnWidths(const PdfPager& pager) const;
    double rowHeight(const PdfPager& pager, const std::vector<double>& widths, const Row& row, bool header) const;
    void placeHeader(PdfPager& pager, const std::vector<double>& widths, double height) const;

    std::vector<Column> m_columns;
    std::vector<Row> m_rows;
    bool m_keepTogether = false;
    bool m_showHeader = true;
};

} // namespace Airwright::Ui
