#pragma once
// What the checks say about one design case of a solved unit.

#include "airwright/core/Finding.h"
#include "airwright/core/Quantities.h"
#include "airwright/core/checks/Compliance.h"
#include "airwright/core/checks/InternalSfp.h"
#include "airwright/core/checks/SfpIntLimit.h"

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Core::Checks {

struct CaseAssessment {
    std::string caseName;
    SpecificFanPower specificFanPower; // the case totals: both fans over the larger flow
    int sfpCategory = 0;               // EN 16798-3
    // Largest section face velocity of either path, scaled to full flow by the
    // case's airflow fraction, and its EN 13053 class.
    Velocity faceVelocity;
    int velocityClass = 1;
    std::optional<InternalSfp> sfpInt;               // two-direction units only
    std::optional<SfpIntLimit> sfpIntLimit;          // two-direction units only
    Compliance compliance = Compliance::NotAssessed; // Regulation (EU) No 1253/2014
    std::vector<Finding> findings;
};

} // namespace Airwright::Core::Checks
