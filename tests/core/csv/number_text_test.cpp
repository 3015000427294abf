// The fast number conversions against the standard library they stand in for: the same text
// as std::to_chars (C++17 [charconv.to.chars]: shortest round trip, fixed or scientific by
// length) and the same double as std::from_chars (correct rounding) wherever the fast path
// answers.
#include <gtest/gtest.h>

#include <bit>
#include <charconv>
#include <cmath>
#include <cstdint>
#include <cstdio>
#include <cstring>
#include <limits>
#include <random>
#include <string>

#include "core/csv/number_text.h"

namespace pw::csv {
namespace {

std::string standardText(double v) {
    char buf[64];
    return {buf, std::to_chars(buf, buf + sizeof buf, v).ptr};
}

std::string fastText(double v) {
    char buf[kShortestMaxBytes];
    return {buf, writeShortest(buf, v)};
}

TEST(NumberText, ShortestMatchesToCharsOnChosenValues) {
    const double cases[] = {0.0,
                            -0.0,
                            1.0,
                            -1.0,
                            0.1,
                            2.5,
                            100.0,
                            1e5,
                            123456.0,
                            1e15,
                            1e16,
                            1e17,
                            1e21,
                            1e22,
                            1e23,
                            123456789012345678.0,
                            1.2345678901234567e20,
                            0.001,
                            0.0001,
                            1.5e-5,
                            -5.155284711006857,
                            -59439740.25061531,
                            611.657,
                            22.064e6,
                            1e-100,
                            1e100,
                            1.7976931348623157e308,
                            2.2250738585072014e-308,
                            4.9406564584124654e-324,
                            std::numeric_limits<double>::infinity(),
                            -std::numeric_limits<double>::infinity()};
    for (double v : cases) EXPECT_EQ(fastText(v), standardText(v)) << v;
    EXPECT_EQ(fastText(std::numeric_limits<double>::quiet_NaN()), "nan");
}

TEST(NumberText, ShortestMatchesToCharsOnRandomBitPatterns) {
    std::mt19937_64 rng(20261202);
    int compared = 0;
    for (int i = 0; i < 2'000'000; ++i) {
        const double v = std::bit_cast<double>(rng());
        if (!std::isfinite(v)) continue;
        ASSERT_EQ(fastText(v), standardText(v)) << std::bit_cast<std::uint64_t>(v);
        ++compared;
    }
    EXPECT_GT(compared, 1'990'000);
}

// Integers put every digit pattern through the eight-digit conversion: all below 10^6, a
// stride through 10^8 (the conversion was checked once on all 10^8 values), and the
// neighbours of every power of ten.
TEST(NumberText, ShortestMatchesToCharsOnIntegers) {
    for (int i = 0; i < 1'000'000; ++i) ASSERT_EQ(fastText(i), standardText(i)) << i;
    for (int i = 0; i < 100'000'000; i += 997) ASSERT_EQ(fastText(i), standardText(i)) << i;
    for (double p = 1.0; p < 1e17; p *= 10.0)
        for (double v : {p - 1.0, p, p + 1.0}) EXPECT_EQ(fastText(v), standardText(v)) << v;
}

// Margins as the classifier gives them: any sign, from 1e-12 to 1e10, and round numbers.
TEST(NumberText, ShortestMatchesToCharsOnMarginLikeValues) {
    std::mt19937_64 rng(7);
    std::uniform_real_distribution<double> mantissa(-1000.0, 1000.0), power(-15.0, 10.0);
    for (int i = 0; i < 1'000'000; ++i) {
        const double v = mantissa(rng) * std::pow(10.0, std::floor(power(rng)));
        ASSERT_EQ(fastText(v), standardText(v)) << v;
        const double round = std::round(v * 1000.0) / 1000.0;
        ASSERT_EQ(fastText(round), standardText(round)) << round;
    }
    for (int k = -323; k <= 308; ++k) {
        const double p = std::pow(10.0, k);
        EXPECT_EQ(fastText(p), standardText(p)) << k;
        EXPECT_EQ(fastText(std::nextafter(p, 0.0)), standardText(std::nextafter(p, 0.0))) << k;
    }
}

std::string standardGeneral(double v, int digits) {
    char buf[64];
    return {buf, std::to_chars(buf, buf + sizeof buf, v, std::chars_format::general, digits).ptr};
}

std::string fastGeneral(double v, int digits) {
    char buf[kShortestMaxBytes];
    return {buf, writeSignificant(buf, v, digits)};
}

TEST(NumberText, SignificantMatchesGeneralFormatOnChosenValues) {
    const double cases[] = {0.0,
                            -0.0,
                            1.0,
                            -1.0,
                            0.5,
                            2.5,
                            0.0001,
                            1e-5,
                            0.000123,
                            100.0,
                            1e11,
                            1e12,
                            1e13,
                            123456789012.0,
                            9.9999999999995,
                            9.99999999999949,
                            -5.155284711006857,
                            -59439740.25061531,
                            611.657,
                            22.064e6,
                            1e-300,
                            1e300,
                            1.7976931348623157e308,
                            4.9e-324,
                            std::numeric_limits<double>::infinity(),
                            std::numeric_limits<double>::quiet_NaN()};
    for (double v : cases)
        for (int digits = 1; digits <= 17; ++digits)
            EXPECT_EQ(fastGeneral(v, digits), standardGeneral(v, digits)) << v << " " << digits;
}

TEST(NumberText, SignificantMatchesGeneralFormatOnRandomValues) {
    std::mt19937_64 rng(17);
    std::uniform_real_distribution<double> mantissa(-1000.0, 1000.0), power(-16.0, 16.0);
    std::uniform_int_distribution<int> digits(1, 17);
    for (int i = 0; i < 1'000'000; ++i) {
        const double v = mantissa(rng) * std::pow(10.0, std::floor(power(rng)));
        ASSERT_EQ(fastGeneral(v, 12), standardGeneral(v, 12)) << v;
        const int d = digits(rng);
        ASSERT_EQ(fastGeneral(v, d), standardGeneral(v, d)) << v << " " << d;
        // Values on a decimal grid sit on or next to rounding ties.
        const double grid = std::round(v * 1e4) / 1e4 + 5e-5;
        ASSERT_EQ(fastGeneral(grid, 4), standardGeneral(grid, 4)) << grid;
    }
    for (int i = 0; i < 1'000'000; ++i) {
        const double v = std::bit_cast<double>(rng());
        ASSERT_EQ(fastGeneral(v, 12), standardGeneral(v, 12)) << v;
    }
}

double standardValue(const std::string &s) {
    double v = 0.0;
    std::from_chars(s.data(), s.data() + s.size(), v);
    return v;
}

bool fastValue(const std::string &s, double &v) {
    return parseSimpleDecimal(s.data(), s.data() + s.size(), v);
}

void expectSameValue(const std::string &s) {
    double v = 0.0;
    if (!fastValue(s, v)) return;  // the caller asks std::from_chars
    ASSERT_EQ(std::bit_cast<std::uint64_t>(v), std::bit_cast<std::uint64_t>(standardValue(s))) << s;
}

TEST(NumberText, ParsesTheUsualLogTextOnTheFastPath) {
    for (const char *s : {"267.182122", "1.08286e+07", "-45.5", "0.000123", "611.657", "1e5",
                          "22064000", "-0", "0.0", "1.", ".5", "1E-3", "3.14e+00"}) {
        double v = 0.0;
        EXPECT_TRUE(fastValue(s, v)) << s;
        EXPECT_EQ(std::bit_cast<std::uint64_t>(v), std::bit_cast<std::uint64_t>(standardValue(s)))
            << s;
    }
}

TEST(NumberText, LeavesEverythingElseToTheStandardParser) {
    double v = 0.0;
    for (const char *s : {"",
                          "-",
                          ".",
                          "+1",
                          " 1",
                          "1 ",
                          "1,5",
                          "nan",
                          "inf",
                          "1e",
                          "1e+",
                          "1e+x",
                          "0x10",
                          "1..2",
                          "--1",
                          "1e5.5",
                          "12345678901234567890",  // 20 digits
                          "9007199254740993",      // 2^53 + 1: not exact
                          "1e23",
                          "1e-23",
                          "1.5e400"})
        EXPECT_FALSE(fastValue(s, v)) << s;
}

// parseDecimalAt on `number` followed by `next` and a zero byte: where it says the number
// ends, and its value.
const char *paddedEnd(const std::string &number, char next, std::string &text, double &v) {
    text = number;
    text += next;
    text += '\0';
    return parseDecimalAt(text.data(), v);
}

TEST(NumberText, ParseAtEndsWhereTheNumberEnds) {
    // Every byte that cannot continue a number ends it, bytes above 0x7F included.
    for (const char *number : {"267.182122", "1.08286e+07", "-45", "12345678", "123456789", "7."}) {
        for (int c = 0; c < 256; ++c) {
            const char next = static_cast<char>(c);
            if ((next >= '0' && next <= '9') || next == '.' || next == 'e' || next == 'E') continue;
            std::string text;
            double v = 0.0;
            const char *end = paddedEnd(number, next, text, v);
            ASSERT_EQ(end, text.data() + std::strlen(number)) << number << " then byte " << c;
            ASSERT_EQ(std::bit_cast<std::uint64_t>(v),
                      std::bit_cast<std::uint64_t>(standardValue(number)))
                << number;
        }
    }
}

TEST(NumberText, ParseAtReadsRunsOfEveryLength) {
    // Runs of 0 to 20 digits before and after the point: past 19 significant digits, or past
    // 2^53, the fast path stands aside.
    std::mt19937_64 rng(5);
    for (int before = 0; before <= 20; ++before) {
        for (int after = 0; after <= 20; ++after) {
            for (int trial = 0; trial < 20; ++trial) {
                std::string number;
                for (int i = 0; i < before; ++i) number += static_cast<char>('0' + rng() % 10);
                if (after > 0) number += '.';
                for (int i = 0; i < after; ++i) number += static_cast<char>('0' + rng() % 10);
                if (before + after == 0) continue;
                std::string text;
                double v = 0.0;
                const char *end = paddedEnd(number, ',', text, v);
                // Up to 15 significant digits (below 2^53 whatever they are) the fast path
                // answers; beyond, it may stand aside, and where it answers it is exact.
                const auto first = number.find_first_not_of("0.");
                const std::size_t significant =
                    first == std::string::npos
                        ? 0
                        : number.size() - first - (number.find('.', first) != std::string::npos);
                if (end == nullptr) {
                    EXPECT_GT(significant, 15u) << number;
                    continue;
                }
                ASSERT_EQ(end, text.data() + number.size()) << number;
                ASSERT_EQ(std::bit_cast<std::uint64_t>(v),
                          std::bit_cast<std::uint64_t>(standardValue(number)))
                    << number;
            }
        }
    }
}

TEST(NumberText, FastPathAgreesWithFromCharsOnRandomText) {
    std::mt19937_64 rng(11);
    std::uniform_real_distribution<double> mantissa(-1000.0, 1000.0), power(-25.0, 25.0);
    std::uniform_int_distribution<int> precision(0, 18);
    char buf[64];
    int fast = 0;
    for (int i = 0; i < 300'000; ++i) {
        const double v = mantissa(rng) * std::pow(10.0, std::floor(power(rng)));
        const int digits = precision(rng);
        for (const char *format : {"%.*f", "%.*e", "%.*g"}) {
            std::snprintf(buf, sizeof buf, format, digits, v);
            const std::string s(buf);
            double parsed = 0.0;
            fast += fastValue(s, parsed) ? 1 : 0;
            expectSameValue(s);
        }
        expectSameValue(standardText(v));
    }
    EXPECT_GT(fast, 300'000);  // most of them take the fast path
}

}  // namespace
}  // namespace pw::csv
