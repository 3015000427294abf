// The CSV writer's buffer: rows longer than the buffer, many flushes, quoting of line breaks.
#include <gtest/gtest.h>

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

}  // namespace
}  // namespace pw::csv
