// Fuzz target: the unit parsers (core/units.h). A unit that parses must survive the round
// trip through its canonical symbol, and a conversion to K or Pa and back must return a
// finite value for a finite input.
#include <cmath>
#include <cstdint>
#include <cstdlib>
#include <cstring>
#include <string_view>

#include "core/errors.h"
#include "core/units.h"

namespace {

double valueFrom(const std::uint8_t *data, std::size_t size) {
    double v = 1.0;
    if (size >= sizeof v) std::memcpy(&v, data, sizeof v);
    return std::isfinite(v) && std::fabs(v) < 1e12 ? v : 1.0;
}

void temperature(std::string_view text, double v) {
    try {
        const pw::TemperatureUnit u = pw::parseTemperatureUnit(text);
        if (pw::parseTemperatureUnit(pw::symbol(u)) != u) std::abort();
        if (!std::isfinite(pw::fromKelvin(pw::toKelvin(v, u), u))) std::abort();
    } catch (const pw::UnitError &) {
    }
}

void pressure(std::string_view text, double v) {
    try {
        const pw::PressureUnit u = pw::parsePressureUnit(text);
        if (pw::parsePressureUnit(pw::symbol(u)) != u) std::abort();
        if (!std::isfinite(pw::fromPascal(pw::toPascal(v, u), u))) std::abort();
    } catch (const pw::UnitError &) {
    }
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    const std::string_view text(reinterpret_cast<const char *>(data), size);
    const double v = valueFrom(data, size);
    temperature(text, v);
    pressure(text, v);
    return 0;
}
