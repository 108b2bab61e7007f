#include "airwright/ui/CasesModel.h"

#include "airwright/ui/EditCasesCommand.h"
#include "airwright/ui/EditValidator.h"
#include "airwright/ui/FieldQuantity.h"
#include "airwright/ui/ProjectDocument.h"
#include "airwright/ui/UnitSystem.h"

#include <set>

namespace Airwright::Ui {

using namespace Airwright::Core;
using Kind = UnitSystem::Kind;

namespace {

const QStringList& filterConditions()
{
    static const QStringList names{QStringLiteral("clean (initial)"), QStringLiteral("design (mean)"),
                                   QStringLiteral("dirty (final)")};
    return names;
}

// The kind of a numeric column, for conversion and its unit.
std::optional<Kind> kindOf(int column)
{
    switch (column) {
    case CasesModel::OutdoorTemperature:
    case CasesModel::RoomTemperature:
    case CasesModel::SupplySetpoint:
        return Kind::Temperature;
    case CasesModel::OutdoorHumidity:
    case CasesModel::RoomHumidity:
    case CasesModel::MinimumHumidity:
    case CasesModel::MaximumHumidity:
    case CasesModel::Airflow:
        return Kind::Percent;
    default:
        return std::nullopt;
    }
}

// Numeric value of a column in its base unit (C or %); empty for an optional left out.
std::optional<double> numberOf(const Chain::DesignCase& c, int column)
{
    switch (column) {
    case CasesModel::OutdoorTemperature:
        return toCelsius(c.outdoorTemperature);
    case CasesModel::OutdoorHumidity:
        return toPercent(c.outdoorHumidity);
    case CasesModel::RoomTemperature:
        return toCelsius(c.roomTemperature);
    case CasesModel::RoomHumidity:
        return toPercent(c.roomHumidity);
    case CasesModel::SupplySetpoint:
        return toCelsius(c.supplySetpoint);
    case CasesModel::MinimumHumidity:
        return c.minimumSupplyHumidity ? std::optional<double>(toPercent(*c.minimumSupplyHumidity)) : std::nullopt;
    case CasesModel::MaximumHumidity:
        return c.maximumSupplyHumidity ? std::optional<double>(toPercent(*c.maximumSupplyHumidity)) : std::nullopt;
    case CasesModel::Airflow:
        return toPercent(c.airflowFraction);
    default:
        return std::nullopt;
    }
}

void setNumber(Chain::DesignCase& c, int column, std::optional<double> v)
{
    switch (column) {
    case CasesModel::OutdoorTemperature:
        c.outdoorTemperature = celsius(*v);
        break;
    case CasesModel::OutdoorHumidity:
        c.outdoorHumidity = percent(*v);
        break;
    case CasesModel::RoomTemperature:
        c.roomTemperature = celsius(*v);
        break;
    case CasesModel::RoomHumidity:
        c.roomHumidity = percent(*v);
        break;
    case CasesModel::SupplySetpoint:
        c.supplySetpoint = celsius(*v);
        break;
    case CasesModel::MinimumHumidity:
        c.minimumSupplyHumidity = v ? std::optional<Ratio>(percent(*v)) : std::nullopt;
        break;
    case CasesModel::MaximumHumidity:
        c.maximumSupplyHumidity = v ? std::optional<Ratio>(percent(*v)) : std::nullopt;
        break;
    case CasesModel::Airflow:
        c.airflowFraction = percent(*v);
        break;
    default:
        break;
    }
}

bool isOptional(int column)
{
    return column == CasesModel::MinimumHumidity || column == CasesModel::MaximumHumidity;
}

} // namespace

CasesModel::CasesModel(ProjectDocument* document, UnitSystem* units, QObject* parent)
    : QAbstractTableModel(parent), m_document(document), m_units(units)
{
    connect(m_document, &ProjectDocument::changed, this, [this](ProjectDocument::Change what) {
        if (what != ProjectDocument::Change::Cases && what != ProjectDocument::Change::Everything)
            return;
        // Same number of cases: refresh in place so the view keeps its current cell.
        if (what == ProjectDocument::Change::Cases && rowCount() == m_rows) {
            if (m_rows > 0)
                emit dataChanged(index(0, 0), index(m_rows - 1, ColumnCount - 1));
            return;
        }
        beginResetModel();
        m_rows = rowCount();
        endResetModel();
    });
    m_rows = rowCount();
    connect(m_units, &UnitSystem::changed, this, [this] {
        emit headerDataChanged(Qt::Horizontal, 0, ColumnCount - 1);
        if (rowCount() > 0)
            emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
    });
}

const std::vector<Chain::DesignCase>& CasesModel::cases() const
{
    return m_document->project().unit.cases;
}

int CasesModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : static_cast<int>(cases().size());
}

int CasesModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QVariant CasesModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() >= rowCount())
        return {};
    const auto& c = cases()[static_cast<std::size_t>(index.row())];
    const int column = index.column();
    if (column == Name) {
        if (role == Qt::DisplayRole || role == Qt::EditRole)
            return QString::fromStdString(c.name);
        return {};
    }
    if (column == Reheat) {
        if (role == Qt::CheckStateRole)
            return c.dehumidifyWithReheat ? Qt::Checked : Qt::Unchecked;
        return {};
    }
    if (column == FilterCondition) {
        if (role == Qt::DisplayRole)
            return filterConditions().value(static_cast<int>(c.filterCondition));
        if (role == Qt::EditRole)
            return static_cast<int>(c.filterCondition);
        if (role == ChoicesRole)
            return filterConditions();
        return {};
    }
    const auto kind = kindOf(column);
    if (!kind)
        return {};
    const auto value = numberOf(c, column);
    if (role == Qt::TextAlignmentRole)
        return QVariant(Qt::AlignRight | Qt::AlignVCenter);
    if (role == Qt::DisplayRole) {
        if (!value)
            return isOptional(column) ? tr("none") : QString();
        QString text = m_units->format(*kind, *value);
        const QString unit = m_units->unit(*kind);
        if (!unit.isEmpty() && text.endsWith(unit))
            text.chop(unit.size() + 1);
        return text;
    }
    if (role == Qt::EditRole)
        return value ? FieldQuantity::editText(m_units->toDisplay(*kind, *value)) : QString();
    return {};
}

QVariant CasesModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation == Qt::Vertical) {
        if (role == Qt::DisplayRole)
            return section + 1;
        return {};
    }
    const QString t = m_units->unit(Kind::Temperature);
    if (role == Qt::DisplayRole) {
        switch (section) {
        case Name:
            return tr("Case");
        case OutdoorTemperature:
            return tr("Outdoor\n%1").arg(t);
        case OutdoorHumidity:
            return tr("Outdoor\nRH %");
        case RoomTemperature:
            return tr("Room\n%1").arg(t);
        case RoomHumidity:
            return tr("Room\nRH %");
        case SupplySetpoint:
            return tr("Supply\nsetpoint %1").arg(t);
        case MinimumHumidity:
            return tr("Supply RH\nmin. %");
        case MaximumHumidity:
            return tr("Supply RH\nmax. %");
        case Reheat:
            return tr("Dehumidify\n+ reheat");
        case FilterCondition:
            return tr("Filters");
        case Airflow:
            return tr("Airflow\n% of design");
        default:
            return {};
        }
    }
    if (role == Qt::ToolTipRole) {
        switch (section) {
        case Name:
            return tr("Name of the case, unique in the project (winter design, summer design, part load, ...).");
        case OutdoorTemperature:
            return tr("Outdoor dry-bulb temperature of the case.");
        case OutdoorHumidity:
            return tr("Outdoor relative humidity of the case.");
        case RoomTemperature:
            return tr("Room (extract air) dry-bulb temperature.");
        case RoomHumidity:
            return tr("Room (extract air) relative humidity.");
        case SupplySetpoint:
            return tr("Supply air temperature the controls aim at.");
        case MinimumHumidity:
            return tr("Lowest supply relative humidity at the setpoint; a humidifier aims at it. Empty: none.");
        case MaximumHumidity:
            return tr("Highest supply relative humidity at the setpoint; a cooling coil dehumidifies to it when "
                      "reheat is allowed. Empty: none.");
        case Reheat:
            return tr("Cool below the setpoint to dehumidify, then reheat with a heating coil after the cooling "
                      "coil.");
        case FilterCondition:
            return tr("Filter pressure drop used: clean (initial), design (mean of initial and final, EN 13053) "
                      "or dirty (final).");
        case Airflow:
            return tr("Airflow of this case as a share of the design airflows, 5 .. 150 %.");
        default:
            return {};
        }
    }
    return {};
}

Qt::ItemFlags CasesModel::flags(const QModelIndex& index) const
{
    if (!index.isValid())
        return Qt::NoItemFlags;
    Qt::ItemFlags f = Qt::ItemIsEnabled | Qt::ItemIsSelectable;
    if (index.column() == Reheat)
        return f | Qt::ItemIsUserCheckable;
    return f | Qt::ItemIsEditable;
}

bool CasesModel::setData(const QModelIndex& index, const QVariant& value, int role)
{
    if (!index.isValid() || index.row() >= rowCount())
        return false;
    std::vector<Chain::DesignCase> edited = cases();
    auto& c = edited[static_cast<std::size_t>(index.row())];
    const QString caseName = QString::fromStdString(c.name);
    const int column = index.column();
    QString text = tr("edit case %1").arg(caseName);
    if (column == Reheat && role == Qt::CheckStateRole) {
        c.dehumidifyWithReheat = value.toInt() == Qt::Checked;
    } else if (role != Qt::EditRole) {
        return false;
    } else if (column == Name) {
        c.name = value.toString().trimmed().toStdString();
        text = tr("rename case %1").arg(caseName);
    } else if (column == FilterCondition) {
        const int choice = value.toInt();
        if (choice < 0 || choice > 2)
            return false;
        c.filterCondition = static_cast<Sections::FilterCondition>(choice);
    } else if (const auto kind = kindOf(column)) {
        const QString typed = value.toString();
        if (typed.trimmed().isEmpty() && isOptional(column)) {
            setNumber(c, column, std::nullopt);
        } else {
            const auto shown = FieldQuantity::parse(typed);
            if (!shown) {
                emit problemFound(tr("%1: \"%2\" is not a number.").arg(
                    headerData(column, Qt::Horizontal).toString().replace(QLatin1Char('\n'), QLatin1Char(' ')),
                    typed));
                return false;
            }
            // The text as shown reads back to the stored value, not its rounding.
            if (typed == data(index, Qt::EditRole).toString())
                return true;
            setNumber(c, column, m_units->fromDisplay(*kind, *shown));
        }
    } else {
        return false;
    }
    return commit(std::move(edited), text);
}

bool CasesModel::addCase(int copyOf)
{
    std::vector<Chain::DesignCase> edited = cases();
    Chain::DesignCase added = copyOf >= 0 && copyOf < static_cast<int>(edited.size())
                                  ? edited[static_cast<std::size_t>(copyOf)]
                                  : Chain::DesignCase{};
    std::set<std::string> names;
    for (const auto& c : edited)
        names.insert(c.name);
    const std::string base = added.name.empty() ? std::string("case") : added.name;
    std::string name = copyOf >= 0 ? base + " copy" : base + " " + std::to_string(edited.size() + 1);
    for (int n = 2; names.count(name); ++n)
        name = base + " " + std::to_string(n);
    added.name = name;
    edited.push_back(added);
    return commit(std::move(edited), tr("add case %1").arg(QString::fromStdString(name)));
}

bool CasesModel::removeCase(int row)
{
    std::vector<Chain::DesignCase> edited = cases();
    if (row < 0 || row >= static_cast<int>(edited.size()))
        return false;
    const QString name = QString::fromStdString(edited[static_cast<std::size_t>(row)].name);
    edited.erase(edited.begin() + row);
    return commit(std::move(edited), tr("remove case %1").arg(name));
}

bool CasesModel::commit(std::vector<Chain::DesignCase> cases, const QString& text)
{
    Project::Project candidate = m_document->project();
    candidate.unit.cases = cases;
    const QString problem = EditValidator::newProblem(m_document->project(), candidate);
    if (!problem.isEmpty()) {
        emit problemFound(problem);
        return false;
    }
    auto* command = new EditCasesCommand(m_document, std::move(cases));
    command->setText(text);
    m_document->undoStack()->push(command);
    emit problemFound({});
    return true;
}

} // namespace Airwright::Ui
