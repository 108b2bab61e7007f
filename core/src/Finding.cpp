#include "airwright/core/Finding.h"

namespace Airwright::Core {

const char* severityName(Severity severity)
{
    switch (severity) {
    case Severity::Info:
        return "info";
    case Severity::Warning:
        return "warning";
    case Severity::Error:
        return "error";
    }
    return "info";
}

} // namespace Airwright::Core
