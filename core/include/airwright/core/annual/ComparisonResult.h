#pragma once
// What the heat recovery comparison reports: the climate it ran on, the figures
// of every option, the ranking with its reasons and the sensitivity table.

#include "airwright/core/Finding.h"
#include "airwright/core/Quantities.h"
#include "airwright/core/annual/AnnualEnergy.h"
#include "airwright/core/annual/DegreeHours.h"
#include "airwright/core/annual/Energy.h"

#include <optional>
#include <string>
#include <vector>

namespace Airwright::Core::Annual {

enum class ClimateMethod { Hourly, Bins };

struct ClimateSummary {
    std::string site;             // the weather file's site name; empty for bins
    ClimateMethod method = ClimateMethod::Hourly;
    Duration duration;            // hours in the year or the bin table
    AbsoluteTemperature meanDryBulb;
    AbsoluteTemperature minDryBulb; // bins: the coldest bin's temperature
    AbsoluteTemperature maxDryBulb;
    AbsoluteTemperature degreeHourBase = celsius(15.0);
    DegreeHours heatingDegreeHours;
    Duration operatingTime;       // normal and setback hours of the schedule
};

struct OptionResult {
    std::string key;
    std::string name;
    std::string kindKey; // exchangerKindKey, or "none"
    bool hasRecovery = false;

    // Design point: the coldest design case, exchanger at full recovery without
    // frost protection, at that case's inlet states and flows.
    Ratio designEffectiveness;
    Ratio regulationEfficiency;   // Regulation (EU) 1253/2014 thermal efficiency
    Pressure supplyPressureDrop;  // at the coldest design case
    Pressure extractPressureDrop;
    std::vector<Finding> designFindings; // recovery and frost findings of the design cases

    AnnualEnergy energy;

    // Against the option without heat recovery.
    Energy heatSaving;        // delivered heat
    Energy electricitySaving; // fans, pump, steam and cooling / EER; negative when more is used
    Energy addedFanEnergy;    // fan energy above that without heat recovery
    Energy netSaving;         // heatSaving + electricitySaving
    double costSaving = 0.0;  // per year, price currency
    Mass co2Saving;           // per year
    double extraCost = 0.0;
    std::optional<double> paybackYears; // extra cost / cost saving; empty when nothing is saved
    double netBenefit = 0.0;  // cost saving x evaluation years - extra cost
};

struct RankingEntry {
    int rank = 0;
    std::string key;
    double netBenefit = 0.0;
    std::string reason;
};

struct SensitivityCell {
    Ratio roomHumidityOffset;
    double heatPriceFactor = 1.0;
    std::vector<std::string> ranking; // option keys, best first
};

struct ComparisonResult {
    ClimateSummary climate;
    std::vector<OptionResult> options;
    std::vector<RankingEntry> ranking;
    std::vector<SensitivityCell> sensitivity;
};

} // namespace Airwright::Core::Annual
