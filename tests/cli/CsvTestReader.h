#pragma once
// A strict RFC 4180 reader for the tests, written apart from CsvWriter so that
// the writer is checked against the RFC rather than against itself: records end
// with CRLF, a quoted field may hold commas, CR, LF and doubled quotes, an
// unquoted field may hold none of them. Anything else fails the test.

#include <gtest/gtest.h>

#include <charconv>
#include <optional>
#include <string>
#include <string_view>
#include <system_error>
#include <vector>

namespace Airwright::Cli::Test {

using CsvRecord = std::vector<std::string>;

inline std::vector<CsvRecord> readCsv(std::string_view text)
{
    std::vector<CsvRecord> records;
    std::size_t i = 0;
    while (i < text.size()) {
        CsvRecord record;
        for (;;) {
            std::string field;
            if (i < text.size() && text[i] == '"') {
                ++i;
                for (;;) {
                    if (i >= text.size()) {
                        ADD_FAILURE() << "unterminated quoted field";
                        return records;
                    }
                    if (text[i] == '"') {
                        if (i + 1 < text.size() && text[i + 1] == '"') {
                            field += '"';
                            i += 2;
                            continue;
                        }
                        ++i;
                        break;
                    }
                    field += text[i++];
                }
            } else {
                while (i < text.size() && text[i] != ',' && text[i] != '\r') {
                    if (text[i] == '"' || text[i] == '\n') {
                        ADD_FAILURE() << "quote or bare LF in an unquoted field at offset " << i;
                        return records;
                    }
                    field += text[i++];
                }
            }
            record.push_back(field);
            if (i < text.size() && text[i] == ',') {
                ++i;
                continue;
            }
            if (text.substr(i, 2) == "\r\n") {
                i += 2;
                break;
            }
            ADD_FAILURE() << "record does not end with CRLF at offset " << i;
            return records;
        }
        records.push_back(record);
    }
    return records;
}

// The whole field as a decimal number (std::from_chars: locale-independent).
inline std::optional<double> csvNumber(const std::string& field)
{
    double value = 0.0;
    const auto [end, ec] = std::from_chars(field.data(), field.data() + field.size(), value);
    if (ec != std::errc() || end != field.data() + field.size() || field.empty())
        return std::nullopt;
    return value;
}

} // namespace Airwright::Cli::Test
