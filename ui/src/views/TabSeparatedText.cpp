#include "airwright/ui/views/TabSeparatedText.h"

namespace Airwright::Ui {

namespace {

QString cleanCell(QString s)
{
    s.replace(QLatin1Char('\t'), QLatin1Char(' '));
    s.replace(QLatin1Char('\n'), QLatin1Char(' '));
    s.replace(QLatin1Char('\r'), QLatin1Char(' '));
    return s;
}

} // namespace

QString TabSeparatedText::write(const QStringList& header, int rowCount, const QList<int>& rows,
                                const std::function<QString(int row, int column)>& cell)
{
    QStringList lines;
    QStringList cleanHeader;
    for (const auto& h : header)
        cleanHeader.push_back(cleanCell(h));
    lines.push_back(cleanHeader.join(QLatin1Char('\t')));
    QList<int> order = rows;
    if (order.isEmpty())
        for (int r = 0; r < rowCount; ++r)
            order.push_back(r);
    for (int r : order) {
        if (r < 0 || r >= rowCount)
            continue;
        QStringList cells;
        for (int c = 0; c < header.size(); ++c)
            cells.push_back(cleanCell(cell(r, c)));
        lines.push_back(cells.join(QLatin1Char('\t')));
    }
    return lines.join(QLatin1Char('\n')) + QLatin1Char('\n');
}

} // namespace Airwright::Ui
