#pragma once
// The temperature and pressure of every record of a state file, a block at a time
// (csv::Reader::nextBlock), for classifying tables of millions of rows on several threads.
//
// A block without quotes whose records hold plain decimals (csv::parseDecimalAt) in the
// T and P columns takes a fast path: no field list, each number read where it stands, its
// end checked against the separator. Every other record goes the full way (split, the checks
// of csv::parseNumber, the field count), so values, accepted forms and messages are exactly
// those of csv::Reader with checkedState(): a bad record becomes a BadRow naming its line,
// column and reason.
#include <cmath>
#include <cstddef>
#include <cstring>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "core/csv/columns.h"
#include "core/csv/number_text.h"
#include "core/csv/reader.h"
#include "core/errors.h"
#include "core/units.h"

namespace pw::csv {

struct StateValues {
    double T_K, P_Pa;
};

// A row's T and P cell values in kelvin and pascal, checked: throws pw::InputError naming the
// file, row and column for a value out of range after conversion or not physical (T <= 0 K,
// p <= 0 Pa).
StateValues checkedState(double t, double p, const StateColumns &columns,
                         const std::vector<std::string> &header, const std::string &fileName,
                         long row);

// A record that could not be read: `line` counts from the block's first line (0), so the
// caller, who knows where the block starts, can name the file's row.
struct BadRow {
    long line = 0;
    std::string column;  // header text of the column; empty for the record as a whole
    std::string message;
    InputError error(const std::string &fileName, long firstLine) const {
        return InputError(fileName, firstLine + line, column, message);
    }
};

class StateRowScanner {
public:
    // For the records after `reader`'s header (its separator and header; `reader` outlives
    // the scanner).
    StateRowScanner(const Reader &reader, const StateColumns &columns, bool decimalComma);

    // Calls row(record, T_K, P_Pa) for each good record of the block in order (the record
    // without its line end), bad(BadRow) for each bad one; returns the number of line ends in
    // the block. Stops early when bad() returns false.
    template <class Row, class Bad>
    long scan(const TextBlock &block, Row &&row, Bad &&bad) const;

private:
    // The record at p when it is simple (see above): its end (its '\n', the '\r' of its
    // "\r\n", or the block's end) with the two values; nullptr otherwise.
    const char *fastRecord(const char *p, const char *end, double &t, double &pr) const;
    // The values of a record the full way; false with `why` filled for a bad one.
    bool fullRecord(std::string_view record, StateValues &values, BadRow &why) const;
    // Converts and checks the cell values, as checkedState() but without throwing.
    bool convert(double t, double p, StateValues &values) const {
        values.T_K = columns_.tUnit == TemperatureUnit::Kelvin ? t : toKelvin(t, columns_.tUnit);
        values.P_Pa = columns_.pUnit == PressureUnit::Pa ? p : toPascal(p, columns_.pUnit);
        return values.T_K > 0.0 && values.P_Pa > 0.0 && std::isfinite(values.T_K) &&
               std::isfinite(values.P_Pa);
    }

    StateColumns columns_;
    const std::vector<std::string> *header_;
    char delimiter_;
    bool decimalComma_;
    std::size_t fieldCount_;
};

inline const char *StateRowScanner::fastRecord(const char *p, const char *end, double &t,
                                               double &pr) const {
    for (std::size_t field = 0;; ++field) {
        const char *q = p;
        if (field == columns_.t || field == columns_.p) {
            double v = 0.0;
            q = parseDecimalAt(p, v);
            if (q == nullptr) return nullptr;
            (field == columns_.t ? t : pr) = v;
        } else {
            while (q < end && *q != delimiter_ && *q != '\n' && *q != '\r') ++q;
        }
        if (q < end && *q == delimiter_) {
            p = q + 1;
            continue;
        }
        if (field + 1 != fieldCount_) return nullptr;
        if (q == end || *q == '\n') return q;
        if (*q == '\r' && q + 1 < end && q[1] == '\n') return q;
        return nullptr;
    }
}

template <class Row, class Bad>
long StateRowScanner::scan(const TextBlock &block, Row &&row, Bad &&bad) const {
    const std::string_view text = block.text();
    const char *p = text.data();
    const char *const end = p + text.size();
    const bool quotes = std::memchr(p, '"', text.size()) != nullptr;
    const bool fast = !quotes && !decimalComma_;
    long line = 0;
    while (p < end) {
        if (fast) {
            double t = 0.0, pr = 0.0;
            StateValues v{};
            if (const char *q = fastRecord(p, end, t, pr); q != nullptr && convert(t, pr, v)) {
                row(std::string_view(p, static_cast<std::size_t>(q - p)), v.T_K, v.P_Pa);
                if (q < end && *q == '\r') ++q;
                if (q < end) ++line;
                p = q < end ? q + 1 : end;
                continue;
            }
        }
        // The full way. The record runs to its line end outside quotes.
        const char *stop = p;
        long breaks = 0;
        if (!quotes) {
            stop =
                static_cast<const char *>(std::memchr(p, '\n', static_cast<std::size_t>(end - p)));
            if (stop == nullptr) stop = end;
        } else {
            for (bool inside = false; stop < end; ++stop) {
                if (*stop == '"') inside = !inside;
                if (*stop != '\n') continue;
                if (!inside) break;
                ++breaks;
            }
        }
        const char *recordEnd = stop > p && stop[-1] == '\r' ? stop - 1 : stop;
        const std::string_view record(p, static_cast<std::size_t>(recordEnd - p));
        const long recordLine = line;
        line += breaks + (stop < end ? 1 : 0);
        p = stop < end ? stop + 1 : end;
        if (record.empty()) continue;  // empty lines are skipped
        StateValues v{};
        BadRow why;
        if (fullRecord(record, v, why)) {
            row(record, v.T_K, v.P_Pa);
        } else {
            why.line = recordLine;
            if (!bad(std::move(why))) return line;
        }
    }
    return line;
}

}  // namespace pw::csv
