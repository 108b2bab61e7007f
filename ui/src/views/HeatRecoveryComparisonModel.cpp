#include "airwright/ui/views/HeatRecoveryComparisonModel.h"

#include "airwright/ui/UnitSystem.h"

namespace Airwright::Ui {

namespace {

using Kind = UnitSystem::Kind;

// Btu_IT = 1055.05585262 J (International Table, 4186.8 J/(kg K) x 0.45359237 kg
// / 1.8 K, exact; NIST SP 811 B.8 prints 1.055056 E+03 J).
constexpr double kJoulesPerMillionBtu = 4186.8 * 0.45359237 / 1.8 * 1.0e6;

} // namespace

HeatRecoveryComparisonModel::HeatRecoveryComparisonModel(const UnitSystem* units, QObject* parent)
    : QAbstractTableModel(parent), m_units(units)
{
    connect(m_units, &UnitSystem::changed, this, &HeatRecoveryComparisonModel::unitsChanged);
}

void HeatRecoveryComparisonModel::setResult(const std::optional<Core::Annual::ComparisonResult>& result,
                                            double evaluationYears)
{
    beginResetModel();
    m_result = result;
    m_years = evaluationYears;
    endResetModel();
    emit headerDataChanged(Qt::Horizontal, 0, ColumnCount - 1);
}

int HeatRecoveryComparisonModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() || !m_result ? 0 : int(m_result->options.size());
}

int HeatRecoveryComparisonModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QString HeatRecoveryComparisonModel::energyUnit() const
{
    return m_units->system() == UnitSystem::System::IP ? QStringLiteral("MMBtu") : QStringLiteral("MWh");
}

double HeatRecoveryComparisonModel::energyToDisplay(Core::Annual::Energy energy) const
{
    if (m_units->system() == UnitSystem::System::IP)
        return energy.value() / kJoulesPerMillionBtu;
    return Core::Annual::toMegawattHours(energy);
}

double HeatRecoveryComparisonModel::netSavingShown(int row) const
{
    if (row < 0 || row >= rowCount())
        return 0.0;
    return energyToDisplay(m_result->options[std::size_t(row)].netSaving);
}

int HeatRecoveryComparisonModel::rank(int row) const
{
    if (row < 0 || row >= rowCount())
        return 0;
    const std::string& key = m_result->options[std::size_t(row)].key;
    for (const auto& entry : m_result->ranking)
        if (entry.key == key)
            return entry.rank;
    return 0;
}

std::optional<double> HeatRecoveryComparisonModel::number(int row, int column) const
{
    const auto& o = m_result->options[std::size_t(row)];
    switch (column) {
    case RankColumn: {
        const int r = rank(row);
        return r > 0 ? std::optional<double>(r) : std::nullopt;
    }
    case EffectivenessColumn:
        return o.hasRecovery ? std::optional<double>(Core::toPercent(o.designEffectiveness)) : std::nullopt;
    case RegulationEfficiencyColumn:
        return o.hasRecovery ? std::optional<double>(Core::toPercent(o.regulationEfficiency)) : std::nullopt;
    case SupplyDropColumn:
        return o.hasRecovery ? std::optional<double>(m_units->toDisplay(Kind::Pressure, Core::toPascals(o.supplyPressureDrop)))
                             : std::nullopt;
    case ExtractDropColumn:
        return o.hasRecovery
                   ? std::optional<double>(m_units->toDisplay(Kind::Pressure, Core::toPascals(o.extractPressureDrop)))
                   : std::nullopt;
    case HeatSavingColumn:
        return energyToDisplay(o.heatSaving);
    case ElectricitySavingColumn:
        return energyToDisplay(o.electricitySaving);
    case NetSavingColumn:
        return energyToDisplay(o.netSaving);
    case CostSavingColumn:
        return o.costSaving;
    case ExtraCostColumn:
        return o.extraCost;
    case PaybackColumn:
        return o.paybackYears;
    case NetBenefitColumn:
        return o.netBenefit;
    default:
        return std::nullopt;
    }
}

QString HeatRecoveryComparisonModel::text(int row, int column) const
{
    const auto& o = m_result->options[std::size_t(row)];
    if (column == OptionColumn)
        return QString::fromStdString(o.name);
    const auto v = number(row, column);
    if (!v) {
        if (column == PaybackColumn)
            return o.hasRecovery ? QStringLiteral("no saving") : QString();
        return column == RankColumn ? QString() : QStringLiteral("-");
    }
    const bool ip = m_units->system() == UnitSystem::System::IP;
    switch (column) {
    case RankColumn:
        return QString::number(*v, 'f', 0);
    case EffectivenessColumn:
    case RegulationEfficiencyColumn:
        return QString::number(*v, 'f', 1);
    case SupplyDropColumn:
    case ExtractDropColumn:
        return QString::number(*v, 'f', ip ? 2 : 0);
    case HeatSavingColumn:
    case ElectricitySavingColumn:
    case NetSavingColumn:
        return QString::number(std::abs(*v) < 0.005 ? 0.0 : *v, 'f', 2);
    case PaybackColumn:
        return QString::number(*v, 'f', 1);
    default: // money: whole units
        return QString::number(std::abs(*v) < 0.5 ? 0.0 : *v, 'f', 0);
    }
}

QVariant HeatRecoveryComparisonModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() >= rowCount() || index.column() >= ColumnCount)
        return {};
    const int row = index.row();
    const int column = index.column();
    switch (role) {
    case Qt::DisplayRole:
        return text(row, column);
    case Qt::TextAlignmentRole:
        return column == OptionColumn ? QVariant(int(Qt::AlignLeft | Qt::AlignVCenter))
                                      : QVariant(int(Qt::AlignRight | Qt::AlignVCenter));
    case Qt::ToolTipRole:
        if (column == OptionColumn || column == RankColumn) {
            const std::string& key = m_result->options[std::size_t(row)].key;
            for (const auto& entry : m_result->ranking)
                if (entry.key == key)
                    return QString::fromStdString(entry.reason);
        }
        return {};
    case SortRole: {
        const auto v = number(row, column);
        return v ? QVariant(*v) : QVariant(text(row, column));
    }
    case KeyRole:
        return QString::fromStdString(m_result->options[std::size_t(row)].key);
    default:
        return {};
    }
}

QVariant HeatRecoveryComparisonModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole)
        return QAbstractTableModel::headerData(section, orientation, role);
    const QString perYear = QStringLiteral("[%1 per year]").arg(energyUnit());
    switch (section) {
    case RankColumn:
        return QStringLiteral("Rank");
    case OptionColumn:
        return QStringLiteral("Heat recovery");
    case EffectivenessColumn:
        return QStringLiteral("Temperature ratio\nat design [%]");
    case RegulationEfficiencyColumn:
        return QStringLiteral("Thermal efficiency\nEU 1253/2014 [%]");
    case SupplyDropColumn:
        return QStringLiteral("Supply Δp\n[%1]").arg(m_units->unit(Kind::Pressure));
    case ExtractDropColumn:
        return QStringLiteral("Extract Δp\n[%1]").arg(m_units->unit(Kind::Pressure));
    case HeatSavingColumn:
        return QStringLiteral("Heat saved\n%1").arg(perYear);
    case ElectricitySavingColumn:
        return QStringLiteral("Electricity saved\n%1").arg(perYear);
    case NetSavingColumn:
        return QStringLiteral("Net saving\n%1").arg(perYear);
    case CostSavingColumn:
        return QStringLiteral("Cost saved\n[per year]");
    case ExtraCostColumn:
        return QStringLiteral("Extra cost");
    case PaybackColumn:
        return QStringLiteral("Payback\n[years]");
    case NetBenefitColumn:
        return QStringLiteral("Net benefit\n[over %1 years]").arg(QString::number(m_years, 'f', 0));
    default:
        return {};
    }
}

void HeatRecoveryComparisonModel::unitsChanged()
{
    emit headerDataChanged(Qt::Horizontal, 0, ColumnCount - 1);
    if (rowCount() > 0)
        emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
}

} // namespace Airwright::Ui
