#pragma once
// Units of temperature and (absolute) pressure. Inside Phasewright every temperature is in
// kelvin and every pressure in pascal; conversion happens only at the edges (files, CLI, UI).
#include <string>
#include <string_view>

namespace pw {

enum class TemperatureUnit { Kelvin, Celsius, Fahrenheit, Rankine };
enum class PressureUnit { Pa, kPa, MPa, GPa, bar, mbar, ubar, atm, Torr, mTorr, mmHg, psi };

// Lenient parsing: case-insensitive, surrounding blanks ignored, common spellings accepted
// ("degC", "°C", "C", "celsius"; "µbar", "ubar", "microbar"; "psia"...). Throws UnitError
// naming the string and the accepted spellings.
TemperatureUnit parseTemperatureUnit(std::string_view text);
PressureUnit parsePressureUnit(std::string_view text);

double toKelvin(double value, TemperatureUnit unit);
double fromKelvin(double kelvin, TemperatureUnit unit);
// A temperature *difference* in kelvin expressed in `unit` (degF/degR: x 9/5).
double differenceFromKelvin(double deltaK, TemperatureUnit unit);
double toPascal(double value, PressureUnit unit);
double fromPascal(double pascal, PressureUnit unit);
// Pascal per one `unit`.
double pascalPer(PressureUnit unit);

// Canonical short symbol used in files and output ("K", "degC", "MPa", "mTorr"...).
std::string_view symbol(TemperatureUnit unit);
std::string_view symbol(PressureUnit unit);

inline constexpr double kStandardAtmosphere_Pa = 101325.0;  // exact by definition (CGPM 1954)
inline constexpr double kGasConstant = 8.314462618;  // J/(mol K), CODATA 2018 (exact product)

}  // namespace pw
