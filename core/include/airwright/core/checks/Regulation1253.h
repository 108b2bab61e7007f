#pragma once
// Commission Regulation (EU) No 1253/2014, non-residential two-direction units,
// requirements applying from 1 January 2018. Each figure, its Annex and whether
// it was read or is from memory: docs/regulation.md.

#include "airwright/core/Quantities.h"
#include "airwright/core/checks/SfpIntLimit.h"
#include "airwright/core/recovery/ExchangerKind.h"
#include "airwright/core/sections/Filter.h"

namespace Airwright::Core::Checks {

// The regulation's reference configuration has a fine filter on the supply
// (inlet) side and a medium filter on the extract side. It names them in EN 779
// terms (medium M5-M6, fine F7-F9); our filters carry ISO 16890 groups, mapped
// by common practice (docs/regulation.md).
enum class RegulationFilterGrade { None, Medium, Fine };
const char* regulationFilterGradeKey(RegulationFilterGrade grade); // "none", "medium", "fine"

// Fine: ISO ePM1, or ISO ePM2.5 at 65 % or more. Medium: ISO ePM2.5 below 65 %,
// or ISO ePM10. None: ISO Coarse, or an efficiency below the 50 % its group
// requires. Throws InputError for an efficiency outside 0 .. 100 %.
RegulationFilterGrade regulationFilterGrade(Sections::FilterGroup group, Ratio efficiency);
// A fine filter meets a requirement for a medium one.
bool meetsGrade(RegulationFilterGrade present, RegulationFilterGrade required);

bool isRunAround(Recovery::ExchangerKind kind);

// Minimum thermal efficiency of the heat recovery: 73 %, run-around coils 68 %.
Ratio minimumThermalEfficiency(bool runAround);

// E = (eta_t - minimum) x 3000 W/(m3/s) above the minimum, 0 at or below it.
// Throws InputError for an efficiency outside 0 .. 100 %.
SpecificFanPower efficiencyBonus(bool runAround, Ratio thermalEfficiency);

// F: 0 with both filters of the reference configuration, a fixed amount for each
// one missing.
SpecificFanPower filterCorrection(bool mediumFilterPresent, bool fineFilterPresent);

// The qnom-dependent term: 1100 - 300 qnom/2 below 2 m3/s, 800 from 2 m3/s on;
// run-around 1600 - 300 qnom/2 and 1300. Throws InputError for qnom <= 0 or
// non-finite.
SpecificFanPower sfpIntLimitBase(bool runAround, VolumeFlow nominalFlow);

// The full limit, base + E - F, with its parts.
SfpIntLimit sfpIntLimit(VolumeFlow nominalFlow, bool runAround, Ratio thermalEfficiency, bool mediumFilterPresent,
                        bool fineFilterPresent);

} // namespace Airwright::Core::Checks
