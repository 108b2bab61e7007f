#include "airwright/ui/SectionEditor.h"

#include "airwright/core/chain/SectionFigures.h"
#include "airwright/ui/EditSectionCommand.h"
#include "airwright/ui/EditValidator.h"
#include "airwright/ui/FieldForm.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/SectionCatalog.h"
#include "airwright/ui/SectionFields.h"
#include "airwright/ui/SectionPaths.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QHeaderView>
#include <QLabel>
#include <QScrollArea>
#include <QStackedWidget>
#include <QTableWidget>
#include <QVBoxLayout>

#include <algorithm>

namespace Airwright::Ui {

using namespace Airwright::Core;

namespace {

// "section hr: rated temperature efficiency ..." -> "rated temperature efficiency ...":
// beside the field the section is obvious.
QString withoutSectionPrefix(QString message, const QString& id)
{
    const QString prefix = QStringLiteral("section %1: ").arg(id);
    if (message.startsWith(prefix))
        message.remove(0, prefix.size());
    return message;
}

Project::Project withSection(const Project::Project& project, const std::string& id, const Chain::Section& edited)
{
    Project::Project candidate = project;
    for (auto* list : {&candidate.unit.supply, &candidate.unit.extract})
        for (auto& section : *list)
            if (section.id == id)
                section = std::holds_alternative<Chain::CoupledSide>(section.spec)
                              ? Chain::Section{edited.id, Chain::CoupledSide{}}
                              : edited;
    return candidate;
}

} // namespace

SectionEditor::SectionEditor(ProjectDocument* document, UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_document(document), m_units(units)
{
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    m_stack = new QStackedWidget(this);
    layout->addWidget(m_stack);

    auto* empty = new QLabel(tr("Select a section in the unit drawing to see and edit its inputs.\n\n"
                                "Add sections from the section list: select a type, then press "
                                "\"Add to supply\" or \"Add to extract\", or drag it onto the drawing."),
                             m_stack);
    empty->setWordWrap(true);
    empty->setAlignment(Qt::AlignTop | Qt::AlignLeft);
    empty->setContentsMargins(8, 8, 8, 8);
    m_stack->addWidget(empty);

    auto* scroll = new QScrollArea(m_stack);
    scroll->setWidgetResizable(true);
    scroll->setFrameShape(QFrame::NoFrame);
    auto* page = new QWidget(scroll);
    auto* pageLayout = new QVBoxLayout(page);
    pageLayout->setContentsMargins(6, 6, 6, 6);
    m_title = new QLabel(page);
    QFont titleFont = m_title->font();
    titleFont.setBold(true);
    titleFont.setPointSizeF(titleFont.pointSizeF() * 1.15);
    m_title->setFont(titleFont);
    m_subtitle = new QLabel(page);
    m_subtitle->setWordWrap(true);
    pageLayout->addWidget(m_title);
    pageLayout->addWidget(m_subtitle);
    m_formHolder = new QVBoxLayout;
    m_formHolder->setContentsMargins(0, 0, 0, 0);
    pageLayout->addLayout(m_formHolder);
    m_resultsTitle = new QLabel(page);
    m_resultsTitle->setFont(titleFont);
    pageLayout->addWidget(m_resultsTitle);
    m_results = new QTableWidget(0, 2, page);
    m_results->setHorizontalHeaderLabels({tr("Result"), tr("Value")});
    m_results->verticalHeader()->setVisible(false);
    m_results->horizontalHeader()->setSectionResizeMode(0, QHeaderView::Stretch);
    m_results->horizontalHeader()->setSectionResizeMode(1, QHeaderView::ResizeToContents);
    m_results->setEditTriggers(QAbstractItemView::NoEditTriggers);
    m_results->setSelectionMode(QAbstractItemView::NoSelection);
    m_results->setFocusPolicy(Qt::NoFocus);
    m_results->setVerticalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    m_results->setWordWrap(false);
    m_results->verticalHeader()->setSectionResizeMode(QHeaderView::Fixed);
    m_results->verticalHeader()->setDefaultSectionSize(m_results->fontMetrics().height() + 6);
    pageLayout->addWidget(m_results);
    pageLayout->addStretch(1);
    scroll->setWidget(page);
    m_stack->addWidget(scroll);

    connect(m_document, &ProjectDocument::selectionChanged, this, [this] { rebuild(); });
    connect(m_document, &ProjectDocument::changed, this, [this] { rebuild(); });
    connect(m_document, &ProjectDocument::resultsChanged, this, [this] { refreshResults(); });
    connect(m_units, &UnitSystem::changed, this, [this] {
        if (m_form)
            m_form->refreshUnits();
        refreshResults();
    });
    rebuild();
}

void SectionEditor::setCaseIndex(int index)
{
    m_caseIndex = index;
    refreshResults();
}

void SectionEditor::rebuild()
{
    const std::string id = m_document->selectedSection().toStdString();
    const Chain::Section* section = SectionPaths::described(m_document->project().unit, id);
    if (!section) {
        m_stack->setCurrentIndex(0);
        return;
    }
    m_stack->setCurrentIndex(1);
    if (!m_form || m_formType != section->spec.index()) {
        if (m_form) {
            m_form->hide();
            m_form->deleteLater(); // a commit from this form may still be on the stack
        }
        m_form = new FieldForm(m_units, this);
        m_formType = section->spec.index();
        m_formHolder->addWidget(m_form);
        ProjectDocument* document = m_document;
        auto read = [document]() -> std::optional<Chain::Section> {
            const auto* s = SectionPaths::described(document->project().unit, document->selectedSection().toStdString());
            return s ? std::optional<Chain::Section>(*s) : std::nullopt;
        };
        auto check = [document](const Chain::Section& candidate) -> QString {
            const QString selected = document->selectedSection();
            const auto project =
                withSection(document->project(), selected.toStdString(), candidate);
            QString problem = EditValidator::newProblem(document->project(), project);
            problem = withoutSectionPrefix(problem, QString::fromStdString(candidate.id));
            return withoutSectionPrefix(problem, selected);
        };
        auto commit = [document](const Chain::Section& candidate) {
            document->undoStack()->push(
                new EditSectionCommand(document, document->selectedSection().toStdString(), candidate));
        };
        for (const auto& spec : SectionFields::fieldsFor(section->spec))
            m_form->bind<Chain::Section>(spec, read, check, commit);
    }
    refresh();
}

void SectionEditor::refresh()
{
    const std::string id = m_document->selectedSection().toStdString();
    const Chain::Section* section = SectionPaths::described(m_document->project().unit, id);
    if (!section || !m_form)
        return;
    m_title->setText(QString::fromStdString(section->id));
    const bool coupled = Chain::isCoupled(section->spec);
    const bool inExtract = SectionPaths::indexOf(m_document->project().unit.extract, id) >= 0
                           && SectionPaths::indexOf(m_document->project().unit.supply, id) < 0;
    m_subtitle->setText(tr("%1, %2")
                            .arg(SectionCatalog::typeLabel(section->spec),
                                 coupled ? tr("spans the supply and extract paths")
                                         : (inExtract ? tr("extract path") : tr("supply path"))));
    m_form->refresh();
    refreshResults();
}

void SectionEditor::refreshResults()
{
    m_results->setRowCount(0);
    const std::string id = m_document->selectedSection().toStdString();
    const auto& result = m_document->result();
    if (id.empty())
        return;
    if (!result || result->cases.empty()) {
        m_resultsTitle->setText(tr("Results"));
        m_results->setRowCount(1);
        m_results->setItem(0, 0, new QTableWidgetItem(tr("not computed: %1").arg(MessageUnits::toDisplay(m_document->computeError(), *m_units))));
        m_results->setFixedHeight(m_results->horizontalHeader()->height() + m_results->rowHeight(0) + 4);
        return;
    }
    const int index = std::clamp(m_caseIndex, 0, static_cast<int>(result->cases.size()) - 1);
    const auto& caseResult = result->cases[static_cast<std::size_t>(index)];
    m_resultsTitle->setText(tr("Results, %1").arg(QString::fromStdString(caseResult.caseName)));

    auto addRow = [this](const QString& label, const QString& value) {
        const int row = m_results->rowCount();
        m_results->insertRow(row);
        m_results->setItem(row, 0, new QTableWidgetItem(label));
        auto* item = new QTableWidgetItem(value);
        item->setTextAlignment(Qt::AlignRight | Qt::AlignVCenter);
        m_results->setItem(row, 1, item);
    };
    using K = UnitSystem::Kind;
    for (const auto path : {Chain::PathKind::Supply, Chain::PathKind::Extract}) {
        const Chain::SectionResult* r = caseResult.find(path, id);
        if (!r)
            continue;
        const QString side = path == Chain::PathKind::Supply ? tr("supply") : tr("extract");
        auto prefix = [&](const QString& what) {
            return Chain::isCoupled(SectionPaths::described(m_document->project().unit, id)->spec)
                       ? QStringLiteral("%1, %2").arg(what, side)
                       : what;
        };
        addRow(prefix(tr("Air in")),
               QStringLiteral("%1, %2 RH")
                   .arg(m_units->format(K::Temperature, toCelsius(r->inlet.state.dryBulb())),
                        m_units->format(K::Percent, toPercent(r->inlet.state.relativeHumidity()), 0)));
        addRow(prefix(tr("Air out")),
               QStringLiteral("%1, %2 RH")
                   .arg(m_units->format(K::Temperature, toCelsius(r->outlet.state.dryBulb())),
                        m_units->format(K::Percent, toPercent(r->outlet.state.relativeHumidity()), 0)));
        addRow(prefix(tr("Airflow at inlet")), m_units->format(K::AirVolumeFlow, toCubicMetresPerHour(r->inletFlow)));
        addRow(prefix(tr("Face velocity")), m_units->format(K::Velocity, toMetresPerSecond(r->faceVelocity)));
        const bool fan = r->pressureDrop.value() < 0.0;
        addRow(prefix(fan ? tr("Pressure rise") : tr("Pressure drop")),
               m_units->format(K::Pressure, std::abs(toPascals(r->pressureDrop))));
        const auto figures = Chain::sectionFigures(*r);
        const bool hasPower = std::any_of(figures.begin(), figures.end(),
                                          [](const Chain::Figure& f) { return f.kind == Chain::FigureKind::Power; });
        if (!hasPower && std::abs(toKilowatts(r->duty)) >= 0.005)
            addRow(prefix(tr("Heat to the air")), m_units->format(K::Power, toKilowatts(r->duty)));
        for (const auto& figure : figures) {
            QString label = QString::fromStdString(figure.label);
            if (!label.isEmpty())
                label[0] = label[0].toUpper();
            label = prefix(label);
            if (figure.kind == Chain::FigureKind::Text)
                addRow(label, QString::fromStdString(figure.text));
            else
                addRow(label, m_units->format(figure.kind, figure.value));
        }
    }
    int height = m_results->horizontalHeader()->height() + 4;
    for (int row = 0; row < m_results->rowCount(); ++row)
        height += m_results->rowHeight(row);
    m_results->setFixedHeight(height);
}

} // namespace Airwright::Ui
