#pragma once
// The design cases as a table: one row per case, one column per input. Edits are
// checked like the forms' (a candidate must not bring a new problem) and pushed
// as EditCasesCommand; a refused edit is reported through problemFound().

#include "airwright/core/chain/DesignCase.h"

#include <QAbstractTableModel>

#include <vector>

namespace Airwright::Ui {

class ProjectDocument;
class UnitSystem;

class CasesModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column {
        Name,
        OutdoorTemperature,
        OutdoorHumidity,
        RoomTemperature,
        RoomHumidity,
        SupplySetpoint,
        MinimumHumidity,
        MaximumHumidity,
        Reheat,
        FilterCondition,
        Airflow,
        ColumnCount
    };
    static constexpr int ChoicesRole = Qt::UserRole + 1; // QStringList for a choice column

    CasesModel(ProjectDocument* document, UnitSystem* units, QObject* parent = nullptr);

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;
    Qt::ItemFlags flags(const QModelIndex& index) const override;
    bool setData(const QModelIndex& index, const QVariant& value, int role = Qt::EditRole) override;

    // Whole-list edits, each one undo step. Return false (and report) when refused.
    bool addCase(int copyOf = -1);
    bool removeCase(int row);

signals:
    void problemFound(const QString& message); // empty: the last edit was accepted

private:
    bool commit(std::vector<Core::Chain::DesignCase> cases, const QString& text);
    const std::vector<Core::Chain::DesignCase>& cases() const;

    ProjectDocument* m_document;
    UnitSystem* m_units;
    int m_rows = 0; // rows the views know of
};

} // namespace Airwright::Ui
