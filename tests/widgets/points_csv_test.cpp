// Points CSV: the command line's columns out, label/T/P (with units from the header) in, and
// errors that name the file, row and column.
#include <gtest/gtest.h>

#include "core/errors.h"
#include "core/library.h"
#include "widgets/points_csv.h"

namespace pw::ui::test {
namespace {

TEST(PointsCsv, ExportHasTheCommandLineColumnsAndReimportsEqualPoints) {
    const auto water = SubstanceLibrary::bundled().find("water");
    const std::vector<StatePoint> points{{QStringLiteral("shelf, low"), 233.15, 10.0},
                                         {QStringLiteral("boil"), 400.0, 101325.0}};
    const QString csv =
        pointsToCsv(points, water.get(), {TemperatureUnit::Celsius, PressureUnit::mTorr});
    const QStringList lines = csv.split('\n', Qt::SkipEmptyParts);
    ASSERT_EQ(lines.size(), 3);
    EXPECT_EQ(lines[0], QStringLiteral("label,T [degC],P [mTorr],phase,solid_form,nearest_boundary,"
                                       "dT_K,dP_Pa,on_boundary,flags"));
    // IAPWS R14-08: ice Ih sublimation pressure at -40 °C is 12.84 Pa (FIELD-NOTES), so 10 Pa
    // is vapor, nearest the sublimation curve.
    EXPECT_TRUE(lines[1].startsWith(QStringLiteral("\"shelf, low\",-40,75.00")))
        << lines[1].toStdString();
    EXPECT_TRUE(lines[1].contains(QStringLiteral(",vapor,,sublimation (ice Ih),")))
        << lines[1].toStdString();
    EXPECT_NEAR(lines[1].split(',').at(8).toDouble(), 10.0 - 12.84, 0.01);  // dP_Pa
    const std::vector<StatePoint> back = parsePointsCsv(csv, QStringLiteral("x.csv"));
    ASSERT_EQ(back.size(), 2u);
    EXPECT_EQ(back[0].label, points[0].label);
    EXPECT_NEAR(back[0].T_K, points[0].T_K, 1e-9);
    EXPECT_NEAR(back[0].P_Pa, points[0].P_Pa, 1e-9);
    EXPECT_NEAR(back[1].P_Pa, 101325.0, 1e-6);
}

TEST(PointsCsv, SemicolonFileWithUnitsInTheHeaderAndNoLabels) {
    const auto pts =
        parsePointsCsv(QStringLiteral("time;T [degC];P [bar]\r\n0;20;1\r\n\r\n5;40;100\r\n"),
                       QStringLiteral("run.csv"));
    ASSERT_EQ(pts.size(), 2u);
    EXPECT_DOUBLE_EQ(pts[1].T_K, 313.15);
    EXPECT_DOUBLE_EQ(pts[1].P_Pa, 1e7);
    EXPECT_EQ(pts[0].label, QStringLiteral("R2"));  // named after its row
}

TEST(PointsCsv, BadValueNamesFileRowAndColumn) {
    try {
        parsePointsCsv(QStringLiteral("label,T_K,P_Pa\na,300,1e5\nb,warm,1e5\n"),
                       QStringLiteral("in.csv"));
        FAIL() << "expected an InputError";
    } catch (const InputError &e) {
        EXPECT_EQ(e.file(), "in.csv");
        EXPECT_EQ(e.row(), 3);
        EXPECT_EQ(e.field(), "T_K");
    }
    EXPECT_THROW(parsePointsCsv(QStringLiteral("label,T,P\na,300,0\n"), QStringLiteral("z.csv")),
                 InputError);
    EXPECT_THROW(
        parsePointsCsv(QStringLiteral("label,T,pressure [furlong]\n"), QStringLiteral("u.csv")),
        InputError);
    EXPECT_THROW(parsePointsCsv(QStringLiteral("label,temp,P\n"), QStringLiteral("t.csv")),
                 InputError);
}

}  // namespace
}  // namespace pw::ui::test
