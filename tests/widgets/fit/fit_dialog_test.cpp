// The fitting dialog: synthetic data from a published equation typed into its table, fitted,
// the curve and residuals plotted, and the result saved as a substance file that reads back.
#include <qcustomplot.h>

#include <QDir>
#include <QTableWidget>
#include <cmath>

#include "../gui_fixture.h"
#include "core/substance_io.h"
#include "widgets/fit/fit_dialog.h"

namespace pw::ui::test {
namespace {

// IAPWS R14-08, eq. (6): sublimation pressure of ice Ih, ln(p/pt) = (1/theta) sum a_i theta^b_i,
// theta = T/Tt, Tt = 273.16 K, pt = 611.657 Pa (coefficients from the release, Table 2;
// written here from memory and checked against the release's value at 230 K below).
constexpr double kTt = 273.16, kPt = 611.657;
constexpr double kA[3] = {-0.212144006e2, 0.273203819e2, -0.610598130e1};
constexpr double kB[3] = {0.333333333e-2, 0.120666667e1, 0.170333333e1};

double iceSublimation(double T) {
    const double th = T / kTt;
    double sum = 0;
    for (int i = 0; i < 3; ++i) sum += kA[i] * std::pow(th, kB[i]);
    return kPt * std::exp(sum / th);
}

class FitDialogTest : public GuiTest {};

TEST_F(FitDialogTest, FitsIapwsSublimationDataAndSavesASubstanceThatReadsBack) {
    // IAPWS R14-08, check value: p_subl(230 K) = 8.94735e-6 MPa.
    ASSERT_NEAR(iceSublimation(230.0), 8.94735, 1e-4);

    fit::FitData data;
    for (int i = 0; i <= 20; ++i) {
        const double T = 200.0 + 3.5 * i;
        data.points.push_back({T, iceSublimation(T), 1.0, i + 2});
    }
    FitDialog dialog(path("substances"));
    dialog.setData(data);
    EXPECT_EQ(dialog.table()->rowCount(), 21);
    dialog.setBoundary(BoundaryKind::Sublimation, QStringLiteral("iapws-sublimation"));
    dialog.setReference(kTt, kPt);
    // The exponents field takes the b_i of the form.
    const auto exponents = dialog.findChildren<QLineEdit *>();
    bool set = false;
    for (QLineEdit *e : exponents)
        if (e->placeholderText() == QStringLiteral("default")) {
            e->setText(QStringLiteral("0.00333333333,1.20666667,1.70333333"));
            set = true;
        }
    ASSERT_TRUE(set);
    dialog.setSubstanceName(QStringLiteral("Test Ice"));
    ASSERT_TRUE(dialog.fit()) << dialog.resultsText()->toPlainText().toStdString();
    const fit::FitResult &r = *dialog.result();
    ASSERT_EQ(r.parameters.size(), 3u);
    for (int i = 0; i < 3; ++i)
        EXPECT_NEAR(r.parameters[static_cast<std::size_t>(i)].value / kA[i], 1.0, 1e-6) << i;
    EXPECT_LT(r.maxAbs_pct, 1e-6);
    // Plots: data and curve, residuals and leave-one-out.
    EXPECT_EQ(dialog.curvePlot()->graph(0)->dataCount(), 21);
    EXPECT_GT(dialog.curvePlot()->graph(1)->dataCount(), 100);
    EXPECT_EQ(dialog.residualPlot()->graph(0)->dataCount(), 21);

    const QString file = dialog.saveToLibrary();
    ASSERT_FALSE(file.isEmpty()) << dialog.resultsText()->toPlainText().toStdString();
    EXPECT_TRUE(file.startsWith(path("substances")));
    EXPECT_TRUE(file.endsWith(QStringLiteral("test-ice.json")));
    const SubstanceReadResult back = readSubstanceFile(file.toStdString());
    ASSERT_TRUE(back.substance.has_value());
    EXPECT_EQ(back.substance->id, "test-ice");
    // Only the file itself is in the folder (atomic write leaves no temporary behind).
    EXPECT_EQ(QDir(path("substances")).entryList(QDir::Files).size(), 1);
}

TEST_F(FitDialogTest, BadCellNamesTheRowAndNothingIsFitted) {
    FitDialog dialog(path("substances"));
    ASSERT_TRUE(dialog.pasteText(QStringLiteral("T\tP\n300\t3500\n310\tabc\n320\t10000\n")));
    EXPECT_EQ(dialog.table()->rowCount(), 3);
    dialog.setBoundary(BoundaryKind::Vaporization, QStringLiteral("clausius-clapeyron"));
    EXPECT_FALSE(dialog.fit());
    const QString text = dialog.resultsText()->toPlainText();
    EXPECT_TRUE(text.contains(QStringLiteral("row 2"))) << text.toStdString();
    EXPECT_TRUE(dialog.saveToLibrary().isEmpty());
    EXPECT_FALSE(QDir(path("substances")).exists());
}

}  // namespace
}  // namespace pw::ui::test
