#include "airwright/core/InputError.h"

#include "airwright/core/NumberFormat.h"

namespace Airwright::Core {

namespace {
std::string describe(const std::string& quantity, double value, const std::string& unit, const std::string& range)
{
    std::string text = quantity + " " + formatNumber(value);
    if (!unit.empty())
        text += " " + unit;
    text += " is outside the allowed range " + range;
    return text;
}
} // namespace

InputError::InputError(std::string quantity, double value, std::string unit, std::string allowedRange)
    : Error(describe(quantity, value, unit, allowedRange)), m_quantity(std::move(quantity))
{
}

InputError::InputError(const std::string& message) : Error(message) {}

} // namespace Airwright::Core
