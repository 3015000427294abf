#include "core/io/substance_checks.h"

#include <fmt/format.h>
#include <algorithm>
#include <cmath>
#include <map>

#include "core/io/read_parts.h"
#include "core/phase_diagram.h"

namespace pw::io {
namespace {

std::string boundaryPath(std::size_t i) { return child("/boundaries", i); }

// Pressure at T, or an error recorded at `path`; nullopt when the curve fails there.
std::optional<double> sample(const Boundary &b, double T, const std::string &path, Reader &reader) {
    double p = kNaN;
    try {
        p = b.model->pressure(T);
    } catch (const std::exception &e) {
        reader.error(path, fmt::format("the {} curve cannot be evaluated at T = {} K inside its "
                                       "validity range: {}",
                                       toString(b.kind), T, e.what()));
        return std::nullopt;
    }
    if (!std::isfinite(p) || p <= 0.0) {
        reader.error(path, fmt::format("the {} curve gives p = {} Pa at T = {} K inside its "
                                       "validity range [{}, {}] K; expected a finite positive "
                                       "pressure (check the coefficients and units)",
                                       toString(b.kind), p, T, b.validity.min_K, b.validity.max_K));
        return std::nullopt;
    }
    return p;
}

void checkCurve(const Boundary &b, const std::string &path, Reader &reader) {
    const double lo = b.validity.min_K;
    const double hi = b.validity.max_K;
    double previous = kNaN;
    int direction = 0;  // +1 rising, -1 falling
    for (int i = 0; i < kCurveSamples; ++i) {
        const double T = lo + (hi - lo) * i / (kCurveSamples - 1);
        const auto p = sample(b, T, path, reader);
        if (!p) return;
        if (i > 0) {
            const int step = *p > previous ? 1 : (*p < previous ? -1 : 0);
            const bool mustRise =
                b.kind == BoundaryKind::Vaporization || b.kind == BoundaryKind::Sublimation;
            if (direction == 0 && !mustRise) direction = step;
            if (step == 0 || (mustRise && step < 0) || (!mustRise && step != direction)) {
                reader.error(path, fmt::format("the {} curve is not monotonic in its validity "
                                               "range: p = {} Pa at {} K, then {} Pa at {} K; "
                                               "expected a pressure that {} steadily with T",
                                               toString(b.kind), previous,
                                               lo + (hi - lo) * (i - 1) / (kCurveSamples - 1), *p,
                                               T, mustRise ? "rises" : "rises or falls"));
                return;
            }
        }
        previous = *p;
    }
}

// Relative deviation of `fp` from curve `b` (see the format doc), or nullopt if unknown.
std::optional<double> deviation(const Boundary &b, const FixedPoint &fp) {
    try {
        const double p = b.model->pressure(fp.T_K);
        if (b.kind == BoundaryKind::Vaporization || b.kind == BoundaryKind::Sublimation)
            return std::abs(p - fp.P_Pa) / fp.P_Pa;
        const double slope = b.model->dPdT(fp.T_K);
        if (!std::isfinite(slope) || slope == 0.0) return std::nullopt;
        return std::abs(p - fp.P_Pa) / std::abs(slope) / fp.T_K;
    } catch (const std::exception &) {
        return std::nullopt;
    }
}

bool compares(BoundaryKind kind, bool mainTriple, bool critical) {
    if (critical) return kind == BoundaryKind::Vaporization;
    if (mainTriple) return kind != BoundaryKind::SolidSolid;
    return kind == BoundaryKind::Melting || kind == BoundaryKind::SolidSolid;
}

// A curve of a named solid form is compared only with fixed points that name that form
// (water: the ice III melting curve with the Ih–III–liquid and III–V–liquid points).
bool solidFormsMatch(const Boundary &b, const FixedPoint &fp) {
    if (fp.phases.empty() || b.solidForm.empty()) return true;
    std::string_view rest = b.solidForm;
    while (true) {
        const auto bar = rest.find('|');
        const std::string_view form = rest.substr(0, bar);
        if (std::find(fp.phases.begin(), fp.phases.end(), form) == fp.phases.end()) return false;
        if (bar == std::string_view::npos) return true;
        rest.remove_prefix(bar + 1);
    }
}

// consistency() checks that repeat a check made above with a JSON path are left out; the
// others get the path of the data they are about.
const std::map<std::string, std::string, std::less<>> &consistencyPaths() {
    static const std::map<std::string, std::string, std::less<>> paths{
        {"melting-at-triple-point", ""},  // repeated: checkFixedPoints
        {"critical-point-mismatch", ""},  // repeated: checkFixedPoints
        {"triple-point-mismatch", "/triple_points/0"},
        {"vaporization-end", "/critical_point"},
        {"fusion-enthalpy", "/fusion_at_triple"},
        {"enthalpy-sum", "/fusion_at_triple"},
        {"ranges-meet", "/boundaries"},
        {"not-monotonic", "/boundaries"},
    };
    return paths;
}

void checkPoint(const Substance &s, const FixedPoint &fp, const std::string &path, bool mainTriple,
                bool critical, Reader &reader) {
    for (std::size_t i = 0; i < s.boundaries.size(); ++i) {
        const Boundary &b = s.boundaries[i];
        const double tol = 1e-9 * fp.T_K;
        if (!b.model || !compares(b.kind, mainTriple, critical) || !solidFormsMatch(b, fp) ||
            fp.T_K < b.validity.min_K - tol || fp.T_K > b.validity.max_K + tol)
            continue;
        const auto d = deviation(b, fp);
        if (!d || *d <= kFixedPointWarnRel) continue;
        const bool isError = !std::isfinite(*d) || *d > kFixedPointErrorRel;
        const bool steep = b.kind == BoundaryKind::Melting || b.kind == BoundaryKind::SolidSolid;
        reader.add(isError ? Severity::Error : Severity::Warning, path,
                   fmt::format("{} ({} K, {} Pa) is off the {} curve of {} by {:.3g} % (in {}); "
                               "expected within {} % ({} above {} %)",
                               critical ? "the critical point" : "the triple point", fp.T_K,
                               fp.P_Pa, toString(b.kind), boundaryPath(i), *d * 100.0,
                               steep ? "temperature" : "pressure", kFixedPointWarnRel * 100.0,
                               isError ? "refused" : "an error", kFixedPointErrorRel * 100.0));
    }
}

}  // namespace

void checkCurves(const Substance &s, Reader &reader) {
    for (std::size_t i = 0; i < s.boundaries.size(); ++i)
        if (s.boundaries[i].model) checkCurve(s.boundaries[i], boundaryPath(i), reader);
}

void checkFixedPoints(const Substance &s, Reader &reader) {
    for (std::size_t i = 0; i < s.triplePoints.size(); ++i)
        checkPoint(s, s.triplePoints[i], child("/triple_points", i), i == 0, false, reader);
    if (s.critical) checkPoint(s, *s.critical, "/critical_point", false, true, reader);
}

void checkConsistency(const Substance &s, Reader &reader) {
    (void)buildAndCheckConsistency(s, reader);
}

std::shared_ptr<PhaseDiagram> buildAndCheckConsistency(Substance s, Reader &reader) {
    std::shared_ptr<PhaseDiagram> diagram;
    try {
        diagram = std::make_shared<PhaseDiagram>(std::move(s));
        for (const Finding &f : diagram->consistency()) {
            if (f.severity == Severity::Info) continue;  // passed checks
            const auto it = consistencyPaths().find(f.check);
            if (it != consistencyPaths().end() && it->second.empty()) continue;
            // A curve that does not reach the next fixed point is a gap in coverage, not an
            // inconsistency (a file may hold partial data): at most a warning.
            const bool gap = f.check == "ranges-meet" || f.check == "vaporization-end";
            const Severity severity = gap ? Severity::Warning : f.severity;
            reader.add(severity, it == consistencyPaths().end() ? "" : it->second,
                       fmt::format("{} [{}]", f.message, f.check));
        }
    } catch (const std::exception &e) {
        reader.error("/boundaries",
                     fmt::format("the data cannot form a phase diagram: {}", e.what()));
        return nullptr;
    }
    return diagram;
}

}  // namespace pw::io
