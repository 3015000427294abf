#pragma once
// Min/max-preserving reduction of a long run for drawing only (the computation always uses
// every state). The run is cut into equal index buckets; each bucket keeps its first and last
// state and the states holding its minimum and maximum T and P, in time order, so peaks,
// dips and crossings stay visible at any zoom that shows whole buckets.
#include <cstddef>
#include <span>
#include <vector>

#include "core/path.h"

namespace pw::run {

// Indices into `states`, strictly increasing, always including the first and the last.
// Returns every index when states.size() <= target. At most about `target` indices
// (target >= 8; smaller values are raised to 8).
std::vector<std::size_t> downsampleIndices(std::span<const State> states, std::size_t target);

// Convenience: the selected states themselves.
std::vector<State> downsample(std::span<const State> states, std::size_t target);

}  // namespace pw::run
