#include "core/csv/reader.h"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <charconv>
#include <cmath>
#include <cstring>
#include <istream>

#include "core/csv/number_text.h"
#include "core/errors.h"

namespace pw::csv {
namespace {

constexpr std::string_view kBom = "\xEF\xBB\xBF";

std::string_view trim(std::string_view s) {
    while (!s.empty() && (s.front() == ' ' || s.front() == '\t')) s.remove_prefix(1);
    while (!s.empty() && (s.back() == ' ' || s.back() == '\t')) s.remove_suffix(1);
    return s;
}

std::string_view delimiterName(char d) {
    return d == ',' ? "comma" : d == ';' ? "semicolon" : d == '\t' ? "tab" : "separator";
}

}  // namespace

bool splitRecord(std::string_view record, char delimiter, std::vector<std::string_view> &fields,
                 std::string &scratch) {
    fields.clear();
    const char d = delimiter;
    std::string_view rest = record;
    if (rest.find('"') == std::string_view::npos) {
        for (;;) {
            const void *hit = std::memchr(rest.data(), d, rest.size());
            if (!hit) break;
            const auto n = static_cast<std::size_t>(static_cast<const char *>(hit) - rest.data());
            fields.push_back(rest.substr(0, n));
            rest.remove_prefix(n + 1);
        }
        fields.push_back(rest);
        return true;
    }
    scratch.clear();
    scratch.reserve(record.size());  // no reallocation below: views stay valid
    std::size_t i = 0;
    const std::size_t n = record.size();
    for (;;) {
        const std::size_t start = scratch.size();
        const bool quoted = i < n && record[i] == '"';
        bool inside = quoted;
        if (quoted) ++i;
        for (; i < n; ++i) {
            const char c = record[i];
            if (inside && c == '"') {
                if (i + 1 < n && record[i + 1] == '"') {
                    scratch += '"';
                    ++i;
                } else {
                    inside = false;
                }
                continue;
            }
            if (!inside && c == d) break;
            scratch += c;
        }
        if (inside) return false;
        fields.emplace_back(scratch.data() + start, scratch.size() - start);
        if (i >= n) break;
        ++i;  // past the separator
    }
    return true;
}

std::string fieldCountMessage(std::size_t fields, std::size_t headerFields, char delimiter) {
    return fmt::format("the row has {} fields but the header has {} ({}-separated)", fields,
                       headerFields, delimiterName(delimiter));
}

void TextBlock::assign(const char *text, std::size_t size) {
    if (data_.size() < size + kPadding) data_.resize(size + kPadding);
    std::memcpy(data_.data(), text, size);
    std::memset(data_.data() + size, 0, kPadding);
    size_ = size;
}

std::string shownCell(std::string_view cell) {
    constexpr std::size_t kMax = 40;
    if (cell.size() <= kMax) return std::string(cell);
    return fmt::format("{}... ({} bytes)", cell.substr(0, kMax), cell.size());
}

std::optional<std::string> parseNumber(std::string_view cell, bool decimalComma, double &out) {
    std::string_view s = trim(cell);
    if (s.empty()) return std::string("missing value");
    std::string_view digits = s;
    if (digits.front() == '+') digits.remove_prefix(1);
    std::array<char, 64> local{};
    if (decimalComma) {
        if (digits.find('.') != std::string_view::npos)
            return fmt::format(
                "'{}' contains '.' but the file was declared to use a decimal "
                "comma (thousands separators are not accepted)",
                shownCell(s));
        if (digits.size() >= local.size()) return fmt::format("'{}' is not a number", shownCell(s));
        std::copy(digits.begin(), digits.end(), local.begin());
        std::replace(local.begin(), local.begin() + digits.size(), ',', '.');
        digits = std::string_view(local.data(), digits.size());
    }
    double v = 0.0;
    if (!decimalComma && parseSimpleDecimal(digits.data(), digits.data() + digits.size(), v)) {
        out = v;  // finite: the fast path reads at most 19 digits times 10^(+-22)
        return std::nullopt;
    }
    const auto [ptr, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), v);
    if (ec == std::errc::result_out_of_range)
        return fmt::format("'{}' is out of range", shownCell(s));
    if (ec != std::errc() || ptr != digits.data() + digits.size()) {
        if (!decimalComma && s.find(',') != std::string_view::npos)
            return fmt::format(
                "'{}' is not a number (if the file uses a decimal comma, declare "
                "it: --decimal-comma)",
                shownCell(s));
        return fmt::format("'{}' is not a number", shownCell(s));
    }
    if (!std::isfinite(v)) return fmt::format("'{}' is not a finite number", shownCell(s));
    out = v;
    return std::nullopt;
}

Reader::Reader(std::istream &in, std::string fileName, ReaderOptions options)
    : in_(in), fileName_(std::move(fileName)), options_(options) {
    buffer_.resize(std::max<std::size_t>(options_.bufferBytes, 4096));
    if (!readRecord()) throw InputError(fileName_, 0, "", "the file is empty (no header line)");
    std::string_view h = record_;
    if (h.substr(0, kBom.size()) == kBom) h.remove_prefix(kBom.size());
    headerRecord_ = std::string(h);
    detectDelimiter();
    if (options_.decimalComma && delimiter_ == ',')
        throw InputError(fileName_, 1, "",
                         "a decimal comma cannot be told apart from a comma separator; use a "
                         "file separated by ';' or tabs");
    record_ = headerRecord_;
    split();
    for (std::string_view f : fields_) header_.emplace_back(trim(f));
    fields_.clear();
}

void Reader::detectDelimiter() {
    if (options_.delimiter != '\0') {
        delimiter_ = options_.delimiter;
        return;
    }
    std::array<std::size_t, 3> counts{};
    constexpr std::array<char, 3> kCandidates{',', ';', '\t'};
    bool quoted = false;
    for (char c : headerRecord_) {
        if (c == '"') quoted = !quoted;
        if (quoted) continue;
        for (std::size_t i = 0; i < kCandidates.size(); ++i)
            if (c == kCandidates[i]) ++counts[i];
    }
    std::size_t best = 0;
    for (std::size_t i = 1; i < counts.size(); ++i)
        if (counts[i] > counts[best]) best = i;
    for (std::size_t i = 0; i < counts.size(); ++i)
        if (i != best && counts[i] == counts[best] && counts[i] > 0)
            throw InputError(
                fileName_, 1, "",
                fmt::format("cannot tell the separator: the header has as many {}s "
                            "as {}s; give it explicitly (--separator)",
                            delimiterName(kCandidates[best]), delimiterName(kCandidates[i])));
    delimiter_ = counts[best] > 0 ? kCandidates[best] : ',';
}

bool Reader::fill() {
    if (begin_ > 0) {
        std::memmove(buffer_.data(), buffer_.data() + begin_, end_ - begin_);
        end_ -= begin_;
        begin_ = 0;
    }
    if (end_ == buffer_.size()) buffer_.resize(buffer_.size() * 2);  // a very long record
    in_.read(buffer_.data() + end_, static_cast<std::streamsize>(buffer_.size() - end_));
    const auto got = static_cast<std::size_t>(in_.gcount());
    if (in_.bad()) throw InputError(fileName_, nextLine_, "", "read error");
    end_ += got;
    if (got == 0) eof_ = true;
    return got > 0;
}

// Finds the next non-empty record, honouring quotes; sets record_, row_ and nextLine_.
bool Reader::readRecord() {
    std::size_t scanned = begin_;  // everything before this has no record end
    for (;;) {
        const char *data = buffer_.data();
        std::size_t stop = end_;
        long breaks = 0;
        const void *nl = std::memchr(data + scanned, '\n', end_ - scanned);
        const std::size_t lineEnd =
            nl ? static_cast<std::size_t>(static_cast<const char *>(nl) - data) : end_;
        const bool quotes = std::memchr(data + begin_, '"', lineEnd - begin_) != nullptr;
        if (nl && !quotes) {
            stop = lineEnd;
        } else if (quotes) {
            bool inside = false;
            for (std::size_t i = begin_; i < end_; ++i) {
                if (data[i] == '"') inside = !inside;
                if (data[i] != '\n') continue;
                if (!inside) {
                    stop = i;
                    break;
                }
                ++breaks;
            }
        }
        if (stop == end_ && !eof_) {
            scanned = end_ - begin_;
            fill();
            scanned += begin_;
            continue;
        }
        if (stop == end_ && begin_ == end_) return false;
        std::size_t len = stop - begin_;
        if (len > 0 && data[begin_ + len - 1] == '\r') --len;
        record_ = std::string_view(data + begin_, len);
        row_ = nextLine_;
        nextLine_ += 1 + breaks;
        begin_ = stop == end_ ? end_ : stop + 1;
        if (!record_.empty()) return true;
        scanned = begin_;
    }
}

void Reader::split() {
    if (!splitRecord(record_, delimiter_, fields_, scratch_))
        throw InputError(fileName_, row_, "", "a quoted field is not closed");
}

bool Reader::next() {
    if (!readRecord()) return false;
    split();
    if (fields_.size() != header_.size())
        throw InputError(fileName_, row_, "",
                         fieldCountMessage(fields_.size(), header_.size(), delimiter_));
    return true;
}

bool Reader::nextBlock(TextBlock &block, std::size_t bytes) {
    bytes = std::max<std::size_t>(bytes, 1);
    for (;;) {
        if (end_ - begin_ < bytes && !eof_) {
            fill();
            continue;
        }
        if (begin_ == end_) return false;
        const char *data = buffer_.data() + begin_;
        const std::size_t size = std::min(end_ - begin_, bytes);
        // The last line end outside quotes within the first `size` bytes.
        std::size_t cut = 0;
        if (std::memchr(data, '"', size) == nullptr) {
            const void *last = ::memrchr(data, '\n', size);
            if (last) cut = static_cast<std::size_t>(static_cast<const char *>(last) - data) + 1;
        } else {
            bool inside = false;
            for (std::size_t i = 0; i < size; ++i) {
                if (data[i] == '"') inside = !inside;
                if (data[i] == '\n' && !inside) cut = i + 1;
            }
        }
        if (cut == 0) {
            // No whole record within `bytes`: a longer one, or the last without a line end.
            if (eof_ && size == end_ - begin_) {
                cut = size;
            } else {
                bytes *= 2;
                continue;
            }
        }
        block.assign(data, cut);
        begin_ += cut;
        return true;
    }
}

double Reader::number(std::size_t column) const {
    double v = 0.0;
    if (auto why = parseNumber(fields_[column], options_.decimalComma, v))
        throw InputError(fileName_, row_, header_[column], *why);
    return v;
}

}  // namespace pw::csv
