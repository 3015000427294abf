// Fuzz target: the run-log reader (core/run/run_log.h): readRunLog and previewRunLog with
// options chosen by the first bytes (time format, gauge, separator, decimal comma). Every
// pw::Error is an accepted answer; a log that is read must hold only finite, physical states
// with time never going backwards (the reader's documented promise).
#include <cmath>
#include <cstdint>
#include <cstdlib>
#include <sstream>
#include <string>

#include "core/errors.h"
#include "core/run/run_log.h"
#include "tests/fuzz/fuzz_input.h"

namespace {

pw::run::RunLogOptions optionsFrom(const pw::fuzz::Input &input) {
    pw::run::RunLogOptions o;
    constexpr pw::run::TimeFormat kFormats[] = {
        pw::run::TimeFormat::Auto, pw::run::TimeFormat::Number, pw::run::TimeFormat::Iso8601};
    o.timeFormat = kFormats[input.option(0) % 3];
    if ((input.option(0) & 8) != 0) o.gauge = (input.option(0) & 16) != 0;
    constexpr char kSeparators[] = {'\0', ',', ';', '\t'};
    o.csv.delimiter = kSeparators[input.option(1) % 4];
    o.csv.decimalComma = (input.option(1) & 4) != 0;
    o.csv.bufferBytes = 4096;  // the reader's minimum (1 MB by default): fast runs, growth tested
    if ((input.option(1) & 16) != 0) o.timeUnit_s = 60.0;
    return o;
}

void check(const pw::run::RunLog &log) {
    double last = -INFINITY;
    for (const auto &s : log.states) {
        if (!(std::isfinite(s.T_K) && s.T_K > 0.0 && std::isfinite(s.P_Pa) && s.P_Pa > 0.0))
            std::abort();
        if (!std::isfinite(s.time_s) || s.time_s < last) std::abort();
        last = s.time_s;
    }
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    const pw::fuzz::Input input(data, size, 2);
    const pw::run::RunLogOptions options = optionsFrom(input);
    try {
        std::istringstream in{std::string(input.text)};
        (void)pw::run::previewRunLog(in, "fuzz.csv", options, 5);
    } catch (const pw::Error &) {
    }
    try {
        std::istringstream in{std::string(input.text)};
        check(pw::run::readRunLog(in, "fuzz.csv", options, {}, nullptr, input.text.size()));
    } catch (const pw::Error &) {
    }
    return 0;
}
