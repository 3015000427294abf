#pragma once
// The shared --substance option: an id, alias, formula or name from the library (bundled
// plus the user's folder, docs/substance-format.md), or a path to a substance file.
#include <CLI/CLI.hpp>
#include <iosfwd>
#include <memory>
#include <string>

#include "core/library.h"

namespace pw::cli {

// Help text of --substance, the same for every command.
inline constexpr const char *kSubstanceHelp =
    "substance: an id (carbon-dioxide), alias or formula (CO2), name (case does not matter), "
    "or the path of a substance file (my-compound.json)";

// Adds the required --substance option to `cmd`, bound to `key`.
CLI::Option *addSubstanceOption(CLI::App *cmd, std::string &key);

// The bundled library plus the user's folder. Findings about the user's files (a refused
// file, a duplicate id, warnings) and refused bundled files are written to `err` as
// "phasewright-cli: note: ..." lines.
SubstanceLibrary loadLibrary(std::ostream &err);

// Resolves a --substance value. A file is read and validated: its warnings go to `err`, a
// refusal throws pw::Error listing every error. Otherwise the library is searched; no match
// throws pw::Error with close matches.
std::shared_ptr<const PhaseDiagram> resolveSubstance(const std::string &key, std::ostream &err);

// True when `key` names a file rather than a library entry (contains '/', ends in .json, or
// is an existing file).
bool isSubstancePath(const std::string &key);

}  // namespace pw::cli
