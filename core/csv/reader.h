#pragma once
// A streaming reader for delimited text files (CSV and its relatives), built for logged runs
// of millions of rows: memory stays flat (one buffer, grown only for a record longer than
// it), fields are views into the buffer, numbers are parsed with std::from_chars.
//
// Conventions (docs/classification.md, "CSV files"):
// - separator: ',', ';' or tab, detected from the header line unless given;
// - fields may be quoted with '"' (a doubled quote inside is one quote; separators and line
//   breaks inside quotes belong to the field);
// - line ends LF or CRLF; a UTF-8 byte-order mark at the start is ignored; empty lines are
//   skipped;
// - numbers use '.' as decimal mark; ',' only when declared (decimalComma), and never
//   together with a comma separator (ambiguous: refused);
// - rows are counted as lines in the file, the header is row 1 (pw::InputError convention).
#include <cstddef>
#include <iosfwd>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pw::csv {

struct ReaderOptions {
    char delimiter = '\0';      // '\0': detect from the header line
    bool decimalComma = false;  // numbers are written 12,5 (needs ';' or tab separator)
    std::size_t bufferBytes = std::size_t{1} << 20;
};

// Whole records of a delimited file, handed out a block at a time (Reader::nextBlock), for
// readers that split and parse the records themselves. The text is followed by kPadding zero
// bytes: a parser that reads up to the first byte that cannot continue a number
// (csv::parseDecimalAt) stops there at the latest.
class TextBlock {
public:
    static constexpr std::size_t kPadding = 16;
    std::string_view text() const { return {data_.data(), size_}; }
    void assign(const char *text, std::size_t size);

private:
    std::vector<char> data_;
    std::size_t size_ = 0;
};

// Splits one record into fields at `delimiter`, honouring quotes (a quoted field's text goes
// to `scratch` without its quotes, a doubled quote as one); the views point into `record` or
// `scratch`. False when a quoted field is not closed.
bool splitRecord(std::string_view record, char delimiter, std::vector<std::string_view> &fields,
                 std::string &scratch);

// The message for a record with the wrong number of fields.
std::string fieldCountMessage(std::size_t fields, std::size_t headerFields, char delimiter);

// A cell as quoted in a message: a long cell (a runaway line) is cut to its first 40 bytes.
std::string shownCell(std::string_view cell);

// Why a cell is not a number, or nullopt when it is one (value in `out`). Accepts an optional
// sign, surrounding blanks, and exponents; refuses empty cells, inf and nan.
std::optional<std::string> parseNumber(std::string_view cell, bool decimalComma, double &out);

class Reader {
public:
    // Reads the header at once; throws pw::InputError for an empty input, an undetectable
    // separator or a decimal comma with a comma separator.
    Reader(std::istream &in, std::string fileName, ReaderOptions options = {});

    const std::string &fileName() const { return fileName_; }
    char delimiter() const { return delimiter_; }
    const std::vector<std::string> &header() const { return header_; }  // unquoted cells
    const std::string &headerRecord() const { return headerRecord_; }   // raw header text

    // Moves to the next data record; false at the end of the input. Throws pw::InputError when
    // the record's field count differs from the header's (the reader has then moved past it,
    // so a caller that skips bad rows may simply call next() again).
    bool next();
    long row() const { return row_; }
    std::size_t fieldCount() const { return fields_.size(); }
    std::string_view field(std::size_t i) const { return fields_[i]; }
    std::string_view record() const { return record_; }  // raw text, without the line end

    // The field as a number; throws pw::InputError naming file, row and the column's header.
    double number(std::size_t column) const;

    // Instead of next(): the rest of the input as blocks of whole records, at most `bytes` each
    // (more for a record longer than that), each ending with its line end (the last block of
    // a file without a final line end: without); false at the end. Empty lines stay in the
    // blocks. Lines are not counted: the first block starts on nextLine().
    bool nextBlock(TextBlock &block, std::size_t bytes);
    // The line (1-based) the unread text starts on.
    long nextLine() const { return nextLine_; }

private:
    bool readRecord();
    bool fill();
    void split();
    void detectDelimiter();

    std::istream &in_;
    std::string fileName_;
    ReaderOptions options_;
    std::vector<char> buffer_;
    std::size_t begin_ = 0, end_ = 0;
    bool eof_ = false;
    long nextLine_ = 1;
    long row_ = 0;
    char delimiter_ = ',';
    std::string_view record_;
    std::vector<std::string_view> fields_;
    std::string scratch_;  // unquoted copies of quoted fields
    std::vector<std::string> header_;
    std::string headerRecord_;
};

}  // namespace pw::csv
