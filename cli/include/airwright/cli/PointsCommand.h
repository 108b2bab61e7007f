#pragma once

#include "airwright/cli/Command.h"

namespace Airwright::Cli {

// "airwright-cli points FILE [--format json|csv|text]": the measuring and control
// points the design implies (Core::Checks::measurementPoints), with position,
// quantity, expected range over the design cases, setpoints and a suggested
// transmitter range. JSON and CSV carry numbers in C, %, Pa or m3/h (the "unit"
// field of each point), with round-trip precision.
class PointsCommand : public Command {
public:
    std::string name() const override { return "points"; }
    std::string summary() const override;
    std::string help() const override;
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) override;
};

} // namespace Airwright::Cli
