#include "core/csv/writer.h"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <ostream>

#include "core/csv/number_text.h"
#include "core/errors.h"

namespace pw::csv {

namespace {
constexpr std::size_t kSlack = 4096;  // room past the flush limit for the row being written
}  // namespace

Writer::Writer(std::ostream &out, char delimiter, std::size_t bufferBytes)
    : out_(&out),
      delimiter_(delimiter),
      limit_(bufferBytes),
      data_(std::make_unique<char[]>(bufferBytes + kSlack)),
      pos_(data_.get()),
      end_(data_.get() + bufferBytes + kSlack) {}

Writer::Writer(char delimiter)
    : out_(nullptr),
      delimiter_(delimiter),
      limit_(std::size_t{1} << 16),
      data_(std::make_unique<char[]>(limit_ + kSlack)),
      pos_(data_.get()),
      end_(data_.get() + limit_ + kSlack) {}

void Writer::grow(std::size_t bytes) {
    const std::size_t used = size();
    const std::size_t capacity =
        std::max(2 * static_cast<std::size_t>(end_ - data_.get()), used + bytes + kSlack);
    auto bigger = std::make_unique<char[]>(capacity);
    if (used > 0) std::memcpy(bigger.get(), data_.get(), used);
    data_ = std::move(bigger);
    pos_ = data_.get() + used;
    end_ = data_.get() + capacity;
}

void Writer::putQuoted(std::string_view text) {
    put('"');
    for (char c : text) {
        if (c == '"') put('"');
        put(c);
    }
    put('"');
}

void Writer::field(double value) {
    separate();
    appendNumber(value);
}

void Writer::appendNumber(double value) {
    rowStart_ = false;
    if (std::isnan(value)) return;
    if (room() < kShortestMaxBytes) grow(kShortestMaxBytes);
    char *start = pos_;
    pos_ = digits_ > 0 ? writeSignificant(pos_, value, digits_) : writeShortest(pos_, value);
    if (decimalComma_) std::replace(start, pos_, '.', ',');
}

void Writer::flush() {
    if (out_ == nullptr) return;
    if (size() > 0) out_->write(data_.get(), static_cast<std::streamsize>(size()));
    pos_ = data_.get();
    out_->flush();
    if (!*out_) throw Error("writing the output failed (disk full or the stream was closed?)");
}

}  // namespace pw::csv
