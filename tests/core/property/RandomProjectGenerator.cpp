#include "RandomProjectGenerator.h"

#include <algorithm>
#include <string>
#include <utility>
#include <variant>

namespace Airwright::Core::Property {

using namespace Airwright::Core::Chain;

RandomProjectGenerator::RandomProjectGenerator(Project::Project base, std::uint32_t seed)
    : m_base(std::move(base)), m_engine(seed)
{
}

double RandomProjectGenerator::uniform(double lo, double hi)
{
    return std::uniform_real_distribution<double>(lo, hi)(m_engine);
}

int RandomProjectGenerator::wholeNumber(int lo, int hi)
{
    return std::uniform_int_distribution<int>(lo, hi)(m_engine);
}

bool RandomProjectGenerator::chance(double p)
{
    return std::bernoulli_distribution(p)(m_engine);
}

Sections::Coolant RandomProjectGenerator::randomCoolant(double lowestUseC)
{
    // Water when it stays liquid; otherwise (or at random) a glycol strong enough.
    if (lowestUseC >= 2.0 && chance(0.6))
        return {};
    const auto kind = chance(0.5) ? Sections::CoolantKind::EthyleneGlycol : Sections::CoolantKind::PropyleneGlycol;
    return Sections::Coolant(kind, percent(uniform(10.0, 60.0)));
}

Project::Project RandomProjectGenerator::next()
{
    Project::Project project = m_base;
    project.info.name = "random project " + std::to_string(m_count++);
    auto& unit = project.unit;
    randomiseSite(unit);
    reshapePaths(unit);
    for (auto& section : unit.supply)
        randomiseSection(section, unit);
    for (auto& section : unit.extract)
        randomiseSection(section, unit);
    randomiseCases(unit);
    return project;
}

void RandomProjectGenerator::randomiseSite(AirHandlingUnit& unit)
{
    unit.site.altitude = metres(uniform(0.0, 3000.0));
    unit.site.barometricPressure.reset();
    auto& flows = unit.airflows;
    flows.basis = chance(0.5) ? FlowBasis::StandardAir : FlowBasis::Actual;
    flows.supply = cubicMetresPerHour(uniform(500.0, 60000.0));
    flows.extract = flows.supply * uniform(0.5, 1.2);
    flows.supplyExternalBefore = pascals(uniform(0.0, 3000.0) * (chance(0.8) ? 0.1 : 1.0));
    flows.supplyExternalAfter = pascals(uniform(0.0, 3000.0) * (chance(0.8) ? 0.2 : 1.0));
    flows.extractExternalBefore = pascals(uniform(0.0, 3000.0) * (chance(0.8) ? 0.2 : 1.0));
    flows.extractExternalAfter = pascals(uniform(0.0, 3000.0) * (chance(0.8) ? 0.1 : 1.0));
    // The solver and the file checks accept 0.5 .. 6 m/s and a 10 .. 500 mm grid
    // (ChainSolver::validate, ProjectReader).
    unit.casing.targetFaceVelocity = metresPerSecond(uniform(0.5, 6.0));
    unit.casing.sizingGrid = millimetres(uniform(10.0, 500.0));
    unit.casing.width.reset();
    unit.casing.height.reset();
}

void RandomProjectGenerator::randomiseCases(AirHandlingUnit& unit)
{
    for (auto& c : unit.cases) {
        c.outdoorTemperature = celsius(uniform(-60.0, 60.0));
        c.outdoorHumidity = percent(chance(0.1) ? 100.0 : uniform(0.0, 100.0));
        c.roomTemperature = celsius(uniform(0.0, 50.0));
        c.roomHumidity = percent(uniform(0.0, 100.0));
        c.supplySetpoint = celsius(uniform(0.0, 60.0));
        c.minimumSupplyHumidity.reset();
        c.maximumSupplyHumidity.reset();
        if (chance(0.4))
            c.minimumSupplyHumidity = percent(uniform(0.0, 60.0));
        if (chance(0.4))
            c.maximumSupplyHumidity = percent(uniform(c.minimumSupplyHumidity ? toPercent(*c.minimumSupplyHumidity) : 0.0,
                                                      100.0));
        c.dehumidifyWithReheat = chance(0.3);
        c.filterCondition = static_cast<Sections::FilterCondition>(wholeNumber(0, 2));
        c.airflowFraction = percent(chance(0.1) ? 5.0 : uniform(5.0, 100.0));
    }
}

void RandomProjectGenerator::randomiseSection(Section& section, const AirHandlingUnit& unit)
{
    const Length length = millimetres(chance(0.9) ? uniform(0.0, 3000.0) : uniform(0.0, 20000.0));
    // Flows the ratings refer to stay within a factor of three of the design flow:
    // inside the documented range, and a realistic selection.
    const VolumeFlow designFlow = unit.airflows.supply;
    std::visit(
        [&](auto& spec) {
            using T = std::decay_t<decltype(spec)>;
            if constexpr (std::is_same_v<T, Sections::Damper>) {
                spec.lossCoefficient = uniform(0.0, 50.0);
                spec.leakageClass = wholeNumber(0, 4);
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::Filter>) {
                spec.group = static_cast<Sections::FilterGroup>(wholeNumber(0, 3));
                spec.efficiency = percent(spec.group == Sections::FilterGroup::IsoCoarse ? uniform(0.0, 100.0)
                                                                                        : uniform(50.0, 100.0));
                spec.construction = static_cast<Sections::FilterConstruction>(wholeNumber(0, 2));
                if (chance(0.5)) {
                    spec.initialPressureDrop = pascals(uniform(1.0, 999.0));
                    spec.finalPressureDrop = pascals(uniform(spec.initialPressureDrop.value() + 1.0, 2000.0));
                } else {
                    const double finalDefault = Sections::Filter::defaultFinalPressureDrop(spec.group).value();
                    spec.initialPressureDrop = pascals(uniform(1.0, finalDefault - 1.0));
                    spec.finalPressureDrop.reset();
                }
                spec.nominalFlow.reset();
                if (chance(0.3))
                    spec.nominalFlow = designFlow * uniform(0.33, 3.0);
                spec.flowExponent = uniform(1.0, 2.0);
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::WaterHeatingCoil>) {
                spec.fluid = randomCoolant(chance(0.5) ? 2.0 : -20.0);
                const double lowest = toCelsius(spec.fluid.lowestTemperature());
                spec.flowTemperature = celsius(uniform(std::max(lowest, 0.0) + 2.0, 100.0));
                spec.returnTemperature =
                    celsius(uniform(std::max(lowest, 0.0) + 1.0, toCelsius(spec.flowTemperature) - 0.5));
                spec.rows = wholeNumber(1, 12);
                spec.pressureDropPerRow = pascals(uniform(0.0, 200.0));
                spec.capacity.reset();
                if (chance(0.3))
                    spec.capacity = kilowatts(uniform(1.0, 1000.0));
                spec.fixedOutletTemperature.reset();
                if (chance(0.2))
                    spec.fixedOutletTemperature = celsius(uniform(-39.0, toCelsius(spec.flowTemperature) - 0.5));
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::ElectricHeater>) {
                spec.ratedPower.reset();
                if (chance(0.5))
                    spec.ratedPower = kilowatts(uniform(0.5, 2000.0));
                spec.steps = wholeNumber(0, 32);
                spec.pressureDrop = pascals(uniform(0.0, 500.0));
                spec.fixedOutletTemperature.reset();
                if (chance(0.2))
                    spec.fixedOutletTemperature = celsius(uniform(-39.0, 59.0));
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::CoolingCoil>) {
                spec.fluid = randomCoolant(chance(0.7) ? 2.0 : -10.0);
                const double lowest = toCelsius(spec.fluid.lowestTemperature());
                spec.waterInletTemperature = celsius(uniform(std::max(lowest, -10.0), 25.0));
                spec.waterOutletTemperature = celsius(uniform(toCelsius(spec.waterInletTemperature) + 0.5, 30.0));
                spec.rows = wholeNumber(1, 12);
                spec.bypassFactor.reset();
                if (chance(0.3))
                    spec.bypassFactor = fraction(uniform(0.01, 0.99));
                spec.pressureDropPerRow = pascals(uniform(0.0, 200.0));
                spec.wetPressureDropFactor = uniform(1.0, 3.0);
                spec.capacity.reset();
                if (chance(0.3))
                    spec.capacity = kilowatts(uniform(1.0, 1000.0));
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::Humidifier>) {
                spec.kind = chance(0.5) ? Sections::HumidifierKind::Steam : Sections::HumidifierKind::Adiabatic;
                spec.saturationEfficiency = percent(uniform(1.0, 100.0));
                spec.steamTemperature = celsius(uniform(100.0, 180.0));
                spec.feedWaterTemperature = celsius(uniform(0.5, 60.0));
                spec.capacity.reset();
                if (chance(0.3))
                    spec.capacity = kilogramsPerSecond(uniform(1.0, 1000.0) / 3600.0);
                spec.pressureDrop = pascals(uniform(0.0, 500.0));
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::Fan>) {
                spec.fanEfficiency = percent(uniform(chance(0.9) ? 40.0 : 5.0, 100.0));
                spec.motorEfficiency = percent(uniform(30.0, 100.0));
                spec.motorIeClass = wholeNumber(1, 5);
                spec.driveEfficiency = percent(uniform(50.0, 100.0));
                spec.controllerEfficiency = percent(uniform(50.0, 100.0));
                spec.motorInAirstream = chance(0.7);
                spec.kFactor.reset();
                if (chance(0.5))
                    spec.kFactor = uniform(1.0, 5000.0);
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::PassiveSection>) {
                spec.kind = static_cast<Sections::PassiveKind>(wholeNumber(0, 3));
                spec.ratedPressureDrop = pascals(uniform(0.0, 2000.0) * (chance(0.8) ? 0.05 : 1.0));
                // Rated velocity from 0.5 m/s up: a lower rating with a high drop
                // scales to megapascals at the design velocity.
                spec.ratedVelocity = metresPerSecond(uniform(0.5, 20.0));
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Sections::MixingBox>) {
                spec.outdoorAirFraction = percent(uniform(0.0, 100.0));
                spec.minimumOutdoorFlow.reset();
                if (chance(0.3))
                    spec.minimumOutdoorFlow = designFlow * uniform(0.0, 1.0);
                spec.lossCoefficient = uniform(0.0, 50.0);
                spec.length = length;
            } else if constexpr (std::is_same_v<T, Recovery::HeatRecovery>) {
                using Recovery::ExchangerKind;
                spec.kind = static_cast<ExchangerKind>(wholeNumber(0, 6));
                const bool wheel = Recovery::isRotary(spec.kind);
                spec.ratedEfficiency = percent(uniform(1.0, 94.9));
                spec.ratedFlow.reset();
                if (chance(0.3))
                    spec.ratedFlow = designFlow * uniform(0.33, 3.0);
                spec.ratedHumidityEfficiency =
                    percent(Recovery::transfersMoisture(spec.kind) ? uniform(0.0, 94.9) : 0.0);
                spec.ratedPressureDropSupply = pascals(uniform(0.0, 1000.0));
                spec.ratedPressureDropExtract = pascals(uniform(0.0, 1000.0));
                spec.rotorSpeed = wheel ? uniform(0.6, 30.0) : 10.0;
                spec.exhaustAirTransfer = percent(wheel ? uniform(0.0, 20.0) : 0.0);
                spec.outdoorAirCorrection = wheel ? uniform(0.8, 1.5) : 1.0;
                spec.purgeSector = chance(0.5);
                spec.loopFluid = spec.kind == ExchangerKind::RunAroundCoil ? randomCoolant(-30.0) : Sections::Coolant{};
                spec.pumpPower = watts(spec.kind == ExchangerKind::RunAroundCoil ? uniform(0.0, 100000.0) * 0.01 : 0.0);
                spec.bypassControl = chance(0.7);
                const int strategies = wheel ? 6 : 5; // rotor speed (the last) is for wheels only
                spec.frostStrategy = static_cast<Recovery::FrostStrategy>(wholeNumber(0, strategies - 1));
                spec.defrostSections = wholeNumber(2, 16);
                spec.length = length;
            }
        },
        section.spec);
}

void RandomProjectGenerator::reshapePaths(AirHandlingUnit& unit)
{
    const int operations = wholeNumber(0, 4);
    for (int op = 0; op < operations; ++op) {
        const bool supplyPath = unit.extract.empty() || chance(0.6);
        auto& path = supplyPath ? unit.supply : unit.extract;
        const auto index = static_cast<std::size_t>(wholeNumber(0, static_cast<int>(path.size()) - 1));
        const Section picked = path[index];
        const bool coupled = isCoupled(picked.spec) || std::holds_alternative<CoupledSide>(picked.spec);
        if (chance(0.5)) {
            // Remove: a coupled section goes with its marker; supply keeps one section.
            if (supplyPath && unit.supply.size() < 2)
                continue;
            if (coupled) {
                std::erase_if(unit.supply, [&](const Section& s) { return s.id == picked.id; });
                std::erase_if(unit.extract, [&](const Section& s) { return s.id == picked.id; });
                if (unit.supply.empty())
                    unit.supply.push_back(Section{"fan-" + std::to_string(op), Sections::Fan{}});
            } else {
                path.erase(path.begin() + static_cast<std::ptrdiff_t>(index));
            }
        } else if (!coupled) {
            Section copy = picked;
            copy.id += "-copy-" + std::to_string(op);
            const auto at = static_cast<std::size_t>(wholeNumber(0, static_cast<int>(path.size())));
            path.insert(path.begin() + static_cast<std::ptrdiff_t>(at), copy);
        }
    }
    if (chance(0.25)) {
        // A recirculation section somewhere in both paths.
        const auto at = static_cast<std::ptrdiff_t>(wholeNumber(0, static_cast<int>(unit.supply.size())));
        unit.supply.insert(unit.supply.begin() + at, Section{"mixing", Sections::MixingBox{}});
        const auto back = static_cast<std::ptrdiff_t>(wholeNumber(0, static_cast<int>(unit.extract.size())));
        unit.extract.insert(unit.extract.begin() + back, Section{"mixing", CoupledSide{}});
    }
    // A unit whose extract path was emptied is a supply-only unit: no extract flow
    // is possible then, so keep one extract section to stay within the model.
    if (unit.extract.empty())
        unit.extract.push_back(Section{"extract-fan", Sections::Fan{}});
}

} // namespace Airwright::Core::Property
