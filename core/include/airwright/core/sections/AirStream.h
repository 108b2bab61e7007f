#pragma once
// Air at a section boundary: its state and its dry-air mass flow. Mass is carried
// as dry air so that it is conserved through every section that neither adds nor
// removes air; the volume flow follows from the state.

#include "airwright/core/Quantities.h"
#include "airwright/core/psychro/MoistAirState.h"

namespace Airwright::Core::Sections {

struct AirStream {
    Psychro::MoistAirState state;
    MassFlow dryAir;

    VolumeFlow volumeFlow() const { return dryAir * state.specificVolume(); }
    Density density() const { return state.density(); }
};

} // namespace Airwright::Core::Sections
