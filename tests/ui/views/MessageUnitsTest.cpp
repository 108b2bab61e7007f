// Numbers with units inside findings follow the unit system. The IP figures
// below come from the conversion factors of NIST Special Publication 811 (2008),
// appendix B.8 and B.9, worked by hand and rounded as UnitSystem rounds them.

#include "airwright/ui/UnitSystem.h"
#include "airwright/ui/views/MessageUnits.h"

#include <gtest/gtest.h>

#include <ostream>

namespace Airwright::Ui {
namespace {

struct MessageRow {
    const char* name;
    bool ip;
    const char* message;  // as core writes it (SI)
    const char* expected; // as the findings view shows it
};

std::ostream& operator<<(std::ostream& os, const MessageRow& row)
{
    return os << row.name;
}

class MessageUnitsTest : public ::testing::TestWithParam<MessageRow> {};

TEST_P(MessageUnitsTest, RewritesEveryNumberWithAUnit)
{
    const MessageRow& row = GetParam();
    UnitSystem units;
    units.setSystem(row.ip ? UnitSystem::System::IP : UnitSystem::System::SI);
    EXPECT_EQ(MessageUnits::toDisplay(QString::fromUtf8(row.message), units).toStdString(), std::string(row.expected));
}

INSTANTIATE_TEST_SUITE_P(
    Findings, MessageUnitsTest,
    ::testing::Values(
        // SI: the plain-text "C" of core gets its degree sign (ISO 80000-5 writes °C).
        MessageRow{"si_celsius", false, "air reaches this water coil at 1.9 C: protect it",
                   "air reaches this water coil at 1.9 °C: protect it"},
        MessageRow{"si_airflow", false, "design flow 9000 m3/h", "design flow 9000 m³/h"},
        // 1 MWh = 3.412142 MMBtu (1 Btu = 1055.056 J, NIST SP 811).
        MessageRow{"si_energy_a_year", false, "saves 233.6 MWh/a delivered energy", "saves 233.6 MWh/a delivered energy"},
        MessageRow{"ip_energy_a_year", true, "saves 233.6 MWh/a delivered energy", "saves 797.1 MMBtu/a delivered energy"},
        MessageRow{"ip_energy", true, "gives up 13.9 MWh in 655 frost hours", "gives up 47.4 MMBtu in 655 frost hours"},
        MessageRow{"si_pressure_unchanged", false, "final drop 250 Pa reached", "final drop 250 Pa reached"},
        // NIST SP 811 B.9: t/°F = 1.8 t/°C + 32; 1.9 -> 35.42, -12.0 -> 10.4.
        MessageRow{"ip_celsius", true, "air reaches this water coil at 1.9 C: protect it",
                   "air reaches this water coil at 35.4 °F: protect it"},
        MessageRow{"ip_negative_before_words", true, "bypass at -12.0 C outdoor air", "bypass at 10.4 °F outdoor air"},
        // A temperature difference scales without the offset: 5 K = 9 °F.
        MessageRow{"ip_difference", true, "approach 5 K", "approach 9.0 °F"},
        // NIST SP 811 B.8: inch of water, conventional = 249.0889 Pa; 120 Pa = 0.4818.
        MessageRow{"ip_pressure", true, "drop 120 Pa)", "drop 0.48 in. w.g.)"},
        // B.8: Btu_IT/h = 0.2930711 W; 51.0 kW = 174019.2 Btu/h.
        MessageRow{"ip_power", true, "51.0 kW is not enough", "174019 Btu/h is not enough"},
        // B.8: cfm = 4.719474e-4 m3/s; 9000 m3/h = 2.5 m3/s = 5297.2 cfm.
        MessageRow{"ip_airflow", true, "design flow 9000 m3/h.", "design flow 5297 cfm."},
        // B.8: ft/min = 5.08e-3 m/s; 2.5 m/s = 492.1 fpm.
        MessageRow{"ip_velocity", true, "above about 2.5 m/s condensate", "above about 492 fpm condensate"},
        // 7000 grains per pound (definition of the grain): 30 g/kg = 210 gr/lb; both
        // ends of a range convert.
        MessageRow{"ip_range", true, "is outside 0 .. 30 g/kg", "is outside 0.0 .. 210.0 gr/lb"},
        // Left as written: compound units, kPa, numbers without a unit, a unit letter
        // that begins a word or a code, digits inside a regulation's number.
        MessageRow{"sfp_compound", true, "SFP 1600 W/(m3/s) above the limit", "SFP 1600 W/(m3/s) above the limit"},
        MessageRow{"kilopascal", true, "site pressure 98.4 kPa", "site pressure 98.4 kPa"},
        MessageRow{"regulation", true, "Regulation (EU) No 1253/2014 applies", "Regulation (EU) No 1253/2014 applies"},
        MessageRow{"code_letter", true, "section C12 at 3 Kelvin steps", "section C12 at 3 Kelvin steps"},
        MessageRow{"no_number", true, "no recovery: C is missing", "no recovery: C is missing"},
        MessageRow{"empty", true, "", ""}));

} // namespace
} // namespace Airwright::Ui
