#pragma once

#include "airwright/core/Quantities.h"
#include "airwright/core/chain/Section.h"
#include "airwright/core/recovery/HeatRecoveryDetail.h"
#include "airwright/core/sections/AirStream.h"

#include <optional>
#include <string>
#include <variant>

namespace Airwright::Core::Chain {

enum class PathKind { Supply, Extract };
const char* pathKey(PathKind path); // "supply", "extract"

using SectionDetail = std::variant<std::monostate, Sections::Damper::Detail, Sections::Filter::Detail,
                                   Sections::WaterHeatingCoil::Detail, Sections::ElectricHeater::Detail,
                                   Sections::CoolingCoil::Detail, Sections::Humidifier::Detail,
                                   Sections::Fan::Detail, Sections::PassiveSection::Detail,
                                   Sections::MixingBox::Detail, Recovery::HeatRecoveryDetail>;

// One section on one path in one case. A coupled section has one result per path
// under the same id, each with its own states and flows. The chain builds it
// with designated initialisers (appendResult in CaseSolver.cpp): a member added
// here is added there too.
struct SectionResult {
    std::string id;
    std::string typeKey;
    PathKind path = PathKind::Supply;
    Sections::AirStream inlet;
    Sections::AirStream outlet;
    Pressure staticPressureIn;   // relative to ambient
    Pressure staticPressureOut;
    VolumeFlow inletFlow;        // actual, at the inlet state
    Velocity faceVelocity;
    Pressure pressureDrop;       // fans: negative (a rise)
    Power duty;                  // dry air x (h_out - h_in) (+ heats the air)
    MassFlow waterAdded;
    MassFlow waterRemoved;
    Length length;
    SectionDetail detail;
};

} // namespace Airwright::Core::Chain
