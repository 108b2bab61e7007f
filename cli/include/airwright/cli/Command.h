#pragma once

#include <iosfwd>
#include <string>
#include <vector>

namespace Airwright::Cli {

// One subcommand of airwright-cli. run() returns an ExitCode; it writes results to
// out and problems to err, one per line. Core errors may propagate: the
// application turns them into exit code 2 (InputError) or 3.
class Command {
public:
    virtual ~Command() = default;
    virtual std::string name() const = 0;
    virtual std::string summary() const = 0; // one line for the command list
    virtual std::string help() const = 0;    // full usage text for --help
    virtual int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) = 0;
};

} // namespace Airwright::Cli
