#include "JsonObjectReader.h"

#include "airwright/core/NumberFormat.h"

#include <cmath>

namespace Airwright::Core::Project {

namespace {
// Whole numbers in full ("1000000", not "1e+06"): limits are read by people.
std::string plain(double value)
{
    if (std::isfinite(value) && std::trunc(value) == value && std::fabs(value) < 1.0e15)
        return std::to_string(static_cast<long long>(value));
    return formatNumber(value);
}
} // namespace

bool Limits::contains(double value) const
{
    const bool aboveLow = lowOpen ? value > low : value >= low;
    const bool belowHigh = highOpen ? value < high : value <= high;
    return aboveLow && belowHigh; // false for NaN
}

std::string Limits::describeViolation(double value) const
{
    if (lowOpen && low == 0.0 && value <= 0.0)
        return "must be positive";
    if (!lowOpen && !highOpen)
        return plain(value) + " is outside " + plain(low) + " .. " + plain(high);
    return plain(value) + " is outside the allowed range " + (lowOpen ? "above " : "") + plain(low) + " .. " +
           (highOpen ? "below " : "") + plain(high);
}

const char* jsonTypeName(const Json& value)
{
    switch (value.type()) {
    case Json::value_t::null:
        return "null";
    case Json::value_t::object:
        return "an object";
    case Json::value_t::array:
        return "an array";
    case Json::value_t::string:
        return "a string";
    case Json::value_t::boolean:
        return "true/false";
    case Json::value_t::number_integer:
    case Json::value_t::number_unsigned:
    case Json::value_t::number_float:
        return "a number";
    case Json::value_t::binary:
    case Json::value_t::discarded:
        break;
    }
    return "an unsupported value";
}

std::string childPath(const std::string& parent, std::string_view key)
{
    if (parent.empty())
        return std::string(key);
    return parent + "." + std::string(key);
}

std::string indexPath(const std::string& parent, std::size_t index)
{
    return parent + "[" + std::to_string(index) + "]";
}

JsonObjectReader::JsonObjectReader(const Json& object, std::string path, IssueLog& log)
    : m_object(object), m_path(std::move(path)), m_log(log)
{
}

bool JsonObjectReader::has(std::string_view key) const
{
    return m_object.contains(key);
}

const Json* JsonObjectReader::take(std::string_view key, Presence presence)
{
    m_taken.emplace(key);
    const auto found = m_object.find(key);
    if (found == m_object.end()) {
        if (presence == Presence::Required)
            error(key, "required key missing");
        return nullptr;
    }
    return &*found;
}

const Json* JsonObjectReader::typed(std::string_view key, Presence presence, bool (Json::*test)() const noexcept,
                                    const char* expected)
{
    const Json* value = take(key, presence);
    if (!value)
        return nullptr;
    if (!(value->*test)()) {
        error(key, std::string("must be ") + expected + ", got " + jsonTypeName(*value));
        return nullptr;
    }
    return value;
}

std::optional<double> JsonObjectReader::number(std::string_view key, Presence presence, const Limits& limits)
{
    const Json* value = typed(key, presence, &Json::is_number, "a number");
    if (!value)
        return std::nullopt;
    const double number = value->get<double>();
    if (!limits.contains(number)) {
        error(key, limits.describeViolation(number));
        return std::nullopt;
    }
    return number;
}

std::optional<long long> JsonObjectReader::integer(std::string_view key, Presence presence, long long low,
                                                   long long high)
{
    const Json* value = typed(key, presence, &Json::is_number, "a number");
    if (!value)
        return std::nullopt;
    const double number = value->get<double>();
    if (std::trunc(number) != number) {
        error(key, "must be a whole number, got " + formatNumber(number));
        return std::nullopt;
    }
    const Limits limits{static_cast<double>(low), static_cast<double>(high)};
    if (!limits.contains(number)) {
        error(key, limits.describeViolation(number));
        return std::nullopt;
    }
    return static_cast<long long>(number);
}

std::optional<bool> JsonObjectReader::boolean(std::string_view key, Presence presence)
{
    const Json* value = typed(key, presence, &Json::is_boolean, "true or false");
    if (!value)
        return std::nullopt;
    return value->get<bool>();
}

std::optional<std::string> JsonObjectReader::string(std::string_view key, Presence presence)
{
    const Json* value = typed(key, presence, &Json::is_string, "a string");
    if (!value)
        return std::nullopt;
    return value->get<std::string>();
}

const Json* JsonObjectReader::object(std::string_view key, Presence presence)
{
    return typed(key, presence, &Json::is_object, "an object");
}

const Json* JsonObjectReader::array(std::string_view key, Presence presence)
{
    return typed(key, presence, &Json::is_array, "an array");
}

void JsonObjectReader::takeAll()
{
    for (const auto& item : m_object.items())
        m_taken.insert(item.key());
}

void JsonObjectReader::reportUnknownKeys()
{
    for (const auto& item : m_object.items()) {
        if (!m_taken.contains(item.key()))
            m_log.warning(pathOf(item.key()), "unknown key, ignored");
    }
}

} // namespace Airwright::Core::Project
