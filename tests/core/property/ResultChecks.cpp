#include "ResultChecks.h"

#include "airwright/core/chain/SectionFigures.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <string>

namespace Airwright::Core::Property {

using namespace Airwright::Core::Chain;

namespace {

void expectFinite(double value, const std::string& where)
{
    EXPECT_TRUE(std::isfinite(value)) << where << " = " << value;
}

void expectStreamFinite(const Sections::AirStream& s, const std::string& where)
{
    expectFinite(s.state.dryBulb().value(), where + " tdb");
    expectFinite(s.state.humidityRatio().value(), where + " W");
    expectFinite(s.state.pressure().value(), where + " p");
    expectFinite(s.state.enthalpy().value(), where + " h");
    expectFinite(s.state.relativeHumidity().value(), where + " rh");
    expectFinite(s.state.specificVolume().value(), where + " v");
    expectFinite(s.dryAir.value(), where + " mdot_da");
}

double enthalpyFlow(const Sections::AirStream& s)
{
    return s.dryAir.value() * s.state.enthalpy().value();
}

double waterFlow(const Sections::AirStream& s)
{
    return s.dryAir.value() * s.state.humidityRatio().value();
}

} // namespace

void expectAllFinite(const UnitResult& result)
{
    expectFinite(result.sizing.width.value(), "width");
    expectFinite(result.sizing.height.value(), "height");
    expectFinite(result.sizing.crossSection.value(), "cross-section");
    expectFinite(result.sizing.unitLength.value(), "unit length");
    for (const auto& c : result.cases) {
        for (const auto* path : {&c.supply, &c.extract}) {
            for (const auto& s : *path) {
                const std::string where = c.caseName + " / " + pathKey(s.path) + " / " + s.id;
                expectStreamFinite(s.inlet, where + " inlet");
                expectStreamFinite(s.outlet, where + " outlet");
                for (double v : {s.staticPressureIn.value(), s.staticPressureOut.value(), s.inletFlow.value(),
                                 s.faceVelocity.value(), s.pressureDrop.value(), s.duty.value(), s.waterAdded.value(),
                                 s.waterRemoved.value(), s.length.value()})
                    expectFinite(v, where);
                for (const auto& f : sectionFigures(s))
                    expectFinite(f.value, where + " " + f.key);
            }
        }
        const auto& t = c.totals;
        for (double v : {t.heating.value(), t.cooling.value(), t.heatRecovered.value(), t.humidification.value(),
                         t.fanElectricPower.value(), t.pumpPower.value(), t.supplyFlow.value(), t.extractFlow.value(),
                         t.specificFanPower.value()})
            expectFinite(v, c.caseName + " totals");
    }
}

void expectBalances(const CaseResult& c)
{
    SCOPED_TRACE(c.converged ? "case converged in " + std::to_string(c.iterations) + " passes" : "case not converged");
    for (const auto* path : {&c.supply, &c.extract}) {
        for (const auto& s : *path) {
            SCOPED_TRACE(c.caseName + " / " + pathKey(s.path) + " / " + s.id);
            const double hFlowIn = enthalpyFlow(s.inlet);
            // Duty is the enthalpy flow out minus in (docs/cli.md); for sections that
            // neither add nor remove air, mdot_da (h_out - h_in). Tolerance: rounding
            // of the two products, 1e-9 of the enthalpy flow plus 1 mW.
            EXPECT_NEAR(s.duty.value(), enthalpyFlow(s.outlet) - hFlowIn, 1e-9 * std::abs(hFlowIn) + 1e-3);
            if (s.typeKey == "heat_recovery" || s.typeKey == "mixing")
                continue; // balanced over both sides below
            // Dry air is conserved through a single-path section (1e-12 kg/s: rounding).
            EXPECT_NEAR(s.outlet.dryAir.value(), s.inlet.dryAir.value(), 1e-12);
            EXPECT_NEAR(s.duty.value(),
                        s.inlet.dryAir.value() * (s.outlet.state.enthalpy() - s.inlet.state.enthalpy()).value(),
                        1e-9 * std::abs(hFlowIn) + 1e-3);
            // Water: mdot_da (W_out - W_in) = water added - water removed (1e-10 kg/s).
            EXPECT_NEAR(waterFlow(s.outlet) - waterFlow(s.inlet), (s.waterAdded - s.waterRemoved).value(), 1e-10);
            if (const auto* fan = std::get_if<Sections::Fan::Detail>(&s.detail)) {
                // All electric input ends up in the air with the motor in the stream,
                // the shaft power otherwise (first law); 0.1 % + 1 mW.
                EXPECT_TRUE(std::abs(s.duty.value() - fan->electricPower.value()) <= 1e-3 * fan->electricPower.value() + 1e-3
                            || std::abs(s.duty.value() - fan->shaftPower.value()) <= 1e-3 * fan->shaftPower.value() + 1e-3)
                    << "fan duty " << s.duty.value() << " W, electric " << fan->electricPower.value() << " W, shaft "
                    << fan->shaftPower.value() << " W";
            }
        }
    }
    // Coupled sections: both sides together conserve dry air (1e-9 kg/s) and water
    // (less the condensate drained, 1e-9 kg/s); energy over both sides closes to
    // the condensate's enthalpy within 0.1 % of the duty plus 1 W.
    for (const auto& hs : c.supply) {
        if (hs.typeKey != "heat_recovery" && hs.typeKey != "mixing")
            continue;
        const auto* hd = std::get_if<Recovery::HeatRecoveryDetail>(&hs.detail);
        SCOPED_TRACE(c.caseName + " / coupled / " + hs.id + (hd ? " / " + std::string(Recovery::toString(hd->kind)) : ""));
        const auto* he = c.find(PathKind::Extract, hs.id);
        ASSERT_NE(he, nullptr);
        EXPECT_NEAR(hs.inlet.dryAir.value() + he->inlet.dryAir.value(),
                    hs.outlet.dryAir.value() + he->outlet.dryAir.value(), 1e-9);
        double condensate = 0.0;
        double preheat = 0.0;
        // Plates and loops: the condensate leaves the core at its wet surface,
        // colder than the condensing stream's outlet (a bypass mixes warmer air in
        // after the core) and warmer than the other stream's inlet; its enthalpy
        // (ASHRAE Fundamentals 2017 ch. 1, liquid water) lies between the two
        // bounds. Wheels: see below.
        double condensateLow = 0.0, condensateHigh = 0.0;
        if (const auto* d = std::get_if<Recovery::HeatRecoveryDetail>(&hs.detail)) {
            // Frost protection by preheat heats the outdoor air at the exchanger's
            // inlet: heat from outside the two streams, reported as protection power.
            if (d->frost.strategy == Recovery::FrostStrategy::Preheat)
                preheat = d->frost.protectionPower.value();
            condensate = d->condensate.value();
            if (Recovery::isRotary(d->kind)) {
                // A wheel's water leaves as fog carried by the air and drops out once
                // per side, at that side's outlet (HeatRecoveryEvaluator.cpp,
                // docs/heat-recovery.md): only a saturated outlet can have dropped
                // any, and at its own temperature. One saturated side makes the
                // bound exact; with both, the split between them is not reported.
                const auto atOutlet = [&](const Sections::AirStream& out) {
                    return condensate * Psychro::liquidWaterEnthalpy(out.state.dryBulb()).value();
                };
                const bool supplyWet = hs.outlet.state.relativeHumidity().value() > 0.9999;
                const bool extractWet = he->outlet.state.relativeHumidity().value() > 0.9999;
                const double a = atOutlet(supplyWet || !extractWet ? hs.outlet : he->outlet);
                const double b = atOutlet(extractWet || !supplyWet ? he->outlet : hs.outlet);
                condensateLow = std::min(a, b);
                condensateHigh = std::max(a, b);
            } else {
                const bool supplyCondenses =
                    waterFlow(hs.inlet) - waterFlow(hs.outlet) > waterFlow(he->inlet) - waterFlow(he->outlet);
                const auto& wetOut = supplyCondenses ? hs.outlet : he->outlet;
                const auto& coldIn = supplyCondenses ? he->inlet : hs.inlet;
                const double a = condensate * Psychro::liquidWaterEnthalpy(wetOut.state.dryBulb()).value();
                const double b = condensate * Psychro::liquidWaterEnthalpy(coldIn.state.dryBulb()).value();
                condensateLow = std::min(a, b);
                condensateHigh = std::max(a, b);
            }
        } else {
            // A mixing box whose mixture lands above saturation drops the fog as
            // water at the mixed temperature (the psychro layer's convention).
            condensate = hs.waterRemoved.value();
            condensateLow = condensateHigh =
                condensate * Psychro::liquidWaterEnthalpy(hs.outlet.state.dryBulb()).value();
        }
        // An exchanger's two sides come from one evaluation and balance to rounding.
        // A mixing box takes its return air from the extract path as the last pass
        // left it (the chain is Gauss-Seidel), so its two sides agree to the chain's
        // convergence tolerance, 1e-8 kg/kg of humidity ratio (CaseSolver.cpp,
        // largestChange) on the recirculated flow.
        const double waterTolerance = 1e-9 + (hd ? 0.0 : 1e-8 * he->inlet.dryAir.value());
        EXPECT_NEAR(waterFlow(hs.inlet) + waterFlow(he->inlet),
                    waterFlow(hs.outlet) + waterFlow(he->outlet) + condensate, waterTolerance);
        // Energy: duty(supply) + duty(extract) + condensate enthalpy flow = preheat.
        const double drained = preheat - hs.duty.value() - he->duty.value();
        const double tolerance = 1e-3 * std::abs(hs.duty.value()) + 1.0;
        EXPECT_GE(drained, condensateLow - tolerance);
        EXPECT_LE(drained, condensateHigh + tolerance);
    }
}

void expectConvergenceReported(const CaseResult& c, const AirHandlingUnit& unit)
{
    if (c.converged)
        return;
    const auto named = std::find_if(c.findings.begin(), c.findings.end(), [&](const Finding& f) {
        if (f.code != "chain.not_converged" || f.sectionId.empty())
            return false;
        const auto hasId = [&](const Section& s) { return s.id == f.sectionId; };
        return std::any_of(unit.supply.begin(), unit.supply.end(), hasId)
               || std::any_of(unit.extract.begin(), unit.extract.end(), hasId);
    });
    EXPECT_NE(named, c.findings.end()) << c.caseName << ": not converged, but no chain.not_converged finding names a section";
}

} // namespace Airwright::Core::Property
