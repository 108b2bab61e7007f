#pragma once

#include "airwright/cli/Command.h"
#include "airwright/core/annual/ComparisonResult.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/core/project/Project.h"

#include <filesystem>
#include <optional>
#include <ostream>
#include <string>
#include <vector>

namespace Airwright::Cli {

// airwright-cli compare-hr FILE [--climate FILE.epw|BINS.csv] [--format json|csv|text] [options]
//
// The annual comparison of heat recovery options (docs/annual.md) for the unit
// of a project file: the six default options sized to the unit, simulated over
// the climate hour by hour (EPW) or by bins (CSV), appraised with the prices,
// emission factors, extra costs and schedule given as options.
class CompareHrCommand : public Command {
public:
    // Where the demo climate is looked for when --climate is not given, in order:
    // the source tree (compile definition AIRWRIGHT_SOURCE_DIR, when the library
    // is built with it), then next to the executable.
    static std::vector<std::filesystem::path> defaultClimateCandidates();
    // The climate file given, else the first candidate that exists; InputError
    // when there is none.
    static std::filesystem::path climatePath(const std::optional<std::string>& given,
                                             const std::vector<std::filesystem::path>& candidates);
    // Runs a comparison on an EPW file (hourly) or a bin table CSV (bins); the
    // warnings of the weather file go to err. Empty when stopped.
    static std::optional<Core::Annual::ComparisonResult> runOn(const Core::Annual::HeatRecoveryComparison& comparison,
                                                               const Core::Project::Project& project,
                                                               const std::filesystem::path& climateFile,
                                                               std::ostream& err);
    // The default options and settings (what compare-hr does without options).
    static Core::Annual::ComparisonResult compareWithDefaults(const Core::Project::Project& project,
                                                              const std::filesystem::path& climateFile,
                                                              std::ostream& err);

    CompareHrCommand() : m_climateCandidates(defaultClimateCandidates()) {}
    explicit CompareHrCommand(std::vector<std::filesystem::path> climateCandidates)
        : m_climateCandidates(std::move(climateCandidates))
    {
    }

    std::string name() const override { return "compare-hr"; }
    std::string summary() const override;
    std::string help() const override;
    int run(const std::vector<std::string>& args, std::ostream& out, std::ostream& err) override;

private:
    std::vector<std::filesystem::path> m_climateCandidates;
};

} // namespace Airwright::Cli
