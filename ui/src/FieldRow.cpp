#include "airwright/ui/FieldRow.h"

#include "airwright/ui/UnitSystem.h"

#include <QCheckBox>
#include <QComboBox>
#include <QEvent>
#include <QHBoxLayout>
#include <QKeyEvent>
#include <QLabel>
#include <QLineEdit>
#include <QPlainTextEdit>
#include <QSpinBox>
#include <QVBoxLayout>

namespace Airwright::Ui {

FieldRow::FieldRow(Type type, Options options, const UnitSystem* units, QWidget* parent)
    : QWidget(parent), m_type(type), m_options(std::move(options)), m_units(units)
{
    auto* outer = new QVBoxLayout(this);
    outer->setContentsMargins(0, 0, 0, 0);
    outer->setSpacing(1);
    auto* line = new QHBoxLayout;
    line->setContentsMargins(0, 0, 0, 0);
    outer->addLayout(line);

    auto notifyEdited = [this] {
        if (!m_updating)
            emit edited();
    };
    auto notifyCommit = [this] {
        if (!m_updating)
            emit commitRequested();
    };

    switch (m_type) {
    case Type::OptionalReal:
        m_check = new QCheckBox(this);
        m_check->setToolTip(tr("Tick to give a value; untick: %1").arg(m_options.offText));
        line->addWidget(m_check);
        connect(m_check, &QCheckBox::toggled, this, [this, notifyEdited, notifyCommit](bool on) {
            if (m_updating)
                return;
            m_line->setEnabled(on);
            if (on && m_line->text().isEmpty())
                m_line->setText(FieldQuantity::editText(m_options.quantity.toDisplay(*m_units, m_options.defaultOn)));
            notifyEdited();
            notifyCommit();
        });
        [[fallthrough]];
    case Type::Real:
    case Type::Text:
        m_line = new QLineEdit(this);
        m_line->installEventFilter(this);
        line->addWidget(m_line, 1);
        connect(m_line, &QLineEdit::textEdited, this, notifyEdited);
        connect(m_line, &QLineEdit::editingFinished, this, notifyCommit);
        if (m_type == Type::OptionalReal)
            m_line->setPlaceholderText(m_options.offText);
        break;
    case Type::Integer:
        m_spin = new QSpinBox(this);
        m_spin->setRange(m_options.minimum, m_options.maximum);
        m_spin->setKeyboardTracking(false);
        line->addWidget(m_spin, 1);
        connect(m_spin, &QSpinBox::valueChanged, this, [notifyEdited, notifyCommit] {
            notifyEdited();
            notifyCommit();
        });
        break;
    case Type::Choice:
        m_combo = new QComboBox(this);
        m_combo->addItems(m_options.choices);
        line->addWidget(m_combo, 1);
        connect(m_combo, &QComboBox::activated, this, [notifyEdited, notifyCommit] {
            notifyEdited();
            notifyCommit();
        });
        break;
    case Type::Flag:
        m_check = new QCheckBox(this);
        line->addWidget(m_check, 1);
        connect(m_check, &QCheckBox::clicked, this, [notifyEdited, notifyCommit] {
            notifyEdited();
            notifyCommit();
        });
        break;
    case Type::LongText:
        m_text = new QPlainTextEdit(this);
        m_text->setTabChangesFocus(true);
        m_text->setMaximumHeight(90);
        m_text->installEventFilter(this);
        line->addWidget(m_text, 1);
        connect(m_text, &QPlainTextEdit::textChanged, this, notifyEdited);
        break;
    }
    if (m_type == Type::Real || m_type == Type::OptionalReal) {
        m_unit = new QLabel(this);
        m_unit->setMinimumWidth(fontMetrics().horizontalAdvance(QStringLiteral("in. w.g.")) + 4);
        line->addWidget(m_unit);
    }
    m_error = new QLabel(this);
    m_error->setWordWrap(true);
    m_error->setStyleSheet(QStringLiteral("color: #d03030;"));
    m_error->setVisible(false);
    outer->addWidget(m_error);

    if (!m_options.tooltip.isEmpty())
        for (QWidget* w : {static_cast<QWidget*>(m_line), static_cast<QWidget*>(m_spin),
                           static_cast<QWidget*>(m_combo), static_cast<QWidget*>(m_text)})
            if (w)
                w->setToolTip(m_options.tooltip);
    if (m_type == Type::Flag)
        m_check->setToolTip(m_options.tooltip);
    showValue();
}

void FieldRow::setValue(const QVariant& value)
{
    m_value = value;
    showValue();
    setError({});
}

void FieldRow::refreshUnits()
{
    showValue();
}

QString FieldRow::shownText() const
{
    switch (m_type) {
    case Type::Real:
    case Type::OptionalReal:
        if (!m_value.isValid())
            return {};
        return FieldQuantity::editText(m_options.quantity.toDisplay(*m_units, m_value.toDouble()));
    case Type::Text:
    case Type::LongText:
        return m_value.toString();
    default:
        return {};
    }
}

void FieldRow::showValue()
{
    m_updating = true;
    m_shownText = shownText();
    switch (m_type) {
    case Type::OptionalReal:
        m_check->setChecked(m_value.isValid());
        m_line->setEnabled(m_value.isValid());
        [[fallthrough]];
    case Type::Real:
    case Type::Text:
        m_line->setText(m_shownText);
        m_line->setCursorPosition(0);
        break;
    case Type::Integer:
        m_spin->setValue(m_value.toInt());
        break;
    case Type::Choice:
        m_combo->setCurrentIndex(m_value.isValid() ? m_value.toInt() : -1);
        break;
    case Type::Flag:
        m_check->setChecked(m_value.toBool());
        break;
    case Type::LongText:
        if (m_text->toPlainText() != m_shownText)
            m_text->setPlainText(m_shownText);
        break;
    }
    if (m_unit)
        m_unit->setText(m_options.quantity.unit(*m_units));
    m_updating = false;
}

std::optional<QVariant> FieldRow::currentValue() const
{
    switch (m_type) {
    case Type::OptionalReal:
        if (!m_check->isChecked())
            return QVariant();
        [[fallthrough]];
    case Type::Real: {
        if (m_line->text() == m_shownText && m_value.isValid())
            return m_value; // untouched: the exact stored value, not its rounded text
        const auto shown = FieldQuantity::parse(m_line->text());
        if (!shown)
            return std::nullopt;
        return QVariant(m_options.quantity.fromDisplay(*m_units, *shown));
    }
    case Type::Text:
        return QVariant(m_line->text().trimmed());
    case Type::LongText:
        return QVariant(m_text->toPlainText());
    case Type::Integer:
        return QVariant(m_spin->value());
    case Type::Choice:
        return QVariant(m_combo->currentIndex());
    case Type::Flag:
        return QVariant(m_check->isChecked());
    }
    return std::nullopt;
}

bool FieldRow::isEdited() const
{
    switch (m_type) {
    case Type::OptionalReal:
        if (m_check->isChecked() != m_value.isValid())
            return true;
        return m_check->isChecked() && m_line->text() != m_shownText;
    case Type::Real:
    case Type::Text:
        return m_line->text() != m_shownText;
    case Type::LongText:
        return m_text->toPlainText() != m_shownText;
    case Type::Integer:
    case Type::Choice:
    case Type::Flag: {
        const auto now = currentValue();
        return now && *now != m_value;
    }
    }
    return false;
}

void FieldRow::revert()
{
    showValue();
    setError({});
}

void FieldRow::setError(const QString& message)
{
    m_error->setText(message);
    m_error->setVisible(!message.isEmpty());
    if (m_line)
        m_line->setStyleSheet(message.isEmpty() ? QString() : QStringLiteral("border: 1px solid #d03030;"));
}

QString FieldRow::error() const
{
    return m_error->text();
}

QWidget* FieldRow::editorWidget() const
{
    if (m_line)
        return m_line;
    if (m_spin)
        return m_spin;
    if (m_combo)
        return m_combo;
    if (m_text)
        return m_text;
    return m_check;
}

bool FieldRow::eventFilter(QObject* watched, QEvent* event)
{
    if (watched == m_line && event->type() == QEvent::KeyPress
        && static_cast<QKeyEvent*>(event)->key() == Qt::Key_Escape) {
        revert();
        return true;
    }
    if (watched == m_text && event->type() == QEvent::FocusOut && !m_updating)
        emit commitRequested();
    return QWidget::eventFilter(watched, event);
}

} // namespace Airwright::Ui
