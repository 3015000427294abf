#pragma once
// The parts of a substance file, read into a Substance with issues recorded on the Reader.
// Split from core/substance_io.cpp to keep files short; used only there.
#include "core/io/reader.h"
#include "core/substance.h"

namespace pw::io {

// Top-level identity: id, name, formula, cas, aliases, molar mass, acentric factor.
void readIdentity(const Json &doc, Reader &reader, Substance &s);
// "sources" (must come before everything that refers to a source).
void readSources(const Json &doc, Reader &reader, Substance &s);
// "triple_points", "critical_point", "fusion_at_triple".
void readFixedPoints(const Json &doc, Reader &reader, Substance &s);
// "boundaries" (including building each model with makeModel()).
void readBoundaries(const Json &doc, Reader &reader, Substance &s);

// The citation for `key` (at `path`) from s.sources; records an error when it is unknown.
Citation resolveSource(const Substance &s, const std::string &key, const std::string &path,
                       Reader &reader);
// "units": {"T": ..., "P": ...} of `object` (defaults K and Pa); false on an error.
bool readUnits(const Json &object, const std::string &path, Reader &reader, TemperatureUnit &t,
               PressureUnit &p);

}  // namespace pw::io
