#include "core/units.h"

#include <algorithm>
#include <array>
#include <cctype>
#include <utility>

#include "core/errors.h"

namespace pw {
namespace {

// Lower-case ASCII, drop blanks, and fold the degree and micro signs to plain letters.
std::string normalise(std::string_view text) {
    std::string s;
    for (std::size_t i = 0; i < text.size(); ++i) {
        const auto c = static_cast<unsigned char>(text[i]);
        if (std::isspace(c) || c == '_' || c == '.') continue;
        if (c == 0xC2 && i + 1 < text.size()) {  // U+00B0 degree, U+00B5 micro (UTF-8)
            const auto d = static_cast<unsigned char>(text[i + 1]);
            if (d == 0xB0) {
                s += "deg";
                ++i;
                continue;
            }
            if (d == 0xB5) {
                s += 'u';
                ++i;
                continue;
            }
        }
        if (c == 0xCE && i + 1 < text.size() &&
            static_cast<unsigned char>(text[i + 1]) == 0xBC) {  // U+03BC greek mu
            s += 'u';
            ++i;
            continue;
        }
        s += static_cast<char>(std::tolower(c));
    }
    return s;
}

template <typename Unit, std::size_t N>
Unit lookup(std::string_view text, const std::array<std::pair<const char *, Unit>, N> &table,
            const char *kind, const char *accepted) {
    const std::string key = normalise(text);
    for (const auto &[name, unit] : table)
        if (key == name) return unit;
    throw UnitError(std::string("unknown ") + kind + " unit '" + std::string(text) +
                    "' (accepted: " + accepted + ")");
}

}  // namespace

TemperatureUnit parseTemperatureUnit(std::string_view text) {
    using U = TemperatureUnit;
    static constexpr std::array<std::pair<const char *, U>, 16> table{{
        {"k", U::Kelvin},
        {"kelvin", U::Kelvin},
        {"degk", U::Kelvin},
        {"c", U::Celsius},
        {"degc", U::Celsius},
        {"celsius", U::Celsius},
        {"degreesc", U::Celsius},
        {"f", U::Fahrenheit},
        {"degf", U::Fahrenheit},
        {"fahrenheit", U::Fahrenheit},
        {"degreesf", U::Fahrenheit},
        {"r", U::Rankine},
        {"degr", U::Rankine},
        {"rankine", U::Rankine},
        {"degreesr", U::Rankine},
        {"ra", U::Rankine},
    }};
    return lookup(text, table, "temperature", "K, degC (°C, C), degF (°F, F), degR (R)");
}

PressureUnit parsePressureUnit(std::string_view text) {
    using U = PressureUnit;
    static constexpr std::array<std::pair<const char *, U>, 24> table{{
        {"pa", U::Pa},           {"pascal", U::Pa},
        {"kpa", U::kPa},         {"mpa", U::MPa},
        {"gpa", U::GPa},         {"bar", U::bar},
        {"bara", U::bar},        {"mbar", U::mbar},
        {"millibar", U::mbar},   {"ubar", U::ubar},
        {"microbar", U::ubar},   {"atm", U::atm},
        {"torr", U::Torr},       {"mtorr", U::mTorr},
        {"millitorr", U::mTorr}, {"micron", U::mTorr},
        {"microns", U::mTorr},   {"mmhg", U::mmHg},
        {"psi", U::psi},         {"psia", U::psi},
        {"hpa", U::mbar},        {"mmhg(0degc)", U::mmHg},
        {"lbf/in2", U::psi},     {"lbf/in^2", U::psi},
    }};
    // "mpa" would be ambiguous (milli vs mega) after case folding: decide on the raw text.
    const std::string key = normalise(text);
    if (key == "mpa") {
        std::string raw;
        for (char c : text)
            if (!std::isspace(static_cast<unsigned char>(c))) raw += c;
        if (raw == "mPa")
            throw UnitError("unit 'mPa' (millipascal) is not supported; did you mean MPa?");
        return U::MPa;
    }
    return lookup(text, table, "pressure",
                  "Pa, kPa, MPa, GPa, bar, mbar, ubar (µbar), atm, Torr, mTorr, mmHg, psi");
}

double toKelvin(double v, TemperatureUnit u) {
    switch (u) {
        case TemperatureUnit::Kelvin:
            return v;
        case TemperatureUnit::Celsius:
            return v + 273.15;
        case TemperatureUnit::Fahrenheit:
            return (v + 459.67) * 5.0 / 9.0;
        case TemperatureUnit::Rankine:
            return v * 5.0 / 9.0;
    }
    return v;
}

double fromKelvin(double k, TemperatureUnit u) {
    switch (u) {
        case TemperatureUnit::Kelvin:
            return k;
        case TemperatureUnit::Celsius:
            return k - 273.15;
        case TemperatureUnit::Fahrenheit:
            return k * 9.0 / 5.0 - 459.67;
        case TemperatureUnit::Rankine:
            return k * 9.0 / 5.0;
    }
    return k;
}

double differenceFromKelvin(double dK, TemperatureUnit u) {
    return (u == TemperatureUnit::Fahrenheit || u == TemperatureUnit::Rankine) ? dK * 9.0 / 5.0
                                                                               : dK;
}

double pascalPer(PressureUnit u) {
    switch (u) {
        case PressureUnit::Pa:
            return 1.0;
        case PressureUnit::kPa:
            return 1e3;
        case PressureUnit::MPa:
            return 1e6;
        case PressureUnit::GPa:
            return 1e9;
        case PressureUnit::bar:
            return 1e5;
        case PressureUnit::mbar:
            return 1e2;
        case PressureUnit::ubar:
            return 0.1;
        case PressureUnit::atm:
            return kStandardAtmosphere_Pa;
        case PressureUnit::Torr:
            return kStandardAtmosphere_Pa / 760.0;  // 1 Torr = 1/760 atm
        case PressureUnit::mTorr:
            return kStandardAtmosphere_Pa / 760.0e3;
        case PressureUnit::mmHg:
            return 133.322387415;  // conventional mmHg (BIPM SI brochure)
        case PressureUnit::psi:
            return 6894.757293168361;  // lbf/in^2 = 0.45359237*9.80665/0.0254^2
    }
    return 1.0;
}

double toPascal(double v, PressureUnit u) { return v * pascalPer(u); }
double fromPascal(double pa, PressureUnit u) { return pa / pascalPer(u); }

std::string_view symbol(TemperatureUnit u) {
    switch (u) {
        case TemperatureUnit::Kelvin:
            return "K";
        case TemperatureUnit::Celsius:
            return "degC";
        case TemperatureUnit::Fahrenheit:
            return "degF";
        case TemperatureUnit::Rankine:
            return "degR";
    }
    return "K";
}

std::string_view symbol(PressureUnit u) {
    switch (u) {
        case PressureUnit::Pa:
            return "Pa";
        case PressureUnit::kPa:
            return "kPa";
        case PressureUnit::MPa:
            return "MPa";
        case PressureUnit::GPa:
            return "GPa";
        case PressureUnit::bar:
            return "bar";
        case PressureUnit::mbar:
            return "mbar";
        case PressureUnit::ubar:
            return "ubar";
        case PressureUnit::atm:
            return "atm";
        case PressureUnit::Torr:
            return "Torr";
        case PressureUnit::mTorr:
            return "mTorr";
        case PressureUnit::mmHg:
            return "mmHg";
        case PressureUnit::psi:
            return "psi";
    }
    return "Pa";
}

}  // namespace pw
