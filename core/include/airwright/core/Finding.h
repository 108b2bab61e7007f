#pragma once
// A finding: something the designer must know about a result. Findings are data,
// not exceptions: an unmet setpoint or a frost risk is reported, never thrown.

#include <string>

namespace Airwright::Core {

enum class Severity { Info, Warning, Error };

struct Finding {
    Severity severity = Severity::Info;
    std::string code;      // stable, ours: "coil.capacity", "frost.unprotected", ...
    std::string sectionId; // empty when it concerns the whole unit
    std::string message;   // plain words, numbers with units

    bool operator==(const Finding&) const = default;
};

const char* severityName(Severity severity); // "info", "warning", "error"

} // namespace Airwright::Core
