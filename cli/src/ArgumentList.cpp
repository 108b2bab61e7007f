#include "airwright/cli/ArgumentList.h"

#include "airwright/core/InputError.h"

#include <charconv>
#include <cmath>
#include <system_error>

namespace Airwright::Cli {

using Core::InputError;

ArgumentList& ArgumentList::addOption(std::string name)
{
    m_declared[std::move(name)] = Kind::Option;
    return *this;
}

ArgumentList& ArgumentList::addFlag(std::string name)
{
    m_declared[std::move(name)] = Kind::Flag;
    return *this;
}

ArgumentList& ArgumentList::allowPositionals(std::size_t maximum)
{
    m_maxPositionals = maximum;
    return *this;
}

const ArgumentList::Kind* ArgumentList::kindOf(std::string_view name) const
{
    const auto it = m_declared.find(name);
    return it == m_declared.end() ? nullptr : &it->second;
}

void ArgumentList::parse(const std::vector<std::string>& args)
{
    m_given.clear();
    m_positionals.clear();
    bool optionsEnded = false;
    for (std::size_t i = 0; i < args.size(); ++i) {
        const std::string& arg = args[i];
        if (optionsEnded || arg.size() < 2 || arg.compare(0, 2, "--") != 0) {
            if (m_positionals.size() >= m_maxPositionals)
                throw InputError("unexpected argument '" + arg + "'");
            m_positionals.push_back(arg);
            continue;
        }
        if (arg == "--") {
            optionsEnded = true;
            continue;
        }
        const auto equals = arg.find('=');
        const std::string name = arg.substr(2, equals == std::string::npos ? std::string::npos : equals - 2);
        const Kind* kind = kindOf(name);
        if (name.empty() || kind == nullptr)
            throw InputError("unknown option '" + arg.substr(0, equals) + "'");
        if (m_given.count(name) != 0)
            throw InputError("option --" + name + " is given more than once");
        if (*kind == Kind::Flag) {
            if (equals != std::string::npos)
                throw InputError("option --" + name + " takes no value");
            m_given.emplace(name, std::string());
            continue;
        }
        if (equals != std::string::npos) {
            m_given.emplace(name, arg.substr(equals + 1));
            continue;
        }
        if (i + 1 >= args.size() || args[i + 1].compare(0, 2, "--") == 0)
            throw InputError("option --" + name + " needs a value");
        m_given.emplace(name, args[++i]);
    }
}

bool ArgumentList::has(std::string_view name) const
{
    return m_given.find(name) != m_given.end();
}

std::optional<std::string> ArgumentList::value(std::string_view name) const
{
    const auto it = m_given.find(name);
    if (it == m_given.end())
        return std::nullopt;
    return it->second;
}

std::optional<double> ArgumentList::number(std::string_view name) const
{
    const auto text = value(name);
    if (!text)
        return std::nullopt;
    return parseNumber(*text, "--" + std::string(name));
}

double ArgumentList::parseNumber(std::string_view text, std::string_view what)
{
    const auto fail = [&]() -> InputError {
        return InputError(std::string(what) + " expects a number (like 20 or -5.5), got '" + std::string(text) + "'");
    };
    std::string_view digits = text;
    // from_chars takes no '+'; allow one in front of a digit or point, nothing more.
    if (digits.size() > 1 && digits.front() == '+' && digits[1] != '-' && digits[1] != '+')
        digits.remove_prefix(1);
    if (digits.empty())
        throw fail();
    double result = 0.0;
    const char* const end = digits.data() + digits.size();
    const auto [ptr, ec] = std::from_chars(digits.data(), end, result, std::chars_format::general);
    if (ec != std::errc() || ptr != end || !std::isfinite(result))
        throw fail();
    return result;
}

} // namespace Airwright::Cli
