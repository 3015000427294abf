// The streaming CSV reader: separators, quotes, CRLF, BOM, the declared decimal comma, and
// errors that name the file, row and column. Numbers are checked against their decimal text
// (std::from_chars is exact: the nearest double, C++17 [charconv]).
#include "core/csv/reader.h"

#include <gtest/gtest.h>

#include <fstream>
#include <sstream>
#include <string>

#include "core/errors.h"

namespace pw::csv {
namespace {

const std::string kData = std::string(PW_SOURCE_DIR) + "/tests/core/csv/data/";

TEST(CsvReader, CommaFileWithHeaderAndRows) {
    std::istringstream in("T,P\n300,1e5\n250.5,+2.5E3\n");
    Reader r(in, "a.csv");
    EXPECT_EQ(r.delimiter(), ',');
    EXPECT_EQ(r.header(), (std::vector<std::string>{"T", "P"}));
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.row(), 2);
    EXPECT_EQ(r.number(0), 300.0);
    EXPECT_EQ(r.number(1), 1e5);
    EXPECT_EQ(r.record(), "300,1e5");
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.number(0), 250.5);
    EXPECT_EQ(r.number(1), 2500.0);
    EXPECT_FALSE(r.next());
}

TEST(CsvReader, BomCrlfSemicolonDecimalCommaAndQuotes) {
    std::ifstream in(kData + "bom_crlf_semicolon_decimal_comma.csv", std::ios::binary);
    ASSERT_TRUE(in);
    ReaderOptions o;
    o.decimalComma = true;
    Reader r(in, "bom.csv", o);
    EXPECT_EQ(r.delimiter(), ';');
    EXPECT_EQ(r.header(), (std::vector<std::string>{"T [degC]", "P [mbar]", "note"}));
    EXPECT_EQ(r.headerRecord().substr(0, 1), "T");  // the byte-order mark is gone
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.number(0), -40.0);
    EXPECT_EQ(r.number(1), 0.1284);
    EXPECT_EQ(r.field(2), "product; shelf 2");
    EXPECT_EQ(r.record(), "-40;0,1284;\"product; shelf 2\"");  // no CR at the end
    ASSERT_TRUE(r.next());  // the empty line is skipped but counted
    EXPECT_EQ(r.row(), 4);
    EXPECT_EQ(r.number(0), 25.5);
    EXPECT_EQ(r.number(1), 1013.25);
    EXPECT_EQ(r.field(2), "said \"ok\"");
    EXPECT_FALSE(r.next());
}

TEST(CsvReader, TabSeparated) {
    std::ifstream in(kData + "tab_mtorr.csv", std::ios::binary);
    Reader r(in, "tab.csv");
    EXPECT_EQ(r.delimiter(), '\t');
    ASSERT_EQ(r.header().size(), 3u);
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.number(2), 75.0);
}

TEST(CsvReader, QuotedLineBreakBelongsToTheField) {
    std::istringstream in("T,P,note\n1,2,\"two\nlines\"\n3,4,x\n");
    Reader r(in, "q.csv");
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.field(2), "two\nlines");
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.row(), 4);  // rows are lines of the file
    EXPECT_EQ(r.number(0), 3.0);
}

TEST(CsvReader, RecordsLongerThanTheBufferAndAcrossRefills) {
    std::string text = "T,P\n";
    for (int i = 0; i < 5000; ++i) text += std::to_string(i) + ".5,1" + std::to_string(i) + "\n";
    std::istringstream in(text);
    ReaderOptions o;
    o.bufferBytes = 64;  // forces many refills (minimum 4096 bytes in practice)
    Reader r(in, "big.csv", o);
    long n = 0;
    double sum = 0.0;
    while (r.next()) {
        sum += r.number(0);
        ++n;
    }
    EXPECT_EQ(n, 5000);
    EXPECT_DOUBLE_EQ(sum, 5000.0 * 4999.0 / 2.0 + 2500.0);
}

TEST(CsvReader, LastLineWithoutLineEnd) {
    std::istringstream in("T;P\r\n1;2");
    Reader r(in, "x.csv");
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.number(1), 2.0);
    EXPECT_FALSE(r.next());
}

TEST(CsvReader, BadCellsNameFileRowAndColumn) {
    std::istringstream in("T [K],P [Pa]\n300,abc\n300,\n300,nan\n");
    Reader r(in, "run.csv");
    ASSERT_TRUE(r.next());
    try {
        r.number(1);
        FAIL() << "no error";
    } catch (const InputError &e) {
        EXPECT_EQ(e.file(), "run.csv");
        EXPECT_EQ(e.row(), 2);
        EXPECT_EQ(e.field(), "P [Pa]");
        EXPECT_NE(std::string(e.what()).find("'abc' is not a number"), std::string::npos);
    }
    ASSERT_TRUE(r.next());
    EXPECT_THROW(r.number(1), InputError);  // missing value
    ASSERT_TRUE(r.next());
    EXPECT_THROW(r.number(1), InputError);  // not finite
}

TEST(CsvReader, WrongFieldCountIsAnErrorAndReadingGoesOn) {
    std::istringstream in("T,P\n1,2,3\n4,5\n");
    Reader r(in, "f.csv");
    try {
        r.next();
        FAIL() << "no error";
    } catch (const InputError &e) {
        EXPECT_EQ(e.row(), 2);
        EXPECT_NE(std::string(e.what()).find("3 fields"), std::string::npos);
    }
    ASSERT_TRUE(r.next());
    EXPECT_EQ(r.number(0), 4.0);
}

TEST(CsvReader, DecimalCommaOnlyWhenDeclared) {
    std::istringstream undeclared("T;P\n12,5;3\n");
    Reader r(undeclared, "d.csv");
    ASSERT_TRUE(r.next());
    try {
        r.number(0);
        FAIL() << "decimal comma accepted without being declared";
    } catch (const InputError &e) {
        EXPECT_NE(std::string(e.what()).find("--decimal-comma"), std::string::npos);
    }
    ReaderOptions o;
    o.decimalComma = true;
    std::istringstream commaSeparated("T,P\n1,2\n");
    EXPECT_THROW(Reader(commaSeparated, "c.csv", o), InputError);  // ambiguous: refused
    std::istringstream thousands("T;P\n1.234,5;2\n");
    Reader t(thousands, "t.csv", o);
    ASSERT_TRUE(t.next());
    EXPECT_THROW(t.number(0), InputError);  // '.' and ',' together: refused
}

TEST(CsvReader, AmbiguousOrMissingHeader) {
    std::istringstream tie("a,b;c\n");
    EXPECT_THROW(Reader(tie, "tie.csv"), InputError);
    std::istringstream empty("");
    EXPECT_THROW(Reader(empty, "empty.csv"), InputError);
    std::istringstream unclosed("T,P\n1,\"2\n");
    Reader r(unclosed, "u.csv");
    EXPECT_THROW(r.next(), InputError);
}

TEST(CsvReader, ParseNumberDirectly) {
    double v = 0.0;
    EXPECT_FALSE(parseNumber(" 1.5e-3 ", false, v));
    EXPECT_EQ(v, 1.5e-3);
    EXPECT_TRUE(parseNumber("1.5.3", false, v));
    EXPECT_TRUE(parseNumber("inf", false, v));
    EXPECT_TRUE(parseNumber("0x10", false, v));
    EXPECT_FALSE(parseNumber("-0,25", true, v));
    EXPECT_EQ(v, -0.25);
}

}  // namespace
}  // namespace pw::csv
