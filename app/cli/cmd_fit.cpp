// phasewright-cli fit: fit a boundary equation to measured (T, p) data and optionally write it
// into a substance file (docs/fitting.md).
//   --output FILE.json  writes a NEW substance file (refuses to overwrite an existing file);
//   --into FILE.json    merges the boundary into an EXISTING substance file (a boundary of the
//                       same kind is replaced, its old source entry is kept).
#include <fmt/format.h>

#include <CLI/CLI.hpp>
#include <filesystem>
#include <memory>
#include <nlohmann/json.hpp>
#include <optional>
#include <ostream>

#include "app/cli/cli.h"
#include "core/errors.h"
#include "core/fit/fit.h"
#include "core/fit/fit_output.h"
#include "core/substance_io.h"

namespace pw::cli {
namespace {

struct FitArgs {
    std::string input;
    std::string boundary;
    fit::FitRequest request;
    fit::FitCsvOptions csv;
    std::string residuals = "relative";
    std::string name;
    std::string output;
    std::string into;
    bool json = false;
};

BoundaryKind parseKind(const std::string &s) {
    if (s == "vaporization") return BoundaryKind::Vaporization;
    if (s == "sublimation") return BoundaryKind::Sublimation;
    return BoundaryKind::Melting;
}

void printText(const fit::FitResult &r, std::ostream &out) {
    out << fmt::format("{} fit, form '{}': {} points, {:.6g}-{:.6g} K\n", toString(r.kind),
                       r.spec.form, r.points, r.validity.min_K, r.validity.max_K);
    out << "parameters (T in K, p in Pa):\n";
    for (const auto &p : r.parameters) {
        out << fmt::format("  {:<4} = {:>22.15g}  +/- {:.3g}{}\n", p.name, p.value, p.stdError,
                           p.unit.empty() ? "" : " " + p.unit);
    }
    if (r.dH_J_mol) {
        out << fmt::format("  dH   = {:.6g} J/mol +/- {:.3g} (R B)\n", *r.dH_J_mol,
                           *r.dHStdError_J_mol);
    }
    out << fmt::format(
        "deviation (P - P_fit)/P: RMS {:.4g} %, max {:.4g} %; absolute RMS {:.4g} Pa, max {:.4g} "
        "Pa\nleave-one-out RMS {:.4g} %; condition number {:.3g}; {} degrees of freedom\n",
        r.rms_pct, r.maxAbs_pct, r.rms_Pa, r.maxAbs_Pa, r.looRms_pct, r.conditionNumber,
        r.degreesOfFreedom);
    out << fmt::format("{:>6} {:>12} {:>14} {:>14} {:>10} {:>10}\n", "row", "T_K", "P_Pa",
                       "P_fit_Pa", "dev_pct", "loo_pct");
    for (const auto &x : r.residuals) {
        out << fmt::format("{:>6} {:>12.6f} {:>14.7g} {:>14.7g} {:>10.4f} {:>10.4f}\n", x.row,
                           x.T_K, x.P_Pa, x.Pfit_Pa, x.dev_pct, x.loo_pct);
    }
    for (const auto &w : r.warnings) out << "warning: " << w << '\n';
}

// Writes the substance file; returns a sentence saying what was written.
std::string writeResult(const FitArgs &a, const fit::FitResult &r, std::ostream &err) {
    const fit::FitProvenance provenance{a.input, fit::today()};
    std::string done;
    std::vector<std::string> notes;
    if (!a.output.empty()) {
        if (std::filesystem::exists(a.output)) {
            throw Error(a.output + ": exists; --output writes a new file (use --into " + a.output +
                        " to merge the fit into it)");
        }
        const std::string name =
            a.name.empty() ? std::filesystem::path(a.input).stem().string() : a.name;
        const auto s = fit::substanceFromFit(r, a.request, name, provenance);
        notes = fit::writeSubstanceChecked(s, a.output);
        done = fmt::format("wrote {} (substance '{}')", a.output, s.id);
    } else {
        auto read = readSubstanceFile(a.into);
        if (!read.substance) {
            std::string why;
            for (const auto &i : read.issues) why += "\n  " + i.text();
            throw Error(a.into + ": cannot merge into this substance file:" + why);
        }
        if (!a.name.empty()) read.substance->name = a.name;
        const auto what = fit::mergeFit(*read.substance, r, provenance);
        notes = fit::writeSubstanceChecked(*read.substance, a.into);
        done = fmt::format("{} in {}", what, a.into);
    }
    for (const auto &n : notes) err << "phasewright-cli: note: " << n << '\n';
    return done;
}

void runFit(FitArgs &a, Io &io) {
    a.request.kind = parseKind(a.boundary);
    a.request.residuals =
        a.residuals == "absolute" ? fit::ResidualKind::Absolute : fit::ResidualKind::Relative;
    const auto data = fit::readFitCsvFile(a.input, a.csv);
    const auto result = fit::fitBoundary(data, a.request);
    std::optional<std::string> written;
    if (!a.output.empty() || !a.into.empty()) written = writeResult(a, result, io.err);
    if (a.json) {
        auto j = nlohmann::json::parse(fit::fitReportJson(result));
        j["input"] = a.input;
        j["written"] = written ? nlohmann::json(*written) : nlohmann::json();
        io.out << j.dump(2) << '\n';
        return;
    }
    printText(result, io.out);
    if (written) io.out << *written << '\n';
}

}  // namespace

void addFitCommand(CLI::App &app, Io &io) {
    auto a = std::make_shared<FitArgs>();
    CLI::App *cmd = app.add_subcommand(
        "fit",
        "Fit a boundary equation to measured (T, P) data (CSV with units in the header "
        "brackets); report coefficients, standard errors, deviations and a leave-one-out "
        "check; optionally write the boundary into a substance file");
    cmd->add_option("--input", a->input, "CSV file with T and P columns (e.g. 'T [degC]')")
        ->required()
        ->check(CLI::ExistingFile);
    cmd->add_option("--boundary", a->boundary, "vaporization, sublimation or melting")
        ->required()
        ->check(CLI::IsMember({"vaporization", "sublimation", "melting"}));
    cmd->add_option("--model", a->request.model,
                    "clausius-clapeyron, antoine, wagner (vaporization); clausius-clapeyron, "
                    "iapws-sublimation, wagner, antoine (sublimation); simon-glatzel, "
                    "melting-polynomial (melting)")
        ->required();
    cmd->add_option("--Tc", a->request.Tc_K, "critical temperature, K (wagner, vaporization)");
    cmd->add_option("--Pc", a->request.Pc_Pa, "critical pressure, Pa (wagner, vaporization)");
    cmd->add_option("--Tt", a->request.Tt_K, "triple-point temperature, K (sublimation/melting)");
    cmd->add_option("--Pt", a->request.Pt_Pa, "triple-point pressure, Pa (sublimation/melting)");
    cmd->add_option("--exponents", a->request.exponents,
                    "wagner: 1-1.5-3-6 (default), 1-1.5-2.5-5 or a list 1,1.5,2,4; "
                    "iapws-sublimation: the b_i; melting-polynomial: the e_i (default 1,2,3)");
    cmd->add_option("--residuals", a->residuals,
                    "relative (fit ln p, the default) or absolute (fit p in Pa)")
        ->check(CLI::IsMember({"relative", "absolute"}));
    cmd->add_option("--t-unit", a->csv.tUnit, "temperature unit when the header has no brackets");
    cmd->add_option("--p-unit", a->csv.pUnit, "pressure unit when the header has no brackets");
    cmd->add_option("--name", a->name, "substance name for --output (default: the file stem)");
    auto *out = cmd->add_option("--output", a->output,
                                "write a NEW substance file with the fitted boundary");
    auto *into = cmd->add_option("--into", a->into,
                                 "merge the fitted boundary into this EXISTING substance file")
                     ->check(CLI::ExistingFile);
    out->excludes(into);
    cmd->add_flag("--json", a->json, "print the fit report as JSON");
    cmd->callback([a, &io] { runFit(*a, io); });
}

}  // namespace pw::cli
