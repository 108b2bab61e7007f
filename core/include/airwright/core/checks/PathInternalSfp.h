#pragma once
// The internal specific fan power of one path, as Regulation (EU) No 1253/2014
// defines SFPint: the static pressure drop of the ventilation components of the
// reference configuration (heat recovery and filters, the filters clean) over the
// fan's static efficiency including motor and drive.
//
// Our fan results carry the overall efficiency (impeller total efficiency x
// motor x drive x speed controller), not a static one; it stands in for the
// regulation's efficiency. A total efficiency is higher than the static one of
// the same fan, so this SFPint is a little optimistic (docs/regulation.md).

#include "airwright/core/Quantities.h"
#include "airwright/core/chain/SectionResult.h"

#include <vector>

namespace Airwright::Core::Checks {

struct PathInternalSfp {
    Pressure recoveryDrop;   // heat recovery sections as given (assessUnit gives them at full core flow)
    Pressure filterDrop;     // filters clean (initial drop), at the case's flow
    Pressure internalDrop;   // recoveryDrop + filterDrop
    Ratio fanEfficiency;     // of the path's fans together
    SpecificFanPower sfpInt; // internalDrop / fanEfficiency
};

// From the section results of one path: heat recovery sections count with their
// pressureDrop as given (a case with the bypass open reports less than the
// reference configuration; assessUnit replaces it, see RecoveryReferenceDrop.h),
// filters with their initial drop. With several fans in series the path's
// efficiency is the one that gives their summed electric power:
// sum(dp_i) / sum(dp_i / eta_i) over their total pressures. Throws InputError
// when the path has no fan or a fan reports an efficiency outside (0, 1].
PathInternalSfp pathInternalSfp(const std::vector<Chain::SectionResult>& path);

} // namespace Airwright::Core::Checks
