// phasewright-cli path: the transitions a logged run or planned path crosses, with the
// summary (phases visited, liquid-vapor crossing, minimum margins).
#include <fmt/format.h>

#include <chrono>
#include <cmath>
#include <fstream>
#include <memory>
#include <nlohmann/json.hpp>
#include <optional>
#include <ostream>
#include <sstream>

#include "app/cli/cli.h"
#include "app/cli/state_input.h"
#include "app/cli/substance_arg.h"
#include "core/errors.h"
#include "core/path.h"
#include "core/run/report.h"
#include "core/run/rules.h"
#include "core/run/run_analysis.h"
#include "core/run/run_log.h"

namespace pw::cli {
namespace {

struct PathArgs {
    std::string substance;
    std::optional<std::string> tUnit, pUnit;
    bool json = false;
    std::string rules;      // rule file (docs/runs.md); verdicts printed, exit 3 on a failure
    std::string eventsCsv;  // events + verdicts CSV, written atomically
    StateFileOptions file;
    ClassifyOptions tolerance;
};

struct Run {
    std::vector<State> states;
    std::vector<long> rows;  // file row of each state
    bool isoTime = false;
};

// A process log whose columns are named by role (product_T, chamber_P, timestamp...): the
// run-log reader of core/run guesses the columns and units (docs/runs.md).
Run readProcessLog(const PathArgs &a, Io &io) {
    run::RunLogOptions o;
    if (a.tUnit) o.temperatureUnit = parseTemperatureUnit(*a.tUnit);
    if (a.pUnit) o.pressureUnit = parsePressureUnit(*a.pUnit);
    run::RunLog log = run::readRunLogFile(a.file.input, o);
    for (const std::string &note : log.layout.notes) io.err << "note: " << note << '\n';
    Run run;
    run.states = std::move(log.states);
    for (std::size_t i = 0; i < run.states.size(); ++i) run.rows.push_back(long(i) + 2);
    return run;
}

bool explicitColumns(const PathArgs &a) {
    return !a.file.columns.tColumn.empty() || !a.file.columns.pColumn.empty();
}

Run readRun(const PathArgs &a, Io &io, const std::string &name) {
    if (a.file.input != "-" && !explicitColumns(a)) {
        std::ifstream probe(a.file.input);
        std::string header;
        std::getline(probe, header);
        try {
            std::istringstream line(header + "\n");
            csv::Reader r(line, name, readerOptions(a.file));
            csv::StateColumnOptions columns = a.file.columns;
            columns.tUnit = a.tUnit;
            columns.pUnit = a.pUnit;
            (void)csv::resolveStateColumns(r.header(), columns, name);
        } catch (const InputError &) {
            return readProcessLog(a, io);
        }
    }
    InputFile input(a.file.input, io.in);
    csv::Reader reader(input.stream(), name, readerOptions(a.file));
    csv::StateColumnOptions columns = a.file.columns;
    columns.tUnit = a.tUnit;
    columns.pUnit = a.pUnit;
    const csv::StateColumns cols = csv::resolveStateColumns(reader.header(), columns, name);
    Run run;
    long bad = 0;
    for (;;) {
        try {
            if (!reader.next()) break;
            const RowState s = readState(reader, cols);
            const double t = readTime(reader, cols);
            if (run.states.empty() && cols.time != csv::kNoColumn)
                run.isoTime = csv::parseIsoTime(reader.field(cols.time)).has_value();
            run.states.push_back({t, s.T_K, s.P_Pa});
            run.rows.push_back(reader.row());
        } catch (const InputError &e) {
            if (!a.file.skipBad) throw;
            ++bad;
            io.err << "skipped: " << e.what() << '\n';
        }
    }
    if (bad > 0) io.err << badRowSummary(bad, name) << '\n';
    if (run.states.empty()) throw InputError(name, 0, "", "no state rows");
    return run;
}

// Seconds since 1970 (UTC) as "2026-12-02T14:03:07.250Z".
std::string isoText(double seconds) {
    using namespace std::chrono;
    const auto ms = sys_time<milliseconds>(milliseconds(std::llround(seconds * 1000.0)));
    const auto day = floor<days>(ms);
    const year_month_day ymd(day);
    const hh_mm_ss hms(ms - day);
    return fmt::format("{:04}-{:02}-{:02}T{:02}:{:02}:{:02}.{:03}Z", int(ymd.year()),
                       unsigned(ymd.month()), unsigned(ymd.day()), hms.hours().count(),
                       hms.minutes().count(), hms.seconds().count(), hms.subseconds().count());
}

nlohmann::json timeJson(double t, bool iso) {
    if (!std::isfinite(t)) return nullptr;
    return iso ? nlohmann::json(isoText(t)) : nlohmann::json(t);
}

nlohmann::json finiteOrNull(double v) { return std::isfinite(v) ? nlohmann::json(v) : nullptr; }

nlohmann::json toJson(const PathResult &r, const Run &run, const std::string &id) {
    nlohmann::json events = nlohmann::json::array();
    for (const PathEvent &e : r.events)
        events.push_back({{"transition", toString(e.transition)},
                          {"T_K", e.T_K},
                          {"P_Pa", e.P_Pa},
                          {"time", timeJson(e.time_s, run.isoTime)},
                          {"index", e.index},
                          {"row", run.rows[e.index]},
                          {"from", toString(e.from)},
                          {"to", toString(e.to)},
                          {"detail", e.detail}});
    nlohmann::json phases = nlohmann::json::array();
    for (Phase p : r.summary.phasesVisited) phases.push_back(toString(p));
    nlohmann::json margins = nlohmann::json::object();
    for (const auto &[label, m] : r.summary.minMargins)
        margins[label] = {{"min_abs_dT_K", finiteOrNull(m.minAbsDT_K)},
                          {"min_abs_dP_Pa", finiteOrNull(m.minAbsDP_Pa)},
                          {"index", m.index},
                          {"row", run.rows[m.index]}};
    return {{"substance", id},
            {"events", events},
            {"summary",
             {{"states", r.summary.states},
              {"phases_visited", phases},
              {"crosses_liquid_vapor", r.summary.crossesLiquidVapor},
              {"min_margins", margins}}}};
}

void printText(const PathResult &r, const Run &run, std::ostream &out) {
    out << fmt::format("{} states, {} transition{}\n", r.summary.states, r.events.size(),
                       r.events.size() == 1 ? "" : "s");
    for (const PathEvent &e : r.events) {
        std::string when = fmt::format("row {}", run.rows[e.index]);
        if (std::isfinite(e.time_s))
            when +=
                run.isoTime ? ", " + isoText(e.time_s) : fmt::format(", t = {:.6g} s", e.time_s);
        out << fmt::format("  {:<20} at T = {:.6g} K, P = {:.6g} Pa ({}; {})\n",
                           toString(e.transition), e.T_K, e.P_Pa, when, e.detail);
    }
    std::string phases;
    for (Phase p : r.summary.phasesVisited)
        phases += (phases.empty() ? "" : ", ") + std::string(toString(p));
    out << "phases visited: " << phases << '\n';
    out << "crosses the liquid-vapor boundary: " << (r.summary.crossesLiquidVapor ? "yes" : "no")
        << '\n';
    // A margin that does not exist there (dP of a melting line outside its range) reads "n/a".
    auto value = [](double v, const char *unit) {
        return std::isfinite(v) ? fmt::format("{:.4g} {}", v, unit) : std::string("n/a");
    };
    for (const auto &[label, m] : r.summary.minMargins)
        out << fmt::format("  closest to {}: |dT| = {}, |dP| = {} (row {})\n", label,
                           value(m.minAbsDT_K, "K"), value(m.minAbsDP_Pa, "Pa"), run.rows[m.index]);
}

void runPath(const PathArgs &a, Io &io) {
    const auto diagram = loadSubstance(a.substance, io.err);
    const std::string name = a.file.input == "-" ? "<stdin>" : a.file.input;
    const Run run = readRun(a, io, name);
    std::optional<run::RuleSet> rules;
    if (!a.rules.empty()) rules = run::readRulesFile(a.rules);
    const run::RunAnalysis analysis =
        run::analyseStates(*diagram, run.states, rules ? &*rules : nullptr, a.tolerance);
    const PathResult &r = analysis.path;
    if (a.json) {
        nlohmann::json j = toJson(r, run, diagram->substance().id);
        if (rules) j["verdicts"] = nlohmann::json::parse(run::verdictsJson(analysis.verdicts));
        io.out << j.dump(2) << '\n';
    } else {
        printText(r, run, io.out);
        if (rules) io.out << run::verdictsText(analysis.verdicts);
    }
    if (!a.eventsCsv.empty()) run::writeEventsAndVerdictsCsv(a.eventsCsv, r, analysis.verdicts);
    if (rules && !run::allPassed(analysis.verdicts)) throw RulesFailed();
}

}  // namespace

void addPathCommand(CLI::App &app, Io &io) {
    auto a = std::make_shared<PathArgs>();
    CLI::App *cmd = app.add_subcommand(
        "path", "Transitions crossed by a run or planned path (CSV of states, optionally timed)");
    addSubstanceOption(cmd, a->substance);
    cmd->add_option("--input", a->file.input, "CSV file of states in order ('-': stdin)")
        ->required();
    cmd->add_option("--t-unit", a->tUnit, "temperature unit (when the header has none)");
    cmd->add_option("--p-unit", a->pUnit, "pressure unit (when the header has none)");
    cmd->add_flag("--json", a->json, "print JSON");
    cmd->add_option("--rules", a->rules,
                    "rule file to check the run against (docs/runs.md); exit 3 when a rule fails");
    cmd->add_option("--events-csv", a->eventsCsv,
                    "write the events and rule verdicts to this CSV (atomic)");
    addStateFileOptions(cmd, a->file, true);
    addToleranceOptions(cmd, a->tolerance);
    cmd->callback([a, &io] { runPath(*a, io); });
}

}  // namespace pw::cli
