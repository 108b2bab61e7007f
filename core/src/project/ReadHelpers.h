#pragma once
// Small typed readers on top of JsonObjectReader that store into model fields.
// Each returns true when the field now holds a valid value (read, or the default
// because the key is absent), so cross-field checks run only on good values.

#include "FileNumber.h"
#include "JsonObjectReader.h"
#include "airwright/core/NumberFormat.h"

#include <initializer_list>
#include <optional>
#include <string>
#include <string_view>

namespace Airwright::Core::Project {

template <class Q>
bool readQuantity(JsonObjectReader& r, std::string_view key, Q& target, const FileUnit<Q>& unit, const Limits& limits,
                  Presence presence = Presence::Optional)
{
    const bool present = r.has(key);
    const auto value = r.number(key, presence, limits);
    if (value)
        target = unit.fromFile(*value);
    return value.has_value() || (!present && presence == Presence::Optional);
}

template <class Q>
bool readOptionalQuantity(JsonObjectReader& r, std::string_view key, std::optional<Q>& target, const FileUnit<Q>& unit,
                          const Limits& limits)
{
    const bool present = r.has(key);
    const auto value = r.number(key, Presence::Optional, limits);
    if (value)
        target = unit.fromFile(*value);
    return value.has_value() || !present;
}

inline bool readPlain(JsonObjectReader& r, std::string_view key, double& target, const Limits& limits)
{
    const bool present = r.has(key);
    const auto value = r.number(key, Presence::Optional, limits);
    if (value)
        target = *value;
    return value.has_value() || !present;
}

inline bool readInteger(JsonObjectReader& r, std::string_view key, int& target, int low, int high,
                        Presence presence = Presence::Optional)
{
    const bool present = r.has(key);
    const auto value = r.integer(key, presence, low, high);
    if (value)
        target = static_cast<int>(*value);
    return value.has_value() || (!present && presence == Presence::Optional);
}

inline bool readBoolean(JsonObjectReader& r, std::string_view key, bool& target)
{
    const bool present = r.has(key);
    const auto value = r.boolean(key, Presence::Optional);
    if (value)
        target = *value;
    return value.has_value() || !present;
}

template <class E>
bool readEnum(JsonObjectReader& r, std::string_view key, E& target, const char* what, std::initializer_list<E> all,
              const char* (*toKey)(E), std::optional<E> (*fromKey)(std::string_view),
              Presence presence = Presence::Optional)
{
    const bool present = r.has(key);
    const auto text = r.string(key, presence);
    if (!text)
        return !present && presence == Presence::Optional;
    const auto value = fromKey(*text);
    if (!value) {
        std::string allowed;
        for (E e : all)
            allowed += (allowed.empty() ? "" : ", ") + std::string(toKey(e));
        r.error(key, std::string("unknown ") + what + " '" + *text + "' (allowed: " + allowed + ")");
        return false;
    }
    target = *value;
    return true;
}

// A value for a message, in the file's unit and as short as it was written.
template <class Q> std::string fileText(Q value, const FileUnit<Q>& unit)
{
    return formatNumber(exactFileNumber(value, unit));
}

} // namespace Airwright::Core::Project
