#pragma once
// Frost onset in air-to-air heat recovery (docs/frost.md has the derivations).
//
// Plates and run-around coils: frost forms where the coldest heat-transfer
// surface is below 0 C and below the dew (frost) point of the warm stream. For a
// plate that surface is the cold corner, where the cold inlet meets the warm
// stream leaving; its temperature is the hA-weighted mean of the two local air
// temperatures (our own derivation). For a coil loop it is the coldest loop
// fluid (the liquid-side coefficient is much larger than the air side's).
//
// Rotors: the mixing-line criterion. Frost accumulates when the straight line on
// the (t, W) chart from the cold inlet state to the warm inlet temperature at the
// warm stream's effective humidity crosses the saturation curve below 0 C. For a
// non-hygroscopic rotor the effective humidity is the warm inlet's; a hygroscopic
// rotor takes up vapour before the air reaches the cold face, so the effective
// humidity is lowered by the humidity effectiveness: W_eff = W_w - eps_w (W_w - W_c)
// (our adaptation of the classic criterion).

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"
#include "airwright/core/recovery/ColdCorner.h"
#include "airwright/core/recovery/ExchangerKind.h"

#include <optional>

namespace Airwright::Core::Recovery {

AbsoluteTemperature coldCornerSurfaceTemperature(const ColdCorner& corner);

// Surface criterion: below 0 C and below the warm stream's dew/frost point.
bool surfaceFrosts(AbsoluteTemperature surface, const Psychro::MoistAirState& warmInlet);

// Mixing-line criterion for rotors; humidityEffectiveness 0 for a non-hygroscopic rotor.
bool mixingLineFrosts(const Psychro::MoistAirState& coldInlet, const Psychro::MoistAirState& warmInlet,
                      Ratio humidityEffectiveness);

// Frost risk at balanced flow with the given (supply-side = Cmin) effectiveness;
// plates with symmetric sides, loops with the loop capacity rate equal to the
// air's and identical coils. humidityEffectiveness is used by hygroscopic and
// sorption rotors only.
bool frostRisk(ExchangerKind kind, const Psychro::MoistAirState& outdoor, const Psychro::MoistAirState& extract,
               Ratio temperatureEffectiveness, Ratio humidityEffectiveness);

// Outdoor temperature below which frost forms, by a bracketed solve on
// -80 .. 0 C under the assumptions of frostRisk; outdoor air at the given
// relative humidity (0 .. below 1; it matters for rotors only). Empty when no
// frost forms down to -80 C. Extract air must be above 0 C.
std::optional<AbsoluteTemperature> frostOnsetOutdoorTemperature(ExchangerKind kind,
                                                                 const Psychro::MoistAirState& extract,
                                                                 Ratio temperatureEffectiveness,
                                                                 Ratio humidityEffectiveness,
                                                                 Ratio outdoorRelativeHumidity);

} // namespace Airwright::Core::Recovery
