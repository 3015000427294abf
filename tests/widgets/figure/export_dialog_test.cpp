// The export dialog: live preview drawn by the export code, options remembered through the
// typed Settings, export and copy to the clipboard.
#include <gtest/gtest.h>

#include <QClipboard>
#include <QFile>
#include <QGuiApplication>
#include <QImage>
#include <QMimeData>

#include "tests/widgets/gui_fixture.h"
#include "widgets/figure/export_dialog.h"

namespace pw::ui::test {
namespace {

class ExportDialogTest : public GuiTest {
protected:
    DiagramScene scene() const {
        DiagramScene s;
        s.substances = {library_.find("carbon-dioxide")};
        s.view = defaultView(s.substances, true);
        s.points = {{QStringLiteral("vessel"), 313.15, 10e6}};
        return s;
    }
};

TEST_F(ExportDialogTest, PreviewIsTheFigureAtScreenResolution) {
    ExportDialog dialog(scene(), *settings_);
    // 85 mm at 96 dpi: 85 / 25.4 * 96 = 321.3 -> 321 px.
    EXPECT_EQ(dialog.previewImage().width(), 321);
}

TEST_F(ExportDialogTest, ExportWritesTheFileAndRemembersTheOptions) {
    {
        ExportDialog dialog(scene(), *settings_);
        FigureSpec s = dialog.spec();
        s.format = FigureFormat::Svg;
        s.widthMm = 170.0;
        s.dpi = 600;
        s.caution = true;
        s.title = QStringLiteral("Run 7");
        dialog.setSpec(s);
        QString error;
        ASSERT_TRUE(dialog.exportTo(path("fig.svg"), &error)) << error.toStdString();
        EXPECT_TRUE(QFile::exists(path("fig.svg")));
        EXPECT_FALSE(dialog.exportTo(path("missing/dir/fig.svg"), &error));
        EXPECT_TRUE(error.contains(QStringLiteral("missing/dir/fig.svg")));
    }
    ExportDialog again(scene(), *settings_);
    const FigureSpec s = again.spec();
    EXPECT_EQ(s.format, FigureFormat::Svg);
    EXPECT_DOUBLE_EQ(s.widthMm, 170.0);
    EXPECT_EQ(s.dpi, 600);
    EXPECT_TRUE(s.caution);
    EXPECT_TRUE(s.title.isEmpty());  // a title belongs to one figure
}

TEST_F(ExportDialogTest, CopyPutsImageAndSvgOnTheClipboard) {
    ExportDialog dialog(scene(), *settings_);
    dialog.copyToClipboard();
    const QMimeData *mime = QGuiApplication::clipboard()->mimeData();
    ASSERT_NE(mime, nullptr);
    ASSERT_TRUE(mime->hasImage());
    // 85 mm at 300 dpi: 1003.9 -> 1004 px.
    EXPECT_EQ(qvariant_cast<QImage>(mime->imageData()).width(), 1004);
    EXPECT_TRUE(mime->data(QStringLiteral("image/svg+xml")).contains("<svg"));
}

}  // namespace
}  // namespace pw::ui::test
