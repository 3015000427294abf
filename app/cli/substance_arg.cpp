#include "app/cli/substance_arg.h"

#include <fmt/format.h>
#include <algorithm>
#include <cctype>
#include <filesystem>
#include <ostream>

#include "core/errors.h"

namespace pw::cli {

CLI::Option *addSubstanceOption(CLI::App *cmd, std::string &key) {
    return cmd->add_option("-s,--substance", key, kSubstanceHelp)->required();
}

SubstanceLibrary loadLibrary(std::ostream &err) {
    const std::string folder = SubstanceLibrary::defaultUserFolder();
    SubstanceLibrary lib = SubstanceLibrary::withUserFolder(folder);
    for (const auto &issue : lib.issues()) {
        // Bundled warnings are known to the developers (tests); a refused bundled file and
        // anything about the user's own files are shown.
        const bool bundled = issue.file.rfind("bundled:", 0) == 0;
        if (issue.severity == Severity::Info || (bundled && issue.severity != Severity::Error))
            continue;
        err << "phasewright-cli: note: " << issue.text() << '\n';
    }
    return lib;
}

bool isSubstancePath(const std::string &key) {
    if (key.find('/') != std::string::npos) return true;
    std::string lower = key;
    std::transform(lower.begin(), lower.end(), lower.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    if (lower.size() > 5 && lower.ends_with(".json")) return true;
    std::error_code ec;
    return std::filesystem::is_regular_file(key, ec);
}

std::shared_ptr<const PhaseDiagram> resolveSubstance(const std::string &key, std::ostream &err) {
    if (!isSubstancePath(key)) return loadLibrary(err).find(key);
    SubstanceReadResult r = readSubstanceFile(key);
    std::string errors;
    for (const auto &issue : r.issues) {
        if (issue.severity == Severity::Error)
            errors += "\n  " + issue.text();
        else
            err << "phasewright-cli: "
                << (issue.severity == Severity::Warning ? "warning: " : "note: ") << issue.text()
                << '\n';
    }
    const auto n = std::count_if(r.issues.begin(), r.issues.end(),
                                 [](const auto &i) { return i.severity == Severity::Error; });
    if (!r.substance)
        throw Error(
            fmt::format("substance file refused ({} error{}):{}", n, n == 1 ? "" : "s", errors));
    return std::make_shared<const PhaseDiagram>(std::move(*r.substance));
}

}  // namespace pw::cli
