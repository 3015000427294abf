#pragma once
// What the state-row scanner and the record-by-record reader make of a file, one line per
// record: "ok <record> <T bits> <P bits>" or "bad <message>". Shared by
// tests/core/csv/state_rows_test.cpp and the csv fuzz target (tests/fuzz/csv_fuzz.cpp), which
// require the two to agree. Both throw pw::InputError when the header itself is refused.
#include <bit>
#include <cstdint>
#include <sstream>
#include <string>
#include <vector>

#include "core/csv/columns.h"
#include "core/csv/reader.h"
#include "core/csv/state_rows.h"
#include "core/errors.h"

namespace pw::csv::testing {

inline std::string goodRow(std::string_view record, double T, double P) {
    return "ok " + std::string(record) + " " + std::to_string(std::bit_cast<std::uint64_t>(T)) +
           " " + std::to_string(std::bit_cast<std::uint64_t>(P));
}

// The reference: Reader::next(), Reader::number() and checkedState().
inline std::vector<std::string> outcomesByReader(const std::string &text,
                                                 const ReaderOptions &options) {
    std::istringstream in(text);
    Reader r(in, "f.csv", options);
    const StateColumns c = resolveStateColumns(r.header(), {}, "f.csv");
    std::vector<std::string> out;
    for (;;) {
        try {
            if (!r.next()) break;
            const double t = r.number(c.t), p = r.number(c.p);
            const StateValues v = checkedState(t, p, c, r.header(), r.fileName(), r.row());
            out.push_back(goodRow(r.record(), v.T_K, v.P_Pa));
        } catch (const InputError &e) {
            out.push_back(std::string("bad ") + e.what());
        }
    }
    return out;
}

// Reader::nextBlock() in blocks of `blockBytes` and StateRowScanner.
inline std::vector<std::string> outcomesByScanner(const std::string &text,
                                                  const ReaderOptions &options,
                                                  std::size_t blockBytes) {
    std::istringstream in(text);
    Reader r(in, "f.csv", options);
    const StateColumns c = resolveStateColumns(r.header(), {}, "f.csv");
    const StateRowScanner scanner(r, c, options.decimalComma);
    std::vector<std::string> out;
    long line = r.nextLine();
    TextBlock block;
    while (r.nextBlock(block, blockBytes)) {
        line += scanner.scan(
            block,
            [&](std::string_view record, double T, double P) {
                out.push_back(goodRow(record, T, P));
            },
            [&](BadRow &&bad) {
                out.push_back(std::string("bad ") + bad.error("f.csv", line).what());
                return true;
            });
    }
    return out;
}

}  // namespace pw::csv::testing
