#pragma once
// Which phase a state point (T, p) is in, and how far it is from the boundary that bounds
// its region. Conventions (docs/classification.md):
//   vapor          fluid below the vaporization or sublimation curve, T < Tc
//   gas            T >= Tc and p < pc
//   supercritical  T >= Tc and p >= pc (and not solid)
//   liquid         between melting and vaporization curves; includes p > pc with T < Tc
//   solid          below the melting or sublimation temperature at that pressure
// Margins: dT_K = T - T_boundary(p), dP_Pa = p - p_boundary(T) for the nearest boundary of
// the point's region (NaN where that boundary does not exist at that T or p). For gas and
// supercritical points the reference is the critical point (dT = T - Tc, dP = p - pc).
#include <limits>
#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "core/phase_diagram.h"

namespace pw {

enum class Phase { Solid, Liquid, Vapor, Gas, Supercritical, Unknown };
std::string_view toString(
    Phase phase);  // "solid", "liquid", "vapor", "gas", "supercritical", "unknown"

struct ClassifyOptions {
    // A point is on_boundary when |dT_K| <= onBoundary_K or |dP_Pa| <= onBoundaryRel * p_boundary.
    double onBoundary_K = 0.01;
    double onBoundaryRel = 1e-4;
};

struct Classification {
    Phase phase = Phase::Unknown;
    std::string solidForm;              // solid points: "ice III", "solid", or "unknown"
    const Boundary *nearest = nullptr;  // null for the critical-point reference or no data
    std::string nearestLabel;           // "sublimation", "melting (ice Ih)", "critical point"
    double dT_K = kNaN;
    double dP_Pa = kNaN;
    bool onBoundary = false;
    bool withinUncertainty = false;  // |dP| within the boundary's stated uncertainty
    bool extrapolated = false;       // a boundary was evaluated outside its validity range
    std::string reason;              // why Unknown (e.g. "no melting data above 1 GPa")
};

// The same result without a string built per point, for tables of millions of rows:
// solidForm and nearestLabel view text owned by the Classifier that made it (or by its
// diagram), valid while both live; reason is set only for Unknown.
struct ClassificationView {
    Phase phase = Phase::Unknown;
    std::string_view solidForm;
    const Boundary *nearest = nullptr;
    std::string_view nearestLabel;
    double dT_K = kNaN;
    double dP_Pa = kNaN;
    bool onBoundary = false;
    bool withinUncertainty = false;
    bool extrapolated = false;
    std::string reason;
};

// Throws DomainError for T <= 0, p <= 0 or non-finite input.
Classification classify(const PhaseDiagram &diagram, double T_K, double P_Pa,
                        const ClassifyOptions &options = {});

// The same classification for many points on one diagram: looks up the fixed points, the
// curves and the melting segments once. Cheap to copy; keeps a reference to `diagram`.
// classify() above is Classifier(diagram, options)(T, p).
class Classifier {
public:
    explicit Classifier(const PhaseDiagram &diagram, ClassifyOptions options = {});
    Classification operator()(double T_K, double P_Pa) const;
    // The same classification as operator(), texts as views (see ClassificationView).
    ClassificationView view(double T_K, double P_Pa) const;
    const PhaseDiagram &diagram() const { return *diagram_; }
    // No melting temperature at pressures between pt and pc reaches this temperature (+inf
    // when no such bound is known); points there at least this warm skip the melting lookup.
    double meltCeilingBelowPc() const { return meltCeilingBelowPc_; }

private:
    struct Segment {
        const Boundary *boundary = nullptr;
        double pLow = kNaN, pHigh = kNaN;  // pressures at the segment's ends
        double tLow = kNaN;                // lower of the segment's end temperatures
        double tHigh = kNaN;               // higher of them
    };
    // A boundary bounding the point's region and its temperature at the point's pressure
    // (boundary null: the critical point, or no boundary when T_K is NaN).
    struct Candidate {
        const Boundary *boundary = nullptr;
        double T_K = kNaN;
        bool extrapolated = false;
    };
    // A boundary's pressure at the point's temperature (NaN: the boundary has none there).
    struct OnCurve {
        double P_Pa = kNaN;
        bool extrapolated = false;
    };
    std::string_view solidFormAt(double T, double P, const Boundary *melt) const;
    std::string_view labelOf(const Boundary *b) const;
    OnCurve pressureOn(const Boundary *b, double T) const;
    static Candidate fromValue(const std::optional<BoundaryValue> &v) {
        return v ? Candidate{v->boundary, v->value, v->extrapolated} : Candidate{};
    }
    // The margins to `best`, the nearer of the candidates (the first on a tie).
    void fillMargins(ClassificationView &c, double T, double P, const Candidate &best) const;
    void fillMargins(ClassificationView &c, double T, double P, const Candidate &a,
                     const Candidate &b) const;
    void criticalMargins(ClassificationView &c, double T, double P) const;
    void abovePc(ClassificationView &c, double T, double P, const Candidate &melt) const;
    void belowPc(ClassificationView &c, double T, double P, double lnP, Candidate melt,
                 bool meltLooked) const;
    void findMeltCeiling();

    const PhaseDiagram *diagram_;
    ClassifyOptions options_;
    double Tt_ = kNaN, pt_ = kNaN, Tc_ = kNaN, pc_ = kNaN;
    std::vector<Segment> segments_;  // melting segments by increasing pressure
    double lowestSolidSolidLiquid_Pa = kNaN;
    // No melting temperature at pressures in (pt, pc) reaches this: fluid points there that
    // are at least this warm need no melting lookup to rule out the solid (+inf: unknown).
    double meltCeilingBelowPc_ = std::numeric_limits<double>::infinity();
    std::string vaporSolidForm_;       // the solid that borders the vapor ("ice Ih", "solid")
    std::vector<std::string> labels_;  // Boundary::label() once, by index in the substance
};

// Space-separated flags for tables: "on_boundary", "within_uncertainty", "extrapolated".
std::string flagsText(const Classification &c);
std::string_view flagsText(const ClassificationView &c);  // the same text, no allocation

}  // namespace pw
