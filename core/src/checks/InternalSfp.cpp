#include "airwright/core/checks/InternalSfp.h"

namespace Airwright::Core::Checks {

InternalSfp internalSfp(const Chain::CaseResult& result)
{
    InternalSfp s;
    s.supply = pathInternalSfp(result.supply);
    s.extract = pathInternalSfp(result.extract);
    s.total = s.supply.sfpInt + s.extract.sfpInt;
    return s;
}

} // namespace Airwright::Core::Checks
