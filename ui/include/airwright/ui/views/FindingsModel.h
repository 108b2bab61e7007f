#pragma once
// Every finding of every design case in one list, errors first, then warnings,
// then notes; within a severity in case order and the solver's order.

#include "airwright/core/Finding.h"
#include "airwright/core/chain/CaseResult.h"

#include <QAbstractTableModel>
#include <QIcon>
#include <QString>

#include <optional>
#include <vector>

namespace Airwright::Ui {

class UnitSystem;

class FindingsModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column { SeverityColumn, CaseColumn, SectionColumn, MessageColumn, ColumnCount };
    enum Role {
        SectionIdRole = Qt::UserRole + 1, // QString, empty for the whole unit
        SeverityRole,                     // int: Core::Severity
        CodeRole,                         // QString: the finding's stable code
    };

    struct Row {
        Core::Finding finding;
        QString caseName;
    };

    explicit FindingsModel(QObject* parent = nullptr);

    // The messages' numbers follow this unit system (see MessageUnits); without
    // one they are shown as core wrote them. units must outlive the model.
    void setUnits(const UnitSystem* units);
    // A row's message as shown.
    QString message(const Row& row) const;

    void rebuild(const std::optional<Core::Chain::UnitResult>& result);
    const std::vector<Row>& rows() const { return m_rows; }

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    // A small drawn marker per severity (our own: round for errors and notes,
    // triangular for warnings), tinted for light and dark backgrounds alike.
    static QIcon severityIcon(Core::Severity severity);
    static QString severityText(Core::Severity severity); // "error", "warning", "note"

private:
    std::vector<Row> m_rows;
    const UnitSystem* m_units = nullptr;
};

} // namespace Airwright::Ui
