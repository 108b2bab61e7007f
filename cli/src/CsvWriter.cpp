#include "airwright/cli/CsvWriter.h"

#include "airwright/core/NumberFormat.h"

#include <cmath>
#include <stdexcept>

namespace Airwright::Cli {

std::string CsvWriter::quote(std::string_view field)
{
    if (field.find_first_of(",\"\r\n") == std::string_view::npos)
        return std::string(field);
    std::string out = "\"";
    for (const char c : field) {
        if (c == '"')
            out += '"';
        out += c;
    }
    out += '"';
    return out;
}

void CsvWriter::separate()
{
    if (m_rowStarted)
        m_text += ',';
    m_rowStarted = true;
}

CsvWriter& CsvWriter::text(std::string_view field)
{
    separate();
    m_text += quote(field);
    return *this;
}

CsvWriter& CsvWriter::number(double value)
{
    if (!std::isfinite(value))
        throw std::runtime_error("a non-finite number cannot be written to CSV");
    separate();
    m_text += Core::formatNumber(value);
    return *this;
}

CsvWriter& CsvWriter::empty()
{
    separate();
    return *this;
}

void CsvWriter::endRow()
{
    m_text += "\r\n";
    m_rowStarted = false;
}

} // namespace Airwright::Cli
