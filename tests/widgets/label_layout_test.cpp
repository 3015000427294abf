// Labels kept off one another (widgets/label_layout.h): after a layout, the point labels of a
// small water diagram (triple and critical point, normal melting and boiling points, 1 atm)
// do not overlap, and each stays next to its mark.
#include "widgets/label_layout.h"

#include <qcustomplot.h>

#include <QFontMetricsF>
#include <vector>

#include "gui_fixture.h"
#include "widgets/diagram_renderer.h"
#include "widgets/diagram_scene.h"

namespace pw::ui::test {
namespace {

class LabelLayoutTest : public GuiTest {};

// The text's box as drawn, less the padding (the text itself).
QRectF textBox(const QCPItemText *t) {
    const QFontMetricsF m(t->font());
    const QSizeF size = m.boundingRect(QRectF(0, 0, 1e6, 1e6), Qt::AlignLeft, t->text()).size();
    const QMargins pad = t->padding();
    const QSizeF box = size + QSizeF(pad.left() + pad.right(), pad.top() + pad.bottom());
    QPointF corner = t->position->pixelPosition();
    const Qt::Alignment a = t->positionAlignment();
    if (a & Qt::AlignRight) corner.rx() -= box.width();
    if (a & Qt::AlignHCenter) corner.rx() -= box.width() / 2;
    if (a & Qt::AlignBottom) corner.ry() -= box.height();
    if (a & Qt::AlignVCenter) corner.ry() -= box.height() / 2;
    return QRectF(corner + QPointF(pad.left(), pad.top()), size);
}

TEST_F(LabelLayoutTest, PointLabelsOfASmallWaterDiagramDoNotOverlap) {
    QCustomPlot plot;
    plot.resize(340, 240);  // about an 85 mm figure at screen resolution
    DiagramScene scene;
    scene.substances = {library_.find("water")};
    scene.view = defaultView(*scene.substances.front(), true);
    renderScene(plot, scene, SceneStyle{});
    plot.replot();
    std::vector<const QCPItemText *> points;
    for (int i = 0; i < plot.itemCount(); ++i) {
        const auto *t = qobject_cast<QCPItemText *>(plot.item(i));
        if (t && t->rotation() == 0 && !(t->positionAlignment() & Qt::AlignHCenter))
            points.push_back(t);
    }
    ASSERT_GE(points.size(), 5u);  // triple, critical, two normal points, 1 atm
    for (std::size_t i = 0; i < points.size(); ++i) {
        const QRectF a = textBox(points[i]);
        // Next to its mark: the text starts or ends within two lines of its anchor.
        const QPointF anchor = points[i]->position->pixelPosition();
        const double reach = 2.5 * QFontMetricsF(points[i]->font()).height();
        EXPECT_LT(std::min(std::abs(a.top() - anchor.y()), std::abs(a.bottom() - anchor.y())),
                  reach)
            << points[i]->text().toStdString();
        for (std::size_t j = 0; j < i; ++j)
            EXPECT_FALSE(a.intersects(textBox(points[j])))
                << points[i]->text().toStdString() << " / " << points[j]->text().toStdString();
    }
}

}  // namespace
}  // namespace pw::ui::test
