#pragma once
// Table text for the clipboard, as spreadsheets paste it: one line per row, cells
// separated by tabs, a header line first. Tabs and line breaks inside a cell
// become spaces so that the grid stays intact.

#include <QList>
#include <QString>
#include <QStringList>

#include <functional>

namespace Airwright::Ui {

class TabSeparatedText {
public:
    // `rows` in the order given (indices outside 0 .. rowCount - 1 are skipped);
    // every row when empty. `cell(row, column)` gives the text of a cell.
    static QString write(const QStringList& header, int rowCount, const QList<int>& rows,
                         const std::function<QString(int row, int column)>& cell);
};

} // namespace Airwright::Ui
