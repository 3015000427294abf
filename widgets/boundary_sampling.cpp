#include "widgets/boundary_sampling.h"

#include <algorithm>
#include <cmath>
#include <map>

#include "core/errors.h"

namespace pw::ui {
namespace {

struct Sample {
    double T = 0.0;
    double P = 0.0;
    bool extrapolated = false;
};

using SampleMap = std::map<const Boundary *, std::vector<Sample>>;

void sweepTemperature(const PhaseDiagram &d, const ViewState &v, int n, SampleMap &out) {
    const double lo = std::max(1e-3, v.T_min_K - 0.02 * (v.T_max_K - v.T_min_K));
    const double hi = v.T_max_K + 0.02 * (v.T_max_K - v.T_min_K);
    for (int i = 0; i <= n; ++i) {  // uniform in 1/T
        const double inv = 1.0 / hi + (1.0 / lo - 1.0 / hi) * i / n;
        const double T = 1.0 / inv;
        try {
            for (const auto &bv : d.pressuresAt(T))
                if (bv.boundary && std::isfinite(bv.value) && bv.value > 0)
                    out[bv.boundary].push_back({T, bv.value, bv.extrapolated});
        } catch (const pw::Error &) {
            // a model that cannot be evaluated there: nothing to draw at this T
        }
    }
}

void sweepPressure(const PhaseDiagram &d, const ViewState &v, int n, SampleMap &out) {
    const bool logScale = v.logPressure && v.P_min_Pa > 0;
    const double lo = logScale ? std::log(v.P_min_Pa) - 0.1 : std::max(0.0, v.P_min_Pa);
    const double hi = logScale ? std::log(v.P_max_Pa) + 0.1 : v.P_max_Pa * 1.02;
    for (int i = 0; i <= n; ++i) {
        const double x = lo + (hi - lo) * i / n;
        const double P = logScale ? std::exp(x) : x;
        if (!(P > 0)) continue;
        try {
            for (const auto &bv : d.temperaturesAt(P))
                if (bv.boundary && std::isfinite(bv.value) && bv.value > 0)
                    out[bv.boundary].push_back({bv.value, P, bv.extrapolated});
        } catch (const pw::Error &) {
        }
    }
}

void appendRuns(const Boundary *b, std::vector<Sample> &s, std::vector<CurveRun> &runs) {
    std::sort(s.begin(), s.end(), [](const Sample &a, const Sample &c) {
        return a.T < c.T || (a.T == c.T && a.P < c.P);
    });
    CurveRun run;
    for (std::size_t i = 0; i < s.size(); ++i) {
        if (!run.T_K.empty() && s[i].extrapolated != run.extrapolated) {
            const double lastT = run.T_K.back(), lastP = run.P_Pa.back();
            runs.push_back(std::move(run));
            run = CurveRun{};
            run.T_K.push_back(lastT);  // share the joint: no gap between runs
            run.P_Pa.push_back(lastP);
        }
        run.boundary = b;
        run.extrapolated = s[i].extrapolated;
        run.T_K.push_back(s[i].T);
        run.P_Pa.push_back(s[i].P);
    }
    if (run.T_K.size() >= 2) runs.push_back(std::move(run));
}

}  // namespace

std::vector<CurveRun> sampleBoundaries(const PhaseDiagram &diagram, const ViewState &view,
                                       int samples) {
    SampleMap map;
    sweepTemperature(diagram, view, samples, map);
    sweepPressure(diagram, view, samples, map);
    std::vector<CurveRun> runs;
    for (const auto &b : diagram.substance().boundaries) {  // file order: stable drawing order
        auto it = map.find(&b);
        if (it != map.end()) appendRuns(&b, it->second, runs);
    }
    return runs;
}

}  // namespace pw::ui
