#pragma once
// The substance library: the bundled files (compiled into the binaries) plus the user's own
// folder ($XDG_DATA_HOME/phasewright/substances, default ~/.local/share/...).
#include <memory>
#include <string>
#include <string_view>
#include <vector>

#include "core/phase_diagram.h"
#include "core/substance_io.h"

namespace pw {

class SubstanceLibrary {
public:
    // Bundled substances only.
    static SubstanceLibrary bundled();
    // Bundled + the user's folder (a file whose id duplicates a bundled one is refused with an
    // issue naming both; user files never silently replace bundled data).
    static SubstanceLibrary withUserFolder(const std::string &folder);
    static std::string defaultUserFolder();  // XDG data location

    const std::vector<std::shared_ptr<const PhaseDiagram>> &all() const { return diagrams_; }
    // By id, alias, formula or name (case-insensitive), or a path to a substance file.
    // Throws pw::Error listing close matches when nothing fits.
    std::shared_ptr<const PhaseDiagram> find(std::string_view key) const;
    const std::vector<ValidationIssue> &issues() const { return issues_; }

    // Add a parsed substance; returns false (and records an issue) on a duplicate id.
    bool add(Substance substance);

private:
    // add() for a diagram already built (and validated) by the reader: no second build.
    bool addDiagram(std::shared_ptr<const PhaseDiagram> diagram);
    bool isDuplicate(const Substance &substance);

    std::vector<std::shared_ptr<const PhaseDiagram>> diagrams_;
    std::vector<ValidationIssue> issues_;
};

}  // namespace pw
