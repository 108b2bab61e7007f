#pragma once

#include "IssueLog.h"
#include "JsonObjectReader.h"
#include "airwright/core/project/Project.h"

namespace Airwright::Core::Project {

// JSON document in the current format -> Project. Checks every key and the
// relations between parts (ids, coupled sections, case names); all problems go to
// the log, and the returned project is meaningful only when the log has no errors.
// "format" and "format_version" are checked by the caller before migration.
class ProjectReader {
public:
    static Project read(const Json& document, IssueLog& log);
};

} // namespace Airwright::Core::Project
