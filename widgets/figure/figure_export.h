#pragma once
// Export is a plain function of (scene, spec, path): the figure laid out by figure_render.h,
// painted to PNG (exactly figurePixelSize() pixels, DPI stored in the file), SVG (vector,
// text kept as text) or PDF (vector, page of the physical size). The file appears only when
// complete (QSaveFile); on failure nothing is written and an existing file is untouched.
#include <QByteArray>
#include <QImage>
#include <QString>

#include "widgets/diagram_scene.h"
#include "widgets/figure/figure_spec.h"

namespace pw::ui {

// Raster of the figure at its exact pixel size (preview, clipboard, PNG).
QImage renderFigureImage(const DiagramScene &scene, const FigureSpec &spec);

// The file's bytes in spec.format.
QByteArray renderFigureBytes(const DiagramScene &scene, const FigureSpec &spec);

// Validates the spec, renders and writes atomically. Throws pw::Error naming the file on
// any failure (bad size, no substance, cannot write).
void exportFigure(const DiagramScene &scene, const FigureSpec &spec, const QString &path);

}  // namespace pw::ui
