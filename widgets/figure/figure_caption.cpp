#include "widgets/figure/figure_caption.h"

#include <QRegularExpression>
#include <utility>
#include <vector>

namespace pw::ui {
namespace {

QString q(const std::string &s) { return QString::fromStdString(s); }

// Authors split on ",", ";", " and " and "&" (an "A. B. Surname" list or "Surname, A.").
QStringList authorList(const QString &authors) {
    static const QRegularExpression sep(QStringLiteral(R"(\s*(?:;|,|&|\band\b)\s*)"));
    QStringList parts = authors.split(sep, Qt::SkipEmptyParts);
    // "Wagner, W." style: drop initials-only parts.
    static const QRegularExpression initials(QStringLiteral(R"(^(?:[A-Z]\.\s*-?)+$)"));
    parts.removeIf([](const QString &p) { return initials.match(p.trimmed()).hasMatch(); });
    return parts;
}

QString surname(const QString &author) {
    const QStringList words = author.trimmed().split(QLatin1Char(' '), Qt::SkipEmptyParts);
    return words.isEmpty() ? author : words.back();
}

struct SourceGroup {
    std::string key;
    Citation citation;
    QStringList boundaries;
    QStringList forms;
};

std::vector<SourceGroup> groupBySource(const Substance &s) {
    std::vector<SourceGroup> groups;
    for (const Boundary &b : s.boundaries) {
        auto it = std::find_if(groups.begin(), groups.end(),
                               [&](const SourceGroup &g) { return g.key == b.sourceKey; });
        if (it == groups.end()) {
            groups.push_back({b.sourceKey, b.source, {}, {}});
            it = std::prev(groups.end());
        }
        if (!it->boundaries.contains(q(b.label()))) it->boundaries << q(b.label());
        if (!it->forms.contains(q(b.spec.form))) it->forms << q(b.spec.form);
    }
    return groups;
}

// "melting (ice Ih)", "melting (ice III)" -> "melting (ice Ih, III)".
QString mergeLabels(const QStringList &labels) {
    static const QRegularExpression re(QStringLiteral(R"(^(.*?) \((.*)\)$)"));
    QStringList out;
    QString prefix;
    QStringList inner;
    auto flush = [&] {
        if (!prefix.isEmpty())
            out << QStringLiteral("%1 (%2)").arg(prefix, inner.join(QStringLiteral(", ")));
        prefix.clear();
        inner.clear();
    };
    for (const QString &l : labels) {
        const auto m = re.match(l);
        if (!m.hasMatch()) {
            flush();
            out << l;
            continue;
        }
        if (m.captured(1) != prefix) flush();
        prefix = m.captured(1);
        QString part = m.captured(2);
        if (!inner.isEmpty() && part.startsWith(QLatin1String("ice "))) part = part.mid(4);
        inner << part;
    }
    flush();
    return out.join(QStringLiteral(", "));
}

// "IAPWS; W. Wagner, ..." names the issuing body before the ';' (a release is cited by it).
QString issuingBody(const QString &authors) {
    const QString head = authors.section(QLatin1Char(';'), 0, 0).trimmed();
    if (!authors.contains(QLatin1Char(';')) || head.contains(QLatin1Char('.'))) return {};
    return head;
}

// "Surname", "One & Two" or "One et al." from an author list.
QString authorsShort(const QStringList &authors) {
    if (authors.size() == 1) return authors.front().trimmed();
    if (authors.size() == 2)
        return surname(authors[0]) + QStringLiteral(" & ") + surname(authors[1]);
    if (authors.size() > 2) return surname(authors[0]) + QStringLiteral(" et al.");
    return {};
}

}  // namespace

QString shortCitation(const Citation &c) {
    QString who = issuingBody(q(c.authors));
    if (who.isEmpty()) who = authorsShort(authorList(q(c.authors)));
    QString text = who;
    if (c.year > 0) text += QStringLiteral(" (%1)").arg(c.year);
    // The publication up to its first ';' (later parts are adoption notes and the like).
    QString where = c.publication.empty() ? q(c.title) : q(c.publication);
    where = where.section(QLatin1Char(';'), 0, 0).trimmed();
    if (!where.isEmpty()) text += (text.isEmpty() ? QString() : QStringLiteral(", ")) + where;
    if (QString::fromStdString(c.note).contains(QLatin1String("from memory"), Qt::CaseInsensitive))
        text += QStringLiteral(" (coefficients from memory)");
    return text.isEmpty() ? QStringLiteral("source not given") : text;
}

QStringList sourceCaption(const DiagramScene &scene) {
    QStringList out;
    for (const DiagramPtr &d : scene.substances) {
        if (!d) continue;
        const Substance &s = d->substance();
        QStringList parts;
        for (const SourceGroup &g : groupBySource(s))
            parts << QStringLiteral("%1 [%2] — %3")
                         .arg(mergeLabels(g.boundaries), g.forms.join(QStringLiteral(", ")),
                              shortCitation(g.citation));
        QString head = q(s.name);
        if (!s.formula.empty()) head += QStringLiteral(" (%1)").arg(q(s.formula));
        out << head + QStringLiteral(": ") + parts.join(QStringLiteral("; "));
    }
    return out;
}

QString versionLine(const QDate &date) {
    return QStringLiteral("Phasewright %1 · %2 · boundaries dashed outside their published range")
        .arg(QStringLiteral(PW_VERSION), date.toString(Qt::ISODate));
}

QString cautionLine() {
    return QStringLiteral(
        "Caution: high-pressure, cryogenic and vacuum work follows the applicable "
        "pressure-equipment codes and site procedures; this diagram supports engineering "
        "judgement and replaces neither.");
}

}  // namespace pw::ui
