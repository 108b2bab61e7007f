#pragma once
// The pressure drop SFPint counts for a heat recovery side: all of the path's air
// through the exchanger core, as in the regulation's reference configuration.
// A case with the bypass open may report a lower drop (only the core flow
// charged), so the checks recompute the drop from the exchanger's rating with
// the law the recovery model uses (docs/regulation.md):
//   dp = dp_rated (m / (q_rated rho_ref))^x rho_ref / rho
// m the dry-air flow and rho the density at the side's inlet, rho_ref 1.2 kg/m3,
// x the kind's default pressure-drop exponent. With the bypass closed this is the
// case's own drop.

#include "airwright/core/Quantities.h"
#include "airwright/core/chain/SectionResult.h"
#include "airwright/core/recovery/HeatRecovery.h"

namespace Airwright::Core::Checks {

// ratedFlow: the spec's rated flow, or the flow the chain rated the exchanger at
// when the spec has none (the case's supply design flow). Throws InputError for a
// rated flow that is not positive or an inlet density that is not positive.
Pressure recoveryReferenceDrop(const Recovery::HeatRecovery& spec, VolumeFlow ratedFlow,
                               const Chain::SectionResult& side);

} // namespace Airwright::Core::Checks
