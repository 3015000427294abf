#include "core/run/downsample.h"

#include <algorithm>
#include <array>

namespace pw::run {

std::vector<std::size_t> downsampleIndices(std::span<const State> states, std::size_t target) {
    const std::size_t n = states.size();
    std::vector<std::size_t> out;
    target = std::max<std::size_t>(target, 8);
    if (n <= target) {
        out.resize(n);
        for (std::size_t i = 0; i < n; ++i) out[i] = i;
        return out;
    }
    constexpr std::size_t kPerBucket = 6;  // first, last, min/max T, min/max P
    const std::size_t buckets = std::max<std::size_t>(1, target / kPerBucket);
    out.reserve(buckets * kPerBucket);
    for (std::size_t b = 0; b < buckets; ++b) {
        const std::size_t lo = b * n / buckets;
        const std::size_t hi = (b + 1) * n / buckets;  // exclusive
        if (lo >= hi) continue;
        std::array<std::size_t, kPerBucket> pick{lo, hi - 1, lo, lo, lo, lo};
        for (std::size_t i = lo; i < hi; ++i) {
            const State &s = states[i];
            if (s.T_K < states[pick[2]].T_K) pick[2] = i;
            if (s.T_K > states[pick[3]].T_K) pick[3] = i;
            if (s.P_Pa < states[pick[4]].P_Pa) pick[4] = i;
            if (s.P_Pa > states[pick[5]].P_Pa) pick[5] = i;
        }
        std::sort(pick.begin(), pick.end());
        for (const std::size_t i : pick)
            if (out.empty() || out.back() != i) out.push_back(i);
    }
    return out;
}

std::vector<State> downsample(std::span<const State> states, std::size_t target) {
    const auto idx = downsampleIndices(states, target);
    std::vector<State> out;
    out.reserve(idx.size());
    for (const std::size_t i : idx) out.push_back(states[i]);
    return out;
}

}  // namespace pw::run
