#include "airwright/cli/ValidateCommand.h"

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"
#include "airwright/core/project/ProjectFileError.h"

#include <cstddef>
#include <ostream>
#include <variant>

namespace Airwright::Cli {

using namespace Airwright::Core;

namespace {

std::string counted(std::size_t n, const char* one, const char* many)
{
    return std::to_string(n) + " " + (n == 1 ? one : many);
}

// Physical sections: a coupled section's extract-path marker is the same section.
std::size_t sectionCount(const Chain::AirHandlingUnit& unit)
{
    std::size_t n = unit.supply.size();
    for (const auto& section : unit.extract)
        if (!std::holds_alternative<Chain::CoupledSide>(section.spec))
            ++n;
    return n;
}

} // namespace

std::string ValidateCommand::name() const
{
    return "validate";
}

std::string ValidateCommand::summary() const
{
    return "check a project file and list every problem in it";
}

std::string ValidateCommand::help() const
{
    return "usage: airwright-cli validate FILE\n"
           "\n"
           "Reads an Airwright project file (.awproj) with every check the program applies\n"
           "when it opens one: JSON syntax, format and version, required keys, JSON types,\n"
           "allowed ranges, unique section ids, coupled sections and their extract-path\n"
           "markers. A file that passes these is then computed for every design case, as\n"
           "compute would, to find what only a computed case shows (more air recirculated\n"
           "than the extract path brings at a case's airflow, a fan that would heat the air\n"
           "beyond 200 C): a file that validate accepts, compute computes. Every problem is\n"
           "reported, not only the first, as\n"
           "  FILE: PATH: MESSAGE\n"
           "where PATH is the place in the file, e.g. supply[3].final_dp_Pa.\n"
           "\n"
           "A valid file prints 'FILE: valid (N sections, M cases)' on stdout, where a\n"
           "coupled section counts once; keys the program does not know are ignored and\n"
           "listed on stderr as 'FILE: warning: PATH: unknown key, ignored'. A file in an\n"
           "older format version is read and reported as such; it is not rewritten.\n"
           "\n"
           "The format is described in docs/project-format.md and\n"
           "resources/schema/airwright-project.schema.json.\n"
           "\n"
           "example:\n"
           "  airwright-cli validate resources/demo/demo-library.awproj\n"
           "\n"
           "exit codes: 0 valid (warnings may be listed), 2 invalid or unreadable file or bad\n"
           "arguments, 3 internal error\n";
}

int ValidateCommand::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    ArgumentList list;
    list.allowPositionals(1);
    list.parse(args);
    if (list.positionals().empty())
        throw InputError("missing FILE: give the project file to check (airwright-cli validate FILE)");
    const std::string file = list.positionals().front();

    Project::LoadReport report;
    Project::Project project;
    try {
        project = Project::ProjectFile::load(file, report);
    } catch (const Project::ProjectFileError& e) {
        for (const auto& line : e.errors())
            err << line << "\n";
        return InvalidInput;
    }
    for (const auto& warning : report.warnings)
        err << file << ": warning: " << warning.text() << "\n";
    const auto problems = Chain::ChainSolver::check(project.unit);
    for (const auto& problem : problems)
        err << file << ": " << (problem.path.empty() ? "" : problem.path + ": ") << problem.message << "\n";
    if (!problems.empty())
        return InvalidInput;
    out << file << ": valid (" << counted(sectionCount(project.unit), "section", "sections") << ", "
        << counted(project.unit.cases.size(), "case", "cases") << ")\n";
    return Done;
}

} // namespace Airwright::Cli
