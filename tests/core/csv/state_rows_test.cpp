// The block scanner of state files against the record-by-record reader it stands in for:
// the same records, the same values (bit for bit), the same bad rows with the same messages,
// however the file is cut into blocks. The reference is csv::Reader::next() with
// Reader::number() and checkedState(), the path of the path and plot commands.
#include "core/csv/state_rows.h"

#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "tests/core/csv/state_rows_outcomes.h"

namespace pw::csv {
namespace {

using testing::outcomesByReader;
using testing::outcomesByScanner;

std::vector<std::string> byScanner(const std::string &text, bool decimalComma,
                                   std::size_t blockBytes) {
    ReaderOptions o;
    o.decimalComma = decimalComma;
    return outcomesByScanner(text, o, blockBytes);
}

void expectSameAsReader(const std::string &text, bool decimalComma = false) {
    ReaderOptions o;
    o.decimalComma = decimalComma;
    const auto expected = outcomesByReader(text, o);
    for (std::size_t bytes :
         {std::size_t{1}, std::size_t{5}, std::size_t{16}, std::size_t{64}, std::size_t{1} << 20}) {
        EXPECT_EQ(byScanner(text, decimalComma, bytes), expected)
            << "blocks of " << bytes << " bytes, file:\n"
            << text;
    }
}

TEST(StateRows, PlainRowsTakeTheFastPathWithTheReadersValues) {
    expectSameAsReader("T [K],P [Pa]\n267.182122,1.08286e+07\n581.887309,131.019\n300,1e5\n");
    // No line end after the last row; CRLF line ends; empty lines counted but skipped.
    expectSameAsReader("T,P\r\n300,1e5\r\n\r\n\n250.5,2500\r\n301,1e5");
}

TEST(StateRows, OtherColumnsUnitsAndOrder) {
    expectSameAsReader("time [s],P [mTorr],note,T [degC]\n0,100,a,-40\n60,80.5,,-38.25\n");
    expectSameAsReader("P [kPa];T [degF]\n101.325;32\n1;-40\n");
}

TEST(StateRows, AnythingElseTakesTheFullWayWithTheSameResult) {
    // Blanks, '+' signs, quotes (a line break inside one), a decimal comma, and bad rows:
    // missing, not a number, not physical, wrong field count, a quote never closed.
    expectSameAsReader(
        "T,P,note\n 300 ,+1e5,x\n\"301\",1e5,\"two\nlines\"\n302,,x\n303,abc,x\n-1,1e5,x\n"
        "304,1e5\n305,1e5,x,y\n306,-5,x\n307,1e5,\"open\n");
    expectSameAsReader("T;P\n300,5;1e5\n301;1,5e5\n302;abc\n", true);
    expectSameAsReader("T,P\n1e999,1\n300,1e400\n0x10,1\n300,1e5\n");
}

TEST(StateRows, BadRowsNameTheirLineInTheFile) {
    const std::string text = "T,P\n300,1e5\n\n301,oops\n302,1e5\n";
    const auto rows = byScanner(text, false, 1 << 20);
    ASSERT_EQ(rows.size(), 3u);
    EXPECT_EQ(rows[1], "bad f.csv, row 4, field 'P': 'oops' is not a number");
}

}  // namespace
}  // namespace pw::csv
