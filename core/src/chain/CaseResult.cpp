#include "airwright/core/chain/CaseResult.h"

namespace Airwright::Core::Chain {

const char* pathKey(PathKind path)
{
    return path == PathKind::Supply ? "supply" : "extract";
}

const SectionResult* CaseResult::find(PathKind path, const std::string& id) const
{
    const auto& list = path == PathKind::Supply ? supply : extract;
    for (const auto& result : list)
        if (result.id == id)
            return &result;
    return nullptr;
}

} // namespace Airwright::Core::Chain
