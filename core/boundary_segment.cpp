#include "core/boundary_segment.h"

#include "core/errors.h"

namespace pw {

LazyInverseTable::LazyInverseTable(BoundaryModelPtr model, double T_lo, double T_hi)
    : model_(std::move(model)), lo_(T_lo), hi_(T_hi) {}

LazyInverseTable::LazyInverseTable(const LazyInverseTable &other) noexcept
    : model_(other.model_), lo_(other.lo_), hi_(other.hi_) {
    shareFrom(other);
}

// A move shares like a copy: the source stays usable (its table is immutable).
LazyInverseTable::LazyInverseTable(LazyInverseTable &&other) noexcept
    : model_(other.model_), lo_(other.lo_), hi_(other.hi_) {
    shareFrom(other);
}

LazyInverseTable &LazyInverseTable::operator=(const LazyInverseTable &other) noexcept {
    if (this == &other) return *this;
    model_ = other.model_;
    lo_ = other.lo_;
    hi_ = other.hi_;
    shareFrom(other);
    return *this;
}

LazyInverseTable &LazyInverseTable::operator=(LazyInverseTable &&other) noexcept {
    return *this = static_cast<const LazyInverseTable &>(other);
}

// Takes other's table if it is built (table_ is never written again once ready_ is set, so
// reading it after the acquire load is race-free); otherwise this one builds its own later.
void LazyInverseTable::shareFrom(const LazyInverseTable &other) noexcept {
    if (other.ready_.load(std::memory_order_acquire) != nullptr) {
        table_ = other.table_;
    } else {
        table_.reset();
    }
    ready_.store(table_.get(), std::memory_order_release);
}

const InverseTable &LazyInverseTable::get() const {
    if (const InverseTable *t = ready_.load(std::memory_order_acquire)) return *t;
    const std::lock_guard<std::mutex> lock(mutex_);
    if (const InverseTable *t = ready_.load(std::memory_order_relaxed)) return *t;
    std::shared_ptr<const InverseTable> built;
    if (model_) {
        try {
            built = std::make_shared<const InverseTable>(model_, lo_, hi_);
        } catch (const DomainError &) {
            // No table (a curve flat at its ends...): queries use the bracketed solver alone.
        }
    }
    if (!built) built = std::make_shared<const InverseTable>();
    table_ = std::move(built);
    ready_.store(table_.get(), std::memory_order_release);
    return *table_;
}

}  // namespace pw
