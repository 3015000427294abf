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

Grid classifyGrid(const PhaseDiagram &d, const ViewState &v, int cols, int rows,
                  std::vector<QString> &names) {
    Grid g{cols, rows, std::vector<int>(static_cast<std::size_t>(cols * rows), -1)};
    QHash<QString, int> index;
    const bool logP = v.logPressure && v.P_min_Pa > 0;
    const double y0 = logP ? std::log(v.P_max_Pa) : v.P_max_Pa;
    const double y1 = logP ? std::log(v.P_min_Pa) : v.P_min_Pa;
    const Classifier classifier(d);
    for (int r = 0; r < rows; ++r) {
        const double y = y0 + (y1 - y0) * (r + 0.5) / rows;
        const double P = logP ? std::exp(y) : y;
        if (!(P > 0)) continue;
        for (int c = 0; c < cols; ++c) {
            const double T = v.T_min_K + (v.T_max_K - v.T_min_K) * (c + 0.5) / cols;
            if (!(T > 0)) continue;
            QString name;
            try {
                name = regionName(classifier(T, P));
            } catch (const pw::Error &) {
                continue;
            }
            if (name.isEmpty()) continue;
            auto it = index.find(name);
            if (it == index.end()) {
                it = index.insert(name, static_cast<int>(names.size()));
                names.push_back(name);
            }
            g.category[static_cast<std::size_t>(r * cols + c)] = it.value();
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

// Long names break over two lines so they fit narrower regions.
QString displayName(const QString &name) {
    if (name == QLatin1String("supercritical fluid")) return QStringLiteral("supercritical\nfluid");
    return name;
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
                           int rows, double cellPx, bool dark) {
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
    const std::vector<int> dist = insideDistance(g);
    std::vector<int> best(names.size(), -1);
    for (std::size_t i = 0; i < dist.size(); ++i) {
        const int k = g.category[i];
        if (k >= 0 && (best[static_cast<std::size_t>(k)] < 0 ||
                       dist[i] > dist[static_cast<std::size_t>(best[static_cast<std::size_t>(k)])]))
            best[static_cast<std::size_t>(k)] = static_cast<int>(i);
    }
    const bool logP = view.logPressure && view.P_min_Pa > 0;
    for (std::size_t k = 0; k < names.size(); ++k) {
        const int i = best[k];
        // Half the label's width in pixels must fit horizontally inside the region.
        const QString text = displayName(names[k]);
        qsizetype longest = 0;
        for (const QString &line : text.split(QLatin1Char('\n')))
            longest = std::max(longest, line.size());
        const double needPx = 3.6 * static_cast<double>(longest) + 8.0;
        if (i < 0 || dist[static_cast<std::size_t>(i)] / double(kHorizontalStep) * cellPx < needPx)
            continue;
        const int c = i % columns, r = i / columns;
        const double fy = (r + 0.5) / rows;
        const double T = view.T_min_K + (view.T_max_K - view.T_min_K) * (c + 0.5) / columns;
        const double P = logP ? std::exp(std::log(view.P_max_Pa) +
                                         (std::log(view.P_min_Pa) - std::log(view.P_max_Pa)) * fy)
                              : view.P_max_Pa + (view.P_min_Pa - view.P_max_Pa) * fy;
        out.labels.push_back({text, T, P});
    }
    return out;
}

}  // namespace pw::ui
