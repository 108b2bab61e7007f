#pragma once
// A weather or bin file that cannot be read. Carries where: line and column are
// 1-based, the column being the comma-separated field number. Line 0 means the
// file as a whole (cannot open, too large); column 0 means the whole line or
// record (a missing or surplus record, a blank line).

#include "airwright/core/InputError.h"

#include <cstddef>
#include <string>

namespace Airwright::Core::Annual {

class WeatherFileError : public InputError {
public:
    // what() reads "<source>, line L, field C: <message>".
    WeatherFileError(const std::string& source, std::size_t line, std::size_t column, const std::string& message);

    const std::string& source() const noexcept { return m_source; }
    std::size_t line() const noexcept { return m_line; }
    std::size_t column() const noexcept { return m_column; }
    const std::string& detail() const noexcept { return m_detail; }

private:
    std::string m_source;
    std::size_t m_line;
    std::size_t m_column;
    std::string m_detail;
};

} // namespace Airwright::Core::Annual
