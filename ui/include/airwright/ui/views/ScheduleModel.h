#pragma once
// The section schedule of one design case as a table: one row per section per
// path (a coupled section has a row on each path), numbers in the units of the
// UnitSystem, the unit on the column header's second line. Sort on SortRole (numbers as numbers).

#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/chain/SectionFigures.h"
#include "airwright/core/project/Project.h"

#include <QAbstractTableModel>
#include <QList>
#include <QString>
#include <QStringList>

#include <optional>
#include <vector>

namespace Airwright::Ui {

class UnitSystem;

class ScheduleModel : public QAbstractTableModel {
    Q_OBJECT
public:
    enum Column {
        PathColumn,
        SectionColumn,
        TypeColumn,
        InletTemperatureColumn,
        OutletTemperatureColumn,
        OutletHumidityRatioColumn,
        OutletRelativeHumidityColumn,
        FaceVelocityColumn,
        PressureDropColumn,
        DutyColumn,
        FiguresColumn,
        ColumnCount
    };
    enum Role {
        SortRole = Qt::UserRole + 1, // double for number columns, text otherwise
        SectionIdRole,               // QString
        PathRole,                    // int: Core::Chain::PathKind
    };

    // units must outlive the model; the model follows its changes.
    explicit ScheduleModel(const UnitSystem* units, QObject* parent = nullptr);

    // Shows one case of the result (an index out of range, or no result: no rows).
    void rebuild(const Core::Project::Project& project, const std::optional<Core::Chain::UnitResult>& result,
                 int caseIndex);
    int caseIndex() const { return m_caseIndex; }
    const QStringList& caseNames() const { return m_caseNames; }

    int rowCount(const QModelIndex& parent = {}) const override;
    int columnCount(const QModelIndex& parent = {}) const override;
    QVariant data(const QModelIndex& index, int role = Qt::DisplayRole) const override;
    QVariant headerData(int section, Qt::Orientation orientation, int role = Qt::DisplayRole) const override;

    // Section id and path of a row.
    QString sectionId(int row) const;
    Core::Chain::PathKind path(int row) const;
    // The rows of a section (one per path it appears on).
    QList<int> rowsOf(const QString& sectionId) const;

    // Tab-separated text for spreadsheets: a header row with the units, then the
    // given rows in the given order (all rows when empty). Tabs and line breaks
    // inside a cell become spaces.
    QString toTsv(const QList<int>& rows = {}) const;

private:
    struct Row {
        Core::Chain::SectionResult result;
        QString typeLabel;
        std::vector<Core::Chain::Figure> figures;
    };

    QString text(const Row& row, int column) const;
    QVariant sortValue(const Row& row, int column) const;
    QString figuresText(const Row& row) const;
    QString numberText(Core::Chain::FigureKind kind, double si) const;
    void unitsChanged();

    const UnitSystem* m_units;
    int m_caseIndex = -1;
    QStringList m_caseNames;
    std::vector<Row> m_rows;
};

} // namespace Airwright::Ui
