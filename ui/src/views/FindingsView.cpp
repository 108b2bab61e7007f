#include "airwright/ui/views/FindingsView.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/views/FindingsModel.h"

#include <QHeaderView>
#include <QLabel>
#include <QTableView>
#include <QVBoxLayout>

namespace Airwright::Ui {

FindingsView::FindingsView(ProjectDocument* document, const UnitSystem* units, QWidget* parent)
    : FindingsView(document, parent)
{
    m_model->setUnits(units);
}

FindingsView::FindingsView(ProjectDocument* document, QWidget* parent) : QWidget(parent), m_document(document)
{
    m_model = new FindingsModel(this);
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    m_summary = new QLabel(this);
    m_summary->setContentsMargins(4, 2, 4, 0);
    m_summary->setWordWrap(true);
    layout->addWidget(m_summary);

    m_table = new QTableView(this);
    m_table->setModel(m_model);
    m_table->setSelectionBehavior(QAbstractItemView::SelectRows);
    m_table->setSelectionMode(QAbstractItemView::SingleSelection);
    m_table->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_table->setWordWrap(true);
    m_table->setAlternatingRowColors(true);
    m_table->verticalHeader()->setVisible(false);
    m_table->verticalHeader()->setSectionResizeMode(QHeaderView::ResizeToContents);
    auto* header = m_table->horizontalHeader();
    header->setSectionResizeMode(QHeaderView::ResizeToContents);
    header->setSectionResizeMode(FindingsModel::MessageColumn, QHeaderView::Stretch);
    layout->addWidget(m_table, 1);

    connect(m_table, &QTableView::clicked, this, &FindingsView::rowClicked);
    connect(m_document, &ProjectDocument::resultsChanged, this, &FindingsView::rebuild);
    rebuild();
}

void FindingsView::rebuild()
{
    m_model->rebuild(m_document->result());
    int counts[3] = {0, 0, 0};
    for (const auto& row : m_model->rows())
        ++counts[int(row.finding.severity)];
    if (!m_document->result()) {
        const QString why = m_document->computeError();
        m_summary->setText(why.isEmpty() ? tr("No results yet") : tr("No results: %1").arg(why));
    } else if (m_model->rows().empty()) {
        m_summary->setText(tr("No findings in any case"));
    } else {
        auto count = [](int n, const QString& one, const QString& many) {
            return QStringLiteral("%1 %2").arg(n).arg(n == 1 ? one : many);
        };
        m_summary->setText(tr("%1, %2, %3 (every design case)")
                               .arg(count(counts[int(Core::Severity::Error)], tr("error"), tr("errors")),
                                    count(counts[int(Core::Severity::Warning)], tr("warning"), tr("warnings")),
                                    count(counts[int(Core::Severity::Info)], tr("note"), tr("notes"))));
    }
}

void FindingsView::rowClicked(const QModelIndex& index)
{
    if (!index.isValid())
        return;
    const QString id = m_model->data(index, FindingsModel::SectionIdRole).toString();
    if (!id.isEmpty())
        m_document->selectSection(id);
}

} // namespace Airwright::Ui
