#pragma once
// The boundary queries of PhaseDiagram, inline: classifying a table of millions of state
// points makes several per point, and inlined they keep their results in registers instead of
// copying std::optional<BoundaryValue> through memory. Included by core/phase_diagram.h only.
#include <cmath>
#include <optional>

namespace pw {

inline std::optional<BoundaryValue> PhaseDiagram::segmentPressure(int seg, double T_K) const {
    if (seg < 0) return std::nullopt;
    const BoundarySegment &s = segments_[static_cast<std::size_t>(seg)];
    if (!s.T.contains(T_K)) return std::nullopt;
    const Boundary &b = boundaryOf(seg);
    double p = s.table.pressure(T_K);
    if (std::isnan(p)) p = b.model->pressure(T_K);  // outside the table: the equation itself
    return BoundaryValue{&b, p, b.extrapolated(T_K)};
}

inline std::optional<BoundaryValue> PhaseDiagram::segmentTemperature(int seg, double P_Pa,
                                                                     double lnP) const {
    if (seg < 0) return std::nullopt;
    const BoundarySegment &s = segments_[static_cast<std::size_t>(seg)];
    if (!(P_Pa >= s.pLo && P_Pa <= s.pHi)) return std::nullopt;
    const std::optional<double> T = s.table.temperature(lnP);
    if (!T) return solveOnSegment(seg, lnP);
    const Boundary &b = boundaryOf(seg);
    return BoundaryValue{&b, *T, b.extrapolated(*T)};
}

inline std::optional<BoundaryValue> PhaseDiagram::meltingTemperature(double P_Pa) const {
    return meltingTemperature(P_Pa, std::log(P_Pa));  // checks P_Pa
}

inline std::optional<BoundaryValue> PhaseDiagram::meltingTemperature(double P_Pa,
                                                                     double lnP) const {
    requirePressure(P_Pa);
    for (std::size_t k = 0; k < meltingSegs_.size(); ++k) {
        const BoundarySegment &s = segments_[static_cast<std::size_t>(meltingSegs_[k])];
        if (P_Pa < s.pLo) {
            // Below the first segment: no melting; between two segments: the gap.
            if (k == 0) return std::nullopt;
            return solveOutside(meltingSegs_[k - 1], P_Pa);
        }
        if (P_Pa <= s.pHi) return segmentTemperature(meltingSegs_[k], P_Pa, lnP);
    }
    return std::nullopt;
}

inline std::optional<BoundaryValue> PhaseDiagram::vaporizationTemperature(double P_Pa) const {
    requirePressure(P_Pa);
    return segmentTemperature(vaporizationSeg_, P_Pa, std::log(P_Pa));
}

inline std::optional<BoundaryValue> PhaseDiagram::vaporizationTemperature(double P_Pa,
                                                                          double lnP) const {
    requirePressure(P_Pa);
    return segmentTemperature(vaporizationSeg_, P_Pa, lnP);
}

inline std::optional<BoundaryValue> PhaseDiagram::sublimationTemperature(double P_Pa) const {
    requirePressure(P_Pa);
    return segmentTemperature(sublimationSeg_, P_Pa, std::log(P_Pa));
}

inline std::optional<BoundaryValue> PhaseDiagram::sublimationTemperature(double P_Pa,
                                                                         double lnP) const {
    requirePressure(P_Pa);
    return segmentTemperature(sublimationSeg_, P_Pa, lnP);
}

inline std::optional<BoundaryValue> PhaseDiagram::meltingPressure(double T_K) const {
    requireTemperature(T_K);
    for (int seg : meltingSegs_) {
        if (auto v = segmentPressure(seg, T_K)) return v;
    }
    return std::nullopt;
}

inline std::optional<BoundaryValue> PhaseDiagram::vaporizationPressure(double T_K) const {
    requireTemperature(T_K);
    return segmentPressure(vaporizationSeg_, T_K);
}

inline std::optional<BoundaryValue> PhaseDiagram::sublimationPressure(double T_K) const {
    requireTemperature(T_K);
    return segmentPressure(sublimationSeg_, T_K);
}

}  // namespace pw
