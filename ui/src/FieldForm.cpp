#include "airwright/ui/FieldForm.h"

#include <QFormLayout>
#include <QLabel>

namespace Airwright::Ui {

FieldForm::FieldForm(const UnitSystem* units, QWidget* parent) : QWidget(parent), m_units(units)
{
    m_layout = new QFormLayout(this);
    m_layout->setContentsMargins(4, 4, 4, 4);
    m_layout->setFieldGrowthPolicy(QFormLayout::AllNonFixedFieldsGrow);
    m_layout->setRowWrapPolicy(QFormLayout::DontWrapRows);
    m_layout->setLabelAlignment(Qt::AlignLeft | Qt::AlignVCenter);
}

void FieldForm::addBinding(const QString& label, const QString& tooltip, Binding binding)
{
    auto* labelWidget = new QLabel(label, this);
    labelWidget->setToolTip(tooltip);
    labelWidget->setBuddy(binding.row->editorWidget());
    m_layout->addRow(labelWidget, binding.row);
    m_bindings.push_back(std::move(binding));
    // Bindings are only appended, so the index stays valid for the connections.
    const std::size_t index = m_bindings.size() - 1;
    FieldRow* row = m_bindings.back().row;
    connect(row, &FieldRow::edited, this, [this, index] { onEdited(m_bindings[index]); });
    connect(row, &FieldRow::commitRequested, this, [this, index] { onCommit(m_bindings[index]); });
}

void FieldForm::addHeading(const QString& text)
{
    auto* heading = new QLabel(text, this);
    QFont font = heading->font();
    font.setBold(true);
    heading->setFont(font);
    heading->setContentsMargins(0, 6, 0, 0);
    m_layout->addRow(heading);
}

void FieldForm::addInfo(const QString& label, std::function<QString()> text, const QString& tooltip)
{
    auto* labelWidget = new QLabel(label, this);
    auto* value = new QLabel(this);
    value->setWordWrap(true);
    value->setTextInteractionFlags(Qt::TextSelectableByMouse);
    labelWidget->setToolTip(tooltip);
    value->setToolTip(tooltip);
    m_layout->addRow(labelWidget, value);
    m_infos.push_back({labelWidget, value, std::move(text)});
    value->setText(m_infos.back().text());
}

void FieldForm::onEdited(Binding& binding)
{
    const auto candidate = binding.row->currentValue();
    if (!candidate) {
        binding.row->setError(tr("Enter a number."));
        return;
    }
    binding.row->setError(binding.check(*candidate));
}

void FieldForm::onCommit(Binding& binding)
{
    if (!binding.row->isEdited()) {
        binding.row->setError({});
        return;
    }
    const auto candidate = binding.row->currentValue();
    if (!candidate) {
        binding.row->setError(tr("Enter a number."));
        return;
    }
    const QString problem = binding.check(*candidate);
    if (!problem.isEmpty()) {
        binding.row->setError(problem);
        return;
    }
    binding.commit(*candidate);
    // A commit that changed nothing (say "60.0" for 60) leaves the document as it
    // was and sends no notice: show the stored value again.
    if (const auto now = binding.read())
        binding.row->setValue(*now);
}

void FieldForm::refresh()
{
    for (auto& binding : m_bindings) {
        const auto value = binding.read();
        const bool shown = value.has_value() && (!binding.applies || binding.applies());
        m_layout->setRowVisible(binding.row, shown);
        if (value)
            binding.row->setValue(*value);
    }
    for (auto& info : m_infos)
        info.value->setText(info.text());
}

void FieldForm::refreshUnits()
{
    for (auto& binding : m_bindings)
        if (!binding.row->isEdited())
            binding.row->refreshUnits();
    for (auto& info : m_infos)
        info.value->setText(info.text());
}

FieldRow* FieldForm::row(const QString& label) const
{
    for (const auto& binding : m_bindings)
        if (binding.label == label)
            return binding.row;
    return nullptr;
}

} // namespace Airwright::Ui
