#pragma once
// The static pressure along both paths of one design case, as plain data for the
// pressure profile view (tests read it without rendering).
//
// Each path runs left to right in its flow direction; x is the distance along the
// path in metres, section by section. A coupled section (heat recovery, mixing)
// is one piece of casing that both paths pass through, so the two paths are
// aligned there: where one path reaches it sooner, its x skips ahead (the air
// pressure is unchanged over the skipped stretch). The extract side of a coupled
// section takes the length of its supply side. Pressures are static, relative to
// ambient, in Pa; each path starts at minus its external pressure before the unit
// and fans appear as rises.

#include "airwright/core/chain/CaseResult.h"

#include <QPointF>
#include <QString>
#include <QStringList>
#include <QVector>

#include <optional>

namespace Airwright::Ui {

class PressureProfileModel {
public:
    struct Span {
        QString id;
        QString typeKey;
        double xStart = 0.0; // m
        double xEnd = 0.0;
        double pressureInPa = 0.0;
        double pressureOutPa = 0.0;
        bool fan = false;
        bool coupled = false;
        double middle() const { return 0.5 * (xStart + xEnd); }
    };

    // Supply minus extract static pressure at the middle of a coupled section, where
    // the solver evaluates it (leakage runs from the higher to the lower side).
    struct Coupling {
        QString id;
        double x = 0.0;
        double supplyPa = 0.0;
        double extractPa = 0.0;
        double differencePa = 0.0;
    };

    // Rebuilds for one case; an index out of range (or no result) gives an empty model.
    void rebuild(const std::optional<Core::Chain::UnitResult>& result, int caseIndex);

    int caseIndex() const { return m_caseIndex; }
    const QStringList& caseNames() const { return m_caseNames; }
    bool isEmpty() const { return m_supply.isEmpty() && m_extract.isEmpty(); }

    const QVector<Span>& supply() const { return m_supply; }
    const QVector<Span>& extract() const { return m_extract; }
    const QVector<Coupling>& couplings() const { return m_couplings; }
    double length() const { return m_length; } // the longer path, m

    // The profile as a polyline (x m, static pressure Pa): each section's inlet and
    // outlet, joined across any alignment gap.
    QVector<QPointF> polyline(Core::Chain::PathKind path) const;
    // Lowest and highest static pressure of both paths, Pa (0 and 0 when empty).
    double minimumPa() const;
    double maximumPa() const;

private:
    int m_caseIndex = -1;
    QStringList m_caseNames;
    QVector<Span> m_supply;
    QVector<Span> m_extract;
    QVector<Coupling> m_couplings;
    double m_length = 0.0;
};

} // namespace Airwright::Ui
