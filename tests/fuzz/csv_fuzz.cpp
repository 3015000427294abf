// Fuzz target: the delimited-text reader (core/csv/reader.h), the state-column resolver
// (core/csv/columns.h) and the block scanner of state rows (core/csv/state_rows.h), which
// must read every file exactly as the reader does (the same records, values and messages).
// Byte 0 picks the separator and the scanner's block size, byte 1 the decimal comma and the
// time column. The buffer starts small so long records make it grow. Every pw::Error is
// accepted; anything else (a crash, a sanitizer report, another exception, the scanner and
// the reader disagreeing) is a finding.
#include <cstdint>
#include <cstdlib>
#include <sstream>
#include <string>

#include "core/csv/columns.h"
#include "core/csv/reader.h"
#include "core/errors.h"
#include "tests/core/csv/state_rows_outcomes.h"
#include "tests/fuzz/fuzz_input.h"

namespace {

void readAll(const pw::fuzz::Input &input) {
    pw::csv::ReaderOptions options;
    options.bufferBytes = 4096;  // the reader's minimum: long records make it grow
    constexpr char kSeparators[] = {'\0', ',', ';', '\t'};
    options.delimiter = kSeparators[input.option(0) % 4];
    options.decimalComma = (input.option(1) & 1) != 0;
    std::istringstream in{std::string(input.text)};
    pw::csv::Reader reader(in, "fuzz.csv", options);
    try {
        pw::csv::StateColumnOptions columns;
        columns.wantTime = (input.option(1) & 4) != 0;
        (void)pw::csv::resolveStateColumns(reader.header(), columns, "fuzz.csv");
    } catch (const pw::Error &) {
    }
    for (int rows = 0; rows < 100000; ++rows) {
        try {
            if (!reader.next()) break;
            for (std::size_t i = 0; i < reader.fieldCount(); ++i) {
                try {
                    (void)reader.number(i);
                } catch (const pw::InputError &) {
                }
                (void)pw::csv::parseIsoTime(reader.field(i));
            }
        } catch (const pw::InputError &) {
            // a short or long row: the reader has moved past it
        }
    }
}

// The scanner against the reader, on blocks of 1 to 64 bytes.
void compareScanner(const pw::fuzz::Input &input) {
    pw::csv::ReaderOptions options;
    constexpr char kSeparators[] = {'\0', ',', ';', '\t'};
    options.delimiter = kSeparators[input.option(0) % 4];
    options.decimalComma = (input.option(1) & 1) != 0;
    const std::string text(input.text);
    std::vector<std::string> expected;
    try {
        expected = pw::csv::testing::outcomesByReader(text, options);
    } catch (const pw::Error &) {
        return;  // the header is refused: there are no rows to compare
    }
    const std::size_t blockBytes = 1 + (input.option(0) >> 2) % 64;
    if (pw::csv::testing::outcomesByScanner(text, options, blockBytes) != expected) std::abort();
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    const pw::fuzz::Input input(data, size, 2);
    try {
        readAll(input);
    } catch (const pw::Error &) {
    }
    compareScanner(input);
    return 0;
}
