#pragma once
// Shared by the classify, boundary and path commands: the substance look-up, the tolerance
// options, and the reading of state files (T and P columns, optional time column).
#include <CLI/CLI.hpp>
#include <iosfwd>
#include <memory>
#include <optional>
#include <string>
#include <vector>

#include "core/classify.h"
#include "core/csv/columns.h"
#include "core/csv/reader.h"
#include "core/path.h"

namespace pw::cli {

// The --substance value resolved as every command does (app/cli/substance_arg.h).
std::shared_ptr<const PhaseDiagram> loadSubstance(const std::string &key, std::ostream &err);

// Options common to the commands that read state files.
struct StateFileOptions {
    std::string input;
    csv::StateColumnOptions columns;
    std::string separator;  // "," ";" "tab" or empty (detect)
    bool decimalComma = false;
    bool skipBad = false;
};
void addStateFileOptions(CLI::App *cmd, StateFileOptions &o, bool withTime);
// --T, --P, --t-unit, --p-unit of one state point; returns the --T and --P options.
struct StatePointOptions {
    CLI::Option *T, *P;
};
StatePointOptions addStatePointOptions(CLI::App *cmd, std::optional<double> &T,
                                       std::optional<double> &P, std::optional<std::string> &tUnit,
                                       std::optional<std::string> &pUnit);
void addToleranceOptions(CLI::App *cmd, ClassifyOptions &o);
csv::ReaderOptions readerOptions(const StateFileOptions &o);

// Opens `path` ("-" = `standardInput`); throws pw::Error naming the file when it cannot.
class InputFile {
public:
    InputFile(const std::string &path, std::istream &standardInput);
    std::istream &stream() { return *stream_; }

private:
    std::unique_ptr<std::istream> owned_;
    std::istream *stream_;
};

// Converts one row's T and P (kelvin, pascal); throws pw::InputError naming file, row and
// column for a missing, non-numeric or non-physical value.
struct RowState {
    double T_K, P_Pa;
};
RowState readState(const csv::Reader &reader, const csv::StateColumns &columns);
// The same for files read without --decimal-comma (decimalComma false): plain numbers take a
// shorter path (one std::from_chars); anything else goes through the checks above.
RowState readState(const csv::Reader &reader, const csv::StateColumns &columns, bool decimalComma);

// The time of one row in seconds (numeric column times its unit, or an ISO 8601 timestamp);
// NaN without a time column.
double readTime(const csv::Reader &reader, const csv::StateColumns &columns);

// "1 bad row" / "12 bad rows" summary line for --skip-bad.
std::string badRowSummary(long count, const std::string &file);

}  // namespace pw::cli
