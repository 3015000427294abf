#include "core/run/run_log.h"

#include <fmt/format.h>
#include <cmath>
#include <fstream>

#include "core/csv/columns.h"
#include "core/errors.h"

namespace pw::run {
namespace {

void checkNotCancelled(const std::atomic<bool> *cancel) {
    if (cancel && cancel->load(std::memory_order_relaxed)) throw Cancelled();
}

}  // namespace

RunLog readRunLog(std::istream &in, const std::string &file, const RunLogOptions &opt,
                  const ProgressFn &progress, const std::atomic<bool> *cancel,
                  std::size_t totalBytes) {
    csv::Reader reader(in, file, opt.csv);
    RunLog log;
    log.file = file;
    if (!reader.next()) throw InputError(file, 2, "", "the log has a header but no data rows");
    const auto &header = reader.header();
    std::vector<std::string_view> firstRow;
    for (std::size_t i = 0; i < reader.fieldCount(); ++i) firstRow.push_back(reader.field(i));
    log.layout = guessLayout(header, firstRow, opt, file);
    const RunLogLayout &L = log.layout;
    const bool iso = L.timeFormat == TimeFormat::Iso8601;
    const std::string &timeName = header[L.timeColumn];
    const double offset_Pa = L.gauge ? L.barometric_Pa : 0.0;
    if (iso) log.startTimestamp = std::string(firstRow[L.timeColumn]);
    if (totalBytes > 0) log.states.reserve(totalBytes / (reader.record().size() + 1) + 16);
    double t0 = kNaN, prev = -INFINITY;
    for (std::size_t n = 0;; ++n) {
        if ((n & 0x3fff) == 0x3fff) {
            checkNotCancelled(cancel);
            if (progress)
                progress(totalBytes > 0 ? std::min(1.0, static_cast<double>(in.tellg()) /
                                                            static_cast<double>(totalBytes))
                                        : -1.0);
        }
        double t = 0.0;
        if (iso) {
            const auto v = csv::parseIsoTime(reader.field(L.timeColumn));
            if (!v)
                throw InputError(file, reader.row(), timeName,
                                 "'" + csv::shownCell(reader.field(L.timeColumn)) +
                                     "' is not an ISO 8601 time (e.g. 2026-03-14T08:00:00Z)");
            t = *v;
        } else {
            t = reader.number(L.timeColumn) * L.timeUnit_s;
        }
        if (std::isnan(t0)) t0 = t;
        if (t < prev)
            throw InputError(
                file, reader.row(), timeName,
                fmt::format("time goes backwards ({:g} s after {:g} s)", t - t0, prev - t0));
        prev = t;
        State st{t - t0, toKelvin(reader.number(L.temperatureColumn), L.temperatureUnit),
                 toPascal(reader.number(L.pressureColumn), L.pressureUnit) + offset_Pa};
        if (!(st.T_K > 0.0))
            throw InputError(file, reader.row(), header[L.temperatureColumn],
                             "temperature at or below absolute zero");
        if (!(st.P_Pa > 0.0))
            throw InputError(file, reader.row(), header[L.pressureColumn],
                             "absolute pressure at or below 0 Pa");
        log.states.push_back(st);
        if (!reader.next()) break;
    }
    checkNotCancelled(cancel);
    if (progress) progress(1.0);
    return log;
}

RunLog readRunLogFile(const std::string &path, const RunLogOptions &options,
                      const ProgressFn &progress, const std::atomic<bool> *cancel) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw InputError(path, 0, "", "cannot open the file");
    in.seekg(0, std::ios::end);
    const auto size = in.tellg();
    in.seekg(0, std::ios::beg);
    return readRunLog(in, path, options, progress, cancel,
                      size > 0 ? static_cast<std::size_t>(size) : 0);
}

RunLogPreview previewRunLog(std::istream &in, const std::string &file, const RunLogOptions &opt,
                            std::size_t maxRows) {
    csv::Reader reader(in, file, opt.csv);
    if (!reader.next()) throw InputError(file, 2, "", "the log has a header but no data rows");
    RunLogPreview out;
    do {
        std::vector<std::string> row;
        for (std::size_t i = 0; i < reader.fieldCount(); ++i) row.emplace_back(reader.field(i));
        out.rows.push_back(std::move(row));
    } while (out.rows.size() < maxRows && reader.next());
    const std::vector<std::string_view> first(out.rows.front().begin(), out.rows.front().end());
    out.layout = guessLayout(reader.header(), first, opt, file);
    return out;
}

RunLogPreview previewRunLogFile(const std::string &path, const RunLogOptions &options,
                                std::size_t maxRows) {
    std::ifstream in(path, std::ios::binary);
    if (!in) throw InputError(path, 0, "", "cannot open the file");
    return previewRunLog(in, path, options, maxRows);
}

}  // namespace pw::run
