#include "widgets/region_raster.h"

#include <QHash>
#include <algorithm>
#include <cmath>

#include "core/classify.h"
#include "core/errors.h"
#include "widgets/format.h"

namespace pw::ui {
namespace {

constexpr int kHorizontalStep = 2;  // chamfer costs: text is about three times wider than tall
constexpr int kVerticalStep = 6;

struct Grid {
    int cols = 0;
    int rows = 0;
    std::vector<int> category;  // -1: unknown
    int at(int c, int r) const { return category[static_cast<std::size_t>(r * cols + c)]; }
};

// Cells are classified with Classifier::view (no strings built per cell); a region's index is
// found by phase and solid-form text, which views stable text owned by the classifier.
class RegionIndex {
public:
    explicit RegionIndex(const Classifier &classifier) : classifier_(classifier) {}
    int of(double T, double P, std::vector<QString> &names) {
        ClassificationView v;
        try {
            v = classifier_.view(T, P);
        } catch (const pw::Error &) {
            return -1;
        }
        for (const Key &k : keys_)
            if (k.phase == v.phase && k.form.data() == v.solidForm.data() &&
                k.form.size() == v.solidForm.size())
                return k.index;
        const QString name = regionName(classifier_(T, P));
        int index = -1;
        if (!name.isEmpty()) {
            const auto it = std::find(names.begin(), names.end(), name);
            index = static_cast<int>(it - names.begin());
            if (it == names.end()) names.push_back(name);
        }
        keys_.push_back({v.phase, v.solidForm, index});
        return index;
    }

private:
    struct Key {
        Phase phase;
        std::string_view form;
        int index;
    };
    const Classifier &classifier_;
    std::vector<Key> keys_;
};

Grid classifyGrid(const PhaseDiagram &d, const ViewState &v, int cols, int rows,
                  std::vector<QString> &names) {
    Grid g{cols, rows, std::vector<int>(static_cast<std::size_t>(cols * rows), -1)};
    const bool logP = v.logPressure && v.P_min_Pa > 0;
    const double y0 = logP ? std::log(v.P_max_Pa) : v.P_max_Pa;
    const double y1 = logP ? std::log(v.P_min_Pa) : v.P_min_Pa;
    const Classifier classifier(d);
    RegionIndex regions(classifier);
    for (int r = 0; r < rows; ++r) {
        const double y = y0 + (y1 - y0) * (r + 0.5) / rows;
        const double P = logP ? std::exp(y) : y;
        if (!(P > 0)) continue;
        for (int c = 0; c < cols; ++c) {
            const double T = v.T_min_K + (v.T_max_K - v.T_min_K) * (c + 0.5) / cols;
            if (!(T > 0)) continue;
            g.category[static_cast<std::size_t>(r * cols + c)] = regions.of(T, P, names);
        }
    }
    return g;
}

// Chamfer distance of every cell to the nearest cell of another category or the grid edge.
std::vector<int> insideDistance(const Grid &g) {
    const int big = 1 << 28;
    std::vector<int> dist(g.category.size(), big);
    auto idx = [&](int c, int r) { return static_cast<std::size_t>(r * g.cols + c); };
    auto relax = [&](int c, int r, int nc, int nr, int cost) {
        if (nc < 0 || nr < 0 || nc >= g.cols || nr >= g.rows) {
            dist[idx(c, r)] = std::min(dist[idx(c, r)], cost);
            return;
        }
        const int through = g.at(nc, nr) == g.at(c, r) ? dist[idx(nc, nr)] + cost : cost;
        dist[idx(c, r)] = std::min(dist[idx(c, r)], through);
    };
    for (int r = 0; r < g.rows; ++r)
        for (int c = 0; c < g.cols; ++c) {
            relax(c, r, c - 1, r, kHorizontalStep);
            relax(c, r, c, r - 1, kVerticalStep);
        }
    for (int r = g.rows - 1; r >= 0; --r)
        for (int c = g.cols - 1; c >= 0; --c) {
            relax(c, r, c + 1, r, kHorizontalStep);
            relax(c, r, c, r + 1, kVerticalStep);
        }
    return dist;
}

// Cells a region label must not cover get category kObstacle in a copy of the grid used for
// the label search only (the fill keeps the real regions).
constexpr int kObstacle = -2;

Grid withObstacles(Grid g, const ViewState &v, double cellPx, const LabelObstacles &o) {
    const bool logP = v.logPressure && v.P_min_Pa > 0;
    // Fractions of the view, clamped so that a mark far outside it stays a small integer
    // (NaN, an empty range: off the grid).
    auto cellOf = [](double f, int n) {
        if (!std::isfinite(f)) return -n;
        return static_cast<int>(std::floor(std::clamp(f, -1.0, 2.0) * n));
    };
    auto row = [&](double P) {
        const double f = logP ? (std::log(v.P_max_Pa) - std::log(P)) /
                                    (std::log(v.P_max_Pa) - std::log(v.P_min_Pa))
                              : (v.P_max_Pa - P) / (v.P_max_Pa - v.P_min_Pa);
        return cellOf(f, g.rows);
    };
    auto col = [&](double T) { return cellOf((T - v.T_min_K) / (v.T_max_K - v.T_min_K), g.cols); };
    auto block = [&](int c0, int c1, int r0, int r1) {
        for (int r = std::max(0, r0); r <= std::min(g.rows - 1, r1); ++r)
            for (int c = std::max(0, c0); c <= std::min(g.cols - 1, c1); ++c)
                g.category[static_cast<std::size_t>(r * g.cols + c)] = kObstacle;
    };
    const int markPx = 8, textWidthPx = 110, textHeightPx = 16;  // a point label, roughly
    const int cell = std::max(1, static_cast<int>(std::lround(cellPx)));
    for (const auto &[T, P] : o.marks) {
        if (!(P > 0)) continue;
        const int c = col(T), r = row(P);
        block(c - markPx / cell, c + textWidthPx / cell, r - textHeightPx / cell,
              r + markPx / cell);
    }
    for (double P : o.isobars_Pa)
        if (P > 0) block(0, g.cols - 1, row(P) - 4 / cell, row(P) + 4 / cell);
    return g;
}

// Per region, the cell for its label: among the cells at least 90 % as far from the edge as
// the farthest one (a long, even-width band has many), the one nearest the region's centre,
// so a label sits in the middle of a tall strip rather than at its top. -1: no cell.
std::vector<int> labelCells(const Grid &g, const std::vector<int> &dist, std::size_t regions) {
    std::vector<int> far(regions, 0);
    std::vector<double> sumC(regions, 0.0), sumR(regions, 0.0), count(regions, 0.0);
    for (std::size_t i = 0; i < dist.size(); ++i) {
        if (g.category[i] < 0) continue;
        const auto k = static_cast<std::size_t>(g.category[i]);
        far[k] = std::max(far[k], dist[i]);
        sumC[k] += static_cast<double>(static_cast<int>(i) % g.cols);
        sumR[k] += static_cast<double>(static_cast<int>(i) / g.cols);
        count[k] += 1.0;
    }
    std::vector<int> best(regions, -1);
    std::vector<double> bestD2(regions, 0.0);
    for (std::size_t i = 0; i < dist.size(); ++i) {
        if (g.category[i] < 0) continue;
        const auto k = static_cast<std::size_t>(g.category[i]);
        if (10 * dist[i] < 9 * far[k]) continue;
        const double dc = static_cast<int>(i) % g.cols - sumC[k] / count[k];
        const double dr = static_cast<int>(i) / g.cols - sumR[k] / count[k];
        const double d2 = dc * dc + dr * dr;
        if (best[k] < 0 || d2 < bestD2[k]) {
            best[k] = static_cast<int>(i);
            bestD2[k] = d2;
        }
    }
    return best;
}

// Long names break over two lines so they fit narrower regions.
QString displayName(const QString &name) {
    if (name == QLatin1String("supercritical fluid")) return QStringLiteral("supercritical\nfluid");
    return name;
}

// The state at the centre of cell i.
std::pair<double, double> cellState(const ViewState &view, int columns, int rows, int i) {
    const int c = i % columns, r = i / columns;
    const double fy = (r + 0.5) / rows;
    const bool logP = view.logPressure && view.P_min_Pa > 0;
    const double T = view.T_min_K + (view.T_max_K - view.T_min_K) * (c + 0.5) / columns;
    const double P = logP ? std::exp(std::log(view.P_max_Pa) +
                                     (std::log(view.P_min_Pa) - std::log(view.P_max_Pa)) * fy)
                          : view.P_max_Pa + (view.P_min_Pa - view.P_max_Pa) * fy;
    return {T, P};
}

}  // namespace

QColor regionColour(const QString &name, bool dark) {
    static const QHash<QString, QColor> base{
        {QStringLiteral("solid"), QColor(0x8f, 0xaa, 0xd4)},
        {QStringLiteral("ice Ih"), QColor(0x8f, 0xaa, 0xd4)},
        {QStringLiteral("ice III"), QColor(0x9c, 0xc9, 0xb8)},
        {QStringLiteral("ice V"), QColor(0xb5, 0xa8, 0xdb)},
        {QStringLiteral("ice VI"), QColor(0x86, 0xc0, 0xd6)},
        {QStringLiteral("ice VII"), QColor(0xc9, 0xa9, 0xc6)},
        {QStringLiteral("liquid"), QColor(0x7c, 0xcf, 0xe8)},
        {QStringLiteral("vapor"), QColor(0xf3, 0xd8, 0x9c)},
        {QStringLiteral("gas"), QColor(0xf4, 0xbe, 0x9c)},
        {QStringLiteral("supercritical fluid"), QColor(0xd9, 0xb6, 0xea)},
    };
    QColor c = base.value(name, QColor(0xa9, 0xb7, 0xc9));  // other solid forms
    c.setAlpha(dark ? 80 : 120);
    return c;
}

RegionRaster rasterRegions(const PhaseDiagram &diagram, const ViewState &view, int columns,
                           int rows, double cellPx, bool dark, const LabelObstacles &obstacles) {
    RegionRaster out;
    if (columns < 2 || rows < 2 || !view.valid()) return out;
    std::vector<QString> names;
    const Grid g = classifyGrid(diagram, view, columns, rows, names);
    out.image = QImage(columns, rows, QImage::Format_ARGB32);
    out.image.fill(Qt::transparent);
    std::vector<QRgb> colours;
    for (const auto &n : names) colours.push_back(regionColour(n, dark).rgba());
    for (int r = 0; r < rows; ++r) {
        auto *line = reinterpret_cast<QRgb *>(out.image.scanLine(r));
        for (int c = 0; c < columns; ++c)
            if (const int k = g.at(c, r); k >= 0) line[c] = colours[static_cast<std::size_t>(k)];
    }
    // Labels keep clear of points, fixed points and the 1 atm line where the region leaves
    // room; a region too crowded for that gets its label where it is widest.
    const Grid free = withObstacles(g, view, cellPx, obstacles);
    const std::vector<int> dist = insideDistance(free);
    const std::vector<int> best = labelCells(free, dist, names.size());
    std::vector<int> plainDist, plainBest;  // without obstacles: only if a region needs it
    for (std::size_t k = 0; k < names.size(); ++k) {
        const QString text = displayName(names[k]);
        qsizetype longest = 0;
        for (const QString &line : text.split(QLatin1Char('\n')))
            longest = std::max(longest, line.size());
        // Half the label's width in pixels must fit horizontally inside the region.
        const double needPx = 3.6 * static_cast<double>(longest) + 8.0;
        auto fits = [&](int cell, const std::vector<int> &d) {
            return cell >= 0 &&
                   d[static_cast<std::size_t>(cell)] / double(kHorizontalStep) * cellPx >= needPx;
        };
        int i = best[k];
        if (!fits(i, dist)) {
            if (plainDist.empty()) {
                plainDist = insideDistance(g);
                plainBest = labelCells(g, plainDist, names.size());
            }
            i = plainBest[k];
            if (!fits(i, plainDist)) continue;
        }
        const auto [T, P] = cellState(view, columns, rows, i);
        out.labels.push_back({text, T, P});
    }
    return out;
}

}  // namespace pw::ui
