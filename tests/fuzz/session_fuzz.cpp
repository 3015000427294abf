// Fuzz target: the session-file reader (widgets/session_io.h sessionFromJson). It is Qt-bound
// (QJsonDocument), so it is built only when the GUI is on. A session that is read must be
// written back (sessionToJson) and read again to the same data: the round trip is the oracle.
#include <QByteArray>
#include <QString>
#include <cstdint>
#include <cstdio>
#include <cstdlib>

#include "core/errors.h"
#include "widgets/session_io.h"

namespace {

[[noreturn]] void finding(const char *what) {
    std::fprintf(stderr, "%s\n", what);
    std::abort();
}

pw::ui::SessionData rewrite(const pw::ui::SessionData &s) {
    try {
        return pw::ui::sessionFromJson(pw::ui::sessionToJson(s),
                                       QStringLiteral("fuzz-rewritten.pwsession"));
    } catch (const pw::Error &e) {
        std::fprintf(stderr, "%s\n", e.what());
        finding("a written session was refused");
    }
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    const QByteArray json(reinterpret_cast<const char *>(data), static_cast<qsizetype>(size));
    pw::ui::SessionData first;
    try {
        first = pw::ui::sessionFromJson(json, QStringLiteral("fuzz.pwsession"));
    } catch (const pw::Error &) {
        return 0;
    }
    // Text may be normalised once (e.g. a lone UTF-16 surrogate in a label); after that the
    // round trip is exact, and numbers, units and the view never change.
    const pw::ui::SessionData second = rewrite(first);
    if (!(rewrite(second) == second)) finding("a session changes on every save");
    if (second.points.size() != first.points.size()) finding("points lost in a round trip");
    for (std::size_t i = 0; i < first.points.size(); ++i)
        if (second.points[i].T_K != first.points[i].T_K ||
            second.points[i].P_Pa != first.points[i].P_Pa)
            finding("a point's value changed in a round trip");
    if (!(second.view == first.view) || !(second.units == first.units) ||
        second.substances.size() != first.substances.size())
        finding("the view, the units or the substances changed in a round trip");
    return 0;
}
