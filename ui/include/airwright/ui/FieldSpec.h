#pragma once
// The description of one input on a value of type T (a section, the site, the
// airflows, ...): its label, tooltip, type and how to read and write it. Values
// travel as QVariant in the base unit of the field's quantity (see FieldRow).
// A setter may throw Core::Error for a value the model refuses outright.

#include "airwright/ui/FieldRow.h"

#include <QString>
#include <QVariant>

#include <functional>

namespace Airwright::Ui {

template <class T>
struct FieldSpec {
    FieldRow::Type type = FieldRow::Type::Real;
    QString label;
    FieldRow::Options options;
    std::function<QVariant(const T&)> get;
    std::function<void(T&, const QVariant&)> set;
    std::function<bool(const T&)> applies; // empty: always shown
};

} // namespace Airwright::Ui
