#pragma once
// Comma-separated text as RFC 4180 describes it: CRLF after every record, a field
// quoted when it holds a comma, a double quote, CR or LF, quotes inside doubled.
// Numbers are written locale-independently with the fewest digits that read back
// to the same double (std::to_chars), so a spreadsheet or script gets exactly the
// computed value.

#include <string>
#include <string_view>

namespace Airwright::Cli {

class CsvWriter {
public:
    CsvWriter& text(std::string_view field);
    // Throws std::runtime_error for NaN or infinity: output never carries them.
    CsvWriter& number(double value);
    CsvWriter& empty();
    void endRow();

    const std::string& str() const { return m_text; }

    static std::string quote(std::string_view field); // the field as it appears in the file

private:
    void separate();

    std::string m_text;
    bool m_rowStarted = false;
};

} // namespace Airwright::Cli
