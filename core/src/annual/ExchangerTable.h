#pragma once
// Private to the annual layer: exchanger outcomes on a grid of outdoor dry bulb
// and humidity, interpolated for any hour (see UnitHourModel.h).
//
// Grid: dry bulbs t_i = t_0 + i step; at each, humidity ratios f_k Ws(t_i) for the
// fractions kFractions of saturation. At an hour (t, W): at the two grid
// temperatures around t, linear in W between the fractions around W / Ws(t_i)
// (linear extrapolation beyond the outer fractions), then linear in t.
//
// A cell through which a threshold runs along the dry bulb (see at()) is refined
// once: kRefinement sub-steps in dry bulb, so that only the hours of the
// sub-cell holding the threshold need an exact evaluation.

#include "airwright/core/annual/RunControl.h"
#include "airwright/core/annual/UnitHourModel.h"

#include <array>
#include <cstddef>
#include <functional>
#include <optional>
#include <vector>

namespace Airwright::Core::Annual {

class ExchangerTable {
public:
    using Values = UnitHourModel::RecoveryValues;
    using NodeFunction = std::function<Values(double tC, double w)>;
    static constexpr std::array<double, 3> kFractions{0.2, 0.6, 1.0};
    static constexpr std::size_t kRefinement = 8;

    // Nodes from lowestC to highestC (already on the grid), inclusive. Stops early
    // when control.stop is requested; complete() tells. jumpW: see at().
    ExchangerTable(double lowestC, double highestC, double stepK, double pressurePa, double jumpW,
                   const NodeFunction& node, const RunControl& control);

    bool complete() const { return m_complete; }
    bool covers(double tC) const { return tC >= m_lowest - 1e-9 && tC <= m_highest + 1e-9; }
    std::size_t nodeCount() const { return m_nodes; }

    // Interpolated values; empty where interpolation would smear a threshold
    // that runs through the (sub-)cell, and the caller evaluates exactly:
    //  - the nodes around the state disagree on frost risk (frost protection is
    //    far from linear across the onset), or
    //  - recovery is off at some of them and on at others with more than jumpW
    //    (a hygroscopic wheel switching on at the extract temperature brings its
    //    moisture transfer in at once; a sensible device starts from zero).
    std::optional<Values> at(double tC, double w) const;

private:
    struct Column {
        double saturation = 0.0; // Ws at the column's dry bulb
        std::array<Values, kFractions.size()> values;
    };
    Column column(double tC, const NodeFunction& node);
    bool needsRefinement(const Column& a, const Column& b) const;

    double m_lowest = 0.0;
    double m_highest = 0.0;
    double m_step = 1.0;
    double m_pressure = 101325.0;
    double m_jump = 0.0;
    std::vector<Column> m_columns;    // one per grid temperature
    std::vector<std::ptrdiff_t> m_fine; // per cell: first of its kRefinement + 1 columns in m_fineColumns, or -1
    std::vector<Column> m_fineColumns;
    std::size_t m_nodes = 0;
    bool m_complete = false;
};

} // namespace Airwright::Core::Annual
