// phasewright-cli validate: check substance files against docs/substance-format.md.
#include <fmt/format.h>

#include <algorithm>
#include <filesystem>
#include <memory>
#include <ostream>

#include "app/cli/cli.h"
#include "app/cli/substance_arg.h"
#include "core/errors.h"

namespace pw::cli {
namespace {

const char *severityWord(Severity s) {
    switch (s) {
        case Severity::Error:
            return "error";
        case Severity::Warning:
            return "warning";
        case Severity::Info:
            return "note";
    }
    return "";
}

// A valid file whose id is taken in the library would be refused when installed.
void checkIdIsFree(const Substance &s, const SubstanceLibrary &lib, Io &io) {
    for (const auto &d : lib.all()) {
        std::error_code ec;
        if (d->substance().id != s.id ||
            std::filesystem::equivalent(d->substance().origin, s.origin, ec))
            continue;
        io.err << fmt::format(
            "warning: {}: /id: id '{}' is already used by {}; the library would "
            "refuse this file as a duplicate (give it an id of its own)\n",
            s.origin, s.id, d->substance().origin);
    }
}

// Validates one file; returns true when it is valid.
bool validateOne(const std::string &file, const SubstanceLibrary &lib, Io &io) {
    const SubstanceReadResult r = readSubstanceFile(file);
    for (const auto &issue : r.issues)
        io.err << severityWord(issue.severity) << ": " << issue.text() << '\n';
    const auto count = [&](Severity s) {
        return std::count_if(r.issues.begin(), r.issues.end(),
                             [s](const auto &i) { return i.severity == s; });
    };
    if (!r.substance) {
        io.err << fmt::format("{}: invalid ({} error{}, {} warning{})\n", file,
                              count(Severity::Error), count(Severity::Error) == 1 ? "" : "s",
                              count(Severity::Warning), count(Severity::Warning) == 1 ? "" : "s");
        return false;
    }
    checkIdIsFree(*r.substance, lib, io);
    io.out << fmt::format("{}: valid: {} ({}), {} boundar{}, {} warning{}\n", file, r.substance->id,
                          r.substance->name, r.substance->boundaries.size(),
                          r.substance->boundaries.size() == 1 ? "y" : "ies",
                          count(Severity::Warning), count(Severity::Warning) == 1 ? "" : "s");
    return true;
}

}  // namespace

void addValidateCommand(CLI::App &app, Io &io) {
    auto *cmd = app.add_subcommand(
        "validate",
        "Check substance files (docs/substance-format.md): JSON syntax, required fields and "
        "types, units, models and their parameters, validity ranges, sources, and the physics "
        "(curves finite and monotonic over their ranges, triple and critical points on the "
        "curves: warning above 0.1 %, error above 2 %). Findings go to stderr as "
        "'error|warning: FILE: /json/path: message'. Exit 0 when every file is valid "
        "(warnings allowed), 1 when any is refused.");
    auto files = std::make_shared<std::vector<std::string>>();
    cmd->add_option("FILE", *files, "substance file(s) to check")->required();
    cmd->footer(
        "Examples:\n  phasewright-cli validate my-compound.json\n"
        "  phasewright-cli validate ~/.local/share/phasewright/substances/*.json");
    cmd->callback([&io, files] {
        const SubstanceLibrary lib =
            SubstanceLibrary::withUserFolder(SubstanceLibrary::defaultUserFolder());
        long invalid = 0;
        for (const auto &file : *files)
            if (!validateOne(file, lib, io)) ++invalid;
        if (invalid > 0)
            throw Error(fmt::format("{} of {} file{} invalid", invalid, files->size(),
                                    files->size() == 1 ? "" : "s"));
    });
}

}  // namespace pw::cli
