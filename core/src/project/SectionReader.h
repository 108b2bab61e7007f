#pragma once

#include "IssueLog.h"
#include "JsonObjectReader.h"
#include "airwright/core/chain/Section.h"

#include <optional>
#include <string>
#include <string_view>

namespace Airwright::Core::Project {

enum class PathSide { Supply, Extract };

// Reads one SECTION object of a path. Returns nullopt when the section cannot be
// built at all (not an object, unknown type); every problem is in the log.
class SectionReader {
public:
    static std::optional<Chain::Section> read(const Json& value, const std::string& path, PathSide side, IssueLog& log);
    // "damper, filter, ..." for messages and docs.
    static std::string knownTypes();
};

} // namespace Airwright::Core::Project
