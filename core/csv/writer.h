#pragma once
// A buffered writer for delimited text: fields are appended to one large buffer and handed to
// the stream in big blocks; numbers are formatted with std::to_chars (shortest text that reads
// back to the same double). Errors of the stream are reported by flush() as pw::Error.
#include <cstddef>
#include <iosfwd>
#include <string>
#include <string_view>

namespace pw::csv {

class Writer {
public:
    explicit Writer(std::ostream &out, char delimiter = ',',
                    std::size_t bufferBytes = std::size_t{1} << 20);
    Writer(const Writer &) = delete;
    Writer &operator=(const Writer &) = delete;
    ~Writer() = default;  // does not flush: call flush() and let it throw

    char delimiter() const { return delimiter_; }
    // Text that is already a row's fields (e.g. an input record passed through).
    void raw(std::string_view text);
    // One field, quoted when it holds the separator, a quote or a line break.
    void field(std::string_view text);
    // One number; NaN gives an empty field.
    void field(double value);
    void endRow();
    // Writes the buffer to the stream; throws pw::Error when the stream has failed.
    void flush();

private:
    void separate();
    void maybeFlush() {
        if (buffer_.size() >= limit_) flush();
    }

    std::ostream &out_;
    char delimiter_;
    std::size_t limit_;
    std::string buffer_;
    bool rowStart_ = true;
};

}  // namespace pw::csv
