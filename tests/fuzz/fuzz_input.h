#pragma once
// Shared by the fuzz targets: the input split into option bytes and the text the parser sees.
#include <cstddef>
#include <cstdint>
#include <string_view>

namespace pw::fuzz {

// The first `n` bytes choose options; the rest is the file. An option byte counts from '0',
// so seed files start with readable digits ("00": every option at its default). Short
// inputs give zero options.
struct Input {
    Input(const std::uint8_t *data, std::size_t size, std::size_t n) {
        const std::size_t k = size < n ? size : n;
        options = std::string_view(reinterpret_cast<const char *>(data), k);
        text = std::string_view(reinterpret_cast<const char *>(data) + k, size - k);
    }
    unsigned char option(std::size_t i) const {
        if (i >= options.size()) return 0;
        return static_cast<unsigned char>(static_cast<unsigned char>(options[i]) - '0');
    }
    std::string_view options;
    std::string_view text;
};

}  // namespace pw::fuzz
