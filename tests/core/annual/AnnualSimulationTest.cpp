#include "airwright/core/annual/AnnualSimulation.h"
#include "AnnualTestSupport.h"
#include "airwright/core/InputError.h"
#include "airwright/core/annual/HeatRecoveryComparison.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <atomic>
#include <cmath>
#include <vector>

using namespace Airwright::Core;
using namespace Airwright::Core::Annual;
using AnnualTestSupport::demoBins;
using AnnualTestSupport::demoUnit;
using AnnualTestSupport::demoYear;

namespace {

HeatRecoveryOption defaultOption(const std::string& key)
{
    for (auto& o : defaultHeatRecoveryOptions(demoUnit().airflows.supply))
        if (o.key == key)
            return o;
    throw InputError("no option " + key);
}

// A unit with nothing but a heating coil: its annual heating is a degree-hour
// sum that can be done by hand.
Chain::AirHandlingUnit heatingOnlyUnit()
{
    Chain::AirHandlingUnit unit;
    unit.site.altitude = metres(0.0);
    unit.airflows.supply = cubicMetresPerHour(3600.0);
    unit.airflows.extract = cubicMetresPerHour(3600.0);
    unit.supply = {Chain::Section{"coil", Sections::WaterHeatingCoil{}}};
    Chain::DesignCase winter;
    winter.name = "winter";
    winter.outdoorTemperature = celsius(-10.0);
    winter.roomTemperature = celsius(20.0);
    winter.roomHumidity = percent(40.0);
    winter.supplySetpoint = celsius(20.0);
    unit.cases = {winter};
    return unit;
}

} // namespace

TEST(AnnualSimulation, AnnualSumsAreTheSumOfTheHours)
{
    AnnualSettings settings;
    settings.keepHours = true;
    settings.schedule.hoursPerDay = 12;
    settings.schedule.firstHour = 6;
    settings.schedule.daysPerWeek = 5;
    settings.schedule.offHours = OffHoursMode::Setback;
    const AnnualSimulation sim(HeatRecoveryComparison::unitWith(demoUnit(), defaultOption("run_around_loop")), settings);
    const auto result = sim.run(demoYear());
    ASSERT_TRUE(result);
    ASSERT_EQ(result->hours.size(), demoYear().size());

    // Definition: every annual figure is the sum of the hourly powers x 1 h.
    double heating = 0.0, cooling = 0.0, fan = 0.0, pump = 0.0, recH = 0.0, recC = 0.0, frost = 0.0, frostH = 0.0;
    double operating = 0.0, setbackFan = 0.0;
    for (const auto& h : result->hours) {
        if (h.mode == OperatingMode::Off) {
            EXPECT_EQ(toWatts(h.fanPower), 0.0);
            continue;
        }
        operating += 1.0;
        heating += toWatts(h.heating);
        cooling += toWatts(h.cooling);
        fan += toWatts(h.fanPower);
        pump += toWatts(h.pumpPower);
        (h.recovered.value() > 0.0 ? recH : recC) += std::abs(toWatts(h.recovered));
        frost += toWatts(h.frostProtection);
        frostH += h.frost ? 1.0 : 0.0;
        if (h.mode == OperatingMode::Setback)
            setbackFan += toWatts(h.fanPower);
    }
    const auto& t = result->total;
    const auto wh = [](Energy e) { return toKilowattHours(e) * 1000.0; };
    EXPECT_NEAR(wh(t.heating), heating, 1e-6 * heating);
    EXPECT_NEAR(wh(t.cooling), cooling, 1e-6 * cooling + 1e-6);
    EXPECT_NEAR(wh(t.fan), fan, 1e-6 * fan);
    EXPECT_NEAR(wh(t.pump), pump, 1e-6 * pump);
    EXPECT_NEAR(wh(t.recoveredHeating), recH, 1e-6 * recH);
    EXPECT_NEAR(wh(t.recoveredCooling), recC, 1e-6 * recC + 1e-6);
    EXPECT_NEAR(wh(t.frostProtection), frost, 1e-6 * frost + 1e-6);
    EXPECT_NEAR(toHours(t.frostTime), frostH, 1e-9);
    EXPECT_NEAR(toHours(t.operatingTime), operating, 1e-9);
    EXPECT_NEAR(wh(result->setback.fan), setbackFan, 1e-6 * setbackFan);
    // Every hour is in operation or setback with this schedule.
    EXPECT_NEAR(operating, 8760.0, 1e-9);
    // Hand calculation (OperatingScheduleTest): 261 working days x 12 h normal.
    EXPECT_NEAR(toHours(result->normal.operatingTime), 3132.0, 1e-9);
    // Setback runs at 50 % flow: less fan power than normal operation.
    EXPECT_LT(toKilowattHours(result->setback.fan) / toHours(result->setback.operatingTime),
              toKilowattHours(result->normal.fan) / toHours(result->normal.operatingTime));
}

TEST(AnnualSimulation, ConstantClimateIsTheDesignPointTimesTheHours)
{
    // A year at the winter design state of the demo (-12 C, 90 % RH): every hour
    // is that design case. Reference: the chain's result for the case (our own
    // ChainSolver) x 8760 h. Tolerance 0.3 % (the hourly model walks the path once
    // with the chain's fan rises; the chain iterates to 1e-4 K).
    const auto& base = demoUnit();
    for (const char* key : {"none", "plate_counter_flow", "rotary_hygroscopic", "run_around_loop"}) {
        const auto unit = HeatRecoveryComparison::unitWith(base, defaultOption(key));
        const auto& winter = base.cases.front();
        ASSERT_NEAR(toCelsius(winter.outdoorTemperature), -12.0, 1e-12);
        const double w = toGramsPerKilogram(Psychro::humidityRatioFromRelativeHumidity(
            winter.outdoorTemperature, winter.outdoorHumidity, base.site.pressure()));
        const auto year = AnnualTestSupport::constantYear(-12.0, w, toPascals(base.site.pressure()));
        const auto result = AnnualSimulation(unit, AnnualSettings{}).run(year);
        ASSERT_TRUE(result);
        const auto design = Chain::ChainSolver::solve(unit).cases.front();
        const auto perYear = [](Power p) { return toKilowatts(p) * 8760.0; };
        const auto kwh = [](Energy e) { return toKilowattHours(e); };
        EXPECT_NEAR(kwh(result->total.heating), perYear(design.totals.heating), 0.003 * perYear(design.totals.heating)) << key;
        EXPECT_NEAR(kwh(result->total.fan), perYear(design.totals.fanElectricPower), 1e-9 * perYear(design.totals.fanElectricPower)) << key;
        EXPECT_NEAR(kwh(result->total.recoveredHeating), perYear(design.totals.heatRecovered),
                    0.003 * perYear(design.totals.heatRecovered) + 1e-6) << key;
        EXPECT_NEAR(kwh(result->total.pump), perYear(design.totals.pumpPower), 1e-6 * perYear(design.totals.pumpPower) + 1e-9) << key;
        EXPECT_NEAR(kwh(result->total.cooling), 0.0, 1e-9) << key;
    }
}

TEST(AnnualSimulation, HeatingMatchesDegreeHoursByHand)
{
    // Hours alternating between -5 C and 25 C at 1 g/kg, sea level (101325 Pa), the
    // unit off nowhere: 4380 h at -5 C below the 20 C setpoint.
    std::vector<WeatherHour> hours;
    for (std::size_t i = 0; i < 8760; ++i)
        hours.push_back({celsius(i % 2 == 0 ? -5.0 : 25.0), gramsPerKilogram(1.0), pascals(101325.0)});
    const WeatherYear year(SiteInfo{}, std::move(hours));
    // Hand calculation: heating degree hours below 20 C = 4380 h x 25 K = 109 500 K h.
    EXPECT_NEAR(toKelvinHours(year.heatingDegreeHours(celsius(20.0))), 109500.0, 1e-6);

    const auto result = AnnualSimulation(heatingOnlyUnit(), AnnualSettings{}).run(year);
    ASSERT_TRUE(result);
    // Hand calculation: standard air 1.2 kg/m3 of moist air (the chain's flow
    // basis, EN 13053 practice) at 1 m3/s is 1.2 / 1.001 kg/s of dry air; heating at
    // constant W takes cp = 1006 + 1860 x 0.001 = 1007.86 J/(kg K) (ASHRAE
    // Fundamentals 2017 ch. 1 eq. 30). 1.2 / 1.001 x 1007.86 x 109 500 K h =
    // 132.3005 MWh.
    EXPECT_NEAR(toMegawattHours(result->total.heating), 1.2 / 1.001 * 1007.86 * 109500.0 / 1e6, 1e-6);
    EXPECT_NEAR(toMegawattHours(result->total.heating), 132.3005, 1e-4);
    EXPECT_NEAR(toMegawattHours(result->total.cooling), 0.0, 1e-12);
}

TEST(AnnualSimulation, BinMethodAgreesWithTheHourlyMethodOnTheDemoClimate)
{
    // The demo climate as 8760 hours and as its shipped 2 K bin table
    // (resources/demo/demo-bins.csv), unit running 24 h a day. Tolerances, our own,
    // relative to the heating the unit needs without heat recovery: heating and
    // recovered heating 1 %, cooling 1 %; fan energy 0.1 % (bins keep the hours).
    // Bins average out what is not linear within a bin (frost protection starting
    // part-way, condensation on the cooling coil), which is where they differ; frost
    // hours are not compared: a bin counts all its hours as frosting or none.
    const auto& base = demoUnit();
    const double scale = toMegawattHours(AnnualSimulation(HeatRecoveryComparison::unitWith(base, defaultOption("none")))
                                             .run(demoYear())
                                             ->total.heating);
    for (const auto& option : defaultHeatRecoveryOptions(base.airflows.supply)) {
        const AnnualSimulation sim(HeatRecoveryComparison::unitWith(base, option));
        const auto hourly = sim.run(demoYear());
        const auto bins = sim.run(demoBins());
        ASSERT_TRUE(hourly && bins);
        const auto& h = hourly->total;
        const auto& b = bins->total;
        EXPECT_NEAR(toMegawattHours(b.heating), toMegawattHours(h.heating), 0.01 * scale) << option.key;
        EXPECT_NEAR(toMegawattHours(b.recoveredHeating), toMegawattHours(h.recoveredHeating), 0.01 * scale) << option.key;
        EXPECT_NEAR(toMegawattHours(b.cooling), toMegawattHours(h.cooling), 0.01 * scale) << option.key;
        EXPECT_NEAR(toMegawattHours(b.fan), toMegawattHours(h.fan), 0.001 * toMegawattHours(h.fan)) << option.key;
        EXPECT_NEAR(toHours(b.operatingTime), 8760.0, 1e-6) << option.key;
    }
}

TEST(AnnualSimulation, ReportsProgressAndStopsWhenAsked)
{
    const AnnualSimulation sim(HeatRecoveryComparison::unitWith(demoUnit(), defaultOption("plate_counter_flow")));
    std::vector<double> seen;
    RunControl control;
    control.progress = [&](double f) { seen.push_back(f); };
    ASSERT_TRUE(sim.run(demoYear(), control));
    ASSERT_GE(seen.size(), 10u);
    EXPECT_NEAR(seen.front(), 0.0, 1e-12);
    EXPECT_NEAR(seen.back(), 1.0, 1e-12);
    for (std::size_t i = 1; i < seen.size(); ++i)
        EXPECT_GE(seen[i], seen[i - 1]);

    // Stopped before it starts.
    std::stop_source early;
    early.request_stop();
    RunControl stopped;
    stopped.stop = early.get_token();
    EXPECT_FALSE(sim.run(demoYear(), stopped));
    EXPECT_FALSE(sim.run(demoBins(), stopped));

    // Stopped half-way by the progress callback, as a GUI would on a new edit.
    std::stop_source midway;
    RunControl halfway;
    halfway.stop = midway.get_token();
    double last = 0.0;
    halfway.progress = [&](double f) {
        last = f;
        if (f >= 0.5)
            midway.request_stop();
    };
    EXPECT_FALSE(sim.run(demoYear(), halfway));
    EXPECT_GE(last, 0.5);
    EXPECT_LT(last, 0.6);
}

TEST(AnnualSimulation, OffHoursCostNothing)
{
    AnnualSettings settings;
    settings.schedule.hoursPerDay = 10;
    settings.schedule.firstHour = 8;
    settings.schedule.daysPerWeek = 5;
    settings.schedule.holidayWeeks = 4;
    const AnnualSimulation sim(HeatRecoveryComparison::unitWith(demoUnit(), defaultOption("none")), settings);
    const auto result = sim.run(demoYear());
    ASSERT_TRUE(result);
    // Hand calculation (OperatingScheduleTest): 241 days x 10 h.
    EXPECT_NEAR(toHours(result->total.operatingTime), 2410.0, 1e-9);
    EXPECT_NEAR(toHours(result->setback.operatingTime), 0.0, 1e-12);
    EXPECT_FALSE(sim.setbackModel());
    // The bin method weights every bin by the same share: 2410 / 8760.
    const auto bins = sim.run(demoBins());
    EXPECT_NEAR(toHours(bins->total.operatingTime), 2410.0, 1e-6);
}

TEST(AnnualSimulation, RejectsInvalidSettings)
{
    AnnualSettings settings;
    settings.schedule.hoursPerDay = 30;
    EXPECT_THROW(AnnualSimulation(demoUnit(), settings), InputError);
    AnnualSettings step;
    step.tableStep = kelvinDifference(10.0);
    EXPECT_THROW(AnnualSimulation(demoUnit(), step), InputError);
}
