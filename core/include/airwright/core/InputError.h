#pragma once
// Core's error types. Every error core throws derives from Airwright::Core::Error,
// so the UI and CLI boundaries catch one type and show what() as a plain message.

#include <stdexcept>
#include <string>

namespace Airwright::Core {

class Error : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

// A value outside what the physics or the model allows. The message names the
// quantity, the value given and the allowed range, e.g.
// "relative humidity 120 % is outside 0 .. 100 %".
class InputError : public Error {
public:
    InputError(std::string quantity, double value, std::string unit, std::string allowedRange);
    explicit InputError(const std::string& message);

    const std::string& quantity() const noexcept { return m_quantity; }

private:
    std::string m_quantity;
};

} // namespace Airwright::Core
