#include "airwright/ui/UnitSystem.h"

#include <QLocale>

#include <gtest/gtest.h>

#include <algorithm>
#include <cctype>
#include <cmath>
#include <string>
#include <tuple>

namespace Airwright::Ui {
namespace {

using Kind = UnitSystem::Kind;

// Conversion factors to SI as tabulated in NIST Special Publication 811 (2008
// edition), "Guide for the Use of the International System of Units",
// appendix B.8 (factors for units listed alphabetically) and B.9 (temperature).
// Seven significant digits as printed there; the relative tolerance below is set
// to the last printed digit.
constexpr double kNistInchOfWaterConventional = 249.0889;     // Pa, "inch of water, conventional (inH2O)"
constexpr double kNistBtuItPerHour = 0.2930711;               // W, "British thermal unit_IT per hour"
constexpr double kNistCubicFootPerMinute = 4.719474e-4;       // m3/s, "cubic foot per minute"
constexpr double kNistGallonUsPerMinute = 6.30902e-5;         // m3/s, "gallon (U.S.) per minute (gpm)"
constexpr double kNistPound = 0.45359237;                     // kg, "pound (avoirdupois)", exact
constexpr double kNistGrain = 6.479891e-5;                    // kg, "grain (gr)"
constexpr double kNistFootPerMinute = 5.08e-3;                // m/s, "foot per minute", exact
constexpr double kRelativeTolerance = 2e-6;

double relativeError(double a, double b)
{
    return std::abs(a - b) / std::max(std::abs(b), 1e-300);
}

// Known values: one IP unit expressed in the SI unit core uses must show as 1.
struct KnownValue {
    const char* name;
    Kind kind;
    double si;        // core's SI unit for the kind
    double expected;  // shown in IP
};

class UnitSystemKnownValue : public ::testing::TestWithParam<KnownValue> {};

TEST_P(UnitSystemKnownValue, MatchesNistSp811)
{
    const KnownValue& row = GetParam();
    UnitSystem units;
    units.setSystem(UnitSystem::System::IP);
    EXPECT_LT(relativeError(units.toDisplay(row.kind, row.si), row.expected), kRelativeTolerance) << row.name;
}

INSTANTIATE_TEST_SUITE_P(
    Nist, UnitSystemKnownValue,
    ::testing::Values(
        // NIST SP 811 B.8: inch of water, conventional = 249.0889 Pa.
        KnownValue{"pressure", Kind::Pressure, kNistInchOfWaterConventional, 1.0},
        // NIST SP 811 B.8: Btu_IT/h = 0.2930711 W; core's power is in kW.
        KnownValue{"power", Kind::Power, kNistBtuItPerHour / 1000.0, 1.0},
        // 1 kW in Btu_IT/h, from the same factor: 1000 / 0.2930711 = 3412.142.
        KnownValue{"power kW", Kind::Power, 1.0, 1000.0 / kNistBtuItPerHour},
        // NIST SP 811 B.8: ft3/min = 4.719474e-4 m3/s; core's air flow is in m3/h.
        KnownValue{"air flow", Kind::AirVolumeFlow, kNistCubicFootPerMinute * 3600.0, 1.0},
        // NIST SP 811 B.8: gal (U.S.)/min = 6.30902e-5 m3/s; core's liquid flow is in l/s.
        KnownValue{"water flow", Kind::LiquidVolumeFlow, kNistGallonUsPerMinute * 1000.0, 1.0},
        // NIST SP 811 B.8: lb = 0.45359237 kg (exact).
        KnownValue{"mass flow per second", Kind::MassFlowPerSecond, kNistPound, 1.0},
        KnownValue{"mass flow per hour", Kind::MassFlowPerHour, kNistPound, 1.0},
        // NIST SP 811 B.8: ft/min = 5.08e-3 m/s (exact).
        KnownValue{"velocity", Kind::Velocity, kNistFootPerMinute, 1.0},
        // Humidity ratio: 1 g/kg = 1e-3 lb water per lb dry air = 1e-3 lb / grain (NIST
        // SP 811 B.8: gr = 6.479891e-5 kg, lb = 0.45359237 kg) = 7.000 gr/lb.
        KnownValue{"humidity ratio", Kind::HumidityRatio, 1.0, 1e-3 * kNistPound / kNistGrain},
        // Btu_IT/(h F) = 0.2930711 W per (5/9) K (NIST SP 811 B.8 and B.9); core: kW/K.
        KnownValue{"conductance", Kind::Conductance, kNistBtuItPerHour * 1.8 / 1000.0, 1.0},
        // NIST SP 811 B.9: t/°F = 1.8 t/°C + 32: 20 °C = 68 °F, -40 °C = -40 °F, 100 °C = 212 °F.
        KnownValue{"temperature 20", Kind::Temperature, 20.0, 68.0},
        KnownValue{"temperature -40", Kind::Temperature, -40.0, -40.0},
        KnownValue{"temperature 100", Kind::Temperature, 100.0, 212.0},
        // NIST SP 811 B.9: a temperature interval of 1 K is 1.8 °F.
        KnownValue{"temperature difference", Kind::TemperatureDifference, 10.0, 18.0},
        // Kinds that must pass through unchanged (no IP unit of their own): the
        // negative rows of the table; a conversion here would be a bug.
        KnownValue{"percent (no conversion)", Kind::Percent, 42.5, 42.5},
        KnownValue{"current (no conversion)", Kind::Current, 16.0, 16.0},
        KnownValue{"number (no conversion)", Kind::Number, 0.73, 0.73},
        KnownValue{"text (no conversion)", Kind::Text, 3.0, 3.0}),
    [](const ::testing::TestParamInfo<KnownValue>& param) {
        std::string name = param.param.name;
        for (char& c : name)
            if (!std::isalnum(static_cast<unsigned char>(c)))
                c = '_';
        return name;
    });

// Round trips SI -> shown -> SI for every kind and both systems, at values from
// the range an air handling unit meets (including negative and zero).
struct RoundTrip {
    Kind kind;
    double si;
};

class UnitSystemRoundTrip : public ::testing::TestWithParam<std::tuple<RoundTrip, UnitSystem::System, bool>> {};

TEST_P(UnitSystemRoundTrip, ReturnsTheSameSiValue)
{
    const auto& [row, system, litres] = GetParam();
    UnitSystem units;
    units.setSystem(system);
    units.setAirflowInLitresPerSecond(litres);
    const double back = units.fromDisplay(row.kind, units.toDisplay(row.kind, row.si));
    EXPECT_NEAR(back, row.si, 1e-12 * std::max(1.0, std::abs(row.si))); // rounding only
}

INSTANTIATE_TEST_SUITE_P(
    AllKinds, UnitSystemRoundTrip,
    ::testing::Combine(::testing::Values(RoundTrip{Kind::Temperature, -23.4}, RoundTrip{Kind::Temperature, 0.0},
                                         RoundTrip{Kind::TemperatureDifference, 12.5},
                                         RoundTrip{Kind::Pressure, -245.0}, RoundTrip{Kind::Pressure, 1234.5},
                                         RoundTrip{Kind::Power, 87.6}, RoundTrip{Kind::AirVolumeFlow, 9000.0},
                                         RoundTrip{Kind::LiquidVolumeFlow, 1.37},
                                         RoundTrip{Kind::MassFlowPerSecond, 2.95},
                                         RoundTrip{Kind::MassFlowPerHour, 18.2}, RoundTrip{Kind::Velocity, 2.31},
                                         RoundTrip{Kind::Percent, 65.0}, RoundTrip{Kind::HumidityRatio, 8.4},
                                         RoundTrip{Kind::Current, 31.0}, RoundTrip{Kind::Conductance, 4.2},
                                         RoundTrip{Kind::Number, 0.82}, RoundTrip{Kind::Text, 0.0}),
                       ::testing::Values(UnitSystem::System::SI, UnitSystem::System::IP), ::testing::Bool()));

TEST(UnitSystem, SiAirflowInLitresPerSecond)
{
    UnitSystem units;
    units.setAirflowInLitresPerSecond(true);
    // 3.6 m3/h = 1 l/s by definition of the litre (1 dm3) and the hour (3600 s).
    EXPECT_NEAR(units.toDisplay(Kind::AirVolumeFlow, 3600.0), 1000.0, 1e-9);
    EXPECT_EQ(units.unit(Kind::AirVolumeFlow), QStringLiteral("l/s"));
    units.setAirflowInLitresPerSecond(false);
    EXPECT_NEAR(units.toDisplay(Kind::AirVolumeFlow, 3600.0), 3600.0, 1e-9);
    EXPECT_EQ(units.unit(Kind::AirVolumeFlow), QStringLiteral("m³/h"));
}

TEST(UnitSystem, UnitsAndFormatFollowTheSystem)
{
    UnitSystem units;
    EXPECT_EQ(units.format(Kind::Temperature, 20.0), QStringLiteral("20.0 °C"));
    EXPECT_EQ(units.format(Kind::Pressure, 249.0889), QStringLiteral("249 Pa"));
    EXPECT_EQ(units.format(Kind::Percent, 35.0, 0), QStringLiteral("35 %"));
    units.setSystem(UnitSystem::System::IP);
    EXPECT_EQ(units.format(Kind::Temperature, 20.0), QStringLiteral("68.0 °F"));
    EXPECT_EQ(units.format(Kind::Pressure, 249.0889), QStringLiteral("1.00 in. w.g."));
    EXPECT_EQ(units.unit(Kind::HumidityRatio), QStringLiteral("gr/lb"));
    EXPECT_EQ(units.unit(Kind::Power), QStringLiteral("Btu/h"));
    EXPECT_EQ(units.unit(Kind::AirVolumeFlow), QStringLiteral("cfm"));
    EXPECT_EQ(units.unit(Kind::LiquidVolumeFlow), QStringLiteral("gpm"));
    EXPECT_EQ(units.unit(Kind::Velocity), QStringLiteral("fpm"));
    EXPECT_TRUE(units.unit(Kind::Number).isEmpty());
}

TEST(UnitSystem, FormatIsLocaleIndependentAndHasNoNegativeZero)
{
    const QLocale previous;
    QLocale::setDefault(QLocale(QLocale::German, QLocale::Germany)); // decimal comma
    UnitSystem units;
    EXPECT_EQ(units.format(Kind::Velocity, 2.346), QStringLiteral("2.35 m/s")) << "no decimal comma";
    EXPECT_EQ(units.format(Kind::Temperature, -0.04), QStringLiteral("0.0 °C"));
    EXPECT_EQ(units.format(Kind::Temperature, -0.06), QStringLiteral("-0.1 °C"));
    QLocale::setDefault(previous);
}

TEST(UnitSystem, ChangedIsEmittedOnlyOnAChange)
{
    UnitSystem units;
    int count = 0;
    QObject::connect(&units, &UnitSystem::changed, [&count] { ++count; });
    units.setSystem(UnitSystem::System::SI); // already SI
    EXPECT_EQ(count, 0);
    units.setSystem(UnitSystem::System::IP);
    EXPECT_EQ(count, 1);
    units.setAirflowInLitresPerSecond(true);
    EXPECT_EQ(count, 2);
}

} // namespace
} // namespace Airwright::Ui
