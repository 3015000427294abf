// PhaseDiagram::consistency(): thermodynamic consistency of the curves (returned, never
// thrown). Thresholds on relative deviations follow docs/substance-format.md ("Validation"):
// up to 0.1 % info, above 0.1 % a warning, above 2 % an error. The enthalpy balance rests on
// the Clausius–Clapeyron approximations and is at most a warning.
#include <fmt/format.h>
#include <cmath>

#include "core/phase_diagram.h"

namespace pw {

namespace {

constexpr int kMonotonicSamples = 257;  // docs/substance-format.md, "Validation"

Severity bySize(double percent) {
    if (!(percent <= 2.0)) return Severity::Error;
    return percent > 0.1 ? Severity::Warning : Severity::Info;
}

double percentOff(double value, double reference) {
    return 100.0 * std::abs(value - reference) / std::abs(reference);
}

void triplePointChecks(const PhaseDiagram &d, std::vector<Finding> &out) {
    const FixedPoint *tp = d.triplePoint();
    if (tp == nullptr) return;
    const Boundary *vap = d.vaporization();
    const Boundary *sub = d.sublimation();
    if (vap != nullptr && sub != nullptr && vap->model->domain().contains(tp->T_K) &&
        sub->model->domain().contains(tp->T_K)) {
        const double pv = vap->model->pressure(tp->T_K);
        const double ps = sub->model->pressure(tp->T_K);
        const double pct = percentOff(ps, pv);
        out.push_back({bySize(pct), "triple-point-mismatch",
                       fmt::format("At the triple point {:.6g} K the sublimation curve gives "
                                   "{:.6g} Pa and the vaporization curve {:.6g} Pa (file: {:.6g} "
                                   "Pa): mismatch {:.3g} %.",
                                   tp->T_K, ps, pv, tp->P_Pa, pct)});
    }
    if (!d.melting().empty()) {
        const BoundaryModel &m = *d.melting().front()->model;
        if (m.domain().contains(tp->T_K)) {
            // Melting curves are steep: compare as a temperature offset (docs, "Validation").
            const double dT = std::abs(m.pressure(tp->T_K) - tp->P_Pa) / std::abs(m.dPdT(tp->T_K));
            const double pct = 100.0 * dT / tp->T_K;
            out.push_back({bySize(pct), "melting-at-triple-point",
                           fmt::format("The first melting curve passes the triple point {:.6g} K "
                                       "/ {:.6g} Pa {:.3g} K away ({:.3g} %).",
                                       tp->T_K, tp->P_Pa, dT, pct)});
        } else {
            out.push_back({Severity::Warning, "melting-at-triple-point",
                           fmt::format("The first melting curve is not defined at the triple "
                                       "point {:.6g} K.",
                                       tp->T_K)});
        }
    }
}

void criticalPointChecks(const PhaseDiagram &d, std::vector<Finding> &out) {
    const FixedPoint *cp = d.criticalPoint();
    const Boundary *vap = d.vaporization();
    if (cp == nullptr || vap == nullptr) return;
    const double Tend = vap->validity.valid() ? vap->validity.max_K : vap->model->domain().max_K;
    const double pctT = percentOff(Tend, cp->T_K);
    out.push_back({bySize(pctT), "vaporization-end",
                   fmt::format("The vaporization curve ends at {:.6g} K; the critical point is at "
                               "{:.6g} K ({:.3g} % apart).",
                               Tend, cp->T_K, pctT)});
    if (vap->model->domain().contains(cp->T_K)) {
        const double pc = vap->model->pressure(cp->T_K);
        const double pct = percentOff(pc, cp->P_Pa);
        out.push_back({bySize(pct), "critical-point-mismatch",
                       fmt::format("At the critical temperature {:.6g} K the vaporization curve "
                                   "gives {:.6g} Pa; the critical pressure is {:.6g} Pa "
                                   "(mismatch {:.3g} %).",
                                   cp->T_K, pc, cp->P_Pa, pct)});
    }
}

void enthalpyChecks(const PhaseDiagram &d, std::vector<Finding> &out) {
    const auto hv = d.dHvapTriple();
    const auto hs = d.dHsubTriple();
    const double fileFus = d.substance().dHfusTriple_J_mol;
    const auto clapeyronFus = d.dHfusTriple();
    if (clapeyronFus && std::isfinite(fileFus)) {
        const double pct = percentOff(*clapeyronFus, fileFus);
        out.push_back({pct > 10.0 ? Severity::Warning : Severity::Info, "fusion-enthalpy",
                       fmt::format("Clapeyron with the melting slope and the file's ΔV gives "
                                   "ΔHfus = {:.5g} J/mol; the file says {:.5g} J/mol ({:.3g} %).",
                                   *clapeyronFus, fileFus, pct)});
    }
    const double hf = std::isfinite(fileFus) ? fileFus : clapeyronFus.value_or(kNaN);
    if (!hv || !hs || !std::isfinite(hf)) return;
    const double pct = percentOff(hf + *hv, *hs);
    out.push_back({pct > 5.0 ? Severity::Warning : Severity::Info, "enthalpy-sum",
                   fmt::format("At the triple point ΔHsub = {:.5g} J/mol and ΔHfus + ΔHvap = "
                               "{:.5g} + {:.5g} = {:.5g} J/mol ({:.3g} % apart; Clausius–"
                               "Clapeyron, ideal vapor).",
                               *hs, hf, *hv, hf + *hv, pct)});
}

void monotonicChecks(const PhaseDiagram &d, std::vector<Finding> &out) {
    for (const Boundary &b : d.substance().boundaries) {
        if (!b.model || !b.validity.valid()) continue;
        const TRange dom = b.model->domain();
        if (dom.min_K > b.validity.min_K || dom.max_K < b.validity.max_K) {
            out.push_back(
                {Severity::Error, "not-monotonic",
                 fmt::format("{}: the equation is finite and monotonic only between "
                             "{:.6g} K and {:.6g} K, not over its stated range "
                             "{:.6g}-{:.6g} K.",
                             b.label(), dom.min_K, dom.max_K, b.validity.min_K, b.validity.max_K)});
            continue;
        }
        const bool mustRise =
            b.kind == BoundaryKind::Vaporization || b.kind == BoundaryKind::Sublimation;
        int sign = 0;
        for (int i = 0; i < kMonotonicSamples; ++i) {
            const double T = b.validity.min_K +
                             (b.validity.max_K - b.validity.min_K) * i / (kMonotonicSamples - 1);
            const double s = b.model->dPdT(T);
            const int si = s > 0.0 ? 1 : (s < 0.0 ? -1 : 0);
            if (sign == 0) sign = si;
            if (si == 0 || si != sign || (mustRise && si < 0) || !(b.model->pressure(T) > 0.0)) {
                out.push_back(
                    {Severity::Error, "not-monotonic",
                     fmt::format("{}: the curve turns or falls at {:.6g} K.", b.label(), T)});
                break;
            }
        }
    }
}

void rangeChecks(const PhaseDiagram &d, std::vector<Finding> &out) {
    const auto &m = d.melting();
    for (std::size_t k = 0; k + 1 < m.size(); ++k) {
        if (!m[k]->validity.valid() || !m[k + 1]->validity.valid()) continue;
        // The high-pressure end of one form against the low-pressure end of the next.
        const BoundaryModel &a = *m[k]->model;
        const BoundaryModel &b = *m[k + 1]->model;
        const double aEnd = a.pressure(m[k]->validity.min_K) > a.pressure(m[k]->validity.max_K)
                                ? m[k]->validity.min_K
                                : m[k]->validity.max_K;
        const double bStart =
            b.pressure(m[k + 1]->validity.min_K) < b.pressure(m[k + 1]->validity.max_K)
                ? m[k + 1]->validity.min_K
                : m[k + 1]->validity.max_K;
        const double pctT = percentOff(bStart, aEnd);
        const double pctP = percentOff(b.pressure(bStart), a.pressure(aEnd));
        out.push_back({bySize(std::max(pctT, pctP)), "ranges-meet",
                       fmt::format("{} ends at {:.6g} K / {:.6g} Pa and {} starts at {:.6g} K / "
                                   "{:.6g} Pa.",
                                   m[k]->label(), aEnd, a.pressure(aEnd), m[k + 1]->label(), bStart,
                                   b.pressure(bStart))});
    }
    const FixedPoint *tp = d.triplePoint();
    const Boundary *vap = d.vaporization();
    if (tp != nullptr && vap != nullptr && vap->validity.valid()) {
        const double pct = percentOff(vap->validity.min_K, tp->T_K);
        if (vap->validity.min_K > tp->T_K) {
            out.push_back({bySize(pct), "ranges-meet",
                           fmt::format("The vaporization curve's range starts at {:.6g} K, above "
                                       "the triple point {:.6g} K.",
                                       vap->validity.min_K, tp->T_K)});
        }
    }
    const Boundary *sub = d.sublimation();
    if (tp != nullptr && sub != nullptr && sub->validity.valid() && sub->validity.max_K < tp->T_K) {
        out.push_back({bySize(percentOff(sub->validity.max_K, tp->T_K)), "ranges-meet",
                       fmt::format("The sublimation curve's range ends at {:.6g} K, below the "
                                   "triple point {:.6g} K.",
                                   sub->validity.max_K, tp->T_K)});
    }
}

}  // namespace

std::vector<Finding> PhaseDiagram::consistency() const {
    std::vector<Finding> out;
    triplePointChecks(*this, out);
    criticalPointChecks(*this, out);
    enthalpyChecks(*this, out);
    monotonicChecks(*this, out);
    rangeChecks(*this, out);
    return out;
}

}  // namespace pw
