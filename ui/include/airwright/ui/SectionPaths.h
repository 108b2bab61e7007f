#pragma once
// Small queries and edits on a unit's two paths that the undo commands, the
// drawing and the editors share: finding a section, making a free id, and where a
// coupled section's other half goes.

#include "airwright/core/chain/AirHandlingUnit.h"
#include "airwright/core/chain/SectionResult.h"

#include <string>
#include <vector>

namespace Airwright::Ui {

class SectionPaths {
public:
    using Path = std::vector<Core::Chain::Section>;

    static Path& path(Core::Chain::AirHandlingUnit& unit, Core::Chain::PathKind kind);
    static const Path& path(const Core::Chain::AirHandlingUnit& unit, Core::Chain::PathKind kind);
    static Core::Chain::PathKind other(Core::Chain::PathKind kind);

    static int indexOf(const Path& path, const std::string& id); // -1 when absent

    // The full description of a section: for a coupled one, its supply-path entry.
    static const Core::Chain::Section* described(const Core::Chain::AirHandlingUnit& unit, const std::string& id);

    // True for a coupled section's description (supply) or its marker (extract).
    static bool isCoupledEntry(const Core::Chain::Section& section);

    static bool idInUse(const Core::Chain::AirHandlingUnit& unit, const std::string& id);
    // base, base-2, base-3, ...: the first not used in either path.
    static std::string uniqueId(const Core::Chain::AirHandlingUnit& unit, const std::string& base);

    // A coupled section inserted at `index` of path `from` needs its other half in
    // the other path. Coupled sections meet the two air streams in opposite order
    // (the extract runs counter to the supply), so the k-th coupled section of the
    // supply is the k-th from the end of the extract. With no coupled section yet,
    // the other half goes before the first fan (extract) or the first coil, heater,
    // humidifier or fan (supply), else at the end.
    static int counterpartIndex(const Core::Chain::AirHandlingUnit& unit, Core::Chain::PathKind from, int index);
};

} // namespace Airwright::Ui
