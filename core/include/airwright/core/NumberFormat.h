#pragma once
// Locale-independent number text for messages, files and CLI output.

#include <string>

namespace Airwright::Core {

// Shortest text that reads back to the same double ("20", "0.5", "1e-07"); "nan"
// and "inf" are spelled out so a bad value is never hidden in a message.
std::string formatNumber(double value);

// Fixed number of decimals, locale-independent ("12.35").
std::string formatFixed(double value, int decimals);

} // namespace Airwright::Core
