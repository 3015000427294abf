#pragma once
// Reading, validating and writing substance files (format: docs/substance-format.md).
#include <string>
#include <string_view>
#include <vector>

#include "core/phase_diagram.h"
#include "core/substance.h"

namespace pw {

inline constexpr std::string_view kSubstanceFormat = "phasewright-substance";
inline constexpr int kSubstanceFormatVersion = 1;

struct ValidationIssue {
    Severity severity = Severity::Error;
    std::string file;
    std::string jsonPath;      // e.g. "/boundaries/2/coefficients/a"
    std::string message;       // what is wrong and what was expected
    std::string text() const;  // "file: /json/path: message"
};

struct SubstanceReadResult {
    std::optional<Substance> substance;   // empty when any Error-severity issue was found
    std::vector<ValidationIssue> issues;  // errors and warnings
};

// Parse and validate; never throws for bad content (it is reported in issues).
SubstanceReadResult readSubstance(std::string_view json, const std::string &fileName);
SubstanceReadResult readSubstanceFile(const std::string &path);

// Serialise back to the file format (round trip). Coefficients keep full precision.
std::string writeSubstance(const Substance &substance);

}  // namespace pw
