#pragma once

#include "IssueLog.h"
#include "JsonObjectReader.h"

#include <optional>
#include <string_view>

namespace Airwright::Core::Project {

// Text -> JSON. A syntax error is reported with its line and column (counted from
// 1, columns in bytes); a key given twice in one object is an error too, because
// the JSON library would silently keep only the last value.
class JsonDocumentParser {
public:
    static std::optional<Json> parse(std::string_view text, IssueLog& log);
};

} // namespace Airwright::Core::Project
