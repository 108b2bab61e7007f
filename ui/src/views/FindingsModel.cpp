#include "airwright/ui/views/FindingsModel.h"

#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MessageUnits.h"

#include <QPainter>
#include <QPainterPath>
#include <QPixmap>

#include <algorithm>

namespace Airwright::Ui {

namespace {

int rank(Core::Severity s)
{
    switch (s) {
    case Core::Severity::Error:
        return 0;
    case Core::Severity::Warning:
        return 1;
    case Core::Severity::Info:
        return 2;
    }
    return 3;
}

QPixmap drawMarker(Core::Severity severity, int size)
{
    QPixmap pm(size, size);
    pm.fill(Qt::transparent);
    QPainter p(&pm);
    p.setRenderHint(QPainter::Antialiasing);
    const double s = size;
    const double m = s * 0.06;
    QColor fill;
    QColor mark(Qt::white);
    QPainterPath shape;
    switch (severity) {
    case Core::Severity::Error:
        fill = QColor(0xc8, 0x3a, 0x32);
        shape.addEllipse(QRectF(m, m, s - 2 * m, s - 2 * m));
        break;
    case Core::Severity::Warning:
        fill = QColor(0xe8, 0xa3, 0x1c);
        mark = QColor(0x30, 0x24, 0x08);
        shape.moveTo(s / 2, m);
        shape.lineTo(s - m, s - m);
        shape.lineTo(m, s - m);
        shape.closeSubpath();
        break;
    case Core::Severity::Info:
        fill = QColor(0x3a, 0x78, 0xc0);
        shape.addEllipse(QRectF(m, m, s - 2 * m, s - 2 * m));
        break;
    }
    p.setPen(QPen(fill.darker(130), s * 0.05));
    p.setBrush(fill);
    p.drawPath(shape);

    // The sign inside: a bar and a dot; the dot on top for a note (an "i").
    p.setPen(Qt::NoPen);
    p.setBrush(mark);
    const double w = s * 0.13;
    const bool note = severity == Core::Severity::Info;
    const double top = severity == Core::Severity::Warning ? s * 0.36 : s * 0.22;
    const double barTop = note ? s * 0.43 : top;
    const double barBottom = note ? s * 0.78 : s * 0.62;
    const double dotY = note ? s * 0.28 : s * 0.75;
    p.drawRoundedRect(QRectF(s / 2 - w / 2, barTop, w, barBottom - barTop), w / 2, w / 2);
    p.drawEllipse(QPointF(s / 2, dotY), w * 0.62, w * 0.62);
    return pm;
}

} // namespace

FindingsModel::FindingsModel(QObject* parent) : QAbstractTableModel(parent) {}

void FindingsModel::setUnits(const UnitSystem* units)
{
    if (m_units)
        disconnect(m_units, nullptr, this, nullptr);
    m_units = units;
    if (m_units)
        connect(m_units, &UnitSystem::changed, this, [this] {
            if (!m_rows.empty())
                emit dataChanged(index(0, MessageColumn), index(rowCount() - 1, MessageColumn));
        });
    if (!m_rows.empty())
        emit dataChanged(index(0, MessageColumn), index(rowCount() - 1, MessageColumn));
}

QString FindingsModel::message(const Row& row) const
{
    const QString text = QString::fromStdString(row.finding.message);
    return m_units ? MessageUnits::toDisplay(text, *m_units) : text;
}

QIcon FindingsModel::severityIcon(Core::Severity severity)
{
    QIcon icon;
    for (int size : {16, 24, 32})
        icon.addPixmap(drawMarker(severity, size));
    return icon;
}

QString FindingsModel::severityText(Core::Severity severity)
{
    switch (severity) {
    case Core::Severity::Error:
        return QStringLiteral("error");
    case Core::Severity::Warning:
        return QStringLiteral("warning");
    case Core::Severity::Info:
        return QStringLiteral("note");
    }
    return {};
}

void FindingsModel::rebuild(const std::optional<Core::Chain::UnitResult>& result)
{
    beginResetModel();
    m_rows.clear();
    if (result)
        for (const auto& c : result->cases)
            for (const auto& f : c.findings)
                m_rows.push_back({f, QString::fromStdString(c.caseName)});
    std::stable_sort(m_rows.begin(), m_rows.end(),
                     [](const Row& a, const Row& b) { return rank(a.finding.severity) < rank(b.finding.severity); });
    endResetModel();
}

int FindingsModel::rowCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : int(m_rows.size());
}

int FindingsModel::columnCount(const QModelIndex& parent) const
{
    return parent.isValid() ? 0 : ColumnCount;
}

QVariant FindingsModel::data(const QModelIndex& index, int role) const
{
    if (!index.isValid() || index.row() < 0 || index.row() >= int(m_rows.size()))
        return {};
    const Row& row = m_rows[std::size_t(index.row())];
    const auto& f = row.finding;
    switch (role) {
    case Qt::DisplayRole:
        switch (index.column()) {
        case SeverityColumn:
            return severityText(f.severity);
        case CaseColumn:
            return row.caseName;
        case SectionColumn:
            return f.sectionId.empty() ? QStringLiteral("(whole unit)") : QString::fromStdString(f.sectionId);
        case MessageColumn:
            return message(row);
        default:
            return {};
        }
    case Qt::DecorationRole:
        if (index.column() == SeverityColumn)
            return severityIcon(f.severity);
        return {};
    case Qt::ToolTipRole:
        if (index.column() == MessageColumn)
            return QStringLiteral("%1\n(%2)").arg(message(row), QString::fromStdString(f.code));
        return {};
    case SectionIdRole:
        return QString::fromStdString(f.sectionId);
    case SeverityRole:
        return int(f.severity);
    case CodeRole:
        return QString::fromStdString(f.code);
    default:
        return {};
    }
}

QVariant FindingsModel::headerData(int section, Qt::Orientation orientation, int role) const
{
    if (orientation != Qt::Horizontal || role != Qt::DisplayRole)
        return QAbstractTableModel::headerData(section, orientation, role);
    switch (section) {
    case SeverityColumn:
        return QStringLiteral("Severity");
    case CaseColumn:
        return QStringLiteral("Case");
    case SectionColumn:
        return QStringLiteral("Section");
    case MessageColumn:
        return QStringLiteral("Message");
    default:
        return {};
    }
}

} // namespace Airwright::Ui
