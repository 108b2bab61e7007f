#include "CaseSolver.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>

namespace Airwright::Core::Chain {

namespace {

constexpr double kStandardAirDensity = 1.2; // kg/m3, moist air (EN 13053, common practice)
constexpr double kConvergence = 1e-4;       // K; W and p scaled to match, see largestChange

template <class T> const T* specAs(const Section& s)
{
    return std::get_if<T>(&s.spec);
}

// Sections that the controls drive towards the temperature target.
bool isTemperatureControlled(const Section& s)
{
    if (const auto* c = specAs<Sections::WaterHeatingCoil>(s))
        return !c->fixedOutletTemperature;
    if (const auto* e = specAs<Sections::ElectricHeater>(s))
        return !e->fixedOutletTemperature;
    if (specAs<Sections::CoolingCoil>(s))
        return true;
    if (const auto* r = specAs<Recovery::HeatRecovery>(s))
        return r->bypassControl;
    return false;
}

bool isHeating(const Section& s)
{
    return specAs<Sections::WaterHeatingCoil>(s) || specAs<Sections::ElectricHeater>(s);
}

Power enthalpyFlowChange(const Sections::AirStream& in, const Sections::AirStream& out)
{
    return out.dryAir * out.state.enthalpy() - in.dryAir * in.state.enthalpy();
}

SectionResult makeResult(const Section& section, PathKind path, const Sections::AirStream& inlet,
                         const Sections::AirStream& outlet, Pressure pIn, Pressure dp, Velocity faceVelocity,
                         MassFlow added, MassFlow removed, SectionDetail detail)
{
    SectionResult r;
    r.id = section.id;
    r.typeKey = sectionTypeKey(section.spec);
    r.path = path;
    r.inlet = inlet;
    r.outlet = outlet;
    r.staticPressureIn = pIn;
    r.staticPressureOut = pIn - dp;
    r.inletFlow = inlet.volumeFlow();
    r.faceVelocity = faceVelocity;
    r.pressureDrop = dp;
    r.duty = enthalpyFlowChange(inlet, outlet);
    r.waterAdded = added;
    r.waterRemoved = removed;
    r.length = sectionLength(section.spec);
    r.detail = std::move(detail);
    return r;
}

void tagFindings(std::vector<Finding>& findings, const std::string& id)
{
    for (auto& f : findings)
        if (f.sectionId.empty())
            f.sectionId = id;
}

} // namespace

CaseSolver::CaseSolver(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing)
    : m_unit(unit), m_case(designCase), m_sizing(sizing), m_pressure(unit.site.pressure())
{
    m_outdoor = Psychro::MoistAirState::fromDryBulbRelativeHumidity(designCase.outdoorTemperature,
                                                                     designCase.outdoorHumidity, m_pressure);
    m_room = Psychro::MoistAirState::fromDryBulbRelativeHumidity(designCase.roomTemperature, designCase.roomHumidity,
                                                                  m_pressure);
    m_supplyDesignFlow = unit.airflows.supply * designCase.airflowFraction.value();
    m_extractDesignFlow = unit.airflows.extract * designCase.airflowFraction.value();

    const auto dryAirFlow = [&](VolumeFlow q, const Psychro::MoistAirState& state) {
        if (unit.airflows.basis == FlowBasis::StandardAir)
            return MassFlow(q * kilogramsPerCubicMetre(kStandardAirDensity) / (1.0 + state.humidityRatio().value()));
        return MassFlow(q / state.specificVolume());
    };
    m_supplyFlow = dryAirFlow(m_supplyDesignFlow, *m_outdoor);
    m_extractFlow = dryAirFlow(m_extractDesignFlow, *m_room);

    if (designCase.minimumSupplyHumidity)
        m_minHumidity = Psychro::humidityRatioFromRelativeHumidity(designCase.supplySetpoint,
                                                                   *designCase.minimumSupplyHumidity, m_pressure);
    if (designCase.maximumSupplyHumidity)
        m_maxHumidity = Psychro::humidityRatioFromRelativeHumidity(designCase.supplySetpoint,
                                                                   *designCase.maximumSupplyHumidity, m_pressure);

    for (std::size_t i = 0; i < unit.supply.size(); ++i) {
        if (!isCoupled(unit.supply[i].spec))
            continue;
        Coupling c;
        c.id = unit.supply[i].id;
        c.supplyIndex = i;
        if (const auto* hr = specAs<Recovery::HeatRecovery>(unit.supply[i]))
            c.evaluator.emplace(*hr, m_supplyDesignFlow);
        for (std::size_t j = 0; j < unit.extract.size(); ++j)
            if (unit.extract[j].id == c.id)
                c.extractIndex = j;
        m_couplings.push_back(c);
    }
    m_supplyFanPressure.assign(unit.supply.size(), Pressure{});
    m_extractFanPressure.assign(unit.extract.size(), Pressure{});
    m_supplyFindings.resize(unit.supply.size());
    m_extractFindings.resize(unit.extract.size());
    computeFlows();
}

CaseSolver::Coupling& CaseSolver::coupling(const std::string& id)
{
    for (auto& c : m_couplings)
        if (c.id == id)
            return c;
    throw Error("internal: no coupling for section " + id);
}

void CaseSolver::computeFlows()
{
    // Supply: from the outlet (the design flow) back to the intake.
    const auto& supply = m_unit.supply;
    m_supplyInFlow.assign(supply.size(), MassFlow{});
    MassFlow m = m_supplyFlow;
    for (std::size_t k = supply.size(); k-- > 0;) {
        if (const auto* mix = specAs<Sections::MixingBox>(supply[k])) {
            const MassFlow outdoor = m * mix->outdoorShare(m_supplyDesignFlow).value();
            coupling(supply[k].id).recirculated = m - outdoor;
            m = outdoor;
        } else if (specAs<Recovery::HeatRecovery>(supply[k])) {
            m = coupling(supply[k].id).evaluator->supplyInletFlow(m);
        }
        m_supplyInFlow[k] = m;
    }
    // Extract: from the room forward.
    const auto& extract = m_unit.extract;
    m_extractInFlow.assign(extract.size(), MassFlow{});
    m = m_extractFlow;
    for (std::size_t k = 0; k < extract.size(); ++k) {
        m_extractInFlow[k] = m;
        if (!std::holds_alternative<CoupledSide>(extract[k].spec))
            continue;
        auto& c = coupling(extract[k].id);
        if (specAs<Sections::MixingBox>(supply[c.supplyIndex])) {
            m = m - c.recirculated;
        } else {
            // Air a wheel carries from the outdoor side to the exhaust (OACF > 1).
            const MassFlow supplyOut = c.supplyIndex + 1 < supply.size() ? m_supplyInFlow[c.supplyIndex + 1] : m_supplyFlow;
            m = m + (m_supplyInFlow[c.supplyIndex] - supplyOut);
        }
        if (m.value() < 0.0) {
            m_caseFindings.push_back({Severity::Error, "flow.recirculation", extract[k].id,
                                      "more air is recirculated than the extract path brings: "
                                      "the extract flow after this section would be negative"});
            m = kilogramsPerSecond(0.0);
        }
    }
}

Sections::SectionContext CaseSolver::contextFor(const Sections::AirStream& inlet, Pressure fanPressure) const
{
    Sections::SectionContext ctx;
    ctx.crossSection = m_sizing.crossSection;
    ctx.faceVelocity = inlet.volumeFlow() / m_sizing.crossSection;
    ctx.filterCondition = m_case.filterCondition;
    ctx.fanTotalPressure = fanPressure;
    return ctx;
}

void CaseSolver::extractPass()
{
    const auto& path = m_unit.extract;
    m_previousExtract = std::move(m_extract);
    m_extract.clear();
    m_extract.reserve(path.size());
    Sections::AirStream air{*m_room, m_extractFlow};
    Pressure p = -m_unit.airflows.extractExternalBefore;

    for (std::size_t k = 0; k < path.size(); ++k) {
        const auto& section = path[k];
        air.dryAir = m_extractInFlow[k];
        auto ctx = contextFor(air, m_extractFanPressure[k]);
        ctx.pathDesignFlow = m_extractDesignFlow;
        auto& findings = m_extractFindings[k];
        findings.clear();

        if (std::holds_alternative<CoupledSide>(section.spec)) {
            auto& c = coupling(section.id);
            c.extractInlet = air;
            const auto& supplySection = m_unit.supply[c.supplyIndex];
            if (const auto* mix = specAs<Sections::MixingBox>(supplySection)) {
                Sections::AirStream out = air;
                out.dryAir = k + 1 < path.size() ? m_extractInFlow[k + 1] : air.dryAir - c.recirculated;
                if (out.dryAir.value() < 0.0)
                    out.dryAir = kilogramsPerSecond(0.0);
                const Pressure dp = Sections::dynamicPressureDrop(mix->lossCoefficient, air.density(), ctx.faceVelocity);
                Sections::MixingBox::Detail detail{mix->outdoorShare(m_supplyDesignFlow), c.recirculated};
                m_extract.push_back(makeResult(supplySection, PathKind::Extract, air, out, p, dp, ctx.faceVelocity,
                                               MassFlow{}, MassFlow{}, detail));
            } else {
                // The supply pass of the previous iteration evaluated the exchanger with
                // this path's state then; at convergence the two agree. The first pass
                // has no supply state yet and assumes outdoor air at the exchanger.
                if (!c.recovery) {
                    Recovery::HeatRecoveryInputs in;
                    in.supplyIn = Sections::AirStream{*m_outdoor, m_supplyInFlow[c.supplyIndex]};
                    in.extractIn = air;
                    in.supplyTarget = m_case.supplySetpoint;
                    c.recovery = c.evaluator->evaluate(in);
                }
                const auto& out = *c.recovery;
                findings = out.findings;
                m_extract.push_back(makeResult(supplySection, PathKind::Extract, air, out.extractOut, p,
                                               out.extractPressureDrop, ctx.faceVelocity, MassFlow{},
                                               out.detail.condensate, out.detail));
            }
        } else {
            Sections::SectionOutcome outcome;
            SectionDetail detail;
            std::visit(
                [&](const auto& spec) {
                    using T = std::decay_t<decltype(spec)>;
                    if constexpr (std::is_same_v<T, Sections::MixingBox> || std::is_same_v<T, Recovery::HeatRecovery>
                                  || std::is_same_v<T, CoupledSide>) {
                        throw Error("internal: coupled section in the extract path");
                    } else {
                        typename T::Detail d;
                        outcome = spec.compute(air, ctx, d);
                        detail = d;
                    }
                },
                section.spec);
            findings = std::move(outcome.findings);
            m_extract.push_back(makeResult(section, PathKind::Extract, air, outcome.outlet, p, outcome.pressureDrop,
                                           ctx.faceVelocity, outcome.waterAdded, outcome.waterRemoved,
                                           std::move(detail)));
        }
        tagFindings(findings, section.id);
        air = m_extract.back().outlet;
        p = m_extract.back().staticPressureOut;
    }
}

void CaseSolver::supplyPass()
{
    const auto& path = m_unit.supply;
    m_previousSupply = std::move(m_supply);
    m_supply.clear();
    m_supply.reserve(path.size());

    // Temperature change of the sections after each one that the controls do not
    // set (fans, humidifiers, fixed preheaters), from the previous pass: a coil
    // aims at the setpoint less what the air gains after it.
    std::vector<TemperatureDifference> drift(path.size(), TemperatureDifference{});
    if (m_previousSupply.size() == path.size()) {
        TemperatureDifference after{};
        for (std::size_t k = path.size(); k-- > 0;) {
            drift[k] = after;
            if (!isTemperatureControlled(path[k]))
                after += m_previousSupply[k].outlet.state.dryBulb() - m_previousSupply[k].inlet.state.dryBulb();
        }
    }

    Sections::AirStream air{*m_outdoor, m_supplyInFlow.empty() ? m_supplyFlow : m_supplyInFlow.front()};
    Pressure p = -m_unit.airflows.supplyExternalBefore;
    bool dehumidifying = false; // a cooling coil upstream has cooled below the temperature target

    for (std::size_t k = 0; k < path.size(); ++k) {
        const auto& section = path[k];
        air.dryAir = m_supplyInFlow[k];
        auto ctx = contextFor(air, m_supplyFanPressure[k]);
        ctx.pathDesignFlow = m_supplyDesignFlow;
        const AbsoluteTemperature target = m_case.supplySetpoint - drift[k];
        ctx.target.outletTemperature = target;
        ctx.target.minHumidity = m_minHumidity;
        ctx.target.maxHumidity = m_maxHumidity;
        ctx.target.dehumidify = m_maxHumidity.has_value();
        if (dehumidifying && isHeating(section) && !m_case.dehumidifyWithReheat)
            ctx.target.outletTemperature.reset();
        auto& findings = m_supplyFindings[k];
        findings.clear();

        if (const auto* mix = specAs<Sections::MixingBox>(section)) {
            auto& c = coupling(section.id);
            Sections::AirStream recirculated{c.extractInlet ? c.extractInlet->state : *m_room, c.recirculated};
            Sections::MixingBox::Detail detail;
            auto outcome = mix->mix(air, recirculated, ctx, detail);
            findings = std::move(outcome.findings);
            m_supply.push_back(makeResult(section, PathKind::Supply, air, outcome.outlet, p, outcome.pressureDrop,
                                          ctx.faceVelocity, MassFlow{}, outcome.waterRemoved, detail));
        } else if (const auto* hr = specAs<Recovery::HeatRecovery>(section)) {
            auto& c = coupling(section.id);
            c.supplyInlet = air;
            Recovery::HeatRecoveryInputs in;
            in.supplyIn = air;
            in.extractIn = c.extractInlet.value_or(Sections::AirStream{*m_room, m_extractInFlow[c.extractIndex]});
            if (hr->bypassControl)
                in.supplyTarget = target;
            c.recovery = c.evaluator->evaluate(in);
            c.bypass = c.recovery->detail.bypassFraction;
            c.rotorSpeed = c.recovery->rotorSpeedRatio;
            const auto& out = *c.recovery;
            findings = out.findings;
            m_supply.push_back(makeResult(section, PathKind::Supply, air, out.supplyOut, p, out.supplyPressureDrop,
                                          ctx.faceVelocity, MassFlow{}, MassFlow{}, out.detail));
        } else {
            Sections::SectionOutcome outcome;
            SectionDetail detail;
            std::visit(
                [&](const auto& spec) {
                    using T = std::decay_t<decltype(spec)>;
                    if constexpr (std::is_same_v<T, Sections::MixingBox> || std::is_same_v<T, Recovery::HeatRecovery>
                                  || std::is_same_v<T, CoupledSide>) {
                        throw Error("internal: unexpected section kind in the supply pass");
                    } else {
                        typename T::Detail d;
                        outcome = spec.compute(air, ctx, d);
                        if constexpr (std::is_same_v<T, Sections::CoolingCoil>) {
                            if (outcome.outlet.state.dryBulb() < target - kelvinDifference(0.05))
                                dehumidifying = true;
                        }
                        detail = d;
                    }
                },
                section.spec);
            findings = std::move(outcome.findings);
            m_supply.push_back(makeResult(section, PathKind::Supply, air, outcome.outlet, p, outcome.pressureDrop,
                                          ctx.faceVelocity, outcome.waterAdded, outcome.waterRemoved,
                                          std::move(detail)));
        }
        tagFindings(findings, section.id);
        air = m_supply.back().outlet;
        p = m_supply.back().staticPressureOut;
    }
}

void CaseSolver::updateFanPressures()
{
    const auto update = [](const std::vector<Section>& path, const std::vector<SectionResult>& results,
                           Pressure externalTotal, std::vector<Pressure>& fanPressure) {
        Pressure internal{};
        int fans = 0;
        for (std::size_t k = 0; k < path.size(); ++k) {
            if (specAs<Sections::Fan>(path[k]))
                ++fans;
            else if (k < results.size())
                internal += results[k].pressureDrop;
        }
        // Fans in series share the work equally.
        const Pressure each = fans > 0 ? (internal + externalTotal) / static_cast<double>(fans) : Pressure{};
        for (std::size_t k = 0; k < path.size(); ++k)
            fanPressure[k] = specAs<Sections::Fan>(path[k]) ? each : Pressure{};
    };
    const auto& f = m_unit.airflows;
    update(m_unit.supply, m_supply, f.supplyExternalBefore + f.supplyExternalAfter, m_supplyFanPressure);
    update(m_unit.extract, m_extract, f.extractExternalBefore + f.extractExternalAfter, m_extractFanPressure);
}

double CaseSolver::largestChange(std::string& where) const
{
    double largest = 0.0;
    const auto compare = [&](const std::vector<SectionResult>& now, const std::vector<SectionResult>& before) {
        if (now.size() != before.size()) {
            largest = 1e300;
            return;
        }
        for (std::size_t k = 0; k < now.size(); ++k) {
            const auto& a = now[k];
            const auto& b = before[k];
            // K; humidity ratio scaled so 1e-8 kg/kg counts as 1e-4; pressure so 0.01 Pa does.
            const double change = std::max({std::abs((a.outlet.state.dryBulb() - b.outlet.state.dryBulb()).value()),
                                            std::abs((a.outlet.state.humidityRatio() - b.outlet.state.humidityRatio()).value()) * 1e4,
                                            std::abs((a.staticPressureOut - b.staticPressureOut).value()) * 1e-2});
            if (!(change <= largest)) {
                largest = std::isfinite(change) ? change : 1e300;
                where = a.id;
            }
        }
    };
    compare(m_supply, m_previousSupply);
    compare(m_extract, m_previousExtract);
    return largest;
}

CaseResult CaseSolver::run()
{
    CaseResult result;
    result.caseName = m_case.name;
    int iteration = 0;
    bool converged = false;
    std::string unsettled;
    while (iteration < ChainSolver::kMaxIterations) {
        ++iteration;
        extractPass();
        supplyPass();
        updateFanPressures();
        if (iteration >= 2 && largestChange(unsettled) < kConvergence) {
            converged = true;
            break;
        }
    }
    finish(result, iteration, converged, unsettled);
    return result;
}

void CaseSolver::finish(CaseResult& result, int iterations, bool converged, const std::string& unsettled)
{
    result.iterations = iterations;
    result.converged = converged;
    result.supply = m_supply;
    result.extract = m_extract;
    auto& findings = result.findings;
    findings = m_caseFindings;
    for (const auto& list : m_supplyFindings)
        findings.insert(findings.end(), list.begin(), list.end());
    for (const auto& list : m_extractFindings)
        for (const auto& f : list)
            if (std::find(findings.begin(), findings.end(), f) == findings.end())
                findings.push_back(f);

    if (!converged)
        findings.push_back({Severity::Error, "chain.not_converged", unsettled,
                            "the calculation did not settle after " + std::to_string(iterations)
                                + " passes; the figures of this case are not reliable"});

    auto& totals = result.totals;
    for (const auto* list : {&result.supply, &result.extract}) {
        for (const auto& r : *list) {
            std::visit(
                [&](const auto& d) {
                    using T = std::decay_t<decltype(d)>;
                    if constexpr (std::is_same_v<T, Sections::WaterHeatingCoil::Detail>
                                  || std::is_same_v<T, Sections::ElectricHeater::Detail>)
                        totals.heating += d.duty;
                    else if constexpr (std::is_same_v<T, Sections::CoolingCoil::Detail>)
                        totals.cooling += d.totalLoad;
                    else if constexpr (std::is_same_v<T, Sections::Humidifier::Detail>)
                        totals.humidification += d.waterAdded;
                    else if constexpr (std::is_same_v<T, Sections::Fan::Detail>)
                        totals.fanElectricPower += d.electricPower;
                    else if constexpr (std::is_same_v<T, Recovery::HeatRecoveryDetail>) {
                        if (r.path == PathKind::Supply) {
                            totals.heatRecovered += d.recovered;
                            totals.pumpPower += d.pumpPower;
                            if (d.frost.strategy == Recovery::FrostStrategy::Preheat)
                                totals.heating += d.frost.protectionPower;
                        }
                    }
                },
                r.detail);
        }
    }
    if (!result.supply.empty())
        totals.supplyFlow = result.supply.back().outlet.volumeFlow();
    if (!result.extract.empty())
        totals.extractFlow = result.extract.front().inlet.volumeFlow();
    const VolumeFlow larger = std::max(totals.supplyFlow, totals.extractFlow);
    if (larger.value() > 0.0)
        totals.specificFanPower = totals.fanElectricPower / larger;

    // The extract side of each exchanger from the final evaluation, so that both
    // sides of one exchanger report one consistent energy balance.
    for (auto& c : m_couplings) {
        if (!c.recovery || c.extractIndex >= result.extract.size())
            continue;
        auto& e = result.extract[c.extractIndex];
        if (!std::holds_alternative<Recovery::HeatRecoveryDetail>(e.detail))
            continue;
        e.inlet = c.recovery->extractIn;
        e.outlet = c.recovery->extractOut;
        e.inletFlow = e.inlet.volumeFlow();
        e.pressureDrop = c.recovery->extractPressureDrop;
        e.staticPressureOut = e.staticPressureIn - e.pressureDrop;
        e.duty = e.outlet.dryAir * e.outlet.state.enthalpy() - e.inlet.dryAir * e.inlet.state.enthalpy();
        e.waterRemoved = c.recovery->detail.condensate;
        e.detail = c.recovery->detail;
    }

    // Pressure relation at coupled exchangers: the supply side should be the higher,
    // so that any leakage goes from supply to extract, never extract into supply.
    for (auto& c : m_couplings) {
        auto* s = &result.supply[c.supplyIndex];
        auto* e = c.extractIndex < result.extract.size() ? &result.extract[c.extractIndex] : nullptr;
        if (!e || !std::holds_alternative<Recovery::HeatRecoveryDetail>(s->detail))
            continue;
        const Pressure ps = 0.5 * (s->staticPressureIn + s->staticPressureOut);
        const Pressure pe = 0.5 * (e->staticPressureIn + e->staticPressureOut);
        const Pressure difference = ps - pe;
        std::get<Recovery::HeatRecoveryDetail>(s->detail).supplyMinusExtract = difference;
        if (auto* d = std::get_if<Recovery::HeatRecoveryDetail>(&e->detail))
            d->supplyMinusExtract = difference;
        if (difference.value() < 0.0) {
            const auto kind = std::get<Recovery::HeatRecoveryDetail>(s->detail).kind;
            findings.push_back({Recovery::isRotary(kind) ? Severity::Warning : Severity::Info,
                                "recovery.leakage_direction", c.id,
                                "at the exchanger the extract side is " + formatFixed(-difference.value(), 0)
                                    + " Pa above the supply side: leakage would carry extract air into the supply. "
                                      "Place the fans so the supply side is at the higher pressure"});
        }
    }

    // Fans.
    const auto countFans = [](const std::vector<Section>& path) {
        return std::count_if(path.begin(), path.end(), [](const Section& s) { return specAs<Sections::Fan>(s); });
    };
    if (!m_unit.supply.empty() && countFans(m_unit.supply) == 0)
        findings.push_back({Severity::Error, "fan.missing", "", "the supply path has no fan"});
    if (!m_unit.extract.empty() && countFans(m_unit.extract) == 0)
        findings.push_back({Severity::Error, "fan.missing", "", "the extract path has no fan"});

    // Setpoints.
    if (result.supply.empty())
        return;
    const auto& leaving = result.supply.back().outlet.state;
    const double error = toCelsius(leaving.dryBulb()) - toCelsius(m_case.supplySetpoint);
    const bool hasHeating = std::any_of(m_unit.supply.begin(), m_unit.supply.end(), isHeating);
    const bool hasCooling = std::any_of(m_unit.supply.begin(), m_unit.supply.end(), [](const Section& s) {
        return specAs<Sections::CoolingCoil>(s) != nullptr;
    });
    const std::string leaves = "supply air leaves at " + formatFixed(toCelsius(leaving.dryBulb()), 1) + " C";
    const std::string setpoint = " the setpoint " + formatFixed(toCelsius(m_case.supplySetpoint), 1) + " C";
    if (error < -0.5) {
        std::string why = hasHeating ? "" : ": the supply path has no heating";
        if (hasHeating && m_maxHumidity && !m_case.dehumidifyWithReheat)
            why = ": dehumidification without reheat";
        findings.push_back({hasHeating ? Severity::Warning : Severity::Error, "setpoint.too_cold", "",
                            leaves + ", " + formatFixed(-error, 1) + " K below" + setpoint + why});
    } else if (error > 0.5) {
        findings.push_back({Severity::Warning, "setpoint.too_warm", "",
                            leaves + ", " + formatFixed(error, 1) + " K above" + setpoint
                                + (hasCooling ? "" : ": the supply path has no cooling")});
    }
    const double tolerance = 2e-5;
    if (m_minHumidity && leaving.humidityRatio().value() < m_minHumidity->value() - tolerance)
        findings.push_back({Severity::Warning, "humidity.too_dry", "",
                            "supply humidity " + formatFixed(toGramsPerKilogram(leaving.humidityRatio()), 2)
                                + " g/kg is below the minimum " + formatFixed(toGramsPerKilogram(*m_minHumidity), 2)
                                + " g/kg"});
    if (m_maxHumidity && leaving.humidityRatio().value() > m_maxHumidity->value() + tolerance)
        findings.push_back({Severity::Warning, "humidity.too_humid", "",
                            "supply humidity " + formatFixed(toGramsPerKilogram(leaving.humidityRatio()), 2)
                                + " g/kg is above the maximum " + formatFixed(toGramsPerKilogram(*m_maxHumidity), 2)
                                + " g/kg"});
}

} // namespace Airwright::Core::Chain
