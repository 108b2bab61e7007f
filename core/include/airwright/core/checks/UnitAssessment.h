#pragma once
// Checks of a solved unit against the classes of EN 16798-3 and EN 13053 and the
// requirements of Regulation (EU) No 1253/2014 for two-direction non-residential
// units (2018 tier). Pure: reads the unit and its results, changes nothing.

#include "airwright/core/Finding.h"
#include "airwright/core/Quantities.h"
#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/CaseResult.h"
#include "airwright/core/checks/CaseAssessment.h"
#include "airwright/core/checks/Compliance.h"
#include "airwright/core/recovery/ExchangerKind.h"

#include <optional>
#include <vector>

namespace Airwright::Core::Checks {

struct UnitAssessment {
    VolumeFlow nominalFlow;    // qnom: the larger design flow, as entered
    Velocity faceVelocity;     // qnom over the unit's inner cross-section
    int velocityClass = 1;     // EN 13053, of faceVelocity
    bool twoDirection = false; // a fan in each path
    std::optional<Recovery::ExchangerKind> recoveryKind;
    // Fail if any full-flow case fails; Pass if at least one was assessed and
    // all passed; NotAssessed otherwise.
    Compliance compliance = Compliance::NotAssessed;
    std::vector<CaseAssessment> cases; // in the order of the result's cases
    std::vector<Finding> findings;     // about the unit as a whole
};

// Only cases at 100 % airflow are held against the regulation, which states its
// limits at nominal flow; other cases get their figures and NotAssessed. Each
// result case is matched to the unit's design case of the same name. SFPint
// counts each heat recovery side with its drop at full core flow, from the
// exchanger's rating (RecoveryReferenceDrop.h), so an open bypass does not lower
// it; method and sources: docs/regulation.md. Throws
// InputError for a result case with no such design case, a cross-section or
// design flow that is not positive, or results without the data a check needs
// (no fan detail on a path, no heat recovery detail for the unit's exchanger).
UnitAssessment assessUnit(const Chain::AirHandlingUnit& unit, const Chain::UnitResult& result);

} // namespace Airwright::Core::Checks
