#pragma once
// Fast, exact conversions between doubles and text for tables of millions of rows. Both give
// the very results of the standard library (checked against it on millions of values in
// tests/core/csv/number_text_test.cpp), only sooner:
// - writeShortest: the text std::to_chars(first, last, value) gives (the shortest text that
//   reads back to the same double; fixed or scientific, whichever is shorter, fixed on a tie).
//   The digits come from the Dragonbox algorithm (Jeon 2020) as built into {fmt}.
// - writeSignificant: the text of printf's %.Ng (std::to_chars with chars_format::general).
// - parseSimpleDecimal: the correctly rounded value of a plain decimal such as 267.182122 or
//   1.08286e+07, when the exact fast path applies (Clinger 1990: at most 19 significant
//   digits forming an integer below 2^53, scaled by 10^k with |k| <= 22: one correctly rounded
//   IEEE multiplication or division). Anything else returns false; the caller then asks
//   std::from_chars, which decides.
#include <cstddef>

namespace pw::csv {

// Room writeShortest needs at `out`: the text is at most 24 bytes ("-2.2250738585072014e-308"),
// but it writes in fixed-size blocks past the end of the text.
inline constexpr std::size_t kShortestMaxBytes = 48;

// Writes the shortest round-trip text of `value` at `out` (kShortestMaxBytes of room) and
// returns the end. Non-finite values give "inf", "-inf" or "nan", as std::to_chars does.
char *writeShortest(char *out, double value);

// Writes `value` rounded to `digits` significant digits (1 to 17), the text
// std::to_chars(out, out + kShortestMaxBytes, value, std::chars_format::general, digits)
// gives (printf's %.*g: trailing zeros dropped; scientific below 1e-4 and from 10^digits);
// `out` needs kShortestMaxBytes of room. Up to 13 digits a fast path scales by an exact power
// of ten and leaves values next to a rounding tie to the standard library.
char *writeSignificant(char *out, double value, int digits);

// [first, last) as a decimal number (optional '-', digits with an optional '.', an optional
// exponent), in full; false when the text has another form or needs the slow path.
bool parseSimpleDecimal(const char *first, const char *last, double &out);

// The decimal number (the forms parseSimpleDecimal reads) at the start of the text at
// `first`, up to the first byte that cannot continue it; returns the end of the number's text
// (the caller checks what follows), or nullptr when no such number starts there or the fast
// path does not apply. The text must hold such a byte before its buffer ends: a
// csv::TextBlock's padding is one.
const char *parseDecimalAt(const char *first, double &out);

}  // namespace pw::csv
