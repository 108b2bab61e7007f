#pragma once
// SFPint of a two-direction unit in one case: supply and extract summed, as
// Regulation (EU) No 1253/2014 sums them for two-direction units.

#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/checks/PathInternalSfp.h"

namespace Airwright::Core::Checks {

struct InternalSfp {
    PathInternalSfp supply;
    PathInternalSfp extract;
    SpecificFanPower total;
};

// Throws InputError when either path has no fan (see pathInternalSfp).
InternalSfp internalSfp(const Chain::CaseResult& result);

} // namespace Airwright::Core::Checks
