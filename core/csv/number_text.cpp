#include "core/csv/number_text.h"

#include <fmt/format.h>

#include <algorithm>
#include <array>
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

// The eight decimal digits of v < 10^8, leading zeros included, as ASCII in the bytes of a
// 64-bit word, first digit in the lowest byte: three rounds that split every lane in two
// (10^4, then 100, then 10), each a multiplication by a rounded-up reciprocal that is exact
// over the lane's range (q = floor(w * ceil(2^s / d) / 2^s) = floor(w / d): checked for
// all 10^8 values once, and on a sample by tests/core/csv/number_text_test.cpp).
// Two digits of v (v < 100) at out.
void putPair(char *out, std::uint32_t v) { std::memcpy(out, kPairs + 2 * v, 2); }

[[gnu::always_inline]] inline std::uint64_t eightDigits(std::uint32_t v) {
    const std::uint64_t q = (std::uint64_t{v} * 109951163) >> 40;          // v / 10^4
    std::uint64_t x = q | ((v - q * 10000) << 32);                         // lanes of 32 bits
    const std::uint64_t q2 = ((x * 10486) >> 20) & 0x0000007F0000007Full;  // w / 100
    x = q2 | ((x - q2 * 100) << 16);                                       // lanes of 16 bits
    const std::uint64_t q3 = ((x * 103) >> 10) & 0x000F000F000F000Full;    // w / 10
    x = q3 | ((x - q3 * 10) << 8);                                         // one digit a byte
    x |= 0x3030303030303030ull;
    if constexpr (std::endian::native == std::endian::big) x = __builtin_bswap64(x);
    return x;
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

constexpr int kDigitsEnd = 17;  // digitsOf writes 17 digits

// How many decimal digits m has (0 < m < 10^18).
int digitCount(std::uint64_t m) {
    const int bits = 64 - std::countl_zero(m);
    const int t = (bits * 1233) >> 12;  // 1233 / 4096 ~ log10(2)
    return t + 1 - (m < kPow10Int[t] ? 1 : 0);
}

// The digits of m (0 < m < 10^17) as 17 digits with leading zeros: the same work for every
// number, so no branch depends on its length. The significant digits end at buf + 17.
[[gnu::always_inline]] inline void digitsOf(char *buf, std::uint64_t m) {
    const std::uint64_t top = m / 10000000000000000ull;  // < 10
    const std::uint64_t rest = m % 10000000000000000ull;
    buf[0] = static_cast<char>('0' + top);
    const std::uint64_t high = eightDigits(static_cast<std::uint32_t>(rest / 100000000));
    const std::uint64_t low = eightDigits(static_cast<std::uint32_t>(rest % 100000000));
    std::memcpy(buf + 1, &high, 8);
    std::memcpy(buf + 9, &low, 8);
}

// Writing from registers: the digits stay in two words (the first eight digits in `high`,
// the next eight in `low`, first digit in the lowest byte) and go out in 8-byte stores only.
// Copying them through a buffer at another offset than they were stored at would make the
// processor wait for the stores to complete (a failed store-to-load forward).
void store8(char *out, std::uint64_t w) { std::memcpy(out, &w, 8); }

// The bytes below byte k of a word (k = 0 to 8).
constexpr std::uint64_t lowBytes(int k) { return k >= 8 ? ~0ull : (1ull << (8 * k)) - 1; }

// w with '.' put in at byte k (0 to 7) and its bytes from k on moved up one (the top one
// falls out).
constexpr std::uint64_t withPoint(std::uint64_t w, int k) {
    return (w & lowBytes(k)) | (std::uint64_t{'.'} << (8 * k)) | ((w << 8) & ~lowBytes(k + 1));
}

constexpr std::uint64_t kZeroDigits = 0x3030303030303030ull;  // "00000000"

// 16 digits whose first n are significant (the rest '0') written with `point` digits before
// the decimal point, -3 <= point <= 16 (%g's fixed notation).
char *fixedFromWords(char *out, std::uint64_t high, std::uint64_t low, int n, int point) {
    if (point >= n) {  // an integer: the digits, then zeros
        store8(out, high);
        store8(out + 8, low);
        store8(out + 16, kZeroDigits);
        return out + point;
    }
    if (point <= 0) {  // 0.000ddd
        std::memcpy(out, "0.000000", 8);
        store8(out + 2 - point, high);
        store8(out + 10 - point, low);
        return out + 2 - point + n;
    }
    // The point in the first word or in the second: both made, one chosen without a branch.
    const bool first = point < 8;
    const std::uint64_t a = withPoint(high, point & 7), b = (high >> 56) | (low << 8);
    const std::uint64_t c = withPoint(low, point & 7);
    store8(out, first ? a : high);
    store8(out + 8, first ? b : c);
    store8(out + 16, low >> 56);
    return out + n + 1;
}

// The exponent part of scientific notation at out: 'e', a sign, 2 or 3 digits.
char *exponentPart(char *out, int exponent) {
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

// m (0 < m < 10^digits, digits <= 16) rounded to `digits` significant digits, in %g's form:
// fixed for -4 <= X < digits, else scientific; X is the exponent of its first digit.
char *significantText(char *out, std::uint64_t m, int digits, int X) {
    const std::uint64_t m16 = m * kPow10Int[16 - digits];  // the first digit at the front
    const std::uint64_t high = eightDigits(static_cast<std::uint32_t>(m16 / 100000000));
    const std::uint64_t low = eightDigits(static_cast<std::uint32_t>(m16 % 100000000));
    // %g drops trailing zeros: the last digit is the top byte of `low`.
    const int zeros = low != kZeroDigits ? std::countl_zero(low ^ kZeroDigits) / 8
                                         : 8 + std::countl_zero(high ^ kZeroDigits) / 8;
    const int n = 16 - zeros;
    if (X >= -4 && X < digits) return fixedFromWords(out, high, low, n, X + 1);
    fixedFromWords(out, high, low, n, 1);  // d.ddd
    return exponentPart(out + (n > 1 ? n + 1 : 1), X);
}

// The writers below copy fixed-size blocks (kCopy bytes) and then move the end back: the
// digit buffer and the output have room for the overshoot.
constexpr std::size_t kCopy = 20;

// "d.ddde+XX": one digit, the rest after a point, the exponent with a sign and 2 or 3 digits.
char *scientific(char *out, const char *digits, int n, int exponent) {
    out[0] = digits[0];
    out[1] = '.';
    std::memcpy(out + 2, digits + 1, kCopy);
    return exponentPart(out + (n > 1 ? n + 1 : 1), exponent);
}

// digits × 10^(point - n) written without an exponent: at most 16 zeros after the digits
// (shortest text: 5, beyond that scientific is shorter; n significant digits: n - 1) and at
// most 6 after "0." (shortest: 4; general format: 3).
[[gnu::always_inline]] inline char *fixed(char *out, const char *digits, int n, int point) {
    if (point >= n) {  // an integer: the digits, then zeros
        std::memcpy(out, digits, kCopy);
        std::memset(out + n, '0', 16);
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

// writeSignificant's fast path: up to 13 digits (s < 10^13, so its rounding error, below
// 10^13 2^-53 ~ 1.1e-3, stays well inside kHalfwayMargin), normal numbers whose exponent
// estimate stays in the table below.
constexpr int kMaxSignificant = 17;
constexpr int kFastSignificant = 13;
constexpr double kHalfwayMargin = 1e-2;
constexpr double kSmallestNormal = 2.2250738585072014e-308;
constexpr double kLargestFast = 1e300;
// a 10^k for |k| <= kMaxPow10, rounded once.
double scaled(double a, int k) { return k >= 0 ? a * kPow10[k] : a / kPow10[-k]; }

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
    char buf[kDigitsEnd + kCopy];
    digitsOf(buf, m);
    const int n = digitCount(m);
    const char *digits = buf + kDigitsEnd - n;
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

char *writeSignificant(char *out, double value, int digits) {
    digits = std::clamp(digits, 1, kMaxSignificant);
    const double a = std::abs(value);
    if (std::endian::native == std::endian::little && digits <= kFastSignificant &&
        a >= kSmallestNormal && a <= kLargestFast) {
        // X, the exponent of the leading digit, from the binary exponent (it is X0 or X0 + 1),
        // then s = a 10^(digits - 1 - X) in one correctly rounded operation with an exact
        // power of ten: its error, below 2^-53 s, is far less than kHalfwayMargin.
        const int e2 = static_cast<int>((std::bit_cast<std::uint64_t>(a) >> 52) & 0x7ff) - 1023;
        int X = (e2 * 1233) >> 12;  // floor(e2 log10 2), up to 1233/4096 ~ log10 2
        int k = digits - 1 - X;
        if (k > -kMaxPow10 && k <= kMaxPow10) {
            // Both scalings, then a choice without a branch (X0 or X0 + 1 is a coin toss for
            // values of every size: a branch on it would often be mispredicted).
            const double s0 = scaled(a, k), s1 = scaled(a, k - 1);
            const bool up = s0 >= kPow10[digits];
            X += up ? 1 : 0;
            const double s = up ? s1 : s0;
            // s is positive and below 2^53: truncation is floor, and s - whole is exact.
            const double whole = static_cast<double>(static_cast<std::uint64_t>(s));
            const double frac = s - whole;
            if (whole >= kPow10[digits - 1] && whole < kPow10[digits] &&
                std::abs(frac - 0.5) > kHalfwayMargin) {
                auto m = static_cast<std::uint64_t>(whole) + (frac > 0.5 ? 1 : 0);
                if (m == kPow10Int[digits]) {  // 9.99...95 rounded up to 10.0...0
                    m = kPow10Int[digits - 1];
                    ++X;
                }
                *out = '-';
                out += std::signbit(value) ? 1 : 0;
                return significantText(out, m, digits, X);
            }
        }
    }
    // Zero, subnormal, huge or too many digits for the fast path, or a value next to a
    // rounding tie: the standard library decides.
    return std::to_chars(out, out + kShortestMaxBytes, value, std::chars_format::general, digits)
        .ptr;
}

namespace {

// The text ends at `last` (Bounded) or at the first byte that cannot continue a number
// (Unbounded: the caller guarantees one).
struct Bounded {
    const char *last;
    char at(const char *p) const { return p != last ? *p : '\0'; }
};
struct Unbounded {
    static char at(const char *p) { return *p; }
};

// The plain decimal at p: the end of its text and its value, or nullptr when the text there
// is no such number or needs the slow path.
template <class End>
const char *parseDecimal(const char *p, End end, double &out) {
    const bool negative = end.at(p) == '-';
    if (negative) ++p;
    const char *start = p;
    while (end.at(p) == '0') ++p;  // leading zeros are not significant digits
    std::uint64_t m = 0;
    const char *digitsStart = p;
    for (; isDigit(end.at(p)); ++p) m = m * 10 + static_cast<std::uint64_t>(*p - '0');
    int digits = static_cast<int>(p - digitsStart), scale = 0;
    if (end.at(p) == '.') {
        const char *fraction = ++p;
        if (m == 0) {  // 0.000ddd: the zeros after the point only scale
            while (end.at(p) == '0') ++p;
        }
        const char *significant = p;
        for (; isDigit(end.at(p)); ++p) m = m * 10 + static_cast<std::uint64_t>(*p - '0');
        digits += static_cast<int>(p - significant);
        scale = -static_cast<int>(p - fraction);
    }
    if (digits > kMaxDigits) return nullptr;  // m may have wrapped: not the fast path
    if (p == start || (p - start == 1 && *start == '.')) return nullptr;  // no digit
    if (const char e = end.at(p); e == 'e' || e == 'E') {
        ++p;
        const bool down = end.at(p) == '-';
        if (end.at(p) == '-' || end.at(p) == '+') ++p;
        if (!isDigit(end.at(p))) return nullptr;
        int x = 0;
        for (; isDigit(end.at(p)); ++p) {
            if (x > 1000) return nullptr;  // far outside the fast path anyway
            x = x * 10 + (*p - '0');
        }
        scale += down ? -x : x;
    }
    if (m == 0) {
        out = negative ? -0.0 : 0.0;
        return p;
    }
    if (m > kExactInt || scale < -kMaxPow10 || scale > kMaxPow10) return nullptr;
    const double v = static_cast<double>(m);
    const double r = scale < 0 ? v / kPow10[-scale] : v * kPow10[scale];
    out = negative ? -r : r;
    return p;
}

}  // namespace

bool parseSimpleDecimal(const char *first, const char *last, double &out) {
    return parseDecimal(first, Bounded{last}, out) == last;
}

const char *parseDecimalAt(const char *first, double &out) {
    return parseDecimal(first, Unbounded{}, out);
}

}  // namespace pw::csv
