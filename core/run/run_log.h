#pragma once
// Logged process runs: a delimited text file with a time column, a temperature column and a
// pressure column (docs/runs.md, "Run logs"), read with the streaming reader of core/csv into
// timed states in K and Pa. The full data is kept for the computation; use downsample.h for
// drawing.
//
// Header conventions: units in brackets after the name ("product_T [degC]",
// "chamber_P [mTorr]", "time [min]"; csv::splitHeader). Time is either a number with a time
// unit (s, min, h, d; seconds when none) counted from any origin, or an ISO 8601 timestamp
// ("2026-03-14T08:00:00Z", "2026-03-14 08:00:00.5", "...+01:00"; csv::parseIsoTime). States
// get time_s since the first row. Explicit units override the header's (noted in the layout). Gauge
// units ("barg", "psig", "kPag") are converted to absolute with the barometric pressure.
#include <atomic>
#include <functional>
#include <iosfwd>
#include <optional>
#include <span>
#include <string>
#include <vector>

#include "core/csv/reader.h"
#include "core/errors.h"
#include "core/path.h"
#include "core/units.h"

namespace pw::run {

enum class TimeFormat { Auto, Number, Iso8601 };

// What the caller (a dialog, CLI options) sets; everything left empty is guessed.
struct RunLogOptions {
    std::string timeColumn;  // header name (exact, or case-insensitive match); empty: guess
    std::string temperatureColumn;
    std::string pressureColumn;
    std::optional<TemperatureUnit> temperatureUnit;  // overrides the header's unit
    std::optional<PressureUnit> pressureUnit;
    std::optional<bool> gauge;  // pressure is gauge; default: from the unit ("barg")
    double barometric_Pa = kStandardAtmosphere_Pa;  // added to gauge readings
    TimeFormat timeFormat = TimeFormat::Auto;
    std::optional<double> timeUnit_s;  // seconds per time unit for numeric time
    csv::ReaderOptions csv;
};

// The columns and units that will be used, with the reasons: what a dialog shows and edits.
struct RunLogLayout {
    std::vector<std::string> header;
    std::size_t timeColumn = 0, temperatureColumn = 0, pressureColumn = 0;
    TimeFormat timeFormat = TimeFormat::Number;
    double timeUnit_s = 1.0;
    TemperatureUnit temperatureUnit = TemperatureUnit::Kelvin;
    PressureUnit pressureUnit = PressureUnit::Pa;
    bool gauge = false;
    double barometric_Pa = kStandardAtmosphere_Pa;
    std::vector<std::string>
        notes;  // e.g. "pressure column 'chamber_P [mTorr]' chosen over 'pirani_P [mTorr]'"
};

struct RunLog {
    std::string file;
    RunLogLayout layout;
    std::vector<State> states;   // time_s from the first row, T in K, P in Pa (absolute)
    std::string startTimestamp;  // ISO logs: the first row's timestamp text; else empty
};

// Called now and then with the fraction of the input read (0..1; -1 when the size is unknown).
using ProgressFn = std::function<void(double fraction)>;

// Thrown when the cancel flag was raised; no partial result is returned.
class Cancelled : public Error {
public:
    Cancelled() : Error("import cancelled") {}
};

// Guesses the layout from the header and the first data row (for the time format). Throws
// InputError naming the file and the column when a named column is absent or a needed
// column cannot be found.
RunLogLayout guessLayout(const std::vector<std::string> &header,
                         std::span<const std::string_view> firstRow, const RunLogOptions &options,
                         const std::string &file = {});

// Reads the whole log. Every bad cell throws InputError naming file, row and column; time
// must not go backwards; T must be above 0 K and P above 0 Pa after conversion.
// `totalBytes` (0: unknown) scales the progress; `cancel` is polled every few thousand rows.
RunLog readRunLog(std::istream &in, const std::string &file, const RunLogOptions &options = {},
                  const ProgressFn &progress = {}, const std::atomic<bool> *cancel = nullptr,
                  std::size_t totalBytes = 0);
RunLog readRunLogFile(const std::string &path, const RunLogOptions &options = {},
                      const ProgressFn &progress = {}, const std::atomic<bool> *cancel = nullptr);

// The first rows of a log with the guessed layout, for an import dialog: what the columns
// are, what was chosen and why, and a few raw rows to show. Throws like readRunLog for an
// unreadable header or a layout that cannot be guessed.
struct RunLogPreview {
    RunLogLayout layout;
    std::vector<std::vector<std::string>> rows;  // raw cells of the first data rows
};
RunLogPreview previewRunLog(std::istream &in, const std::string &file,
                            const RunLogOptions &options = {}, std::size_t maxRows = 20);
RunLogPreview previewRunLogFile(const std::string &path, const RunLogOptions &options = {},
                                std::size_t maxRows = 20);

}  // namespace pw::run
