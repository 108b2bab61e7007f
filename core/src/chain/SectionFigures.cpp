#include "airwright/core/chain/SectionFigures.h"

#include "airwright/core/recovery/HeatRecovery.h"

#include <type_traits>

namespace Airwright::Core::Chain {

namespace {

class FigureList {
public:
    void add(std::string key, std::string label, FigureKind kind, double value)
    {
        m_figures.push_back({std::move(key), std::move(label), kind, value, {}});
    }
    void text(std::string key, std::string label, std::string value)
    {
        m_figures.push_back({std::move(key), std::move(label), FigureKind::Text, 0.0, std::move(value)});
    }
    std::vector<Figure> take() { return std::move(m_figures); }

private:
    std::vector<Figure> m_figures;
};

void describe(FigureList& f, const Sections::Damper::Detail& d)
{
    f.add("loss_coefficient", "loss coefficient (open)", FigureKind::Number, d.lossCoefficient);
    f.add("leakage_class", "leakage class EN 1751", FigureKind::Number, d.leakageClass);
}

void describe(FigureList& f, const Sections::Filter::Detail& d)
{
    f.text("filter_group", "ISO 16890 group", Sections::filterGroupLabel(d.group));
    f.add("efficiency_pct", "efficiency", FigureKind::Percent, toPercent(d.efficiency));
    f.add("initial_dp_Pa", "initial pressure drop", FigureKind::Pressure, d.initialDrop.value());
    f.add("design_dp_Pa", "design pressure drop", FigureKind::Pressure, d.designDrop.value());
    f.add("final_dp_Pa", "final pressure drop", FigureKind::Pressure, d.finalDrop.value());
    f.add("alarm_dp_Pa", "alarm setpoint", FigureKind::Pressure, d.alarmSetpoint.value());
    f.text("filter_condition", "filter condition used", Sections::filterConditionKey(d.condition));
    f.add("rh_at_filter_pct", "relative humidity at filter", FigureKind::Percent, toPercent(d.relativeHumidity));
}

void describe(FigureList& f, const Sections::WaterHeatingCoil::Detail& d)
{
    f.add("coil_load_kW", "heating duty", FigureKind::Power, toKilowatts(d.duty));
    f.add("flow_temperature_C", "flow temperature", FigureKind::Temperature, toCelsius(d.flowTemperature));
    f.add("return_temperature_C", "return temperature", FigureKind::Temperature, toCelsius(d.returnTemperature));
    f.add("water_flow_kgs", "water flow", FigureKind::MassFlowPerSecond, toKilogramsPerSecond(d.fluidFlow));
    f.add("water_flow_ls", "water volume flow", FigureKind::LiquidVolumeFlow,
          toCubicMetresPerSecond(d.fluidVolumeFlow) * 1000.0);
    if (d.lmtd)
        f.add("lmtd_K", "log-mean temperature difference", FigureKind::TemperatureDifference,
              toKelvinDifference(*d.lmtd));
    if (d.requiredUa)
        f.add("required_ua_kWK", "required UA", FigureKind::Conductance, toWattsPerKelvin(*d.requiredUa) / 1000.0);
}

void describe(FigureList& f, const Sections::ElectricHeater::Detail& d)
{
    f.add("heater_duty_kW", "heating duty", FigureKind::Power, toKilowatts(d.duty));
    if (d.rated)
        f.add("rated_power_kW", "rated power", FigureKind::Power, toKilowatts(*d.rated));
    f.add("steps_on", "steps switched on", FigureKind::Number, d.stepsOn);
    f.add("current_A", "line current at 400 V", FigureKind::Current, toAmperes(d.lineCurrent));
}

void describe(FigureList& f, const Sections::CoolingCoil::Detail& d)
{
    f.add("coil_load_kW", "coil load", FigureKind::Power, toKilowatts(d.totalLoad));
    f.add("sensible_kW", "sensible load", FigureKind::Power, toKilowatts(d.sensibleLoad));
    f.add("latent_kW", "latent load", FigureKind::Power, toKilowatts(d.latentLoad));
    f.add("shr", "sensible heat ratio", FigureKind::Number, d.sensibleHeatRatio.value());
    f.add("condensate_kgh", "condensate", FigureKind::MassFlowPerHour, toKilogramsPerSecond(d.condensate) * 3600.0);
    if (d.apparatusDewPoint)
        f.add("adp_C", "apparatus dew point", FigureKind::Temperature, toCelsius(*d.apparatusDewPoint));
    f.add("bypass_factor", "bypass factor", FigureKind::Number, d.bypassFactor.value());
    f.add("water_flow_kgs", "water flow", FigureKind::MassFlowPerSecond, toKilogramsPerSecond(d.fluidFlow));
    f.add("water_flow_ls", "water volume flow", FigureKind::LiquidVolumeFlow,
          toCubicMetresPerSecond(d.fluidVolumeFlow) * 1000.0);
}

void describe(FigureList& f, const Sections::Humidifier::Detail& d)
{
    f.add("water_added_kgh", "water added", FigureKind::MassFlowPerHour, toKilogramsPerSecond(d.waterAdded) * 3600.0);
    f.add("steam_power_kW", "steam generator power", FigureKind::Power, toKilowatts(d.steamGeneratorPower));
}

void describe(FigureList& f, const Sections::Fan::Detail& d)
{
    f.add("flow_m3h", "air flow", FigureKind::AirVolumeFlow, toCubicMetresPerHour(d.flow));
    f.add("total_pressure_Pa", "total pressure", FigureKind::Pressure, d.totalPressure.value());
    f.add("shaft_power_kW", "shaft power", FigureKind::Power, toKilowatts(d.shaftPower));
    f.add("power_kW", "electric power", FigureKind::Power, toKilowatts(d.electricPower));
    f.add("overall_efficiency_pct", "overall efficiency", FigureKind::Percent, toPercent(d.overallEfficiency));
    f.add("temperature_rise_K", "air temperature rise", FigureKind::TemperatureDifference,
          toKelvinDifference(d.temperatureRise));
    f.add("sfp_W_per_m3s", "specific fan power", FigureKind::Number,
          toWattsPerCubicMetrePerSecond(d.specificFanPower));
    if (d.inletRingPressure)
        f.add("inlet_ring_dp_Pa", "inlet ring pressure at this flow", FigureKind::Pressure,
              d.inletRingPressure->value());
}

void describe(FigureList& f, const Sections::PassiveSection::Detail& d)
{
    f.text("kind", "kind", Sections::passiveKindKey(d.kind));
}

void describe(FigureList& f, const Sections::MixingBox::Detail& d)
{
    f.add("outdoor_share_pct", "outdoor air share", FigureKind::Percent, toPercent(d.outdoorShare));
    f.add("recirculated_kgs", "recirculated dry air", FigureKind::MassFlowPerSecond,
          toKilogramsPerSecond(d.recirculated));
}

void describe(FigureList& f, const Recovery::HeatRecoveryDetail& d)
{
    f.text("exchanger", "exchanger", Recovery::exchangerKindLabel(d.kind));
    f.add("effectiveness_t", "temperature effectiveness", FigureKind::Number, d.temperatureEffectiveness.value());
    if (d.humidityEffectiveness)
        f.add("effectiveness_x", "humidity effectiveness", FigureKind::Number, d.humidityEffectiveness->value());
    f.add("eta_t_1253", "thermal efficiency (EU 1253/2014)", FigureKind::Number, d.regulationThermalEfficiency.value());
    f.add("recovered_kW", "heat recovered", FigureKind::Power, toKilowatts(d.recovered));
    f.add("bypass_fraction", "bypass fraction", FigureKind::Number, d.bypassFraction.value());
    f.add("condensate_kgh", "condensate", FigureKind::MassFlowPerHour, toKilogramsPerSecond(d.condensate) * 3600.0);
    f.text("frost_risk", "frost risk", d.frost.risk ? "yes" : "no");
    if (d.frost.onsetOutdoorTemperature)
        f.add("frost_onset_outdoor_C", "frost onset, outdoor", FigureKind::Temperature,
              toCelsius(*d.frost.onsetOutdoorTemperature));
    f.text("frost_strategy", "frost protection", Recovery::frostStrategyKey(d.frost.strategy));
    f.add("frost_protection_kW", "frost protection cost", FigureKind::Power, toKilowatts(d.frost.protectionPower));
    f.add("recovered_fraction", "recovery kept under frost protection", FigureKind::Number,
          d.frost.recoveredFraction.value());
    f.add("eatr_pct", "exhaust air transfer ratio", FigureKind::Percent, toPercent(d.leakage.exhaustAirTransfer));
    f.add("oacf", "outdoor air correction factor", FigureKind::Number, d.leakage.outdoorAirCorrection);
    f.add("dp_clean_Pa", "clean pressure drop, extract side", FigureKind::Pressure, d.cleanExtractPressureDrop.value());
    f.add("frost_alarm_dp_Pa", "frost alarm pressure drop", FigureKind::Pressure, d.frostAlarmPressureDrop.value());
    if (d.supplyMinusExtract)
        f.add("supply_minus_extract_Pa", "supply minus extract static pressure", FigureKind::Pressure,
              d.supplyMinusExtract->value());
    if (d.loopSupplyTemperature)
        f.add("loop_supply_C", "loop fluid to the supply coil", FigureKind::Temperature,
              toCelsius(*d.loopSupplyTemperature));
    if (d.loopReturnTemperature)
        f.add("loop_return_C", "loop fluid to the extract coil", FigureKind::Temperature,
              toCelsius(*d.loopReturnTemperature));
    if (d.pumpPower.value() > 0.0)
        f.add("pump_power_kW", "loop pump power", FigureKind::Power, toKilowatts(d.pumpPower));
}

void describe(FigureList&, const std::monostate&) {}

} // namespace

std::vector<Figure> sectionFigures(const SectionResult& result)
{
    FigureList list;
    std::visit([&](const auto& detail) { describe(list, detail); }, result.detail);
    return list.take();
}

const char* figureUnit(FigureKind kind)
{
    switch (kind) {
    case FigureKind::Temperature:
        return "C";
    case FigureKind::TemperatureDifference:
        return "K";
    case FigureKind::Pressure:
        return "Pa";
    case FigureKind::Power:
        return "kW";
    case FigureKind::AirVolumeFlow:
        return "m3/h";
    case FigureKind::LiquidVolumeFlow:
        return "l/s";
    case FigureKind::MassFlowPerSecond:
        return "kg/s";
    case FigureKind::MassFlowPerHour:
        return "kg/h";
    case FigureKind::Velocity:
        return "m/s";
    case FigureKind::Percent:
        return "%";
    case FigureKind::HumidityRatio:
        return "g/kg";
    case FigureKind::Current:
        return "A";
    case FigureKind::Conductance:
        return "kW/K";
    case FigureKind::Number:
    case FigureKind::Text:
        return "";
    }
    return "";
}

} // namespace Airwright::Core::Chain
