#include "widgets/figure/figure_render.h"

#include <qcustomplot.h>

#include <QFontMetricsF>

#include "core/classify.h"
#include "widgets/figure/figure_caption.h"
#include "widgets/format.h"

namespace pw::ui {
namespace {

constexpr int kMarginPx = 6;  // logical pixels around the figure rows

QCPTextElement *addRow(QCustomPlot &plot, const QString &text, const QFont &font,
                       const QColor &colour) {
    auto *layout = plot.plotLayout();
    const int row = layout->rowCount();
    auto *element = new QCPTextElement(&plot, text, font);
    element->setTextFlags(Qt::AlignLeft | Qt::AlignTop);
    element->setTextColor(colour);
    element->setMargins(QMargins(kMarginPx, 1, kMarginPx, 1));
    layout->addElement(row, 0, element);
    layout->setRowStretchFactor(row, 0.001);
    return element;
}

void moveLegendBelow(QCustomPlot &plot, const DiagramScene &scene, const SceneStyle &style) {
    QCPLegend *legend = plot.legend;
    if (QCPLayoutInset *inset = plot.axisRect()->insetLayout();
        inset->elements(false).contains(legend))
        inset->take(legend);
    auto *layout = plot.plotLayout();
    const int row = layout->rowCount();
    layout->addElement(row, 0, legend);
    layout->setRowStretchFactor(row, 0.001);
    legend->setFillOrder(QCPLayoutGrid::foColumnsFirst);
    legend->setWrap(4);
    legend->setBorderPen(Qt::NoPen);
    legend->setMargins(QMargins(kMarginPx, 2, kMarginPx, 2));
    legend->setIconSize(
        QSize(static_cast<int>(30 * style.scale), static_cast<int>(10 * style.scale)));
    legend->setColumnSpacing(static_cast<int>(14 * style.scale));
    legend->setVisible(true);
    (void)scene;
}

bool wantsLegend(const QCustomPlot &plot, const DiagramScene &scene, const FigureSpec &spec) {
    if (!spec.legend) return false;
    return scene.substances.size() > 1 || plot.legend->itemCount() > 1;
}

}  // namespace

QString wrapText(const QString &text, const QFont &font, double width) {
    const QFontMetricsF fm(font);
    QStringList lines;
    for (const QString &paragraph : text.split(QLatin1Char('\n'))) {
        QString line;
        for (const QString &word : paragraph.split(QLatin1Char(' '), Qt::SkipEmptyParts)) {
            const QString candidate = line.isEmpty() ? word : line + QLatin1Char(' ') + word;
            if (!line.isEmpty() && fm.horizontalAdvance(candidate) > width) {
                lines << line;
                line = word;
            } else {
                line = candidate;
            }
        }
        lines << line;
    }
    return lines.join(QLatin1Char('\n'));
}

DiagramScene figureScene(const DiagramScene &scene, const FigureSpec &spec) {
    DiagramScene out = scene;
    out.title = spec.title;
    if (spec.pointPhases && !out.substances.empty() && out.substances.front()) {
        const PhaseDiagram &d = *out.substances.front();
        for (StatePoint &p : out.points) {
            const QString region = regionName(classify(d, p.T_K, p.P_Pa));
            if (region.isEmpty()) continue;
            p.label = p.label.isEmpty() ? region : p.label + QStringLiteral(" · ") + region;
        }
    }
    return out;
}

SceneStyle figureStyle(const FigureSpec &spec) {
    SceneStyle style;
    const double base = figureBaseFontPt(spec);
    style.font = QFont(QStringLiteral("DejaVu Sans"));
    style.font.setPointSizeF(7.5);
    style.scale = base / 7.5;  // the renderer scales fonts, lines and markers by it
    style.regionCellPx = 1.0;
    return style;
}

namespace {

QFont captionFont(const SceneStyle &style) {
    QFont small = style.font;
    small.setPointSizeF(style.font.pointSizeF() * style.scale * 0.82);
    return small;
}

QString captionText(const DiagramScene &shown, const FigureSpec &spec, const QFont &font,
                    double width) {
    QStringList lines = sourceCaption(shown);
    lines << versionLine(spec.date);
    QStringList wrapped;
    for (const QString &l : lines) wrapped << wrapText(l, font, width);
    return wrapped.join(QLatin1Char('\n'));
}

}  // namespace

FigureSpec resolveFigureHeight(const DiagramScene &scene, const FigureSpec &spec) {
    if (spec.heightMm > 0 || (spec.widthPx > 0 && spec.heightPx > 0)) return spec;
    constexpr double kMmPerPt = 25.4 / 72.0;
    const SceneStyle style = figureStyle(spec);
    const QFont small = captionFont(style);
    const double widthPx = figureSizeMm(spec).width() / 25.4 * 96.0 - 2.0 * kMarginPx - 2.0;
    int lines = 0;
    if (spec.caption)
        lines += static_cast<int>(
            captionText(figureScene(scene, spec), spec, small, widthPx).count(QLatin1Char('\n')) +
            1);
    if (spec.caution)
        lines +=
            static_cast<int>(wrapText(cautionLine(), small, widthPx).count(QLatin1Char('\n')) + 1);
    double extraMm = lines * small.pointSizeF() * 1.22 * kMmPerPt + 2.0;
    if (spec.legend && scene.substances.size() > 1) extraMm += 1.8 * small.pointSizeF() * kMmPerPt;
    if (!spec.title.isEmpty()) extraMm += 2.0 * style.font.pointSizeF() * style.scale * kMmPerPt;
    FigureSpec out = spec;
    out.heightMm = spec.widthMm * 0.68 + extraMm;
    return out;
}

void buildFigure(QCustomPlot &plot, const DiagramScene &scene, const FigureSpec &spec) {
    const QSize logical = figureLogicalSize(spec);
    plot.resize(logical);
    plot.setAntialiasedElements(QCP::aeAll);
    const SceneStyle style = figureStyle(spec);
    const DiagramScene shown = figureScene(scene, spec);
    renderScene(plot, shown, style);
    plot.plotLayout()->setMargins(QMargins(0, 2, 0, 2));
    plot.plotLayout()->setRowSpacing(0);
    if (wantsLegend(plot, shown, spec))
        moveLegendBelow(plot, shown, style);
    else
        plot.legend->setVisible(false);

    const QFont small = captionFont(style);
    const double width = logical.width() - 2.0 * kMarginPx - 2.0;
    if (spec.caption) addRow(plot, captionText(shown, spec, small, width), small, style.text);
    if (spec.caution) {
        QFont italic = small;
        italic.setItalic(true);
        addRow(plot, wrapText(cautionLine(), italic, width), italic, QColor(0x8a, 0x1c, 0x1c));
    }
}

}  // namespace pw::ui
