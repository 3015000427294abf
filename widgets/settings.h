#pragma once
// The user's preferences in one typed object over a QSettings store (passed in by reference,
// never global): display units, axis scale, recent files, window state, first-run caution,
// autosave interval. Every setter writes through to the store and emits a change signal.
#include <QByteArray>
#include <QObject>
#include <QSettings>
#include <QStringList>

#include "core/units.h"
#include "widgets/figure/figure_spec.h"

namespace pw::ui {

struct DisplayUnits {
    TemperatureUnit temperature = TemperatureUnit::Kelvin;
    PressureUnit pressure = PressureUnit::Pa;
    bool operator==(const DisplayUnits &) const = default;
};

class Settings : public QObject {
    Q_OBJECT
public:
    static constexpr int kMaxRecentFiles = 8;
    static constexpr int kDefaultAutosaveSeconds = 60;

    explicit Settings(QSettings &store, QObject *parent = nullptr);

    DisplayUnits units() const { return units_; }
    void setUnits(DisplayUnits units);
    bool logPressure() const { return logPressure_; }
    void setLogPressure(bool on);
    bool showAtmosphere() const { return showAtmosphere_; }
    void setShowAtmosphere(bool on);

    QStringList recentFiles() const { return recentFiles_; }
    void addRecentFile(const QString &path);  // most recent first, duplicates removed
    void clearRecentFiles();

    QByteArray windowGeometry() const;
    QByteArray windowState() const;
    void setWindowGeometry(const QByteArray &geometry);
    void setWindowState(const QByteArray &state);

    bool cautionShown() const;
    void setCautionShown(bool shown);
    int autosaveSeconds() const { return autosaveSeconds_; }  // 0 disables autosave
    void setAutosaveSeconds(int seconds);
    QString lastDirectory() const;
    void setLastDirectory(const QString &dir);
    // Figure export options remembered between uses (widgets/figure/export_dialog.h); the
    // title and date are not kept.
    FigureSpec figureSpec() const;
    void setFigureSpec(const FigureSpec &spec);

signals:
    void unitsChanged(pw::ui::DisplayUnits units);
    void logPressureChanged(bool on);
    void showAtmosphereChanged(bool on);
    void recentFilesChanged(const QStringList &files);
    void autosaveSecondsChanged(int seconds);

private:
    QSettings &store_;
    DisplayUnits units_;
    bool logPressure_ = true;
    bool showAtmosphere_ = true;
    QStringList recentFiles_;
    int autosaveSeconds_ = kDefaultAutosaveSeconds;
};

}  // namespace pw::ui
