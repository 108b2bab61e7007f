#include "airwright/cli/CliApplication.h"

#include "airwright/cli/ExitCode.h"
#include "airwright/cli/CompareHrCommand.h"
#include "airwright/cli/ComputeCommand.h"
#include "airwright/cli/PointsCommand.h"
#include "airwright/cli/StateCommand.h"
#include "airwright/cli/ValidateCommand.h"
#include "airwright/core/InputError.h"

#include <exception>
#include <new>
#include <ostream>

namespace Airwright::Cli {

CliApplication::CliApplication()
{
    addCommand(std::make_unique<StateCommand>());
    addCommand(std::make_unique<ValidateCommand>());
    addCommand(std::make_unique<ComputeCommand>());
    addCommand(std::make_unique<PointsCommand>());
    addCommand(std::make_unique<CompareHrCommand>());
}

CliApplication::~CliApplication() = default;

void CliApplication::addCommand(std::unique_ptr<Command> command)
{
    m_commands.push_back(std::move(command));
}

std::string CliApplication::usage() const
{
    std::string text = "usage: airwright-cli COMMAND [OPTIONS]\n\ncommands:\n";
    for (const auto& command : m_commands)
        text += "  " + command->name() + std::string(command->name().size() < 12 ? 12 - command->name().size() : 1, ' ')
                + command->summary() + "\n";
    text += "\n'airwright-cli COMMAND --help' describes one command.\n";
    return text;
}

int CliApplication::run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err)
{
    if (args.empty()) {
        err << usage();
        return InvalidInput;
    }
    if (args.front() == "--help" || args.front() == "-h" || args.front() == "help") {
        out << usage();
        return Done;
    }
    for (const auto& command : m_commands) {
        if (command->name() != args.front())
            continue;
        const std::vector<std::string> rest(args.begin() + 1, args.end());
        for (const auto& arg : rest) {
            if (arg == "--help" || arg == "-h") {
                out << command->help();
                return Done;
            }
        }
        try {
            return command->run(rest, out, err);
        } catch (const Core::InputError& e) {
            err << "error: " << e.what() << "\n";
            return InvalidInput;
        } catch (const std::bad_alloc&) {
            err << "internal error: out of memory\n";
            return InternalError;
        } catch (const std::exception& e) {
            err << "internal error: " << e.what() << "\n";
            return InternalError;
        } catch (...) {
            err << "internal error: unknown exception\n";
            return InternalError;
        }
    }
    err << "error: unknown command '" << args.front() << "'\n" << usage();
    return InvalidInput;
}

} // namespace Airwright::Cli
