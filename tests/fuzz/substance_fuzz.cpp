// Fuzz target: the substance-file parser and validator (core/substance_io.h readSubstance).
// readSubstance promises never to throw for bad content; a file it accepts must be written
// back (writeSubstance) and read again without an error: the round trip is the oracle.
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <string>
#include <string_view>

#include "core/substance_io.h"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    const std::string_view json(reinterpret_cast<const char *>(data), size);
    const pw::SubstanceReadResult r = pw::readSubstance(json, "fuzz.json");
    if (!r.substance) return 0;
    const std::string written = pw::writeSubstance(*r.substance);
    const pw::SubstanceReadResult again = pw::readSubstance(written, "fuzz-rewritten.json");
    if (!again.substance) {
        for (const auto &issue : again.issues) std::fprintf(stderr, "%s\n", issue.text().c_str());
        std::fprintf(stderr, "an accepted substance file was refused after writeSubstance\n");
        std::abort();
    }
    return 0;
}
