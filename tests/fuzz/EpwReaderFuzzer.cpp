// libFuzzer harness: EpwReader::readText on arbitrary bytes. A WeatherFileError
// is the documented answer to a bad file (InputError for an option out of range,
// which the default options never are); anything else is a finding.

#include "airwright/core/annual/EpwReader.h"
#include "airwright/core/annual/WeatherFileError.h"

#include <cstddef>
#include <cstdint>
#include <string_view>

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size)
{
    const std::string_view text(reinterpret_cast<const char*>(data), size);
    try {
        const Airwright::Core::Annual::EpwReader reader;
        reader.readText(text, "fuzz.epw");
    } catch (const Airwright::Core::Annual::WeatherFileError&) {
    }
    return 0;
}
