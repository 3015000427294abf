#include "widgets/figure/figure_export.h"

#include <qcustomplot.h>

#include <QBuffer>
#include <QPdfWriter>
#include <QSaveFile>
#include <QSvgGenerator>
#include <cmath>

#include "core/errors.h"
#include "widgets/figure/figure_caption.h"
#include "widgets/figure/figure_render.h"

namespace pw::ui {
namespace {

constexpr int kLogicalDpi = 96;

QString documentTitle(const DiagramScene &scene, const FigureSpec &spec) {
    if (!spec.title.isEmpty()) return spec.title;
    QStringList names;
    for (const DiagramPtr &d : scene.substances)
        if (d) names << QString::fromStdString(d->substance().name);
    return names.join(QStringLiteral(" / ")) + QStringLiteral(" phase diagram");
}

// Paints the laid-out figure on `device`, whose coordinate system is `scaleX`/`scaleY` times
// the logical canvas.
void paintFigure(QCustomPlot &plot, QPaintDevice &device, const QSize &logical, double scaleX,
                 double scaleY, bool vector) {
    QCPPainter painter(&device);
    if (vector) painter.setMode(QCPPainter::pmVectorized);
    painter.setMode(QCPPainter::pmNoCaching);
    painter.setRenderHints(QPainter::Antialiasing | QPainter::TextAntialiasing |
                           QPainter::SmoothPixmapTransform);
    painter.scale(scaleX, scaleY);
    plot.toPainter(&painter, logical.width(), logical.height());
    painter.end();
}

QImage paintImage(QCustomPlot &plot, const FigureSpec &spec) {
    const QSize px = figurePixelSize(spec);
    const QSize logical = figureLogicalSize(spec);
    QImage image(px, QImage::Format_ARGB32_Premultiplied);
    // Fonts are sized in points against the logical 96-per-inch canvas.
    const int dpm96 = static_cast<int>(std::lround(kLogicalDpi / 0.0254));
    image.setDotsPerMeterX(dpm96);
    image.setDotsPerMeterY(dpm96);
    image.fill(Qt::white);
    paintFigure(plot, image, logical, double(px.width()) / logical.width(),
                double(px.height()) / logical.height(), false);
    const int dpm = static_cast<int>(std::lround(spec.dpi / 0.0254));
    image.setDotsPerMeterX(dpm);
    image.setDotsPerMeterY(dpm);
    return image;
}

QByteArray svgBytes(QCustomPlot &plot, const DiagramScene &scene, const FigureSpec &spec) {
    const QSize logical = figureLogicalSize(spec);
    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    QSvgGenerator svg;
    svg.setOutputDevice(&buffer);
    svg.setResolution(kLogicalDpi);
    svg.setSize(logical);
    svg.setViewBox(QRect(QPoint(0, 0), logical));
    svg.setTitle(documentTitle(scene, spec));
    svg.setDescription(versionLine(spec.date));
    paintFigure(plot, svg, logical, 1.0, 1.0, true);
    return bytes;
}

QByteArray pdfBytes(QCustomPlot &plot, const DiagramScene &scene, const FigureSpec &spec) {
    const QSize logical = figureLogicalSize(spec);
    const QSizeF mm = figureSizeMm(spec);
    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    {
        QPdfWriter pdf(&buffer);
        pdf.setResolution(kLogicalDpi);
        pdf.setPageSize(QPageSize(mm, QPageSize::Millimeter, QString(), QPageSize::ExactMatch));
        pdf.setPageMargins(QMarginsF(0, 0, 0, 0));
        pdf.setTitle(documentTitle(scene, spec));
        pdf.setCreator(QStringLiteral("Phasewright %1").arg(QStringLiteral(PW_VERSION)));
        const double sx = pdf.width() / double(logical.width());
        const double sy = pdf.height() / double(logical.height());
        paintFigure(plot, pdf, logical, sx, sy, true);
    }
    return bytes;
}

void requireSubstance(const DiagramScene &scene) {
    if (scene.substances.empty() || !scene.substances.front())
        throw Error("figure: no substance to draw");
    if (!scene.view.valid()) throw Error("figure: the view range is empty or not positive");
}

}  // namespace

QImage renderFigureImage(const DiagramScene &scene, const FigureSpec &given) {
    requireSubstance(scene);
    const FigureSpec spec = resolveFigureHeight(scene, given);
    QCustomPlot plot;
    buildFigure(plot, scene, spec);
    return paintImage(plot, spec);
}

QByteArray renderFigureBytes(const DiagramScene &scene, const FigureSpec &given) {
    requireSubstance(scene);
    const FigureSpec spec = resolveFigureHeight(scene, given);
    QCustomPlot plot;
    buildFigure(plot, scene, spec);
    switch (spec.format) {
        case FigureFormat::Svg:
            return svgBytes(plot, scene, spec);
        case FigureFormat::Pdf:
            return pdfBytes(plot, scene, spec);
        case FigureFormat::Png:
            break;
    }
    QByteArray bytes;
    QBuffer buffer(&bytes);
    buffer.open(QIODevice::WriteOnly);
    if (!paintImage(plot, spec).save(&buffer, "PNG")) throw Error("figure: PNG encoding failed");
    return bytes;
}

void exportFigure(const DiagramScene &scene, const FigureSpec &spec, const QString &path) {
    validateFigureSpec(spec);
    const QByteArray bytes = renderFigureBytes(scene, spec);
    if (bytes.isEmpty())
        throw Error(QStringLiteral("%1: nothing was rendered").arg(path).toStdString());
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly))
        throw Error(
            QStringLiteral("%1: cannot write: %2").arg(path, file.errorString()).toStdString());
    if (file.write(bytes) != bytes.size() || !file.commit())
        throw Error(
            QStringLiteral("%1: cannot write: %2").arg(path, file.errorString()).toStdString());
}

}  // namespace pw::ui
