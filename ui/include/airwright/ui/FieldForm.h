#pragma once
// A form of FieldRows bound to a value that lives in the document. As the user
// types, each row shows the problem its candidate value would cause; a finished
// edit without a problem is handed to the commit function (which pushes an undo
// command). The form re-reads every row from the document on refresh().

#include "airwright/core/InputError.h"
#include "airwright/ui/FieldRow.h"
#include "airwright/ui/FieldSpec.h"

#include <QWidget>

#include <functional>
#include <optional>
#include <vector>

class QFormLayout;

namespace Airwright::Ui {

class UnitSystem;

class FieldForm : public QWidget {
    Q_OBJECT
public:
    explicit FieldForm(const UnitSystem* units, QWidget* parent = nullptr);

    // read: the value as it is now (empty when there is none, e.g. no selection);
    // check: the problem a candidate would cause, empty when none;
    // commit: applies an accepted candidate.
    template <class T>
    FieldRow* bind(const FieldSpec<T>& spec, std::function<std::optional<T>()> read,
                   std::function<QString(const T&)> check, std::function<void(const T&)> commit);

    void addHeading(const QString& text);
    void addInfo(const QString& label, std::function<QString()> text, const QString& tooltip = {});

    void refresh();      // re-reads values, shows or hides rows that apply
    void refreshUnits(); // after a unit change: labels and shown values
    int rowCount() const { return static_cast<int>(m_bindings.size()); }
    FieldRow* row(const QString& label) const; // by label, for tests

private:
    struct Binding {
        FieldRow* row = nullptr;
        QString label;
        std::function<std::optional<QVariant>()> read;
        std::function<QString(const QVariant&)> check;
        std::function<void(const QVariant&)> commit;
        std::function<bool()> applies;
    };
    struct Info {
        QWidget* label = nullptr;
        class QLabel* value = nullptr;
        std::function<QString()> text;
    };

    void addBinding(const QString& label, const QString& tooltip, Binding binding);
    void onEdited(Binding& binding);
    void onCommit(Binding& binding);

    const UnitSystem* m_units;
    QFormLayout* m_layout;
    std::vector<Binding> m_bindings;
    std::vector<Info> m_infos;
};

template <class T>
FieldRow* FieldForm::bind(const FieldSpec<T>& spec, std::function<std::optional<T>()> read,
                          std::function<QString(const T&)> check, std::function<void(const T&)> commit)
{
    Binding binding;
    binding.row = new FieldRow(spec.type, spec.options, m_units, this);
    binding.label = spec.label;
    auto get = spec.get;
    auto set = spec.set;
    binding.read = [read, get]() -> std::optional<QVariant> {
        const std::optional<T> value = read();
        if (!value)
            return std::nullopt;
        return get(*value);
    };
    binding.check = [read, set, check](const QVariant& v) -> QString {
        const std::optional<T> value = read();
        if (!value)
            return {};
        T candidate = *value;
        try {
            set(candidate, v);
        } catch (const Core::Error& e) {
            return QString::fromStdString(e.what());
        }
        return check(candidate);
    };
    binding.commit = [read, set, commit](const QVariant& v) {
        const std::optional<T> value = read();
        if (!value)
            return;
        T candidate = *value;
        set(candidate, v);
        commit(candidate);
    };
    if (spec.applies) {
        auto applies = spec.applies;
        binding.applies = [read, applies] {
            const std::optional<T> value = read();
            return value && applies(*value);
        };
    }
    FieldRow* row = binding.row;
    addBinding(spec.label, spec.options.tooltip, std::move(binding));
    return row;
}

} // namespace Airwright::Ui
