#include "airwright/core/checks/MeasurementPoints.h"

#include "airwright/core/InputError.h"
#include "airwright/core/NumberFormat.h"

#include <algorithm>
#include <cmath>
#include <map>
#include <type_traits>

namespace Airwright::Core::Checks {

namespace {

using Chain::PathKind;
using Chain::SectionResult;

// Frost thermostat after a water heating coil: common practice, about +5 C
// (ASHRAE Guideline 36-2021 describes staged freeze protection on this reading).
constexpr double kFrostThermostatC = 5.0;
// High-limit humidistat after a humidifier: common practice, about 90 % RH, so the
// air leaving the humidifier never reaches saturation and wets the duct.
constexpr double kHumidityHighLimitPct = 90.0;

// The value type of each quantity, so a point never mixes units.
template <class Q>
constexpr PointQuantity quantityOf()
{
    if constexpr (std::is_same_v<Q, AbsoluteTemperature>)
        return PointQuantity::Temperature;
    else if constexpr (std::is_same_v<Q, Ratio>)
        return PointQuantity::RelativeHumidity;
    else if constexpr (std::is_same_v<Q, Pressure>)
        return PointQuantity::DifferentialPressure;
    else
        return PointQuantity::AirVolumeFlow;
}

// Lowest and highest of one quantity over the cases.
template <class Q>
class Spread {
public:
    void add(Q value)
    {
        if (!m_any) {
            m_low = m_high = value;
            m_any = true;
            return;
        }
        m_low = std::min(m_low, value);
        m_high = std::max(m_high, value);
    }
    Q low() const { return m_low; }
    Q high() const { return m_high; }

private:
    bool m_any = false;
    Q m_low{};
    Q m_high{};
};

const SectionResult& resultOf(const Chain::CaseResult& c, PathKind path, const std::string& id)
{
    const SectionResult* r = c.find(path, id);
    if (r == nullptr)
        throw InputError(std::string("case '") + c.caseName + "' has no result for the " + Chain::pathKey(path)
                         + " section '" + id + "': the result does not belong to this unit");
    return *r;
}

template <class Detail>
const Detail& detailOf(const SectionResult& r)
{
    const auto* d = std::get_if<Detail>(&r.detail);
    if (d == nullptr)
        throw InputError("section '" + r.id + "' has no " + r.typeKey + " figures in case results");
    return *d;
}

std::string pathAbbreviation(PathKind path) { return path == PathKind::Supply ? "SUP" : "ETA"; }

double finiteValue(const PointValue& v)
{
    const double x = toPointUnit(v);
    if (!std::isfinite(x))
        throw InputError("measuring point value", x, "", "finite");
    return x;
}

template <class Q>
void setRange(MeasurementPoint& p, const Spread<Q>& s)
{
    p.quantity = quantityOf<Q>();
    p.expectedLow = s.low();
    p.expectedHigh = s.high();
}

// The transmitter must show the expected range and every setpoint.
void chooseTransmitter(MeasurementPoint& p)
{
    if (p.quantity == PointQuantity::AirVolumeFlow)
        return;
    PointValue low = p.expectedLow;
    PointValue high = p.expectedHigh;
    for (const auto& s : p.setpoints) {
        if (finiteValue(s.value) < finiteValue(low))
            low = s.value;
        if (finiteValue(s.value) > finiteValue(high))
            high = s.value;
    }
    p.transmitter = suggestTransmitterRange(p.quantity, low, high);
}

// Cases with the same setpoint share one entry: "setpoint (winter design, mid-season)".
template <class Q>
void addGroupedSetpoints(MeasurementPoint& p, const std::string& key, const std::string& label,
                         const std::vector<std::pair<std::string, Q>>& perCase, const std::string& basis)
{
    std::vector<std::pair<Q, std::string>> groups;
    for (const auto& [name, value] : perCase) {
        // A named reference: clang before 16 cannot capture a structured binding.
        const auto& caseValue = value;
        auto it = std::find_if(groups.begin(), groups.end(), [&](const auto& g) { return g.first == caseValue; });
        if (it == groups.end())
            groups.push_back({value, name});
        else
            it->second += ", " + name;
    }
    for (const auto& [value, names] : groups)
        p.setpoints.push_back({key, groups.size() == 1 ? label : label + " (" + names + ")", value, basis});
}

// The point before or after section index i of a path.
std::string idAt(const std::vector<Chain::Section>& path, std::size_t i)
{
    return i < path.size() ? path[i].id : std::string();
}

class PointBuilder {
public:
    PointBuilder(const Chain::AirHandlingUnit& unit, const Chain::UnitResult& result) : m_unit(unit), m_result(result)
    {
        if (result.cases.empty())
            throw InputError("measuring points need at least one computed design case");
    }

    // Supply path in flow order, then extract; the extract humidity sits with the
    // extract temperature at the path's inlet.
    std::vector<MeasurementPoint> build()
    {
        outdoorTemperature();
        supplyPathSections();
        supplyTemperature();
        humidityPoints();
        extractTemperature();
        extractHumidityPoint();
        extractPathSections();
        for (auto& p : m_points)
            chooseTransmitter(p);
        return std::move(m_points);
    }

private:
    const std::vector<Chain::Section>& path(PathKind kind) const
    {
        return kind == PathKind::Supply ? m_unit.supply : m_unit.extract;
    }

    // Where the air enters the path is the first section's inlet; leaving, the last one's outlet.
    template <class Getter>
    Spread<AbsoluteTemperature> temperatures(PathKind kind, const std::string& id, Getter get) const
    {
        Spread<AbsoluteTemperature> s;
        for (const auto& c : m_result.cases)
            s.add(get(resultOf(c, kind, id)).state.dryBulb());
        return s;
    }

    template <class Getter>
    Spread<Ratio> humidities(PathKind kind, const std::string& id, Getter get) const
    {
        Spread<Ratio> s;
        for (const auto& c : m_result.cases)
            s.add(get(resultOf(c, kind, id)).state.relativeHumidity());
        return s;
    }

    static const Sections::AirStream& inletOf(const SectionResult& r) { return r.inlet; }
    static const Sections::AirStream& outletOf(const SectionResult& r) { return r.outlet; }

    MeasurementPoint between(PathKind kind, std::string tag, PointPurpose purpose, std::size_t afterIndex,
                             bool atInlet) const
    {
        const auto& p = path(kind);
        MeasurementPoint m;
        m.tag = std::move(tag);
        m.purpose = purpose;
        m.path = kind;
        m.placement = PointPlacement::Between;
        if (atInlet) {
            m.downstreamId = idAt(p, 0);
        } else {
            m.upstreamId = idAt(p, afterIndex);
            m.downstreamId = idAt(p, afterIndex + 1);
        }
        return m;
    }

    void outdoorTemperature()
    {
        if (m_unit.supply.empty())
            return;
        auto m = between(PathKind::Supply, "T-ODA", PointPurpose::OutdoorTemperature, 0, true);
        setRange(m, temperatures(PathKind::Supply, m_unit.supply.front().id, inletOf));
        m.note = "outdoor air entering the unit; shield it from sun and from the exhaust";
        m_points.push_back(std::move(m));
    }

    void supplyTemperature()
    {
        if (m_unit.supply.empty())
            return;
        auto m = between(PathKind::Supply, "T-SUP", PointPurpose::SupplyTemperature, m_unit.supply.size() - 1, false);
        setRange(m, temperatures(PathKind::Supply, m_unit.supply.back().id, outletOf));
        std::vector<std::pair<std::string, AbsoluteTemperature>> perCase;
        for (const auto& c : m_unit.cases)
            perCase.push_back({c.name, c.supplySetpoint});
        addGroupedSetpoints(m, "setpoint", "supply setpoint", perCase, "design case");
        m.note = "the controlled variable of the temperature sequence; in the duct after the unit";
        m_points.push_back(std::move(m));
    }

    void extractTemperature()
    {
        if (m_unit.extract.empty())
            return;
        auto m = between(PathKind::Extract, "T-ETA", PointPurpose::ExtractTemperature, 0, true);
        setRange(m, temperatures(PathKind::Extract, m_unit.extract.front().id, inletOf));
        m.note = "extract air from the rooms: the room temperature the cases assume";
        m_points.push_back(std::move(m));
    }

    void filterPoint(PathKind kind, const Chain::Section& section, const Sections::Filter& spec)
    {
        MeasurementPoint m;
        m.tag = "DP-" + section.id;
        m.purpose = PointPurpose::FilterPressureDrop;
        m.path = kind;
        m.placement = PointPlacement::Across;
        m.sectionId = section.id;
        Spread<Pressure> s;
        for (const auto& c : m_result.cases) {
            const auto& d = detailOf<Sections::Filter::Detail>(resultOf(c, kind, section.id));
            s.add(d.initialDrop);
            s.add(d.finalDrop);
        }
        setRange(m, s);
        // At the path's design flow as entered (100 %): the drops are rated at the
        // nominal flow and scale with (q / q_nominal)^n, as the chain scales them.
        const VolumeFlow design = kind == PathKind::Supply ? m_unit.airflows.supply : m_unit.airflows.extract;
        const VolumeFlow nominal = spec.nominalFlow.value_or(design);
        const double scale = std::pow(toCubicMetresPerSecond(design) / toCubicMetresPerSecond(nominal), spec.flowExponent);
        m.setpoints.push_back({"clean", "clean (initial) at design flow", spec.initialPressureDrop * scale,
                               "initial pressure drop of the filter at the design flow"});
        m.setpoints.push_back({"alarm", "change alarm at design flow", spec.finalDrop() * scale,
                               "final pressure drop at the design flow (EN 13053: change the filter there)"});
        m.note = "taps before and after the filter; the range runs from clean to final over the cases";
        m_points.push_back(std::move(m));
    }

    // The coldest case (lowest outdoor temperature) is where frost forms.
    const Chain::CaseResult& coldestCase() const
    {
        const Chain::CaseResult* coldest = &m_result.cases.front();
        if (m_unit.supply.empty())
            return *coldest;
        auto outdoor = [&](const Chain::CaseResult& c) {
            return resultOf(c, PathKind::Supply, m_unit.supply.front().id).inlet.state.dryBulb();
        };
        for (const auto& c : m_result.cases)
            if (outdoor(c) < outdoor(*coldest))
                coldest = &c;
        return *coldest;
    }

    void recoveryPoint(const Chain::Section& section)
    {
        MeasurementPoint m;
        m.tag = "DP-" + section.id;
        m.purpose = PointPurpose::RecoveryPressureDrop;
        m.path = PathKind::Extract;
        m.placement = PointPlacement::Across;
        m.sectionId = section.id;
        Spread<Pressure> s;
        for (const auto& c : m_result.cases) {
            const auto& r = resultOf(c, PathKind::Extract, section.id);
            const auto& d = detailOf<Recovery::HeatRecoveryDetail>(r);
            s.add(r.pressureDrop);
            s.add(d.cleanExtractPressureDrop);
            s.add(d.frostAlarmPressureDrop);
        }
        setRange(m, s);
        const auto& cold = coldestCase();
        const auto& d = detailOf<Recovery::HeatRecoveryDetail>(resultOf(cold, PathKind::Extract, section.id));
        m.setpoints.push_back({"clean", "clean, " + cold.caseName, d.cleanExtractPressureDrop,
                               "exchanger pressure drop, extract side, at the case's flow"});
        m.setpoints.push_back({"frost", "frost alarm, " + cold.caseName, d.frostAlarmPressureDrop,
                               "clean value plus 5 .. 10 Pa (common practice)"});
        m.note = "extract side of the exchanger: a rising drop at low outdoor temperature means ice";
        m_points.push_back(std::move(m));
    }

    void fanPoint(PathKind kind, const Chain::Section& section, const Sections::Fan& spec)
    {
        MeasurementPoint m;
        m.tag = "Q-" + section.id;
        m.purpose = PointPurpose::FanAirflow;
        m.path = kind;
        m.placement = PointPlacement::AtFan;
        m.sectionId = section.id;
        const VolumeFlow design = kind == PathKind::Supply ? m_unit.airflows.supply : m_unit.airflows.extract;
        if (spec.kFactor) {
            m.kFactor = *spec.kFactor;
            Spread<Pressure> s;
            for (const auto& c : m_result.cases) {
                const auto& d = detailOf<Sections::Fan::Detail>(resultOf(c, kind, section.id));
                // The chain fills it whenever the fan has a k-factor.
                s.add(d.inletRingPressure.value_or(pascals(std::pow(toCubicMetresPerHour(d.flow) / *spec.kFactor, 2.0))));
            }
            setRange(m, s);
            // q = k sqrt(dp), q in m3/h, dp in Pa: dp = (q / k)^2.
            const double ratio = toCubicMetresPerHour(design) / *spec.kFactor;
            m.setpoints.push_back({"design_flow", "at design flow " + formatFixed(toCubicMetresPerHour(design), 0) + " m3/h",
                                   pascals(ratio * ratio), "q = k sqrt(dp) with the fan's k-factor"});
            m.note = "inlet ring taps; q [m3/h] = " + formatNumber(*spec.kFactor)
                     + " x sqrt(dp [Pa]); use the maker's k-factor for the fitted fan";
        } else {
            Spread<VolumeFlow> s;
            for (const auto& c : m_result.cases)
                s.add(detailOf<Sections::Fan::Detail>(resultOf(c, kind, section.id)).flow);
            setRange(m, s);
            m.setpoints.push_back({"design_flow", "design flow", design, "path design flow as entered"});
            m.note = "no k-factor given: ask the fan maker for the inlet ring factor, then dp = (q / k)^2";
        }
        m_points.push_back(std::move(m));
    }

    void frostThermostat(std::size_t index)
    {
        const auto& section = m_unit.supply[index];
        auto m = between(PathKind::Supply, "TF-" + section.id, PointPurpose::FrostThermostat, index, false);
        m.sectionId = section.id;
        setRange(m, temperatures(PathKind::Supply, section.id, outletOf));
        m.setpoints.push_back({"frost", "frost protection", celsius(kFrostThermostatC),
                               "common practice; ASHRAE Guideline 36-2021 stages freeze protection"});
        m.note = "capillary across the whole coil face, downstream; trips the unit, opens the valve and runs the pump";
        m_points.push_back(std::move(m));
    }

    void supplyPathSections()
    {
        for (std::size_t i = 0; i < m_unit.supply.size(); ++i) {
            const auto& section = m_unit.supply[i];
            if (const auto* f = std::get_if<Sections::Filter>(&section.spec))
                filterPoint(PathKind::Supply, section, *f);
            else if (const auto* fan = std::get_if<Sections::Fan>(&section.spec))
                fanPoint(PathKind::Supply, section, *fan);
            else if (std::holds_alternative<Sections::WaterHeatingCoil>(section.spec))
                frostThermostat(i);
            else if (std::holds_alternative<Sections::Humidifier>(section.spec))
                humidifierHighLimit(i);
        }
    }

    void extractPathSections()
    {
        for (const auto& section : m_unit.extract) {
            if (const auto* f = std::get_if<Sections::Filter>(&section.spec))
                filterPoint(PathKind::Extract, section, *f);
            else if (const auto* fan = std::get_if<Sections::Fan>(&section.spec))
                fanPoint(PathKind::Extract, section, *fan);
            else if (std::holds_alternative<Chain::CoupledSide>(section.spec) && isRecovery(section.id))
                recoveryPoint(section);
        }
    }

    bool isRecovery(const std::string& id) const
    {
        return std::any_of(m_unit.supply.begin(), m_unit.supply.end(), [&](const Chain::Section& s) {
            return s.id == id && std::holds_alternative<Recovery::HeatRecovery>(s.spec);
        });
    }

    void humidifierHighLimit(std::size_t index)
    {
        const auto& section = m_unit.supply[index];
        auto m = between(PathKind::Supply, "RH-HL-" + section.id, PointPurpose::HumidifierHighLimit, index, false);
        m.sectionId = section.id;
        setRange(m, humidities(PathKind::Supply, section.id, outletOf));
        m.setpoints.push_back({"high_limit", "high limit", percent(kHumidityHighLimitPct),
                               "common practice: keep the air after the humidifier below saturation"});
        m.note = "after the humidifier's absorption distance; stops humidification above the limit";
        m_points.push_back(std::move(m));
    }

    bool hasHumidifier() const
    {
        return std::any_of(m_unit.supply.begin(), m_unit.supply.end(), [](const Chain::Section& s) {
            return std::holds_alternative<Sections::Humidifier>(s.spec);
        });
    }

    bool controlsDehumidification() const
    {
        return std::any_of(m_unit.cases.begin(), m_unit.cases.end(), [](const Chain::DesignCase& c) {
            return c.maximumSupplyHumidity.has_value() || c.dehumidifyWithReheat;
        });
    }

    void humidityPoints()
    {
        const bool humidify = hasHumidifier();
        const bool dehumidify = controlsDehumidification();
        if ((!humidify && !dehumidify) || m_unit.supply.empty())
            return;
        auto m = between(PathKind::Supply, "RH-" + pathAbbreviation(PathKind::Supply), PointPurpose::SupplyHumidity,
                         m_unit.supply.size() - 1, false);
        setRange(m, humidities(PathKind::Supply, m_unit.supply.back().id, outletOf));
        std::vector<std::pair<std::string, Ratio>> minimum;
        std::vector<std::pair<std::string, Ratio>> maximum;
        for (const auto& c : m_unit.cases) {
            if (c.minimumSupplyHumidity)
                minimum.push_back({c.name, *c.minimumSupplyHumidity});
            if (c.maximumSupplyHumidity)
                maximum.push_back({c.name, *c.maximumSupplyHumidity});
        }
        addGroupedSetpoints(m, "minimum", "minimum supply humidity", minimum, "design case");
        addGroupedSetpoints(m, "maximum", "maximum supply humidity", maximum, "design case");
        m.note = std::string("supply humidity for the ") + (humidify && dehumidify ? "humidifier and dehumidification"
                                                            : humidify            ? "humidifier"
                                                                                  : "dehumidification")
                 + " sequence";
        m_points.push_back(std::move(m));

        if (m_unit.extract.empty())
            return;
        auto e = between(PathKind::Extract, "RH-" + pathAbbreviation(PathKind::Extract), PointPurpose::ExtractHumidity,
                         0, true);
        setRange(e, humidities(PathKind::Extract, m_unit.extract.front().id, inletOf));
        e.note = "room humidity as the extract air shows it; resets the supply humidity setpoint";
        m_extractHumidity = std::move(e);
    }

    void extractHumidityPoint()
    {
        if (m_extractHumidity)
            m_points.push_back(std::move(*m_extractHumidity));
    }

    const Chain::AirHandlingUnit& m_unit;
    const Chain::UnitResult& m_result;
    std::vector<MeasurementPoint> m_points;
    std::optional<MeasurementPoint> m_extractHumidity;

};

template <class Q>
PointValue sameType(const PointValue& v, const char* what)
{
    if (!std::holds_alternative<Q>(v))
        throw InputError(std::string(what) + " is not in the quantity of the measuring point");
    return v;
}

void checkQuantity(PointQuantity quantity, const PointValue& v, const char* what)
{
    switch (quantity) {
    case PointQuantity::Temperature:
        sameType<AbsoluteTemperature>(v, what);
        return;
    case PointQuantity::RelativeHumidity:
        sameType<Ratio>(v, what);
        return;
    case PointQuantity::DifferentialPressure:
        sameType<Pressure>(v, what);
        return;
    case PointQuantity::AirVolumeFlow:
        sameType<VolumeFlow>(v, what);
        return;
    }
}

} // namespace

const char* pointQuantityKey(PointQuantity quantity)
{
    switch (quantity) {
    case PointQuantity::Temperature:
        return "temperature";
    case PointQuantity::RelativeHumidity:
        return "relative_humidity";
    case PointQuantity::DifferentialPressure:
        return "differential_pressure";
    case PointQuantity::AirVolumeFlow:
        return "air_volume_flow";
    }
    return "temperature";
}

const char* pointPurposeKey(PointPurpose purpose)
{
    switch (purpose) {
    case PointPurpose::OutdoorTemperature:
        return "outdoor_temperature";
    case PointPurpose::SupplyTemperature:
        return "supply_temperature";
    case PointPurpose::ExtractTemperature:
        return "extract_temperature";
    case PointPurpose::FilterPressureDrop:
        return "filter_pressure_drop";
    case PointPurpose::RecoveryPressureDrop:
        return "recovery_pressure_drop";
    case PointPurpose::FanAirflow:
        return "fan_airflow";
    case PointPurpose::FrostThermostat:
        return "frost_thermostat";
    case PointPurpose::SupplyHumidity:
        return "supply_humidity";
    case PointPurpose::HumidifierHighLimit:
        return "humidifier_high_limit";
    case PointPurpose::ExtractHumidity:
        return "extract_humidity";
    }
    return "outdoor_temperature";
}

const char* pointPurposeLabel(PointPurpose purpose)
{
    switch (purpose) {
    case PointPurpose::OutdoorTemperature:
        return "outdoor air temperature";
    case PointPurpose::SupplyTemperature:
        return "supply air temperature";
    case PointPurpose::ExtractTemperature:
        return "extract air temperature";
    case PointPurpose::FilterPressureDrop:
        return "filter differential pressure";
    case PointPurpose::RecoveryPressureDrop:
        return "heat exchanger differential pressure (frost)";
    case PointPurpose::FanAirflow:
        return "fan airflow (inlet ring)";
    case PointPurpose::FrostThermostat:
        return "frost thermostat";
    case PointPurpose::SupplyHumidity:
        return "supply air humidity";
    case PointPurpose::HumidifierHighLimit:
        return "humidity high limit";
    case PointPurpose::ExtractHumidity:
        return "extract air humidity";
    }
    return "";
}

const char* pointPlacementKey(PointPlacement placement)
{
    switch (placement) {
    case PointPlacement::Between:
        return "between";
    case PointPlacement::Across:
        return "across";
    case PointPlacement::AtFan:
        return "at_fan";
    }
    return "between";
}

double toPointUnit(const PointValue& value)
{
    return std::visit(
        [](const auto& q) -> double {
            using Q = std::decay_t<decltype(q)>;
            if constexpr (std::is_same_v<Q, AbsoluteTemperature>)
                return toCelsius(q);
            else if constexpr (std::is_same_v<Q, Ratio>)
                return toPercent(q);
            else if constexpr (std::is_same_v<Q, Pressure>)
                return toPascals(q);
            else
                return toCubicMetresPerHour(q);
        },
        value);
}

const char* pointUnit(PointQuantity quantity)
{
    switch (quantity) {
    case PointQuantity::Temperature:
        return "C";
    case PointQuantity::RelativeHumidity:
        return "%";
    case PointQuantity::DifferentialPressure:
        return "Pa";
    case PointQuantity::AirVolumeFlow:
        return "m3/h";
    }
    return "";
}

std::string pointPosition(const MeasurementPoint& point)
{
    std::string text = std::string(Chain::pathKey(point.path)) + " path, ";
    switch (point.placement) {
    case PointPlacement::Across:
        return text + "across '" + point.sectionId + "'";
    case PointPlacement::AtFan:
        return text + "inlet ring of '" + point.sectionId + "'";
    case PointPlacement::Between:
        break;
    }
    if (point.upstreamId.empty() && point.downstreamId.empty())
        return text + "in the duct";
    if (point.upstreamId.empty())
        return text + "inlet, before '" + point.downstreamId + "'";
    if (point.downstreamId.empty())
        return text + "outlet, after '" + point.upstreamId + "'";
    return text + "between '" + point.upstreamId + "' and '" + point.downstreamId + "'";
}

std::vector<TransmitterRange> standardTransmitterRanges(PointQuantity quantity)
{
    switch (quantity) {
    case PointQuantity::DifferentialPressure: {
        std::vector<TransmitterRange> spans;
        for (double top : {100.0, 250.0, 500.0, 1000.0, 2500.0})
            spans.push_back({pascals(0.0), pascals(top)});
        return spans;
    }
    case PointQuantity::Temperature:
        return {{celsius(-50.0), celsius(50.0)}, {celsius(0.0), celsius(100.0)}, {celsius(-50.0), celsius(150.0)}};
    case PointQuantity::RelativeHumidity:
        return {{percent(0.0), percent(100.0)}};
    case PointQuantity::AirVolumeFlow:
        return {};
    }
    return {};
}

std::optional<TransmitterRange> suggestTransmitterRange(PointQuantity quantity, const PointValue& lowest,
                                                        const PointValue& highest)
{
    checkQuantity(quantity, lowest, "lowest value");
    checkQuantity(quantity, highest, "highest value");
    const double lo = finiteValue(lowest);
    const double hi = finiteValue(highest);
    if (lo > hi)
        throw InputError("lowest value " + formatNumber(lo) + " " + pointUnit(quantity)
                         + " is above the highest value " + formatNumber(hi) + " " + pointUnit(quantity));
    for (const auto& span : standardTransmitterRanges(quantity)) {
        const double a = toPointUnit(span.low);
        const double b = toPointUnit(span.high);
        // Relative humidity cannot exceed its full scale of 100 %: on it is fine.
        const bool fits = quantity == PointQuantity::RelativeHumidity ? (lo >= a && hi <= b) : (lo >= a && hi < b);
        if (fits)
            return span;
    }
    return std::nullopt;
}

std::vector<MeasurementPoint> measurementPoints(const Chain::AirHandlingUnit& unit, const Chain::UnitResult& result)
{
    return PointBuilder(unit, result).build();
}

} // namespace Airwright::Core::Checks
