// phasewright-cli classify: the phase of one state point, or of every row of a CSV file,
// with the margins to the nearest boundary (docs/classification.md).
#include <fmt/format.h>

#include <memory>
#include <nlohmann/json.hpp>
#include <optional>
#include <ostream>

#include "app/cli/atomic_output.h"
#include "app/cli/cli.h"
#include "app/cli/state_input.h"
#include "app/cli/substance_arg.h"
#include "core/classify.h"
#include "core/csv/writer.h"
#include "core/errors.h"
#include "core/units.h"

namespace pw::cli {
namespace {

struct ClassifyArgs {
    std::string substance;
    std::optional<double> T, P;
    std::optional<std::string> tUnit, pUnit;
    bool json = false;
    std::string output = "-";
    StateFileOptions file;
    ClassifyOptions tolerance;
};

nlohmann::json number(double v) { return std::isfinite(v) ? nlohmann::json(v) : nlohmann::json(); }

nlohmann::json toJson(const Classification &c, double T, double P) {
    return {{"T_K", T},
            {"P_Pa", P},
            {"phase", toString(c.phase)},
            {"solid_form", c.solidForm},
            {"nearest_boundary", c.nearestLabel},
            {"dT_K", number(c.dT_K)},
            {"dP_Pa", number(c.dP_Pa)},
            {"on_boundary", c.onBoundary},
            {"within_uncertainty", c.withinUncertainty},
            {"extrapolated", c.extrapolated},
            {"reason", c.reason}};
}

void classifyPoint(const ClassifyArgs &a, Io &io) {
    if (!a.T || !a.P) throw CLI::RequiredError("--T and --P (or --input)");
    const TemperatureUnit tu = parseTemperatureUnit(a.tUnit.value_or("K"));
    const PressureUnit pu = parsePressureUnit(a.pUnit.value_or("Pa"));
    const double T = toKelvin(*a.T, tu), P = toPascal(*a.P, pu);
    const auto diagram = loadSubstance(a.substance, io.err);
    const Classification c = classify(*diagram, T, P, a.tolerance);
    if (a.json) {
        nlohmann::json j = toJson(c, T, P);
        j["substance"] = diagram->substance().id;
        io.out << j.dump(2) << '\n';
        return;
    }
    io.out << fmt::format("{} at T = {:.6g} K, P = {:.6g} Pa: {}", diagram->substance().name, T, P,
                          toString(c.phase));
    if (c.phase == Phase::Solid) io.out << " (" << c.solidForm << ")";
    io.out << '\n';
    if (c.phase == Phase::Unknown) io.out << "  reason: " << c.reason << '\n';
    if (!c.nearestLabel.empty())
        io.out << fmt::format("  nearest boundary: {}; dT = {:+.6g} K, dP = {:+.6g} Pa\n",
                              c.nearestLabel, c.dT_K, c.dP_Pa);
    if (const std::string f = flagsText(c); !f.empty()) io.out << "  flags: " << f << '\n';
}

void writeRow(csv::Writer &w, std::string_view record, const ClassificationView &c) {
    w.raw(record);
    w.field(toString(c.phase));
    w.field(c.solidForm);
    w.field(c.nearestLabel);
    w.field(c.dT_K);
    w.field(c.dP_Pa);
    w.field(c.onBoundary ? std::string_view("true") : std::string_view("false"));
    const std::string_view flags = flagsText(c);
    if (c.phase == Phase::Unknown)
        w.field(flags.empty() ? c.reason : fmt::format("{} {}", flags, c.reason));
    else
        w.field(flags);
    w.endRow();
}

void classifyFile(const ClassifyArgs &a, Io &io) {
    const auto diagram = loadSubstance(a.substance, io.err);
    const Classifier classifier(*diagram, a.tolerance);
    const std::string name = a.file.input == "-" ? "<stdin>" : a.file.input;
    InputFile input(a.file.input, io.in);
    csv::Reader reader(input.stream(), name, readerOptions(a.file));
    csv::StateColumnOptions columns = a.file.columns;
    columns.tUnit = a.tUnit;
    columns.pUnit = a.pUnit;
    const csv::StateColumns cols = csv::resolveStateColumns(reader.header(), columns, name);

    AtomicOutput out(a.output, io.out);
    csv::Writer w(out.stream(), reader.delimiter());
    w.raw(reader.headerRecord());
    for (const char *h :
         {"phase", "solid_form", "nearest_boundary", "dT_K", "dP_Pa", "on_boundary", "flags"})
        w.field(h);
    w.endRow();
    long bad = 0;
    for (;;) {
        try {
            if (!reader.next()) break;
            const RowState s = readState(reader, cols, a.file.decimalComma);
            writeRow(w, reader.record(), classifier.view(s.T_K, s.P_Pa));
        } catch (const InputError &e) {
            if (!a.file.skipBad) throw;
            ++bad;
            io.err << "skipped: " << e.what() << '\n';
        }
    }
    w.flush();
    out.commit();
    if (bad > 0) io.err << badRowSummary(bad, name) << '\n';
}

}  // namespace

void addClassifyCommand(CLI::App &app, Io &io) {
    auto a = std::make_shared<ClassifyArgs>();
    CLI::App *cmd = app.add_subcommand(
        "classify",
        "Phase of a state point (--T, --P) or of every row of a CSV file (--input), with the "
        "nearest boundary and the margins dT_K and dP_Pa to it");
    addSubstanceOption(cmd, a->substance);
    auto *t = cmd->add_option("--T", a->T, "temperature (unit: --t-unit, default K)");
    auto *p = cmd->add_option("--P", a->P, "absolute pressure (unit: --p-unit, default Pa)");
    cmd->add_option("--t-unit", a->tUnit, "temperature unit: K, degC, degF, degR");
    cmd->add_option("--p-unit", a->pUnit, "pressure unit: Pa, kPa, MPa, bar, mbar, Torr, mTorr...");
    auto *json = cmd->add_flag("--json", a->json, "single point: print JSON");
    auto *in = cmd->add_option("--input", a->file.input, "CSV file of state points ('-': stdin)");
    auto *outOpt = cmd->add_option("--output", a->output,
                                   "output CSV ('-': stdout, the default); written only "
                                   "when complete");
    in->excludes(t)->excludes(p)->excludes(json);
    outOpt->needs(in);
    addStateFileOptions(cmd, a->file, false);
    addToleranceOptions(cmd, a->tolerance);
    cmd->callback([a, &io] {
        if (a->file.input.empty())
            classifyPoint(*a, io);
        else
            classifyFile(*a, io);
    });
}

}  // namespace pw::cli
