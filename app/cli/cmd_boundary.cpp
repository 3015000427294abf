// phasewright-cli boundary: every boundary at a temperature (its pressure) or at a pressure
// (its temperature).
#include <fmt/format.h>

#include <memory>
#include <nlohmann/json.hpp>
#include <optional>
#include <ostream>

#include "app/cli/cli.h"
#include "app/cli/state_input.h"
#include "app/cli/substance_arg.h"
#include "core/units.h"

namespace pw::cli {
namespace {

struct BoundaryArgs {
    std::string substance;
    std::optional<double> T, P;
    std::optional<std::string> tUnit, pUnit;
    bool json = false;
};

void runBoundary(const BoundaryArgs &a, Io &io) {
    const auto diagram = loadSubstance(a.substance, io.err);
    const bool atT = a.T.has_value();
    const TemperatureUnit tu = parseTemperatureUnit(a.tUnit.value_or("K"));
    const PressureUnit pu = parsePressureUnit(a.pUnit.value_or("Pa"));
    const double x = atT ? toKelvin(*a.T, tu) : toPascal(*a.P, pu);
    const std::vector<BoundaryValue> values =
        atT ? diagram->pressuresAt(x) : diagram->temperaturesAt(x);
    nlohmann::json list = nlohmann::json::array();
    for (const BoundaryValue &v : values) {
        const Boundary &b = *v.boundary;
        const auto [first, second] = b.phases();
        nlohmann::json j = {{"kind", toString(b.kind)},
                            {"label", b.label()},
                            {"phases", {first, second}},
                            {"extrapolated", v.extrapolated}};
        if (!b.solidForm.empty()) j["solid_form"] = b.solidForm;
        j[atT ? "P_Pa" : "T_K"] = v.value;
        list.push_back(std::move(j));
    }
    if (a.json) {
        nlohmann::json out = {{"substance", diagram->substance().id}, {"boundaries", list}};
        out[atT ? "T_K" : "P_Pa"] = x;
        io.out << out.dump(2) << '\n';
        return;
    }
    io.out << fmt::format("{} at {} = {:.10g} {}: {} boundar{}\n", diagram->substance().name,
                          atT ? "T" : "P", x, atT ? "K" : "Pa", values.size(),
                          values.size() == 1 ? "y" : "ies");
    for (const BoundaryValue &v : values) {
        const auto [first, second] = v.boundary->phases();
        io.out << fmt::format("  {:<22} {:>8} | {:<8} {} = {:.10g} {}{}\n", v.boundary->label(),
                              first, second, atT ? "P" : "T", v.value, atT ? "Pa" : "K",
                              v.extrapolated ? "  (extrapolated)" : "");
    }
}

}  // namespace

void addBoundaryCommand(CLI::App &app, Io &io) {
    auto a = std::make_shared<BoundaryArgs>();
    CLI::App *cmd = app.add_subcommand(
        "boundary",
        "Every phase boundary at a temperature (its pressure) or at a pressure (its "
        "temperature)");
    addSubstanceOption(cmd, a->substance);
    const auto [t, p] = addStatePointOptions(cmd, a->T, a->P, a->tUnit, a->pUnit);
    t->excludes(p);
    cmd->add_flag("--json", a->json, "print JSON");
    cmd->callback([a, &io] {
        if (!a->T && !a->P) throw CLI::RequiredError("--T or --P");
        runBoundary(*a, io);
    });
}

}  // namespace pw::cli
