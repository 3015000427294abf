#pragma once
// Turning a fit into substance-file content: a new substance, or the fitted boundary merged
// into an existing one, with the data source recorded; written atomically.
#include <string>
#include <vector>

#include "core/fit/fit.h"
#include "core/substance.h"

namespace pw::fit {

struct FitProvenance {
    std::string dataFile;  // as given by the user; its file name goes into the citation
    std::string date;      // "YYYY-MM-DD" (today() by default)
};

// Today's UTC date as "YYYY-MM-DD".
std::string today();

// The boundary for `result`, pointing at `sourceKey`: spec, model (makeModel), validity = the
// data span, note with the statistics.
Boundary fittedBoundary(const FitResult &result, const std::string &sourceKey);

// The citation recorded for the data: authors "measurements in <file>", the year of the date,
// title "<file>, fitted <date>", note "fitted by phasewright-cli fit: ...".
Citation fitCitation(const FitResult &result, const FitProvenance &provenance);

// A new substance holding only the fitted boundary, and the critical and triple points given in
// the request (recorded with a source saying they were given on the command line).
// `name` becomes the display name; the id is derived from it (lower case, hyphens).
Substance substanceFromFit(const FitResult &result, const FitRequest &request,
                           const std::string &name, const FitProvenance &provenance);

// Merges the fitted boundary into `substance`: a boundary of the same kind (and solid form)
// is replaced, otherwise the new one is appended; the source is added under a fresh key.
// Returns what was done, for the user ("replaced the vaporization boundary ...").
std::string mergeFit(Substance &substance, const FitResult &result,
                     const FitProvenance &provenance);

// "My Solvent 2" -> "my-solvent-2"; throws pw::Error when nothing usable is left.
std::string substanceId(const std::string &name);

// Serialises `substance` (writeSubstance), reads the text back (readSubstance) and refuses it
// with every error found, so an invalid file is never written; then writes it atomically.
// Returns the warnings of the read-back check.
std::vector<std::string> writeSubstanceChecked(const Substance &substance, const std::string &path);

// Writes `text` to `path` via a temporary file in the same folder and a rename; on any error
// the temporary file is removed, `path` is untouched and pw::Error names the path.
void writeFileAtomically(const std::string &path, const std::string &text);

// The result as JSON text (parameters, covariance, statistics, residuals, warnings, spec).
std::string fitReportJson(const FitResult &result);

}  // namespace pw::fit
