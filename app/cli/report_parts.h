#pragma once
// Pieces shared by `info` and `compare`, so both write a fixed point the same way
// ({"T_K": ..., "P_Pa": ...}, null for a missing value) and carry the same caution.
#include <nlohmann/json.hpp>
#include <optional>

#include "core/substance.h"

namespace pw::cli {

using Json = nlohmann::ordered_json;

// Every result supports engineering judgement (FIELD-NOTES, "Cautions the tool must carry").
inline constexpr const char *kGeneralCaution =
    "Results support engineering judgement; they do not replace the applicable "
    "pressure-equipment codes, site procedures or licensed practice.";

inline Json optionalNumber(const std::optional<double> &x) { return x ? Json(*x) : Json(nullptr); }

inline Json pointJson(const FixedPoint *fp) {
    if (fp == nullptr) return nullptr;
    return Json{{"T_K", fp->T_K}, {"P_Pa", fp->P_Pa}};
}

}  // namespace pw::cli
