#pragma once
// A buffered writer for delimited text: fields are appended to one large buffer and handed to
// the stream in big blocks; numbers are formatted as the shortest text that reads back to the
// same double (the text std::to_chars gives), or rounded to a set number of significant
// digits (printf's %.Ng). Errors of the stream are reported by flush() as
// pw::Error. The per-field paths are inline: a million-row table calls them ten million times.
#include <cstddef>
#include <cstring>
#include <iosfwd>
#include <memory>
#include <string_view>

namespace pw::csv {

class Writer {
public:
    explicit Writer(std::ostream &out, char delimiter = ',',
                    std::size_t bufferBytes = std::size_t{1} << 20);
    // A writer into memory only: rows collect in the buffer (text()) until clear().
    explicit Writer(char delimiter);
    Writer(Writer &&) noexcept = default;
    Writer(const Writer &) = delete;
    Writer &operator=(const Writer &) = delete;
    Writer &operator=(Writer &&) noexcept = default;
    ~Writer() = default;  // does not flush: call flush() and let it throw

    char delimiter() const { return delimiter_; }
    // Numbers written with a decimal comma (12,5), for files read with one (';' or tab
    // separated: the caller makes sure the separator is not ',').
    void setDecimalComma(bool on) { decimalComma_ = on; }
    // Numbers rounded to this many significant digits (1 to 17); 0, the default: the shortest
    // text that reads back to the same double.
    void setSignificantDigits(int digits) { digits_ = digits; }
    // Text that is already a row's fields (e.g. an input record passed through).
    void raw(std::string_view text) {
        separate();
        put(text);
    }
    // One field, quoted when it holds the separator, a quote or a line break.
    void field(std::string_view text) {
        separate();
        if (needsQuotes(text))
            putQuoted(text);
        else
            put(text);
    }
    // One field the caller has checked once with needsQuotes() (a fixed set of labels): no
    // per-row scan.
    void fieldVerbatim(std::string_view text) {
        separate();
        put(text);
    }
    // Text that continues the current row as it is, separators included: rows the caller
    // composes from pieces it has checked once with needsQuotes().
    void append(std::string_view text) {
        rowStart_ = false;
        put(text);
    }
    // A number that continues the current row (no separator before it); NaN adds nothing.
    void appendNumber(double value);
    // Whether field() would quote `text` with this writer's separator.
    bool needsQuotes(std::string_view text) const {
        // One pass over the (short) field: cheaper than a search per special character.
        for (const char c : text)
            if (c == delimiter_ || c == '"' || c == '\n' || c == '\r') return true;
        return false;
    }
    // One number; NaN gives an empty field.
    void field(double value);
    void endRow() {
        put('\n');
        rowStart_ = true;
        if (out_ != nullptr && size() >= limit_) flush();
    }
    // Writes the buffer to the stream; throws pw::Error when the stream has failed. A memory
    // writer keeps its text.
    void flush();
    // The rows written and not yet flushed; clear() forgets them.
    std::string_view text() const { return {data_.get(), size()}; }
    void clear() {
        pos_ = data_.get();
        rowStart_ = true;
    }

private:
    std::size_t size() const { return static_cast<std::size_t>(pos_ - data_.get()); }
    std::size_t room() const { return static_cast<std::size_t>(end_ - pos_); }
    void separate() {
        if (!rowStart_) put(delimiter_);
        rowStart_ = false;
    }
    void put(char c) {
        if (pos_ == end_) grow(1);
        *pos_++ = c;
    }
    void put(std::string_view text) {
        if (text.size() > room()) grow(text.size());
        if (!text.empty()) std::memcpy(pos_, text.data(), text.size());
        pos_ += text.size();
    }
    void putQuoted(std::string_view text);
    void grow(std::size_t bytes);  // room for `bytes` more (a row longer than the buffer)

    std::ostream *out_;  // null: a memory writer
    char delimiter_;
    std::size_t limit_;
    std::unique_ptr<char[]> data_;
    char *pos_ = nullptr;
    char *end_ = nullptr;
    bool rowStart_ = true;
    bool decimalComma_ = false;
    int digits_ = 0;
};

}  // namespace pw::csv
