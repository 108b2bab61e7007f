#pragma once
// Hand-built section results for the checks' tests: only the fields the checks
// read are set, the rest keep their defaults.

#include "airwright/core/chain/SectionResult.h"

#include <string>

namespace Airwright::Core::Checks::TestSupport {

inline Chain::SectionResult filterResult(const std::string& id, Chain::PathKind path, Sections::FilterGroup group,
                                         double efficiency, double initialPa, double designPa, double finalPa,
                                         double faceVelocity = 2.0)
{
    Chain::SectionResult r;
    r.id = id;
    r.typeKey = "filter";
    r.path = path;
    r.faceVelocity = metresPerSecond(faceVelocity);
    r.pressureDrop = pascals(designPa); // what the case used; the checks must take the clean drop
    Sections::Filter::Detail d;
    d.group = group;
    d.efficiency = fraction(efficiency);
    d.initialDrop = pascals(initialPa);
    d.designDrop = pascals(designPa);
    d.finalDrop = pascals(finalPa);
    r.detail = d;
    return r;
}

// dryAirFlow: dry air entering the side, kg/s; the inlet state stays the default
// (dry air at 20 C and 101325 Pa).
inline Chain::SectionResult recoveryResult(const std::string& id, Chain::PathKind path, Recovery::ExchangerKind kind,
                                           double regulationEfficiency, double dropPa, double faceVelocity = 2.0,
                                           double dryAirFlow = 0.0)
{
    Chain::SectionResult r;
    r.inlet.dryAir = kilogramsPerSecond(dryAirFlow);
    r.id = id;
    r.typeKey = "heat_recovery";
    r.path = path;
    r.faceVelocity = metresPerSecond(faceVelocity);
    r.pressureDrop = pascals(dropPa);
    Recovery::HeatRecoveryDetail d;
    d.kind = kind;
    d.regulationThermalEfficiency = fraction(regulationEfficiency);
    r.detail = d;
    return r;
}

inline Chain::SectionResult fanResult(const std::string& id, Chain::PathKind path, double overallEfficiency,
                                      double totalPressurePa, double faceVelocity = 2.0)
{
    Chain::SectionResult r;
    r.id = id;
    r.typeKey = "fan";
    r.path = path;
    r.faceVelocity = metresPerSecond(faceVelocity);
    r.pressureDrop = pascals(-totalPressurePa);
    Sections::Fan::Detail d;
    d.overallEfficiency = fraction(overallEfficiency);
    d.totalPressure = pascals(totalPressurePa);
    r.detail = d;
    return r;
}

// A section the regulation's reference configuration does not contain (a coil,
// a silencer): its drop must not count in SFPint.
inline Chain::SectionResult otherResult(const std::string& id, Chain::PathKind path, double dropPa,
                                        double faceVelocity = 2.0)
{
    Chain::SectionResult r;
    r.id = id;
    r.typeKey = "passive";
    r.path = path;
    r.faceVelocity = metresPerSecond(faceVelocity);
    r.pressureDrop = pascals(dropPa);
    return r;
}

} // namespace Airwright::Core::Checks::TestSupport
