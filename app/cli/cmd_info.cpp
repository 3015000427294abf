// phasewright-cli info: the fixed points, derived quantities, curves, sources and cautions of
// one substance.
#include <fmt/format.h>

#include <memory>
#include <nlohmann/json.hpp>
#include <ostream>

#include "app/cli/cli.h"
#include "app/cli/report_parts.h"
#include "app/cli/substance_arg.h"
#include "core/units.h"

namespace pw::cli {
namespace {

Json boundaryJson(const Boundary &b) {
    Json j{{"kind", std::string(toString(b.kind))},
           {"label", b.label()},
           {"solid_form", b.solidForm},
           {"model", b.spec.form},
           {"validity", {{"T_min_K", b.validity.min_K}, {"T_max_K", b.validity.max_K}}},
           {"uncertainty_rel", std::isfinite(b.uncertaintyRel) ? Json(b.uncertaintyRel) : Json()},
           {"source", b.source.text()}};
    if (!b.note.empty()) j["note"] = b.note;
    return j;
}

std::string verdict(const PhaseDiagram &d) {
    const auto sign = d.meltSlopeSign();
    const auto denser = d.solidDenserThanLiquid();
    if (!sign || !denser) return "unknown (no melting curve at the triple point)";
    return fmt::format("dp/dT {} 0 on the melting curve: the solid is {} than its liquid{}",
                       *sign > 0 ? ">" : "<", *denser ? "denser" : "less dense",
                       *denser ? " (it sinks)" : " (it floats)");
}

Json infoJson(const PhaseDiagram &d) {
    const Substance &s = d.substance();
    Json tps = Json::array();
    for (const auto &tp : s.triplePoints)
        tps.push_back({{"T_K", tp.T_K},
                       {"P_Pa", tp.P_Pa},
                       {"phases", tp.phases},
                       {"source", tp.source.text()}});
    Json boundaries = Json::array();
    for (const auto &b : s.boundaries) boundaries.push_back(boundaryJson(b));
    Json sources = Json::array();
    for (const auto &[key, c] : s.sources) sources.push_back({{"key", key}, {"text", c.text()}});
    Json cautions = s.hazards;
    cautions.push_back(kGeneralCaution);
    return Json{
        {"id", s.id},
        {"name", s.name},
        {"formula", s.formula},
        {"cas", s.cas},
        {"aliases", s.aliases},
        {"molar_mass_g_mol", std::isfinite(s.molarMass_g_mol) ? Json(s.molarMass_g_mol) : Json()},
        {"origin", s.origin},
        {"triple_point", pointJson(d.triplePoint())},
        {"triple_points", tps},
        {"critical_point", pointJson(d.criticalPoint())},
        {"normal_melting_point_K", optionalNumber(d.normalMeltingPoint())},
        {"normal_boiling_point_K", optionalNumber(d.normalBoilingPoint())},
        {"normal_sublimation_point_K", optionalNumber(d.normalSublimationPoint())},
        {"melt_slope_sign", d.meltSlopeSign() ? Json(*d.meltSlopeSign()) : Json()},
        {"solid_denser_than_liquid",
         d.solidDenserThanLiquid() ? Json(*d.solidDenserThanLiquid()) : Json()},
        {"implied_enthalpies_J_mol",
         {{"vaporization", optionalNumber(d.dHvapTriple())},
          {"sublimation", optionalNumber(d.dHsubTriple())},
          {"fusion", optionalNumber(d.dHfusTriple())}}},
        {"boundaries", boundaries},
        {"sources", sources},
        {"hazards", s.hazards},
        {"cautions", cautions}};
}

std::string kelvin(const std::optional<double> &T) {
    return T ? fmt::format("{:.6g} K ({:.2f} degC)", *T, *T - 273.15) : "none";
}

std::string point(const FixedPoint &fp) {
    return fmt::format("{:.7g} K ({:.3f} degC), {:.7g} Pa", fp.T_K, fp.T_K - 273.15, fp.P_Pa);
}

std::string enthalpy(const std::optional<double> &h) {
    return h ? fmt::format("{:.4g} kJ/mol", *h / 1000.0) : "n/a";
}

void writeFixedPoints(const PhaseDiagram &d, std::ostream &out) {
    const Substance &s = d.substance();
    if (s.triplePoints.empty()) out << "Triple point:          unknown\n";
    for (std::size_t i = 0; i < s.triplePoints.size(); ++i) {
        const auto &tp = s.triplePoints[i];
        std::string phases;
        for (const auto &p : tp.phases) phases += (phases.empty() ? "" : "/") + p;
        out << fmt::format("{:<22} {}{}\n",
                           i == 0 ? "Triple point:" : "Other triple point:", point(tp),
                           phases.empty() ? "" : "  [" + phases + "]");
    }
    out << fmt::format("{:<22} {}\n", "Critical point:",
                       d.criticalPoint() ? point(*d.criticalPoint()) : "unknown");
    out << fmt::format("{:<22} {}\n", "Normal melting point:", kelvin(d.normalMeltingPoint()));
    out << fmt::format("{:<22} {}\n", "Normal boiling point:", kelvin(d.normalBoilingPoint()));
    out << fmt::format("{:<22} {}\n", "Normal sublimation:", kelvin(d.normalSublimationPoint()));
    out << "  (normal = at 101325 Pa; 'none' where that isobar does not meet the curve)\n";
}

void writeText(const PhaseDiagram &d, std::ostream &out) {
    const Substance &s = d.substance();
    out << fmt::format("{} ({})  formula {}  CAS {}\n", s.name, s.id,
                       s.formula.empty() ? "-" : s.formula, s.cas.empty() ? "-" : s.cas);
    if (std::isfinite(s.molarMass_g_mol))
        out << fmt::format("Molar mass: {:.6g} g/mol\n", s.molarMass_g_mol);
    out << "Loaded from: " << s.origin << "\n\n";
    writeFixedPoints(d, out);
    out << fmt::format("\nMelt slope: {}\n", verdict(d));
    out << fmt::format(
        "Enthalpies at the triple point implied by the curves: vaporization {}, "
        "sublimation {}, fusion {}\n",
        enthalpy(d.dHvapTriple()), enthalpy(d.dHsubTriple()), enthalpy(d.dHfusTriple()));
    out << "\nBoundaries (published validity ranges; outside them results are extrapolated):\n";
    for (const auto &b : s.boundaries) {
        out << fmt::format("  {:<24} {:<20} {:.6g} to {:.6g} K{}\n", b.label(), b.spec.form,
                           b.validity.min_K, b.validity.max_K,
                           std::isfinite(b.uncertaintyRel)
                               ? fmt::format(", u(p) = {:.3g} %", b.uncertaintyRel * 100.0)
                               : "");
        out << "      " << b.source.text() << '\n';
    }
    out << "\nCautions:\n";
    for (const auto &h : s.hazards) out << "  - " << h << '\n';
    out << "  - " << kGeneralCaution << '\n';
}

}  // namespace

void addInfoCommand(CLI::App &app, Io &io) {
    auto *cmd = app.add_subcommand(
        "info",
        "Show what the library knows about one substance: triple point(s), critical point, "
        "normal melting, boiling and sublimation points (at 101325 Pa), the sign of the "
        "melting-curve slope with the solid-vs-liquid density verdict, the enthalpies the "
        "curves imply at the triple point, each boundary with its validity range and source, "
        "and the cautions.");
    auto key = std::make_shared<std::string>();
    auto json = std::make_shared<bool>(false);
    addSubstanceOption(cmd, *key);
    cmd->add_flag("--json", *json,
                  "write JSON (keys include triple_point {T_K, P_Pa}, critical_point, "
                  "normal_melting_point_K, normal_boiling_point_K, normal_sublimation_point_K, "
                  "solid_denser_than_liquid; null where absent)");
    cmd->footer(
        "Examples:\n  phasewright-cli info --substance CO2\n"
        "  phasewright-cli info --substance water --json\n"
        "  phasewright-cli info --substance ./my-compound.json");
    cmd->callback([&io, key, json] {
        const auto diagram = resolveSubstance(*key, io.err);
        if (*json)
            io.out << infoJson(*diagram).dump(2, ' ', false,
                                              nlohmann::json::error_handler_t::replace)
                   << '\n';
        else
            writeText(*diagram, io.out);
    });
}

}  // namespace pw::cli
