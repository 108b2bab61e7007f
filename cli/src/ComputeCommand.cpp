#include "airwright/cli/ComputeCommand.h"

#include "airwright/cli/ArgumentList.h"
#include "airwright/cli/ComputeReport.h"
#include "airwright/cli/ExitCode.h"
#include "airwright/core/InputError.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/project/ProjectFile.h"

#include <algorithm>
#include <ostream>

namespace Airwright::Cli {

std::string ComputeCommand::summary() const
{
    return "compute every section of a project for its design cases";
}

std::string ComputeCommand::help() const
{
    return "usage: airwright-cli compute FILE [--case NAME] [--format json|text]\n"
           "\n"
           "Loads the project FILE, sizes the unit and computes both air paths for each\n"
           "design case: states, pressures, flows, duties and findings of every section.\n"
           "\n"
           "  --case NAME      only the design case called NAME\n"
           "  --format FORMAT  json (the documented contract, see docs/cli.md) or text\n"
           "                   (default)\n"
           "\n"
           "Exit codes: 0 computed (findings may include warnings), 2 invalid input,\n"
           "3 internal error.\n";
}

int ComputeCommand::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    ArgumentList list;
    list.addOption("case").addOption("format").allowPositionals(1);
    list.parse(args);
    if (list.positionals().size() != 1)
        throw Core::InputError("compute needs one project FILE (see 'airwright-cli compute --help')");
    const std::string format = list.value("format").value_or("text");
    if (format != "json" && format != "text")
        throw Core::InputError("--format must be json or text, not '" + format + "'");

    Core::Project::LoadReport report;
    auto project = Core::Project::ProjectFile::load(list.positionals().front(), report);
    for (const auto& warning : report.warnings)
        err << "warning: " << warning.path << ": " << warning.message << "\n";

    if (const auto wanted = list.value("case")) {
        auto& cases = project.unit.cases;
        const auto it = std::find_if(cases.begin(), cases.end(), [&](const auto& c) { return c.name == *wanted; });
        if (it == cases.end()) {
            std::string names;
            for (const auto& c : cases)
                names += (names.empty() ? "" : ", ") + c.name;
            throw Core::InputError("no design case called '" + *wanted + "' (the project has: " + names + ")");
        }
        const auto only = *it;
        cases = {only};
    }

    const auto result = Core::Chain::ChainSolver::solve(project.unit);
    if (format == "json")
        out << computeReportJson(project, result).dump(2) << "\n";
    else
        out << computeReportText(project, result);
    return Done;
}

} // namespace Airwright::Cli
