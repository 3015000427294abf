#include "widgets/figure/figure_spec.h"

#include <QFileInfo>
#include <algorithm>
#include <cmath>

#include "core/errors.h"

namespace pw::ui {
namespace {

constexpr double kMmPerInch = 25.4;
constexpr double kLogicalDpi = 96.0;
constexpr double kDefaultAspect = 0.85;

[[noreturn]] void refuse(const QString &what) { throw Error(what.toStdString()); }

}  // namespace

FigureFormat figureFormatFromPath(const QString &path) {
    const QString ext = QFileInfo(path).suffix().toLower();
    if (ext == QLatin1String("png")) return FigureFormat::Png;
    if (ext == QLatin1String("svg")) return FigureFormat::Svg;
    if (ext == QLatin1String("pdf")) return FigureFormat::Pdf;
    refuse(
        QStringLiteral("%1: unknown figure format '%2' (use .png, .svg or .pdf)").arg(path, ext));
}

QString figureFormatName(FigureFormat format) {
    switch (format) {
        case FigureFormat::Png:
            return QStringLiteral("PNG");
        case FigureFormat::Svg:
            return QStringLiteral("SVG");
        case FigureFormat::Pdf:
            return QStringLiteral("PDF");
    }
    return {};
}

void validateFigureSpec(const FigureSpec &s) {
    const bool pixels = s.widthPx > 0 || s.heightPx > 0;
    if (pixels) {
        if (s.widthPx < 100 || s.widthPx > 20000 || s.heightPx < 100 || s.heightPx > 20000)
            refuse(QStringLiteral("--width-px/--height-px: both must be 100..20000 pixels (got "
                                  "%1 x %2)")
                       .arg(s.widthPx)
                       .arg(s.heightPx));
    } else if (!(s.widthMm >= 10.0 && s.widthMm <= 1000.0)) {
        refuse(QStringLiteral("--width-mm: %1 is outside 10..1000 mm").arg(s.widthMm));
    }
    if (s.dpi < 50 || s.dpi > 2400)
        refuse(QStringLiteral("--dpi: %1 is outside 50..2400").arg(s.dpi));
    if (!pixels && s.heightMm > 0 && (s.heightMm < 0.2 * s.widthMm || s.heightMm > 3 * s.widthMm))
        refuse(QStringLiteral("--height-mm: %1 mm must be 0.2..3 times the width").arg(s.heightMm));
    const QSize px = figurePixelSize(s);
    if (static_cast<double>(px.width()) * px.height() > 400e6)
        refuse(QStringLiteral("figure of %1 x %2 pixels is too large")
                   .arg(px.width())
                   .arg(px.height()));
}

QSizeF figureSizeMm(const FigureSpec &s) {
    if (s.widthPx > 0 && s.heightPx > 0)
        return {s.widthPx * kMmPerInch / s.dpi, s.heightPx * kMmPerInch / s.dpi};
    const double h = s.heightMm > 0 ? s.heightMm : s.widthMm * kDefaultAspect;
    return {s.widthMm, h};
}

QSize figurePixelSize(const FigureSpec &s) {
    if (s.widthPx > 0 && s.heightPx > 0) return {s.widthPx, s.heightPx};
    const QSizeF mm = figureSizeMm(s);
    return {static_cast<int>(std::lround(mm.width() / kMmPerInch * s.dpi)),
            static_cast<int>(std::lround(mm.height() / kMmPerInch * s.dpi))};
}

QSize figureLogicalSize(const FigureSpec &s) {
    const QSizeF mm = figureSizeMm(s);
    return {std::max(1, static_cast<int>(std::lround(mm.width() / kMmPerInch * kLogicalDpi))),
            std::max(1, static_cast<int>(std::lround(mm.height() / kMmPerInch * kLogicalDpi)))};
}

double figureBaseFontPt(const FigureSpec &s) {
    const double w = figureSizeMm(s).width();
    return std::clamp(7.5 * std::sqrt(w / 85.0), 6.5, 14.0);
}

}  // namespace pw::ui
