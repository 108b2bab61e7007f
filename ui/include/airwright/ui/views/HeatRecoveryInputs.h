#pragma once
// What the user changed of the heat recovery comparison's inputs: per option the
// datasheet figures that differ from defaultHeatRecoveryOptions, and the prices,
// evaluation period and operating schedule of ComparisonSettings. Option edits
// are kept as differences so that an option left alone follows the unit (its
// default extra cost scales with the supply flow). Kept in QSettings under the
// group kSettingsGroup.

#include "airwright/core/Quantities.h"
#include "airwright/core/annual/ComparisonSettings.h"
#include "airwright/core/annual/HeatRecoveryOption.h"
#include "airwright/core/recovery/HeatRecovery.h"

#include <map>
#include <optional>
#include <string>
#include <vector>

class QSettings;

namespace Airwright::Ui {

class HeatRecoveryInputs {
public:
    static inline const char* const kSettingsGroup = "heatRecoveryComparisonInputs";

    // The editable figures of one option; empty: the default.
    struct OptionEdits {
        std::optional<Core::Ratio> efficiency;
        std::optional<Core::Ratio> humidityEfficiency;
        std::optional<Core::Pressure> dropSupply;
        std::optional<Core::Pressure> dropExtract;
        std::optional<Core::Recovery::FrostStrategy> frost;
        std::optional<double> extraCost;

        bool empty() const;
        bool operator==(const OptionEdits&) const = default;
    };

    // The options for a unit of this supply flow: the defaults with the edits on top.
    std::vector<Core::Annual::HeatRecoveryOption> options(Core::VolumeFlow supplyFlow) const;
    // One option with `edits` in place of its stored edits; empty key: none.
    static void apply(Core::Annual::HeatRecoveryOption& option, const OptionEdits& edits);

    const OptionEdits& edits(const std::string& key) const;
    // Drops the fields equal to the default of `supplyFlow` so that a value typed
    // back to its default follows the defaults again.
    void setEdits(const std::string& key, OptionEdits edits, Core::VolumeFlow supplyFlow);

    // Prices, evaluation period and schedule; the rest of ComparisonSettings stays
    // at its defaults (the view leaves out the sensitivity table).
    const Core::Annual::ComparisonSettings& settings() const { return m_settings; }
    void setSettings(const Core::Annual::ComparisonSettings& settings) { m_settings = settings; }

    bool optionsAreDefault() const { return m_edits.empty(); }
    bool settingsAreDefault() const;
    void restoreDefaultOptions() { m_edits.clear(); }
    void restoreDefaultSettings() { m_settings = {}; }

    // load() skips what is missing, unreadable or out of range (a file edited by
    // hand must not stop the program): those stay at the default.
    void save(QSettings& store) const;
    static HeatRecoveryInputs load(QSettings& store);

    bool operator==(const HeatRecoveryInputs&) const = default;

private:
    std::map<std::string, OptionEdits> m_edits;
    Core::Annual::ComparisonSettings m_settings;
};

} // namespace Airwright::Ui
