#include "airwright/ui/views/MeasuringPointsView.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MeasuringPointsModel.h"

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QItemSelectionModel>
#include <QLabel>
#include <QSortFilterProxyModel>
#include <QStyle>
#include <QTableView>
#include <QToolButton>
#include <QVBoxLayout>

#include <algorithm>

namespace Airwright::Ui {

MeasuringPointsView::MeasuringPointsView(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document)
{
    m_model = new MeasuringPointsModel(units, this);
    m_proxy = new QSortFilterProxyModel(this);
    m_proxy->setSourceModel(m_model);
    m_proxy->setSortRole(MeasuringPointsModel::SortRole);
    m_proxy->setSortCaseSensitivity(Qt::CaseInsensitive);

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto* bar = new QHBoxLayout;
    bar->setContentsMargins(4, 2, 4, 0);
    m_status = new QLabel(this);
    m_status->setWordWrap(true);
    bar->addWidget(m_status, 1);
    m_copy = new QAction(tr("Copy"), this);
    m_copy->setShortcut(QKeySequence::Copy);
    m_copy->setShortcutContext(Qt::WidgetWithChildrenShortcut);
    m_copy->setToolTip(tr("Copy the selected rows (or all rows) as tab-separated text with units"));
    auto* copyButton = new QToolButton(this);
    copyButton->setDefaultAction(m_copy);
    bar->addWidget(copyButton);
    layout->addLayout(bar);
    addAction(m_copy);

    m_table = new QTableView(this);
    m_table->setModel(m_proxy);
    // Core's order (supply path first, in flow order) until the user clicks a header.
    m_table->horizontalHeader()->setSortIndicator(-1, Qt::AscendingOrder);
    m_table->setSortingEnabled(true);
    m_table->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_table->setSelectionMode(QAbstractItemView::ExtendedSelection);
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->setAlternatingRowColors(true);
    // Setpoints stand a line each and long notes wrap, so rows grow to fit.
    m_table->setWordWrap(true);
    m_table->verticalHeader()->setVisible(false);
    m_table->verticalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_table->horizontalHeader()->setSectionResizeMode(QHeaderView::Interactive);
    m_table->horizontalHeader()->setStretchLastSection(false);
    m_table->setContextMenuPolicy(Qt::ActionsContextMenu);
    m_table->addAction(m_copy);
    layout->addWidget(m_table, 1);

    connect(m_copy, &QAction::triggered, this, &MeasuringPointsView::copyToClipboard);
    connect(m_document, &ProjectDocument::resultsChanged, this, &MeasuringPointsView::rebuild);
    connect(units, &UnitSystem::changed, this, [this] {
        showStatus();
        fitColumns();
    });
    rebuild();
}

void MeasuringPointsView::rebuild()
{
    m_model->rebuild(m_document->project(), m_document->result(), m_document->computeError());
    showStatus();
    fitColumns();
}

void MeasuringPointsView::showStatus()
{
    const QString message = m_model->message();
    const int n = m_model->rowCount();
    m_status->setText(!message.isEmpty() ? message
                      : n == 1           ? tr("1 measuring or control point implied by the design")
                                         : tr("%1 measuring and control points implied by the design").arg(n));
}

void MeasuringPointsView::fitColumns()
{
    QHeaderView* header = m_table->horizontalHeader();
    const QFontMetrics metrics(header->font());
    const int margin = header->style()->pixelMetric(QStyle::PM_HeaderMargin, nullptr, header);
    const int arrow = header->style()->pixelMetric(QStyle::PM_HeaderMarkSize, nullptr, header);
    // Setpoints with their basis and the note are prose: they wrap at a width
    // that still reads as a line.
    const int proseWidth = metrics.averageCharWidth() * 52;
    const QAbstractItemView* view = m_table; // the public face of QTableView's size hint
    for (int column = 0; column < m_proxy->columnCount(); ++column) {
        int width = view->sizeHintForColumn(column);
        if (column == MeasuringPointsModel::NoteColumn || column == MeasuringPointsModel::SetpointsColumn)
            width = std::min(width, proseWidth);
        const QString title = m_proxy->headerData(column, Qt::Horizontal).toString();
        width = std::max(width, metrics.horizontalAdvance(title) + 2 * margin + arrow);
        header->resizeSection(column, width);
    }
    m_table->resizeRowsToContents();
}

QString MeasuringPointsView::copyText() const
{
    QList<int> proxyRows;
    for (const QModelIndex& i : m_table->selectionModel()->selectedRows())
        proxyRows.push_back(i.row());
    std::sort(proxyRows.begin(), proxyRows.end());
    if (proxyRows.isEmpty())
        for (int r = 0; r < m_proxy->rowCount(); ++r)
            proxyRows.push_back(r);
    QList<int> rows;
    for (int r : proxyRows)
        rows.push_back(m_proxy->mapToSource(m_proxy->index(r, 0)).row());
    return m_model->toTsv(rows);
}

void MeasuringPointsView::copyToClipboard()
{
    QApplication::clipboard()->setText(copyText());
}

} // namespace Airwright::Ui
