#pragma once
// Safe parsing of untrusted JSON text: size and nesting limits checked before parsing,
// malformed text reported with line and column, non-finite numbers refused.
#include <optional>
#include <string_view>

#include "core/io/reader.h"

namespace pw::io {

inline constexpr std::size_t kMaxFileBytes = 4u * 1024u * 1024u;  // 4 MiB
inline constexpr int kMaxDepth = 64;

// 1-based line and column of byte `offset` in `text`.
struct TextPosition {
    long line = 1;
    long column = 1;
};
TextPosition positionOf(std::string_view text, std::size_t offset);

// Parses `text`; on any problem records an error on `reader` and returns nullopt.
std::optional<Json> parseGuarded(std::string_view text, Reader &reader);

}  // namespace pw::io
