// phasewright-cli plot, run in-process: headless figure output in the three formats, the
// points file with labels, guide parsing, and refusals that leave no file behind.
#ifdef PW_HAVE_GUI
#include <gtest/gtest.h>

#include <QFile>
#include <QImage>
#include <QXmlStreamReader>
#include <filesystem>
#include <fstream>
#include <sstream>

#include "app/cli/cli.h"

namespace {

namespace fs = std::filesystem;

class CliPlot : public ::testing::Test {
protected:
    void SetUp() override {
        dir_ = fs::temp_directory_path() /
               ("pw-cli-plot-" + std::to_string(::getpid()) + "-" +
                ::testing::UnitTest::GetInstance()->current_test_info()->name());
        fs::create_directories(dir_);
    }
    void TearDown() override { fs::remove_all(dir_); }
    int run(std::vector<std::string> args) {
        std::ostringstream o, e;
        std::istringstream in;
        args.insert(args.begin(), "plot");
        const int code = pw::cli::run(args, pw::cli::Io{o, e, in}, &pw::cli::addPlotCommand);
        out = o.str();
        err = e.str();
        return code;
    }
    std::string file(const std::string &name) const { return (dir_ / name).string(); }
    fs::path dir_;
    std::string out, err;
};

QString svgText(const std::string &path) {
    QFile f(QString::fromStdString(path));
    if (!f.open(QIODevice::ReadOnly)) return {};
    QXmlStreamReader xml(&f);
    QStringList texts;
    while (!xml.atEnd()) {
        xml.readNext();
        if (xml.isStartElement() && xml.name() == QLatin1String("text"))
            texts << xml.readElementText(QXmlStreamReader::IncludeChildElements);
    }
    return xml.hasError() ? QStringLiteral("PARSE ERROR ") + xml.errorString()
                          : texts.join(QLatin1Char('|'));
}

TEST_F(CliPlot, PngAtWidthAndDpiHasExactPixelSize) {
    // 85 mm at 300 dpi: 85 / 25.4 * 300 = 1003.9 -> 1004 px.
    ASSERT_EQ(run({"--substance", "water", "--output", file("w.png"), "--width-mm", "85", "--dpi",
                   "300"}),
              0)
        << err;
    EXPECT_EQ(QImage(QString::fromStdString(file("w.png"))).width(), 1004);
    // Explicit pixels are taken as given.
    ASSERT_EQ(run({"--substance", "CO2", "--output", file("c.png"), "--width-px", "800",
                   "--height-px", "600"}),
              0)
        << err;
    EXPECT_EQ(QImage(QString::fromStdString(file("c.png"))).size(), QSize(800, 600));
}

TEST_F(CliPlot, SvgHoldsPointAndGuideLabelsAsText) {
    std::ofstream(file("points.csv")) << "label,T [degC],P [Pa]\nvial 3,-32.5,13.33\n";
    ASSERT_EQ(run({"--substance", "water",
                   "--points",    file("points.csv"),
                   "--guide",     "P=100 mTorr: chamber",
                   "--guide",     "T=-35 degC: collapse",
                   "--title",     "Cycle 12",
                   "--t-unit",    "degC",
                   "--t-range",   "-60",
                   "40",          "--p-range",
                   "1",           "10000",
                   "--output",    file("fd.svg")}),
              0)
        << err;
    const QString text = svgText(file("fd.svg"));
    EXPECT_FALSE(text.startsWith(QStringLiteral("PARSE ERROR"))) << text.toStdString();
    EXPECT_TRUE(text.contains(QStringLiteral("Cycle 12")));
    EXPECT_TRUE(text.contains(QStringLiteral("vial 3")));
    // 100 mTorr = 13.33 Pa (1 mTorr = 0.1333 Pa, FIELD-NOTES); the label keeps the user's unit.
    EXPECT_TRUE(text.contains(QStringLiteral("chamber (100"))) << text.toStdString();
    EXPECT_TRUE(text.contains(QStringLiteral("collapse (−35")));
    EXPECT_TRUE(text.contains(QStringLiteral("ice Ih")));
}

TEST_F(CliPlot, OverlayPdfIsWritten) {
    ASSERT_EQ(run({"--substance", "CO2", "--substance", "nitrogen", "--output", file("o.pdf"),
                   "--width-mm", "170", "--caution"}),
              0)
        << err;
    std::ifstream f(file("o.pdf"), std::ios::binary);
    std::string head(4, '\0');
    f.read(head.data(), 4);
    EXPECT_EQ(head, "%PDF");
}

TEST_F(CliPlot, BadInputIsRefusedWithoutOutput) {
    EXPECT_EQ(run({"--substance", "water", "--output", file("x.jpg")}), 1);
    EXPECT_NE(err.find("x.jpg"), std::string::npos) << err;
    EXPECT_EQ(run({"--substance", "water", "--guide", "Q=3 Pa", "--output", file("g.png")}), 1);
    EXPECT_NE(err.find("--guide 'Q=3 Pa'"), std::string::npos) << err;
    EXPECT_FALSE(fs::exists(file("g.png")));
    std::ofstream(file("bad.csv")) << "label,T [K],P [Pa]\nok,250,100\nbroken,abc,100\n";
    EXPECT_EQ(run({"--substance", "water", "--points", file("bad.csv"), "--output", file("b.png")}),
              1);
    EXPECT_NE(err.find("row 3"), std::string::npos) << err;
    EXPECT_FALSE(fs::exists(file("b.png")));
    EXPECT_EQ(run({"--substance", "water", "--width-mm", "5", "--output", file("s.png")}), 1);
    EXPECT_FALSE(fs::exists(file("s.png")));
}

}  // namespace
#endif  // PW_HAVE_GUI
