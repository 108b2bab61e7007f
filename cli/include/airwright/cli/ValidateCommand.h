#pragma once

#include "airwright/cli/Command.h"

namespace Airwright::Cli {

// "airwright-cli validate FILE": loads a project file with every check the
// program applies and reports the outcome. A valid file prints one line on
// stdout ("FILE: valid (N sections, M cases)") and its warnings on stderr; an
// invalid or unreadable one prints every problem on stderr, one per line, and
// exits with InvalidInput.
class ValidateCommand : public Command {
public:
    std::string name() const override;
    std::string summary() const override;
    std::string help() const override;
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) override;
};

} // namespace Airwright::Cli
