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

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t *data, std::size_t size) {
    const QByteArray json(reinterpret_cast<const char *>(data), static_cast<qsizetype>(size));
    pw::ui::SessionData session;
    try {
        session = pw::ui::sessionFromJson(json, QStringLiteral("fuzz.pwsession"));
    } catch (const pw::Error &) {
        return 0;
    }
    try {
        const auto again = pw::ui::sessionFromJson(pw::ui::sessionToJson(session),
                                                   QStringLiteral("fuzz-rewritten.pwsession"));
        if (again == session) return 0;
        std::fprintf(stderr, "a session read back differs from the one written\n");
    } catch (const pw::Error &e) {
        std::fprintf(stderr, "a written session was refused: %s\n", e.what());
    }
    std::abort();
}
