#include "widgets/settings.h"

#include <QFileInfo>

#include "core/errors.h"

namespace pw::ui {
namespace {

// Keys live here only.
constexpr auto kTUnit = "units/temperature";
constexpr auto kPUnit = "units/pressure";
constexpr auto kLogP = "diagram/logPressure";
constexpr auto kAtm = "diagram/showAtmosphere";
constexpr auto kRecent = "files/recent";
constexpr auto kLastDir = "files/lastDirectory";
constexpr auto kGeometry = "window/geometry";
constexpr auto kState = "window/state";
constexpr auto kCaution = "firstRun/cautionShown";
constexpr auto kAutosave = "session/autosaveSeconds";
constexpr auto kFigure = "figure/";  // + format, widthMm, heightMm, dpi, legend, caption...

template <typename Unit, typename Parse>
Unit readUnit(const QSettings &store, const char *key, Unit fallback, Parse parse) {
    const QString text = store.value(QLatin1String(key)).toString();
    if (text.isEmpty()) return fallback;
    try {
        return parse(text.toStdString());
    } catch (const pw::UnitError &) {
        return fallback;  // a hand-edited or stale value: keep the default
    }
}

}  // namespace

Settings::Settings(QSettings &store, QObject *parent) : QObject(parent), store_(store) {
    units_.temperature = readUnit(store_, kTUnit, TemperatureUnit::Kelvin,
                                  [](const std::string &s) { return parseTemperatureUnit(s); });
    units_.pressure = readUnit(store_, kPUnit, PressureUnit::Pa,
                               [](const std::string &s) { return parsePressureUnit(s); });
    logPressure_ = store_.value(QLatin1String(kLogP), true).toBool();
    showAtmosphere_ = store_.value(QLatin1String(kAtm), true).toBool();
    recentFiles_ = store_.value(QLatin1String(kRecent)).toStringList();
    bool ok = false;
    const int seconds = store_.value(QLatin1String(kAutosave), kDefaultAutosaveSeconds).toInt(&ok);
    autosaveSeconds_ = ok && seconds >= 0 ? seconds : kDefaultAutosaveSeconds;
}

void Settings::setUnits(DisplayUnits units) {
    if (units == units_) return;
    units_ = units;
    store_.setValue(QLatin1String(kTUnit), QString::fromUtf8(symbol(units.temperature).data()));
    store_.setValue(QLatin1String(kPUnit), QString::fromUtf8(symbol(units.pressure).data()));
    emit unitsChanged(units_);
}

void Settings::setLogPressure(bool on) {
    if (on == logPressure_) return;
    logPressure_ = on;
    store_.setValue(QLatin1String(kLogP), on);
    emit logPressureChanged(on);
}

void Settings::setShowAtmosphere(bool on) {
    if (on == showAtmosphere_) return;
    showAtmosphere_ = on;
    store_.setValue(QLatin1String(kAtm), on);
    emit showAtmosphereChanged(on);
}

void Settings::addRecentFile(const QString &path) {
    const QString absolute = QFileInfo(path).absoluteFilePath();
    recentFiles_.removeAll(absolute);
    recentFiles_.prepend(absolute);
    while (recentFiles_.size() > kMaxRecentFiles) recentFiles_.removeLast();
    store_.setValue(QLatin1String(kRecent), recentFiles_);
    emit recentFilesChanged(recentFiles_);
}

void Settings::clearRecentFiles() {
    recentFiles_.clear();
    store_.setValue(QLatin1String(kRecent), recentFiles_);
    emit recentFilesChanged(recentFiles_);
}

QByteArray Settings::windowGeometry() const {
    return store_.value(QLatin1String(kGeometry)).toByteArray();
}
QByteArray Settings::windowState() const {
    return store_.value(QLatin1String(kState)).toByteArray();
}
void Settings::setWindowGeometry(const QByteArray &g) {
    store_.setValue(QLatin1String(kGeometry), g);
}
void Settings::setWindowState(const QByteArray &s) { store_.setValue(QLatin1String(kState), s); }

bool Settings::cautionShown() const {
    return store_.value(QLatin1String(kCaution), false).toBool();
}
void Settings::setCautionShown(bool shown) { store_.setValue(QLatin1String(kCaution), shown); }

void Settings::setAutosaveSeconds(int seconds) {
    if (seconds < 0 || seconds == autosaveSeconds_) return;
    autosaveSeconds_ = seconds;
    store_.setValue(QLatin1String(kAutosave), seconds);
    emit autosaveSecondsChanged(seconds);
}

QString Settings::lastDirectory() const { return store_.value(QLatin1String(kLastDir)).toString(); }
void Settings::setLastDirectory(const QString &dir) {
    store_.setValue(QLatin1String(kLastDir), dir);
}

FigureSpec Settings::figureSpec() const {
    const FigureSpec d;
    auto value = [this](const char *name, const QVariant &fallback) {
        return store_.value(QLatin1String(kFigure) + QLatin1String(name), fallback);
    };
    FigureSpec s;
    const int format = value("format", static_cast<int>(d.format)).toInt();
    s.format = format >= 0 && format <= 2 ? static_cast<FigureFormat>(format) : d.format;
    s.widthMm = value("widthMm", d.widthMm).toDouble();
    s.heightMm = value("heightMm", d.heightMm).toDouble();
    s.dpi = value("dpi", d.dpi).toInt();
    s.legend = value("legend", d.legend).toBool();
    s.caption = value("caption", d.caption).toBool();
    s.caution = value("caution", d.caution).toBool();
    s.pointPhases = value("pointPhases", d.pointPhases).toBool();
    if (!(s.widthMm >= 10 && s.widthMm <= 1000)) s.widthMm = d.widthMm;  // stale or hand-edited
    if (s.dpi < 50 || s.dpi > 2400) s.dpi = d.dpi;
    if (s.heightMm < 0) s.heightMm = 0;
    return s;
}

void Settings::setFigureSpec(const FigureSpec &s) {
    auto set = [this](const char *name, const QVariant &v) {
        store_.setValue(QLatin1String(kFigure) + QLatin1String(name), v);
    };
    set("format", static_cast<int>(s.format));
    set("widthMm", s.widthMm);
    set("heightMm", s.heightMm);
    set("dpi", s.dpi);
    set("legend", s.legend);
    set("caption", s.caption);
    set("caution", s.caution);
    set("pointPhases", s.pointPhases);
}

}  // namespace pw::ui
