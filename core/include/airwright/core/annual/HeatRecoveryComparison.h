#pragma once
// Compares heat recovery options on one unit over a year: each option is put
// into the unit in place of its heat recovery section (same casing sizing, same
// fans, rated at the unit's supply flow), simulated with AnnualSimulation, and
// appraised and ranked with OptionRanking. The option without heat recovery is
// the baseline for every saving; the comparison needs it among the options.

#include "airwright/core/annual/BinTable.h"
#include "airwright/core/annual/ComparisonResult.h"
#include "airwright/core/annual/ComparisonSettings.h"
#include "airwright/core/annual/HeatRecoveryOption.h"
#include "airwright/core/annual/RunControl.h"
#include "airwright/core/annual/WeatherYear.h"
#include "airwright/core/chain/AirHandlingUnit.h"

#include <optional>
#include <vector>

namespace Airwright::Core::Annual {

class HeatRecoveryComparison {
public:
    // Validates the unit, the options (unique non-empty keys, one without heat
    // recovery, extra costs >= 0, specs in range) and the settings.
    HeatRecoveryComparison(Chain::AirHandlingUnit unit, std::vector<HeatRecoveryOption> options,
                           ComparisonSettings settings);

    // Empty when control.stop was requested before the end. Progress runs over
    // every simulation, the sensitivity runs included.
    std::optional<ComparisonResult> run(const WeatherYear& year, const RunControl& control = {}) const;
    std::optional<ComparisonResult> run(const BinTable& bins, const RunControl& control = {}) const;

    // The unit with this option: the existing heat recovery section's
    // description replaced (id and place kept), or a new section "heat-recovery"
    // placed after the leading dampers and filters of both paths (in the extract
    // path also after the take-off of a mixing section, so that the exchanger
    // handles outdoor and exhaust air), or the section
    // removed for the option without heat recovery. A rated flow left empty
    // becomes the unit's supply design flow.
    static Chain::AirHandlingUnit unitWith(const Chain::AirHandlingUnit& unit, const HeatRecoveryOption& option);

    const std::vector<HeatRecoveryOption>& options() const { return m_options; }
    const ComparisonSettings& settings() const { return m_settings; }

private:
    template <class Climate>
    std::optional<ComparisonResult> compare(const Climate& climate, ClimateSummary summary,
                                            const RunControl& control) const;

    Chain::AirHandlingUnit m_unit;
    std::vector<HeatRecoveryOption> m_options;
    ComparisonSettings m_settings;
};

} // namespace Airwright::Core::Annual
