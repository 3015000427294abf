// phasewright-cli classify: the phase of one state point, or of every row of a CSV file,
// with the margins to the nearest boundary (docs/classification.md).
#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cstdint>
#include <memory>
#include <nlohmann/json.hpp>
#include <optional>
#include <ostream>
#include <string>
#include <thread>
#include <vector>

#include "app/cli/atomic_output.h"
#include "app/cli/cli.h"
#include "app/cli/state_input.h"
#include "app/cli/substance_arg.h"
#include "core/classify.h"
#include "core/csv/state_rows.h"
#include "core/csv/writer.h"
#include "core/errors.h"
#include "core/ordered_pipeline.h"
#include "core/units.h"

namespace pw::cli {
namespace {

// Significant digits of dT_K and dP_Pa in CSV output. The curve tables behind them are good
// to 1e-11 K and 1e-13 in p (core/solver.h): digits past the twelfth would be noise.
constexpr int kDefaultDigits = 12;

struct ClassifyArgs {
    std::string substance;
    std::optional<double> T, P;
    std::optional<std::string> tUnit, pUnit;
    bool json = false;
    std::string output = "-";
    StateFileOptions file;
    ClassifyOptions tolerance;
    int threads = 0;  // 0: one per core
    int digits = kDefaultDigits;
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
    // A margin that does not exist there (dP above the triple temperature on the sublimation
    // curve) reads "n/a".
    auto margin = [](double v, const char *unit) {
        return std::isfinite(v) ? fmt::format("{:+.6g} {}", v, unit) : std::string("n/a");
    };
    if (!c.nearestLabel.empty())
        io.out << fmt::format("  nearest boundary: {}; dT = {}, dP = {}\n", c.nearestLabel,
                              margin(c.dT_K, "K"), margin(c.dP_Pa, "Pa"));
    if (const std::string f = flagsText(c); !f.empty()) io.out << "  flags: " << f << '\n';
}

// Whether every text a classification of this diagram can hold (phase names, solid forms,
// boundary labels, flags) goes into a field unquoted: then rows skip the per-field scan.
bool plainTexts(const PhaseDiagram &diagram, const csv::Writer &w) {
    std::vector<std::string> texts{"solid",          "liquid",
                                   "vapor",          "gas",
                                   "supercritical",  "unknown",
                                   "true",           "false",
                                   "critical point", "on_boundary within_uncertainty extrapolated"};
    for (const Boundary &b : diagram.substance().boundaries) {
        texts.push_back(b.label());
        texts.push_back(b.solidForm);
    }
    return std::none_of(texts.begin(), texts.end(),
                        [&](const std::string &t) { return w.needsQuotes(t); });
}

// The fixed texts of a plain row around its margins, composed once for each combination
// met: before them ",solid,ice Ih,melting (ice Ih),", after them ",false," or
// ",true,on_boundary" (one append each instead of a field each).
class RowTexts {
public:
    explicit RowTexts(char delimiter) : d_(delimiter) {
        for (int i = 0; i < 8; ++i) {
            ClassificationView c;
            c.onBoundary = (i & 1) != 0;
            c.withinUncertainty = (i & 2) != 0;
            c.extrapolated = (i & 4) != 0;
            after_[static_cast<std::size_t>(i)] =
                fmt::format("{}{}{}{}", d_, c.onBoundary ? "true" : "false", d_, flagsText(c));
        }
    }
    // Cached by the addresses of the texts (a classifier's texts stay where they are), in an
    // open-addressing table: a diagram has a few dozen combinations at most.
    std::string_view before(const ClassificationView &c) {
        const auto address = [](std::string_view t) {
            return static_cast<std::uint64_t>(reinterpret_cast<std::uintptr_t>(t.data()));
        };
        const std::uint64_t h = (address(c.solidForm) * 0x9E3779B97F4A7C15ull) ^
                                (address(c.nearestLabel) * 0xC2B2AE3D27D4EB4Full) ^
                                static_cast<std::uint64_t>(c.phase);
        for (std::size_t i = (h >> 32) % kSlots;; i = (i + 1) % kSlots) {
            Slot &s = slots_[i];
            if (!s.used) {
                if (++used_ > kSlots / 2) {  // not expected: start again rather than fill up
                    for (Slot &t : slots_) t.used = false;
                    used_ = 0;
                    return before(c);
                }
                s = {true, c.phase, c.solidForm, c.nearestLabel,
                     fmt::format("{}{}{}{}{}{}{}", d_, toString(c.phase), d_, c.solidForm, d_,
                                 c.nearestLabel, d_)};
                return s.text;
            }
            if (s.phase == c.phase && s.form.data() == c.solidForm.data() &&
                s.form.size() == c.solidForm.size() && s.label.data() == c.nearestLabel.data() &&
                s.label.size() == c.nearestLabel.size())
                return s.text;
        }
    }
    std::string_view after(const ClassificationView &c) const {
        return after_[(c.onBoundary ? 1u : 0u) + (c.withinUncertainty ? 2u : 0u) +
                      (c.extrapolated ? 4u : 0u)];
    }

private:
    static constexpr std::size_t kSlots = 64;
    struct Slot {
        bool used = false;
        Phase phase = Phase::Unknown;
        std::string_view form, label;
        std::string text;
    };
    char d_;
    std::size_t used_ = 0;
    std::array<Slot, kSlots> slots_;
    std::array<std::string, 8> after_;
};

// `texts`: set when every text a classification can hold goes into a field unquoted
// (plainTexts()); then rows are composed from them.
void writeRow(csv::Writer &w, std::string_view record, const ClassificationView &c,
              RowTexts *texts) {
    w.raw(record);
    if (texts != nullptr && c.phase != Phase::Unknown) {
        w.append(texts->before(c));
        w.appendNumber(c.dT_K);
        w.field(c.dP_Pa);
        w.append(texts->after(c));
        w.endRow();
        return;
    }
    const std::string_view flags = flagsText(c);
    const std::string_view onBoundary = c.onBoundary ? "true" : "false";
    w.field(toString(c.phase));
    w.field(c.solidForm);
    w.field(c.nearestLabel);
    w.field(c.dT_K);
    w.field(c.dP_Pa);
    w.field(onBoundary);
    if (c.phase == Phase::Unknown)
        w.field(flags.empty() ? c.reason : fmt::format("{} {}", flags, c.reason));
    else
        w.field(flags);
    w.endRow();
}

// Rows travel in blocks of input text: the reading thread cuts the file into blocks of whole
// records, worker threads read, classify and format them (csv::StateRowScanner), the reading
// thread writes the finished blocks and reports their bad rows in input order
// (core/ordered_pipeline.h).
struct RowBlock {
    csv::TextBlock input;
    csv::Writer text;                 // the output rows
    std::vector<csv::BadRow> bad;     // lines counted from the block's first line
    long lines = 0;                   // line ends in the block
    long rows = 0;                    // good rows written
    std::unique_ptr<RowTexts> texts;  // writeRow's `texts`

    RowBlock(char delimiter, bool decimalComma, int digits) : text(delimiter) {
        text.setDecimalComma(decimalComma);
        text.setSignificantDigits(digits);
    }
};

constexpr std::size_t kBlockBytes = std::size_t{64} << 10;

unsigned workerThreads(int threads) {
    const unsigned n = threads > 0 ? static_cast<unsigned>(threads)
                                   : std::max(1u, std::thread::hardware_concurrency());
    return n == 1 ? 0 : n;
}

// Without --skip-bad the first bad row ends the block's work: it fails the command.
void classifyBlock(const Classifier &classifier, const csv::StateRowScanner &scanner, bool skipBad,
                   RowBlock &b) {
    b.text.clear();
    b.bad.clear();
    b.rows = 0;
    b.lines = scanner.scan(
        b.input,
        [&](std::string_view record, double T, double P) {
            writeRow(b.text, record, classifier.view(T, P), b.texts.get());
            ++b.rows;
        },
        [&](csv::BadRow &&row) {
            b.bad.push_back(std::move(row));
            return skipBad;
        });
}

void writeHeader(AtomicOutput &out, const csv::Reader &reader) {
    csv::Writer w(out.stream(), reader.delimiter());
    w.raw(reader.headerRecord());
    for (const char *h :
         {"phase", "solid_form", "nearest_boundary", "dT_K", "dP_Pa", "on_boundary", "flags"})
        w.field(h);
    w.endRow();
    w.flush();
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
    const csv::StateRowScanner scanner(reader, cols, a.file.decimalComma);

    AtomicOutput out(a.output, io.out);
    writeHeader(out, reader);
    long bad = 0, rows = 0, line = reader.nextLine();
    const unsigned workers = workerThreads(a.threads);
    OrderedPipeline<RowBlock> pipeline(
        workers, 2 * workers + 2,
        [&] {
            RowBlock b(reader.delimiter(), a.file.decimalComma, a.digits);
            if (plainTexts(*diagram, b.text))
                b.texts = std::make_unique<RowTexts>(reader.delimiter());
            return b;
        },
        [&](RowBlock &b) { classifyBlock(classifier, scanner, a.file.skipBad, b); },
        [&](RowBlock &b) {
            for (const csv::BadRow &r : b.bad) {
                if (!a.file.skipBad) throw r.error(name, line);
                ++bad;
                io.err << "skipped: " << r.error(name, line).what() << '\n';
            }
            out.stream().write(b.text.text().data(),
                               static_cast<std::streamsize>(b.text.text().size()));
            rows += b.rows;
            line += b.lines;
        });
    while (reader.nextBlock(pipeline.next().input, kBlockBytes)) pipeline.submit();
    pipeline.finish();
    if (rows == 0 && bad == 0)
        throw InputError(name, 2, "", "the file has a header but no data rows");
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
    const auto [t, p] = addStatePointOptions(cmd, a->T, a->P, a->tUnit, a->pUnit);
    auto *json = cmd->add_flag("--json", a->json, "single point: print JSON");
    auto *in = cmd->add_option("--input", a->file.input, "CSV file of state points ('-': stdin)");
    auto *outOpt = cmd->add_option("--output", a->output,
                                   "output CSV ('-': stdout, the default); written only "
                                   "when complete");
    in->excludes(t)->excludes(p)->excludes(json);
    outOpt->needs(in);
    addStateFileOptions(cmd, a->file, false);
    addToleranceOptions(cmd, a->tolerance);
    cmd->add_option("--threads", a->threads,
                    "CSV input: threads for classifying and formatting (0: one per core; 1: "
                    "all in one thread); the output is the same for any number")
        ->capture_default_str()
        ->check(CLI::Range(0, 256))
        ->needs(in);
    cmd->add_option("--digits", a->digits,
                    "CSV input: significant digits of dT_K and dP_Pa (1 to 17; 17 reads back "
                    "to the exact double)")
        ->capture_default_str()
        ->check(CLI::Range(1, 17))
        ->needs(in);
    cmd->callback([a, &io] {
        if (a->file.input.empty())
            classifyPoint(*a, io);
        else
            classifyFile(*a, io);
    });
}

}  // namespace pw::cli
