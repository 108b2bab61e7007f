#pragma once
// The heat recovery options of the comparison as an editable table: one row per
// option, its datasheet figures (dry temperature efficiency, humidity
// efficiency, rated pressure drops, frost protection) and its extra cost. Every
// typed value is checked with the core's HeatRecovery::validate() before it is
// taken; a refused value leaves the option as it was and problemFound() says
// why. Values that differ from the defaults are shown bold, the default in the
// tooltip. Pressures follow the UnitSystem. The model owns the inputs; the
// prices and schedule are set through setSettings().

#include "airwright/ui/views/HeatRecoveryInputs.h"

#include <QAbstractTableModel>
#include <QString>

namespace Airwright::Ui {

class UnitSystem;

class HeatRecoveryOptionsModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column {
        OptionColumn,
        EfficiencyColumn,
        HumidityEfficiencyColumn,
        DropSupplyColumn,
        DropExtractColumn,
        FrostColumn,
        ExtraCostColumn,
        ColumnCount
    };
    // Same role number as CasesModel::ChoicesRole: a QStringList for a choice cell
    // (its Qt::EditRole is the index of the current choice).
    static constexpr int ChoicesRole = Qt::UserRole + 1;
    static constexpr int KeyRole = Qt::UserRole + 2; // QString: the option's key

    // units must outlive the model.
    explicit HeatRecoveryOptionsModel(const UnitSystem* units, QObject* parent = nullptr);

    const HeatRecoveryInputs& inputs() const { return m_inputs; }
    void setInputs(const HeatRecoveryInputs& inputs); // emits inputsChanged() when different
    void setSettings(const Core::Annual::ComparisonSettings& settings);
    void restoreDefaultOptions();
    // The unit's supply design flow: the defaults (rated flow, extra cost) follow it.
    void setSupplyFlow(Core::VolumeFlow flow);
    Core::VolumeFlow supplyFlow() const { return m_flow; }
    std::vector<Core::Annual::HeatRecoveryOption> options() const { return m_inputs.options(m_flow); }

    // Why `typed` cannot go into this cell (shown units), or empty when it can.
    QString check(const QModelIndex& index, const QString& typed) const;

    // The frost protection strategies in the order of the choices, with plain labels.
    static const std::vector<Core::Recovery::FrostStrategy>& frostStrategies();
    static QString frostLabel(Core::Recovery::FrostStrategy strategy);

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;
    Qt::ItemFlags flags(const QModelIndex& index) const override;
    bool setData(const QModelIndex& index, const QVariant& value, int role = Qt::EditRole) override;

signals:
    void inputsChanged();
    void problemFound(const QString& message);

private:
    bool editable(int row, int column) const;
    // The cell's value in shown units; empty where the option has no such figure.
    std::optional<double> shown(const Core::Annual::HeatRecoveryOption& option, int column) const;
    QString text(const Core::Annual::HeatRecoveryOption& option, int column) const;
    // The option of `row` with `typed` put into `column`, or the reason it cannot be.
    std::optional<HeatRecoveryInputs::OptionEdits> edited(int row, int column, const QVariant& typed,
                                                          QString* problem) const;
    std::vector<Core::Recovery::FrostStrategy> frostChoices(int row) const;
    void changed();

    const UnitSystem* m_units;
    HeatRecoveryInputs m_inputs;
    Core::VolumeFlow m_flow;
};

} // namespace Airwright::Ui
