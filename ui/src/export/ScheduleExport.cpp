#include "airwright/ui/export/ScheduleExport.h"

#include "airwright/cli/ScheduleCsv.h"
#include "airwright/ui/ProjectDocument.h"

#include <QFile>
#include <QFileDialog>
#include <QFileInfo>
#include <QMessageBox>
#include <QSaveFile>

#include <exception>
#include <string>

namespace Airwright::Ui {

QString ScheduleExport::write(const ProjectDocument& document, const QString& file, Format format,
                              UnitSystem::System units, const Core::Annual::ComparisonResult* comparison)
{
    const auto& result = document.result();
    if (!result) {
        const QString why = document.computeError();
        return why.isEmpty() ? QObject::tr("The project has no results to export yet.")
                             : QObject::tr("The project has no results to export: %1").arg(why);
    }
    try {
        if (format == Format::Csv) {
            const std::string text = Cli::ScheduleCsv::write(*result);
            QSaveFile out(file);
            if (!out.open(QIODevice::WriteOnly)
                || out.write(text.data(), static_cast<qint64>(text.size())) != static_cast<qint64>(text.size())
                || !out.commit())
                return QObject::tr("Cannot write %1: %2").arg(file, out.errorString());
            return {};
        }
        SchedulePdf::Options options;
        options.paper = format == Format::PdfLetter ? SchedulePdf::Paper::Letter : SchedulePdf::Paper::A4;
        options.units = units;
        if (comparison)
            options.comparison = *comparison;
        SchedulePdf::write(file, document.project(), *result, options);
        if (!QFileInfo(file).isFile())
            return QObject::tr("Cannot write %1.").arg(file);
        return {};
    } catch (const std::exception& e) {
        return QObject::tr("The schedule could not be written: %1").arg(QString::fromUtf8(e.what()));
    }
}

QString ScheduleExport::run(QWidget* parent, const ProjectDocument& document, UnitSystem::System units,
                           const Core::Annual::ComparisonResult* comparison)
{
    const QString pdfA4 = QObject::tr("PDF schedule, A4 paper (*.pdf)");
    const QString pdfLetter = QObject::tr("PDF schedule, Letter paper (*.pdf)");
    const QString csv = QObject::tr("CSV schedule, one row per section and case, SI (*.csv)");
    QString base = document.filePath().isEmpty() ? QObject::tr("schedule")
                                                 : QFileInfo(document.filePath()).completeBaseName() + QObject::tr("-schedule");
    if (!document.filePath().isEmpty())
        base = QFileInfo(document.filePath()).absoluteDir().filePath(base);
    QString chosenFilter = pdfA4;
    QString file = QFileDialog::getSaveFileName(parent, QObject::tr("Export Section Schedule"), base + QStringLiteral(".pdf"),
                                                pdfA4 + QStringLiteral(";;") + pdfLetter + QStringLiteral(";;") + csv,
                                                &chosenFilter);
    if (file.isEmpty())
        return {};
    const Format format = chosenFilter == csv ? Format::Csv : chosenFilter == pdfLetter ? Format::PdfLetter : Format::PdfA4;
    const QString suffix = format == Format::Csv ? QStringLiteral(".csv") : QStringLiteral(".pdf");
    if (!file.endsWith(suffix, Qt::CaseInsensitive))
        file += suffix;
    const QString error = write(document, file, format, units, comparison);
    if (!error.isEmpty()) {
        QMessageBox::warning(parent, QObject::tr("Export Section Schedule"), error);
        return {};
    }
    return file;
}

} // namespace Airwright::Ui
