#include "widgets/points_csv.h"

#include <QFile>
#include <QRegularExpression>
#include <QSaveFile>
#include <QStringList>
#include <cmath>

#include "core/classify.h"
#include "core/errors.h"
#include "widgets/format.h"

namespace pw::ui {
namespace {

QString quoted(const QString &field) {
    if (!field.contains(QLatin1Char(',')) && !field.contains(QLatin1Char('"')) &&
        !field.contains(QLatin1Char('\n')))
        return field;
    QString q = field;
    q.replace(QStringLiteral("\""), QStringLiteral("\"\""));
    return QLatin1Char('"') + q + QLatin1Char('"');
}

QString number(double v) { return std::isfinite(v) ? QString::number(v, 'g', 10) : QString(); }

QStringList splitRow(const QString &line, QChar sep) {
    QStringList fields;
    QString cur;
    bool inQuotes = false;
    for (int i = 0; i < line.size(); ++i) {
        const QChar ch = line[i];
        if (inQuotes) {
            if (ch == QLatin1Char('"') && i + 1 < line.size() && line[i + 1] == QLatin1Char('"')) {
                cur += ch;
                ++i;
            } else if (ch == QLatin1Char('"')) {
                inQuotes = false;
            } else {
                cur += ch;
            }
        } else if (ch == QLatin1Char('"')) {
            inQuotes = true;
        } else if (ch == sep) {
            fields << cur.trimmed();
            cur.clear();
        } else {
            cur += ch;
        }
    }
    fields << cur.trimmed();
    return fields;
}

QChar detectSeparator(const QString &header) {
    const QChar candidates[] = {QLatin1Char(','), QLatin1Char(';'), QLatin1Char('\t')};
    QChar best = candidates[0];
    qsizetype most = -1;
    for (QChar c : candidates)
        if (header.count(c) > most) {
            most = header.count(c);
            best = c;
        }
    return best;
}

struct Column {
    int index = -1;
    QString header;
    QString unit;  // from "[...]"; empty: default
};

Column findColumn(const QStringList &headers, const QStringList &names,
                  const QString &impliedUnit) {
    static const QRegularExpression re(QStringLiteral(R"(^\s*([^\[]*?)\s*(?:\[(.*)\])?\s*$)"));
    for (int i = 0; i < headers.size(); ++i) {
        const auto m = re.match(headers[i]);
        const QString name = m.captured(1).toLower();
        for (const QString &n : names)
            if (name == n) {
                QString unit = m.captured(2).trimmed();
                if (unit.isEmpty() && name.contains(QLatin1Char('_'))) unit = impliedUnit;
                return {i, headers[i], unit};
            }
    }
    return {};
}

double cell(const QStringList &fields, const Column &col, const QString &file, long row) {
    const QString text = col.index < fields.size() ? fields[col.index] : QString();
    double v = 0.0;
    if (text.isEmpty())
        throw InputError(file.toStdString(), row, col.header.toStdString(), "missing value");
    if (!parseNumber(text, v))
        throw InputError(file.toStdString(), row, col.header.toStdString(),
                         "'" + text.toStdString() + "' is not a number");
    return v;
}

}  // namespace

QString pointsToCsv(const std::vector<StatePoint> &points, const PhaseDiagram *diagram,
                    DisplayUnits units) {
    const QString tu = QString::fromLatin1(symbol(units.temperature).data());
    const QString pu = QString::fromLatin1(symbol(units.pressure).data());
    QString out = QStringLiteral(
                      "label,T [%1],P [%2],phase,solid_form,nearest_boundary,dT_K,"
                      "dP_Pa,on_boundary,flags\n")
                      .arg(tu, pu);
    for (const StatePoint &p : points) {
        QStringList f{quoted(p.label), number(fromKelvin(p.T_K, units.temperature)),
                      number(fromPascal(p.P_Pa, units.pressure))};
        Classification c;
        bool ok = false;
        if (diagram) try {
                c = classify(*diagram, p.T_K, p.P_Pa);
                ok = true;
            } catch (const pw::Error &) {
            }
        f << (ok ? QString::fromLatin1(toString(c.phase).data()) : QStringLiteral("unknown"))
          << quoted(QString::fromStdString(c.solidForm))
          << quoted(QString::fromStdString(c.nearestLabel)) << number(c.dT_K) << number(c.dP_Pa)
          << (c.onBoundary ? QStringLiteral("true") : QStringLiteral("false"))
          << quoted(QString::fromStdString(flagsText(c)));
        out += f.join(QLatin1Char(',')) + QLatin1Char('\n');
    }
    return out;
}

bool writePointsCsv(const QString &path, const std::vector<StatePoint> &points,
                    const PhaseDiagram *diagram, DisplayUnits units, QString *error) {
    QSaveFile file(path);
    if (!file.open(QIODevice::WriteOnly | QIODevice::Text)) {
        if (error) *error = QObject::tr("%1: cannot write: %2").arg(path, file.errorString());
        return false;
    }
    file.write(pointsToCsv(points, diagram, units).toUtf8());
    if (!file.commit()) {
        if (error) *error = QObject::tr("%1: cannot write: %2").arg(path, file.errorString());
        return false;
    }
    return true;
}

std::vector<StatePoint> parsePointsCsv(const QString &text, const QString &fileName) {
    QStringList lines = text.split(QLatin1Char('\n'));
    for (QString &l : lines)
        if (l.endsWith(QLatin1Char('\r'))) l.chop(1);
    const std::string file = fileName.toStdString();
    if (lines.isEmpty() || lines.front().trimmed().isEmpty())
        throw InputError(file, 1, "", "empty file: expected a header row with T and P columns");
    const QChar sep = detectSeparator(lines.front());
    const QStringList headers = splitRow(lines.front(), sep);
    const Column label = findColumn(headers, {QStringLiteral("label"), QStringLiteral("name")}, {});
    const Column tCol = findColumn(
        headers, {QStringLiteral("t"), QStringLiteral("t_k"), QStringLiteral("temperature")},
        QStringLiteral("K"));
    const Column pCol = findColumn(
        headers, {QStringLiteral("p"), QStringLiteral("p_pa"), QStringLiteral("pressure")},
        QStringLiteral("Pa"));
    if (tCol.index < 0)
        throw InputError(file, 1, "T", "no temperature column (T, T_K, temperature)");
    if (pCol.index < 0) throw InputError(file, 1, "P", "no pressure column (P, P_Pa, pressure)");
    TemperatureUnit tu = TemperatureUnit::Kelvin;
    PressureUnit pu = PressureUnit::Pa;
    try {
        if (!tCol.unit.isEmpty()) tu = parseTemperatureUnit(tCol.unit.toStdString());
        if (!pCol.unit.isEmpty()) pu = parsePressureUnit(pCol.unit.toStdString());
    } catch (const UnitError &e) {
        throw InputError(file, 1, "", e.what());
    }
    std::vector<StatePoint> points;
    for (int i = 1; i < lines.size(); ++i) {
        if (lines[i].trimmed().isEmpty()) continue;
        const long row = i + 1;
        const QStringList f = splitRow(lines[i], sep);
        StatePoint p;
        p.T_K = toKelvin(cell(f, tCol, fileName, row), tu);
        p.P_Pa = toPascal(cell(f, pCol, fileName, row), pu);
        if (!(p.T_K > 0))
            throw InputError(file, row, tCol.header.toStdString(), "temperature is not above 0 K");
        if (!(p.P_Pa > 0))
            throw InputError(file, row, pCol.header.toStdString(), "pressure is not above 0 Pa");
        p.label = label.index >= 0 && label.index < f.size() ? f[label.index]
                                                             : QStringLiteral("R%1").arg(row);
        points.push_back(std::move(p));
    }
    return points;
}

std::vector<StatePoint> readPointsCsv(const QString &path) {
    QFile file(path);
    if (!file.open(QIODevice::ReadOnly))
        throw InputError(path.toStdString(), 0, "",
                         "cannot open: " + file.errorString().toStdString());
    return parsePointsCsv(QString::fromUtf8(file.readAll()), path);
}

}  // namespace pw::ui
