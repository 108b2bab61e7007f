#pragma once
// Units built in code for the chain tests: an invented office-like unit with both
// paths, and variations of it. Not measured data.

#include "airwright/core/chain/AirHandlingUnit.h"

namespace Airwright::Core::Chain::Testing {

inline DesignCase winterCase()
{
    DesignCase c;
    c.name = "winter";
    c.outdoorTemperature = celsius(-10.0);
    c.outdoorHumidity = percent(90.0);
    c.roomTemperature = celsius(21.0);
    c.roomHumidity = percent(35.0);
    c.supplySetpoint = celsius(19.0);
    return c;
}

inline DesignCase summerCase()
{
    DesignCase c;
    c.name = "summer";
    c.outdoorTemperature = celsius(30.0);
    c.outdoorHumidity = percent(45.0);
    c.roomTemperature = celsius(25.0);
    c.roomHumidity = percent(50.0);
    c.supplySetpoint = celsius(17.0);
    return c;
}

inline AirHandlingUnit exampleUnit()
{
    AirHandlingUnit unit;
    unit.site.altitude = metres(200.0);
    unit.airflows.supply = cubicMetresPerHour(8000.0);
    unit.airflows.extract = cubicMetresPerHour(8000.0);

    Sections::Damper outdoorDamper;
    Sections::Filter coarse;
    coarse.group = Sections::FilterGroup::IsoEpm10;
    coarse.efficiency = percent(60.0);
    coarse.initialPressureDrop = pascals(50.0);
    Recovery::HeatRecovery hr;
    hr.kind = Recovery::ExchangerKind::PlateCounterFlow;
    hr.ratedEfficiency = percent(80.0);
    hr.ratedPressureDropSupply = pascals(140.0);
    hr.ratedPressureDropExtract = pascals(145.0);
    Sections::WaterHeatingCoil heater;
    heater.flowTemperature = celsius(60.0);
    heater.returnTemperature = celsius(40.0);
    Sections::CoolingCoil cooler;
    Sections::Fan supplyFan;
    Sections::Filter fine;
    fine.group = Sections::FilterGroup::IsoEpm1;
    fine.efficiency = percent(70.0);
    fine.initialPressureDrop = pascals(70.0);

    unit.supply = {{"OAD", outdoorDamper}, {"F1", coarse}, {"HR", hr},         {"HC", heater},
                   {"CC", cooler},         {"SF", supplyFan}, {"F2", fine}};
    Sections::Filter extractFilter = coarse;
    Sections::Fan extractFan;
    Sections::Damper exhaustDamper;
    exhaustDamper.role = Sections::DamperRole::Exhaust;
    unit.extract = {{"F3", extractFilter}, {"HR", CoupledSide{}}, {"EF", extractFan}, {"EAD", exhaustDamper}};
    unit.cases = {winterCase(), summerCase()};
    return unit;
}

} // namespace Airwright::Core::Chain::Testing
