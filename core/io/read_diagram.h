#pragma once
// Reading a substance file straight into its PhaseDiagram: the diagram the consistency check
// builds is the one handed back, so a file costs one diagram, not two (SubstanceLibrary).
// readSubstance()/readSubstanceFile() (core/substance_io.h) are these plus a copy of the
// substance; the issues are the same.
#include <memory>
#include <string>
#include <string_view>
#include <vector>

#include "core/phase_diagram.h"
#include "core/substance_io.h"

namespace pw::io {

struct DiagramReadResult {
    std::shared_ptr<const PhaseDiagram> diagram;  // null when any Error-severity issue was found
    std::vector<ValidationIssue> issues;
};

DiagramReadResult readSubstanceDiagram(std::string_view json, const std::string &fileName);
DiagramReadResult readSubstanceDiagramFile(const std::string &path);

}  // namespace pw::io
