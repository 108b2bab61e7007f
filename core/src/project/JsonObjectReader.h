#pragma once
// Typed, path-aware access to one JSON object of a project file. Every problem
// (missing key, wrong JSON type, value out of range) goes to the IssueLog with the
// key's path, and the accessor returns nullopt so the caller keeps its default and
// carries on: one read reports everything. Keys never asked for are reported as
// unknown (warnings) by reportUnknownKeys().

#include "IssueLog.h"

#include <nlohmann/json.hpp>

#include <optional>
#include <set>
#include <string>
#include <string_view>

namespace Airwright::Core::Project {

using Json = nlohmann::ordered_json;

enum class Presence { Required, Optional };

// Allowed range of a number in the file's unit; open ends exclude the bound.
struct Limits {
    double low;
    double high;
    bool lowOpen = false;
    bool highOpen = false;

    bool contains(double value) const;
    // "120 is outside 0 .. 100", "must be positive", ...
    std::string describeViolation(double value) const;
};

const char* jsonTypeName(const Json& value);
std::string childPath(const std::string& parent, std::string_view key);
std::string indexPath(const std::string& parent, std::size_t index);

class JsonObjectReader {
public:
    // `object` must be a JSON object and outlive the reader.
    JsonObjectReader(const Json& object, std::string path, IssueLog& log);

    const std::string& path() const { return m_path; }
    std::string pathOf(std::string_view key) const { return childPath(m_path, key); }
    IssueLog& log() { return m_log; }
    void error(std::string_view key, std::string message) { m_log.error(pathOf(key), std::move(message)); }

    bool has(std::string_view key) const;
    // The raw value, marking the key as known; reports a missing required key.
    const Json* take(std::string_view key, Presence presence);

    std::optional<double> number(std::string_view key, Presence presence, const Limits& limits);
    std::optional<long long> integer(std::string_view key, Presence presence, long long low, long long high);
    std::optional<bool> boolean(std::string_view key, Presence presence);
    std::optional<std::string> string(std::string_view key, Presence presence);
    const Json* object(std::string_view key, Presence presence);
    const Json* array(std::string_view key, Presence presence);

    // Marks every key as known without reading it (a part that could not be read
    // at all, such as a section of an unknown type, gets no unknown-key warnings).
    void takeAll();
    void reportUnknownKeys();

private:
    const Json* typed(std::string_view key, Presence presence, bool (Json::*test)() const noexcept,
                      const char* expected);

    const Json& m_object;
    std::string m_path;
    IssueLog& m_log;
    std::set<std::string, std::less<>> m_taken;
};

} // namespace Airwright::Core::Project
