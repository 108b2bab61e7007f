#include "airwright/core/recovery/AirToAirExchanger.h"
#include "airwright/core/PowerLaw.h"

#include "EffectivenessKernels.h"
#include "FrostKernels.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"
#include "airwright/core/psychro/AirProcesses.h"
#include "airwright/core/psychro/PsychroRaw.h"
#include "airwright/core/psychro/Psychrometrics.h"
#include "airwright/core/recovery/BracketedRoot.h"
#include "airwright/core/recovery/EffectivenessNtu.h"
#include "airwright/core/recovery/FrostOnset.h"

#include <algorithm>
#include <array>
#include <cmath>
#include <cstddef>
#include <limits>
#include <optional>
#include <string>
#include <utility>

namespace Airwright::Core::Recovery {

namespace raw = Psychro::detail;

namespace {

constexpr double kMaxFlowOverRated = 5.0;
constexpr double kTypicalUpperEfficiency = 0.90;
// Temperature tolerance of the wet-surface solve, K: far below any measurement,
// and the energy balance closes exactly whatever it is (see coolWarmStream).
constexpr double kWetSolveTolerance = 1e-4;
// The solve ends without a further evaluation once an interpolation step is
// shorter than this and at most a tenth of the step before it (BracketedRoot.h):
// converging superlinearly, the returned outlet is then typically within 1e-5 K
// of the root, well inside the tolerance (a test holds it to that).
constexpr double kWetSolveAcceptStep = 1e-2;
constexpr double kWetSolveAcceptRatio = 0.1;

// Dry-air basis cp of moist air, the slope of ASHRAE eq. 30 at constant W.
double moistCp(double w) { return raw::enthalpy(1.0, w) - raw::enthalpy(0.0, w); }

// Enthalpy of the water a stream leaves behind, 4186 t J/kg as in the psychro
// layer's clampToSaturation, so every kind balances on the same convention (the
// heat of fusion of frost is not counted: frost is a fault the protection avoids).
double condensateEnthalpy(double tC) { return raw::liquidWaterEnthalpy(tC); }

[[noreturn, gnu::cold, gnu::noinline]] void throwOutOfRange(const char* quantity, double v, const char* unit,
                                                           const char* range)
{
    throw InputError(quantity, v, unit, range);
}

[[noreturn, gnu::cold, gnu::noinline]] void throwFlowOutOfRange(const char* quantity, double m, double maxFlow)
{
    throw InputError(quantity, m, "kg/s", "above 0 .. " + formatNumber(maxFlow) + " kg/s (5 x rated)");
}

// Inline: the operating-point checks run on every evaluation of the solves.
inline void checkRange(const char* quantity, double v, double lo, double hi, const char* unit, const char* range)
{
    if (!(v >= lo && v <= hi)) [[unlikely]]
        throwOutOfRange(quantity, v, unit, range);
}

struct Side {
    double t, w, p, m, cp;
    double capacity() const { return m * cp; }
};

Side sideOf(const Psychro::MoistAirState& s, double m)
{
    const double w = toKilogramsPerKilogram(s.humidityRatio());
    return {toCelsius(s.dryBulb()), w, toPascals(s.pressure()), m, moistCp(w)};
}

// Cooling of the warm stream against a heat rate rate(b), where b multiplies
// the warm side's capacity rate and conductance (1 when dry; AirToAirExchanger.h).
struct WarmOutcome {
    double q = 0.0;          // W, total enthalpy given up (gas + condensate)
    double tOut = 0.0;       // C
    double wOut = 0.0;
    double condensate = 0.0; // kg/s
    double b = 1.0;
    // b of the last rate() call: equal to b within the solve tolerance; a caller
    // that asks rate's kernel again (the cold corner) finds it in its memo.
    double bLastRate = 1.0;
};

// warmDewPoint(): of the warm inlet, C (computed at most once per evaluation,
// shared with the frost margin).
// surelyDryAbove: an outlet above this temperature is known to stay dry (above
// the inlet's dew point), so Ws(t) need not be computed for it.
template <class Rate, class DewPoint>
WarmOutcome coolWarmStream(const Side& warm, double tColdIn, double surelyDryAbove, DewPoint&& warmDewPoint, Rate rate)
{
    const double cw = warm.capacity();
    double bLastRate = 1.0;
    const double qDry = rate(1.0);
    const double tDry = warm.t - qDry / cw;
    if (tDry > surelyDryAbove)
        return {qDry, tDry, warm.w, 0.0, 1.0, 1.0};
    // Saturation humidity ratio, remembering the last two: the solve asks again
    // for the temperatures it has just tried (tDry, and the root it returns, which
    // need not be the last one tried).
    const double wsDry = raw::satHumidityRatio(tDry, warm.p);
    double lastT[2] = {tDry, tDry}, lastWs[2] = {wsDry, wsDry};
    auto satW = [&](double t) {
        if (t == lastT[0])
            return lastWs[0];
        if (t != lastT[1]) {
            lastT[1] = lastT[0];
            lastWs[1] = lastWs[0];
            lastT[0] = t;
            lastWs[0] = raw::satHumidityRatio(t, warm.p);
            return lastWs[0];
        }
        return lastWs[1];
    };
    if (warm.w <= lastWs[0])
        return {qDry, tDry, warm.w, 0.0, 1.0, 1.0};

    const double hIn = raw::enthalpy(warm.t, warm.w);
    auto qAir = [&](double t) {
        const double ws = satW(t);
        if (ws >= warm.w)
            return cw * (warm.t - t);
        return warm.m * (hIn - raw::enthalpy(t, ws) - (warm.w - ws) * condensateEnthalpy(t));
    };
    auto meanSlope = [&](double t, double q) {
        const double drop = warm.t - t;
        return drop > 1e-9 ? q / (cw * drop) : 1.0; // at the inlet itself the path is empty
    };
    auto g = [&](double t) {
        const double q = qAir(t);
        bLastRate = meanSlope(t, q);
        return rate(bLastRate) - q;
    };
    // g > 0 above the root (the surface could take more), g <= 0 at the cold inlet
    // (no rate exceeds b C_warm dT there). Above the dew point b = 1 and
    // g = qDry - C_warm (t_in - t) > 0 because t > tDry.
    const double gDry = g(tDry);
    double lo, hi, fLo, fHi;
    if (gDry > 0.0) {
        lo = tColdIn;
        fLo = g(lo);
        hi = tDry;
        fHi = gDry;
        if (fLo >= 0.0) // rounding at an extreme NTU: the outlet reaches the cold inlet
            hi = lo, fHi = fLo = 0.0;
    } else {
        lo = tDry;
        fLo = gDry;
        // A saturated inlet has its dew point at (or by rounding just above) t_in.
        hi = std::min(warmDewPoint(), warm.t);
        fHi = qDry - cw * (warm.t - hi); // b = 1 at the dew point: no rate call needed
    }
    const double t =
        hi == lo ? lo : findBracketedRoot(g, lo, hi, fLo, fHi, kWetSolveTolerance, 100, kWetSolveAcceptStep,
                                                   kWetSolveAcceptRatio)
                                     .x;
    const double q = qAir(t);
    const double ws = std::min(warm.w, satW(t));
    return {q, t, ws, warm.m * (warm.w - ws), meanSlope(t, q), bLastRate};
}

// Unmixed cross-flow effectiveness of the last few (NTU, Cr) pairs: within one
// evaluation the cold corner asks again for the pair of the converged wet-surface
// step, which the solve has already computed.
struct CrossFlowMemo {
    struct Entry {
        double n = -1.0, cr = -1.0, eps = 0.0; // n = -1: empty (an NTU is never negative)
    };
    std::array<Entry, 4> entries{};
    std::size_t next = 0;

    double operator()(double n, double cr)
    {
        for (const Entry& e : entries)
            if (e.n == n && e.cr == cr)
                return e.eps;
        Entry& e = entries[next];
        next = (next + 1) % entries.size();
        e = {n, cr, Kernels::crossFlowBothUnmixed(n, cr)};
        return e.eps;
    }
};

// An outlet that needs no clamp: core() has already found W <= Ws(t) for it (the
// wet-surface solve caps W at Ws(t), a heated or dry-cooled stream keeps a W below
// it, a rotor outlet passed the clamp test), so pws(t) is not computed again.
Psychro::MoistAirState stateOf(double tC, double w, double p)
{
    return Psychro::detail::stateBelowSaturation(celsius(tC), kilogramsPerKilogram(w), pascals(p));
}

} // namespace

AirToAirExchanger::AirToAirExchanger(ExchangerRating rating) : m_rating(std::move(rating))
{
    const ExchangerKind kind = m_rating.kind;
    const double eps = toFraction(m_rating.ratedTemperatureEfficiency);
    const double q = toCubicMetresPerSecond(m_rating.ratedVolumeFlow);
    checkRange("rated temperature efficiency", eps * 100.0, 0.0, 100.0, "%", "0 .. below 100 %");
    if (!(eps > 0.0 && eps < 1.0))
        throw InputError("rated temperature efficiency", eps * 100.0, "%", "above 0 and below 100 %");
    if (!(q > 0.0 && std::isfinite(q)))
        throw InputError("rated volume flow", q, "m3/s", "above 0");
    checkRange("rated supply pressure drop", toPascals(m_rating.ratedSupplyPressureDrop), 0.0, 1e5, "Pa",
               "0 .. 100000 Pa");
    checkRange("rated extract pressure drop", toPascals(m_rating.ratedExtractPressureDrop), 0.0, 1e5, "Pa",
               "0 .. 100000 Pa");
    m_dpExponent = toFraction(m_rating.pressureDropExponent.value_or(defaultPressureDropExponent(kind)));
    m_htExponent = toFraction(m_rating.heatTransferExponent.value_or(defaultHeatTransferExponent(kind)));
    checkRange("pressure drop exponent", m_dpExponent, 1.0, 2.0, "", "1 .. 2");
    checkRange("heat-transfer exponent", m_htExponent, 0.0, 1.0, "", "0 .. 1");
    const double epsW = toFraction(m_rating.ratedHumidityEfficiency);
    if (transfersMoisture(kind))
        checkRange("rated humidity efficiency", epsW * 100.0, 0.0, 100.0, "%", "0 .. 100 %");
    else if (epsW != 0.0)
        throw InputError("rated humidity efficiency of a " + std::string(toString(kind)), epsW * 100.0, "%",
                         "0 % (only hygroscopic and sorption rotors take up vapour)");

    m_ratedMassFlow = q * kReferenceAirDensity;
    m_ratedCapacityRate = m_ratedMassFlow * moistCp(0.0);
    const double c = m_ratedCapacityRate;

    if (isPlate(kind)) {
        m_ratedNtu = toFraction(ntuFromEffectiveness(arrangementOf(kind), fraction(eps), fraction(1.0)));
        m_ratedSideConductance = 2.0 * m_ratedNtu * c; // 1/UA = 1/hA + 1/hA, sides equal
    } else if (isRotary(kind)) {
        const double crr = toFraction(m_rating.ratedRotorCapacityRatio);
        if (!(crr > 0.0 && crr <= 1000.0))
            throw InputError("rated rotor capacity ratio", crr, "", "above 0 .. 1000");
        const double factor = Kernels::rotorFactor(crr);
        const double epsCf = eps / factor;
        const double epsCfMax = toFraction(maximumEffectiveness(FlowArrangement::CounterFlow, fraction(1.0)));
        if (!(epsCf < epsCfMax))
            throw InputError("rated temperature efficiency of a rotor with capacity ratio " + formatNumber(crr),
                             eps * 100.0, "%", "below " + formatNumber(100.0 * factor * epsCfMax) + " %");
        m_ratedNtu = toFraction(ntuFromEffectiveness(FlowArrangement::CounterFlow, fraction(epsCf), fraction(1.0)));
        m_ratedSideConductance = 2.0 * m_ratedNtu * c;
    } else {
        const double cp = toJoulesPerKilogramKelvin(m_rating.loopFluidSpecificHeat);
        checkRange("loop fluid specific heat", cp, 1000.0, 5000.0, "J/(kg K)", "1000 .. 5000 J/(kg K)");
        checkRange("pump power", toWatts(m_rating.pumpPower), 0.0, 1e6, "W", "0 .. 1000000 W");
        if (m_rating.loopFluidFlow) {
            const double mf = toKilogramsPerSecond(*m_rating.loopFluidFlow);
            if (!(mf > 0.0 && std::isfinite(mf)))
                throw InputError("loop fluid flow", mf, "kg/s", "above 0");
            m_loopCapacityRate = mf * cp;
        } else {
            m_loopCapacityRate = c;
        }
        // Identical coils, Q = dT / (2/(eps_c Cmin_c) - 1/C_f) = eps C dT.
        const double cf = m_loopCapacityRate;
        const double cmin = std::min(c, cf), cmax = std::max(c, cf);
        const double epsCoil = 2.0 * c / (cmin * (1.0 / eps + c / cf));
        const double limit = toFraction(maximumEffectiveness(FlowArrangement::CounterFlow, fraction(cmin / cmax)));
        if (!(epsCoil < limit))
            throw InputError("rated temperature efficiency of a run-around loop with fluid/air capacity ratio "
                                 + formatNumber(cf / c),
                             eps * 100.0, "%", "a value the two coils can reach (each coil below "
                                                   + formatNumber(100.0 * limit) + " %)");
        m_ratedNtu = toFraction(
            ntuFromEffectiveness(FlowArrangement::CounterFlow, fraction(epsCoil), fraction(cmin / cmax)));
        m_ratedCoilConductance = m_ratedNtu * cmin;
    }
}

bool AirToAirExchanger::exceedsTypicalEfficiency() const
{
    return toFraction(m_rating.ratedTemperatureEfficiency) > kTypicalUpperEfficiency;
}

AirToAirExchanger::Invariants AirToAirExchanger::invariants(const ExchangerOperatingPoint& point) const
{
    // Rotors and plates: each side's film conductance; loops: the air side
    // dominates a finned coil's resistance, the loop flow is constant.
    Invariants r{powerLaw(toKilogramsPerSecond(point.supplyDryAirFlow) / m_ratedMassFlow, m_htExponent),
                 powerLaw(toKilogramsPerSecond(point.extractDryAirFlow) / m_ratedMassFlow, m_htExponent),
                 std::nullopt};
    const bool extractWarm = point.extractInlet.dryBulb() > point.supplyInlet.dryBulb();
    const Psychro::MoistAirState& warm = extractWarm ? point.extractInlet : point.supplyInlet;
    const double pw = raw::vapourPressureFromHumidityRatio(toKilogramsPerKilogram(warm.humidityRatio()),
                                                           toPascals(warm.pressure()));
    if (pw >= raw::minSatPressure() && pw <= raw::maxSatPressure())
        r.warmDewPoint = raw::dewPointFromVapourPressure(pw);
    return r;
}

// Everything of one evaluation except the outlet states and pressure drops, in
// raw doubles, so that the control and frost solves can stop here.
struct AirToAirExchanger::CoreOutcome {
    double msTotal = 0.0, ms = 0.0, me = 0.0, beta = 0.0;
    double supT = 0.0, supW = 0.0, supP = 0.0, supCp = 0.0;
    double extT = 0.0, extW = 0.0, extP = 0.0;
    double tsOut = 0.0, wsOut = 0.0, teOut = 0.0, weOut = 0.0;
    double condS = 0.0, condE = 0.0, moisture = 0.0;
    double surface = 0.0;
    bool frost = false;
    double margin = 1.0;
    bool supplyClampNeeded = false, extractClampNeeded = false;
    std::optional<RunAroundLoopState> loop;
};

AirToAirExchanger::CoreOutcome AirToAirExchanger::core(const ExchangerOperatingPoint& point, bool frostFigures,
                                                      const std::optional<Invariants>& known) const
{
    const ExchangerKind kind = m_rating.kind;
    const double maxFlow = kMaxFlowOverRated * m_ratedMassFlow;
    const double msTotal = toKilogramsPerSecond(point.supplyDryAirFlow);
    const double me = toKilogramsPerSecond(point.extractDryAirFlow);
    auto checkFlow = [maxFlow](const char* quantity, double m) {
        if (!(m > 0.0 && m <= maxFlow)) [[unlikely]]
            throwFlowOutOfRange(quantity, m, maxFlow);
    };
    checkFlow("supply dry-air flow", msTotal);
    checkFlow("extract dry-air flow", me);
    const double beta = toFraction(point.bypassFraction);
    const double speed = toFraction(point.rotorSpeedRatio);
    checkRange("bypass fraction", beta, 0.0, 1.0, "", "0 .. 1");
    checkRange("rotor speed ratio", speed, 0.0, 1.0, "", "0 .. 1");

    const Side supIn = sideOf(point.supplyInlet, msTotal * (1.0 - beta));
    const Side extIn = sideOf(point.extractInlet, me);
    const double ms = supIn.m;
    // Conductance scale of the supply core flow msTotal (1 - beta) and of the extract flow.
    const double totalSupplyScale = known ? known->supply : powerLaw(msTotal / m_ratedMassFlow, m_htExponent);
    const double scaleSupply = beta > 0.0 ? totalSupplyScale * powerLaw(1.0 - beta, m_htExponent) : totalSupplyScale;
    const double scaleExtract = known ? known->extract : powerLaw(me / m_ratedMassFlow, m_htExponent);

    CoreOutcome o;
    o.msTotal = msTotal;
    o.ms = ms;
    o.me = me;
    o.beta = beta;
    o.supT = supIn.t;
    o.supW = supIn.w;
    o.supP = supIn.p;
    o.supCp = supIn.cp;
    o.extT = extIn.t;
    o.extW = extIn.w;
    o.extP = extIn.p;

    // Core outlet of each stream, raw.
    double tsOut = supIn.t, wsOut = supIn.w, teOut = extIn.t, weOut = extIn.w;
    double condS = 0.0, condE = 0.0, moisture = 0.0;
    double surface = std::min(supIn.t, extIn.t);
    bool frost = false;
    double margin = 1.0;

    const bool extractWarm = extIn.t > supIn.t;
    const Side& warm = extractWarm ? extIn : supIn;
    const Side& cold = extractWarm ? supIn : extIn;
    const double dT = warm.t - cold.t;
    const double cWarm = warm.capacity(), cCold = cold.capacity();
    // Plates and loops: the warm stream's vapour pressure and dew point serve both
    // the wet-surface solve and the frost margin.
    const double warmPw = raw::vapourPressureFromHumidityRatio(warm.w, warm.p);
    double warmDew = 0.0;
    bool warmDewKnown = false;
    const auto warmDewPoint = [&] {
        if (!warmDewKnown) {
            warmDew = known && known->warmDewPoint ? *known->warmDewPoint : raw::dewPointFromVapourPressure(warmPw);
            warmDewKnown = true;
        }
        return warmDew;
    };
    // Above this a warm outlet is dry without testing Ws(t) (the margin covers the
    // dew point's rounding, far below 1e-6 K).
    const double surelyDryAbove =
        known && known->warmDewPoint ? *known->warmDewPoint + 1e-6 : std::numeric_limits<double>::infinity();
    // Kelvin of the coldest surface above min(0 C, dew/frost point of the warm stream).
    // A vapour pressure at or above the triple point's has its dew point at or
    // above 0.01 C, so the limit is 0 C without computing it.
    const auto surfaceMargin = [&](double tSurface) {
        const double limit = warmPw >= raw::satPressureAtTriplePoint() || !(warmPw > 0.0)
                                 ? 0.0
                                 : std::min(0.0, warmDewPoint());
        return tSurface - limit;
    };

    if (kind == ExchangerKind::RunAroundCoil) {
        const double cf = m_loopCapacityRate;
        const double cp = toJoulesPerKilogramKelvin(m_rating.loopFluidSpecificHeat);
        double tFluidIntoWarmCoil = cold.t, q = 0.0;
        if (ms > 0.0 && dT > 0.0) {
            const double uaCold = m_ratedCoilConductance * (extractWarm ? scaleSupply : scaleExtract);
            const double uaWarm = m_ratedCoilConductance * (extractWarm ? scaleExtract : scaleSupply);
            auto coil = [cf](double ua, double c) {
                const double cmin = std::min(c, cf), cmax = std::max(c, cf);
                return Kernels::counterFlow(std::min(ua / cmin, kMaxNtu), cmin / cmax) * cmin;
            };
            const double epsCminCold = coil(uaCold, cCold);
            auto rate = [&](double b) { return dT / (1.0 / coil(b * uaWarm, b * cWarm) + 1.0 / epsCminCold - 1.0 / cf); };
            const WarmOutcome w = coolWarmStream(warm, cold.t, surelyDryAbove, warmDewPoint, rate);
            q = w.q;
            tFluidIntoWarmCoil = warm.t - q / coil(w.b * uaWarm, w.b * cWarm);
            const double tColdOut = cold.t + q / cCold;
            (extractWarm ? teOut : tsOut) = w.tOut;
            (extractWarm ? weOut : wsOut) = w.wOut;
            (extractWarm ? condE : condS) = w.condensate;
            (extractWarm ? tsOut : teOut) = tColdOut;
            surface = tFluidIntoWarmCoil;
            if (frostFigures) {
                frost = Kernels::surfaceFrosts(surface, warmPw);
                margin = surfaceMargin(surface);
            }
        }
        const double tFluidWarm = tFluidIntoWarmCoil + q / cf;
        o.loop = RunAroundLoopState{kilogramsPerSecond(cf / cp),
                                    celsius(extractWarm ? tFluidWarm : tFluidIntoWarmCoil),
                                    celsius(extractWarm ? tFluidIntoWarmCoil : tFluidWarm),
                                    watts(extractWarm ? q : -q), m_rating.pumpPower};
    } else if (isPlate(kind)) {
        if (ms > 0.0 && dT > 0.0) {
            const FlowArrangement arrangement = arrangementOf(kind);
            const double haWarm = m_ratedSideConductance * (extractWarm ? scaleExtract : scaleSupply);
            const double haCold = m_ratedSideConductance * (extractWarm ? scaleSupply : scaleExtract);
            // Cross-counter passes go through the memo, where the cold corner below
            // finds the pass of the converged step again.
            const bool crossCounter = arrangement == FlowArrangement::CrossCounterFlow;
            CrossFlowMemo passEffectiveness;
            auto rate = [&](double b) {
                const double cw = b * cWarm;
                const double ua = 1.0 / (1.0 / (b * haWarm) + 1.0 / haCold);
                const double cmin = std::min(cw, cCold), cmax = std::max(cw, cCold);
                const double n = std::min(ua / cmin, kMaxNtu), cr = cmin / cmax;
                const double eps =
                    crossCounter && n > 0.0
                        ? Kernels::crossCounterFlowFromPass(passEffectiveness(n / kCrossCounterFlowPasses, cr), cr,
                                                            kCrossCounterFlowPasses)
                        : Kernels::effectiveness(arrangement, n, cr, kCrossCounterFlowPasses);
                return eps * cmin * dT;
            };
            const WarmOutcome w = coolWarmStream(warm, cold.t, surelyDryAbove, warmDewPoint, rate);
            (extractWarm ? teOut : tsOut) = w.tOut;
            (extractWarm ? weOut : wsOut) = w.wOut;
            (extractWarm ? condE : condS) = w.condensate;
            (extractWarm ? tsOut : teOut) = cold.t + w.q / cCold;
            if (frostFigures) {
                // Cold corner with the converged wet-side augmentation.
                const double cw = w.bLastRate * cWarm, haW = w.bLastRate * haWarm;
                const double ua = 1.0 / (1.0 / haW + 1.0 / haCold);
                const double cmin = std::min(cw, cCold), cmax = std::max(cw, cCold);
                const double n = std::min(ua / cmin, kMaxNtu), cr = cmin / cmax;
                const std::optional<double> passEps =
                    crossCounter ? std::optional<double>(passEffectiveness(n / kCrossCounterFlowPasses, cr))
                                 : std::nullopt;
                surface = Kernels::coldCornerSurface(arrangement, cold.t, warm.t, w.tOut, n, cr, cw <= cCold,
                                                     haCold / (haCold + haW), passEps);
                frost = Kernels::surfaceFrosts(surface, warmPw);
                margin = surfaceMargin(surface);
            }
        }
    } else { // rotors
        if (ms > 0.0) {
            const double cs = supIn.capacity(), ce = extIn.capacity();
            const double ua =
                1.0 / (1.0 / (m_ratedSideConductance * scaleSupply) + 1.0 / (m_ratedSideConductance * scaleExtract));
            const double cmin = std::min(cs, ce), cmax = std::max(cs, ce);
            const double rotorRatio = toFraction(m_rating.ratedRotorCapacityRatio) * speed * m_ratedCapacityRate / cmin;
            const double eps = Kernels::counterFlow(std::min(ua / cmin, kMaxNtu), cmax > 0.0 ? cmin / cmax : 0.0)
                               * Kernels::rotorFactor(rotorRatio);
            const double q = eps * cmin * (extIn.t - supIn.t); // to the supply air
            tsOut = supIn.t + q / cs;
            teOut = extIn.t - q / ce;
            double epsW = 0.0;
            if (transfersMoisture(kind)) {
                epsW = std::min(1.0, toFraction(m_rating.ratedHumidityEfficiency) * eps
                                         / toFraction(m_rating.ratedTemperatureEfficiency));
                moisture = epsW * std::min(ms, me) * (extIn.w - supIn.w);
            } else if (dT > 0.0) {
                // Condensation rotor: water condensed from the cooled stream is
                // taken up again by the heated one as far as it stays unsaturated.
                const double tWarmOut = extractWarm ? teOut : tsOut;
                const double tColdOut = extractWarm ? tsOut : teOut;
                const double condensed = warm.m * std::max(0.0, warm.w - raw::satHumidityRatio(tWarmOut, warm.p));
                const double room = cold.m * std::max(0.0, raw::satHumidityRatio(tColdOut, cold.p) - cold.w);
                moisture = (extractWarm ? 1.0 : -1.0) * std::min(condensed, room);
            }
            wsOut = supIn.w + moisture / ms;
            weOut = extIn.w - moisture / me;
            // Energy by enthalpy bookkeeping: what the supply gains the extract loses.
            const double qTotal = ms * (raw::enthalpy(tsOut, wsOut) - raw::enthalpy(supIn.t, supIn.w));
            teOut = raw::dryBulbFromEnthalpy(raw::enthalpy(extIn.t, extIn.w) - qTotal / me, weOut);
            o.supplyClampNeeded = wsOut > raw::satHumidityRatio(tsOut, supIn.p);
            o.extractClampNeeded = weOut > raw::satHumidityRatio(teOut, extIn.p);
            surface = cold.t;
            if (frostFigures && dT > 0.0 && cold.t < 0.0) {
                const double wEff = warm.w - epsW * (warm.w - cold.w);
                const double excess = Kernels::mixingLineSupersaturation(cold.t, cold.w, warm.t, wEff, cold.p);
                frost = excess > 0.0;
                margin = -1000.0 * excess;
            }
        }
    }
    o.tsOut = tsOut;
    o.wsOut = wsOut;
    o.teOut = teOut;
    o.weOut = weOut;
    o.condS = condS;
    o.condE = condE;
    o.moisture = moisture;
    o.surface = surface;
    o.frost = frost;
    o.margin = margin;
    return o;
}

AirToAirExchanger::ControlFigures AirToAirExchanger::controlFigures(const ExchangerOperatingPoint& point) const
{
    return figures(point, true);
}

AirToAirExchanger::ControlFigures AirToAirExchanger::controlFigures(const ExchangerOperatingPoint& point,
                                                                    const Invariants& known) const
{
    return figures(point, true, known);
}

AirToAirExchanger::ControlFigures AirToAirExchanger::figures(const ExchangerOperatingPoint& point, bool frostFigures,
                                                             const std::optional<Invariants>& known) const
{
    const CoreOutcome o = core(point, frostFigures, known);
    double tSup = o.tsOut;
    bool exact = !o.supplyClampNeeded;
    if (o.ms <= 0.0) {
        tSup = o.supT;
    } else if (o.beta > 0.0) {
        // Adiabatic mixing of core and bypass air, as Psychro::mix does it; a mix
        // that would fog is left to the full evaluation (it clamps).
        const double fa = o.ms / o.msTotal;
        const double w = fa * o.wsOut + (1.0 - fa) * o.supW;
        const double h = fa * raw::enthalpy(o.tsOut, o.wsOut) + (1.0 - fa) * raw::enthalpy(o.supT, o.supW);
        tSup = std::clamp(raw::dryBulbFromEnthalpy(h, w), Psychro::kMinTemperatureC, Psychro::kMaxTemperatureC);
        if (o.wsOut != o.supW && w > raw::satHumidityRatio(tSup, o.supP))
            exact = false;
    }
    if (!exact)
        return {evaluate(point, known).supplyOutlet.dryBulb(), o.margin};
    return {celsius(tSup), o.margin};
}

ExchangerPerformance AirToAirExchanger::evaluate(const ExchangerOperatingPoint& point) const
{
    return evaluate(point, std::nullopt);
}

ExchangerPerformance AirToAirExchanger::evaluate(const ExchangerOperatingPoint& point,
                                                 const std::optional<Invariants>& known) const
{
    const ExchangerKind kind = m_rating.kind;
    CoreOutcome o = core(point, true, known);
    const double msTotal = o.msTotal, ms = o.ms, me = o.me;

    // Outlet states; a supersaturated rotor outlet is brought back to saturation.
    auto outlet = [](double t, double w, double p, bool clamp, double m, double& condensate) {
        if (!clamp)
            return stateOf(t, w, p);
        const Psychro::ProcessOutcome r = Psychro::clampToSaturation(celsius(t), kilogramsPerKilogram(w), pascals(p));
        condensate += m * toKilogramsPerKilogram(r.condensate);
        return r.outlet;
    };
    const Psychro::MoistAirState coreSupply = outlet(o.tsOut, o.wsOut, o.supP, o.supplyClampNeeded, ms, o.condS);
    const Psychro::MoistAirState extractOut = outlet(o.teOut, o.weOut, o.extP, o.extractClampNeeded, me, o.condE);

    Psychro::MoistAirState supplyOut = coreSupply;
    if (ms <= 0.0) {
        supplyOut = point.supplyInlet;
    } else if (o.beta > 0.0 && o.supplyClampNeeded) {
        // A wheel's fog is droplets carried by the air, not water drained in the
        // matrix: the unclamped core outlet (air plus its liquid, the same total
        // enthalpy, ASHRAE Fundamentals ch. 1) mixes with the bypass air, and what
        // is still liquid after the mix drops out once, at the mixed temperature.
        // So all the supply side's condensate leaves at the supply outlet's
        // temperature, which HeatRecoveryEvaluator relies on.
        o.condS = 0.0;
        const double fa = ms / msTotal;
        const double w = fa * o.wsOut + (1.0 - fa) * o.supW;
        const double h = fa * raw::enthalpy(o.tsOut, o.wsOut) + (1.0 - fa) * raw::enthalpy(o.supT, o.supW);
        const double t = std::clamp(raw::dryBulbFromEnthalpy(h, w), Psychro::kMinTemperatureC, Psychro::kMaxTemperatureC);
        const Psychro::ProcessOutcome mixed = Psychro::clampToSaturation(celsius(t), kilogramsPerKilogram(w), point.supplyInlet.pressure());
        supplyOut = mixed.outlet;
        o.condS = msTotal * toKilogramsPerKilogram(mixed.condensate);
    } else if (o.beta > 0.0) {
        const Psychro::ProcessOutcome mixed =
            Psychro::mix(coreSupply, kilogramsPerSecond(ms), point.supplyInlet, kilogramsPerSecond(msTotal - ms));
        supplyOut = mixed.outlet;
        o.condS += msTotal * toKilogramsPerKilogram(mixed.condensate);
    }

    const double tSup = toCelsius(supplyOut.dryBulb());
    const double wSup = toKilogramsPerKilogram(supplyOut.humidityRatio());
    const double dTin = o.extT - o.supT;
    const double dWin = o.extW - o.supW;
    auto pressureDrop = [&](Pressure rated, double m, const Psychro::MoistAirState& in) {
        if (m <= 0.0)
            return pascals(0.0);
        // dp ~ rho^(x-1) V^x = m^x / rho (x = 1 laminar, 2 turbulent).
        return rated * (powerLaw(m / m_ratedMassFlow, m_dpExponent) * kReferenceAirDensity
                        / toKilogramsPerCubicMetre(in.density()));
    };

    return ExchangerPerformance{
        supplyOut,
        extractOut,
        watts(msTotal * o.supCp * (tSup - o.supT)),
        watts(msTotal * (raw::enthalpy(tSup, wSup) - raw::enthalpy(o.supT, o.supW))),
        fraction(dTin != 0.0 ? (tSup - o.supT) / dTin : 0.0),
        fraction(dWin != 0.0 ? (wSup - o.supW) / dWin : 0.0),
        kilogramsPerSecond(o.moisture),
        kilogramsPerSecond(o.condS),
        kilogramsPerSecond(o.condE),
        // The bypass damper is matched to the core, so the supply side loses the
        // core's pressure drop at the full supply flow whatever the bypass share
        // (common practice).
        pressureDrop(m_rating.ratedSupplyPressureDrop, msTotal, point.supplyInlet),
        pressureDrop(m_rating.ratedExtractPressureDrop, me, point.extractInlet),
        kind == ExchangerKind::RunAroundCoil ? m_rating.pumpPower : watts(0.0),
        celsius(o.surface),
        o.frost,
        o.margin,
        point.bypassFraction,
        point.rotorSpeedRatio,
        o.loop,
    };
}

Ratio AirToAirExchanger::thermalEfficiencyEu1253() const
{
    const Pressure p = pascals(101325.0);
    const ExchangerOperatingPoint point{
        Psychro::MoistAirState::fromDryBulbHumidityRatio(celsius(5.0), kilogramsPerKilogram(0.0), p),
        kilogramsPerSecond(m_ratedMassFlow),
        Psychro::MoistAirState::fromDryBulbHumidityRatio(celsius(25.0), kilogramsPerKilogram(0.0), p),
        kilogramsPerSecond(m_ratedMassFlow),
    };
    return evaluate(point).temperatureEffectiveness;
}

SetpointControlResult AirToAirExchanger::controlSupplyTemperature(const ExchangerOperatingPoint& point,
                                                                  AbsoluteTemperature setpoint,
                                                                  const std::optional<ControlStart>& start) const
{
    const bool rotor = isRotary(m_rating.kind);
    // Control value c: bypass fraction (1 = no recovery) or speed (0 = no recovery).
    const double none = rotor ? 0.0 : 1.0;
    const double full = rotor ? 1.0 : 0.0;
    auto pointAt = [&](double c) {
        ExchangerOperatingPoint p = point;
        (rotor ? p.rotorSpeedRatio : p.bypassFraction) = fraction(c);
        return p;
    };
    // Only bypass or speed changes from here on (core() checks the flows before
    // using what invariants() worked out from them).
    const std::optional<Invariants> invariant = invariants(point);
    auto at = [&](double c) { return evaluate(pointAt(c), invariant); };
    // The last two evaluations of the solve, for the local slope it reports.
    double lastC[2] = {0.0, 0.0}, lastT[2] = {0.0, 0.0};
    int evaluations = 0;
    // Only the supply outlet temperature matters inside the solve.
    auto tOutAt = [&](double c) {
        const double t = toCelsius(figures(pointAt(c), false, invariant).supplyOutlet);
        lastC[1] = lastC[0];
        lastT[1] = lastT[0];
        lastC[0] = c;
        lastT[0] = t;
        ++evaluations;
        return t;
    };
    const double tIn = toCelsius(point.supplyInlet.dryBulb());
    const double target = toCelsius(setpoint);
    checkRange("supply temperature setpoint", target, Psychro::kMinTemperatureC, Psychro::kMaxTemperatureC, "C",
               "-100 .. 200 C");
    // Full recovery: evaluated in full when the last solve ended there (or there
    // is none), as it most likely ends there again (out of reach in cold weather)
    // and then that evaluation is the result.
    std::optional<ExchangerPerformance> fullPerformance;
    double tFull = 0.0;
    if (start && start->fullRecoveryOutlet) {
        tFull = toCelsius(*start->fullRecoveryOutlet);
    } else if (!start || toFraction(start->control) == full) {
        fullPerformance = at(full);
        tFull = toCelsius(fullPerformance->supplyOutlet.dryBulb());
    } else {
        tFull = tOutAt(full);
    }
    const double reach = tFull - tIn;
    const double want = target - tIn;
    const double chord = reach / (full - none);
    // The result with what the solve learnt on the way.
    auto result = [&](double c, bool reached) {
        SetpointControlResult r{fraction(c), reached,
                                c == full && fullPerformance ? std::move(*fullPerformance) : at(c), celsius(tFull),
                                std::nullopt};
        if (evaluations >= 2 && lastC[0] != lastC[1]) {
            const double slope = (lastT[0] - lastT[1]) / (lastC[0] - lastC[1]);
            if (slope * chord > 0.0 && std::isfinite(slope))
                r.outletChangePerControl = kelvinDifference(slope);
        }
        return r;
    };
    constexpr double tolerance = 1e-6; // K
    constexpr double controlTolerance = 1e-9;
    // Interpolation steps shorter than this end the solve (BracketedRoot.h): the
    // outlet is then within about 1e-9 K of the setpoint, without the evaluations
    // that only shrink the bracket around it.
    constexpr double acceptStep = 1e-7;

    if (reach * want <= 0.0 || std::abs(reach) < tolerance) {
        // Recovery would move away from the setpoint (or cannot move at all).
        return result(none, std::abs(want) < tolerance);
    }
    if (std::abs(want) >= std::abs(reach))
        return result(full, std::abs(want - reach) < tolerance);

    auto f = [&](double c) { return tOutAt(c) - target; };
    if (start) {
        // From the last control value, the first step along the last slope (or
        // the chord from no to full recovery).
        const double x0 = std::clamp(toFraction(start->control), std::min(none, full), std::max(none, full));
        double slope = chord;
        if (start->outletChangePerControl) {
            const double known = start->outletChangePerControl->value();
            if (known * chord > 0.0 && std::isfinite(known))
                slope = known;
        }
        if (const auto c = findRootFromWarmStart(f, x0, f(x0), slope, std::min(none, full), std::max(none, full),
                                                 2.0 * controlTolerance, controlTolerance, 100, acceptStep))
            return result(*c, true);
    }
    const double c = findBracketedRoot(f, none, full, -want, reach - want, controlTolerance, 100, acceptStep).x;
    return result(c, true);
}

std::optional<AbsoluteTemperature>
AirToAirExchanger::frostOnsetOutdoorTemperature(const Psychro::MoistAirState& extract,
                                                Ratio outdoorRelativeHumidity) const
{
    return Recovery::frostOnsetOutdoorTemperature(m_rating.kind, extract, m_rating.ratedTemperatureEfficiency,
                                                  m_rating.ratedHumidityEfficiency, outdoorRelativeHumidity);
}

} // namespace Airwright::Core::Recovery
