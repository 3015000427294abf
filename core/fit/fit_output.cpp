#include "core/fit/fit_output.h"

#include <fcntl.h>
#include <sys/stat.h>
#include <unistd.h>

#include <fmt/format.h>
#include <cctype>
#include <cerrno>
#include <chrono>
#include <cstring>
#include <filesystem>

#include "core/errors.h"
#include "core/substance_io.h"

namespace pw::fit {
namespace {

std::string fileName(const std::string &path) {
    const auto name = std::filesystem::path(path).filename().string();
    return name.empty() ? path : name;
}

int yearOf(const std::string &date) {
    return date.size() >= 4 ? std::atoi(date.substr(0, 4).c_str()) : 0;
}

std::string freshKey(const Substance &s, const std::string &base) {
    std::string key = base;
    for (int i = 2; s.sources.count(key) != 0; ++i) key = base + "-" + std::to_string(i);
    return key;
}

std::string sourceKeyFor(const FitProvenance &pv) {
    std::string stem = std::filesystem::path(pv.dataFile).stem().string();
    std::string key = "fit-";
    for (const char c : stem) {
        const auto u = static_cast<unsigned char>(c);
        key += std::isalnum(u) ? static_cast<char>(std::tolower(u)) : '-';
    }
    return key + "-" + pv.date;
}

Citation userValuesCitation(const FitProvenance &pv) {
    Citation c;
    c.authors = "values given to phasewright-cli fit";
    c.year = yearOf(pv.date);
    c.title = "reference point given on the command line, " + pv.date;
    c.note = "not checked against a published source";
    return c;
}

}  // namespace

std::string today() {
    const auto days = std::chrono::floor<std::chrono::days>(std::chrono::system_clock::now());
    const std::chrono::year_month_day ymd{days};
    return fmt::format("{:04d}-{:02d}-{:02d}", static_cast<int>(ymd.year()),
                       static_cast<unsigned>(ymd.month()), static_cast<unsigned>(ymd.day()));
}

std::string substanceId(const std::string &name) {
    std::string id;
    for (const char c : name) {
        const auto u = static_cast<unsigned char>(c);
        if (std::isalnum(u) && u < 0x80) {
            id += static_cast<char>(std::tolower(u));
        } else if (!id.empty() && id.back() != '-') {
            id += '-';
        }
    }
    while (!id.empty() && id.back() == '-') id.pop_back();
    if (id.size() > 64) id.resize(64);
    while (!id.empty() && id.back() == '-') id.pop_back();
    if (id.empty()) {
        throw Error("cannot make a substance id from the name '" + name +
                    "': use letters or digits (--name)");
    }
    return id;
}

Boundary fittedBoundary(const FitResult &result, const std::string &sourceKey) {
    Boundary b;
    b.kind = result.kind;
    b.spec = result.spec;
    b.model = makeModel(result.spec);
    b.validity = result.validity;
    b.sourceKey = sourceKey;
    b.note = fmt::format(
        "fitted to {} points, RMS deviation {:.3g} %, max {:.3g} %; valid over the data span",
        result.points, result.rms_pct, result.maxAbs_pct);
    return b;
}

Citation fitCitation(const FitResult &result, const FitProvenance &pv) {
    Citation c;
    c.authors = "measurements in " + fileName(pv.dataFile);
    c.year = yearOf(pv.date);
    c.title = fmt::format("{} ({} points, {:.6g}-{:.6g} K), fitted {}", fileName(pv.dataFile),
                          result.points, result.validity.min_K, result.validity.max_K, pv.date);
    c.note = fmt::format("fitted by phasewright-cli fit: {} form, RMS deviation {:.3g} %",
                         result.spec.form, result.rms_pct);
    return c;
}

Substance substanceFromFit(const FitResult &result, const FitRequest &request,
                           const std::string &name, const FitProvenance &provenance) {
    Substance s;
    s.id = substanceId(name);
    s.name = name;
    mergeFit(s, result, provenance);
    const bool hasTc = std::isfinite(request.Tc_K) && std::isfinite(request.Pc_Pa);
    const bool hasTt = std::isfinite(request.Tt_K) && std::isfinite(request.Pt_Pa);
    if (hasTc || hasTt) s.sources["command-line"] = userValuesCitation(provenance);
    if (hasTc) {
        s.critical = FixedPoint{request.Tc_K,
                                request.Pc_Pa,
                                {"liquid", "vapor"},
                                "command-line",
                                s.sources["command-line"]};
    }
    if (hasTt) {
        s.triplePoints.push_back(FixedPoint{request.Tt_K,
                                            request.Pt_Pa,
                                            {"solid", "liquid", "vapor"},
                                            "command-line",
                                            s.sources["command-line"]});
    }
    return s;
}

std::string mergeFit(Substance &substance, const FitResult &result,
                     const FitProvenance &provenance) {
    const auto key = freshKey(substance, sourceKeyFor(provenance));
    substance.sources[key] = fitCitation(result, provenance);
    Boundary b = fittedBoundary(result, key);
    b.source = substance.sources[key];
    for (auto &old : substance.boundaries) {
        if (old.kind == b.kind && old.solidForm.empty()) {
            const auto what = fmt::format("replaced the {} boundary ({}, source '{}')",
                                          toString(b.kind), old.spec.form, old.sourceKey);
            old = b;
            return what;
        }
    }
    substance.boundaries.push_back(b);
    return fmt::format("added a {} boundary ({})", toString(b.kind), b.spec.form);
}

std::vector<std::string> writeSubstanceChecked(const Substance &substance,
                                               const std::string &path) {
    const std::string text = writeSubstance(substance);
    const auto back = readSubstance(text, path);
    std::vector<std::string> warnings;
    std::string errors;
    for (const auto &issue : back.issues) {
        if (issue.severity == Severity::Error) {
            errors += "\n  " + issue.text();
        } else {
            warnings.push_back(issue.text());
        }
    }
    if (!errors.empty() || !back.substance) {
        throw Error("the fitted substance would not be a valid file; nothing was written:" +
                    errors);
    }
    writeFileAtomically(path, text);
    return warnings;
}

void writeFileAtomically(const std::string &path, const std::string &text) {
    std::string tmp = path + ".tmp-XXXXXX";
    const int fd = ::mkstemp(tmp.data());
    if (fd < 0) {
        throw Error(fmt::format("{}: cannot create a temporary file beside it: {}", path,
                                std::strerror(errno)));
    }
    struct stat st {};
    const mode_t mode = ::stat(path.c_str(), &st) == 0 ? (st.st_mode & 07777) : 0644;
    bool ok = ::fchmod(fd, mode) == 0;
    std::size_t done = 0;
    while (ok && done < text.size()) {
        const auto n = ::write(fd, text.data() + done, text.size() - done);
        if (n < 0 && errno == EINTR) continue;
        ok = n > 0;
        if (ok) done += static_cast<std::size_t>(n);
    }
    ok = ok && ::fsync(fd) == 0;
    const int savedErrno = errno;
    ok = ::close(fd) == 0 && ok;
    if (!ok || ::rename(tmp.c_str(), path.c_str()) != 0) {
        const int err = ok ? errno : savedErrno;
        ::unlink(tmp.c_str());
        throw Error(fmt::format("{}: cannot write the file: {}", path, std::strerror(err)));
    }
}

}  // namespace pw::fit
