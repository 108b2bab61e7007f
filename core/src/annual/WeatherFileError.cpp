#include "airwright/core/annual/WeatherFileError.h"

namespace Airwright::Core::Annual {

namespace {
std::string describe(const std::string& source, std::size_t line, std::size_t column, const std::string& message)
{
    std::string where = source;
    if (line > 0) {
        where += ", line " + std::to_string(line);
        if (column > 0)
            where += ", field " + std::to_string(column);
    }
    return where + ": " + message;
}
} // namespace

WeatherFileError::WeatherFileError(const std::string& source, std::size_t line, std::size_t column,
                                   const std::string& message)
    : InputError(describe(source, line, column, message)), m_source(source), m_line(line), m_column(column),
      m_detail(message)
{
}

} // namespace Airwright::Core::Annual
