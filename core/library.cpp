// The substance library: bundled files plus the user's folder, with duplicate-id refusal
// and forgiving look-up (docs/substance-format.md, "Library folders and duplicate ids").
#include "core/library.h"

#include <fmt/format.h>
#include <algorithm>
#include <cctype>
#include <cstdlib>
#include <filesystem>

#include "core/errors.h"
#include "core/io/read_diagram.h"
#include "resources/bundled.h"

namespace pw {
namespace {

std::string lower(std::string_view s) {
    std::string out(s);
    for (char &c : out) c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
    return out;
}

std::string trim(std::string_view s) {
    const auto b = s.find_first_not_of(" \t\r\n");
    if (b == std::string_view::npos) return {};
    const auto e = s.find_last_not_of(" \t\r\n");
    return std::string(s.substr(b, e - b + 1));
}

// Edit distance (Levenshtein), for close-match suggestions.
std::size_t distance(const std::string &a, const std::string &b) {
    std::vector<std::size_t> row(b.size() + 1);
    for (std::size_t j = 0; j <= b.size(); ++j) row[j] = j;
    for (std::size_t i = 1; i <= a.size(); ++i) {
        std::size_t diagonal = row[0];
        row[0] = i;
        for (std::size_t j = 1; j <= b.size(); ++j) {
            const std::size_t above = row[j];
            row[j] =
                std::min({row[j] + 1, row[j - 1] + 1, diagonal + (a[i - 1] == b[j - 1] ? 0u : 1u)});
            diagonal = above;
        }
    }
    return row[b.size()];
}

bool looksLikePath(const std::string &key) {
    if (key.find('/') != std::string::npos) return true;
    const std::string l = lower(key);
    if (l.size() > 5 && l.ends_with(".json")) return true;
    std::error_code ec;
    return std::filesystem::is_regular_file(key, ec);
}

std::string joinIssues(const std::vector<ValidationIssue> &issues) {
    std::string s;
    for (const auto &i : issues)
        if (i.severity == Severity::Error) s += "\n  " + i.text();
    return s;
}

std::string suggestions(const std::vector<std::shared_ptr<const PhaseDiagram>> &diagrams,
                        std::string_view key) {
    const std::string k = lower(key);
    std::vector<std::pair<std::size_t, std::string>> ranked;
    for (const auto &d : diagrams) {
        const Substance &s = d->substance();
        std::vector<std::string> names{s.id, s.name, s.formula};
        names.insert(names.end(), s.aliases.begin(), s.aliases.end());
        std::size_t best = std::string::npos;
        for (const auto &n : names) {
            if (n.empty()) continue;
            const std::string l = lower(n);
            const bool contains = k.size() >= 3 && l.find(k) != std::string::npos;
            const std::size_t dist = contains ? 0 : distance(k, l);
            best = std::min(best, dist);
        }
        if (best <= std::max<std::size_t>(1, k.size() / 3)) ranked.emplace_back(best, s.id);
    }
    std::sort(ranked.begin(), ranked.end());
    if (ranked.empty()) {
        std::string all;
        for (const auto &d : diagrams) all += (all.empty() ? "" : ", ") + d->substance().id;
        return all.empty() ? "; the library is empty" : "; known ids: " + all;
    }
    std::string s = "; did you mean: ";
    for (std::size_t i = 0; i < ranked.size() && i < 3; ++i)
        s += (i ? ", " : "") + ranked[i].second;
    return s + "?";
}

}  // namespace

SubstanceLibrary SubstanceLibrary::bundled() {
    SubstanceLibrary lib;
    for (const auto &file : pw::bundled::files()) {
        if (!file.path.starts_with("substances/") || !file.path.ends_with(".json")) continue;
        const std::string name = "bundled:" + std::string(file.path.substr(11));
        io::DiagramReadResult r = io::readSubstanceDiagram(file.content, name);
        lib.issues_.insert(lib.issues_.end(), r.issues.begin(), r.issues.end());
        if (r.diagram) lib.addDiagram(std::move(r.diagram));
    }
    return lib;
}

SubstanceLibrary SubstanceLibrary::withUserFolder(const std::string &folder) {
    SubstanceLibrary lib = bundled();
    std::error_code ec;
    if (folder.empty() || !std::filesystem::is_directory(folder, ec)) return lib;
    std::vector<std::filesystem::path> files;
    for (const auto &entry : std::filesystem::directory_iterator(folder, ec)) {
        if (entry.path().extension() == ".json" && entry.is_regular_file(ec))
            files.push_back(entry.path());
    }
    std::sort(files.begin(), files.end());
    for (const auto &path : files) {
        io::DiagramReadResult r = io::readSubstanceDiagramFile(path.string());
        lib.issues_.insert(lib.issues_.end(), r.issues.begin(), r.issues.end());
        if (r.diagram) lib.addDiagram(std::move(r.diagram));
    }
    return lib;
}

std::string SubstanceLibrary::defaultUserFolder() {
    const char *xdg = std::getenv("XDG_DATA_HOME");
    std::filesystem::path base;
    if (xdg != nullptr && xdg[0] == '/') {
        base = xdg;
    } else {
        const char *home = std::getenv("HOME");
        if (home == nullptr || home[0] == '\0') return {};
        base = std::filesystem::path(home) / ".local" / "share";
    }
    return (base / "phasewright" / "substances").string();
}

bool SubstanceLibrary::isDuplicate(const Substance &substance) {
    for (const auto &d : diagrams_) {
        if (d->substance().id != substance.id) continue;
        issues_.push_back(ValidationIssue{
            Severity::Error, substance.origin, "/id",
            fmt::format("duplicate id '{}': already loaded from {}; this file is ignored (give "
                        "it an id of its own to keep both)",
                        substance.id, d->substance().origin)});
        return true;
    }
    return false;
}

bool SubstanceLibrary::addDiagram(std::shared_ptr<const PhaseDiagram> diagram) {
    if (isDuplicate(diagram->substance())) return false;
    diagrams_.push_back(std::move(diagram));
    return true;
}

bool SubstanceLibrary::add(Substance substance) {
    if (isDuplicate(substance)) return false;
    try {
        diagrams_.push_back(std::make_shared<const PhaseDiagram>(std::move(substance)));
    } catch (const std::exception &e) {
        issues_.push_back(
            ValidationIssue{Severity::Error, substance.origin, "",
                            fmt::format("cannot form a phase diagram: {}", e.what())});
        return false;
    }
    return true;
}

std::shared_ptr<const PhaseDiagram> SubstanceLibrary::find(std::string_view rawKey) const {
    const std::string key = trim(rawKey);
    if (key.empty()) throw Error("no substance given; expected an id, alias, formula or file");
    if (looksLikePath(key)) {
        io::DiagramReadResult r = io::readSubstanceDiagramFile(key);
        if (!r.diagram) throw Error(fmt::format("substance file refused:{}", joinIssues(r.issues)));
        return std::move(r.diagram);
    }
    const std::string k = lower(key);
    for (const auto &d : diagrams_)
        if (d->substance().id == k) return d;
    std::vector<std::shared_ptr<const PhaseDiagram>> found;
    for (const auto &d : diagrams_)
        if (d->substance().matches(key)) found.push_back(d);
    if (found.size() == 1) return found.front();
    if (found.size() > 1) {
        std::string ids;
        for (const auto &d : found) ids += (ids.empty() ? "" : ", ") + d->substance().id;
        throw Error(fmt::format("'{}' matches several substances ({}); give the id", key, ids));
    }
    throw Error(fmt::format("no substance matches '{}' (by id, alias, formula or name){}", key,
                            suggestions(diagrams_, key)));
}

}  // namespace pw
