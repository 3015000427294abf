// Column and unit resolution for state files, ISO timestamps, and the CSV writer.
#include <gtest/gtest.h>

#include <cmath>
#include <sstream>

#include "core/csv/columns.h"
#include "core/csv/writer.h"
#include "core/errors.h"

namespace pw::csv {
namespace {

TEST(CsvColumns, SplitHeaderBrackets) {
    EXPECT_EQ(splitHeader("T [degC]").name, "T");
    EXPECT_EQ(splitHeader("T [degC]").unit, "degC");
    EXPECT_EQ(splitHeader(" P [mTorr] ").unit, "mTorr");
    EXPECT_EQ(splitHeader("pressure").unit, "");
}

TEST(CsvColumns, FindsColumnsAndBracketUnits) {
    const std::vector<std::string> h = {"time [min]", "Shelf", "T [degC]", "P [mTorr]"};
    StateColumnOptions o;
    o.wantTime = true;
    const StateColumns c = resolveStateColumns(h, o, "run.csv");
    EXPECT_EQ(c.t, 2u);
    EXPECT_EQ(c.p, 3u);
    EXPECT_EQ(c.time, 0u);
    EXPECT_EQ(c.tUnit, TemperatureUnit::Celsius);
    EXPECT_EQ(c.pUnit, PressureUnit::mTorr);
    EXPECT_EQ(c.secondsPerTimeUnit, 60.0);  // 1 min = 60 s (SI brochure, non-SI units table)
}

TEST(CsvColumns, ExplicitColumnsAndUnits) {
    const std::vector<std::string> h = {"product", "chamber"};
    StateColumnOptions o;
    o.tColumn = "product";
    o.pColumn = "CHAMBER";
    o.tUnit = "degC";
    o.pUnit = "ubar";
    const StateColumns c = resolveStateColumns(h, o, "run.csv");
    EXPECT_EQ(c.t, 0u);
    EXPECT_EQ(c.p, 1u);
    EXPECT_EQ(c.pUnit, PressureUnit::ubar);
}

TEST(CsvColumns, RefusesMissingAmbiguousAndContradictions) {
    EXPECT_THROW(resolveStateColumns({"a", "b"}, {}, "x.csv"), InputError);
    EXPECT_THROW(resolveStateColumns({"T", "temp", "P"}, {}, "x.csv"), InputError);
    StateColumnOptions o;
    o.tUnit = "K";
    try {
        resolveStateColumns({"T [degC]", "P"}, o, "x.csv");
        FAIL() << "a bracket and an option that disagree were reconciled";
    } catch (const InputError &e) {
        EXPECT_EQ(e.row(), 1);
        EXPECT_EQ(e.field(), "T [degC]");
    }
    o.tUnit = "C";  // the same unit spelled differently: no conflict
    EXPECT_NO_THROW(resolveStateColumns({"T [degC]", "P"}, o, "x.csv"));
    EXPECT_THROW(resolveStateColumns({"T [furlong]", "P"}, {}, "x.csv"), InputError);
}

TEST(CsvColumns, IsoTimestamps) {
    // 2000-01-01T00:00:00Z is 946684800 s after the Unix epoch (POSIX time, common practice).
    EXPECT_EQ(*parseIsoTime("2000-01-01T00:00:00Z"), 946684800.0);
    EXPECT_EQ(*parseIsoTime("2000-01-01 00:00:01.5"), 946684801.5);
    EXPECT_EQ(*parseIsoTime("2000-01-01T01:00:00+01:00"), 946684800.0);
    EXPECT_FALSE(parseIsoTime("2000-02-30T00:00:00"));
    EXPECT_FALSE(parseIsoTime("12.5"));
}

TEST(CsvWriter, QuotesNumbersAndEmptyNaN) {
    std::ostringstream out;
    Writer w(out, ';');
    w.raw("1;2");
    w.field("a;b");
    w.field("say \"hi\"");
    w.field(0.1);
    w.field(std::nan(""));
    w.field(1e-300);
    w.endRow();
    w.flush();
    // Shortest round-trip text (std::to_chars, C++17 [charconv]).
    EXPECT_EQ(out.str(), "1;2;\"a;b\";\"say \"\"hi\"\"\";0.1;;1e-300\n");
}

}  // namespace
}  // namespace pw::csv
