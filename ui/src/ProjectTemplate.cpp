#include "airwright/ui/ProjectTemplate.h"

#include <QDate>

namespace Airwright::Ui {

using namespace Airwright::Core;

Project::Project ProjectTemplate::newProject()
{
    Project::Project project;
    project.info.name = "New unit";
    project.info.date = QDate::currentDate().toString(Qt::ISODate).toStdString();
    project.info.revision = "A";

    auto& unit = project.unit;
    Sections::Damper outdoorDamper;
    outdoorDamper.role = Sections::DamperRole::OutdoorAir;
    Sections::Filter supplyFilter; // ISO ePM1 50 %, bag
    Sections::Filter extractFilter;
    extractFilter.group = Sections::FilterGroup::IsoEpm10;
    extractFilter.efficiency = percent(60.0);
    Sections::Damper exhaustDamper;
    exhaustDamper.role = Sections::DamperRole::Exhaust;

    unit.supply = {{"oda-damper", outdoorDamper},        {"supply-filter", supplyFilter},
                   {"hr", Recovery::HeatRecovery{}},      {"heating-coil", Sections::WaterHeatingCoil{}},
                   {"cooling-coil", Sections::CoolingCoil{}}, {"supply-fan", Sections::Fan{}}};
    unit.extract = {{"extract-filter", extractFilter},
                    {"hr", Chain::CoupledSide{}},
                    {"extract-fan", Sections::Fan{}},
                    {"eha-damper", exhaustDamper}};

    Chain::DesignCase winter;
    winter.name = "winter design";
    Chain::DesignCase summer;
    summer.name = "summer design";
    summer.outdoorTemperature = celsius(30.0);
    summer.outdoorHumidity = percent(40.0);
    summer.roomTemperature = celsius(24.0);
    summer.roomHumidity = percent(50.0);
    summer.supplySetpoint = celsius(18.0);
    unit.cases = {winter, summer};
    return project;
}

} // namespace Airwright::Ui
