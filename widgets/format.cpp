#include "widgets/format.h"

#include <cmath>

namespace pw::ui {
namespace {

const QChar kMinus(0x2212);

QString withMinus(QString s) {
    if (s.startsWith(QLatin1Char('-'))) s[0] = kMinus;
    return s;
}

// Significant digits that keep small and large pressures readable without exponents where
// possible: 4 significant digits, plain notation between 1e-3 and 1e6.
QString compactNumber(double v) {
    if (!std::isfinite(v)) return QStringLiteral("—");
    const double a = std::fabs(v);
    if (a != 0.0 && (a < 1e-3 || a >= 1e6)) return withMinus(QString::number(v, 'e', 3));
    const int digits = a == 0.0 ? 0 : static_cast<int>(std::floor(std::log10(a)));
    const int decimals = std::max(0, 3 - digits);
    return withMinus(QString::number(v, 'f', decimals));
}

}  // namespace

QString unitLabel(TemperatureUnit unit) {
    switch (unit) {
        case TemperatureUnit::Kelvin:
            return QStringLiteral("K");
        case TemperatureUnit::Celsius:
            return QStringLiteral("°C");
        case TemperatureUnit::Fahrenheit:
            return QStringLiteral("°F");
        case TemperatureUnit::Rankine:
            return QStringLiteral("°R");
    }
    return QStringLiteral("K");
}

QString unitLabel(PressureUnit unit) {
    if (unit == PressureUnit::ubar) return QStringLiteral("µbar");
    return QString::fromLatin1(symbol(unit).data(), static_cast<int>(symbol(unit).size()));
}

QString temperatureText(double T_K, TemperatureUnit unit) {
    if (!std::isfinite(T_K)) return QStringLiteral("—");
    return withMinus(QString::number(fromKelvin(T_K, unit), 'f', 2));
}

QString pressureText(double P_Pa, PressureUnit unit) {
    return compactNumber(fromPascal(P_Pa, unit));
}

QString temperatureWithUnit(double T_K, TemperatureUnit unit) {
    return temperatureText(T_K, unit) + QChar(0x202F) + unitLabel(unit);
}

QString pressureWithUnit(double P_Pa, PressureUnit unit) {
    return pressureText(P_Pa, unit) + QChar(0x202F) + unitLabel(unit);
}

QString deltaTemperatureText(double dT_K, TemperatureUnit unit) {
    if (!std::isfinite(dT_K)) return QStringLiteral("—");
    const double d = differenceFromKelvin(dT_K, unit);
    const QString unitText =
        unit == TemperatureUnit::Celsius ? QStringLiteral("K") : unitLabel(unit);
    return (d >= 0 ? QStringLiteral("+") : QString()) + withMinus(QString::number(d, 'f', 2)) +
           QChar(0x202F) + unitText;
}

QString deltaPressureText(double dP_Pa, PressureUnit unit) {
    if (!std::isfinite(dP_Pa)) return QStringLiteral("—");
    const double d = fromPascal(dP_Pa, unit);
    return (d >= 0 ? QStringLiteral("+") : QString()) + compactNumber(d) + QChar(0x202F) +
           unitLabel(unit);
}

QString regionName(const Classification &c) {
    switch (c.phase) {
        case Phase::Solid:
            return c.solidForm.empty() || c.solidForm == "unknown"
                       ? QStringLiteral("solid")
                       : QString::fromStdString(c.solidForm);
        case Phase::Liquid:
            return QStringLiteral("liquid");
        case Phase::Vapor:
            return QStringLiteral("vapor");
        case Phase::Gas:
            return QStringLiteral("gas");
        case Phase::Supercritical:
            return QStringLiteral("supercritical fluid");
        case Phase::Unknown:
            break;
    }
    return {};
}

QString phaseText(const Classification &c) {
    if (c.phase == Phase::Solid && !c.solidForm.empty() && c.solidForm != "solid")
        return QStringLiteral("solid (%1)").arg(QString::fromStdString(c.solidForm));
    if (c.phase == Phase::Unknown)
        return c.reason.empty()
                   ? QStringLiteral("unknown")
                   : QStringLiteral("unknown (%1)").arg(QString::fromStdString(c.reason));
    return regionName(c);
}

bool parseNumber(const QString &text, double &value) {
    QString t = text.trimmed();
    t.replace(kMinus, QLatin1Char('-'));
    bool ok = false;
    const double v = t.toDouble(&ok);
    if (!ok || !std::isfinite(v)) return false;
    value = v;
    return true;
}

}  // namespace pw::ui
