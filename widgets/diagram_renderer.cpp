#include "widgets/diagram_renderer.h"

#include <qcustomplot.h>

#include <QFontMetricsF>

#include <algorithm>
#include <cmath>

#include "widgets/boundary_sampling.h"
#include "widgets/format.h"
#include "widgets/label_layout.h"
#include "widgets/region_raster.h"

namespace pw::ui {
namespace {

const QString kRegionLayer = QStringLiteral("regions");

struct Ctx {
    QCustomPlot &plot;
    const DiagramScene &scene;
    const SceneStyle &style;
    QFont font(double pointScale, bool bold = false, bool italic = false) const {
        QFont f = style.font;
        f.setPointSizeF(std::max(6.0, style.font.pointSizeF() * pointScale * style.scale));
        f.setBold(bold);
        f.setItalic(italic);
        return f;
    }
    double x(double T_K) const { return plotX(T_K, scene.units); }
    double y(double P_Pa) const { return plotY(P_Pa, scene.units); }
};

QCPItemText *addText(const Ctx &c, double T_K, double P_Pa, const QString &text,
                     Qt::Alignment align, const QFont &font, const QColor &colour) {
    auto *t = new QCPItemText(&c.plot);
    t->position->setCoords(c.x(T_K), c.y(P_Pa));
    t->setPositionAlignment(align);
    t->setTextAlignment(Qt::AlignLeft);
    t->setText(text);
    t->setFont(font);
    t->setColor(colour);
    t->setSelectable(false);
    return t;
}

// A label anchored in the right quarter of the view is placed left of its anchor, so it is
// not cut off by the plot edge.
void keepInView(const Ctx &c, QCPItemText *t, double T_K) {
    const ViewState &v = c.scene.view;
    const double frac = (T_K - v.T_min_K) / (v.T_max_K - v.T_min_K);
    bool flip = frac >= 0.72;
    if (c.plot.width() >= 200) {
        // The plot's size is known: flip only a label that would run past the right edge.
        // The axis rect is the plot less its axis margins (about 90 px).
        const double axisPx = c.plot.width() - 90.0;
        const QFontMetricsF metrics(t->font());
        double textPx = t->padding().left() + t->padding().right();
        double widest = 0.0;
        for (const QString &line : t->text().split(QLatin1Char('\n')))
            widest = std::max(widest, metrics.horizontalAdvance(line));
        flip = frac * axisPx + textPx + widest > axisPx;
    }
    if (!flip) return;
    const Qt::Alignment vertical = t->positionAlignment() & Qt::AlignVertical_Mask;
    t->setPositionAlignment(Qt::AlignRight | vertical);
    t->setTextAlignment(Qt::AlignRight);
    const QMargins m = t->padding();
    t->setPadding(QMargins(m.right(), m.top(), m.left(), m.bottom()));
}

QCPGraph *addMarkers(const Ctx &c, const QVector<double> &xs, const QVector<double> &ys,
                     QCPScatterStyle::ScatterShape shape, const QColor &edge, const QColor &fill,
                     double size) {
    QCPGraph *g = c.plot.addGraph();
    g->setLineStyle(QCPGraph::lsNone);
    g->setScatterStyle(QCPScatterStyle(shape, QPen(edge, 1.4 * c.style.scale), QBrush(fill),
                                       size * c.style.scale));
    g->setData(xs, ys);
    g->removeFromLegend();
    g->setSelectable(QCP::stNone);
    return g;
}

void setupAxes(const Ctx &c) {
    const QString tUnit = unitLabel(c.scene.units.temperature);
    const QString pUnit = unitLabel(c.scene.units.pressure);
    c.plot.xAxis->setLabel(QObject::tr("Temperature [%1]").arg(tUnit));
    c.plot.yAxis->setLabel(QObject::tr("Pressure [%1]").arg(pUnit));
    for (QCPAxis *axis : {c.plot.xAxis, c.plot.yAxis, c.plot.xAxis2, c.plot.yAxis2}) {
        axis->setBasePen(QPen(c.style.text, 1.0 * c.style.scale));
        axis->setTickPen(QPen(c.style.text, 1.0 * c.style.scale));
        axis->setSubTickPen(QPen(c.style.text, 0.8 * c.style.scale));
        axis->setTickLabelColor(c.style.text);
        axis->setLabelColor(c.style.text);
        axis->setTickLabelFont(c.font(0.95));
        axis->setLabelFont(c.font(1.05));
        axis->grid()->setPen(QPen(c.style.grid, 0.8 * c.style.scale, Qt::DotLine));
        axis->grid()->setSubGridPen(QPen(Qt::NoPen));
    }
    c.plot.xAxis2->setVisible(true);
    c.plot.yAxis2->setVisible(true);
    c.plot.xAxis2->setTickLabels(false);
    c.plot.yAxis2->setTickLabels(false);
    c.plot.xAxis2->grid()->setVisible(false);
    c.plot.yAxis2->grid()->setVisible(false);
    c.plot.setBackground(QBrush(c.style.background));
    c.plot.axisRect()->setBackground(QBrush(c.style.background));
    applyView(c.plot, c.scene.view, c.scene.units);
}

QSize plotAreaPx(const QCustomPlot &plot) {
    const QRect r = plot.axisRect()->rect();
    if (r.width() > 20 && r.height() > 20) return r.size();
    return QSize(std::max(200, plot.width() - 80), std::max(150, plot.height() - 60));
}

// Region labels keep clear of the points, the fixed points and the 1 atm line with the
// normal points, all drawn with labels of their own.
LabelObstacles labelObstacles(const Ctx &c, const PhaseDiagram &d) {
    LabelObstacles o;
    for (const StatePoint &p : c.scene.points) o.marks.emplace_back(p.T_K, p.P_Pa);
    for (const FixedPoint *f : {d.triplePoint(), d.criticalPoint()})
        if (f && c.scene.labelFixedPoints) o.marks.emplace_back(f->T_K, f->P_Pa);
    if (c.scene.showAtmosphere) {
        o.isobars_Pa.push_back(kStandardAtmosphere_Pa);
        for (const auto &T :
             {d.normalMeltingPoint(), d.normalBoilingPoint(), d.normalSublimationPoint()})
            if (T) o.marks.emplace_back(*T, kStandardAtmosphere_Pa);
    }
    return o;
}

void addRegions(const Ctx &c, const PhaseDiagram &d) {
    if (!c.plot.layer(kRegionLayer))
        c.plot.addLayer(kRegionLayer, c.plot.layer(QStringLiteral("background")),
                        QCustomPlot::limAbove);
    const QSize px = plotAreaPx(c.plot);
    const double cell = std::max(1.0, c.style.regionCellPx);
    const int cols = std::clamp(static_cast<int>(px.width() / cell), 2, 1600);
    const int rows = std::clamp(static_cast<int>(px.height() / cell), 2, 1200);
    const RegionRaster raster = rasterRegions(
        d, c.scene.view, cols, rows, px.width() / double(cols), c.style.dark, labelObstacles(c, d));
    if (c.scene.fillRegions && !raster.image.isNull()) {
        auto *pm = new QCPItemPixmap(&c.plot);
        pm->setLayer(kRegionLayer);
        pm->setPixmap(QPixmap::fromImage(raster.image));
        pm->setScaled(true, Qt::IgnoreAspectRatio, Qt::SmoothTransformation);
        pm->topLeft->setCoords(c.x(c.scene.view.T_min_K), c.y(c.scene.view.P_max_Pa));
        pm->bottomRight->setCoords(c.x(c.scene.view.T_max_K), c.y(c.scene.view.P_min_Pa));
        pm->setSelectable(false);
    }
    if (!c.scene.labelRegions) return;
    QColor colour = c.style.text;
    colour.setAlpha(200);
    for (const auto &l : raster.labels)
        addText(c, l.T_K, l.P_Pa, l.name, Qt::AlignCenter, c.font(1.15, false, true), colour);
}

// Overlays (figures) must stay apart in greyscale print: each substance after the first has
// its own dash pattern and marker along its curves.
void styleOverlay(const Ctx &c, QCPCurve *curve, QPen &pen, int index, int pointCount) {
    static const Qt::PenStyle dashes[] = {Qt::DashDotLine, Qt::DotLine, Qt::DashDotDotLine};
    static const QCPScatterStyle::ScatterShape shapes[] = {
        QCPScatterStyle::ssSquare, QCPScatterStyle::ssTriangle, QCPScatterStyle::ssCross};
    const int i = std::clamp(index - 1, 0, 2);
    pen.setStyle(dashes[i]);
    curve->setScatterStyle(QCPScatterStyle(shapes[i], QPen(pen.color(), 1.2 * c.style.scale),
                                           QBrush(c.style.background), 6 * c.style.scale));
    curve->setScatterSkip(std::max(0, pointCount / 8 - 1));
}

void addBoundaries(const Ctx &c, const PhaseDiagram &d, int index) {
    const QColor colour = substanceColour(index, c.style.dark);
    bool legendDone = false;
    for (const CurveRun &run : sampleBoundaries(d, c.scene.view)) {
        auto *curve = new QCPCurve(c.plot.xAxis, c.plot.yAxis);
        QVector<double> xs, ys;
        xs.reserve(static_cast<int>(run.T_K.size()));
        ys.reserve(static_cast<int>(run.T_K.size()));
        for (std::size_t i = 0; i < run.T_K.size(); ++i) {
            xs.push_back(c.x(run.T_K[i]));
            ys.push_back(c.y(run.P_Pa[i]));
        }
        curve->setData(xs, ys);
        QPen pen(colour, (run.extrapolated ? 1.4 : 2.0) * c.style.scale,
                 run.extrapolated ? Qt::DashLine : Qt::SolidLine);
        if (index > 0 && !run.extrapolated) styleOverlay(c, curve, pen, index, xs.size());
        curve->setPen(pen);
        curve->setSelectable(QCP::stNone);
        curve->setName(QString::fromStdString(d.substance().name));
        if (legendDone || run.extrapolated)
            curve->removeFromLegend();
        else
            legendDone = true;
    }
}

void addFixedPoints(const Ctx &c, const PhaseDiagram &d, int index) {
    const QColor colour = substanceColour(index, c.style.dark);
    const DisplayUnits &u = c.scene.units;
    QVector<double> tx, ty;
    for (const auto &tp : d.substance().triplePoints) {
        tx.push_back(c.x(tp.T_K));
        ty.push_back(c.y(tp.P_Pa));
    }
    addMarkers(c, tx, ty, QCPScatterStyle::ssDiamond, colour, c.style.background, 9);
    const QString where = QStringLiteral("%1 · %2");
    if (const FixedPoint *tp = d.triplePoint(); tp && c.scene.labelFixedPoints) {
        addText(
            c, tp->T_K, tp->P_Pa,
            QObject::tr("triple point\n") + where.arg(temperatureWithUnit(tp->T_K, u.temperature),
                                                      pressureWithUnit(tp->P_Pa, u.pressure)),
            Qt::AlignLeft | Qt::AlignTop, c.font(0.85), colour)
            ->setPadding(QMargins(8, 4, 0, 0));
    }
    if (const FixedPoint *cp = d.criticalPoint()) {
        addMarkers(c, {c.x(cp->T_K)}, {c.y(cp->P_Pa)}, QCPScatterStyle::ssCircle, colour, colour,
                   8);
        if (c.scene.labelFixedPoints)
            addText(c, cp->T_K, cp->P_Pa,
                    QObject::tr("critical point\n") +
                        where.arg(temperatureWithUnit(cp->T_K, u.temperature),
                                  pressureWithUnit(cp->P_Pa, u.pressure)),
                    Qt::AlignLeft | Qt::AlignTop, c.font(0.85), colour)
                ->setPadding(QMargins(8, 4, 0, 0));
    }
}

void addIsobar(const Ctx &c, double P_Pa, const QString &label, const QColor &colour,
               Qt::PenStyle style) {
    auto *line = new QCPItemStraightLine(&c.plot);
    line->point1->setCoords(0.0, c.y(P_Pa));
    line->point2->setCoords(1.0, c.y(P_Pa));
    line->setPen(QPen(colour, 1.0 * c.style.scale, style));
    line->setSelectable(false);
    // Labelled at the right end, where the diagram is usually free (gas region).
    addText(c, c.scene.view.T_max_K, P_Pa, label, Qt::AlignRight | Qt::AlignBottom, c.font(0.85),
            colour)
        ->setPadding(QMargins(0, 0, 4, 1));
}

void addIsotherm(const Ctx &c, double T_K, const QString &label, const QColor &colour) {
    auto *line = new QCPItemStraightLine(&c.plot);
    line->point1->setCoords(c.x(T_K), 0.0);
    line->point2->setCoords(c.x(T_K), 1.0);
    line->setPen(QPen(colour, 1.0 * c.style.scale, Qt::DashDotLine));
    line->setSelectable(false);
    // Written along the line (reading upwards from the bottom edge, left of it), so it is
    // never cut off at the right edge and stays clear of the region labels near the top.
    auto *t = addText(c, T_K, c.scene.view.P_min_Pa, label, Qt::AlignLeft | Qt::AlignBottom,
                      c.font(0.85), colour);
    t->setRotation(-90);
    t->setPadding(QMargins(4, 0, 0, 2));
}

void addAtmosphere(const Ctx &c, const PhaseDiagram &d) {
    QColor colour = c.style.text;
    colour.setAlpha(170);
    addIsobar(c, kStandardAtmosphere_Pa, QObject::tr("1 atm"), colour, Qt::DashLine);
    const DisplayUnits &u = c.scene.units;
    const std::pair<std::optional<double>, QString> normals[] = {
        {d.normalMeltingPoint(), QObject::tr("normal melting point")},
        {d.normalBoilingPoint(), QObject::tr("normal boiling point")},
        {d.normalSublimationPoint(), QObject::tr("normal sublimation point")}};
    for (const auto &[T, name] : normals) {
        if (!T) continue;
        addMarkers(c, {c.x(*T)}, {c.y(kStandardAtmosphere_Pa)}, QCPScatterStyle::ssCircle, colour,
                   c.style.background, 7);
        addText(c, *T, kStandardAtmosphere_Pa,
                name + QStringLiteral("\n") + temperatureWithUnit(*T, u.temperature),
                Qt::AlignLeft | Qt::AlignBottom, c.font(0.8), colour)
            ->setPadding(QMargins(6, 0, 0, 4));
    }
}

void addPaths(const Ctx &c) {
    const QColor colour = c.style.dark ? QColor(0xff, 0xb0, 0x4a) : QColor(0xb8, 0x5c, 0x00);
    for (const ScenePath &path : c.scene.paths) {
        const std::vector<State> shown = decimateForDisplay(path.states, c.scene.view);
        QVector<double> xs, ys;
        xs.reserve(static_cast<int>(shown.size()));
        ys.reserve(static_cast<int>(shown.size()));
        for (const State &s : shown) {
            xs.push_back(c.x(s.T_K));
            ys.push_back(c.y(s.P_Pa));
        }
        auto *curve = new QCPCurve(c.plot.xAxis, c.plot.yAxis);
        curve->setData(xs, ys);
        curve->setPen(QPen(colour, 1.6 * c.style.scale));
        curve->setName(path.label);
        curve->setSelectable(QCP::stNone);
        curve->setAntialiased(xs.size() < 5000);  // long logs: speed over smooth edges
        if (path.label.isEmpty()) curve->removeFromLegend();
    }
}

void addPoints(const Ctx &c) {
    if (c.scene.points.empty()) return;
    QVector<double> xs, ys;
    for (const StatePoint &p : c.scene.points) {
        xs.push_back(c.x(p.T_K));
        ys.push_back(c.y(p.P_Pa));
    }
    addMarkers(c, xs, ys, QCPScatterStyle::ssCircle, c.style.background, c.style.pointColour, 10);
    for (const StatePoint &p : c.scene.points) {
        auto *t = addText(c, p.T_K, p.P_Pa, p.label, Qt::AlignLeft | Qt::AlignBottom,
                          c.font(0.9, true), c.style.pointColour);
        t->setPadding(QMargins(6, 0, 0, 3));
    }
}

void setTitle(QCustomPlot &plot, const QString &title, const Ctx &c) {
    auto *layout = plot.plotLayout();
    QCPTextElement *existing =
        layout->rowCount() > 1 ? qobject_cast<QCPTextElement *>(layout->element(0, 0)) : nullptr;
    if (title.isEmpty()) {
        if (existing) {
            layout->remove(existing);
            layout->simplify();
        }
        return;
    }
    if (!existing) {
        layout->insertRow(0);
        existing = new QCPTextElement(&plot);
        layout->addElement(0, 0, existing);
    }
    existing->setText(title);
    existing->setFont(c.font(1.2, true));
    existing->setTextColor(c.style.text);
}

// Left-aligned labels anchored in the right quarter of the view flip to the left of their
// anchor so the plot edge does not cut them off (fixed points, points, isotherms).
void keepLabelsInView(const Ctx &c) {
    for (int i = 0; i < c.plot.itemCount(); ++i) {
        auto *t = qobject_cast<QCPItemText *>(c.plot.item(i));
        if (t && t->rotation() == 0 && (t->positionAlignment() & Qt::AlignLeft))
            keepInView(c, t, kelvinFromPlot(t->position->coords().x(), c.scene.units));
    }
}

}  // namespace

SceneStyle SceneStyle::fromPalette(const QPalette &palette, const QFont &font) {
    SceneStyle s;
    s.background = palette.color(QPalette::Base);
    s.text = palette.color(QPalette::Text);
    s.dark = s.background.lightnessF() < 0.5;
    s.grid = s.dark ? QColor(0x4a, 0x50, 0x5a) : QColor(0xd8, 0xdc, 0xe2);
    s.pointColour = s.dark ? QColor(0xff, 0x7a, 0x8c) : QColor(0xc0, 0x2f, 0x4b);
    s.font = font;
    return s;
}

QColor substanceColour(int index, bool dark) {
    static const QColor light[] = {QColor(0x1f, 0x33, 0x55), QColor(0xa8, 0x3a, 0x1c),
                                   QColor(0x2e, 0x7d, 0x32), QColor(0x6a, 0x1b, 0x9a)};
    static const QColor darkSet[] = {QColor(0xd6, 0xe2, 0xf5), QColor(0xff, 0x9e, 0x7a),
                                     QColor(0x9c, 0xe0, 0x9f), QColor(0xd1, 0xa6, 0xf0)};
    const int i = std::clamp(index, 0, 3);
    return dark ? darkSet[i] : light[i];
}

double plotX(double T_K, const DisplayUnits &u) { return fromKelvin(T_K, u.temperature); }
double plotY(double P_Pa, const DisplayUnits &u) { return fromPascal(P_Pa, u.pressure); }
double kelvinFromPlot(double x, const DisplayUnits &u) { return toKelvin(x, u.temperature); }
double pascalFromPlot(double y, const DisplayUnits &u) { return toPascal(y, u.pressure); }

void applyView(QCustomPlot &plot, const ViewState &view, const DisplayUnits &units) {
    const bool logP = view.logPressure;
    if (logP && plot.yAxis->scaleType() != QCPAxis::stLogarithmic) {
        plot.yAxis->setScaleType(QCPAxis::stLogarithmic);
        plot.yAxis->setTicker(QSharedPointer<QCPAxisTickerLog>(new QCPAxisTickerLog));
        plot.yAxis->setNumberFormat(QStringLiteral("eb"));
        plot.yAxis->setNumberPrecision(0);
    } else if (!logP && plot.yAxis->scaleType() != QCPAxis::stLinear) {
        plot.yAxis->setScaleType(QCPAxis::stLinear);
        plot.yAxis->setTicker(QSharedPointer<QCPAxisTicker>(new QCPAxisTicker));
        plot.yAxis->setNumberFormat(QStringLiteral("gb"));
        plot.yAxis->setNumberPrecision(6);
    }
    plot.yAxis2->setScaleType(plot.yAxis->scaleType());
    plot.yAxis2->setTicker(plot.yAxis->ticker());
    plot.xAxis->setRange(plotX(view.T_min_K, units), plotX(view.T_max_K, units));
    plot.yAxis->setRange(plotY(view.P_min_Pa, units), plotY(view.P_max_Pa, units));
    plot.xAxis2->setRange(plot.xAxis->range());
    plot.yAxis2->setRange(plot.yAxis->range());
}

void renderScene(QCustomPlot &plot, const DiagramScene &scene, const SceneStyle &style) {
    plot.clearItems();
    plot.clearPlottables();
    plot.setPlottingHint(QCP::phFastPolylines, true);
    const Ctx c{plot, scene, style};
    setTitle(plot, scene.title, c);
    setupAxes(c);
    for (std::size_t i = 0; i < scene.substances.size(); ++i) {
        const auto &d = scene.substances[i];
        if (!d) continue;
        if (i == 0 && (scene.fillRegions || scene.labelRegions)) addRegions(c, *d);
        addBoundaries(c, *d, static_cast<int>(i));
        addFixedPoints(c, *d, static_cast<int>(i));
    }
    if (scene.showAtmosphere && !scene.substances.empty() && scene.substances.front())
        addAtmosphere(c, *scene.substances.front());
    QColor guideColour = style.dark ? QColor(0x7f, 0xd1, 0xb9) : QColor(0x00, 0x69, 0x5c);
    for (const GuideLine &g : scene.guides) {
        if (g.kind == GuideLine::Kind::Isobar)
            addIsobar(c, g.value, g.label, guideColour, Qt::DashDotLine);
        else
            addIsotherm(c, g.value, g.label, guideColour);
    }
    addPaths(c);
    addPoints(c);
    keepLabelsInView(c);
    keepLabelsApart(plot);
    plot.legend->setVisible(scene.substances.size() > 1);
    plot.legend->setBrush(QBrush(style.background));
    plot.legend->setTextColor(style.text);
    plot.legend->setFont(c.font(0.9));
}

std::vector<State> decimateForDisplay(const std::vector<State> &states, const ViewState &view) {
    constexpr double kCells = 1200.0;  // about one screen pixel per cell
    if (states.size() < 4096) return states;
    const bool logP = view.logPressure && view.P_min_Pa > 0;
    const double sx = kCells / std::max(1e-12, view.T_max_K - view.T_min_K);
    const double sy = logP ? kCells / std::max(1e-12, std::log(view.P_max_Pa / view.P_min_Pa))
                           : kCells / std::max(1e-12, view.P_max_Pa - view.P_min_Pa);
    std::vector<State> out;
    out.reserve(8192);
    auto key = [&](const State &s) {
        const double y = logP ? std::log(std::max(s.P_Pa, 1e-300)) : s.P_Pa;
        return std::pair<long long, long long>(std::llround(s.T_K * sx), std::llround(y * sy));
    };
    std::pair<long long, long long> last{};
    for (std::size_t i = 0; i < states.size(); ++i) {
        const auto k = key(states[i]);
        if (i == 0 || i + 1 == states.size() || k != last) {
            out.push_back(states[i]);
            last = k;
        }
    }
    return out;
}

}  // namespace pw::ui
