#pragma once
// What a figure looks like on paper: format, size (physical width + DPI, or pixels), title
// and the annotation rows (legend, source caption, caution line). Plain data, no Qt widgets.
//
// Size model: the figure is laid out on a logical canvas at 96 units per inch, so a font of
// N points is N points on paper; the canvas is then scaled to the output (PNG: exactly
// widthPx x heightPx pixels; SVG/PDF: the physical size, vector).
#include <QDate>
#include <QSize>
#include <QSizeF>
#include <QString>

namespace pw::ui {

enum class FigureFormat { Png, Svg, Pdf };

struct FigureSpec {
    FigureFormat format = FigureFormat::Png;
    // Physical size: width in mm (85 single column, 170 double column) and DPI (PNG only).
    // heightMm <= 0: automatic (figure_render.h resolveFigureHeight; width * 0.85 here).
    double widthMm = 85.0;
    double heightMm = 0.0;
    int dpi = 300;
    // Pixel size instead (PNG): both > 0 override widthMm/heightMm; the physical width is
    // then widthPx / dpi inches.
    int widthPx = 0;
    int heightPx = 0;

    QString title;            // empty: no title row (the scene's title is not used)
    bool legend = true;       // substance legend below the plot (always for overlays)
    bool caption = true;      // sources, model names, tool version, date
    bool caution = false;     // the safety line under the caption
    bool pointPhases = true;  // "P1 · liquid" instead of "P1"
    QDate date = QDate::currentDate();

    bool operator==(const FigureSpec &) const = default;
};

// "png", "svg", "pdf" (the file's extension, any case); throws pw::Error otherwise.
FigureFormat figureFormatFromPath(const QString &path);
QString figureFormatName(FigureFormat format);  // "PNG", "SVG", "PDF"

// Throws pw::Error with a message naming the option for a size that cannot be produced
// (width 10..1000 mm, dpi 50..2400, pixels 100..20000, height 0.2..3 x width).
void validateFigureSpec(const FigureSpec &spec);

// Output pixel size (PNG): round(widthMm / 25.4 * dpi) or the explicit pixels.
QSize figurePixelSize(const FigureSpec &spec);
// Physical size in millimetres (SVG/PDF page; PNG physical size).
QSizeF figureSizeMm(const FigureSpec &spec);
// Logical canvas (96 per inch) the figure is laid out on.
QSize figureLogicalSize(const FigureSpec &spec);
// Base font in points: 7.5 pt at 85 mm, growing with the square root of the width
// (about 10.5 pt at 170 mm), kept within 6.5..14 pt.
double figureBaseFontPt(const FigureSpec &spec);

}  // namespace pw::ui
