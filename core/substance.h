#pragma once
// A pure substance as described by a substance file (docs/substance-format.md): identity,
// fixed points and the boundary curves with their sources. Pure data; the physics that uses
// it lives in PhaseDiagram (core/phase_diagram.h).
#include <limits>
#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "core/boundary_model.h"
#include "core/model_spec.h"

namespace pw {

inline constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

enum class BoundaryKind { Melting, Vaporization, Sublimation, SolidSolid };
std::string_view toString(BoundaryKind kind);  // "melting", "vaporization", ...

// A published source. `text()` renders "Authors (year). Title. Publication." for captions.
struct Citation {
    std::string authors;
    int year = 0;
    std::string title;
    std::string publication;  // journal + volume/pages, or the standard's number
    std::string note;         // e.g. "from memory", "built by Clausius–Clapeyron"
    std::string text() const;
};

struct Boundary {
    BoundaryKind kind = BoundaryKind::Vaporization;
    std::string solidForm;   // melting/sublimation: which solid ("ice III"); solid-solid: "a|b"
    ModelSpec spec;          // as read from the file (written back unchanged)
    BoundaryModelPtr model;  // makeModel(spec)
    TRange validity;         // published validity range
    double uncertaintyRel = kNaN;  // stated relative uncertainty of p (optional)
    std::string sourceKey;         // key into the file's "sources"
    Citation source;
    std::string note;

    bool extrapolated(double T) const { return !validity.contains(T); }
    // "vaporization", "sublimation", "melting (ice III)" — the name shown to users.
    std::string label() const;
    // The two phases it separates, e.g. {"solid", "liquid"}.
    std::pair<std::string, std::string> phases() const;
};

struct FixedPoint {
    double T_K = kNaN;
    double P_Pa = kNaN;
    std::vector<std::string> phases;  // triple points: e.g. {"ice Ih", "liquid", "vapor"}
    std::string sourceKey;
    Citation source;
};

struct Substance {
    std::string id;  // lower-case with hyphens: "carbon-dioxide"
    std::string name;
    std::string formula;
    std::string cas;
    std::vector<std::string> aliases;
    double molarMass_g_mol = kNaN;
    double acentricFactor = kNaN;
    std::vector<FixedPoint> triplePoints;  // [0]: the solid-liquid-vapor triple point
    std::optional<FixedPoint> critical;
    std::vector<Boundary> boundaries;
    // Optional data at the main triple point for the Clapeyron relations (J/mol, m^3/mol).
    double dHfusTriple_J_mol = kNaN;
    double dVfusTriple_m3_mol = kNaN;
    std::map<std::string, Citation> sources;  // the file's "sources", by key
    std::string fusionSourceKey;
    std::vector<std::string> hazards;
    std::string notes;
    std::string origin;  // where it was loaded from: a path or "bundled:water.json"

    // Case-insensitive match on id, name, formula or alias.
    bool matches(std::string_view key) const;
};

}  // namespace pw
