#pragma once
// Internal text helpers shared by the weather and bin readers: line and field
// splitting and locale-independent number parsing (std::from_chars).

#include <cstddef>
#include <istream>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace Airwright::Core::Annual::TextFields {

// Lines split on '\n' with a trailing '\r' removed (CRLF files) and a leading
// UTF-8 byte order mark dropped. A final newline does not make an extra line.
std::vector<std::string_view> splitLines(std::string_view text);

// Comma-separated fields, not trimmed; "a,,b" has three fields, "" has one.
std::vector<std::string_view> splitFields(std::string_view line);

std::string_view trim(std::string_view text);
bool equalsIgnoringCase(std::string_view a, std::string_view b);
bool startsWithIgnoringCase(std::string_view text, std::string_view prefix);

// The whole trimmed field as a finite number; a leading '+' is accepted. Nothing
// for empty text, trailing characters, "nan" or "inf".
std::optional<double> parseNumber(std::string_view field);
std::optional<long long> parseInteger(std::string_view field);

// Reads all of in, or nothing: returns no value when more than maxBytes are there.
std::optional<std::string> readAtMost(std::istream& in, std::size_t maxBytes);

// Shortens text for quoting in a message.
std::string quote(std::string_view field);

} // namespace Airwright::Core::Annual::TextFields
