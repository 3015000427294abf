#pragma once
// One boundary curve restricted to the part of the diagram where it applies (between triple
// points, or its validity range), with the fast tables over it (core/solver.h, CurveTable).
// Internal to PhaseDiagram; kept in its own header so PhaseDiagram can hold segments by value.
#include <atomic>
#include <cstddef>
#include <memory>
#include <mutex>
#include <optional>

#include "core/boundary_model.h"
#include "core/solver.h"

namespace pw {

// The tables of a segment, built on the first query that uses them (about a millisecond;
// most diagrams of a library are never queried that way). Thread-safe: the
// first query builds the table under a mutex and publishes it through an atomic pointer,
// later queries read it lock-free. The built table is immutable and shared by copies; a copy
// of a diagram whose table is not built yet builds its own on first use (same values: the
// construction is deterministic).
class LazyCurveTable {
public:
    LazyCurveTable() = default;
    // Table over [T_lo, T_hi]; a curve that cannot be tabulated there gives an empty table
    // (queries fall back to the bracketed solver).
    LazyCurveTable(BoundaryModelPtr model, double T_lo, double T_hi);
    LazyCurveTable(const LazyCurveTable &other) noexcept;
    LazyCurveTable(LazyCurveTable &&other) noexcept;
    LazyCurveTable &operator=(const LazyCurveTable &other) noexcept;
    LazyCurveTable &operator=(LazyCurveTable &&other) noexcept;
    ~LazyCurveTable() = default;

    // T at ln p from the table (built now if needed); nullopt outside it or without a table.
    std::optional<double> temperature(double lnp) const { return get().temperature(lnp); }
    // p at T from the table; NaN outside it or without a table.
    double pressure(double T) const { return get().pressure(T); }
    // The table, built now if needed (the built case inline: it is on every query's path).
    const CurveTable &get() const {
        if (const CurveTable *t = ready_.load(std::memory_order_acquire)) return *t;
        return build();
    }
    bool built() const { return ready_.load(std::memory_order_acquire) != nullptr; }

private:
    void shareFrom(const LazyCurveTable &other) noexcept;
    const CurveTable &build() const;

    BoundaryModelPtr model_;  // null: no table
    double lo_ = 0.0;
    double hi_ = 0.0;
    mutable std::mutex mutex_;                                // serialises the build
    mutable std::shared_ptr<const CurveTable> table_;         // written once, under mutex_
    mutable std::atomic<const CurveTable *> ready_{nullptr};  // table_.get() once written
};

struct BoundarySegment {
    std::size_t index = 0;  // into Substance::boundaries
    TRange T;               // temperatures the segment covers
    double pLo = 0.0;       // lowest and highest pressure on the segment (Pa)
    double pHi = 0.0;
    LazyCurveTable table;  // ln p(T) and T(ln p) over the segment
};

}  // namespace pw
