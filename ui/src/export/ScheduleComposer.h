#pragma once
// What the printed schedule says and in which order: lays every chapter out on
// a PdfPager. Private to SchedulePdf.

#include "airwright/core/annual/ComparisonResult.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/chain/SectionFigures.h"
#include "airwright/core/checks/MeasurementPoints.h"
#include "airwright/core/checks/UnitAssessment.h"
#include "airwright/core/project/Project.h"
#include "airwright/ui/export/PdfStyle.h"
#include "airwright/ui/export/ScheduleUnits.h"

#include <QColor>
#include <QString>
#include <QStringList>

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Ui {

class PdfPager;
class PdfTable;
class UnitSystem;

class ScheduleComposer {
public:
    ScheduleComposer(PdfPager& pager, const Core::Project::Project& project, const Core::Chain::UnitResult& result,
                     const UnitSystem& units, const Core::Annual::ComparisonResult* comparison = nullptr);

    void compose();

private:
    // One row of a table with a column per design case.
    struct CaseRow {
        QString label;
        QString unit;
        QStringList values; // one per case
    };

    void titleBlock();
    void siteAndAirflows();
    void designCases();
    void unitSummary();
    void pathSchedule(Core::Chain::PathKind path);
    void sectionBlock(Core::Chain::PathKind path, std::size_t index);
    void filterGroups();
    void fans();
    void heatRecovery();
    void comparison();
    void charts();
    void pointsSheet();
    void findings();
    void cautions();

    void heading(const QString& text);
    void subheading(const QString& text, double keepWithNextMm = 30.0);
    void paragraph(const QString& text, PdfStyle::Role role = PdfStyle::Body, const QColor& colour = {});
    void caseTable(const std::vector<CaseRow>& rows, bool keepTogether);
    // The case tables of `rows`, kCasesPerTable cases each.
    std::vector<PdfTable> caseTables(const std::vector<CaseRow>& rows) const;
    void keyValues(const std::vector<std::pair<QString, QString>>& rows);

    // Figures of a section result per case, in display units.
    std::vector<CaseRow> sectionRows(Core::Chain::PathKind path, const std::string& id) const;
    QString figureValue(const Core::Chain::Figure& figure) const;
    QString figureUnit(const Core::Chain::Figure& figure) const;
    QString pointValue(const Core::Checks::PointValue& value) const;

    const Core::Chain::SectionResult* resultOf(std::size_t caseIndex, Core::Chain::PathKind path,
                                               const std::string& id) const;
    const Core::Chain::Section* specOf(const std::string& id) const; // the supply side of a coupled section
    QString sectionNumber(Core::Chain::PathKind path, std::size_t index) const;
    QString typeLabel(Core::Chain::PathKind path, const Core::Chain::Section& section) const;
    const Core::Chain::DesignCase* designCase(const std::string& name) const;
    QString nextChapter(const QString& title);

    PdfPager& m_pager;
    const Core::Project::Project& m_project;
    const Core::Chain::UnitResult& m_result;
    const UnitSystem& m_units;
    const Core::Annual::ComparisonResult* m_comparison = nullptr;
    ScheduleUnits m_format;
    std::optional<Core::Checks::UnitAssessment> m_assessment;
    QString m_assessmentError;
    std::vector<Core::Checks::MeasurementPoint> m_points;
    QString m_pointsError;
    int m_chapter = 0;
};

} // namespace Airwright::Ui
