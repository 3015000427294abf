// phasewright-cli compare: two substances side by side (core/compare.h, docs/compare.md).
#include <fmt/format.h>

#include <array>
#include <memory>
#include <nlohmann/json.hpp>
#include <ostream>

#include "app/cli/cli.h"
#include "app/cli/report_parts.h"
#include "app/cli/substance_arg.h"
#include "core/compare.h"
#include "core/units.h"

namespace pw::cli {
namespace {

struct CompareArgs {
    std::vector<std::string> substances;
    std::optional<double> T, P;
    std::string tUnit = "K";
    std::string pUnit = "Pa";
    bool json = false;
};

struct Units {
    TemperatureUnit t;
    PressureUnit p;
};

// ---- JSON -----------------------------------------------------------------------------------

const FixedPoint *ptr(const std::optional<FixedPoint> &fp) { return fp ? &*fp : nullptr; }

bool isFixedPointRow(const std::string &key) {
    return key.starts_with("triple_point_T_K") || key.starts_with("triple_point_P_Pa") ||
           key.starts_with("critical_point_");
}

Json substanceJson(const SubstanceSummary &s, const Comparison &c, bool isA) {
    Json tps = Json::array();
    for (const auto &tp : s.triplePoints)
        tps.push_back({{"T_K", tp.T_K}, {"P_Pa", tp.P_Pa}, {"phases", tp.phases}});
    Json j{{"id", s.id},
           {"name", s.name},
           {"triple_point", pointJson(ptr(s.triple))},
           {"triple_points", tps},
           {"critical_point", pointJson(ptr(s.critical))}};
    Json notes = Json::object();
    for (const auto &r : c.rows) {
        if (isFixedPointRow(r.key)) continue;
        j[r.key] = optionalNumber(isA ? r.a : r.b);
        const std::string &note = isA ? r.noteA : r.noteB;
        if (!note.empty()) notes[r.key] = note;
    }
    j["solid_denser_than_liquid"] =
        s.solidDenserThanLiquid ? Json(*s.solidDenserThanLiquid) : Json(nullptr);
    j["notes"] = notes;
    return j;
}

Json compareJson(const Comparison &c) {
    std::string keyA = c.a.id, keyB = c.b.id;
    if (keyB == keyA) keyB += " (B)";  // the same id twice (a user file beside the bundled one)
    Json diffs = Json::object();
    for (const auto &r : c.rows) diffs[r.key] = optionalNumber(r.difference());
    Json volatileId = nullptr;
    if (c.moreVolatileAtT) volatileId = *c.moreVolatileAtT == 0 ? keyA : keyB;
    Json j{
        {"a", keyA},
        {"b", keyB},
        {"conditions",
         {{"T_K", optionalNumber(c.conditions.T_K)}, {"P_Pa", optionalNumber(c.conditions.P_Pa)}}}};
    j[keyA] = substanceJson(c.a, c, true);
    j[keyB] = substanceJson(c.b, c, false);
    j["differences_b_minus_a"] = diffs;
    j["more_volatile_at_T"] = volatileId;
    j["cautions"] = Json::array({kGeneralCaution});
    return j;
}

// ---- text -----------------------------------------------------------------------------------

std::string valueText(Quantity q, const std::optional<double> &v, const Units &u) {
    if (!v) return "none";
    switch (q) {
        case Quantity::Temperature:
            return fmt::format("{:.6g} {}", fromKelvin(*v, u.t), symbol(u.t));
        case Quantity::Pressure:
            return fmt::format("{:.6g} {}", fromPascal(*v, u.p), symbol(u.p));
        case Quantity::Enthalpy:
            return fmt::format("{:.4g} kJ/mol", *v / 1000.0);
        case Quantity::Sign:
            return *v > 0 ? "+ (rises)" : "- (falls)";
        case Quantity::Reduced:
            return fmt::format("{:.4g}", *v);
    }
    return {};
}

std::string differenceText(const CompareRow &r, const Units &u) {
    const auto d = r.difference();
    if (!d) return "-";
    switch (r.quantity) {
        case Quantity::Temperature:
            return fmt::format("{:+.4g} {}", differenceFromKelvin(*d, u.t),
                               u.t == TemperatureUnit::Celsius ? "K" : symbol(u.t));
        case Quantity::Pressure:
            return fmt::format("{:+.4g} {} (B/A = {:.4g})", *d / pascalPer(u.p), symbol(u.p),
                               r.ratio().value_or(kNaN));
        case Quantity::Enthalpy:
            return fmt::format("{:+.4g} kJ/mol", *d / 1000.0);
        case Quantity::Sign:
            return *d == 0.0 ? "same" : "differ";
        case Quantity::Reduced:
            return fmt::format("{:+.4g}", *d);
    }
    return {};
}

std::string withNote(std::string text, const std::string &note) {
    return note.empty() ? text : text + " (" + note + ")";
}

std::string rowLabel(const CompareRow &r, const Comparison &c, const Units &u) {
    if (r.key == "vapor_pressure_at_T_Pa" && c.conditions.T_K)
        return fmt::format("Vapor pressure at {:.6g} {}", fromKelvin(*c.conditions.T_K, u.t),
                           symbol(u.t));
    if (r.key == "saturation_temperature_at_P_K" && c.conditions.P_Pa)
        return fmt::format("Boiling/sublimation T at {:.6g} {}",
                           fromPascal(*c.conditions.P_Pa, u.p), symbol(u.p));
    return r.label;
}

void writeOtherTriplePoints(const SubstanceSummary &s, const Units &u, std::ostream &out) {
    for (std::size_t i = 1; i < s.triplePoints.size(); ++i) {
        const auto &tp = s.triplePoints[i];
        std::string phases;
        for (const auto &p : tp.phases) phases += (phases.empty() ? "" : "/") + p;
        out << fmt::format("  {}: {} at {}, {}\n", s.id, phases.empty() ? "triple point" : phases,
                           valueText(Quantity::Temperature, tp.T_K, u),
                           valueText(Quantity::Pressure, tp.P_Pa, u));
    }
}

void writeText(const Comparison &c, const Units &u, std::ostream &out) {
    out << fmt::format("A: {} ({})\nB: {} ({})\n\n", c.a.name, c.a.id, c.b.name, c.b.id);
    std::vector<std::array<std::string, 4>> cells;
    cells.push_back({"Quantity", "A: " + c.a.id, "B: " + c.b.id, "B - A"});
    for (const auto &r : c.rows)
        cells.push_back({rowLabel(r, c, u), withNote(valueText(r.quantity, r.a, u), r.noteA),
                         withNote(valueText(r.quantity, r.b, u), r.noteB), differenceText(r, u)});
    std::array<std::size_t, 4> width{};
    for (const auto &row : cells)
        for (std::size_t k = 0; k < 4; ++k) width[k] = std::max(width[k], row[k].size());
    for (const auto &row : cells)
        out << fmt::format("{:<{}}  {:<{}}  {:<{}}  {}\n", row[0], width[0], row[1], width[1],
                           row[2], width[2], row[3]);
    out << "  (normal = at 101325 Pa; enthalpies by Clausius-Clapeyron from the curves, ideal "
           "vapor; a rising melting curve means the solid is denser than its liquid)\n";
    if (c.conditions.T_K) {
        const std::string at = valueText(Quantity::Temperature, c.conditions.T_K, u);
        if (c.moreVolatileAtT)
            out << fmt::format("\nMore volatile at {}: {}\n", at,
                               *c.moreVolatileAtT == 0 ? c.a.name : c.b.name);
        else
            out << fmt::format("\nMore volatile at {}: cannot tell (no vapor pressure)\n", at);
    }
    if (c.a.triplePoints.size() > 1 || c.b.triplePoints.size() > 1) {
        out << "\nOther triple points:\n";
        writeOtherTriplePoints(c.a, u, out);
        writeOtherTriplePoints(c.b, u, out);
    }
    out << "\nCaution: " << kGeneralCaution << '\n';
}

void runCompare(const CompareArgs &a, Io &io) {
    if (a.substances.size() != 2)
        throw CLI::ValidationError("--substance", "compare needs exactly two substances, got " +
                                                      std::to_string(a.substances.size()));
    const Units u{parseTemperatureUnit(a.tUnit), parsePressureUnit(a.pUnit)};
    CompareConditions conditions;
    if (a.T) conditions.T_K = toKelvin(*a.T, u.t);
    if (a.P) conditions.P_Pa = toPascal(*a.P, u.p);
    const auto first = resolveSubstance(a.substances.at(0), io.err);
    const auto second = resolveSubstance(a.substances.at(1), io.err);
    const Comparison c = compare(*first, *second, conditions);
    if (a.json)
        io.out << compareJson(c).dump(2, ' ', false, nlohmann::json::error_handler_t::replace)
               << '\n';
    else
        writeText(c, u, io.out);
}

}  // namespace

void addCompareCommand(CLI::App &app, Io &io) {
    auto *cmd = app.add_subcommand(
        "compare",
        "Compare two substances side by side: triple and critical points (also reduced, T/Tc "
        "and p/pc), normal melting, boiling and sublimation points, the vapor pressure at a "
        "chosen temperature (which one is more volatile), the boiling or sublimation "
        "temperature at a chosen pressure, the melting-curve slope sign and the enthalpies "
        "of vaporization and sublimation the curves imply at the triple point, with B - A.");
    auto a = std::make_shared<CompareArgs>();
    cmd->add_option("--substance", a->substances,
                    std::string(kSubstanceHelp) + "; give it twice: A, then B")
        ->required();
    cmd->add_option("--T", a->T, "temperature for the vapor-pressure row (unit: --t-unit)");
    cmd->add_option("--P", a->P,
                    "absolute pressure for the boiling-temperature row (unit: --p-unit)");
    cmd->add_option("--t-unit", a->tUnit, "temperature unit: K, degC, degF, degR");
    cmd->add_option("--p-unit", a->pUnit, "pressure unit: Pa, kPa, MPa, bar, mbar, Torr, mTorr...");
    cmd->add_flag("--json", a->json,
                  "write JSON: each substance's values under its id (triple_point {T_K, P_Pa}, "
                  "critical_point {T_K, P_Pa} as in info; null where absent), "
                  "differences_b_minus_a and more_volatile_at_T");
    cmd->footer(
        "Examples:\n  phasewright-cli compare --substance water --substance D2O --T 300 --P 10\n"
        "  phasewright-cli compare --substance CO2 --substance N2 --T -20 --t-unit degC --json");
    cmd->callback([&io, a] { runCompare(*a, io); });
}

}  // namespace pw::cli
