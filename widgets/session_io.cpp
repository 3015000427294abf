#include "widgets/session_io.h"

#include <QJsonArray>
#include <QJsonDocument>
#include <QJsonObject>
#include <QSaveFile>
#include <cmath>

#include "core/errors.h"

namespace pw::ui {
namespace {

QString unitText(TemperatureUnit u) { return QString::fromLatin1(symbol(u).data()); }
QString unitText(PressureUnit u) { return QString::fromLatin1(symbol(u).data()); }

struct Reader {
    std::string file;
    [[noreturn]] void fail(const std::string &field, const std::string &what) const {
        throw InputError(file, 0, field, what);
    }
    double number(const QJsonObject &o, const char *key, const std::string &where) const {
        const QJsonValue v = o.value(QLatin1String(key));
        if (!v.isDouble() || !std::isfinite(v.toDouble()))
            fail(where + "/" + key, "expected a finite number");
        return v.toDouble();
    }
    QString string(const QJsonObject &o, const char *key, const std::string &where) const {
        const QJsonValue v = o.value(QLatin1String(key));
        if (!v.isString()) fail(where + "/" + key, "expected a string");
        return v.toString();
    }
};

void readUnits(const Reader &r, const QJsonObject &o, SessionData &s) {
    try {
        s.units.temperature = parseTemperatureUnit(r.string(o, "T", "/units").toStdString());
        s.units.pressure = parsePressureUnit(r.string(o, "P", "/units").toStdString());
    } catch (const UnitError &e) {
        r.fail("/units", e.what());
    }
}

void readView(const Reader &r, const QJsonObject &o, SessionData &s) {
    s.view.logPressure = o.value(QLatin1String("log_p")).toBool(true);
    s.showAtmosphere = o.value(QLatin1String("show_1atm")).toBool(true);
    if (!o.contains(QLatin1String("T_min_K"))) return;  // no view saved: the default applies
    s.view.T_min_K = r.number(o, "T_min_K", "/view");
    s.view.T_max_K = r.number(o, "T_max_K", "/view");
    s.view.P_min_Pa = r.number(o, "P_min_Pa", "/view");
    s.view.P_max_Pa = r.number(o, "P_max_Pa", "/view");
    if (!s.view.valid()) r.fail("/view", "the view's ranges are empty or not positive");
}

void readPoints(const Reader &r, const QJsonArray &a, SessionData &s) {
    for (int i = 0; i < a.size(); ++i) {
        const std::string where = "/points/" + std::to_string(i);
        if (!a[i].isObject()) r.fail(where, "expected an object");
        const QJsonObject p = a[i].toObject();
        StatePoint pt{r.string(p, "label", where), r.number(p, "T_K", where),
                      r.number(p, "P_Pa", where)};
        if (!(pt.T_K > 0)) r.fail(where + "/T_K", "temperature is not above 0 K");
        if (!(pt.P_Pa > 0)) r.fail(where + "/P_Pa", "pressure is not above 0 Pa");
        s.points.push_back(pt);
    }
}

// An unset view (the diagram never shown) is written with its flags only.
QJsonObject viewJson(const SessionData &s) {
    QJsonObject v{{"log_p", s.view.logPressure}, {"show_1atm", s.showAtmosphere}};
    if (!s.view.valid()) return v;
    v.insert(QStringLiteral("T_min_K"), s.view.T_min_K);
    v.insert(QStringLiteral("T_max_K"), s.view.T_max_K);
    v.insert(QStringLiteral("P_min_Pa"), s.view.P_min_Pa);
    v.insert(QStringLiteral("P_max_Pa"), s.view.P_max_Pa);
    return v;
}

}  // namespace

QByteArray sessionToJson(const SessionData &s) {
    QJsonArray substances;
    for (const auto &ref : s.substances)
        substances.append(QJsonObject{{"id", ref.id}, {"origin", ref.origin}});
    QJsonArray points;
    for (const auto &p : s.points)
        points.append(QJsonObject{{"label", p.label}, {"T_K", p.T_K}, {"P_Pa", p.P_Pa}});
    QJsonObject root{{"format", QLatin1String(kSessionFormat)},
                     {"version", kSessionVersion},
                     {"substances", substances},
                     {"units", QJsonObject{{"T", unitText(s.units.temperature)},
                                           {"P", unitText(s.units.pressure)}}},
                     {"view", viewJson(s)},
                     {"points", points}};
    if (!s.recoveredFrom.isNull()) root.insert(QStringLiteral("recovered_from"), s.recoveredFrom);
    return QJsonDocument(root).toJson(QJsonDocument::Indented);
}

SessionData sessionFromJson(const QByteArray &json, const QString &fileName) {
    const Reader r{fileName.toStdString()};
    QJsonParseError err{};
    const QJsonDocument doc = QJsonDocument::fromJson(json, &err);
    if (err.error != QJsonParseError::NoError)
        r.fail("", "not valid JSON at byte " + std::to_string(err.offset) + ": " +
                       err.errorString().toStdString());
    if (!doc.isObject()) r.fail("", "expected a JSON object");
    const QJsonObject root = doc.object();
    if (root.value(QLatin1String("format")).toString() != QLatin1String(kSessionFormat))
        r.fail("/format", std::string("expected \"") + kSessionFormat + "\"");
    if (root.value(QLatin1String("version")).toInt(-1) != kSessionVersion)
        r.fail("/version", "unsupported version (this program reads version 1)");
    SessionData s;
    const QJsonArray subs = root.value(QLatin1String("substances")).toArray();
    for (int i = 0; i < subs.size(); ++i) {
        const std::string where = "/substances/" + std::to_string(i);
        const QJsonObject o = subs[i].toObject();
        s.substances.push_back(
            {r.string(o, "id", where), o.value(QLatin1String("origin")).toString()});
    }
    readUnits(r, root.value(QLatin1String("units")).toObject(), s);
    readView(r, root.value(QLatin1String("view")).toObject(), s);
    readPoints(r, root.value(QLatin1String("points")).toArray(), s);
    if (root.contains(QLatin1String("recovered_from")))
        s.recoveredFrom = root.value(QLatin1String("recovered_from")).toString(QStringLiteral(""));
    return s;
}

bool writeFileAtomically(const QString &path, const QByteArray &data, QString *error) {
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly) || file.write(data) != data.size() || !file.commit()) {
        if (error) *error = QObject::tr("%1: cannot write: %2").arg(path, file.errorString());
        file.cancelWriting();
        return false;
    }
    return true;
}

}  // namespace pw::ui
