#include "app/cli/state_input.h"

#include <fmt/format.h>

#include <charconv>
#include <cmath>
#include <fstream>
#include <iostream>

#include "app/cli/substance_arg.h"
#include "core/csv/number_text.h"
#include "core/csv/state_rows.h"
#include "core/errors.h"
#include "core/units.h"

namespace pw::cli {

std::shared_ptr<const PhaseDiagram> loadSubstance(const std::string &key, std::ostream &err) {
    return resolveSubstance(key, err);
}

void addStateFileOptions(CLI::App *cmd, StateFileOptions &o, bool withTime) {
    cmd->add_option("--t-col", o.columns.tColumn,
                    "temperature column (header text or its name before [unit]); default: "
                    "the column named T, temperature or temp");
    cmd->add_option("--p-col", o.columns.pColumn,
                    "pressure column; default: the column named P or pressure");
    if (withTime)
        cmd->add_option("--time-col", o.columns.timeColumn,
                        "time column (seconds, or [min]/[h]/[d], or ISO 8601 timestamps); "
                        "default: a column named time or timestamp, if any");
    cmd->add_option("--separator", o.separator,
                    "column separator: ',', ';' or 'tab' (default: detected from the header)");
    cmd->add_flag("--decimal-comma", o.decimalComma,
                  "numbers use a decimal comma (12,5); needs ';' or tab separators");
    cmd->add_flag("--skip-bad", o.skipBad,
                  "skip bad rows (each reported on stderr, with a count) instead of failing");
    o.columns.wantTime = withTime;
}

StatePointOptions addStatePointOptions(CLI::App *cmd, std::optional<double> &T,
                                       std::optional<double> &P, std::optional<std::string> &tUnit,
                                       std::optional<std::string> &pUnit) {
    auto *t = cmd->add_option("--T", T, "temperature (unit: --t-unit, default K)");
    auto *p = cmd->add_option("--P", P, "absolute pressure (unit: --p-unit, default Pa)");
    cmd->add_option("--t-unit", tUnit, "temperature unit: K, degC, degF, degR");
    cmd->add_option("--p-unit", pUnit, "pressure unit: Pa, kPa, MPa, bar, mbar, Torr, mTorr...");
    return {t, p};
}

namespace {

// CLI11's NonNegativeNumber prints the largest double in its message; this one is readable.
CLI::Validator notNegative() {
    return CLI::Validator(
        [](std::string &text) {
            double v = 0.0;
            const auto [end, ec] = std::from_chars(text.data(), text.data() + text.size(), v);
            if (ec == std::errc() && end == text.data() + text.size() && std::isfinite(v) &&
                v >= 0.0)
                return std::string();
            return "expected a number of 0 or more, got '" + text + "'";
        },
        "NUMBER >= 0");
}

}  // namespace

void addToleranceOptions(CLI::App *cmd, ClassifyOptions &o) {
    cmd->add_option("--on-boundary-K", o.onBoundary_K, "on_boundary when |dT| is at most this (K)")
        ->capture_default_str()
        ->check(notNegative());
    cmd->add_option("--on-boundary-rel", o.onBoundaryRel,
                    "on_boundary when |dP| is at most this fraction of the boundary pressure")
        ->capture_default_str()
        ->check(notNegative());
}

csv::ReaderOptions readerOptions(const StateFileOptions &o) {
    csv::ReaderOptions r;
    r.decimalComma = o.decimalComma;
    if (o.separator.empty()) return r;
    if (o.separator == "," || o.separator == "comma") {
        r.delimiter = ',';
    } else if (o.separator == ";" || o.separator == "semicolon") {
        r.delimiter = ';';
    } else if (o.separator == "tab" || o.separator == "\\t" || o.separator == "\t") {
        r.delimiter = '\t';
    } else {
        throw CLI::ValidationError("--separator",
                                   "expected ',', ';' or 'tab', got '" + o.separator + "'");
    }
    return r;
}

InputFile::InputFile(const std::string &path, std::istream &standardInput)
    : stream_(&standardInput) {
    if (path == "-") return;
    auto file = std::make_unique<std::ifstream>(path, std::ios::binary);
    if (!*file) throw Error(fmt::format("{}: cannot open the file for reading", path));
    owned_ = std::move(file);
    stream_ = owned_.get();
}

namespace {

// A plain decimal cell (no blanks, '+' sign or decimal comma; core/csv/number_text.h) is the
// number Reader::number would give; any other cell goes through Reader::number, which names
// file, row and column when it is not a number.
double cellNumber(const csv::Reader &reader, std::size_t column, bool decimalComma) {
    if (!decimalComma) {
        const std::string_view cell = reader.field(column);
        double v = 0.0;
        if (csv::parseSimpleDecimal(cell.data(), cell.data() + cell.size(), v)) return v;
    }
    return reader.number(column);
}

}  // namespace

RowState readState(const csv::Reader &reader, const csv::StateColumns &columns) {
    return readState(reader, columns, true);  // the decimal mark is not known here: full checks
}

RowState readState(const csv::Reader &reader, const csv::StateColumns &columns, bool decimalComma) {
    const double t = cellNumber(reader, columns.t, decimalComma);
    const double p = cellNumber(reader, columns.p, decimalComma);
    const csv::StateValues v =
        csv::checkedState(t, p, columns, reader.header(), reader.fileName(), reader.row());
    return {v.T_K, v.P_Pa};
}

double readTime(const csv::Reader &reader, const csv::StateColumns &columns) {
    if (columns.time == csv::kNoColumn) return kNaN;
    const std::string_view cell = reader.field(columns.time);
    if (auto iso = csv::parseIsoTime(cell)) return *iso;
    return reader.number(columns.time) * columns.secondsPerTimeUnit;
}

std::string badRowSummary(long count, const std::string &file) {
    return fmt::format("{}: {} bad row{} skipped", file.empty() ? "<input>" : file, count,
                       count == 1 ? "" : "s");
}

}  // namespace pw::cli
