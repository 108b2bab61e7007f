#pragma once
// The heat recovery comparison as a table: one row per option in the order of
// the comparison (the option without heat recovery first), its rank, design
// figures and annual savings against that option. Pressures follow the
// UnitSystem; energies are MWh per year in SI and MMBtu per year in IP; money is
// in the price currency (the program has no currency unit).

#include "airwright/core/annual/ComparisonResult.h"

#include <QAbstractTableModel>
#include <QString>

#include <optional>

namespace Airwright::Ui {

class UnitSystem;

class HeatRecoveryComparisonModel : public QAbstractTableModel {
    Q_OBJECT
public:
    // The verdict first (rank, net saving, money), then the energies behind it,
    // then the design figures.
    enum Column {
        RankColumn,
        OptionColumn,
        NetSavingColumn,
        CostSavingColumn,
        ExtraCostColumn,
        PaybackColumn,
        NetBenefitColumn,
        HeatSavingColumn,
        ElectricitySavingColumn,
        EffectivenessColumn,
        RegulationEfficiencyColumn,
        SupplyDropColumn,
        ExtractDropColumn,
        ColumnCount
    };
    enum Role {
        SortRole = Qt::UserRole + 1, // double for number columns
        KeyRole,                     // QString: the option's stable key
    };

    // units must outlive the model; the model follows its changes.
    explicit HeatRecoveryComparisonModel(const UnitSystem* units, QObject* parent = nullptr);

    // evaluationYears: the period of the net benefit (ComparisonSettings).
    void setResult(const std::optional<Core::Annual::ComparisonResult>& result, double evaluationYears);
    const std::optional<Core::Annual::ComparisonResult>& result() const { return m_result; }

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    // Net saving (heat plus electricity) of each row in the shown energy unit.
    double netSavingShown(int row) const;
    QString energyUnit() const; // "MWh" or "MMBtu"
    // An annual energy in the shown unit: MWh, or MMBtu (10^6 Btu_IT).
    double energyToDisplay(Core::Annual::Energy energy) const;
    // 1 was the best; 0 when the ranking does not list the option.
    int rank(int row) const;

private:
    QString text(int row, int column) const;
    std::optional<double> number(int row, int column) const;
    void unitsChanged();

    const UnitSystem* m_units;
    std::optional<Core::Annual::ComparisonResult> m_result;
    double m_years = 0.0;
};

} // namespace Airwright::Ui
