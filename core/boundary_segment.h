#pragma once
// One boundary curve restricted to the part of the diagram where it applies (between triple
// points, or its validity range), with the fast inverse table over it. Internal to
// PhaseDiagram; kept in its own header so PhaseDiagram can hold segments by value.
#include <atomic>
#include <cstddef>
#include <memory>
#include <mutex>
#include <optional>

#include "core/boundary_model.h"
#include "core/solver.h"

namespace pw {

// The inverse table of a segment, built on the first inverse query (a 4096-node table costs
// milliseconds; most diagrams of a library are never queried backwards). Thread-safe: the
// first query builds the table under a mutex and publishes it through an atomic pointer,
// later queries read it lock-free. The built table is immutable and shared by copies; a copy
// of a diagram whose table is not built yet builds its own on first use (same values: the
// construction is deterministic).
class LazyInverseTable {
public:
    LazyInverseTable() = default;
    // Table over [T_lo, T_hi]; a curve that cannot be tabulated there gives an empty table
    // (queries fall back to the bracketed solver).
    LazyInverseTable(BoundaryModelPtr model, double T_lo, double T_hi);
    LazyInverseTable(const LazyInverseTable &other) noexcept;
    LazyInverseTable(LazyInverseTable &&other) noexcept;
    LazyInverseTable &operator=(const LazyInverseTable &other) noexcept;
    LazyInverseTable &operator=(LazyInverseTable &&other) noexcept;
    ~LazyInverseTable() = default;

    // T at ln p from the table (built now if needed); nullopt outside it or without a table.
    std::optional<double> temperature(double lnp) const { return get().temperature(lnp); }
    // The table, built now if needed.
    const InverseTable &get() const;
    bool built() const { return ready_.load(std::memory_order_acquire) != nullptr; }

private:
    void shareFrom(const LazyInverseTable &other) noexcept;

    BoundaryModelPtr model_;  // null: no table
    double lo_ = 0.0;
    double hi_ = 0.0;
    mutable std::mutex mutex_;                                  // serialises the build
    mutable std::shared_ptr<const InverseTable> table_;         // written once, under mutex_
    mutable std::atomic<const InverseTable *> ready_{nullptr};  // table_.get() once written
};

struct BoundarySegment {
    std::size_t index = 0;  // into Substance::boundaries
    TRange T;               // temperatures the segment covers
    double pLo = 0.0;       // lowest and highest pressure on the segment (Pa)
    double pHi = 0.0;
    LazyInverseTable table;  // T(ln p) over the segment
};

}  // namespace pw
