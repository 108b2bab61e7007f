#pragma once
// Reads the open EnergyPlus weather format (EPW), as specified in "EnergyPlus
// Weather File (EPW) Data Dictionary", EnergyPlus Auxiliary Programs, chapter
// Weather Converter Program (EnergyPlus v24.1 documentation).
//
// Layout: eight header records (LOCATION, DESIGN CONDITIONS, TYPICAL/EXTREME
// PERIODS, GROUND TEMPERATURES, HOLIDAYS/DAYLIGHT SAVINGS, COMMENTS 1, COMMENTS 2,
// DATA PERIODS), then one data record per hour with 35 comma-separated fields:
// year, month, day, hour (1 .. 24, hour 1 = 00:00 .. 01:00), minute, data source
// flags, dry bulb C (field 7), dew point C (8), relative humidity % (9), station
// pressure Pa (10), then radiation, wind, sky and precipitation fields that this
// reader does not use (they are neither parsed nor checked).
//
// What is checked, each failure a WeatherFileError with line and field:
//  - header keywords in order; LOCATION with 10 fields and latitude -90 .. 90,
//    longitude -180 .. 180, time zone -12 .. 12 h, elevation -1000 .. < 9999.9 m;
//    DATA PERIODS with one period and one record per hour (other layouts refused);
//  - every data record has 35 fields, numeric where used, dates in calendar order
//    from 1 January hour 1 to 31 December hour 24 (29 February allowed, making a
//    leap year of 8784 hours);
//  - ranges from the data dictionary: dry bulb and dew point > -70 and < 70 C,
//    relative humidity 0 .. 110 %, pressure > 31000 and < 120000 Pa;
//  - dew point not above dry bulb by more than EpwReadOptions::dewPointTolerance.
// Missing values follow the rule in EpwReadOptions.h.
//
// Humidity ratio comes from the dew point and station pressure; where the dew
// point is missing, from the relative humidity (capped at 100 %); where both are
// missing, the humidity ratio is interpolated like any other quantity.
//
// Parsing is locale-independent (std::from_chars), accepts LF or CRLF line ends
// and a UTF-8 byte order mark, ignores blank lines at the end of the file and
// refuses input above EpwReadOptions::maxBytes.

#include "airwright/core/annual/EpwReadOptions.h"
#include "airwright/core/annual/EpwReadResult.h"

#include <filesystem>
#include <istream>
#include <string>
#include <string_view>

namespace Airwright::Core::Annual {

class EpwReader {
public:
    explicit EpwReader(EpwReadOptions options = {});

    EpwReadResult readFile(const std::filesystem::path& path) const;
    // sourceName is only used in error messages.
    EpwReadResult readStream(std::istream& in, const std::string& sourceName = "EPW input") const;
    EpwReadResult readText(std::string_view text, const std::string& sourceName = "EPW input") const;

private:
    EpwReadOptions m_options;
};

} // namespace Airwright::Core::Annual
