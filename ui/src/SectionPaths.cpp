#include "airwright/ui/SectionPaths.h"

#include <algorithm>
#include <variant>

namespace Airwright::Ui {

using namespace Airwright::Core;

SectionPaths::Path& SectionPaths::path(Chain::AirHandlingUnit& unit, Chain::PathKind kind)
{
    return kind == Chain::PathKind::Supply ? unit.supply : unit.extract;
}

const SectionPaths::Path& SectionPaths::path(const Chain::AirHandlingUnit& unit, Chain::PathKind kind)
{
    return kind == Chain::PathKind::Supply ? unit.supply : unit.extract;
}

Chain::PathKind SectionPaths::other(Chain::PathKind kind)
{
    return kind == Chain::PathKind::Supply ? Chain::PathKind::Extract : Chain::PathKind::Supply;
}

int SectionPaths::indexOf(const Path& path, const std::string& id)
{
    for (std::size_t i = 0; i < path.size(); ++i)
        if (path[i].id == id)
            return static_cast<int>(i);
    return -1;
}

const Chain::Section* SectionPaths::described(const Chain::AirHandlingUnit& unit, const std::string& id)
{
    for (const auto& s : unit.supply)
        if (s.id == id)
            return &s;
    for (const auto& s : unit.extract)
        if (s.id == id && !std::holds_alternative<Chain::CoupledSide>(s.spec))
            return &s;
    return nullptr;
}

bool SectionPaths::isCoupledEntry(const Chain::Section& section)
{
    return Chain::isCoupled(section.spec) || std::holds_alternative<Chain::CoupledSide>(section.spec);
}

bool SectionPaths::idInUse(const Chain::AirHandlingUnit& unit, const std::string& id)
{
    return indexOf(unit.supply, id) >= 0 || indexOf(unit.extract, id) >= 0;
}

std::string SectionPaths::uniqueId(const Chain::AirHandlingUnit& unit, const std::string& base)
{
    if (!idInUse(unit, base))
        return base;
    for (int n = 2;; ++n) {
        std::string candidate = base + "-" + std::to_string(n);
        if (!idInUse(unit, candidate))
            return candidate;
    }
}

int SectionPaths::counterpartIndex(const Chain::AirHandlingUnit& unit, Chain::PathKind from, int index)
{
    const Path& source = path(unit, from);
    const Path& target = path(unit, other(from));
    const int clamped = std::clamp(index, 0, static_cast<int>(source.size()));
    int before = 0;
    for (int i = 0; i < clamped; ++i)
        if (isCoupledEntry(source[static_cast<std::size_t>(i)]))
            ++before;

    std::vector<int> positions;
    for (std::size_t i = 0; i < target.size(); ++i)
        if (isCoupledEntry(target[i]))
            positions.push_back(static_cast<int>(i));
    const int count = static_cast<int>(positions.size());

    if (count == 0) {
        const bool targetIsSupply = other(from) == Chain::PathKind::Supply;
        for (std::size_t i = 0; i < target.size(); ++i) {
            const auto& spec = target[i].spec;
            const bool fan = std::holds_alternative<Sections::Fan>(spec);
            const bool treats = std::holds_alternative<Sections::WaterHeatingCoil>(spec)
                                || std::holds_alternative<Sections::ElectricHeater>(spec)
                                || std::holds_alternative<Sections::CoolingCoil>(spec)
                                || std::holds_alternative<Sections::Humidifier>(spec);
            if (fan || (targetIsSupply && treats))
                return static_cast<int>(i);
        }
        return static_cast<int>(target.size());
    }
    const int k = std::clamp(count - before, 0, count);
    if (k == count)
        return positions.back() + 1;
    return positions[static_cast<std::size_t>(k)];
}

} // namespace Airwright::Ui
