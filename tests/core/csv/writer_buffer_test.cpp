// The CSV writer's buffer: rows longer than the buffer, many flushes, quoting of line breaks.
#include <gtest/gtest.h>

#include <algorithm>
#include <sstream>
#include <string>

#include "core/csv/writer.h"

namespace pw::csv {
namespace {

TEST(CsvWriterBuffer, RowLongerThanTheBufferIsWrittenWhole) {
    std::ostringstream out;
    Writer w(out, ',', 16);  // far smaller than one row
    const std::string longText(100000, 'x');
    w.raw(longText);
    w.field(longText);
    w.field(2.5);
    w.endRow();
    w.flush();
    EXPECT_EQ(out.str(), longText + "," + longText + ",2.5\n");
}

TEST(CsvWriterBuffer, ManySmallFlushesKeepEveryRowInOrder) {
    std::ostringstream out, expected;
    Writer w(out, ';', 64);
    for (int i = 0; i < 5000; ++i) {
        w.field(static_cast<double>(i));
        w.field("a\nb");  // a line break inside a field is quoted (RFC 4180, section 2.6)
        w.field("");
        w.endRow();
        expected << i << ";\"a\nb\";\n";
    }
    w.flush();
    EXPECT_EQ(out.str(), expected.str());
}

TEST(CsvWriterBuffer, MemoryWriterKeepsItsRowsUntilCleared) {
    Writer w(';');
    for (int i = 0; i < 20000; ++i) {  // past the 64 KiB flush limit of a stream writer
        w.field(0.1 * i);
        w.field("x;y");
        w.endRow();
    }
    w.flush();  // nothing to flush to: the text stays
    const std::string_view text = w.text();
    EXPECT_EQ(text.substr(0, 12), "0;\"x;y\"\n0.1;");
    EXPECT_EQ(std::count(text.begin(), text.end(), '\n'), 20000);
    w.clear();
    EXPECT_TRUE(w.text().empty());
    w.field(2.5);
    w.endRow();
    EXPECT_EQ(w.text(), "2.5\n");  // a new row after clear(): no separator in front
}

}  // namespace
}  // namespace pw::csv
