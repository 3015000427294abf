#pragma once
// How numbers, units and classifications are shown to users in the desktop (one place, so
// the table, the readout and the diagram labels agree).
#include <QString>

#include "core/classify.h"
#include "widgets/settings.h"

namespace pw::ui {

// "K", "°C", "°F", "°R"; "Pa", "MPa", "µbar"...
QString unitLabel(TemperatureUnit unit);
QString unitLabel(PressureUnit unit);

// A value in the user's unit, without the unit ("−40.00", "12.84", "7.377").
QString temperatureText(double T_K, TemperatureUnit unit);
QString pressureText(double P_Pa, PressureUnit unit);
// With the unit: "−40.00 °C", "12.84 Pa".
QString temperatureWithUnit(double T_K, TemperatureUnit unit);
QString pressureWithUnit(double P_Pa, PressureUnit unit);
// Signed differences: "+1.25 K", "−66.02 Pa"; "—" for NaN.
QString deltaTemperatureText(double dT_K, TemperatureUnit unit);
QString deltaPressureText(double dP_Pa, PressureUnit unit);

// "solid (ice Ih)", "liquid", "supercritical fluid"...
QString phaseText(const Classification &c);
// Short region name used for diagram labels: "ice III", "solid", "liquid", "vapor", "gas",
// "supercritical fluid", or empty for unknown.
QString regionName(const Classification &c);

// Parse a number typed by a user (accepts the Unicode minus sign); false on failure.
bool parseNumber(const QString &text, double &value);

}  // namespace pw::ui
