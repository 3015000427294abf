#include "core/boundary_segment.h"

#include "core/errors.h"

namespace pw {

LazyCurveTable::LazyCurveTable(BoundaryModelPtr model, double T_lo, double T_hi)
    : model_(std::move(model)), lo_(T_lo), hi_(T_hi) {}

LazyCurveTable::LazyCurveTable(const LazyCurveTable &other) noexcept
    : model_(other.model_), lo_(other.lo_), hi_(other.hi_) {
    shareFrom(other);
}

// A move shares like a copy: the source stays usable (its table is immutable).
LazyCurveTable::LazyCurveTable(LazyCurveTable &&other) noexcept
    : model_(other.model_), lo_(other.lo_), hi_(other.hi_) {
    shareFrom(other);
}

LazyCurveTable &LazyCurveTable::operator=(const LazyCurveTable &other) noexcept {
    if (this == &other) return *this;
    model_ = other.model_;
    lo_ = other.lo_;
    hi_ = other.hi_;
    shareFrom(other);
    return *this;
}

LazyCurveTable &LazyCurveTable::operator=(LazyCurveTable &&other) noexcept {
    return *this = static_cast<const LazyCurveTable &>(other);
}

// Takes other's table if it is built (table_ is never written again once ready_ is set, so
// reading it after the acquire load is race-free); otherwise this one builds its own later.
void LazyCurveTable::shareFrom(const LazyCurveTable &other) noexcept {
    if (other.ready_.load(std::memory_order_acquire) != nullptr) {
        table_ = other.table_;
    } else {
        table_.reset();
    }
    ready_.store(table_.get(), std::memory_order_release);
}

const CurveTable &LazyCurveTable::build() const {
    const std::lock_guard<std::mutex> lock(mutex_);
    if (const CurveTable *t = ready_.load(std::memory_order_relaxed)) return *t;
    std::shared_ptr<const CurveTable> built;
    if (model_) {
        try {
            built = std::make_shared<const CurveTable>(model_, lo_, hi_);
        } catch (const DomainError &) {
            // No table (a curve flat at its ends...): queries use the bracketed solver alone.
        }
    }
    if (!built) built = std::make_shared<const CurveTable>();
    table_ = std::move(built);
    ready_.store(table_.get(), std::memory_order_release);
    return *table_;
}

}  // namespace pw
