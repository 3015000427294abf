#pragma once
// The pressure–temperature phase diagram of one substance, built from its Substance data.
// Knows which boundary applies where (the triple points split the curves into segments),
// answers boundary queries, derived quantities, and checks thermodynamic consistency.
#include <cmath>
#include <optional>
#include <string>
#include <vector>

#include "core/boundary_segment.h"
#include "core/substance.h"

namespace pw {

struct BoundaryValue {
    const Boundary *boundary = nullptr;
    double value = kNaN;  // Pa for pressuresAt, K for temperaturesAt
    bool extrapolated = false;
};

enum class Severity { Info, Warning, Error };
struct Finding {
    Severity severity = Severity::Info;
    std::string check;    // short id: "triple-point-mismatch", "not-monotonic", ...
    std::string message;  // full sentence with the numbers
};

class PhaseDiagram {
public:
    // Throws pw::Error when the data cannot form a diagram (no boundary at all...).
    explicit PhaseDiagram(Substance substance);
    // Copies and moves re-point melting() into the new object's own substance.
    PhaseDiagram(const PhaseDiagram &other);
    PhaseDiagram(PhaseDiagram &&other) noexcept;
    PhaseDiagram &operator=(const PhaseDiagram &other);
    PhaseDiagram &operator=(PhaseDiagram &&other) noexcept;
    ~PhaseDiagram() = default;

    const Substance &substance() const { return substance_; }
    const FixedPoint *triplePoint() const;  // solid–liquid–vapor, null if unknown
    const FixedPoint *criticalPoint() const;
    const Boundary *vaporization() const;
    const Boundary *sublimation() const;
    // Melting curves ordered by increasing pressure (water: Ih, III, V, VI, VII).
    const std::vector<const Boundary *> &melting() const { return melting_; }

    // Every boundary's pressure at T where its segment exists at T.
    std::vector<BoundaryValue> pressuresAt(double T_K) const;
    // Every boundary's temperature at P where its segment exists at P.
    std::vector<BoundaryValue> temperaturesAt(double P_Pa) const;

    // Piecewise over the segments; nullopt where no segment covers the argument. These
    // queries are inline (core/phase_diagram_queries.h): a table of a million state points
    // makes several each per point. The forms with lnP take ln(P_Pa) from a caller that has it.
    std::optional<BoundaryValue> meltingTemperature(double P_Pa) const;
    std::optional<BoundaryValue> meltingTemperature(double P_Pa, double lnP) const;
    // No meltingTemperature(P) for P in [P_lo, P_hi] exceeds this (-inf: none there; +inf: a
    // gap between segments there is bridged by extrapolation, so no bound is known).
    double meltingTemperatureCeiling(double P_lo_Pa, double P_hi_Pa) const;
    std::optional<BoundaryValue> vaporizationTemperature(double P_Pa) const;  // pt <= P <= pc
    std::optional<BoundaryValue> vaporizationTemperature(double P_Pa, double lnP) const;
    std::optional<BoundaryValue> sublimationTemperature(double P_Pa) const;  // P <= pt
    std::optional<BoundaryValue> sublimationTemperature(double P_Pa, double lnP) const;
    std::optional<BoundaryValue> meltingPressure(double T_K) const;
    std::optional<BoundaryValue> vaporizationPressure(double T_K) const;  // Tt <= T <= Tc
    std::optional<BoundaryValue> sublimationPressure(double T_K) const;   // T <= Tt

    // At 101 325 Pa; nullopt when the isobar does not meet that boundary.
    std::optional<double> normalMeltingPoint() const;
    std::optional<double> normalBoilingPoint() const;
    std::optional<double> normalSublimationPoint() const;

    // Sign of dp/dT of the melting curve at the main triple point (+1, -1; nullopt: no data)
    // and the Clapeyron verdict: a positive slope means the solid is denser than the liquid.
    std::optional<int> meltSlopeSign() const;
    std::optional<bool> solidDenserThanLiquid() const;

    // Enthalpies at the main triple point implied by the curves (J/mol): Clausius–Clapeyron
    // (ideal vapor, negligible condensed volume) for vaporization and sublimation; Clapeyron
    // with the file's ΔV for fusion (nullopt without ΔV).
    std::optional<double> dHvapTriple() const;
    std::optional<double> dHsubTriple() const;
    std::optional<double> dHfusTriple() const;

    // Thermodynamic consistency checks (returned, never thrown).
    std::vector<Finding> consistency() const;

private:
    // Segment queries (core/phase_diagram.cpp). `seg` indexes segments_.
    std::optional<BoundaryValue> segmentPressure(int seg, double T_K) const;
    std::optional<BoundaryValue> segmentTemperature(int seg, double P_Pa, double lnP) const;
    std::optional<BoundaryValue> solveOnSegment(int seg, double lnP) const;
    static void requireTemperature(double T) {
        if (!(std::isfinite(T) && T > 0.0)) badTemperature(T);
    }
    static void requirePressure(double P) {
        if (!(std::isfinite(P) && P > 0.0)) badPressure(P);
    }
    [[noreturn]] static void badTemperature(double T);  // throws DomainError
    [[noreturn]] static void badPressure(double P);
    std::optional<BoundaryValue> solveOutside(int seg, double P_Pa) const;
    const Boundary &boundaryOf(int seg) const {
        return substance_.boundaries[segments_[static_cast<std::size_t>(seg)].index];
    }
    void buildSegments();
    void relink();  // melting_ from meltingSegs_

    Substance substance_;
    std::vector<const Boundary *> melting_;
    std::vector<BoundarySegment> segments_;  // one per boundary with a usable range
    int vaporizationSeg_ = -1;
    int sublimationSeg_ = -1;
    std::vector<int> meltingSegs_;  // by increasing pressure
};

}  // namespace pw

#include "core/phase_diagram_queries.h"  // IWYU pragma: export
