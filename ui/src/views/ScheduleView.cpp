#include "airwright/ui/views/ScheduleView.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/ScheduleModel.h"

#include <QAction>
#include <QApplication>
#include <QClipboard>
#include <QComboBox>
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

ScheduleView::ScheduleView(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document)
{
    m_model = new ScheduleModel(units, this);
    m_proxy = new QSortFilterProxyModel(this);
    m_proxy->setSourceModel(m_model);
    m_proxy->setSortRole(ScheduleModel::SortRole);
    m_proxy->setSortCaseSensitivity(Qt::CaseInsensitive);

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto* bar = new QHBoxLayout;
    bar->setContentsMargins(4, 2, 4, 0);
    auto* label = new QLabel(tr("Case:"), this);
    m_cases = new QComboBox(this);
    m_cases->setSizeAdjustPolicy(QComboBox::AdjustToContents);
    label->setBuddy(m_cases);
    bar->addWidget(label);
    bar->addWidget(m_cases);
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
    // Flow order (the model's) until the user clicks a header.
    m_table->horizontalHeader()->setSortIndicator(-1, Qt::AscendingOrder);
    m_table->setSortingEnabled(true);
    m_table->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_table->setSelectionMode(QAbstractItemView::ExtendedSelection);
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->setAlternatingRowColors(true);
    m_table->setWordWrap(false);
    m_table->verticalHeader()->setVisible(false);
    m_table->verticalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    m_table->horizontalHeader()->setSectionResizeMode(QHeaderView::Interactive);
    // The key figures keep their full width (the table scrolls sideways) rather
    // than being cut to what is left of the view.
    m_table->horizontalHeader()->setStretchLastSection(false);
    m_table->setContextMenuPolicy(Qt::ActionsContextMenu);
    m_table->addAction(m_copy);
    layout->addWidget(m_table, 1);

    connect(m_copy, &QAction::triggered, this, &ScheduleView::copyToClipboard);
    connect(m_cases, &QComboBox::currentIndexChanged, this, [this](int index) {
        if (index >= 0)
            setCaseIndex(index);
    });
    connect(m_table, &QTableView::clicked, this, &ScheduleView::rowActivated);
    connect(m_document, &ProjectDocument::resultsChanged, this, &ScheduleView::rebuild);
    connect(m_document, &ProjectDocument::selectionChanged, this, &ScheduleView::showSelection);
    connect(m_model, &QAbstractItemModel::headerDataChanged, this, &ScheduleView::fitColumns);
    rebuild();
}

void ScheduleView::fitColumns()
{
    QHeaderView* header = m_table->horizontalHeader();
    const QFontMetrics metrics(header->font());
    const int margin = header->style()->pixelMetric(QStyle::PM_HeaderMargin, nullptr, header);
    // Room for the sort arrow beside the text.
    const int arrow = header->style()->pixelMetric(QStyle::PM_HeaderMarkSize, nullptr, header);
    const QAbstractItemView* view = m_table; // the public face of QTableView's size hint
    for (int column = 0; column < m_proxy->columnCount(); ++column) {
        int width = view->sizeHintForColumn(column);
        const QString title = m_proxy->headerData(column, Qt::Horizontal).toString();
        for (const QString& line : title.split(QLatin1Char('\n')))
            width = std::max(width, metrics.horizontalAdvance(line) + 2 * margin + arrow);
        header->resizeSection(column, width);
    }
}

int ScheduleView::caseIndex() const
{
    return m_caseIndex;
}

void ScheduleView::setCaseIndex(int index)
{
    if (index == m_caseIndex)
        return;
    m_caseIndex = index;
    rebuild();
}

void ScheduleView::rebuild()
{
    const auto& result = m_document->result();
    if (result && !result->cases.empty())
        m_caseIndex = std::clamp(m_caseIndex, 0, int(result->cases.size()) - 1);
    m_model->rebuild(m_document->project(), result, m_caseIndex);

    const QStringList& names = m_model->caseNames();
    QStringList shown;
    for (int i = 0; i < m_cases->count(); ++i)
        shown.push_back(m_cases->itemText(i));
    {
        const QSignalBlocker block(m_cases);
        if (shown != names) {
            m_cases->clear();
            m_cases->addItems(names);
        }
        m_cases->setCurrentIndex(m_caseIndex < m_cases->count() ? m_caseIndex : -1);
        m_cases->setEnabled(m_cases->count() > 0);
    }
    const QString why = m_document->computeError();
    m_status->setText(result ? QString() : (why.isEmpty() ? tr("No results yet") : tr("No results: %1").arg(why)));
    fitColumns();
    showSelection(m_document->selectedSection());
}

void ScheduleView::showSelection(const QString& id)
{
    if (m_syncing)
        return;
    m_syncing = true;
    QItemSelection selection;
    for (int row : m_model->rowsOf(id)) {
        const QModelIndex left = m_proxy->mapFromSource(m_model->index(row, 0));
        const QModelIndex right = m_proxy->mapFromSource(m_model->index(row, ScheduleModel::ColumnCount - 1));
        selection.select(left, right);
    }
    m_table->selectionModel()->select(selection, QItemSelectionModel::ClearAndSelect);
    if (!selection.isEmpty())
        m_table->scrollTo(selection.indexes().front());
    m_syncing = false;
}

void ScheduleView::rowActivated(const QModelIndex& index)
{
    if (!index.isValid() || m_syncing)
        return;
    const QString id = m_proxy->data(index, ScheduleModel::SectionIdRole).toString();
    m_syncing = true; // keep the user's own selection (several rows) as it is
    m_document->selectSection(id);
    m_syncing = false;
}

QString ScheduleView::copyText() const
{
    QList<int> rows;
    const QModelIndexList selected = m_table->selectionModel()->selectedRows();
    QList<int> proxyRows;
    for (const QModelIndex& i : selected)
        proxyRows.push_back(i.row());
    std::sort(proxyRows.begin(), proxyRows.end());
    if (proxyRows.isEmpty())
        for (int r = 0; r < m_proxy->rowCount(); ++r)
            proxyRows.push_back(r);
    for (int r : proxyRows)
        rows.push_back(m_proxy->mapToSource(m_proxy->index(r, 0)).row());
    return m_model->toTsv(rows);
}

void ScheduleView::copyToClipboard()
{
    QApplication::clipboard()->setText(copyText());
}

} // namespace Airwright::Ui
