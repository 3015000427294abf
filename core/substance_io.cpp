// Reading, validating and writing substance files (docs/substance-format.md). The parts of
// the reader live in core/io/ (reader, json_guard, model_schema, read_*, substance_checks).
#include "core/substance_io.h"

#include <fmt/format.h>
#include <cerrno>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <sstream>

#include "core/io/json_guard.h"
#include "core/io/read_diagram.h"
#include "core/io/read_parts.h"
#include "core/io/substance_checks.h"

namespace pw {
namespace {

using io::Json;
using io::Reader;
using Ordered = nlohmann::ordered_json;

bool readHeader(const Json &doc, Reader &reader) {
    const auto format = reader.string(doc, "format", "", true);
    if (format && *format != kSubstanceFormat) {
        reader.error("/format", fmt::format("'{}' is not a Phasewright substance file; expected "
                                            "\"{}\"",
                                            *format, kSubstanceFormat));
        return false;
    }
    const auto version = reader.integer(doc, "version", "", true);
    if (version && *version != kSubstanceFormatVersion) {
        reader.error("/version", fmt::format("format version {} is not supported; expected {}",
                                             *version, kSubstanceFormatVersion));
        return false;
    }
    return format && version;
}

void readContent(const Json &doc, Reader &reader, Substance &s) {
    reader.unknownKeys(doc,
                       {"format", "version", "id", "name", "formula", "cas", "aliases",
                        "molar_mass_g_mol", "acentric_factor", "sources", "triple_points",
                        "critical_point", "fusion_at_triple", "boundaries", "hazards", "notes"},
                       "");
    io::readIdentity(doc, reader, s);
    io::readSources(doc, reader, s);
    io::readFixedPoints(doc, reader, s);
    io::readBoundaries(doc, reader, s);
    if (auto hazards = reader.strings(doc, "hazards", "", false)) s.hazards = std::move(*hazards);
    s.notes = reader.string(doc, "notes", "", false).value_or("");
}

Ordered units(TemperatureUnit t, PressureUnit p) {
    return Ordered{{"T", std::string(symbol(t))}, {"P", std::string(symbol(p))}};
}

Ordered writeParameters(const ModelSpec &spec) {
    Ordered out = Ordered::object();
    for (const auto &[k, v] : spec.scalars) out[k] = v;
    for (const auto &[k, v] : spec.arrays) out[k] = v;
    for (const auto &[k, v] : spec.strings) out[k] = v;
    for (const auto &[k, v] : spec.flags) out[k] = v;
    return out;
}

Ordered writeBoundary(const Boundary &b) {
    Ordered out;
    out["kind"] = std::string(toString(b.kind));
    if (!b.solidForm.empty()) out["solid_form"] = b.solidForm;
    out["model"] = b.spec.form;
    out["parameters"] = writeParameters(b.spec);
    out["units"] = units(b.spec.tUnit, b.spec.pUnit);
    out["validity"] =
        Ordered{{"T_min", b.validity.min_K}, {"T_max", b.validity.max_K}, {"unit", "K"}};
    if (std::isfinite(b.uncertaintyRel)) out["uncertainty_rel"] = b.uncertaintyRel;
    out["source"] = b.sourceKey;
    if (!b.note.empty()) out["note"] = b.note;
    return out;
}

Ordered writePoint(const FixedPoint &fp, bool triple) {
    Ordered out{{"T", fp.T_K}, {"P", fp.P_Pa}};
    out["units"] = units(TemperatureUnit::Kelvin, PressureUnit::Pa);
    if (triple && !fp.phases.empty()) out["phases"] = fp.phases;
    out["source"] = fp.sourceKey;
    return out;
}

Ordered writeSources(const std::map<std::string, Citation> &sources) {
    Ordered out = Ordered::object();
    for (const auto &[key, c] : sources)
        out[key] = Ordered{{"authors", c.authors},
                           {"year", c.year},
                           {"title", c.title},
                           {"publication", c.publication},
                           {"note", c.note}};
    return out;
}

}  // namespace

std::string ValidationIssue::text() const {
    std::string s = file.empty() ? std::string("<input>") : file;
    s += ": ";
    if (!jsonPath.empty()) s += jsonPath + ": ";
    return s + message;
}

namespace io {

DiagramReadResult readSubstanceDiagram(std::string_view json, const std::string &fileName) {
    Reader reader(fileName);
    Substance s;
    s.origin = fileName;
    const std::optional<Json> doc = io::parseGuarded(json, reader);
    if (doc && !doc->is_object())
        reader.error("",
                     "expected a JSON object at the top level, found " + io::describeType(*doc));
    if (doc && doc->is_object() && readHeader(*doc, reader)) readContent(*doc, reader, s);
    if (!reader.hasErrors()) io::checkCurves(s, reader);
    if (!reader.hasErrors()) io::checkFixedPoints(s, reader);
    std::shared_ptr<const PhaseDiagram> diagram;
    if (!reader.hasErrors()) diagram = io::buildAndCheckConsistency(std::move(s), reader);
    DiagramReadResult result;
    if (!reader.hasErrors()) result.diagram = std::move(diagram);
    result.issues = reader.take();
    return result;
}

DiagramReadResult readSubstanceDiagramFile(const std::string &path) {
    Reader reader(path);
    std::error_code ec;
    const auto status = std::filesystem::status(path, ec);
    if (ec || !std::filesystem::exists(status)) {
        reader.error("", "cannot open the file: it does not exist");
    } else if (!std::filesystem::is_regular_file(status)) {
        reader.error("", "cannot read it: not a regular file");
    } else if (const auto size = std::filesystem::file_size(path, ec);
               !ec && size > io::kMaxFileBytes) {
        reader.error("", fmt::format("file too large: {} bytes; a substance file may hold at "
                                     "most {} bytes (4 MiB)",
                                     size, io::kMaxFileBytes));
    } else {
        std::ifstream in(path, std::ios::binary);
        if (!in) {
            reader.error("", fmt::format("cannot open the file: {}", std::strerror(errno)));
        } else {
            std::ostringstream text;
            text << in.rdbuf();
            return readSubstanceDiagram(text.str(), path);
        }
    }
    return DiagramReadResult{nullptr, reader.take()};
}

}  // namespace io

namespace {
SubstanceReadResult withSubstance(io::DiagramReadResult r) {
    SubstanceReadResult result;
    if (r.diagram) result.substance = r.diagram->substance();
    result.issues = std::move(r.issues);
    return result;
}
}  // namespace

SubstanceReadResult readSubstance(std::string_view json, const std::string &fileName) {
    return withSubstance(io::readSubstanceDiagram(json, fileName));
}

SubstanceReadResult readSubstanceFile(const std::string &path) {
    return withSubstance(io::readSubstanceDiagramFile(path));
}

std::string writeSubstance(const Substance &s) {
    Ordered out;
    out["format"] = std::string(kSubstanceFormat);
    out["version"] = kSubstanceFormatVersion;
    out["id"] = s.id;
    out["name"] = s.name;
    if (!s.formula.empty()) out["formula"] = s.formula;
    if (!s.cas.empty()) out["cas"] = s.cas;
    if (!s.aliases.empty()) out["aliases"] = s.aliases;
    if (std::isfinite(s.molarMass_g_mol)) out["molar_mass_g_mol"] = s.molarMass_g_mol;
    if (std::isfinite(s.acentricFactor)) out["acentric_factor"] = s.acentricFactor;
    out["sources"] = writeSources(s.sources);
    if (!s.triplePoints.empty()) {
        Ordered tps = Ordered::array();
        for (const auto &fp : s.triplePoints) tps.push_back(writePoint(fp, true));
        out["triple_points"] = tps;
    }
    if (s.critical) out["critical_point"] = writePoint(*s.critical, false);
    if (std::isfinite(s.dHfusTriple_J_mol) || std::isfinite(s.dVfusTriple_m3_mol))
        out["fusion_at_triple"] = Ordered{{"dH_J_mol", s.dHfusTriple_J_mol},
                                          {"dV_m3_mol", s.dVfusTriple_m3_mol},
                                          {"source", s.fusionSourceKey}};
    Ordered bs = Ordered::array();
    for (const auto &b : s.boundaries) bs.push_back(writeBoundary(b));
    out["boundaries"] = bs;
    if (!s.hazards.empty()) out["hazards"] = s.hazards;
    if (!s.notes.empty()) out["notes"] = s.notes;
    return out.dump(2, ' ', false, nlohmann::json::error_handler_t::replace) + "\n";
}

}  // namespace pw
