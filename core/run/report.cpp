#include "core/run/report.h"

#include <fmt/format.h>
#include <cmath>
#include <filesystem>
#include <fstream>
#include <random>

#include "core/errors.h"

namespace pw::run {
namespace {

std::string number(double v) { return std::isnan(v) ? std::string() : fmt::format("{:.10g}", v); }

// RFC 4180 quoting when needed.
std::string csvField(std::string_view s) {
    if (s.find_first_of(",\"\r\n") == std::string_view::npos) return std::string(s);
    std::string out = "\"";
    for (const char c : s) {
        if (c == '"') out += '"';
        out += c;
    }
    return out + "\"";
}

}  // namespace

std::string eventsAndVerdictsCsv(const PathResult &analysis,
                                 const std::vector<RuleVerdict> &verdicts) {
    std::string out = "record,id,result,time_s,index,T_K,P_Pa,from,to,detail\n";
    for (const PathEvent &e : analysis.events)
        out += fmt::format("event,{},,{},{},{},{},{},{},{}\n", toString(e.transition),
                           number(e.time_s), e.index, number(e.T_K), number(e.P_Pa),
                           toString(e.from), toString(e.to), csvField(e.detail));
    for (const RuleVerdict &v : verdicts) {
        const bool failed = v.verdict == Verdict::Fail;
        out += fmt::format("rule,{},{},{},{},{},{},,,{}\n", csvField(v.ruleId), toString(v.verdict),
                           failed ? number(v.firstViolation_s) : "",
                           failed ? std::to_string(v.index) : "", failed ? number(v.T_K) : "",
                           failed ? number(v.P_Pa) : "", csvField(v.detail));
    }
    return out;
}

void writeFileAtomically(const std::string &path, std::string_view content) {
    namespace fs = std::filesystem;
    const fs::path target(path);
    std::random_device rd;
    const fs::path tmp =
        target.parent_path() / fmt::format(".{}.tmp-{:08x}", target.filename().string(), rd());
    {
        std::ofstream out(tmp, std::ios::binary | std::ios::trunc);
        if (!out) throw Error("cannot write '" + path + "': cannot create a temporary file");
        out.write(content.data(), static_cast<std::streamsize>(content.size()));
        out.flush();
        if (!out) {
            out.close();
            std::error_code ec;
            fs::remove(tmp, ec);
            throw Error("cannot write '" + path + "': write failed (disk full?)");
        }
    }
    std::error_code ec;
    fs::rename(tmp, target, ec);
    if (ec) {
        std::error_code ignored;
        fs::remove(tmp, ignored);
        throw Error("cannot write '" + path + "': " + ec.message());
    }
}

void writeEventsAndVerdictsCsv(const std::string &path, const PathResult &analysis,
                               const std::vector<RuleVerdict> &verdicts) {
    writeFileAtomically(path, eventsAndVerdictsCsv(analysis, verdicts));
}

}  // namespace pw::run
