#pragma once
// The measuring and control points the design implies (Core::Checks::
// measurementPoints over the whole result) as a table: one row per point, values
// in the units of the UnitSystem. A row's quantity decides its unit, so the unit
// is written in each cell rather than in the header. Sort on SortRole (the
// expected range sorts on its low end, as a number).

#include "airwright/core/checks/MeasurementPoints.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/project/Project.h"

#include <QAbstractTableModel>
#include <QList>
#include <QString>

#include <optional>
#include <vector>

namespace Airwright::Ui {

class UnitSystem;

class MeasuringPointsModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column {
        // What a controls engineer reads first comes first: the tab is narrower
        // than the table.
        TagColumn,
        PurposeColumn,
        ExpectedColumn,
        SetpointsColumn,
        TransmitterColumn,
        QuantityColumn,
        PositionColumn,
        NoteColumn,
        ColumnCount
    };
    enum Role {
        SortRole = Qt::UserRole + 1, // double for the expected range, text otherwise
        TagRole,                     // QString
    };

    // units must outlive the model; the model follows its changes.
    explicit MeasuringPointsModel(const UnitSystem* units, QObject* parent = nullptr);

    // The points of the result. Without a result, `computeError` (SI, as the
    // document gives it) says why; a result the points cannot be derived from
    // leaves no rows and a message too.
    void rebuild(const Core::Project::Project& project, const std::optional<Core::Chain::UnitResult>& result,
                 const QString& computeError);

    // Why there are no rows, in the chosen units; empty when there are rows.
    QString message() const;

    const Core::Checks::MeasurementPoint& point(int row) const { return m_points.at(std::size_t(row)); }

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    // Tab-separated text for spreadsheets: a header row, then the given rows in
    // the given order (all rows when empty). Tabs and line breaks inside a cell
    // become spaces, several setpoints are joined with "; ".
    QString toTsv(const QList<int>& rows = {}) const;

private:
    QString text(const Core::Checks::MeasurementPoint& point, int column) const;
    // decimals -1: the UnitSystem's default for the quantity.
    QString value(const Core::Checks::PointValue& value, bool withUnit = true, int decimals = -1) const;
    QString range(const Core::Checks::PointValue& low, const Core::Checks::PointValue& high, int decimals = -1) const;
    QString setpointsText(const Core::Checks::MeasurementPoint& point, const QString& separator) const;
    QString transmitterText(const Core::Checks::MeasurementPoint& point) const;
    void unitsChanged();

    const UnitSystem* m_units;
    std::vector<Core::Checks::MeasurementPoint> m_points;
    bool m_hasResult = false;
    QString m_siMessage; // why there are no results / no points, as core or the document wrote it
};

} // namespace Airwright::Ui
