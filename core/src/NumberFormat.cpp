#include "airwright/core/NumberFormat.h"

#include <array>
#include <charconv>
#include <cmath>

namespace Airwright::Core {

std::string formatNumber(double value)
{
    if (std::isnan(value))
        return "nan";
    if (std::isinf(value))
        return value > 0 ? "inf" : "-inf";
    std::array<char, 64> buffer{};
    auto [end, ec] = std::to_chars(buffer.data(), buffer.data() + buffer.size(), value);
    if (ec != std::errc())
        return "?";
    return std::string(buffer.data(), end);
}

std::string formatFixed(double value, int decimals)
{
    if (!std::isfinite(value))
        return formatNumber(value);
    std::array<char, 64> buffer{};
    auto [end, ec] = std::to_chars(buffer.data(), buffer.data() + buffer.size(), value,
                                   std::chars_format::fixed, decimals);
    if (ec != std::errc())
        return "?";
    std::string text(buffer.data(), end);
    if (text.find_first_not_of("-0.") == std::string::npos && text.front() == '-')
        text.erase(0, 1); // "-0.00" reads as a sign error on a schedule
    return text;
}

} // namespace Airwright::Core
