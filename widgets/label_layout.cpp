#include "widgets/label_layout.h"

#include <qcustomplot.h>
#include <QFontMetricsF>
#include <QVariant>
#include <array>
#include <cmath>
#include <vector>

namespace pw::ui {
namespace {

// Where a text sits: its alignment at the anchor, its padding as rendered, and a vertical
// shift in pixels (down when positive), drawn as extra padding.
struct Placement {
    Qt::Alignment align;
    QMargins padding;
    double shift = 0.0;
};

bool pointLabel(Qt::Alignment a) {
    return (a & (Qt::AlignLeft | Qt::AlignRight)) && (a & (Qt::AlignTop | Qt::AlignBottom));
}

// The box of the text as drawn (text plus its rendered padding), aligned at the anchor.
QRectF boxOf(const QCPItemText *t, const Placement &p) {
    const QFontMetricsF metrics(t->font());
    QSizeF size = metrics.boundingRect(QRectF(0, 0, 1e6, 1e6), Qt::AlignLeft, t->text()).size();
    size += QSizeF(p.padding.left() + p.padding.right(), p.padding.top() + p.padding.bottom());
    QPointF corner = t->position->pixelPosition();
    if (p.align & Qt::AlignRight)
        corner.rx() -= size.width();
    else if (p.align & Qt::AlignHCenter)
        corner.rx() -= size.width() / 2;
    if (p.align & Qt::AlignBottom)
        corner.ry() -= size.height();
    else if (p.align & Qt::AlignVCenter)
        corner.ry() -= size.height() / 2;
    corner.ry() += p.shift;
    return {corner, size};
}

Placement flippedVertically(const Placement &p) {
    Qt::Alignment a = p.align & ~Qt::AlignVertical_Mask;
    a |= (p.align & Qt::AlignTop) ? Qt::AlignBottom : Qt::AlignTop;
    const QMargins m = p.padding;
    return {a, QMargins(m.left(), m.bottom(), m.right(), m.top())};
}

Placement flippedHorizontally(const Placement &p) {
    Qt::Alignment a = p.align & ~Qt::AlignHorizontal_Mask;
    a |= (p.align & Qt::AlignLeft) ? Qt::AlignRight : Qt::AlignLeft;
    const QMargins m = p.padding;
    return {a, QMargins(m.right(), m.top(), m.left(), m.bottom())};
}

// The placement as rendered, kept on the item the first time it is seen (later layouts, after
// a pan or zoom, start again from it).
Placement renderedPlacement(QCPItemText *t) {
    if (!t->property("pwAlign").isValid()) {
        const QMargins m = t->padding();
        t->setProperty("pwAlign", static_cast<int>(t->positionAlignment()));
        t->setProperty("pwPadding",
                       QVariant::fromValue(QList<int>{m.left(), m.top(), m.right(), m.bottom()}));
    }
    const auto m = t->property("pwPadding").value<QList<int>>();
    return {Qt::Alignment(t->property("pwAlign").toInt()), QMargins(m[0], m[1], m[2], m[3])};
}

// Draws `t` as `p` says: a shift is padding on the side it moves away from (twice the shift
// for a vertically centred text, whose box grows both ways).
void apply(QCPItemText *t, const Placement &p) {
    t->setPositionAlignment(p.align);
    if (pointLabel(p.align))
        t->setTextAlignment((p.align & Qt::AlignRight) ? Qt::AlignRight : Qt::AlignLeft);
    const double grow = (p.align & Qt::AlignVCenter) ? 2.0 * std::abs(p.shift) : std::abs(p.shift);
    const int extra = static_cast<int>(std::lround(grow));
    QMargins m = p.padding;
    if (p.shift > 0)
        m.setTop(m.top() + extra);
    else if (p.shift < 0)
        m.setBottom(m.bottom() + extra);
    t->setPadding(m);
}

// The places `rendered` may take, in order of preference: a point label around its anchor
// (above or below it, right or left of it), then one text height further from it (further
// would part it from its mark); a centred (region) label one and two text heights up or down.
std::vector<Placement> candidates(const Placement &rendered, double height) {
    std::vector<Placement> out;
    if (pointLabel(rendered.align)) {
        const Placement v = flippedVertically(rendered), h = flippedHorizontally(rendered);
        for (int level = 0; level <= 1; ++level) {
            for (Placement p : {rendered, v, h, flippedHorizontally(v)}) {
                // Further from the anchor: up for a text above it, down for one below.
                p.shift = (p.align & Qt::AlignBottom ? -1.0 : 1.0) * level * height;
                out.push_back(p);
            }
        }
        return out;
    }
    for (int level = 1; level <= 2; ++level) {
        for (const double direction : {-1.0, 1.0}) {
            Placement p = rendered;
            p.shift = direction * level * height;
            out.push_back(p);
        }
    }
    return out;
}

// Point labels first (they belong next to their marks; the last drawn first: the user's own
// points and guides before the normal points, those before the fixed points), then the
// centred region labels in the order drawn.
std::vector<QCPItemText *> textsInOrder(QCustomPlot &plot) {
    std::vector<QCPItemText *> texts;
    for (const bool points : {true, false}) {
        for (int k = 0; k < plot.itemCount(); ++k) {
            const int i = points ? plot.itemCount() - 1 - k : k;
            auto *t = qobject_cast<QCPItemText *>(plot.item(i));
            if (t == nullptr || t->rotation() != 0 || t->text().isEmpty()) continue;
            if (pointLabel(renderedPlacement(t).align) == points) texts.push_back(t);
        }
    }
    return texts;
}

}  // namespace

void separateLabels(QCustomPlot &plot) {
    if (plot.axisRect() == nullptr) return;
    const QRectF area = plot.axisRect()->rect();
    std::vector<QRectF> placed;
    const auto clear = [&](const QRectF &r) {
        for (const QRectF &other : placed)
            if (r.intersects(other)) return false;
        return true;
    };
    for (QCPItemText *t : textsInOrder(plot)) {
        const Placement rendered = renderedPlacement(t);
        apply(t, rendered);
        QRectF box = boxOf(t, rendered);
        if (!clear(box)) {
            for (const Placement &p : candidates(rendered, box.height())) {
                const QRectF r = boxOf(t, p);
                if (clear(r) && area.contains(r)) {
                    apply(t, p);
                    box = r;
                    break;
                }
            }
        }
        placed.push_back(box);
    }
}

void keepLabelsApart(QCustomPlot &plot) {
    if (plot.property("pwLabelsApart").toBool()) return;
    plot.setProperty("pwLabelsApart", true);
    QObject::connect(&plot, &QCustomPlot::afterLayout, &plot, [&plot] { separateLabels(plot); });
}

}  // namespace pw::ui
