// Identity, sources and fixed points of a substance file.
#include <fmt/format.h>

#include <regex>

#include "core/errors.h"
#include "core/io/read_parts.h"

namespace pw::io {
namespace {

constexpr double kMaxPlausibleT_K = 1e5;
constexpr double kMaxPlausibleP_Pa = 1e13;

bool casCheckDigitOk(const std::string &cas) {
    int sum = 0;
    int weight = 1;
    // Digits before the check digit, from the right, weighted 1, 2, 3...
    for (auto it = cas.rbegin() + 1; it != cas.rend(); ++it) {
        if (*it == '-') continue;
        sum += (*it - '0') * weight++;
    }
    return sum % 10 == cas.back() - '0';
}

void readCas(const Json &doc, Reader &reader, Substance &s) {
    const auto cas = reader.string(doc, "cas", "", false);
    if (!cas) return;
    static const std::regex pattern("^[0-9]{2,7}-[0-9]{2}-[0-9]$");
    if (!std::regex_match(*cas, pattern))
        reader.error("/cas", fmt::format("'{}' is not a CAS registry number; expected the form "
                                         "NNNNNNN-NN-N (2 to 7 digits, 2 digits, 1 check digit)",
                                         *cas));
    else if (!casCheckDigitOk(*cas))
        reader.error("/cas", fmt::format("'{}' fails the CAS check digit; check the number", *cas));
    else
        s.cas = *cas;
}

// A temperature/pressure pair of a fixed point, in K and Pa, with plausibility checks.
bool readStatePoint(const Json &v, const std::string &path, Reader &reader, FixedPoint &fp) {
    TemperatureUnit tu = TemperatureUnit::Kelvin;
    PressureUnit pu = PressureUnit::Pa;
    const bool unitsOk = readUnits(v, path, reader, tu, pu);
    const auto T = reader.number(v, "T", path, true);
    const auto P = reader.number(v, "P", path, true);
    if (!unitsOk || !T || !P) return false;
    fp.T_K = toKelvin(*T, tu);
    fp.P_Pa = toPascal(*P, pu);
    bool ok = true;
    if (!(fp.T_K > 0.0 && fp.T_K <= kMaxPlausibleT_K)) {
        reader.error(child(path, "T"), fmt::format("temperature {} K is not plausible; expected "
                                                   "0 K < T <= {:g} K",
                                                   fp.T_K, kMaxPlausibleT_K));
        ok = false;
    }
    if (!(fp.P_Pa > 0.0 && fp.P_Pa <= kMaxPlausibleP_Pa)) {
        reader.error(child(path, "P"), fmt::format("pressure {} Pa is not plausible; expected "
                                                   "0 Pa < P <= {:g} Pa",
                                                   fp.P_Pa, kMaxPlausibleP_Pa));
        ok = false;
    }
    return ok;
}

std::optional<FixedPoint> readFixedPoint(const Json &v, const std::string &path, bool triple,
                                         Reader &reader, const Substance &s) {
    if (!reader.expectObject(v, path, triple ? "a triple point" : "the critical point"))
        return std::nullopt;
    if (triple)
        reader.unknownKeys(v, {"T", "P", "units", "phases", "source"}, path);
    else
        reader.unknownKeys(v, {"T", "P", "units", "source"}, path);
    FixedPoint fp;
    bool ok = readStatePoint(v, path, reader, fp);
    if (triple) {
        if (auto phases = reader.strings(v, "phases", path, false)) {
            if (!phases->empty() && phases->size() != 3) {
                reader.error(
                    child(path, "phases"),
                    fmt::format("has {} entries; expected the 3 phases that meet", phases->size()));
                ok = false;
            }
            fp.phases = std::move(*phases);
        }
    }
    if (const auto key = reader.string(v, "source", path, true)) {
        fp.sourceKey = *key;
        fp.source = resolveSource(s, *key, child(path, "source"), reader);
    } else {
        ok = false;
    }
    if (!ok) return std::nullopt;
    return fp;
}

void readFusion(const Json &doc, Reader &reader, Substance &s) {
    const Json *f = reader.member(doc, "fusion_at_triple", "", false);
    if (f == nullptr) return;
    const std::string path = "/fusion_at_triple";
    if (!reader.expectObject(*f, path, "fusion data")) return;
    reader.unknownKeys(*f, {"dH_J_mol", "dV_m3_mol", "source"}, path);
    const auto dH = reader.positive(*f, "dH_J_mol", path, true);
    const auto dV = reader.number(*f, "dV_m3_mol", path, true);
    if (dV && *dV == 0.0) reader.error(child(path, "dV_m3_mol"), "expected a non-zero volume");
    if (dH) s.dHfusTriple_J_mol = *dH;
    if (dV && *dV != 0.0) s.dVfusTriple_m3_mol = *dV;
    if (const auto key = reader.string(*f, "source", path, true)) {
        s.fusionSourceKey = *key;
        resolveSource(s, *key, child(path, "source"), reader);
    }
}

}  // namespace

bool readUnits(const Json &object, const std::string &path, Reader &reader, TemperatureUnit &t,
               PressureUnit &p) {
    const Json *u = reader.member(object, "units", path, false);
    if (u == nullptr) return true;
    const std::string here = child(path, "units");
    if (!reader.expectObject(*u, here, "units {\"T\": ..., \"P\": ...}")) return false;
    reader.unknownKeys(*u, {"T", "P"}, here);
    bool ok = true;
    try {
        if (const auto ts = reader.string(*u, "T", here, false)) t = parseTemperatureUnit(*ts);
    } catch (const UnitError &e) {
        reader.error(child(here, "T"), e.what());
        ok = false;
    }
    try {
        if (const auto ps = reader.string(*u, "P", here, false)) p = parsePressureUnit(*ps);
    } catch (const UnitError &e) {
        reader.error(child(here, "P"), e.what());
        ok = false;
    }
    return ok;
}

Citation resolveSource(const Substance &s, const std::string &key, const std::string &path,
                       Reader &reader) {
    const auto it = s.sources.find(key);
    if (it != s.sources.end()) return it->second;
    std::string keys;
    for (const auto &[k, c] : s.sources) keys += (keys.empty() ? "" : ", ") + k;
    reader.error(path, fmt::format("unknown source key '{}'; expected one of the keys of "
                                   "/sources ({})",
                                   key, keys.empty() ? "none defined" : keys));
    return {};
}

void readIdentity(const Json &doc, Reader &reader, Substance &s) {
    if (const auto id = reader.string(doc, "id", "", true)) {
        static const std::regex pattern("^[a-z0-9]+(-[a-z0-9]+)*$");
        if (id->size() > 64 || !std::regex_match(*id, pattern))
            reader.error("/id", fmt::format("'{}' is not a valid id; expected lower-case letters, "
                                            "digits and single hyphens (e.g. carbon-dioxide), at "
                                            "most 64 characters",
                                            *id));
        else
            s.id = *id;
    }
    if (const auto name = reader.string(doc, "name", "", true)) {
        if (name->empty()) reader.error("/name", "expected a non-empty display name");
        s.name = *name;
    }
    if (const auto formula = reader.string(doc, "formula", "", false)) s.formula = *formula;
    readCas(doc, reader, s);
    if (auto aliases = reader.strings(doc, "aliases", "", false)) s.aliases = std::move(*aliases);
    if (const auto m = reader.positive(doc, "molar_mass_g_mol", "", false)) s.molarMass_g_mol = *m;
    if (const auto w = reader.number(doc, "acentric_factor", "", false)) s.acentricFactor = *w;
}

void readSources(const Json &doc, Reader &reader, Substance &s) {
    const Json *sources = reader.member(doc, "sources", "", true);
    if (sources == nullptr || !reader.expectObject(*sources, "/sources", "citations by key"))
        return;
    for (const auto &[key, v] : sources->items()) {
        const std::string path = child("/sources", key);
        if (!reader.expectObject(v, path, "a citation")) continue;
        reader.unknownKeys(v, {"authors", "year", "title", "publication", "note"}, path);
        Citation c;
        if (const auto a = reader.string(v, "authors", path, true)) {
            if (a->empty()) reader.error(child(path, "authors"), "expected the authors' names");
            c.authors = *a;
        }
        if (const auto y = reader.integer(v, "year", path, true)) {
            if (*y < 1600 || *y > 2100)
                reader.error(child(path, "year"),
                             fmt::format("{} is not a plausible year; expected 1600 to 2100", *y));
            else
                c.year = static_cast<int>(*y);
        }
        c.title = reader.string(v, "title", path, false).value_or("");
        c.publication = reader.string(v, "publication", path, false).value_or("");
        c.note = reader.string(v, "note", path, false).value_or("");
        s.sources[key] = std::move(c);
    }
}

void readFixedPoints(const Json &doc, Reader &reader, Substance &s) {
    if (const Json *tps = reader.member(doc, "triple_points", "", false)) {
        if (!tps->is_array()) {
            reader.error("/triple_points",
                         "expected an array of triple points, found " + describeType(*tps));
        } else {
            for (std::size_t i = 0; i < tps->size(); ++i)
                if (auto fp =
                        readFixedPoint((*tps)[i], child("/triple_points", i), true, reader, s))
                    s.triplePoints.push_back(std::move(*fp));
        }
    }
    if (const Json *cp = reader.member(doc, "critical_point", "", false))
        s.critical = readFixedPoint(*cp, "/critical_point", false, reader, s);
    readFusion(doc, reader, s);
}

}  // namespace pw::io
