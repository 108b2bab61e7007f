#include "airwright/core/sections/Humidifier.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>

namespace Airwright::Core::Sections {

const char* humidifierKindKey(HumidifierKind kind)
{
    return kind == HumidifierKind::Steam ? "steam" : "adiabatic";
}

std::optional<HumidifierKind> humidifierKindFromKey(std::string_view key)
{
    if (key == "steam")
        return HumidifierKind::Steam;
    if (key == "adiabatic")
        return HumidifierKind::Adiabatic;
    return std::nullopt;
}

void Humidifier::validate() const
{
    if (!(saturationEfficiency.value() > 0.0 && saturationEfficiency.value() <= 1.0))
        throw InputError("saturation efficiency", toPercent(saturationEfficiency), "%", "above 0 .. 100 %");
    const double ts = toCelsius(steamTemperature);
    if (!(ts >= 100.0 && ts <= 180.0))
        throw InputError("steam temperature", ts, "C", "100 .. 180 C");
    const double tf = toCelsius(feedWaterTemperature);
    if (!(tf > 0.0 && tf <= 60.0))
        throw InputError("feed water temperature", tf, "C", "above 0 .. 60 C");
    if (capacity && !(capacity->value() > 0.0))
        throw InputError("humidifier capacity", toKilogramsPerSecond(*capacity) * 3600.0, "kg/h", "above 0");
    if (!(pressureDrop.value() >= 0.0 && pressureDrop.value() <= 500.0))
        throw InputError("humidifier pressure drop", pressureDrop.value(), "Pa", "0 .. 500 Pa");
    if (!(length.value() >= 0.0 && length.value() <= 20.0))
        throw InputError("humidifier length", toMillimetres(length), "mm", "0 .. 20000 mm");
}

SectionOutcome Humidifier::compute(const AirStream& inlet, const SectionContext& context, Detail& detail) const
{
    const Pressure dp = scaledPressureDrop(pressureDrop, metresPerSecond(2.0), context.faceVelocity, 2.0);
    detail = Detail{};
    SectionOutcome outcome{inlet, dp, MassFlow{}, MassFlow{}, {}};
    outcome.findings.push_back({Severity::Info, "humidifier.hygiene", "",
                                "humidifier hygiene: water treatment, drain and cleaning access, no standing water; "
                                "follow the local hygiene rules (e.g. VDI 6022 where it applies)"});

    const auto& in = inlet.state;
    const auto minW = context.target.minHumidity;
    if (!minW || in.humidityRatio() >= *minW)
        return outcome;

    HumidityRatio wanted = *minW;
    if (capacity) {
        const HumidityRatio most = in.humidityRatio() + *capacity / inlet.dryAir;
        if (most < wanted) {
            wanted = most;
            detail.capacityLimited = true;
            detail.targetReached = false;
            outcome.findings.push_back({Severity::Error, "humidifier.capacity", "",
                                        "humidifier capacity " + formatFixed(toKilogramsPerSecond(*capacity) * 3600.0, 1)
                                            + " kg/h is not enough to reach the minimum humidity"});
        }
    }

    Psychro::ProcessOutcome process{in, HumidityRatio{}, false};
    if (kind == HumidifierKind::Steam) {
        process = Psychro::steamHumidify(in, wanted, steamTemperature);
    } else {
        const auto full = Psychro::adiabaticHumidify(in, saturationEfficiency);
        if (full.outlet.humidityRatio() <= wanted) {
            process = full;
            if (full.outlet.humidityRatio() < wanted - kilogramsPerKilogram(1e-7)) {
                detail.targetReached = false;
                outcome.findings.push_back(
                    {Severity::Warning, "humidifier.saturation", "",
                     "adiabatic humidifier reaches only " + formatFixed(toGramsPerKilogram(full.outlet.humidityRatio()), 2)
                         + " g/kg of the " + formatFixed(toGramsPerKilogram(*minW), 2)
                         + " g/kg wanted at its saturation efficiency: preheat more"});
            }
        } else {
            // Modulate (e.g. spray staging) to the efficiency that just reaches the target.
            double lo = 0.0;
            double hi = saturationEfficiency.value();
            for (int i = 0; i < 60 && hi - lo > 1e-9; ++i) {
                const double mid = 0.5 * (lo + hi);
                if (Psychro::adiabaticHumidify(in, fraction(mid)).outlet.humidityRatio() < wanted)
                    lo = mid;
                else
                    hi = mid;
            }
            process = Psychro::adiabaticHumidify(in, fraction(hi));
        }
    }
    outcome.outlet.state = process.outlet;
    const MassFlow added = inlet.dryAir * (process.outlet.humidityRatio() - in.humidityRatio() + process.condensate);
    outcome.waterAdded = added;
    outcome.waterRemoved = inlet.dryAir * process.condensate;
    if (process.clamped)
        outcome.findings.push_back({Severity::Warning, "humidifier.oversaturation", "",
                                    "the air cannot hold the humidity asked for at this point: water would drop out"});
    detail.waterAdded = added;
    if (kind == HumidifierKind::Steam)
        detail.steamGeneratorPower =
            added * (Psychro::waterVapourEnthalpy(steamTemperature) - Psychro::liquidWaterEnthalpy(feedWaterTemperature));
    return outcome;
}

} // namespace Airwright::Core::Sections
