#include "airwright/ui/views/MeasuringPointsModel.h"

#include "airwright/core/InputError.h"
#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MessageUnits.h"
#include "airwright/ui/views/TabSeparatedText.h"

#include <QStringList>

#include <variant>

namespace Airwright::Ui {

namespace {

using Core::Checks::PointQuantity;
using Kind = UnitSystem::Kind;

// The UnitSystem kind of a quantity: its SI unit is the point unit core gives
// (C, %, Pa, m3/h), so toPointUnit feeds it directly.
Kind kindOf(PointQuantity quantity)
{
    switch (quantity) {
    case PointQuantity::Temperature:
        return Kind::Temperature;
    case PointQuantity::RelativeHumidity:
        return Kind::Percent;
    case PointQuantity::DifferentialPressure:
        return Kind::Pressure;
    case PointQuantity::AirVolumeFlow:
        return Kind::AirVolumeFlow;
    }
    return Kind::Number;
}

Kind kindOf(const Core::Checks::PointValue& value)
{
    if (std::holds_alternative<Core::AbsoluteTemperature>(value))
        return Kind::Temperature;
    if (std::holds_alternative<Core::Ratio>(value))
        return Kind::Percent;
    if (std::holds_alternative<Core::Pressure>(value))
        return Kind::Pressure;
    return Kind::AirVolumeFlow;
}

const char* columnTitle(int column)
{
    switch (column) {
    case MeasuringPointsModel::TagColumn:
        return "Tag";
    case MeasuringPointsModel::PurposeColumn:
        return "Measures";
    case MeasuringPointsModel::PositionColumn:
        return "Position";
    case MeasuringPointsModel::QuantityColumn:
        return "Quantity";
    case MeasuringPointsModel::ExpectedColumn:
        return "Expected range";
    case MeasuringPointsModel::SetpointsColumn:
        return "Setpoints (basis)";
    case MeasuringPointsModel::TransmitterColumn:
        return "Transmitter span";
    case MeasuringPointsModel::NoteColumn:
        return "Note";
    default:
        return "";
    }
}

} // namespace

MeasuringPointsModel::MeasuringPointsModel(const UnitSystem* units, QObject* parent)
    : QAbstractTableModel(parent), m_units(units)
{
    connect(m_units, &UnitSystem::changed, this, &MeasuringPointsModel::unitsChanged);
}

void MeasuringPointsModel::rebuild(const Core::Project::Project& project,
                                   const std::optional<Core::Chain::UnitResult>& result, const QString& computeError)
{
    beginResetModel();
    m_points.clear();
    m_hasResult = result.has_value();
    m_siMessage = result ? QString() : computeError;
    if (result) {
        try {
            m_points = Core::Checks::measurementPoints(project.unit, *result);
        } catch (const Core::Error& e) {
            m_siMessage = QString::fromUtf8(e.what());
        }
    }
    endResetModel();
}

QString MeasuringPointsModel::message() const
{
    if (!m_points.empty())
        return {};
    const QString why = MessageUnits::toDisplay(m_siMessage, *m_units);
    if (m_hasResult)
        return why.isEmpty() ? tr("The design implies no measuring points")
                             : tr("The points could not be derived: %1").arg(why);
    return why.isEmpty() ? tr("No results yet") : tr("No results: %1").arg(why);
}

int MeasuringPointsModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : int(m_points.size());
}

int MeasuringPointsModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QString MeasuringPointsModel::value(const Core::Checks::PointValue& v, bool withUnit, int decimals) const
{
    const Kind kind = kindOf(v);
    // Humidity sensors hold a few percent at best: whole percent is honest.
    if (kind == Kind::Percent)
        decimals = 0;
    QString s = m_units->format(kind, Core::Checks::toPointUnit(v), decimals);
    const QString unit = m_units->unit(kind);
    if (!withUnit && !unit.isEmpty() && s.endsWith(QLatin1Char(' ') + unit))
        s.chop(unit.size() + 1);
    return s;
}

QString MeasuringPointsModel::range(const Core::Checks::PointValue& low, const Core::Checks::PointValue& high,
                                    int decimals) const
{
    return value(low, false, decimals) + QStringLiteral(" .. ") + value(high, true, decimals);
}

QString MeasuringPointsModel::setpointsText(const Core::Checks::MeasurementPoint& point,
                                            const QString& separator) const
{
    QStringList parts;
    for (const auto& s : point.setpoints) {
        // Labels and bases may carry SI figures ("at design flow 8000 m3/h").
        QString part = MessageUnits::toDisplay(QString::fromStdString(s.label), *m_units) + QStringLiteral(": ")
                       + value(s.value);
        if (!s.basis.empty())
            part += QStringLiteral(" (") + MessageUnits::toDisplay(QString::fromStdString(s.basis), *m_units)
                    + QLatin1Char(')');
        parts.push_back(part);
    }
    return parts.join(separator);
}

QString MeasuringPointsModel::transmitterText(const Core::Checks::MeasurementPoint& point) const
{
    if (!point.transmitter)
        return point.quantity == PointQuantity::AirVolumeFlow ? QStringLiteral("-")
                                                                : tr("beyond the standard spans");
    // Temperature spans are whole degrees (-58 .. 122 °F for -50 .. 50 °C).
    QString s = range(point.transmitter->low, point.transmitter->high,
                      point.quantity == PointQuantity::Temperature ? 0 : -1);
    // Transmitters are sold in metric spans; in IP the span ordered is shown too.
    if (m_units->system() == UnitSystem::System::IP
        && (point.quantity == PointQuantity::DifferentialPressure || point.quantity == PointQuantity::Temperature))
        s += QStringLiteral(" (%1 .. %2 %3)")
                 .arg(Core::Checks::toPointUnit(point.transmitter->low), 0, 'f', 0)
                 .arg(Core::Checks::toPointUnit(point.transmitter->high), 0, 'f', 0)
                 .arg(point.quantity == PointQuantity::Temperature ? QStringLiteral("°C") : QStringLiteral("Pa"));
    return s;
}

QString MeasuringPointsModel::text(const Core::Checks::MeasurementPoint& p, int column) const
{
    switch (column) {
    case TagColumn:
        return QString::fromStdString(p.tag);
    case PurposeColumn: {
        QString s = QString::fromUtf8(Core::Checks::pointPurposeLabel(p.purpose));
        if (p.kFactor)
            s += QStringLiteral(" (k = %1)").arg(*p.kFactor, 0, 'f', 0);
        return s;
    }
    case PositionColumn:
        return QString::fromStdString(Core::Checks::pointPosition(p));
    case QuantityColumn:
        return QString::fromUtf8(Core::Checks::pointQuantityKey(p.quantity)).replace(QLatin1Char('_'), QLatin1Char(' '))
               + QStringLiteral(" [") + m_units->unit(kindOf(p.quantity)) + QLatin1Char(']');
    case ExpectedColumn:
        return range(p.expectedLow, p.expectedHigh);
    case SetpointsColumn: {
        const QString s = setpointsText(p, QStringLiteral("; "));
        return s.isEmpty() ? QStringLiteral("-") : s;
    }
    case TransmitterColumn:
        return transmitterText(p);
    case NoteColumn:
        return MessageUnits::toDisplay(QString::fromStdString(p.note), *m_units);
    default:
        return {};
    }
}

QVariant MeasuringPointsModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() < 0 || index.row() >= int(m_points.size()))
        return {};
    const auto& p = m_points[std::size_t(index.row())];
    switch (role) {
    case Qt::DisplayRole:
        // A setpoint a line, so each reads with its basis (the copy joins them).
        if (index.column() == SetpointsColumn && !p.setpoints.empty())
            return setpointsText(p, QStringLiteral("\n"));
        return text(p, index.column());
    case Qt::ToolTipRole:
        if ((index.column() == NoteColumn || index.column() == PurposeColumn) && !p.note.empty())
            return text(p, NoteColumn);
        return {};
    case Qt::TextAlignmentRole:
        return QVariant::fromValue(Qt::AlignLeft | Qt::AlignTop);
    case SortRole:
        if (index.column() == ExpectedColumn)
            return m_units->toDisplay(kindOf(p.expectedLow), Core::Checks::toPointUnit(p.expectedLow));
        return text(p, index.column());
    case TagRole:
        return QString::fromStdString(p.tag);
    default:
        return {};
    }
}

QVariant MeasuringPointsModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole || section < 0 || section >= ColumnCount)
        return QAbstractTableModel::headerData(section, orientation, role);
    return QString::fromUtf8(columnTitle(section));
}

QString MeasuringPointsModel::toTsv(const QList<int>& rows) const
{
    QStringList header;
    for (int c = 0; c < ColumnCount; ++c)
        header.push_back(headerData(c, Qt::Horizontal).toString());
    return TabSeparatedText::write(header, int(m_points.size()), rows,
                                   [this](int r, int c) { return text(m_points[std::size_t(r)], c); });
}

void MeasuringPointsModel::unitsChanged()
{
    if (!m_points.empty())
        emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
}

} // namespace Airwright::Ui
