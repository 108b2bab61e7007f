#include "PdfText.h"

#include <QProcess>
#include <QRegularExpression>
#include <QStandardPaths>

namespace Airwright::Ui::Test {

namespace {

QString run(const QString& program, const QStringList& args)
{
    QProcess process;
    process.start(program, args);
    if (!process.waitForFinished(60000) || process.exitStatus() != QProcess::NormalExit || process.exitCode() != 0)
        return {};
    return QString::fromUtf8(process.readAllStandardOutput());
}

} // namespace

bool PdfText::toolsAvailable()
{
    for (const char* tool : {"pdftotext", "pdfinfo", "pdfimages"})
        if (QStandardPaths::findExecutable(QString::fromLatin1(tool)).isEmpty())
            return false;
    return true;
}

QString PdfText::text(const QString& pdf, std::optional<int> page)
{
    QStringList args;
    if (page)
        args << QStringLiteral("-f") << QString::number(*page) << QStringLiteral("-l") << QString::number(*page);
    args << QStringLiteral("-enc") << QStringLiteral("UTF-8") << pdf << QStringLiteral("-");
    return run(QStringLiteral("pdftotext"), args);
}

int PdfText::pageCount(const QString& pdf)
{
    const auto match = QRegularExpression(QStringLiteral("^Pages:\\s+(\\d+)"), QRegularExpression::MultilineOption)
                           .match(run(QStringLiteral("pdfinfo"), {pdf}));
    return match.hasMatch() ? match.captured(1).toInt() : -1;
}

std::optional<std::pair<double, double>> PdfText::pageSizePoints(const QString& pdf)
{
    const auto match =
        QRegularExpression(QStringLiteral("^Page size:\\s+([0-9.]+) x ([0-9.]+) pts"), QRegularExpression::MultilineOption)
            .match(run(QStringLiteral("pdfinfo"), {pdf}));
    if (!match.hasMatch())
        return std::nullopt;
    return std::make_pair(match.captured(1).toDouble(), match.captured(2).toDouble());
}

int PdfText::imageCount(const QString& pdf)
{
    const QString list = run(QStringLiteral("pdfimages"), {QStringLiteral("-list"), pdf});
    // Two header lines, then one line per image.
    const auto lines = list.split(QLatin1Char('\n'), Qt::SkipEmptyParts);
    return lines.size() < 2 ? (list.isEmpty() ? -1 : 0) : static_cast<int>(lines.size()) - 2;
}

} // namespace Airwright::Ui::Test
