// The "boundaries" array of a substance file.
#include <fmt/format.h>

#include "core/errors.h"
#include "core/io/model_schema.h"
#include "core/io/read_parts.h"

namespace pw::io {
namespace {

std::optional<BoundaryKind> parseKind(const std::string &text) {
    for (const auto k : {BoundaryKind::Melting, BoundaryKind::Vaporization,
                         BoundaryKind::Sublimation, BoundaryKind::SolidSolid})
        if (text == toString(k)) return k;
    return std::nullopt;
}

void readValidity(const Json &b, const std::string &path, Reader &reader, Boundary &out) {
    const Json *v = reader.member(b, "validity", path, true);
    const std::string here = child(path, "validity");
    if (v == nullptr || !reader.expectObject(*v, here, "a validity range")) return;
    reader.unknownKeys(*v, {"T_min", "T_max", "unit"}, here);
    TemperatureUnit unit = TemperatureUnit::Kelvin;
    if (const auto u = reader.string(*v, "unit", here, false)) {
        try {
            unit = parseTemperatureUnit(*u);
        } catch (const UnitError &e) {
            reader.error(child(here, "unit"), e.what());
            return;
        }
    }
    const auto lo = reader.number(*v, "T_min", here, true);
    const auto hi = reader.number(*v, "T_max", here, true);
    if (!lo || !hi) return;
    const double loK = toKelvin(*lo, unit);
    const double hiK = toKelvin(*hi, unit);
    if (!(loK > 0.0)) {
        reader.error(child(here, "T_min"),
                     fmt::format("{} K is not a temperature; expected T_min above 0 K", loK));
    } else if (!(hiK > loK)) {
        reader.error(here, fmt::format("inverted or empty range: T_min = {} K is not below "
                                       "T_max = {} K; expected T_min < T_max",
                                       loK, hiK));
    } else if (hiK > 1e5) {
        reader.error(child(here, "T_max"),
                     fmt::format("{} K is not plausible; expected at most 1e5 K", hiK));
    } else {
        out.validity = TRange{loK, hiK};
    }
}

void readModel(const Json &b, const std::string &path, Reader &reader, Boundary &out) {
    const auto model = reader.string(b, "model", path, true);
    const Json *params = reader.member(b, "parameters", path, true);
    if (!readUnits(b, path, reader, out.spec.tUnit, out.spec.pUnit) || !model) return;
    const FormSchema *schema = findForm(*model);
    if (schema == nullptr) {
        reader.error(child(path, "model"),
                     fmt::format("unknown model '{}'; expected one of: {}", *model, formList()));
        return;
    }
    out.spec.form = *model;
    if (params != nullptr)
        readParameters(*params, *schema, child(path, "parameters"), reader, out.spec);
}

void buildModel(const std::string &path, Reader &reader, Boundary &out) {
    try {
        out.model = makeModel(out.spec);
        if (!out.model) reader.error(path, "the model could not be built");
    } catch (const ModelSpecError &e) {
        const std::string where = e.parameter().empty()
                                      ? child(path, "model")
                                      : child(child(path, "parameters"), e.parameter());
        reader.error(where, e.what());
    } catch (const std::exception &e) {
        reader.error(child(path, "parameters"), e.what());
    }
}

void readBoundary(const Json &b, const std::string &path, Reader &reader, Substance &s) {
    if (!reader.expectObject(b, path, "a boundary")) return;
    reader.unknownKeys(b,
                       {"kind", "solid_form", "model", "parameters", "units", "validity",
                        "uncertainty_rel", "source", "note"},
                       path);
    const int errorsBefore = reader.errorCount();
    Boundary out;
    if (const auto kind = reader.string(b, "kind", path, true)) {
        if (const auto k = parseKind(*kind))
            out.kind = *k;
        else
            reader.error(child(path, "kind"),
                         fmt::format("unknown kind '{}'; expected vaporization, sublimation, "
                                     "melting or solid-solid",
                                     *kind));
    }
    out.solidForm = reader.string(b, "solid_form", path, false).value_or("");
    if (out.kind == BoundaryKind::SolidSolid && out.solidForm.find('|') == std::string::npos)
        reader.error(
            child(path, "solid_form"),
            "a solid-solid boundary needs the two forms joined by '|' (\"ice Ih|ice III\")");
    readModel(b, path, reader, out);
    readValidity(b, path, reader, out);
    if (const auto u = reader.number(b, "uncertainty_rel", path, false)) {
        if (*u <= 0.0 || *u >= 1.0)
            reader.error(child(path, "uncertainty_rel"),
                         fmt::format("{} is not a relative uncertainty; expected 0 < u < 1", *u));
        else
            out.uncertaintyRel = *u;
    }
    if (const auto key = reader.string(b, "source", path, true)) {
        out.sourceKey = *key;
        out.source = resolveSource(s, *key, child(path, "source"), reader);
    }
    out.note = reader.string(b, "note", path, false).value_or("");
    if (reader.errorCount() == errorsBefore) buildModel(path, reader, out);
    s.boundaries.push_back(std::move(out));
}

}  // namespace

void readBoundaries(const Json &doc, Reader &reader, Substance &s) {
    const Json *bs = reader.member(doc, "boundaries", "", true);
    if (bs == nullptr) return;
    if (!bs->is_array()) {
        reader.error("/boundaries", "expected an array of boundaries, found " + describeType(*bs));
        return;
    }
    for (std::size_t i = 0; i < bs->size(); ++i)
        readBoundary((*bs)[i], child("/boundaries", i), reader, s);
}

}  // namespace pw::io
