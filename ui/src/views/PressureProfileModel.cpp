#include "airwright/ui/views/PressureProfileModel.h"

#include <algorithm>
#include <string_view>

namespace Airwright::Ui {

namespace {

// A section without casing length (a marker) still gets a sliver of the axis so
// its pressure step stays visible.
constexpr double kMinimumWidth = 0.1; // m

bool isCoupledKey(std::string_view key)
{
    return key == "heat_recovery" || key == "mixing" || key == "coupled";
}

PressureProfileModel::Span makeSpan(const Core::Chain::SectionResult& r, double x, double width)
{
    PressureProfileModel::Span s;
    s.id = QString::fromStdString(r.id);
    s.typeKey = QString::fromStdString(r.typeKey);
    s.xStart = x;
    s.xEnd = x + width;
    s.pressureInPa = Core::toPascals(r.staticPressureIn);
    s.pressureOutPa = Core::toPascals(r.staticPressureOut);
    s.fan = r.typeKey == "fan";
    s.coupled = isCoupledKey(r.typeKey);
    return s;
}

} // namespace

void PressureProfileModel::rebuild(const std::optional<Core::Chain::UnitResult>& result, int caseIndex)
{
    m_caseIndex = caseIndex;
    m_caseNames.clear();
    m_supply.clear();
    m_extract.clear();
    m_couplings.clear();
    m_length = 0.0;
    if (!result)
        return;
    for (const auto& c : result->cases)
        m_caseNames.push_back(QString::fromStdString(c.caseName));
    if (caseIndex < 0 || caseIndex >= int(result->cases.size()))
        return;
    const auto& c = result->cases[std::size_t(caseIndex)];

    auto supplyIndexOf = [&](const std::string& id) -> std::optional<std::size_t> {
        for (std::size_t i = 0; i < c.supply.size(); ++i)
            if (c.supply[i].id == id)
                return i;
        return std::nullopt;
    };
    std::vector<double> supplyWidth;
    for (const auto& s : c.supply)
        supplyWidth.push_back(std::max(kMinimumWidth, Core::toMetres(s.length)));
    std::vector<double> extractWidth;
    for (const auto& e : c.extract) {
        double w = Core::toMetres(e.length);
        if (isCoupledKey(e.typeKey))
            if (const auto i = supplyIndexOf(e.id))
                w = supplyWidth[*i];
        extractWidth.push_back(std::max(kMinimumWidth, w));
    }

    // Coupled sections met in the same order on both paths anchor the alignment.
    std::vector<std::pair<std::size_t, std::size_t>> anchors;
    std::size_t nextExtract = 0;
    for (std::size_t i = 0; i < c.supply.size(); ++i) {
        if (!isCoupledKey(c.supply[i].typeKey))
            continue;
        for (std::size_t j = nextExtract; j < c.extract.size(); ++j)
            if (c.extract[j].id == c.supply[i].id) {
                anchors.push_back({i, j});
                nextExtract = j + 1;
                break;
            }
    }

    double xs = 0.0;
    double xe = 0.0;
    std::size_t i = 0;
    std::size_t j = 0;
    auto advanceSupply = [&](std::size_t until) {
        for (; i < until; ++i) {
            m_supply.push_back(makeSpan(c.supply[i], xs, supplyWidth[i]));
            xs += supplyWidth[i];
        }
    };
    auto advanceExtract = [&](std::size_t until) {
        for (; j < until; ++j) {
            m_extract.push_back(makeSpan(c.extract[j], xe, extractWidth[j]));
            xe += extractWidth[j];
        }
    };
    for (const auto& [ai, aj] : anchors) {
        advanceSupply(ai);
        advanceExtract(aj);
        xs = xe = std::max(xs, xe);
        const auto supplyAt = m_supply.size();
        const auto extractAt = m_extract.size();
        advanceSupply(ai + 1);
        advanceExtract(aj + 1);
        const Span& s = m_supply[supplyAt];
        const Span& e = m_extract[extractAt];
        Coupling k;
        k.id = s.id;
        k.x = s.middle();
        k.supplyPa = 0.5 * (s.pressureInPa + s.pressureOutPa);
        k.extractPa = 0.5 * (e.pressureInPa + e.pressureOutPa);
        k.differencePa = k.supplyPa - k.extractPa;
        // The solver's own figure where it has one (the same midpoint rule).
        if (const auto* d = std::get_if<Core::Recovery::HeatRecoveryDetail>(&c.supply[ai].detail))
            if (d->supplyMinusExtract)
                k.differencePa = Core::toPascals(*d->supplyMinusExtract);
        m_couplings.push_back(k);
    }
    advanceSupply(c.supply.size());
    advanceExtract(c.extract.size());
    m_length = std::max(xs, xe);
}

QVector<QPointF> PressureProfileModel::polyline(Core::Chain::PathKind path) const
{
    const auto& spans = path == Core::Chain::PathKind::Supply ? m_supply : m_extract;
    QVector<QPointF> out;
    for (const auto& s : spans) {
        const QPointF in(s.xStart, s.pressureInPa);
        if (out.isEmpty() || out.back() != in)
            out.push_back(in);
        out.push_back(QPointF(s.xEnd, s.pressureOutPa));
    }
    return out;
}

double PressureProfileModel::minimumPa() const
{
    double lo = 0.0;
    bool any = false;
    for (const auto* spans : {&m_supply, &m_extract})
        for (const auto& s : *spans) {
            const double m = std::min(s.pressureInPa, s.pressureOutPa);
            lo = any ? std::min(lo, m) : m;
            any = true;
        }
    return lo;
}

double PressureProfileModel::maximumPa() const
{
    double hi = 0.0;
    bool any = false;
    for (const auto* spans : {&m_supply, &m_extract})
        for (const auto& s : *spans) {
            const double m = std::max(s.pressureInPa, s.pressureOutPa);
            hi = any ? std::max(hi, m) : m;
            any = true;
        }
    return hi;
}

} // namespace Airwright::Ui
