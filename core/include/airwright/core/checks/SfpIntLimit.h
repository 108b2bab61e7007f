#pragma once
// The maximum internal specific fan power a two-direction non-residential unit
// may have under Regulation (EU) No 1253/2014 (2018 tier), with the parts it is
// made of so a report can show the arithmetic: limit = base + E - F.

#include "airwright/core/Quantities.h"

namespace Airwright::Core::Checks {

struct SfpIntLimit {
    VolumeFlow nominalFlow;            // qnom
    bool runAround = false;            // run-around coils have their own figures
    Ratio thermalEfficiency;           // eta_t of the regulation; 0 without heat recovery
    bool mediumFilter = false;         // on the extract side (reference configuration)
    bool fineFilter = false;           // on the supply side
    SpecificFanPower base;             // the qnom-dependent term
    SpecificFanPower efficiencyBonus;  // E
    SpecificFanPower filterCorrection; // F
    SpecificFanPower limit;            // base + E - F
};

} // namespace Airwright::Core::Checks
