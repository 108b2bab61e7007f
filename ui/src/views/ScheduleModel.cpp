#include "airwright/ui/views/ScheduleModel.h"

#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/TabSeparatedText.h"

namespace Airwright::Ui {

namespace {

using Core::Chain::FigureKind;
using Core::Chain::PathKind;

QString typeLabelFor(const Core::Chain::AirHandlingUnit& unit, const Core::Chain::SectionResult& r)
{
    // The extract side of a coupled section is a marker; its type is that of the
    // supply side with the same id.
    const auto find = [&](const std::vector<Core::Chain::Section>& path) -> const Core::Chain::Section* {
        for (const auto& s : path)
            if (s.id == r.id && !std::holds_alternative<Core::Chain::CoupledSide>(s.spec))
                return &s;
        return nullptr;
    };
    const auto* s = find(r.path == PathKind::Supply ? unit.supply : unit.extract);
    if (!s)
        s = find(unit.supply);
    return s ? QString::fromUtf8(Core::Chain::sectionTypeLabel(s->spec)) : QString::fromStdString(r.typeKey);
}

struct ColumnInfo {
    const char* title;
    std::optional<FigureKind> kind; // unit shown in the header
};

ColumnInfo columnInfo(int column)
{
    switch (column) {
    case ScheduleModel::PathColumn:
        return {"Path", std::nullopt};
    case ScheduleModel::SectionColumn:
        return {"Section", std::nullopt};
    case ScheduleModel::TypeColumn:
        return {"Type", std::nullopt};
    case ScheduleModel::InletTemperatureColumn:
        return {"Inlet t", FigureKind::Temperature};
    case ScheduleModel::OutletTemperatureColumn:
        return {"Outlet t", FigureKind::Temperature};
    case ScheduleModel::OutletHumidityRatioColumn:
        return {"Outlet W", FigureKind::HumidityRatio};
    case ScheduleModel::OutletRelativeHumidityColumn:
        return {"Outlet RH", FigureKind::Percent};
    case ScheduleModel::FaceVelocityColumn:
        return {"Face velocity", FigureKind::Velocity};
    case ScheduleModel::PressureDropColumn:
        return {"Pressure drop", FigureKind::Pressure};
    case ScheduleModel::DutyColumn:
        return {"Duty", FigureKind::Power};
    case ScheduleModel::FiguresColumn:
        return {"Key figures", std::nullopt};
    default:
        return {"", std::nullopt};
    }
}

// The SI value of a number column, in the unit its FigureKind names.
std::optional<double> siValue(const Core::Chain::SectionResult& r, int column)
{
    switch (column) {
    case ScheduleModel::InletTemperatureColumn:
        return Core::toCelsius(r.inlet.state.dryBulb());
    case ScheduleModel::OutletTemperatureColumn:
        return Core::toCelsius(r.outlet.state.dryBulb());
    case ScheduleModel::OutletHumidityRatioColumn:
        return Core::toGramsPerKilogram(r.outlet.state.humidityRatio());
    case ScheduleModel::OutletRelativeHumidityColumn:
        return Core::toPercent(r.outlet.state.relativeHumidity());
    case ScheduleModel::FaceVelocityColumn:
        return Core::toMetresPerSecond(r.faceVelocity);
    case ScheduleModel::PressureDropColumn:
        return Core::toPascals(r.pressureDrop);
    case ScheduleModel::DutyColumn:
        return Core::toKilowatts(r.duty);
    default:
        return std::nullopt;
    }
}

} // namespace

ScheduleModel::ScheduleModel(const UnitSystem* units, QObject* parent) : QAbstractTableModel(parent), m_units(units)
{
    connect(m_units, &UnitSystem::changed, this, &ScheduleModel::unitsChanged);
}

void ScheduleModel::rebuild(const Core::Project::Project& project,
                            const std::optional<Core::Chain::UnitResult>& result, int caseIndex)
{
    beginResetModel();
    m_caseIndex = caseIndex;
    m_caseNames.clear();
    m_rows.clear();
    if (result) {
        for (const auto& c : result->cases)
            m_caseNames.push_back(QString::fromStdString(c.caseName));
        if (caseIndex >= 0 && caseIndex < int(result->cases.size())) {
            const auto& c = result->cases[std::size_t(caseIndex)];
            for (const auto* path : {&c.supply, &c.extract})
                for (const auto& r : *path)
                    m_rows.push_back({r, typeLabelFor(project.unit, r), Core::Chain::sectionFigures(r)});
        }
    }
    endResetModel();
}

int ScheduleModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : int(m_rows.size());
}

int ScheduleModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QString ScheduleModel::numberText(FigureKind kind, double si) const
{
    QString s = m_units->format(kind, si);
    const QString unit = m_units->unit(kind);
    if (!unit.isEmpty() && s.endsWith(QLatin1Char(' ') + unit))
        s.chop(unit.size() + 1);
    return s;
}

QString ScheduleModel::figuresText(const Row& row) const
{
    QStringList parts;
    for (const auto& f : row.figures) {
        const QString label = QString::fromStdString(f.label);
        if (f.kind == FigureKind::Text)
            parts.push_back(label + QLatin1Char(' ') + QString::fromStdString(f.text));
        else
            parts.push_back(label + QLatin1Char(' ') + m_units->format(f.kind, f.value));
    }
    return parts.join(QStringLiteral("; "));
}

QString ScheduleModel::text(const Row& row, int column) const
{
    const auto& r = row.result;
    switch (column) {
    case PathColumn:
        return QString::fromUtf8(Core::Chain::pathKey(r.path));
    case SectionColumn:
        return QString::fromStdString(r.id);
    case TypeColumn:
        return row.typeLabel;
    case FiguresColumn:
        return figuresText(row);
    default:
        break;
    }
    const auto v = siValue(r, column);
    const auto kind = columnInfo(column).kind;
    return v && kind ? numberText(*kind, *v) : QString();
}

QVariant ScheduleModel::sortValue(const Row& row, int column) const
{
    const auto v = siValue(row.result, column);
    const auto kind = columnInfo(column).kind;
    if (v && kind)
        return m_units->toDisplay(*kind, *v);
    return text(row, column);
}

QVariant ScheduleModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() < 0 || index.row() >= int(m_rows.size()))
        return {};
    const Row& row = m_rows[std::size_t(index.row())];
    switch (role) {
    case Qt::DisplayRole:
        return text(row, index.column());
    case Qt::ToolTipRole:
        if (index.column() == FiguresColumn) {
            QString tip = figuresText(row);
            tip.replace(QStringLiteral("; "), QStringLiteral("\n"));
            return tip;
        }
        return {};
    case Qt::TextAlignmentRole:
        if (columnInfo(index.column()).kind)
            return QVariant::fromValue(Qt::AlignRight | Qt::AlignVCenter);
        return QVariant::fromValue(Qt::AlignLeft | Qt::AlignVCenter);
    case SortRole:
        return sortValue(row, index.column());
    case SectionIdRole:
        return QString::fromStdString(row.result.id);
    case PathRole:
        return int(row.result.path);
    default:
        return {};
    }
}

QVariant ScheduleModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    // The key figures run long: their title stays at the start of the column,
    // in sight, instead of in its middle.
    if (orientation == Qt::Horizontal && role == Qt::TextAlignmentRole && section == FiguresColumn)
        return QVariant(int(Qt::AlignLeft | Qt::AlignVCenter));
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole || section < 0 || section >= ColumnCount)
        return QAbstractTableModel::headerData(section, orientation, role);
    const ColumnInfo info = columnInfo(section);
    const QString title = QString::fromUtf8(info.title);
    if (!info.kind)
        return title;
    // The unit on a second line keeps the number columns narrow (toTsv joins the
    // lines again).
    return QStringLiteral("%1\n[%2]").arg(title, m_units->unit(*info.kind));
}

QString ScheduleModel::sectionId(int row) const
{
    return row >= 0 && row < int(m_rows.size()) ? QString::fromStdString(m_rows[std::size_t(row)].result.id) : QString();
}

Core::Chain::PathKind ScheduleModel::path(int row) const
{
    return row >= 0 && row < int(m_rows.size()) ? m_rows[std::size_t(row)].result.path : PathKind::Supply;
}

QList<int> ScheduleModel::rowsOf(const QString& sectionId) const
{
    QList<int> rows;
    const std::string id = sectionId.toStdString();
    for (std::size_t i = 0; i < m_rows.size(); ++i)
        if (m_rows[i].result.id == id)
            rows.push_back(int(i));
    return rows;
}

QString ScheduleModel::toTsv(const QList<int>& rows) const
{
    QStringList header;
    for (int c = 0; c < ColumnCount; ++c)
        header.push_back(headerData(c, Qt::Horizontal).toString());
    return TabSeparatedText::write(header, int(m_rows.size()), rows,
                                   [this](int r, int c) { return text(m_rows[std::size_t(r)], c); });
}

void ScheduleModel::unitsChanged()
{
    emit headerDataChanged(Qt::Horizontal, 0, ColumnCount - 1);
    if (!m_rows.empty())
        emit dataChanged(index(0, 0), index(rowCount() - 1, ColumnCount - 1));
}

} // namespace Airwright::Ui
