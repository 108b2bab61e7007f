#pragma once
// Prices and emission factors that turn annual energies into cost and CO2, and
// the cold source's efficiency that turns a cooling load into electricity.
//
// Money has no unit in this program: prices are in the user's currency per kWh
// and every cost figure is in that currency. The defaults are illustrative only
// (our own round numbers, of the order seen in Europe in the 2020s; not from a
// price source): the user is expected to enter their own. Heat is priced per kWh
// delivered to the coils, so a boiler's or a heat network's losses belong in the
// price; cooling becomes electricity through the seasonal EER.

namespace Airwright::Core::Annual {

struct EnergyPrices {
    double heatPricePerKilowattHour = 0.10;
    double electricityPricePerKilowattHour = 0.25;
    double heatCo2KilogramsPerKilowattHour = 0.20;        // e.g. a gas boiler (illustrative)
    double electricityCo2KilogramsPerKilowattHour = 0.40; // grid mix (illustrative)
    // Seasonal energy efficiency ratio of the chiller or cold source: kWh of
    // cooling per kWh of electricity. 3.0 is common practice for a seasonal
    // figure of an air-cooled chiller.
    double coolingEer = 3.0;

    // Prices and factors 0 .. 100 per kWh, EER 0.5 .. 20; InputError otherwise.
    void validate() const;
    bool operator==(const EnergyPrices&) const = default;
};

} // namespace Airwright::Core::Annual
