#include "airwright/ui/UnitPanel.h"

#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitDrawing.h"

#include <QComboBox>
#include <QHBoxLayout>
#include <QLabel>
#include <QVBoxLayout>

namespace Airwright::Ui {

UnitPanel::UnitPanel(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->setSpacing(2);
    auto* header = new QHBoxLayout;
    header->setContentsMargins(6, 4, 6, 0);
    auto* title = new QLabel(tr("<b>Unit</b>: supply deck above (outdoor air → rooms), extract deck below "
                                "(rooms → exhaust)"),
                             this);
    header->addWidget(title, 1);
    auto* caseLabel = new QLabel(tr("Figures for case:"), this);
    m_cases = new QComboBox(this);
    m_cases->setSizeAdjustPolicy(QComboBox::AdjustToContents);
    m_cases->setToolTip(tr("The design case whose results the drawing and the section results show."));
    caseLabel->setBuddy(m_cases);
    header->addWidget(caseLabel);
    header->addWidget(m_cases);
    layout->addLayout(header);
    m_drawing = new UnitDrawing(document, units, this);
    layout->addWidget(m_drawing, 1);

    connect(m_cases, &QComboBox::currentIndexChanged, this, [this](int index) {
        if (index < 0)
            return;
        m_drawing->setCaseIndex(index);
        emit caseIndexChanged(index);
    });
    connect(m_document, &ProjectDocument::changed, this, [this] { updateCases(); });
    updateCases();
}

int UnitPanel::caseIndex() const
{
    return std::max(0, m_cases->currentIndex());
}

void UnitPanel::updateCases()
{
    QStringList names;
    for (const auto& c : m_document->project().unit.cases)
        names << QString::fromStdString(c.name);
    QStringList shown;
    for (int i = 0; i < m_cases->count(); ++i)
        shown << m_cases->itemText(i);
    if (names == shown)
        return;
    const int keep = std::clamp(m_cases->currentIndex(), 0, std::max(0, static_cast<int>(names.size()) - 1));
    {
        const QSignalBlocker block(m_cases);
        m_cases->clear();
        m_cases->addItems(names);
        m_cases->setCurrentIndex(names.isEmpty() ? -1 : keep);
    }
    m_drawing->setCaseIndex(keep);
    emit caseIndexChanged(keep);
}

} // namespace Airwright::Ui
