#include "airwright/ui/views/HeatRecoveryOptionsModel.h"

#include "airwright/core/InputError.h"
#include "airwright/core/recovery/ExchangerKind.h"
#include "airwright/ui/FieldQuantity.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QFont>

#include <cmath>

namespace Airwright::Ui {

namespace {

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using Recovery::FrostStrategy;
using Kind = UnitSystem::Kind;

bool movesMoisture(const HeatRecoveryOption& option)
{
    return option.spec && (option.spec->kind == Recovery::ExchangerKind::RotaryHygroscopic ||
                           option.spec->kind == Recovery::ExchangerKind::RotarySorption);
}

} // namespace

HeatRecoveryOptionsModel::HeatRecoveryOptionsModel(const UnitSystem* units, QObject* parent)
    : QAbstractTableModel(parent), m_units(units), m_flow(cubicMetresPerHour(10000.0))
{
    connect(m_units, &UnitSystem::changed, this, [this] {
        emit headerDataChanged(Qt::Horizontal, 0, ColumnCount - 1);
        emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
    });
}

const std::vector<FrostStrategy>& HeatRecoveryOptionsModel::frostStrategies()
{
    static const std::vector<FrostStrategy> all{FrostStrategy::None,          FrostStrategy::Bypass,
                                                FrostStrategy::Preheat,       FrostStrategy::SectionalDefrost,
                                                FrostStrategy::ReducedSupply, FrostStrategy::RotorSpeed};
    return all;
}

QString HeatRecoveryOptionsModel::frostLabel(FrostStrategy strategy)
{
    switch (strategy) {
    case FrostStrategy::None:
        return tr("none");
    case FrostStrategy::Bypass:
        return tr("bypass");
    case FrostStrategy::Preheat:
        return tr("preheat outdoor air");
    case FrostStrategy::SectionalDefrost:
        return tr("defrost one section at a time");
    case FrostStrategy::ReducedSupply:
        return tr("reduce supply air");
    case FrostStrategy::RotorSpeed:
        return tr("slow the rotor");
    }
    return {};
}

std::vector<FrostStrategy> HeatRecoveryOptionsModel::frostChoices(int row) const
{
    const auto all = options();
    const auto& o = all[std::size_t(row)];
    std::vector<FrostStrategy> list;
    for (const FrostStrategy s : frostStrategies())
        if (s != FrostStrategy::RotorSpeed || (o.spec && Recovery::isRotary(o.spec->kind)))
            list.push_back(s);
    return list;
}

void HeatRecoveryOptionsModel::setInputs(const HeatRecoveryInputs& inputs)
{
    if (inputs == m_inputs)
        return;
    m_inputs = inputs;
    changed();
}

void HeatRecoveryOptionsModel::setSettings(const ComparisonSettings& settings)
{
    if (settings == m_inputs.settings())
        return;
    m_inputs.setSettings(settings);
    emit inputsChanged();
}

void HeatRecoveryOptionsModel::restoreDefaultOptions()
{
    if (m_inputs.optionsAreDefault())
        return;
    m_inputs.restoreDefaultOptions();
    changed();
}

void HeatRecoveryOptionsModel::setSupplyFlow(VolumeFlow flow)
{
    if (flow == m_flow)
        return;
    m_flow = flow;
    emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
}

void HeatRecoveryOptionsModel::changed()
{
    emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
    emit inputsChanged();
}

int HeatRecoveryOptionsModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : int(defaultHeatRecoveryOptions(m_flow).size());
}

int HeatRecoveryOptionsModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

bool HeatRecoveryOptionsModel::editable(int row, int column) const
{
    const auto all = options();
    const auto& o = all[std::size_t(row)];
    switch (column) {
    case ExtraCostColumn:
        return true;
    case HumidityEfficiencyColumn:
        return movesMoisture(o);
    case OptionColumn:
        return false;
    default:
        return o.spec.has_value();
    }
}

std::optional<double> HeatRecoveryOptionsModel::shown(const HeatRecoveryOption& o, int column) const
{
    if (column == ExtraCostColumn)
        return o.extraCost;
    if (!o.spec)
        return std::nullopt;
    switch (column) {
    case EfficiencyColumn:
        return toPercent(o.spec->ratedEfficiency);
    case HumidityEfficiencyColumn:
        return Recovery::isRotary(o.spec->kind) ? std::optional<double>(toPercent(o.spec->ratedHumidityEfficiency))
                                                : std::nullopt;
    case DropSupplyColumn:
        return m_units->toDisplay(Kind::Pressure, toPascals(o.spec->ratedPressureDropSupply));
    case DropExtractColumn:
        return m_units->toDisplay(Kind::Pressure, toPascals(o.spec->ratedPressureDropExtract));
    default:
        return std::nullopt;
    }
}

QString HeatRecoveryOptionsModel::text(const HeatRecoveryOption& o, int column) const
{
    if (column == OptionColumn)
        return QString::fromStdString(o.name);
    if (column == FrostColumn)
        return o.spec ? frostLabel(o.spec->frostStrategy) : QStringLiteral("-");
    const auto v = shown(o, column);
    if (!v)
        return QStringLiteral("-");
    const bool ip = m_units->system() == UnitSystem::System::IP;
    switch (column) {
    case DropSupplyColumn:
    case DropExtractColumn:
        return QString::number(*v, 'f', ip ? 2 : 0);
    case ExtraCostColumn:
        return QString::number(*v, 'f', 0);
    default:
        return FieldQuantity::editText(*v);
    }
}

QVariant HeatRecoveryOptionsModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() >= rowCount() || index.column() >= ColumnCount)
        return {};
    const int row = index.row();
    const int column = index.column();
    const auto all = options();
    const auto& o = all[std::size_t(row)];
    const auto defaults = defaultHeatRecoveryOptions(m_flow);
    const auto& d = defaults[std::size_t(row)];
    const bool differs = column != OptionColumn && text(o, column) != text(d, column);
    switch (role) {
    case Qt::DisplayRole:
        return text(o, column);
    case Qt::EditRole: {
        if (column == FrostColumn) {
            const auto choices = frostChoices(row);
            for (std::size_t i = 0; i < choices.size(); ++i)
                if (o.spec && choices[i] == o.spec->frostStrategy)
                    return int(i);
            return 0;
        }
        const auto v = shown(o, column);
        // Full precision for the editor, so that an untouched cell reads back as it was.
        return v ? FieldQuantity::editText(*v) : QString();
    }
    case ChoicesRole: {
        if (column != FrostColumn)
            return {};
        QStringList labels;
        for (const FrostStrategy s : frostChoices(row))
            labels << frostLabel(s);
        return labels;
    }
    case KeyRole:
        return QString::fromStdString(o.key);
    case Qt::TextAlignmentRole:
        return column == OptionColumn || column == FrostColumn ? QVariant(int(Qt::AlignLeft | Qt::AlignVCenter))
                                                               : QVariant(int(Qt::AlignRight | Qt::AlignVCenter));
    case Qt::FontRole:
        if (differs) {
            QFont bold;
            bold.setBold(true);
            return bold;
        }
        return {};
    case Qt::ToolTipRole:
        if (differs)
            return tr("Changed; the default is %1").arg(text(d, column));
        if (column == HumidityEfficiencyColumn && !editable(row, column))
            return tr("Only hygroscopic and sorption wheels transfer moisture");
        return {};
    default:
        return {};
    }
}

QVariant HeatRecoveryOptionsModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal)
        return QAbstractTableModel::headerData(section, orientation, role);
    if (role == Qt::ToolTipRole) {
        switch (section) {
        case EfficiencyColumn:
            return tr("Dry temperature efficiency at balanced rated flow (EN 308), as on a datasheet");
        case HumidityEfficiencyColumn:
            return tr("Humidity efficiency at rated flow; hygroscopic and sorption wheels only");
        case DropSupplyColumn:
        case DropExtractColumn:
            return tr("Pressure drop at the rated flow (the unit's supply design flow)");
        case FrostColumn:
            return tr("How the exchanger is kept free of ice at low outdoor temperatures");
        case ExtraCostColumn:
            return tr("Cost of the unit with this heat recovery over the unit without, in the price currency");
        default:
            return {};
        }
    }
    if (role != Qt::DisplayRole)
        return {};
    const QString pressure = m_units->unit(Kind::Pressure);
    switch (section) {
    case OptionColumn:
        return tr("Heat recovery");
    case EfficiencyColumn:
        return tr("Dry temperature\nefficiency [%]");
    case HumidityEfficiencyColumn:
        return tr("Humidity\nefficiency [%]");
    case DropSupplyColumn:
        return tr("Rated Δp\nsupply [%1]").arg(pressure);
    case DropExtractColumn:
        return tr("Rated Δp\nextract [%1]").arg(pressure);
    case FrostColumn:
        return tr("Frost\nprotection");
    case ExtraCostColumn:
        return tr("Extra\ncost");
    default:
        return {};
    }
}

Qt::ItemFlags HeatRecoveryOptionsModel::flags(const QModelIndex& index) const
{
    if (!index.isValid() || index.row() >= rowCount())
        return Qt::NoItemFlags;
    Qt::ItemFlags f = Qt::ItemIsEnabled | Qt::ItemIsSelectable;
    if (editable(index.row(), index.column()))
        f |= Qt::ItemIsEditable;
    return f;
}

std::optional<HeatRecoveryInputs::OptionEdits>
HeatRecoveryOptionsModel::edited(int row, int column, const QVariant& typed, QString* problem) const
{
    const auto all = options();
    const auto& o = all[std::size_t(row)];
    const QString name = QString::fromStdString(o.name);
    auto fail = [problem, &name](const QString& why) -> std::optional<HeatRecoveryInputs::OptionEdits> {
        if (problem)
            *problem = tr("%1: %2").arg(name, why);
        return std::nullopt;
    };
    if (!editable(row, column))
        return fail(tr("this figure does not apply"));
    HeatRecoveryInputs::OptionEdits e = m_inputs.edits(o.key);
    if (column == FrostColumn) {
        const auto choices = frostChoices(row);
        bool ok = false;
        const int i = typed.toInt(&ok);
        if (!ok || i < 0 || i >= int(choices.size()))
            return fail(tr("no such frost protection"));
        e.frost = choices[std::size_t(i)];
    } else {
        const QString text = typed.toString();
        const auto value = FieldQuantity::parse(text);
        if (!value || !std::isfinite(*value))
            return fail(tr("\"%1\" is not a number").arg(text));
        switch (column) {
        case EfficiencyColumn:
            e.efficiency = percent(*value);
            break;
        case HumidityEfficiencyColumn:
            e.humidityEfficiency = percent(*value);
            break;
        case DropSupplyColumn:
            e.dropSupply = pascals(m_units->fromDisplay(Kind::Pressure, *value));
            break;
        case DropExtractColumn:
            e.dropExtract = pascals(m_units->fromDisplay(Kind::Pressure, *value));
            break;
        case ExtraCostColumn:
            if (*value < 0.0)
                return fail(tr("the extra cost cannot be negative"));
            e.extraCost = *value;
            break;
        default:
            return fail(tr("this figure does not apply"));
        }
    }
    HeatRecoveryOption trial = o;
    HeatRecoveryInputs::apply(trial, e);
    if (trial.spec) {
        try {
            trial.spec->validate();
        } catch (const Core::Error& error) {
            return fail(MessageUnits::toDisplay(QString::fromUtf8(error.what()), *m_units));
        }
    }
    return e;
}

QString HeatRecoveryOptionsModel::check(const QModelIndex& index, const QString& typed) const
{
    if (!index.isValid() || index.row() >= rowCount())
        return tr("no such cell");
    QString problem;
    edited(index.row(), index.column(), typed, &problem);
    return problem;
}

bool HeatRecoveryOptionsModel::setData(const QModelIndex& index, const QVariant& value, int role)
{
    if (role != Qt::EditRole || !index.isValid() || index.row() >= rowCount())
        return false;
    // The text as shown reads back to the stored value, not its rounding.
    if (index.column() != FrostColumn && value.toString() == data(index, Qt::EditRole).toString())
        return true;
    QString problem;
    const auto e = edited(index.row(), index.column(), value, &problem);
    if (!e) {
        emit problemFound(problem);
        return false;
    }
    const std::string key = data(index, KeyRole).toString().toStdString();
    const auto before = m_inputs;
    m_inputs.setEdits(key, *e, m_flow);
    if (m_inputs == before)
        return true;
    emit dataChanged(this->index(index.row(), 0), this->index(index.row(), ColumnCount - 1));
    emit inputsChanged();
    return true;
}

} // namespace Airwright::Ui
