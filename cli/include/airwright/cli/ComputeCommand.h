#pragma once

#include "airwright/cli/Command.h"

namespace Airwright::Cli {

// airwright-cli compute FILE [--case NAME] [--format json|text]
class ComputeCommand : public Command {
public:
    std::string name() const override { return "compute"; }
    std::string summary() const override;
    std::string help() const override;
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) override;
};

} // namespace Airwright::Cli
