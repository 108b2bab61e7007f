#include "airwright/ui/export/SchedulePdf.h"

#include "ScheduleComposer.h"
#include "airwright/core/InputError.h"
#include "airwright/ui/export/PdfPager.h"

#include <QFile>
#include <QGuiApplication>
#include <QMarginsF>
#include <QPageLayout>
#include <QPageSize>
#include <QPainter>
#include <QPdfWriter>

#include <algorithm>
#include <cctype>
#include <string>

#ifndef AIRWRIGHT_VERSION
#define AIRWRIGHT_VERSION "dev"
#endif

namespace Airwright::Ui {

namespace {

// Device resolution of the PDF: fine enough that coordinates rounded to device
// units do not show, the page content is vector either way.
constexpr int kResolution = 1200;
constexpr double kMarginMm = 14.0;

QString headerText(const Core::Project::Project& project)
{
    QString text = QString::fromStdString(project.info.name.empty() ? std::string("(unnamed project)") : project.info.name);
    if (!project.info.reference.empty())
        text += QStringLiteral("  |  ") + QString::fromStdString(project.info.reference);
    if (!project.info.revision.empty())
        text += QStringLiteral("  |  rev. ") + QString::fromStdString(project.info.revision);
    return text;
}

} // namespace

std::optional<SchedulePdf::Paper> SchedulePdf::paperFromName(std::string_view name)
{
    std::string lower(name);
    std::transform(lower.begin(), lower.end(), lower.begin(), [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    if (lower == "a4")
        return Paper::A4;
    if (lower == "letter")
        return Paper::Letter;
    return std::nullopt;
}

const char* SchedulePdf::paperName(Paper paper)
{
    return paper == Paper::A4 ? "A4" : "Letter";
}

SchedulePdf::Outcome SchedulePdf::write(const QString& file, const Core::Project::Project& project,
                                        const Core::Chain::UnitResult& result, const Options& options)
{
    if (qobject_cast<QGuiApplication*>(QCoreApplication::instance()) == nullptr)
        throw Core::Error("the PDF schedule needs a QGuiApplication for its fonts");
    // QPdfWriter reports nothing when it cannot open its file: check first.
    {
        QFile probe(file);
        if (!probe.open(QIODevice::WriteOnly | QIODevice::Truncate))
            throw Core::InputError("cannot write '" + file.toStdString() + "': " + probe.errorString().toStdString());
    }

    QPdfWriter writer(file);
    writer.setResolution(kResolution);
    writer.setCreator(QStringLiteral("Airwright " AIRWRIGHT_VERSION));
    writer.setTitle(headerText(project) + QStringLiteral(": section schedule"));
    const QPageSize size(options.paper == Paper::A4 ? QPageSize::A4 : QPageSize::Letter);
    writer.setPageLayout(QPageLayout(size, QPageLayout::Portrait,
                                     QMarginsF(kMarginMm, kMarginMm, kMarginMm, kMarginMm), QPageLayout::Millimeter));

    UnitSystem units;
    units.setSystem(options.units);
    units.setAirflowInLitresPerSecond(options.units == UnitSystem::System::SI && options.airflowInLitresPerSecond);

    const QRectF page = writer.pageLayout().paintRectPixels(kResolution).toRectF().translated(
        -writer.pageLayout().paintRectPixels(kResolution).topLeft().toPointF());
    PdfPager pager(writer, kResolution, page);
    ScheduleComposer(pager, project, result, units, options.comparison ? &*options.comparison : nullptr).compose();

    QPainter painter;
    if (!painter.begin(&writer))
        throw Core::Error("cannot start the PDF '" + file.toStdString() + "'");
    pager.paint(painter, headerText(project), QStringLiteral("Section schedule"),
                QStringLiteral("Airwright " AIRWRIGHT_VERSION " | a design aid: confirm with the chosen manufacturer's "
                               "certified data"),
                [&writer]() { writer.newPage(); });
    painter.end();
    return {pager.pageCount()};
}

} // namespace Airwright::Ui
