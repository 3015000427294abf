// Figure export: exact PNG pixel size, SVG with its labels as text, PDF whose extracted text
// holds the labels and the source caption, atomic writes. The water sources checked in the
// caption are the bundled file's (IAPWS R14-08 for sublimation and melting).
#include <gtest/gtest.h>

#include <QFile>
#include <QImage>
#include <QProcess>
#include <QStandardPaths>
#include <QXmlStreamReader>

#include "core/errors.h"
#include "tests/widgets/gui_fixture.h"
#include "widgets/diagram_scene.h"
#include "widgets/figure/figure_caption.h"
#include "widgets/figure/figure_export.h"

namespace pw::ui::test {
namespace {

class FigureExport : public GuiTest {
protected:
    DiagramScene waterScene() const {
        DiagramScene scene;
        scene.substances = {library_.find("water")};
        scene.units = {TemperatureUnit::Celsius, PressureUnit::Pa};
        // Freeze-drying window (FIELD-NOTES: chamber 5-30 Pa, product -45..-15 degC).
        scene.view = {213.15, 313.15, 1.0, 1e4, true};
        scene.points = {{QStringLiteral("vial A"), 243.15, 13.33}};
        scene.guides = {{GuideLine::Kind::Isobar, 13.33, QStringLiteral("chamber set point")},
                        {GuideLine::Kind::Isotherm, 238.15, QStringLiteral("collapse")}};
        return scene;
    }
    FigureSpec spec(FigureFormat format) const {
        FigureSpec s;
        s.format = format;
        s.title = QStringLiteral("Freeze-drying window");
        s.caution = true;
        s.date = QDate(2026, 12, 2);
        return s;
    }
};

QStringList svgTexts(const QByteArray &svg, QString *error) {
    QXmlStreamReader xml(svg);
    QStringList texts;
    while (!xml.atEnd()) {
        xml.readNext();
        if (xml.isStartElement() && xml.name() == QLatin1String("text"))
            texts << xml.readElementText(QXmlStreamReader::IncludeChildElements).simplified();
    }
    if (xml.hasError()) *error = xml.errorString();
    return texts;
}

bool anyContains(const QStringList &texts, const QString &needle) {
    return std::any_of(texts.begin(), texts.end(),
                       [&](const QString &t) { return t.contains(needle); });
}

TEST_F(FigureExport, PngHasExactlyTheRequestedPixelSize) {
    FigureSpec s = spec(FigureFormat::Png);
    // 85 mm x 60 mm at 300 dpi: 85 / 25.4 * 300 = 1003.9 -> 1004 px; 60 / 25.4 * 300 =
    // 708.7 -> 709 px.
    s.heightMm = 60.0;
    const QString file = path("fig.png");
    exportFigure(waterScene(), s, file);
    QImage png(file);
    ASSERT_FALSE(png.isNull());
    EXPECT_EQ(png.width(), 1004);
    EXPECT_EQ(png.height(), 709);
    EXPECT_NEAR(png.dotsPerMeterX() * 0.0254, 300.0, 0.5);
    // Automatic height: the plot keeps 0.68 x the width, the caption rows come on top.
    s.heightMm = 0.0;
    exportFigure(waterScene(), s, file);
    png = QImage(file);
    EXPECT_EQ(png.width(), 1004);
    EXPECT_GT(png.height(), 683);
    // 170 mm at 600 dpi: 4015.7 -> 4016 px.
    s.widthMm = 170.0;
    s.dpi = 600;
    EXPECT_EQ(figurePixelSize(s).width(), 4016);
    // Explicit pixels.
    s.widthPx = 640;
    s.heightPx = 480;
    exportFigure(waterScene(), s, file);
    EXPECT_EQ(QImage(file).size(), QSize(640, 480));
}

TEST_F(FigureExport, SvgParsesAndKeepsLabelsAsText) {
    const QByteArray svg = renderFigureBytes(waterScene(), spec(FigureFormat::Svg));
    QString error;
    const QStringList texts = svgTexts(svg, &error);
    ASSERT_TRUE(error.isEmpty()) << error.toStdString();
    EXPECT_TRUE(anyContains(texts, QStringLiteral("Freeze-drying window")));
    for (const char *region : {"ice Ih", "liquid", "vapor"})  // regions in view
        EXPECT_TRUE(anyContains(texts, QString::fromUtf8(region))) << region;
    // -30 degC at 13.33 Pa is below the ice sublimation pressure there (IAPWS R14-08:
    // about 38 Pa at -30 degC, from memory), so the point's stable phase is vapor.
    EXPECT_TRUE(anyContains(texts, QStringLiteral("vial A · vapor")));
    EXPECT_TRUE(anyContains(texts, QStringLiteral("chamber set point")));
    EXPECT_TRUE(anyContains(texts, QStringLiteral("collapse")));
    EXPECT_TRUE(anyContains(texts, QStringLiteral("triple point")));
    EXPECT_TRUE(anyContains(texts, QStringLiteral("Caution:")));
}

TEST_F(FigureExport, PdfTextHoldsLabelsAndSourceCaption) {
    const QString pdftotext = QStandardPaths::findExecutable(QStringLiteral("pdftotext"));
    if (pdftotext.isEmpty()) GTEST_FAIL() << "pdftotext (poppler-utils) is not installed";
    const QString file = path("fig.pdf");
    exportFigure(waterScene(), spec(FigureFormat::Pdf), file);
    QFile f(file);
    ASSERT_TRUE(f.open(QIODevice::ReadOnly));
    EXPECT_TRUE(f.read(5).startsWith("%PDF"));
    QProcess p;
    p.start(pdftotext, {file, QStringLiteral("-")});
    ASSERT_TRUE(p.waitForFinished(30000));
    const QString text = QString::fromUtf8(p.readAllStandardOutput());
    EXPECT_TRUE(text.contains(QStringLiteral("Freeze-drying window")));
    EXPECT_TRUE(text.contains(QStringLiteral("chamber set point")));
    EXPECT_TRUE(text.contains(QStringLiteral("vial A")));
    EXPECT_TRUE(text.contains(QStringLiteral("ice Ih")));
    EXPECT_TRUE(text.contains(QStringLiteral("R14-08")));  // the bundled water sources
    EXPECT_TRUE(text.contains(QStringLiteral("Wagner")));
    EXPECT_TRUE(text.contains(QStringLiteral("Phasewright ") + QStringLiteral(PW_VERSION)));
    EXPECT_TRUE(text.contains(QStringLiteral("2026-12-02")));
}

TEST_F(FigureExport, FailedExportLeavesNoFileAndKeepsTheOldOne) {
    const QString file = path("keep.png");
    {
        QFile f(file);
        ASSERT_TRUE(f.open(QIODevice::WriteOnly));
        f.write("old");
    }
    FigureSpec bad = spec(FigureFormat::Png);
    bad.widthMm = 5.0;  // below 10 mm: refused
    EXPECT_THROW(exportFigure(waterScene(), bad, file), Error);
    QFile f(file);
    ASSERT_TRUE(f.open(QIODevice::ReadOnly));
    EXPECT_EQ(f.readAll(), QByteArray("old"));
    const QString missingDir = path("no/such/folder/fig.svg");
    EXPECT_THROW(exportFigure(waterScene(), spec(FigureFormat::Svg), missingDir), Error);
    EXPECT_FALSE(QFile::exists(missingDir));
    EXPECT_THROW(exportFigure(DiagramScene{}, spec(FigureFormat::Svg), path("empty.svg")), Error);
    EXPECT_FALSE(QFile::exists(path("empty.svg")));
}

TEST_F(FigureExport, FontsScaleWithPhysicalWidth) {
    FigureSpec s;
    EXPECT_DOUBLE_EQ(figureBaseFontPt(s), 7.5);
    s.widthMm = 170.0;  // 7.5 * sqrt(2)
    EXPECT_NEAR(figureBaseFontPt(s), 10.61, 0.01);
    s.widthMm = 20.0;
    EXPECT_DOUBLE_EQ(figureBaseFontPt(s), 6.5);
}

TEST_F(FigureExport, FormatFromExtension) {
    EXPECT_EQ(figureFormatFromPath(QStringLiteral("a/b.PNG")), FigureFormat::Png);
    EXPECT_EQ(figureFormatFromPath(QStringLiteral("b.svg")), FigureFormat::Svg);
    EXPECT_EQ(figureFormatFromPath(QStringLiteral("b.pdf")), FigureFormat::Pdf);
    EXPECT_THROW(figureFormatFromPath(QStringLiteral("b.jpg")), Error);
}

TEST_F(FigureExport, CaptionNamesSourcesAndModels) {
    DiagramScene scene = waterScene();
    scene.substances.push_back(library_.find("carbon-dioxide"));
    const QStringList caption = sourceCaption(scene);
    ASSERT_EQ(caption.size(), 2);
    EXPECT_TRUE(caption[0].startsWith(QStringLiteral("Water")));
    EXPECT_TRUE(caption[0].contains(QStringLiteral("R14-08")));
    EXPECT_TRUE(caption[0].contains(QStringLiteral("melting (ice Ih, III, V, VI, VII)")));
    EXPECT_TRUE(caption[1].contains(QStringLiteral("CO2")));
    Citation c;
    c.authors = "R. Span, W. Wagner";
    c.year = 1996;
    c.publication = "J. Phys. Chem. Ref. Data 25, 1509; adopted later";
    EXPECT_EQ(shortCitation(c),
              QStringLiteral("Span & Wagner (1996), J. Phys. Chem. Ref. Data 25, 1509"));
    c.authors = "A. One, B. Two, C. Three";
    EXPECT_TRUE(shortCitation(c).startsWith(QStringLiteral("One et al. (1996)")));
    c.authors = "IAPWS; W. Wagner, T. Riethmann, R. Feistel, A. H. Harvey";  // a release
    c.year = 2011;
    c.publication = "IAPWS R14-08(2011)";
    EXPECT_EQ(shortCitation(c), QStringLiteral("IAPWS (2011), IAPWS R14-08(2011)"));
}

}  // namespace
}  // namespace pw::ui::test
