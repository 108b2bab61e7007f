#pragma once

#include <cstddef>
#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace Airwright::Cli {

// The arguments of one command: declared options (--name VALUE or --name=VALUE),
// flags (--name) and positionals, checked in one pass. Every problem throws
// Core::InputError with a message naming the argument, which the application
// turns into exit code 2: commands never see a half-parsed command line.
//
// A value may start with a single dash ("--tdb -5"); a word starting with "--" is
// always an option, so "--tdb --rh 50" reports the missing value instead of
// taking "--rh" as the temperature. "--" ends the options.
class ArgumentList {
public:
    // Names are given without the leading dashes: addOption("tdb") accepts --tdb.
    ArgumentList& addOption(std::string name);
    ArgumentList& addFlag(std::string name);
    ArgumentList& allowPositionals(std::size_t maximum);

    void parse(const std::vector<std::string>& args);

    bool has(std::string_view name) const; // option or flag given
    std::optional<std::string> value(std::string_view name) const;
    // The option's value as a number (strict, see parseNumber); nullopt if absent.
    std::optional<double> number(std::string_view name) const;
    const std::vector<std::string>& positionals() const { return m_positionals; }

    // Locale-independent and strict: the whole text must be one finite decimal
    // number ("20", "-5.5", "1e3", "+3"); "", "20abc", "20,5", " 20", "nan" and "inf"
    // are rejected. `what` names the argument in the message, e.g. "--tdb".
    static double parseNumber(std::string_view text, std::string_view what);

private:
    enum class Kind { Option, Flag };
    const Kind* kindOf(std::string_view name) const;

    std::map<std::string, Kind, std::less<>> m_declared;
    std::size_t m_maxPositionals = 0;
    std::map<std::string, std::string, std::less<>> m_given; // flags map to ""
    std::vector<std::string> m_positionals;
};

} // namespace Airwright::Cli
