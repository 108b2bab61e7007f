#pragma once

#include "airwright/cli/Command.h"

#include <iosfwd>
#include <memory>
#include <string>
#include <vector>

namespace Airwright::Cli {

// Dispatches "airwright-cli COMMAND ARGS..." to its command and maps every
// exception to an exit code with one plain line on err: nothing escapes.
class CliApplication {
public:
    CliApplication();
    ~CliApplication();

    // args excludes the program name.
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err);

    void addCommand(std::unique_ptr<Command> command);

private:
    std::string usage() const;
    std::vector<std::unique_ptr<Command>> m_commands;
};

} // namespace Airwright::Cli
