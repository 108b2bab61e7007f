#pragma once
// Builds EPW text for reader tests: the header of a hand-made file and one record
// per hour of a normal (8760 h) or leap (8784 h) year, with the used fields given
// as text so a test can put any value (or garbage) in any hour.

#include <array>
#include <functional>
#include <string>

namespace Airwright::Core::Annual::Test {

struct EpwFields {
    std::string dryBulb = "5.0";
    std::string dewPoint = "1.0";
    std::string relativeHumidity = "76";
    std::string pressure = "98000";
};

inline constexpr const char* kUnusedFields =
    "9999,9999,9999,9999,9999,9999,999999,999999,999999,9999,999,999,99,99,9999,99999,9,999999999,999,.999,999,99,"
    "999,999,99";

inline std::string epwHeader()
{
    return "LOCATION,Test Site (invented),Test Region,ZZ,hand-made,000000,50.00,10.00,1.0,200.0\n"
           "DESIGN CONDITIONS,0\n"
           "TYPICAL/EXTREME PERIODS,0\n"
           "GROUND TEMPERATURES,0\n"
           "HOLIDAYS/DAYLIGHT SAVINGS,No,0,0,0\n"
           "COMMENTS 1,Hand-made test file\n"
           "COMMENTS 2,\n"
           "DATA PERIODS,1,1,Data,Monday, 1/ 1,12/31\n";
}

// fieldsOf(index) gives the fields of hour index (0 = 1 January hour 1). With
// crlf every line ends in "\r\n".
inline std::string epwText(const std::function<EpwFields(std::size_t)>& fieldsOf, bool leapYear = false,
                           bool crlf = false)
{
    static constexpr std::array<int, 12> kDays = {31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31};
    std::string text = epwHeader();
    std::size_t index = 0;
    for (int month = 1; month <= 12; ++month) {
        const int days = kDays[static_cast<std::size_t>(month - 1)] + (leapYear && month == 2 ? 1 : 0);
        for (int day = 1; day <= days; ++day) {
            for (int hour = 1; hour <= 24; ++hour, ++index) {
                const EpwFields f = fieldsOf(index);
                text += (leapYear ? "2004," : "2001,") + std::to_string(month) + "," + std::to_string(day) + "," +
                        std::to_string(hour) + ",0,*," + f.dryBulb + "," + f.dewPoint + "," + f.relativeHumidity + "," +
                        f.pressure + "," + kUnusedFields + "\n";
            }
        }
    }
    if (!crlf)
        return text;
    std::string converted;
    converted.reserve(text.size() + text.size() / 50);
    for (char c : text) {
        if (c == '\n')
            converted += '\r';
        converted += c;
    }
    return converted;
}

inline std::string constantEpwText()
{
    return epwText([](std::size_t) { return EpwFields{}; });
}

// First line of the data records is line 9; hour index i sits on line 9 + i.
inline constexpr std::size_t kFirstDataLine = 9;

} // namespace Airwright::Core::Annual::Test
