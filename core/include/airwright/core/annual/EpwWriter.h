#pragma once
// Writes a WeatherYear as an EPW file (format as in EpwReader.h) that EpwReader
// reads back. Values are written with one decimal (temperatures, C), whole
// percent (relative humidity) and whole pascals, as EPW files usually carry them.
// Fields this program does not model (radiation, wind, sky, precipitation) are
// written as the data dictionary's missing codes. Design conditions, typical
// periods and ground temperatures are written as empty (count 0).

#include "airwright/core/annual/WeatherYear.h"

#include <ostream>
#include <string>

namespace Airwright::Core::Annual {

class EpwWriter {
public:
    // calendarYear goes into the year field of every record; 0 picks 2001 for a
    // normal year and 2004 for a leap year. The DATA PERIODS start weekday is
    // that of 1 January of calendarYear. Comments must be single-line; site text
    // fields must not contain commas (InputError otherwise).
    static void write(const WeatherYear& year, std::ostream& out, const std::string& comment1 = {},
                      const std::string& comment2 = {}, int calendarYear = 0);
};

} // namespace Airwright::Core::Annual
