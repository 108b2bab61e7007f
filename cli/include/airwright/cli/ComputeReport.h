#pragma once
// The computed unit as the command line shows it: JSON with the documented
// contract (docs/cli.md) or readable text.

#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/project/Project.h"

#include <nlohmann/json.hpp>

#include <optional>
#include <string>

namespace Airwright::Cli {

nlohmann::json computeReportJson(const Core::Project::Project& project, const Core::Chain::UnitResult& result);
std::string computeReportText(const Core::Project::Project& project, const Core::Chain::UnitResult& result);

// JSON of one moist-air state with its static pressure relative to ambient.
nlohmann::json stateJson(const Core::Sections::AirStream& air, Core::Pressure staticPressure);

} // namespace Airwright::Cli
