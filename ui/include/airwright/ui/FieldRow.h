#pragma once
// One input of a form: the editor widget for its type, its unit, and the error
// line beside it. It converts between the shown unit and the base unit of its
// FieldQuantity; what the value means and whether it is acceptable is decided
// by the FieldForm that owns it.

#include "airwright/ui/FieldQuantity.h"

#include <QStringList>
#include <QVariant>
#include <QWidget>

#include <optional>

class QCheckBox;
class QComboBox;
class QLabel;
class QLineEdit;
class QPlainTextEdit;
class QSpinBox;

namespace Airwright::Ui {

class UnitSystem;

class FieldRow : public QWidget {
    Q_OBJECT
public:
    // Values travel as QVariant: Real double (base unit), OptionalReal double or
    // an invalid QVariant for "not set", Integer and Choice int, Flag bool, Text
    // and LongText QString.
    enum class Type { Real, OptionalReal, Integer, Choice, Flag, Text, LongText };

    struct Options {
        FieldQuantity quantity;
        QString offText;          // OptionalReal: what "not set" means ("sized automatically")
        double defaultOn = 0.0;   // OptionalReal: base value offered when switched on
        QStringList choices;      // Choice
        int minimum = 0;          // Integer
        int maximum = 100;
        QString tooltip;
    };

    FieldRow(Type type, Options options, const UnitSystem* units, QWidget* parent = nullptr);

    Type type() const { return m_type; }

    // Shows a value (base unit) without emitting anything; clears the error.
    void setValue(const QVariant& value);
    const QVariant& shownValue() const { return m_value; }
    // What the editor holds now; empty when it cannot be read (not a number).
    std::optional<QVariant> currentValue() const;
    // True when the user changed the editor since the last setValue.
    bool isEdited() const;
    void revert();

    void setError(const QString& message);
    QString error() const;
    void refreshUnits(); // re-shows the value after a unit change

    QWidget* editorWidget() const; // the widget taking focus (tests, tab order)

signals:
    void edited();          // the value changed as the user types
    void commitRequested(); // editing finished (Enter, focus out, a click on a choice)

protected:
    bool eventFilter(QObject* watched, QEvent* event) override;

private:
    void showValue();
    QString shownText() const;

    Type m_type;
    Options m_options;
    const UnitSystem* m_units;
    QVariant m_value;
    QString m_shownText;
    bool m_updating = false;

    QLineEdit* m_line = nullptr;
    QCheckBox* m_check = nullptr;
    QComboBox* m_combo = nullptr;
    QSpinBox* m_spin = nullptr;
    QPlainTextEdit* m_text = nullptr;
    QLabel* m_unit = nullptr;
    QLabel* m_error = nullptr;
};

} // namespace Airwright::Ui
