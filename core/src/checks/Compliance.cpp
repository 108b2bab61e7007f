#include "airwright/core/checks/Compliance.h"

namespace Airwright::Core::Checks {

const char* complianceKey(Compliance compliance)
{
    switch (compliance) {
    case Compliance::Pass:
        return "pass";
    case Compliance::Fail:
        return "fail";
    case Compliance::NotAssessed:
        return "not_assessed";
    }
    return "not_assessed";
}

} // namespace Airwright::Core::Checks
