#include "CaseSolver.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/chain/ChainSolver.h"
#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/psychro/Psychrometrics.h"

#include <algorithm>
#include <cmath>
#include <iterator>
#include <limits>
#include <type_traits>
#include <utility>

namespace Airwright::Core::Chain {

namespace {

constexpr double kStandardAirDensity = 1.2; // kg/m3, moist air (EN 13053, common practice)
constexpr double kConvergence = 1e-4;       // K; W and p scaled to match, see largestChange
// Largest observed contraction per iteration for which run() estimates the
// distance left to the fixed point from it (the passes usually contract a
// hundredfold per iteration; a slower one must settle by its changes alone).
constexpr double kTrustedContraction = 0.05;
// A fan is computed again in the same pass when the drops it serves moved by more
// than this since (1 % of what the convergence test sees, Pa).
constexpr double kFanPressureTolerance = 2e-2;
constexpr int kFanSweeps = 3;
constexpr std::size_t kNone = static_cast<std::size_t>(-1);

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

bool isFan(const Section& s) { return specAs<Sections::Fan>(s) != nullptr; }

std::size_t firstFan(const std::vector<Section>& path)
{
    const auto it = std::find_if(path.begin(), path.end(), isFan);
    return static_cast<std::size_t>(it - path.begin());
}

// Sections whose outcome depends on the temperature target (coils); the others
// ignore it, so a new target does not make them compute again.
bool usesTarget(const Section& s)
{
    return specAs<Sections::WaterHeatingCoil>(s) || specAs<Sections::ElectricHeater>(s)
           || specAs<Sections::CoolingCoil>(s);
}

// States in results are valid by construction, so the raw formulas of
// Psychrometrics.h serve (the same numbers without the range checks).
double rawEnthalpy(const Psychro::MoistAirState& s)
{
    return Psychro::detail::enthalpy(toCelsius(s.dryBulb()), s.humidityRatio().value());
}

Power enthalpyFlowChange(const Sections::AirStream& in, const Sections::AirStream& out)
{
    return watts(out.dryAir.value() * rawEnthalpy(out.state) - in.dryAir.value() * rawEnthalpy(in.state));
}

VolumeFlow volumeFlowOf(const Sections::AirStream& s)
{
    const auto& st = s.state;
    return cubicMetresPerSecond(
        s.dryAir.value()
        * Psychro::detail::specificVolume(toCelsius(st.dryBulb()), st.humidityRatio().value(), st.pressure().value()));
}

// A target as a plain number for the memo key (NaN: none). GCC 12 at -O3 warns,
// wrongly, about comparing optional quantities.
double targetKey(const std::optional<AbsoluteTemperature>& t)
{
    return t ? t->value() : std::numeric_limits<double>::quiet_NaN();
}

bool sameKey(double a, double b) { return a == b || (std::isnan(a) && std::isnan(b)); }

bool sameStream(const Sections::AirStream& a, const Sections::AirStream& b)
{
    return a.state == b.state && a.dryAir.value() == b.dryAir.value();
}

// emplace_back(inPlace(make)) constructs the element from make()'s return value
// directly (a conversion that returns a prvalue is not a move), for aggregates
// that emplace_back cannot build from their members.
template <class Make>
struct InPlace {
    Make make;
    operator std::invoke_result_t<Make&>() { return make(); }
};
template <class Make>
InPlace<Make> inPlace(Make make)
{
    return InPlace<Make>{std::move(make)};
}

// Fills the result appended to `list` in place (a result is a few hundred bytes:
// built where it stays rather than moved there).
void appendResult(std::vector<SectionResult>& list, const Section& section, PathKind path,
                  const Sections::AirStream& inlet, const Sections::AirStream& outlet, Pressure pIn, Pressure dp,
                  Velocity faceVelocity, MassFlow added, MassFlow removed, SectionDetail&& detail)
{
    // Every member at once, so nothing is first defaulted and then assigned, and
    // built in the vector's own storage (InPlace).
    list.emplace_back(inPlace([&] {
        return SectionResult{.id = section.id,
                             .typeKey = sectionTypeKey(section.spec),
                             .path = path,
                             .inlet = inlet,
                             .outlet = outlet,
                             .staticPressureIn = pIn,
                             .staticPressureOut = pIn - dp,
                             .inletFlow = volumeFlowOf(inlet),
                             .faceVelocity = faceVelocity,
                             .pressureDrop = dp,
                             .duty = enthalpyFlowChange(inlet, outlet),
                             .waterAdded = added,
                             .waterRemoved = removed,
                             .length = sectionLength(section.spec),
                             .detail = std::move(detail)};
    }));
}

} // namespace

CaseSolver::Evaluators CaseSolver::makeEvaluators(const AirHandlingUnit& unit)
{
    Evaluators evaluators(unit.supply.size());
    for (std::size_t i = 0; i < unit.supply.size(); ++i)
        if (const auto* hr = specAs<Recovery::HeatRecovery>(unit.supply[i]))
            evaluators[i] = std::make_shared<const Recovery::HeatRecoveryEvaluator>(*hr, unit.airflows.supply);
    return evaluators;
}

CaseSolver::CaseSolver(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing)
    : CaseSolver(unit, designCase, sizing, makeEvaluators(unit))
{
}

CaseSolver::CaseSolver(const AirHandlingUnit& unit, const DesignCase& designCase, const UnitSizing& sizing,
                       const Evaluators& evaluators)
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

    m_supplyCoupling.assign(unit.supply.size(), kNone);
    m_extractCoupling.assign(unit.extract.size(), kNone);
    m_supplyControlled.assign(unit.supply.size(), false);
    m_couplings.reserve(unit.supply.size());
    for (std::size_t i = 0; i < unit.supply.size(); ++i) {
        m_supplyControlled[i] = isTemperatureControlled(unit.supply[i]);
        if (!isCoupled(unit.supply[i].spec))
            continue;
        Coupling& c = m_couplings.emplace_back();
        c.id = unit.supply[i].id;
        c.supplyIndex = i;
        if (specAs<Recovery::HeatRecovery>(unit.supply[i]))
            c.evaluator = i < evaluators.size() ? evaluators[i] : nullptr;
        if (specAs<Recovery::HeatRecovery>(unit.supply[i]) && !c.evaluator)
            throw Error("internal: no heat recovery model for section " + unit.supply[i].id);
        for (std::size_t j = 0; j < unit.extract.size(); ++j)
            if (unit.extract[j].id == c.id)
                c.extractIndex = j;
        m_supplyCoupling[i] = m_couplings.size() - 1;
        if (c.extractIndex < unit.extract.size() && unit.extract[c.extractIndex].id == c.id)
            m_extractCoupling[c.extractIndex] = m_couplings.size() - 1;
    }
    m_supply.resize(unit.supply.size());
    m_extract.resize(unit.extract.size());
    m_drift.assign(unit.supply.size(), TemperatureDifference{});
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
        if (!(m.value() > 1e-9)) {
            // No air would be left for the rest of the extract path: the flows of
            // the project contradict each other, whatever the air states. The
            // message gives the flows and what would make them fit.
            const double arriving = extractCubicMetresPerHour(m_extractInFlow[k]);
            const std::string where = "in case '" + m_case.name + "' ";
            const std::string supplyPlace = "supply[" + std::to_string(c.supplyIndex) + "]";
            if (const auto* mix = specAs<Sections::MixingBox>(supply[c.supplyIndex])) {
                const MassFlow total = c.recirculated + m_supplyInFlow[c.supplyIndex];
                const double neededPct =
                    std::ceil(100.0 * (1.0 - m_extractInFlow[k].value() / total.value()) + 1e-9);
                throw SectionError(
                    "extract[" + std::to_string(k) + "]",
                    where + "the mixing section '" + extract[k].id + "' recirculates "
                        + formatFixed(extractCubicMetresPerHour(c.recirculated), 0) + " m3/h but only "
                        + formatFixed(arriving, 0)
                        + " m3/h of extract air reaches it; the recirculated air must be less than the extract "
                          "air reaching it: raise outdoor_air_pct of "
                        + supplyPlace + " (now " + formatNumber(toPercent(mix->outdoorAirFraction)) + ") to at least "
                        + formatNumber(std::min(neededPct, 100.0)) + ", or raise airflows.extract_m3h");
            }
            const auto* hr = specAs<Recovery::HeatRecovery>(supply[c.supplyIndex]);
            const MassFlow supplyOut =
                c.supplyIndex + 1 < supply.size() ? m_supplyInFlow[c.supplyIndex + 1] : m_supplyFlow;
            const double lowestOacf = 1.0 - m_extractInFlow[k].value() / supplyOut.value();
            throw SectionError("extract[" + std::to_string(k) + "]",
                               where + "the wheel '" + extract[k].id + "' draws "
                                   + formatFixed(arriving - extractCubicMetresPerHour(m), 0)
                                   + " m3/h from the extract side to the supply side (oacf "
                                   + formatNumber(hr ? hr->outdoorAirCorrection : 1.0) + ") but only "
                                   + formatFixed(arriving, 0)
                                   + " m3/h of extract air reaches it; the air drawn must be less than the extract "
                                     "air reaching it: raise oacf of "
                                   + supplyPlace + " above " + formatFixed(lowestOacf, 3)
                                   + ", or raise airflows.extract_m3h");
        }
    }
}

std::string CaseSolver::placeOf(const Section& section) const
{
    for (std::size_t k = 0; k < m_unit.supply.size(); ++k)
        if (&m_unit.supply[k] == &section)
            return "supply[" + std::to_string(k) + "]";
    for (std::size_t k = 0; k < m_unit.extract.size(); ++k)
        if (&m_unit.extract[k] == &section)
            return "extract[" + std::to_string(k) + "]";
    return "section '" + section.id + "'";
}

double CaseSolver::extractCubicMetresPerHour(MassFlow m) const
{
    // The design extract flow is m_extractFlow of dry air at the room state.
    if (!(m_extractFlow.value() > 0.0))
        return 0.0;
    return toCubicMetresPerHour(m_extractDesignFlow) * (m.value() / m_extractFlow.value());
}

Sections::SectionContext CaseSolver::contextFor(const Sections::AirStream& inlet, Pressure fanPressure) const
{
    Sections::SectionContext ctx;
    ctx.crossSection = m_sizing.crossSection;
    ctx.faceVelocity = volumeFlowOf(inlet) / m_sizing.crossSection;
    ctx.filterCondition = m_case.filterCondition;
    ctx.fanTotalPressure = fanPressure;
    return ctx;
}

void CaseSolver::computeSection(const Section& section, Slot& slot, const Sections::AirStream& air,
                                const Sections::SectionContext& ctx, Pressure pIn)
{
    const Pressure fanPressure = ctx.fanTotalPressure;
    const double target = usesTarget(section) ? targetKey(ctx.target.outletTemperature)
                                              : std::numeric_limits<double>::quiet_NaN();
    const bool unchanged = slot.computed && sameStream(slot.inlet, air) && slot.fanPressure == fanPressure
                           && sameKey(slot.target, target) && slot.dehumidify == ctx.target.dehumidify;
    if (unchanged) {
        slot.staticPressureIn = pIn;
        slot.staticPressureOut = pIn - slot.pressureDrop;
        return;
    }
    // The detail is filled where it stays, the outcome built where it is kept.
    Sections::SectionOutcome outcome = std::visit(
        [&](const auto& spec) -> Sections::SectionOutcome {
            using T = std::decay_t<decltype(spec)>;
            if constexpr (std::is_same_v<T, Sections::MixingBox> || std::is_same_v<T, Recovery::HeatRecovery>
                          || std::is_same_v<T, CoupledSide>) {
                throw Error("internal: coupled section " + section.id + " computed as a plain one");
            } else {
                auto& d = slot.detail.template emplace<typename T::Detail>();
                try {
                    return spec.compute(air, ctx, d);
                } catch (const SectionError&) {
                    throw;
                } catch (const InputError& e) {
                    // Name the case and the section: the section's own message
                    // does not know where it sits.
                    throw SectionError(placeOf(section), "in case '" + m_case.name + "', " + sectionTypeKey(section.spec)
                                                             + " '" + section.id + "': " + e.what());
                }
            }
        },
        section.spec);
    const Pressure pOut = pIn - outcome.pressureDrop;
    slot.computed = true;
    slot.inlet = air;
    slot.fanPressure = fanPressure;
    slot.target = target;
    slot.dehumidify = ctx.target.dehumidify;
    slot.outlet = outcome.outlet;
    slot.pressureDrop = outcome.pressureDrop;
    slot.waterAdded = outcome.waterAdded;
    slot.waterRemoved = outcome.waterRemoved;
    slot.faceVelocity = ctx.faceVelocity;
    slot.findings = std::move(outcome.findings);
    for (auto& f : slot.findings)
        if (f.sectionId.empty())
            f.sectionId = section.id;
    slot.cooledBelowTarget = specAs<Sections::CoolingCoil>(section) && !std::isnan(target)
                             && outcome.outlet.state.dryBulb().value() < target - 0.05;
    slot.staticPressureIn = pIn;
    slot.staticPressureOut = pOut;
}

Pressure CaseSolver::fanPressure(const std::vector<Section>& path, std::vector<Slot>& slots, std::size_t k,
                                 const Sections::AirStream& air, Pressure externalTotal, bool supply)
{
    Pressure internal{};
    int fans = 0;
    for (std::size_t j = 0; j < path.size(); ++j) {
        if (isFan(path[j])) {
            ++fans;
            continue;
        }
        Slot& s = slots[j];
        if (!s.computed && j > k && !isCoupled(path[j].spec) && !std::holds_alternative<CoupledSide>(path[j].spec)) {
            // First pass: a section after the fan has no drop yet; compute it ahead
            // with the air at the fan (its inlet differs a little, so the real pass
            // computes it again).
            Sections::AirStream ahead = air;
            ahead.dryAir = supply ? m_supplyInFlow[j] : m_extractInFlow[j];
            auto ctx = contextFor(ahead, Pressure{});
            ctx.pathDesignFlow = supply ? m_supplyDesignFlow : m_extractDesignFlow;
            if (supply) {
                ctx.target.outletTemperature = aimAt(j);
                ctx.target.minHumidity = m_minHumidity;
                ctx.target.maxHumidity = m_maxHumidity;
                ctx.target.dehumidify = m_maxHumidity.has_value();
            }
            computeSection(path[j], s, ahead, ctx, Pressure{});
        }
        if (s.computed)
            internal += s.pressureDrop;
    }
    // Fans in series share the work equally.
    return fans > 0 ? (internal + externalTotal) / static_cast<double>(fans) : Pressure{};
}

void CaseSolver::extractPass(bool untilFirstExchanger, std::size_t from)
{
    const auto& path = m_unit.extract;
    const auto& flows = m_unit.airflows;
    Sections::AirStream air{*m_room, m_extractFlow};
    Pressure p = -flows.extractExternalBefore;
    if (from > 0) { // the sections before are as the last pass left them
        air = m_extract[from - 1].outlet;
        p = m_extract[from - 1].staticPressureOut;
    }

    for (std::size_t k = from; k < path.size(); ++k) {
        const auto& section = path[k];
        Slot& slot = m_extract[k];
        air.dryAir = m_extractInFlow[k];

        if (std::holds_alternative<CoupledSide>(section.spec)) {
            auto& c = m_couplings[m_extractCoupling[k]];
            c.extractInlet = air;
            const auto& supplySection = m_unit.supply[c.supplyIndex];
            Sections::AirStream out;
            Pressure dp;
            MassFlow removed;
            if (const auto* mix = specAs<Sections::MixingBox>(supplySection)) {
                out = air;
                out.dryAir = k + 1 < path.size() ? m_extractInFlow[k + 1] : air.dryAir - c.recirculated;
                if (out.dryAir.value() < 0.0)
                    out.dryAir = kilogramsPerSecond(0.0);
                const Velocity v = volumeFlowOf(air) / m_sizing.crossSection;
                dp = Sections::dynamicPressureDrop(mix->lossCoefficient, air.density(), v);
                slot.detail = Sections::MixingBox::Detail{mix->outdoorShare(m_supplyDesignFlow), c.recirculated};
                slot.faceVelocity = v;
            } else {
                if (!c.recovery) {
                    if (untilFirstExchanger)
                        return; // the supply pass evaluates it first
                    throw Error("internal: exchanger " + c.id + " not evaluated by the supply pass");
                }
                // The supply pass evaluated the exchanger with the extract air of
                // the pass before; at convergence the two agree (finish() reports
                // the extract side of the final evaluation).
                out = c.recovery->extractOut;
                dp = c.recovery->extractPressureDrop;
                removed = c.recovery->detail.condensate;
                if (!sameStream(slot.inlet, air) || !slot.computed)
                    slot.faceVelocity = volumeFlowOf(air) / m_sizing.crossSection;
            }
            const Pressure pOut = p - dp;
            slot.computed = true;
            slot.inlet = air;
            slot.outlet = out;
            slot.pressureDrop = dp;
            slot.waterRemoved = removed;
            slot.staticPressureIn = p;
            slot.staticPressureOut = pOut;
        } else {
            const Pressure fan = isFan(section)
                                     ? fanPressure(path, m_extract, k, air,
                                                   flows.extractExternalBefore + flows.extractExternalAfter, false)
                                     : Pressure{};
            if (slot.computed && sameStream(slot.inlet, air) && slot.fanPressure == fan) {
                slot.staticPressureIn = p;
                slot.staticPressureOut = p - slot.pressureDrop;
            } else {
                auto ctx = contextFor(air, fan);
                ctx.pathDesignFlow = m_extractDesignFlow;
                computeSection(section, slot, air, ctx, p);
            }
        }
        air = slot.outlet;
        p = slot.staticPressureOut;
    }
}

AbsoluteTemperature CaseSolver::aimAt(std::size_t k) const
{
    const double aim = toCelsius(m_case.supplySetpoint - m_drift[k]);
    return celsius(std::clamp(aim, Psychro::kMinTemperatureC + 1.0, Psychro::kMaxTemperatureC - 1.0));
}

void CaseSolver::updateDrift()
{
    const auto& path = m_unit.supply;
    // Temperature change of the sections after each one that the controls do not
    // set (fans, humidifiers, fixed preheaters), from the last pass: a coil aims at
    // the setpoint less what the air gains after it.
    TemperatureDifference after{};
    for (std::size_t k = path.size(); k-- > 0;) {
        m_drift[k] = after;
        if (!m_supplyControlled[k] && m_supply[k].computed)
            after += m_supply[k].outlet.state.dryBulb() - m_supply[k].inlet.state.dryBulb();
    }
}

bool CaseSolver::fansSettled(const std::vector<Section>& path, const std::vector<Slot>& slots,
                             Pressure externalTotal) const
{
    Pressure internal{};
    int fans = 0;
    for (std::size_t j = 0; j < path.size(); ++j) {
        if (isFan(path[j]))
            ++fans;
        else if (slots[j].computed)
            internal += slots[j].pressureDrop;
    }
    if (fans == 0)
        return true;
    const Pressure each = (internal + externalTotal) / static_cast<double>(fans);
    for (std::size_t j = 0; j < path.size(); ++j)
        if (isFan(path[j]) && std::abs((slots[j].fanPressure - each).value()) > kFanPressureTolerance)
            return false;
    return true;
}

void CaseSolver::supplyPass(std::size_t from)
{
    const auto& path = m_unit.supply;
    const auto& flows = m_unit.airflows;

    Sections::AirStream air{*m_outdoor, m_supplyInFlow.empty() ? m_supplyFlow : m_supplyInFlow.front()};
    Pressure p = -flows.supplyExternalBefore;
    bool dehumidifying = false; // a cooling coil upstream has cooled below the temperature target
    if (from > 0) { // the sections before are as the last pass left them
        air = m_supply[from - 1].outlet;
        p = m_supply[from - 1].staticPressureOut;
        for (std::size_t k = 0; k < from; ++k)
            dehumidifying = dehumidifying || m_supply[k].cooledBelowTarget;
    }

    for (std::size_t k = from; k < path.size(); ++k) {
        const auto& section = path[k];
        Slot& slot = m_supply[k];
        air.dryAir = m_supplyInFlow[k];
        const AbsoluteTemperature aim = aimAt(k);
        const bool hasTarget = !(dehumidifying && isHeating(section) && !m_case.dehumidifyWithReheat);
        const double key = hasTarget && usesTarget(section) ? aim.value() : std::numeric_limits<double>::quiet_NaN();

        if (const auto* mix = specAs<Sections::MixingBox>(section)) {
            auto& c = m_couplings[m_supplyCoupling[k]];
            const Sections::AirStream recirculated{c.extractInlet ? c.extractInlet->state : *m_room, c.recirculated};
            if (!(slot.computed && sameStream(slot.inlet, air) && sameStream(slot.recirculated, recirculated))) {
                auto ctx = contextFor(air, Pressure{});
                ctx.pathDesignFlow = m_supplyDesignFlow;
                ctx.target.outletTemperature = aim;
                ctx.target.minHumidity = m_minHumidity;
                ctx.target.maxHumidity = m_maxHumidity;
                ctx.target.dehumidify = m_maxHumidity.has_value();
                Sections::MixingBox::Detail detail;
                auto outcome = mix->mix(air, recirculated, ctx, detail);
                slot.computed = true;
                slot.inlet = air;
                slot.recirculated = recirculated;
                slot.outlet = outcome.outlet;
                slot.pressureDrop = outcome.pressureDrop;
                slot.waterRemoved = outcome.waterRemoved;
                slot.faceVelocity = ctx.faceVelocity;
                slot.detail = std::move(detail);
                slot.findings = std::move(outcome.findings);
                for (auto& f : slot.findings)
                    if (f.sectionId.empty())
                        f.sectionId = section.id;
            }
            slot.staticPressureIn = p;
            slot.staticPressureOut = p - slot.pressureDrop;
        } else if (const auto* hr = specAs<Recovery::HeatRecovery>(section)) {
            auto& c = m_couplings[m_supplyCoupling[k]];
            Recovery::HeatRecoveryInputs in;
            in.supplyIn = air;
            in.extractIn = c.extractInlet.value_or(Sections::AirStream{*m_room, m_extractInFlow[c.extractIndex]});
            if (hr->bypassControl)
                in.supplyTarget = aimAt(k);
            const auto& out = c.evaluator->evaluate(in, c.memory);
            c.recovery = &out;
            const Pressure pOut = p - out.supplyPressureDrop;
            if (!slot.computed || !sameStream(slot.inlet, air))
                slot.faceVelocity = volumeFlowOf(air) / m_sizing.crossSection;
            slot.computed = true;
            slot.inlet = air;
            slot.outlet = out.supplyOut;
            slot.pressureDrop = out.supplyPressureDrop;
            slot.staticPressureIn = p;
            slot.staticPressureOut = pOut;
        } else {
            const Pressure fan = isFan(section)
                                     ? fanPressure(path, m_supply, k, air,
                                                   flows.supplyExternalBefore + flows.supplyExternalAfter, true)
                                     : Pressure{};
            const bool unchanged = slot.computed && sameStream(slot.inlet, air) && slot.fanPressure == fan
                                   && sameKey(slot.target, key)
                                   && slot.dehumidify == m_maxHumidity.has_value();
            if (unchanged) {
                slot.staticPressureIn = p;
                slot.staticPressureOut = p - slot.pressureDrop;
            } else {
                auto ctx = contextFor(air, fan);
                ctx.pathDesignFlow = m_supplyDesignFlow;
                ctx.target.minHumidity = m_minHumidity;
                ctx.target.maxHumidity = m_maxHumidity;
                if (hasTarget)
                    ctx.target.outletTemperature = aim;
                ctx.target.dehumidify = m_maxHumidity.has_value();
                computeSection(section, slot, air, ctx, p);
            }
            if (slot.cooledBelowTarget)
                dehumidifying = true;
        }
        air = slot.outlet;
        p = slot.staticPressureOut;
    }
}

CaseResult CaseSolver::run()
{
    CaseResult result;
    result.caseName = m_case.name;
    const auto& flows = m_unit.airflows;
    const Pressure supplyExternal = flows.supplyExternalBefore + flows.supplyExternalAfter;
    const Pressure extractExternal = flows.extractExternalBefore + flows.extractExternalAfter;
    int iteration = 0;
    bool converged = false;
    double lastChange = 0.0;
    const std::string* unsettled = nullptr; // id of the section that moved most, in the unit
    extractPass(true, 0);
    std::vector<double> before(3 * (m_supply.size() + m_extract.size()));
    while (iteration < ChainSolver::kMaxIterations) {
        ++iteration;
        snapshot(before);
        updateDrift();
        // A fan whose drops after it moved since it was computed is computed again
        // (with the sections after it) in the same pass. Not in the first
        // iteration: a second always follows it, with the drops of the first.
        const int sweeps = iteration == 1 ? 1 : kFanSweeps;
        supplyPass(0);
        for (int sweep = 1; sweep < sweeps && !fansSettled(m_unit.supply, m_supply, supplyExternal); ++sweep)
            supplyPass(firstFan(m_unit.supply));
        extractPass(false, 0);
        for (int sweep = 1; sweep < sweeps && !fansSettled(m_unit.extract, m_extract, extractExternal); ++sweep)
            extractPass(false, firstFan(m_unit.extract));
        const std::string* where = nullptr;
        const double change = largestChange(before, where);
        // Settled when the distance left to the fixed point is below kConvergence.
        // For an iteration contracting by rho per step that distance is at most
        // change * rho / (1 - rho) (the a-posteriori bound of the contraction
        // mapping theorem); rho is estimated from the last two changes and trusted
        // only when it is clearly small, otherwise the change itself must be.
        const double rho = lastChange > 0.0 ? change / lastChange : 1.0;
        const double left = rho <= kTrustedContraction ? change * rho / (1.0 - rho) : change;
        if (iteration >= 2 && (change < kConvergence || left < kConvergence)) {
            converged = true;
            break;
        }
        // The first iteration's change is measured from nothing (a zero snapshot):
        // not a contraction, so the estimate starts from the second.
        lastChange = iteration >= 2 ? change : 0.0;
        unsettled = where;
    }
    finish(result, iteration, converged, unsettled ? *unsettled : std::string());
    return result;
}

void CaseSolver::snapshot(std::vector<double>& values) const
{
    std::size_t i = 0;
    for (const auto* slots : {&m_supply, &m_extract}) {
        for (const Slot& s : *slots) {
            values[i++] = s.outlet.state.dryBulb().value();
            values[i++] = s.outlet.state.humidityRatio().value();
            values[i++] = s.staticPressureOut.value();
        }
    }
}

double CaseSolver::largestChange(const std::vector<double>& before, const std::string*& where) const
{
    double largest = 0.0;
    std::size_t i = 0;
    for (const auto* path : {&m_unit.supply, &m_unit.extract}) {
        const auto& slots = path == &m_unit.supply ? m_supply : m_extract;
        for (std::size_t k = 0; k < slots.size(); ++k, i += 3) {
            const Slot& s = slots[k];
            // K; humidity ratio scaled so 1e-8 kg/kg counts as 1e-4; pressure so 0.01 Pa does.
            const double change = std::max({std::abs(s.outlet.state.dryBulb().value() - before[i]),
                                            std::abs(s.outlet.state.humidityRatio().value() - before[i + 1]) * 1e4,
                                            std::abs(s.staticPressureOut.value() - before[i + 2]) * 1e-2});
            if (!(change <= largest)) {
                largest = std::isfinite(change) ? change : 1e300;
                where = &(*path)[k].id;
            }
        }
    }
    return largest;
}

void CaseSolver::finish(CaseResult& result, int iterations, bool converged, const std::string& unsettled)
{
    result.iterations = iterations;
    result.converged = converged;
    auto& findings = result.findings;
    findings = m_caseFindings;

    result.supply.reserve(m_supply.size());
    // The slots are not used after this: their details and findings move out.
    for (std::size_t k = 0; k < m_supply.size(); ++k) {
        Slot& s = m_supply[k];
        const Section& section = m_unit.supply[k];
        if (m_supplyCoupling[k] != kNone && m_couplings[m_supplyCoupling[k]].recovery) {
            const auto& out = *m_couplings[m_supplyCoupling[k]].recovery;
            appendResult(result.supply, section, PathKind::Supply, s.inlet, s.outlet, s.staticPressureIn,
                         s.pressureDrop, s.faceVelocity, MassFlow{}, MassFlow{}, SectionDetail{out.detail});
            for (Finding f : out.findings) {
                if (f.sectionId.empty())
                    f.sectionId = section.id;
                findings.push_back(std::move(f));
            }
        } else {
            appendResult(result.supply, section, PathKind::Supply, s.inlet, s.outlet, s.staticPressureIn,
                         s.pressureDrop, s.faceVelocity, s.waterAdded, s.waterRemoved, std::move(s.detail));
            findings.insert(findings.end(), std::make_move_iterator(s.findings.begin()),
                            std::make_move_iterator(s.findings.end()));
        }
    }
    result.extract.reserve(m_extract.size());
    for (std::size_t k = 0; k < m_extract.size(); ++k) {
        Slot& s = m_extract[k];
        const Section& section = m_unit.extract[k];
        if (m_extractCoupling[k] != kNone) {
            const Coupling& c = m_couplings[m_extractCoupling[k]];
            const Section& supplySection = m_unit.supply[c.supplyIndex];
            // An exchanger's findings are already there from the supply side.
            appendResult(result.extract, supplySection, PathKind::Extract, s.inlet, s.outlet, s.staticPressureIn,
                         s.pressureDrop, s.faceVelocity, MassFlow{}, s.waterRemoved,
                         c.recovery ? SectionDetail{c.recovery->detail} : std::move(s.detail));
        } else {
            appendResult(result.extract, section, PathKind::Extract, s.inlet, s.outlet, s.staticPressureIn,
                         s.pressureDrop, s.faceVelocity, s.waterAdded, s.waterRemoved, std::move(s.detail));
            for (auto& f : s.findings)
                if (std::find(findings.begin(), findings.end(), f) == findings.end())
                    findings.push_back(std::move(f));
        }
    }

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
    // Built only for a finding: most cases meet their setpoint.
    const auto leaves = [&] { return "supply air leaves at " + formatFixed(toCelsius(leaving.dryBulb()), 1) + " C"; };
    const auto setpoint = [&] { return " the setpoint " + formatFixed(toCelsius(m_case.supplySetpoint), 1) + " C"; };
    if (error < -0.5) {
        std::string why = hasHeating ? "" : ": the supply path has no heating";
        if (hasHeating && m_maxHumidity && !m_case.dehumidifyWithReheat)
            why = ": dehumidification without reheat";
        findings.push_back({hasHeating ? Severity::Warning : Severity::Error, "setpoint.too_cold", "",
                            leaves() + ", " + formatFixed(-error, 1) + " K below" + setpoint() + why});
    } else if (error > 0.5) {
        findings.push_back({Severity::Warning, "setpoint.too_warm", "",
                            leaves() + ", " + formatFixed(error, 1) + " K above" + setpoint()
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
