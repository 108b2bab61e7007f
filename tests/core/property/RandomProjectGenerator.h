#pragma once
// Random valid projects for the property tests: the demo project with its design
// states, airflows, site and section parameters drawn within the documented ranges
// (docs/project-format.md), and sections removed or duplicated. Seeded, so a
// failure names a project number that reproduces on every machine.

#include "airwright/core/project/Project.h"

#include <cstdint>
#include <random>

namespace Airwright::Core::Property {

class RandomProjectGenerator {
public:
    RandomProjectGenerator(Project::Project base, std::uint32_t seed);

    Project::Project next();

private:
    double uniform(double lo, double hi);
    int wholeNumber(int lo, int hi);
    bool chance(double p);

    void randomiseSite(Chain::AirHandlingUnit& unit);
    void randomiseCases(Chain::AirHandlingUnit& unit);
    void randomiseSection(Chain::Section& section, const Chain::AirHandlingUnit& unit);
    void reshapePaths(Chain::AirHandlingUnit& unit);
    Sections::Coolant randomCoolant(double lowestUseC);

    Project::Project m_base;
    std::mt19937 m_engine;
    int m_count = 0;
};

} // namespace Airwright::Core::Property
