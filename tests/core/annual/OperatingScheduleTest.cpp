#include "airwright/core/annual/OperatingSchedule.h"
#include "airwright/core/InputError.h"

#include <gtest/gtest.h>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;

namespace {

std::size_t countMode(const OperatingSchedule& s, OperatingMode mode, std::size_t hours = 8760)
{
    std::size_t n = 0;
    for (std::size_t i = 0; i < hours; ++i)
        n += s.modeAt(i, hours) == mode ? 1 : 0;
    return n;
}

} // namespace

TEST(AnnualOperatingSchedule, ContinuousOperationRunsEveryHour)
{
    const OperatingSchedule s;
    // Hand calculation: 24 h x 365 d = 8760 h.
    EXPECT_EQ(countMode(s, OperatingMode::Normal), 8760u);
    EXPECT_NEAR(s.share(OperatingMode::Normal, 8760), 1.0, 1e-12);
}

TEST(AnnualOperatingSchedule, OfficeWeekWithHolidays)
{
    OperatingSchedule s;
    s.hoursPerDay = 12;
    s.firstHour = 6;
    s.daysPerWeek = 5;
    s.holidayWeeks = 4;
    // Hand calculation, a year starting on a Monday: 52 weeks and one day (a
    // Monday) give 52 x 5 + 1 = 261 working days; 2 holiday weeks at the end of
    // the year and 2 from day 210 remove 4 x 5 = 20 (any 7 consecutive days hold 5
    // working days): 241 days x 12 h = 2892 h.
    EXPECT_EQ(countMode(s, OperatingMode::Normal), 2892u);
    EXPECT_EQ(countMode(s, OperatingMode::Off), 8760u - 2892u);
    EXPECT_NEAR(s.share(OperatingMode::Normal, 8760), 2892.0 / 8760.0, 1e-12);
    // Hour index 6 (06:00 .. 07:00, Monday 1 January) runs; hour 5 does not; hour
    // 18 (18:00) is the first after the 12-hour period.
    EXPECT_EQ(s.modeAt(6, 8760), OperatingMode::Normal);
    EXPECT_EQ(s.modeAt(5, 8760), OperatingMode::Off);
    EXPECT_EQ(s.modeAt(18, 8760), OperatingMode::Off);
    // Day 5 is Saturday.
    EXPECT_EQ(s.modeAt(5 * 24 + 8, 8760), OperatingMode::Off);
    // Day 206 (206 % 7 = 3, a Thursday) is a working day; day 211 (a Tuesday) lies
    // in the summer holiday weeks, days 210 .. 223.
    EXPECT_EQ(s.modeAt(206 * 24 + 8, 8760), OperatingMode::Normal);
    EXPECT_EQ(s.modeAt(211 * 24 + 8, 8760), OperatingMode::Off);
}

TEST(AnnualOperatingSchedule, NightPeriodBelongsToTheDayItStarts)
{
    OperatingSchedule s;
    s.hoursPerDay = 4;
    s.firstHour = 22;
    s.daysPerWeek = 5;
    s.offHours = OffHoursMode::Setback;
    // Friday (day 4) 22:00 starts a period running to Saturday 02:00: Saturday
    // 00:00 .. 01:00 still runs; Saturday 22:00 does not.
    EXPECT_EQ(s.modeAt(4 * 24 + 22, 8760), OperatingMode::Normal);
    EXPECT_EQ(s.modeAt(5 * 24 + 0, 8760), OperatingMode::Normal);
    EXPECT_EQ(s.modeAt(5 * 24 + 22, 8760), OperatingMode::Setback);
    // Hand calculation: every working day contributes 4 hours, the 261 working
    // days (see above) give 1044 h; the first hours of 1 January belong to the
    // previous year's last day (a Monday in a year starting on a Monday, so they
    // run) and the last day's period runs past the end of the year (2 h lost).
    EXPECT_EQ(countMode(s, OperatingMode::Normal), 1044u);
}

struct ScheduleRow {
    const char* what;
    OperatingSchedule schedule;
    bool valid;
};

class AnnualOperatingScheduleValidation : public ::testing::TestWithParam<ScheduleRow> {};

TEST_P(AnnualOperatingScheduleValidation, ChecksRanges)
{
    const auto& row = GetParam();
    if (row.valid)
        EXPECT_NO_THROW(row.schedule.validate()) << row.what;
    else
        EXPECT_THROW(row.schedule.validate(), InputError) << row.what;
}

OperatingSchedule with(void (*edit)(OperatingSchedule&))
{
    OperatingSchedule s;
    edit(s);
    return s;
}

INSTANTIATE_TEST_SUITE_P(
    Rows, AnnualOperatingScheduleValidation,
    ::testing::Values(ScheduleRow{"defaults", OperatingSchedule{}, true},
                      ScheduleRow{"one hour a day", with([](OperatingSchedule& s) { s.hoursPerDay = 1; }), true},
                      ScheduleRow{"no hours", with([](OperatingSchedule& s) { s.hoursPerDay = 0; }), false},
                      ScheduleRow{"25 hours", with([](OperatingSchedule& s) { s.hoursPerDay = 25; }), false},
                      ScheduleRow{"first hour 24", with([](OperatingSchedule& s) { s.firstHour = 24; }), false},
                      ScheduleRow{"first hour -1", with([](OperatingSchedule& s) { s.firstHour = -1; }), false},
                      ScheduleRow{"no days", with([](OperatingSchedule& s) { s.daysPerWeek = 0; }), false},
                      ScheduleRow{"8 days", with([](OperatingSchedule& s) { s.daysPerWeek = 8; }), false},
                      ScheduleRow{"52 holiday weeks", with([](OperatingSchedule& s) { s.holidayWeeks = 52; }), true},
                      ScheduleRow{"53 holiday weeks", with([](OperatingSchedule& s) { s.holidayWeeks = 53; }), false},
                      ScheduleRow{"weekday 7", with([](OperatingSchedule& s) { s.firstWeekday = 7; }), false},
                      ScheduleRow{"setback 4 %", with([](OperatingSchedule& s) { s.setbackAirflow = percent(4.0); }),
                                  false},
                      ScheduleRow{"setback 101 %",
                                  with([](OperatingSchedule& s) { s.setbackAirflow = percent(101.0); }), false},
                      ScheduleRow{"setback 11 K",
                                  with([](OperatingSchedule& s) { s.setbackTemperature = kelvinDifference(11.0); }),
                                  false},
                      ScheduleRow{"setback -1 K",
                                  with([](OperatingSchedule& s) { s.setbackTemperature = kelvinDifference(-1.0); }),
                                  false}));

TEST(AnnualOperatingSchedule, OffHoursKeys)
{
    EXPECT_EQ(offHoursModeFromKey("off"), OffHoursMode::Off);
    EXPECT_EQ(offHoursModeFromKey("setback"), OffHoursMode::Setback);
    EXPECT_FALSE(offHoursModeFromKey("night"));
    EXPECT_STREQ(offHoursModeKey(OffHoursMode::Setback), "setback");
}
