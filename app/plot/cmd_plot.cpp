// phasewright-cli plot: an annotated figure (PNG, SVG or PDF) drawn headlessly by the same
// code as the desktop (widgets/figure). Built only with the GUI, into the library
// phasewright_cli_plot: the helper program phasewright-plot (app/plot/main.cpp) runs it for
// phasewright-cli, which links no Qt (app/cli/plot_forward.cpp).
#include <fmt/format.h>

#include <CLI/CLI.hpp>
#include <QApplication>
#include <charconv>
#include <memory>
#include <regex>

#include "app/cli/cli.h"
#include "app/cli/state_input.h"
#include "app/cli/substance_arg.h"
#include "core/errors.h"
#include "core/units.h"
#include "widgets/diagram_scene.h"
#include "widgets/figure/figure_export.h"
#include "widgets/format.h"

namespace pw::cli {
namespace {

struct PlotArgs {
    std::vector<std::string> substances;
    std::string points;
    std::vector<std::string> guides;
    std::string title;
    bool linearP = false;
    std::string output;
    double widthMm = 85.0, heightMm = 0.0;
    int dpi = 300, widthPx = 0, heightPx = 0;
    std::string tUnit = "K", pUnit = "Pa";
    std::vector<double> tRange, pRange;
    bool noCaption = false, noLegend = false, caution = false, noAtmosphere = false;
    bool noRegions = false;
};

// A QApplication for the command when none exists (the CLI never shows a window: without a
// platform chosen by the user it uses the offscreen one, so no display is needed).
struct HeadlessApp {
    int argc = 1;
    char name[16] = "phasewright-cli";
    char *argv[2] = {name, nullptr};
    std::unique_ptr<QApplication> app;
    HeadlessApp() {
        if (QCoreApplication::instance()) return;
        if (qEnvironmentVariableIsEmpty("QT_QPA_PLATFORM"))
            qputenv("QT_QPA_PLATFORM", QByteArrayLiteral("offscreen"));
        app = std::make_unique<QApplication>(argc, argv);
    }
};

double parseDouble(const std::string &text, const std::string &what) {
    std::string t = text;
    if (const auto pos = t.find("\xE2\x88\x92"); pos != std::string::npos) t.replace(pos, 3, "-");
    double v = 0;
    const auto r = std::from_chars(t.data(), t.data() + t.size(), v);
    if (r.ec != std::errc() || r.ptr != t.data() + t.size() || !std::isfinite(v))
        throw Error(fmt::format("{}: '{}' is not a number", what, text));
    return v;
}

// "P=13.33 Pa: chamber", "T=-35 degC: collapse", "P = 100 mTorr".
ui::GuideLine parseGuide(const std::string &text) {
    static const std::regex re(R"(^\s*([PpTt])\s*=\s*([^\s:]+)\s*([^\s:]*)\s*(?::\s*(.*?))?\s*$)");
    std::smatch m;
    if (!std::regex_match(text, m, re))
        throw Error(
            fmt::format("--guide '{}': expected \"P=13.33 Pa: label\" or "
                        "\"T=-35 degC: label\"",
                        text));
    const bool isobar = m[1].str() == "P" || m[1].str() == "p";
    const double v = parseDouble(m[2].str(), "--guide '" + text + "'");
    const std::string unit = m[3].str().empty() ? (isobar ? "Pa" : "K") : m[3].str();
    ui::GuideLine g;
    g.kind = isobar ? ui::GuideLine::Kind::Isobar : ui::GuideLine::Kind::Isotherm;
    g.value =
        isobar ? toPascal(v, parsePressureUnit(unit)) : toKelvin(v, parseTemperatureUnit(unit));
    if (!(g.value > 0))
        throw Error(fmt::format("--guide '{}': the value must be above absolute zero", text));
    const std::string label = m[4].str();
    const QString value = isobar ? ui::pressureWithUnit(g.value, parsePressureUnit(unit))
                                 : ui::temperatureWithUnit(g.value, parseTemperatureUnit(unit));
    g.label = label.empty() ? value
                            : QString::fromStdString(label) + QStringLiteral(" (") + value +
                                  QStringLiteral(")");
    return g;
}

std::vector<ui::StatePoint> readPoints(const std::string &path, std::istream &in) {
    InputFile input(path, in);
    csv::Reader reader(input.stream(), path, csv::ReaderOptions{});
    const csv::StateColumns cols =
        csv::resolveStateColumns(reader.header(), csv::StateColumnOptions{}, path);
    std::size_t labelCol = csv::kNoColumn;
    for (std::size_t i = 0; i < reader.header().size(); ++i) {
        std::string name = csv::splitHeader(reader.header()[i]).name;
        for (char &ch : name) ch = static_cast<char>(std::tolower(static_cast<unsigned char>(ch)));
        if (name == "label") labelCol = i;
    }
    std::vector<ui::StatePoint> points;
    while (reader.next()) {
        const RowState s = readState(reader, cols);
        ui::StatePoint p{{}, s.T_K, s.P_Pa};
        if (labelCol != csv::kNoColumn && labelCol < reader.fieldCount())
            p.label = QString::fromUtf8(reader.field(labelCol).data(),
                                        static_cast<qsizetype>(reader.field(labelCol).size()));
        if (p.label.isEmpty()) p.label = QStringLiteral("P%1").arg(points.size() + 1);
        points.push_back(p);
    }
    if (points.empty()) throw InputError(path, 2, "", "no state points in the file");
    return points;
}

ui::ViewState viewFor(const PlotArgs &a, const ui::DiagramScene &scene) {
    ui::ViewState v = ui::defaultView(scene.substances, !a.linearP);
    if (a.tRange.size() == 2) {
        v.T_min_K = toKelvin(a.tRange[0], scene.units.temperature);
        v.T_max_K = toKelvin(a.tRange[1], scene.units.temperature);
    }
    if (a.pRange.size() == 2) {
        v.P_min_Pa = toPascal(a.pRange[0], scene.units.pressure);
        v.P_max_Pa = toPascal(a.pRange[1], scene.units.pressure);
    } else if (a.linearP) {
        v.P_min_Pa = 0.0;
    }
    if (!v.valid())
        throw Error(
            "--t-range/--p-range: the range is empty, reversed, or not positive on a "
            "log pressure axis");
    return v;
}

ui::FigureSpec specFor(const PlotArgs &a) {
    ui::FigureSpec s;
    s.format = ui::figureFormatFromPath(QString::fromStdString(a.output));
    s.widthMm = a.widthMm;
    s.heightMm = a.heightMm;
    s.dpi = a.dpi;
    s.widthPx = a.widthPx;
    s.heightPx = a.heightPx;
    s.title = QString::fromStdString(a.title);
    s.caption = !a.noCaption;
    s.legend = !a.noLegend;
    s.caution = a.caution;
    return s;
}

void plot(const PlotArgs &a, Io &io) {
    ui::FigureSpec spec = specFor(a);  // format and size errors before any work
    ui::validateFigureSpec(spec);
    HeadlessApp headless;
    ui::DiagramScene scene;
    for (const std::string &key : a.substances)
        scene.substances.push_back(loadSubstance(key, io.err));
    scene.units = {parseTemperatureUnit(a.tUnit), parsePressureUnit(a.pUnit)};
    scene.showAtmosphere = !a.noAtmosphere;
    scene.fillRegions = scene.labelRegions = !a.noRegions;
    if (!a.points.empty()) scene.points = readPoints(a.points, io.in);
    for (const std::string &g : a.guides) scene.guides.push_back(parseGuide(g));
    scene.view = viewFor(a, scene);
    ui::exportFigure(scene, spec, QString::fromStdString(a.output));
    io.out << a.output << '\n';
}

}  // namespace

void addPlotCommand(CLI::App &app, Io &io) {
    auto a = std::make_shared<PlotArgs>();
    CLI::App *cmd = app.add_subcommand(
        "plot",
        "Annotated phase diagram as PNG, SVG or PDF (format from the --output extension), "
        "drawn without a display by the desktop's rendering code");
    cmd->add_option("--substance", a->substances,
                    std::string(kSubstanceHelp) + "; repeat to overlay up to 4 substances")
        ->required();
    cmd->add_option("--points", a->points,
                    "CSV of state points (T and P columns with [unit] brackets, optional label "
                    "column), drawn with their label and phase");
    cmd->add_option("--guide", a->guides,
                    "guide line: \"P=13.33 Pa: chamber\" (isobar) or \"T=-35 degC: collapse\" "
                    "(isotherm); repeatable");
    cmd->add_option("--title", a->title, "title row");
    cmd->add_flag("--linear-p", a->linearP, "linear pressure axis (default: logarithmic)");
    cmd->add_option("--output", a->output, "figure file: .png, .svg or .pdf")->required();
    cmd->add_option("--width-mm", a->widthMm, "physical width in mm (85: one column, 170: two)")
        ->capture_default_str();
    cmd->add_option("--height-mm", a->heightMm,
                    "physical height in mm (default: 0.68 x width for the plot, plus the caption)");
    cmd->add_option("--dpi", a->dpi, "PNG resolution in dots per inch")->capture_default_str();
    auto *wpx = cmd->add_option("--width-px", a->widthPx, "PNG width in pixels (with --height-px)");
    auto *hpx = cmd->add_option("--height-px", a->heightPx, "PNG height in pixels");
    wpx->needs(hpx);
    hpx->needs(wpx);
    cmd->add_option("--t-unit", a->tUnit, "temperature axis unit: K, degC, degF, degR")
        ->capture_default_str();
    cmd->add_option("--p-unit", a->pUnit, "pressure axis unit: Pa, kPa, MPa, bar, mbar, mTorr...")
        ->capture_default_str();
    cmd->add_option("--t-range", a->tRange, "temperature axis range MIN MAX (axis unit)")
        ->expected(2);
    cmd->add_option("--p-range", a->pRange, "pressure axis range MIN MAX (axis unit)")->expected(2);
    cmd->add_flag("--caution", a->caution,
                  "add the caution line for high-pressure, cryogenic and vacuum work");
    cmd->add_flag("--no-caption", a->noCaption, "leave out the sources/version caption");
    cmd->add_flag("--no-legend", a->noLegend, "leave out the legend");
    cmd->add_flag("--no-regions", a->noRegions,
                  "leave out the region fills and labels (e.g. for overlays)");
    cmd->add_flag("--no-atmosphere", a->noAtmosphere, "leave out the 1 atm line");
    cmd->callback([a, &io] {
        if (a->substances.size() > 4) throw CLI::ValidationError("--substance", "at most 4");
        plot(*a, io);
    });
}

}  // namespace pw::cli
