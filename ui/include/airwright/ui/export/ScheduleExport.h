#pragma once

#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/export/SchedulePdf.h"

#include <QString>

class QWidget;

namespace Airwright::Ui {

class ProjectDocument;

// File > Export Section Schedule: the same PDF and CSV the schedule command of
// airwright-cli writes, from the open document's current results.
class ScheduleExport {
public:
    enum class Format { PdfA4, PdfLetter, Csv };

    // Writes the schedule of the document's current results. Returns an empty
    // string when written, else the reason in plain words (nothing computed yet,
    // the file cannot be written, ...).
    // `comparison`, when given, is printed as a chapter of the PDF.
    static QString write(const ProjectDocument& document, const QString& file, Format format,
                         UnitSystem::System units, const Core::Annual::ComparisonResult* comparison = nullptr);

    // Asks for a file and format, writes, and reports a failure in a message box.
    // Returns the file written, or an empty string when cancelled or failed.
    static QString run(QWidget* parent, const ProjectDocument& document, UnitSystem::System units,
                       const Core::Annual::ComparisonResult* comparison = nullptr);
};

} // namespace Airwright::Ui
