// phasewright-cli list: the substances in the library with their sources.
#include <fmt/format.h>

#include <memory>
#include <nlohmann/json.hpp>
#include <ostream>

#include "app/cli/cli.h"
#include "app/cli/substance_arg.h"

namespace pw::cli {
namespace {

std::string shortCitation(const Citation &c) {
    return c.year > 0 ? fmt::format("{} ({})", c.authors, c.year) : c.authors;
}

nlohmann::ordered_json sourcesJson(const Substance &s) {
    nlohmann::ordered_json list = nlohmann::ordered_json::array();
    for (const auto &[key, c] : s.sources)
        list.push_back({{"key", key},
                        {"authors", c.authors},
                        {"year", c.year},
                        {"title", c.title},
                        {"publication", c.publication},
                        {"note", c.note}});
    return list;
}

void writeJson(const SubstanceLibrary &lib, std::ostream &out) {
    nlohmann::ordered_json list = nlohmann::ordered_json::array();
    for (const auto &d : lib.all()) {
        const Substance &s = d->substance();
        list.push_back({{"id", s.id},
                        {"name", s.name},
                        {"formula", s.formula},
                        {"cas", s.cas},
                        {"aliases", s.aliases},
                        {"origin", s.origin},
                        {"sources", sourcesJson(s)}});
    }
    out << list.dump(2, ' ', false, nlohmann::json::error_handler_t::replace) << '\n';
}

void writeTable(const SubstanceLibrary &lib, std::ostream &out) {
    std::size_t idWidth = 2, nameWidth = 4, formulaWidth = 7;
    for (const auto &d : lib.all()) {
        idWidth = std::max(idWidth, d->substance().id.size());
        nameWidth = std::max(nameWidth, d->substance().name.size());
        formulaWidth = std::max(formulaWidth, d->substance().formula.size());
    }
    out << fmt::format("{:<{}}  {:<{}}  {:<{}}  {}\n", "id", idWidth, "name", nameWidth, "formula",
                       formulaWidth, "sources");
    for (const auto &d : lib.all()) {
        const Substance &s = d->substance();
        std::string sources;
        for (const auto &[key, c] : s.sources) {
            const std::string cite = shortCitation(c);
            if (sources.find(cite) == std::string::npos)
                sources += (sources.empty() ? "" : "; ") + cite;
        }
        out << fmt::format("{:<{}}  {:<{}}  {:<{}}  {}\n", s.id, idWidth, s.name, nameWidth,
                           s.formula.empty() ? "-" : s.formula, formulaWidth, sources);
    }
    out << fmt::format("{} substance{} (user folder: {})\n", lib.all().size(),
                       lib.all().size() == 1 ? "" : "s", SubstanceLibrary::defaultUserFolder());
}

}  // namespace

void addListCommand(CLI::App &app, Io &io) {
    auto *cmd = app.add_subcommand(
        "list",
        "List the substances in the library: id, name, formula and the published sources of "
        "their data. The library is the bundled set plus the substance files in the user "
        "folder ($XDG_DATA_HOME/phasewright/substances, default "
        "~/.local/share/phasewright/substances). Files refused there are noted on stderr.");
    auto json = std::make_shared<bool>(false);
    cmd->add_flag("--json", *json,
                  "write a JSON array (id, name, formula, cas, aliases, origin, sources)");
    cmd->footer("Examples:\n  phasewright-cli list\n  phasewright-cli list --json");
    cmd->callback([&io, json] {
        const SubstanceLibrary lib = loadLibrary(io.err);
        if (*json)
            writeJson(lib, io.out);
        else
            writeTable(lib, io.out);
    });
}

}  // namespace pw::cli
