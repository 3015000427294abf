#include "core/csv/number_text.h"

#include <fmt/format.h>

#include <bit>
#include <charconv>
#include <cmath>
#include <cstdint>
#include <cstring>

namespace pw::csv {
namespace {

constexpr char kPairs[] =
    "00010203040506070809101112131415161718192021222324252627282930313233343536373839"
    "40414243444546474849505152535455565758596061626364656667686970717273747576777879"
    "8081828384858687888990919293949596979899";

// Two digits of v (v < 100) at out.
void putPair(char *out, std::uint32_t v) { std::memcpy(out, kPairs + 2 * v, 2); }

// Eight digits of v (v < 10^8), leading zeros included.
void putEight(char *out, std::uint32_t v) {
    const std::uint32_t hi = v / 10000, lo = v % 10000;
    putPair(out, hi / 100);
    putPair(out + 2, hi % 100);
    putPair(out + 4, lo / 100);
    putPair(out + 6, lo % 100);
}

constexpr std::uint64_t kPow10Int[] = {1ull,
                                       10ull,
                                       100ull,
                                       1000ull,
                                       10000ull,
                                       100000ull,
                                       1000000ull,
                                       10000000ull,
                                       100000000ull,
                                       1000000000ull,
                                       10000000000ull,
                                       100000000000ull,
                                       1000000000000ull,
                                       10000000000000ull,
                                       100000000000000ull,
                                       1000000000000000ull,
                                       10000000000000000ull,
                                       100000000000000000ull,
                                       1000000000000000000ull};

// How many decimal digits m has (0 < m < 10^18).
int digitCount(std::uint64_t m) {
    const int bits = 64 - std::countl_zero(m);
    const int t = (bits * 1233) >> 12;  // 1233 / 4096 ~ log10(2)
    return t + 1 - (m < kPow10Int[t] ? 1 : 0);
}

// The digits of m (0 < m < 10^18) as 18 digits with leading zeros: the same work for every
// number, so no branch depends on its length. Returns the number of significant digits, which
// end at buf + 18.
int digitsOf(char *buf, std::uint64_t m) {
    const auto high = static_cast<std::uint32_t>(m / 10000000000000000ull);  // < 100
    const std::uint64_t low = m % 10000000000000000ull;
    putPair(buf, high);
    putEight(buf + 2, static_cast<std::uint32_t>(low / 100000000));
    putEight(buf + 10, static_cast<std::uint32_t>(low % 100000000));
    return digitCount(m);
}

// The writers below copy fixed-size blocks (kCopy bytes) and then move the end back: the
// digit buffer and the output have room for the overshoot.
constexpr std::size_t kCopy = 20;

// "d.ddde+XX": one digit, the rest after a point, the exponent with a sign and 2 or 3 digits.
char *scientific(char *out, const char *digits, int n, int exponent) {
    out[0] = digits[0];
    out[1] = '.';
    std::memcpy(out + 2, digits + 1, kCopy);
    out += n > 1 ? n + 1 : 1;
    out[0] = 'e';
    out[1] = exponent < 0 ? '-' : '+';
    const int a = exponent < 0 ? -exponent : exponent;
    if (a >= 100) {
        out[2] = static_cast<char>('0' + a / 100);
        putPair(out + 3, static_cast<std::uint32_t>(a % 100));
        return out + 5;
    }
    putPair(out + 2, static_cast<std::uint32_t>(a));
    return out + 4;
}

// digits × 10^(point - n) written without an exponent (at most 5 zeros are ever added:
// scientific is shorter beyond that).
char *fixed(char *out, const char *digits, int n, int point) {
    if (point >= n) {  // an integer: the digits, then zeros
        std::memcpy(out, digits, kCopy);
        std::memset(out + n, '0', 8);
        return out + point;
    }
    if (point > 0) {  // the point falls among the digits
        std::memcpy(out, digits, kCopy);
        out[point] = '.';
        std::memcpy(out + point + 1, digits + point, kCopy);
        return out + n + 1;
    }
    std::memcpy(out, "0.000000", 8);  // 0.000ddd
    std::memcpy(out + 2 - point, digits, kCopy);
    return out + 2 - point + n;
}

constexpr double kPow10[] = {1e0,  1e1,  1e2,  1e3,  1e4,  1e5,  1e6,  1e7,  1e8,  1e9,  1e10, 1e11,
                             1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
constexpr int kMaxPow10 = 22;                    // 10^22 is the largest power of ten a double holds
constexpr std::uint64_t kExactInt = 1ull << 53;  // integers up to this convert exactly
constexpr double kExactIntDouble = 9007199254740992.0;  // 2^53
constexpr int kMaxDigits = 19;                          // digits that always fit in 64 bits

bool isDigit(char c) { return c >= '0' && c <= '9'; }

}  // namespace

char *writeShortest(char *out, double value) {
    if (!std::isfinite(value)) return std::to_chars(out, out + kShortestMaxBytes, value).ptr;
    if (std::signbit(value)) {
        *out++ = '-';
        value = -value;
    }
    if (value == 0.0) {
        *out++ = '0';
        return out;
    }
    const auto dec = fmt::detail::dragonbox::to_decimal(value);
    std::uint64_t m = dec.significand;
    int e = dec.exponent;
    while (m % 10 == 0) {  // Dragonbox already drops them; kept for safety
        m /= 10;
        ++e;
    }
    char buf[18 + kCopy];
    const int n = digitsOf(buf, m);
    const char *digits = buf + 18 - n;
    const int point = n + e;  // value = 0.d1d2...dn × 10^point
    const int exponent = point - 1;
    const int sciLength = n + (n > 1 ? 1 : 0) + 2 + (std::abs(exponent) >= 100 ? 3 : 2);
    const int fixedLength = e >= 0 ? n + e : point > 0 ? n + 1 : 2 - e;
    if (fixedLength <= sciLength) {
        // An integer from 2^53 up is written with all its exact digits (123456789012345667584,
        // not ...670000), as std::to_chars does: leave those to it.
        if (e > 0 && value >= kExactIntDouble)
            return std::to_chars(out, out + kShortestMaxBytes, value).ptr;
        return fixed(out, digits, n, point);
    }
    return scientific(out, digits, n, exponent);
}

bool parseSimpleDecimal(const char *p, const char *last, double &out) {
    const bool negative = p != last && *p == '-';
    if (negative) ++p;
    const char *start = p;
    while (p != last && *p == '0') ++p;  // leading zeros are not significant digits
    std::uint64_t m = 0;
    const char *digitsStart = p;
    for (; p != last && isDigit(*p); ++p) m = m * 10 + static_cast<std::uint64_t>(*p - '0');
    int digits = static_cast<int>(p - digitsStart), scale = 0;
    if (p != last && *p == '.') {
        const char *fraction = ++p;
        if (m == 0) {  // 0.000ddd: the zeros after the point only scale
            while (p != last && *p == '0') ++p;
        }
        const char *significant = p;
        for (; p != last && isDigit(*p); ++p) m = m * 10 + static_cast<std::uint64_t>(*p - '0');
        digits += static_cast<int>(p - significant);
        scale = -static_cast<int>(p - fraction);
    }
    if (digits > kMaxDigits) return false;  // m may have wrapped: not the fast path
    const bool any = p != start && !(p - start == 1 && *start == '.');
    if (!any) return false;
    if (p != last && (*p == 'e' || *p == 'E')) {
        ++p;
        const bool down = p != last && *p == '-';
        if (p != last && (*p == '-' || *p == '+')) ++p;
        if (p == last) return false;
        int x = 0;
        for (; p != last && isDigit(*p); ++p) {
            if (x > 1000) return false;  // far outside the fast path anyway
            x = x * 10 + (*p - '0');
        }
        scale += down ? -x : x;
    }
    if (p != last) return false;
    if (m == 0) {
        out = negative ? -0.0 : 0.0;
        return true;
    }
    if (m > kExactInt || scale < -kMaxPow10 || scale > kMaxPow10) return false;
    const double v = static_cast<double>(m);
    const double r = scale < 0 ? v / kPow10[-scale] : v * kPow10[scale];
    out = negative ? -r : r;
    return true;
}

}  // namespace pw::csv
