#include "FileNumber.h"

#include <array>
#include <charconv>
#include <cmath>
#include <cstdint>
#include <limits>

namespace Airwright::Core::Project {

double shortestExactNumber(double approximate, const std::function<bool(double)>& readsBack)
{
    if (!std::isfinite(approximate))
        return approximate;
    std::array<char, 64> buffer{};
    for (int precision = 1; precision <= std::numeric_limits<double>::max_digits10; ++precision) {
        const auto written = std::to_chars(buffer.data(), buffer.data() + buffer.size(), approximate,
                                           std::chars_format::general, precision);
        double candidate = 0.0;
        const auto read = std::from_chars(buffer.data(), written.ptr, candidate);
        if (read.ec == std::errc() && readsBack(candidate))
            return candidate;
    }
    // The conversion may land a few units in the last place away from the decimal
    // that was entered; look at the neighbours.
    double up = approximate;
    double down = approximate;
    for (int step = 0; step < 16; ++step) {
        up = std::nextafter(up, std::numeric_limits<double>::infinity());
        down = std::nextafter(down, -std::numeric_limits<double>::infinity());
        if (readsBack(up))
            return up;
        if (readsBack(down))
            return down;
    }
    return approximate;
}

nlohmann::ordered_json numberJson(double value)
{
    // 2^53: every whole double up to here is exactly an int64.
    constexpr double kExactIntegerLimit = 9007199254740992.0;
    if (std::isfinite(value) && std::trunc(value) == value && std::fabs(value) < kExactIntegerLimit &&
        !(value == 0.0 && std::signbit(value)))
        return static_cast<std::int64_t>(value);
    return value;
}

} // namespace Airwright::Core::Project
