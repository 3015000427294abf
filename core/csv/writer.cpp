#include "core/csv/writer.h"

#include <array>
#include <charconv>
#include <cmath>
#include <ostream>

#include "core/errors.h"

namespace pw::csv {

Writer::Writer(std::ostream &out, char delimiter, std::size_t bufferBytes)
    : out_(out), delimiter_(delimiter), limit_(bufferBytes) {
    buffer_.reserve(limit_ + 4096);
}

void Writer::separate() {
    if (!rowStart_) buffer_ += delimiter_;
    rowStart_ = false;
}

void Writer::raw(std::string_view text) {
    separate();
    buffer_.append(text);
}

void Writer::field(std::string_view text) {
    separate();
    const bool quote =
        text.find_first_of(std::string_view("\"\r\n", 3)) != std::string_view::npos ||
        text.find(delimiter_) != std::string_view::npos;
    if (!quote) {
        buffer_.append(text);
        return;
    }
    buffer_ += '"';
    for (char c : text) {
        if (c == '"') buffer_ += '"';
        buffer_ += c;
    }
    buffer_ += '"';
}

void Writer::field(double value) {
    separate();
    if (std::isnan(value)) return;
    std::array<char, 32> text{};
    const auto result = std::to_chars(text.data(), text.data() + text.size(), value);
    buffer_.append(text.data(), result.ptr);
}

void Writer::endRow() {
    buffer_ += '\n';
    rowStart_ = true;
    maybeFlush();
}

void Writer::flush() {
    if (!buffer_.empty()) out_.write(buffer_.data(), static_cast<std::streamsize>(buffer_.size()));
    buffer_.clear();
    out_.flush();
    if (!out_) throw Error("writing the output failed (disk full or the stream was closed?)");
}

}  // namespace pw::csv
