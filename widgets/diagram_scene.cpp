#include "widgets/diagram_scene.h"

#include <algorithm>
#include <cmath>

#include "core/errors.h"

namespace pw::ui {
namespace {

double pressureAtOrNaN(const PhaseDiagram &d, double T) {
    try {
        double lowest = kNaN;
        for (const auto &bv : d.pressuresAt(T))
            if (std::isfinite(bv.value) && bv.value > 0 && !(bv.value >= lowest)) lowest = bv.value;
        return lowest;
    } catch (const pw::Error &) {
        return kNaN;
    }
}

}  // namespace

ViewState defaultView(const PhaseDiagram &d, bool logPressure) {
    const FixedPoint *tp = d.triplePoint();
    const FixedPoint *cp = d.criticalPoint();
    const double Tt = tp ? tp->T_K : (cp ? 0.6 * cp->T_K : 200.0);
    const double Tc = cp ? cp->T_K : 1.6 * Tt;
    ViewState v;
    v.logPressure = logPressure;
    v.T_min_K = 0.75 * Tt;
    v.T_max_K = Tc + 0.3 * (Tc - v.T_min_K);  // room for the supercritical label
    const double pc = cp ? cp->P_Pa : 1e7;
    double highest = pc;
    for (const auto &t : d.substance().triplePoints) highest = std::max(highest, t.P_Pa);
    if (logPressure) {
        double low = pressureAtOrNaN(d, v.T_min_K);
        if (!std::isfinite(low)) low = (tp ? tp->P_Pa : pc) * 1e-3;
        v.P_min_Pa = std::pow(10.0, std::floor(std::log10(low * 0.3)));
        v.P_max_Pa = std::pow(10.0, std::ceil(std::log10(std::max(10.0 * pc, 3.0 * highest))));
    } else {
        v.P_min_Pa = 0.0;
        v.P_max_Pa = 1.4 * pc;
    }
    return v;
}

ViewState defaultView(const std::vector<DiagramPtr> &substances, bool logPressure) {
    ViewState v;
    v.logPressure = logPressure;
    bool first = true;
    for (const auto &d : substances) {
        if (!d) continue;
        const ViewState s = defaultView(*d, logPressure);
        if (first) {
            v = s;
            first = false;
            continue;
        }
        v.T_min_K = std::min(v.T_min_K, s.T_min_K);
        v.T_max_K = std::max(v.T_max_K, s.T_max_K);
        v.P_min_Pa = std::min(v.P_min_Pa, s.P_min_Pa);
        v.P_max_Pa = std::max(v.P_max_Pa, s.P_max_Pa);
    }
    if (first) v = ViewState{150.0, 700.0, logPressure ? 1.0 : 0.0, 1e8, logPressure};
    return v;
}

}  // namespace pw::ui
