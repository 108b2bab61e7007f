#include "airwright/ui/export/ScheduleCommand.h"

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/CompareHrCommand.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/cli/ScheduleCsv.h"
#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"
#include "airwright/ui/export/SchedulePdf.h"

#include <QDir>
#include <QFile>
#include <QGuiApplication>
#include <QTemporaryDir>

#include <algorithm>
#include <cctype>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <memory>
#include <ostream>

namespace Airwright::Ui {

namespace {

std::string lowerExtension(const std::string& file)
{
    std::string ext = std::filesystem::path(file).extension().string();
    std::transform(ext.begin(), ext.end(), ext.begin(), [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return ext;
}

// A command-line run has no QGuiApplication: make one for the PDF's fonts, on
// the offscreen platform unless the caller chose another. Without a session
// (a build machine, a cron job) XDG_RUNTIME_DIR is unset and Qt would warn about
// it on stderr; the run then gets a private one of its own, removed at the end.
class GuiForRun {
public:
    GuiForRun()
    {
        if (QCoreApplication::instance() != nullptr)
            return;
        if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
            qputenv("QT_QPA_PLATFORM", "offscreen");
        if (qEnvironmentVariableIsEmpty("XDG_RUNTIME_DIR")) {
            m_runtime = std::make_unique<QTemporaryDir>(QDir::tempPath() + "/airwright-runtime-XXXXXX");
            if (m_runtime->isValid()) {
                QFile::setPermissions(m_runtime->path(), QFileDevice::ReadOwner | QFileDevice::WriteOwner
                                                             | QFileDevice::ExeOwner);
                qputenv("XDG_RUNTIME_DIR", QFile::encodeName(m_runtime->path()));
            }
        }
        m_app = std::make_unique<QGuiApplication>(m_argc, m_argv);
    }

private:
    std::unique_ptr<QTemporaryDir> m_runtime;
    int m_argc = 1;
    char m_name[16] = "airwright-cli";
    char* m_argv[2] = {m_name, nullptr};
    std::unique_ptr<QGuiApplication> m_app;
};

} // namespace

std::string ScheduleCommand::summary() const
{
    return "write the section schedule of a project as PDF or CSV";
}

std::string ScheduleCommand::help() const
{
    return "usage: airwright-cli schedule FILE -o OUT.pdf|OUT.csv [--paper A4|Letter] [--units SI|IP]\n"
           "                              [--compare-hr [--climate FILE.epw|BINS.csv]]\n"
           "\n"
           "Loads the project FILE, computes every design case and writes the section\n"
           "schedule. The extension of OUT chooses the format:\n"
           "  .pdf  the printed schedule: project, conditions, unit summary and classes,\n"
           "        both paths section by section, filters, fans, heat recovery and frost,\n"
           "        psychrometric chart, pressure profiles, measuring points, findings and\n"
           "        cautions; vector pages with selectable text\n"
           "  .csv  one row per section per case, SI units in the column names (RFC 4180)\n"
           "\n"
           "  -o, --output OUT   the file to write (replaced if it exists)\n"
           "  --paper PAPER      A4 (default) or Letter; PDF only\n"
           "  --units UNITS      SI (default) or IP; PDF only (CSV is always SI)\n"
           "  --compare-hr       add a chapter comparing heat recovery options over a year\n"
           "                     (the defaults of 'airwright-cli compare-hr'); PDF only\n"
           "  --climate FILE     its climate: EPW or bin table CSV (default: the demo climate)\n"
           "\n"
           "Exit codes: 0 written, 2 invalid input, 3 internal error.\n";
}

int ScheduleCommand::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    // "-o" is the short form of --output.
    std::vector<std::string> normalized;
    for (const auto& a : args)
        normalized.push_back(a == "-o" ? std::string("--output") : a);
    Cli::ArgumentList list;
    list.addOption("output").addOption("paper").addOption("units").addFlag("compare-hr").addOption("climate");
    list.allowPositionals(1);
    list.parse(normalized);
    if (list.positionals().size() != 1)
        throw Core::InputError("schedule needs one project FILE (see 'airwright-cli schedule --help')");
    const auto output = list.value("output");
    if (!output || output->empty())
        throw Core::InputError("schedule needs -o OUT.pdf or -o OUT.csv");
    const std::string ext = lowerExtension(*output);
    if (ext != ".pdf" && ext != ".csv")
        throw Core::InputError("-o must name a .pdf or .csv file, not '" + *output + "'");

    SchedulePdf::Options options;
    if (const auto paper = list.value("paper")) {
        const auto parsed = SchedulePdf::paperFromName(*paper);
        if (!parsed)
            throw Core::InputError("--paper must be A4 or Letter, not '" + *paper + "'");
        options.paper = *parsed;
    }
    if (const auto units = list.value("units")) {
        std::string u = *units;
        std::transform(u.begin(), u.end(), u.begin(), [](unsigned char c) { return static_cast<char>(std::toupper(c)); });
        if (u != "SI" && u != "IP")
            throw Core::InputError("--units must be SI or IP, not '" + *units + "'");
        options.units = u == "IP" ? UnitSystem::System::IP : UnitSystem::System::SI;
    }
    if (list.has("climate") && !list.has("compare-hr"))
        throw Core::InputError("--climate goes with --compare-hr");
    if (ext == ".csv" && list.has("compare-hr"))
        throw Core::InputError("--compare-hr adds a chapter to the PDF schedule; for its figures as CSV use "
                         "'airwright-cli compare-hr FILE --format csv'");
    if (ext == ".csv" && (list.has("paper") || options.units == UnitSystem::System::IP))
        throw Core::InputError("--paper and --units IP apply to the PDF schedule; the CSV is written in SI with the "
                               "units in its column names");

    Core::Project::LoadReport report;
    const auto project = Core::Project::ProjectFile::load(list.positionals().front(), report);
    for (const auto& warning : report.warnings)
        err << "warning: " << warning.path << ": " << warning.message << "\n";
    const auto result = Core::Chain::ChainSolver::solve(project.unit);

    if (ext == ".csv") {
        const std::string text = Cli::ScheduleCsv::write(result);
        std::ofstream file(*output, std::ios::binary | std::ios::trunc);
        if (!file)
            throw Core::InputError("cannot write '" + *output + "'");
        file << text;
        file.close();
        if (!file)
            throw Core::InputError("cannot write '" + *output + "'");
        out << *output << ": " << result.cases.size() << " cases, CSV schedule written\n";
        return Cli::Done;
    }

    if (list.has("compare-hr"))
        options.comparison = Cli::CompareHrCommand::compareWithDefaults(
            project, Cli::CompareHrCommand::climatePath(list.value("climate"),
                                                        Cli::CompareHrCommand::defaultClimateCandidates()),
            err);

    GuiForRun gui;
    const auto outcome = SchedulePdf::write(QString::fromStdString(*output), project, result, options);
    out << *output << ": " << outcome.pages << " pages, " << SchedulePdf::paperName(options.paper) << ", "
        << (options.units == UnitSystem::System::IP ? "IP" : "SI") << "\n";
    return Cli::Done;
}

} // namespace Airwright::Ui
